import { useRouter } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useRouteId } from '@/components/query/use-route-id';
import { useStationQuery } from '@/components/stations/queries';
import { useUnitQuery } from '@/components/units/queries';
import { Screen } from '@/components/ui/screen';
import { LazyBandList as BandList } from '@/components/workshop/lazy-parts';
import { useSetBandMutation } from '@/components/workshop/queries';
import { WorkshopHeader } from '@/components/workshop/workshop-header';
import { ApiError } from '@/shared/api/client';
import type { BandId } from '@/shared/domain/bands';

export default function StationBandsRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const unit = useUnitQuery(station.data?.unitId);
  const setBand = useSetBandMutation(stationId);
  const [pending, setPending] = useState<BandId | null>(null);
  const [errors, setErrors] = useState<Partial<Record<BandId, string>>>({});

  return (
    <Screen>
      <QueryBoundary
        query={station}
        noun="station"
        validId={valid}
        loadingLabel="Loading the bands…"
        alongside={[{ query: unit, errorTitle: 'The station’s unit could not be loaded' }]}
      >
        {(data) => {
          const readOnly = data.ownerId !== me?.id;
          return (
            <>
              <WorkshopHeader
                title="Bands and calibration"
                station={data}
                actions={[
                  ...(readOnly
                    ? []
                    : [{ label: 'Calibrate', onPress: () => router.push({ pathname: '/stations/[id]/calibrate', params: { id } }) }]),
                  {
                    label: 'On-air detail',
                    onPress: () => router.push({ pathname: '/stations/[id]/on-air', params: { id } }),
                    secondary: true,
                  },
                ]}
                intro="Switch on the bands this station uses. A band needs a low-pass filter on the unit that covers it. Each enabled band shows where its four tones sit in the 200 Hz receive window."
              />
              <BandList
                station={data}
                unit={unit.data ?? null}
                readOnly={readOnly}
                pendingBandId={pending}
                errors={errors}
                onToggle={(bandId, enabled) => {
                  setPending(bandId);
                  setErrors((all) => ({ ...all, [bandId]: undefined }));
                  setBand.mutate(
                    { bandId, enabled },
                    {
                      onError: (error) =>
                        setErrors((all) => ({
                          ...all,
                          [bandId]:
                            error instanceof ApiError
                              ? (error.fields.enabled ?? error.message)
                              : 'The band could not be changed. Try again.',
                        })),
                      onSettled: () => setPending(null),
                    },
                  );
                }}
              />
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}
