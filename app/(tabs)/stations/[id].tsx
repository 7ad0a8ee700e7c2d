import { useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { StationDeviceLinks } from '@/components/devices/station-device-links';
import { ExposureCard } from '@/components/stations/exposure-card';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { useDeleteStationMutation, useStationQuery } from '@/components/stations/queries';
import { StationDetails } from '@/components/stations/station-details';
import { StationHeader } from '@/components/stations/station-header';
import { useUnitQuery } from '@/components/units/queries';
import { LazyStationWorkshop as StationWorkshop } from '@/components/workshop/lazy-parts';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';

export default function StationDetailRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const unit = useUnitQuery(station.data?.unitId);
  const remove = useConfirmedMutation(useDeleteStationMutation(stationId));
  const open = (pathname: '/stations/[id]/edit' | '/stations/[id]/bands' | '/stations/[id]/calibrate' | '/stations/[id]/on-air') =>
    router.push({ pathname, params: { id } });

  return (
    <Screen
      overlay={
        <ConfirmDialog
          {...remove.dialog}
          title="Delete this station?"
          message={`“${station.data?.name ?? 'This station'}” will be removed for good, and with it:`}
          details={stationDeletionTakes}
          confirmLabel="Delete station"
          destructive
          onConfirm={() =>
            remove.confirm(undefined, () => {
              if (router.canGoBack()) router.back();
              else router.replace('/stations');
            })
          }
        />
      }
    >
      <QueryBoundary query={station} noun="station" validId={valid}>
        {(data) => {
          // a club admin may open a member's station, but only its owner may change it
          const readOnly = data.ownerId !== me?.id;
          return (
            <>
              <StationHeader
                station={data}
                onEdit={readOnly ? undefined : () => open('/stations/[id]/edit')}
                onDelete={readOnly ? undefined : () => remove.ask()}
              />
              <StationDeviceLinks stationId={stationId} readOnly={readOnly} />
              <TextLink
                href={{ pathname: '/stations/[id]/results', params: { id: String(stationId) } }}
                label="Who heard it: reception results"
              />
              <StationWorkshop
                station={data}
                unit={unit.data ?? null}
                unitLoading={unit.isPending && data.unitId !== null}
                unitError={unit.isError ? unit.error.message : undefined}
                readOnly={readOnly}
                onOpenBands={() => open('/stations/[id]/bands')}
                onOpenCalibration={() => open('/stations/[id]/calibrate')}
                onOpenOnAir={() => open('/stations/[id]/on-air')}
              />
              <ExposureCard station={data} unit={unit.data ?? null} />
              <StationDetails station={data} readOnly={readOnly} />
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}

/** Everything the database removes together with a station. */
const stationDeletionTakes = [
  'its notes and band settings, with the calibration',
  'its transmit schedule',
  'its device token, so the beacon can no longer sign in',
  'the reception summaries worked out for its reports',
] as const;
