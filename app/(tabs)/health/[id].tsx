import { Stack, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useSaveAlertSettingsMutation, useStationHealthQuery } from '@/components/health/queries';
import { StationHealthView } from '@/components/health/station-health-view';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useRouteId } from '@/components/query/use-route-id';
import { useStationQuery } from '@/components/stations/queries';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';

export default function StationHealthRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const health = useStationHealthQuery(stationId, { live: true });
  const station = useStationQuery(stationId);
  const save = useSaveAlertSettingsMutation(stationId);
  // club admins may look; only the owner changes thresholds or the device token
  const owner = !!station.data && station.data.ownerId === me?.id;

  return (
    <Screen>
      <Stack.Screen options={{ title: health.data ? `${health.data.stationName} · health` : 'Station health' }} />
      {valid ? (
        <TextLink
          href={{ pathname: '/stations/[id]/results', params: { id: String(stationId) } }}
          label="Who heard it: reception results"
        />
      ) : null}
      <QueryBoundary
        query={health}
        noun="station"
        validId={valid}
        loadingLabel="Loading the station's health…"
        errorTitle="The station's health could not be loaded"
      >
        {(data) => (
          <StationHealthView
            health={data}
            nowMs={health.dataUpdatedAt}
            readOnly={!owner}
            onSaveSettings={(settings) => save.mutateAsync(settings)}
            onOpenDevice={owner ? () => router.push({ pathname: '/stations/[id]/device', params: { id } }) : undefined}
          />
        )}
      </QueryBoundary>
    </Screen>
  );
}
