import { useLocalSearchParams, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useStationQuery, useUpdateStationMutation } from '@/components/stations/queries';
import { StationForm } from '@/components/stations/station-form';
import { useUnitsQuery } from '@/components/units/queries';
import { Card } from '@/components/ui/card';
import { formatLocator } from '@/components/ui/format';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { layout } from '@/components/ui/theme';

export default function EditStationRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const update = useUpdateStationMutation(stationId);
  const units = useUnitsQuery();
  const back = () =>
    router.canGoBack() ? router.back() : router.replace({ pathname: '/stations/[id]', params: { id: String(stationId) } });

  let body;
  if (station.isPending || units.isPending) body = <LoadingState label="Loading the station…" />;
  else if (station.isError)
    body = <ErrorState title="The station could not be loaded" error={station.error} onRetry={() => station.refetch()} />;
  else if (units.isError) body = <ErrorState title="Your units could not be loaded" error={units.error} onRetry={() => units.refetch()} />;
  else if (station.data.ownerId !== me?.id)
    body = (
      <ErrorState title="Read-only" error={new Error(`This station belongs to ${station.data.ownerName}; only its owner can change it.`)} />
    );
  else
    body = (
      <Card>
        <StationForm
          units={units.data}
          defaultValues={{
            name: station.data.name,
            callsign: station.data.callsign,
            locator: formatLocator(station.data.locator),
            notes: station.data.notes,
            unitId: station.data.unitId,
            region: station.data.region,
            audioOffsetHz: station.data.audioOffsetHz,
            transmitEnabled: station.data.transmitEnabled,
          }}
          submitLabel="Save station"
          onSubmit={async (values) => {
            await update.mutateAsync(values);
            back();
          }}
          onCancel={back}
        />
      </Card>
    );
  return <Screen maxWidth={layout.maxFormWidth + 120}>{body}</Screen>;
}
