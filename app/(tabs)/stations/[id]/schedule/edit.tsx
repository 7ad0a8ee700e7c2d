import { Stack, useLocalSearchParams, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { useSaveScheduleMutation, useScheduleQuery, useScheduleUnitQuery } from '@/components/schedules/queries';
import { LazyScheduleEditor as ScheduleEditor, LazySchedulePreviewPanel as SchedulePreviewPanel } from '@/components/schedules/lazy-parts';
import { draftDefaults } from '@/components/schedules/draft-defaults';
import { useTickingClock } from '@/components/ui/use-ticking-clock';
import { useStationQuery } from '@/components/stations/queries';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function EditScheduleRoute() {
  const router = useRouter();
  const { id, preset } = useLocalSearchParams<{ id: string; preset?: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const schedule = useScheduleQuery(stationId);
  const unit = useScheduleUnitQuery(station.data?.unitId);
  const save = useSaveScheduleMutation(stationId, !!schedule.data);
  const nowMs = useTickingClock(60_000);
  const { isWide } = useBreakpoints();
  const back = () => router.replace({ pathname: '/stations/[id]/schedule', params: { id } });

  let body;
  const unitPending = !!station.data?.unitId && unit.isPending;
  if (station.isPending || schedule.isPending || unitPending) body = <LoadingState label="Loading the schedule…" />;
  else if (station.isError)
    body = <ErrorState title="The station could not be loaded" error={station.error} onRetry={() => station.refetch()} />;
  else if (schedule.isError)
    body = <ErrorState title="The schedule could not be loaded" error={schedule.error} onRetry={() => schedule.refetch()} />;
  else if (unit.isError)
    body = <ErrorState title="The station's unit could not be loaded" error={unit.error} onRetry={() => unit.refetch()} />;
  else if (station.data.ownerId !== me?.id)
    body = (
      <ErrorState
        title="Read-only"
        error={new Error(`This station belongs to ${station.data.ownerName}; only its owner can change its schedule.`)}
      />
    );
  else {
    const { values, presets } = draftDefaults({
      station: station.data,
      schedule: schedule.data,
      unit: unit.data ?? null,
      presetId: preset,
      nowMs,
    });
    body = (
      <>
        <ScreenTitle>{schedule.data ? 'Edit the schedule' : 'Build a rotation'}</ScreenTitle>
        <Text variant="mono" tone="primary">
          {station.data.name} · {station.data.callsign}
        </Text>
        <ScheduleEditor
          key={preset ?? 'plain'}
          station={station.data}
          unit={unit.data ?? null}
          defaultValues={values}
          presets={schedule.data ? undefined : presets}
          submitLabel="Save schedule"
          onSubmit={async (input) => {
            await save.mutateAsync(input);
            back();
          }}
          onCancel={back}
          bandsHref={{ pathname: '/stations/[id]/bands', params: { id } }}
          wide={isWide}
          nowMs={nowMs}
          renderPreview={(preview) => (
            <SchedulePreviewPanel preview={preview} note="Live preview of this draft, computed as the server will plan it once saved." />
          )}
        />
      </>
    );
  }
  return (
    <Screen maxWidth={isWide ? 1180 : undefined}>
      <Stack.Screen options={{ title: schedule.data ? 'Edit schedule' : 'New schedule' }} />
      {body}
    </Screen>
  );
}
