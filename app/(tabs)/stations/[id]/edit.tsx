import { useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useRouteId } from '@/components/query/use-route-id';
import { useStationQuery, useUpdateStationMutation } from '@/components/stations/queries';
import { StationForm } from '@/components/stations/station-form';
import { useUnitsQuery } from '@/components/units/queries';
import { Card } from '@/components/ui/card';
import { formatLocator } from '@/components/ui/format';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function EditStationRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const update = useUpdateStationMutation(stationId);
  const units = useUnitsQuery();
  const back = () => (router.canGoBack() ? router.back() : router.replace({ pathname: '/stations/[id]', params: { id } }));

  return (
    <Screen maxWidth={layout.maxFormWidth + 120}>
      <QueryBoundary
        query={station}
        noun="station"
        validId={valid}
        alongside={[{ query: units, errorTitle: 'Your units could not be loaded' }]}
        refuse={(data) => (data.ownerId === me?.id ? null : `This station belongs to ${data.ownerName}; only its owner can change it.`)}
      >
        {(data) => (
          <Card>
            <StationForm
              units={units.data ?? []}
              defaultValues={{
                name: data.name,
                callsign: data.callsign,
                locator: formatLocator(data.locator),
                notes: data.notes,
                unitId: data.unitId,
                region: data.region,
                audioOffsetHz: data.audioOffsetHz,
                transmitEnabled: data.transmitEnabled,
              }}
              submitLabel="Save station"
              onSubmit={async (values) => {
                await update.mutateAsync(values);
                back();
              }}
              onCancel={back}
            />
          </Card>
        )}
      </QueryBoundary>
    </Screen>
  );
}
