import { Stack, useLocalSearchParams, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useSaveAlertSettingsMutation, useStationHealthQuery } from '@/components/health/queries';
import { StationHealthView } from '@/components/health/station-health-view';
import { useStationQuery } from '@/components/stations/queries';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ApiError } from '@/shared/api/client';

export default function StationHealthRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const health = useStationHealthQuery(stationId, { live: true });
  const station = useStationQuery(stationId);
  const save = useSaveAlertSettingsMutation(stationId);

  let body;
  if (!Number.isInteger(stationId) || stationId <= 0)
    body = <ErrorState title="Station not found" error={new Error('This address does not name a station.')} />;
  else if (health.isPending) body = <LoadingState label="Loading the station's health…" />;
  else if (health.isError && !health.data) {
    const missing = health.error instanceof ApiError && health.error.status === 404;
    body = (
      <ErrorState
        title={missing ? 'Station not found' : "The station's health could not be loaded"}
        error={health.error}
        onRetry={missing ? undefined : () => health.refetch()}
      />
    );
  } else {
    // club admins may look; only the owner changes thresholds or the device token
    const owner = !!station.data && station.data.ownerId === me?.id;
    body = (
      <StationHealthView
        health={health.data}
        nowMs={health.dataUpdatedAt}
        readOnly={!owner}
        onSaveSettings={(settings) => save.mutateAsync(settings)}
        onOpenDevice={owner ? () => router.push({ pathname: '/stations/[id]/device', params: { id: String(stationId) } }) : undefined}
      />
    );
  }
  return (
    <Screen>
      <Stack.Screen options={{ title: health.data ? `${health.data.stationName} · health` : 'Station health' }} />
      {Number.isInteger(stationId) && stationId > 0 ? (
        <TextLink
          href={{ pathname: '/stations/[id]/results', params: { id: String(stationId) } }}
          label="Who heard it: reception results"
        />
      ) : null}
      {body}
    </Screen>
  );
}
