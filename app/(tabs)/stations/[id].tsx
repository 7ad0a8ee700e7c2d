import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { StationDeviceLinks } from '@/components/devices/station-device-links';
import { useDeleteStationMutation, useStationQuery } from '@/components/stations/queries';
import { StationDetails } from '@/components/stations/station-details';
import { StationHeader } from '@/components/stations/station-header';
import { useUnitQuery } from '@/components/units/queries';
import { LazyStationWorkshop as StationWorkshop } from '@/components/workshop/lazy-parts';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ApiError } from '@/shared/api/client';

export default function StationDetailRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const remove = useDeleteStationMutation(stationId);
  const unit = useUnitQuery(station.data?.unitId);
  const [confirming, setConfirming] = useState(false);

  let body;
  if (!Number.isInteger(stationId) || stationId <= 0)
    body = <ErrorState title="Station not found" error={new Error('This address does not name a station.')} />;
  else if (station.isPending) body = <LoadingState label="Loading the station…" />;
  else if (station.isError) {
    const missing = station.error instanceof ApiError && station.error.status === 404;
    body = (
      <ErrorState
        title={missing ? 'Station not found' : 'The station could not be loaded'}
        error={station.error}
        onRetry={missing ? undefined : () => station.refetch()}
      />
    );
  } else {
    // a club admin may open a member's station, but only its owner may change it
    const readOnly = station.data.ownerId !== me?.id;
    body = (
      <>
        <StationHeader
          station={station.data}
          onEdit={readOnly ? undefined : () => router.push({ pathname: '/stations/[id]/edit', params: { id: String(stationId) } })}
          onDelete={readOnly ? undefined : () => setConfirming(true)}
        />
        <TextLink
          href={{ pathname: '/stations/[id]/results', params: { id: String(stationId) } }}
          label="Who heard it: reception results"
        />
        <StationDeviceLinks stationId={stationId} readOnly={readOnly} />
        <StationWorkshop
          station={station.data}
          unit={unit.data ?? null}
          unitLoading={unit.isPending && station.data.unitId !== null}
          unitError={unit.isError ? unit.error.message : undefined}
          readOnly={readOnly}
          onOpenBands={() => router.push({ pathname: '/stations/[id]/bands', params: { id: String(stationId) } })}
          onOpenCalibration={() => router.push({ pathname: '/stations/[id]/calibrate', params: { id: String(stationId) } })}
          onOpenOnAir={() => router.push({ pathname: '/stations/[id]/on-air', params: { id: String(stationId) } })}
        />
        <StationDetails station={station.data} readOnly={readOnly} />
      </>
    );
  }

  const closeDialog = () => {
    remove.reset();
    setConfirming(false);
  };
  return (
    <Screen
      overlay={
        <ConfirmDialog
          visible={confirming}
          title="Delete this station?"
          message={`“${station.data?.name ?? 'This station'}” and its notes will be removed for good.`}
          confirmLabel="Delete station"
          destructive
          busy={remove.isPending}
          error={remove.error?.message}
          onCancel={closeDialog}
          onConfirm={() =>
            remove.mutate(undefined, {
              onSuccess: () => {
                setConfirming(false);
                if (router.canGoBack()) router.back();
                else router.replace('/stations');
              },
            })
          }
        />
      }
    >
      {body}
    </Screen>
  );
}
