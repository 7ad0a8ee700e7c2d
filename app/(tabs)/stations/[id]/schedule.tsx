import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';

import { useSessionQuery } from '@/components/auth/queries';
import { useDeleteScheduleMutation, usePatchScheduleMutation, usePlanQuery, useScheduleQuery } from '@/components/schedules/queries';
import { previewFromPlan, previewRange } from '@/components/schedules/preview-model';
import {
  LazyScheduleEmpty as ScheduleEmpty,
  LazySchedulePreviewPanel as SchedulePreviewPanel,
  LazyScheduleSummary as ScheduleSummary,
} from '@/components/schedules/lazy-parts';
import { useTickingClock } from '@/components/ui/use-ticking-clock';
import { useStationQuery } from '@/components/stations/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

export default function StationScheduleRoute() {
  const router = useRouter();
  const { id } = useLocalSearchParams<{ id: string }>();
  const stationId = Number(id);
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const schedule = useScheduleQuery(stationId);
  const nowMs = useTickingClock(60_000);
  const range = previewRange(nowMs);
  const plan = usePlanQuery(stationId, range, !!schedule.data);
  const patch = usePatchScheduleMutation(stationId);
  const remove = useDeleteScheduleMutation(stationId);
  const [confirming, setConfirming] = useState(false);
  const toEditor = (preset?: string) => router.push({ pathname: '/stations/[id]/schedule/edit', params: preset ? { id, preset } : { id } });

  let body;
  if (station.isPending || schedule.isPending) body = <LoadingState label="Loading the schedule…" />;
  else if (station.isError)
    body = <ErrorState title="The station could not be loaded" error={station.error} onRetry={() => station.refetch()} />;
  else if (schedule.isError)
    body = <ErrorState title="The schedule could not be loaded" error={schedule.error} onRetry={() => schedule.refetch()} />;
  else {
    const readOnly = station.data.ownerId !== me?.id;
    if (!schedule.data) {
      body = <ScheduleEmpty station={station.data} readOnly={readOnly} nowMs={nowMs} onBuild={toEditor} />;
    } else {
      const saved = schedule.data;
      body = (
        <>
          <Text variant="mono" tone="primary">
            {station.data.name} · {station.data.callsign}
          </Text>
          <ScheduleSummary
            schedule={saved}
            station={station.data}
            busy={patch.isPending}
            error={patch.error?.message}
            onEdit={readOnly ? undefined : () => toEditor()}
            onPause={readOnly ? undefined : () => patch.mutate({ paused: true })}
            onResume={readOnly ? undefined : () => patch.mutate({ paused: false })}
            onDelete={readOnly ? undefined : () => setConfirming(true)}
          />
          {plan.isPending ? (
            <LoadingState label="Loading the plan…" />
          ) : plan.isError ? (
            <ErrorState title="The plan could not be loaded" error={plan.error} onRetry={() => plan.refetch()} />
          ) : (
            <SchedulePreviewPanel
              preview={previewFromPlan(
                plan.data,
                saved.steps.map((s) => s.bandId),
                nowMs,
              )}
              upcoming={plan.data.transmissions}
              quietMessage={plan.data.quiet.map((q) => q.message).join(' ') || undefined}
            />
          )}
        </>
      );
    }
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
          title="Delete this schedule?"
          message={`“${schedule.data?.name ?? 'The schedule'}” will be removed and the station stops transmitting by plan. The station, its bands and calibration stay.`}
          confirmLabel="Delete schedule"
          destructive
          busy={remove.isPending}
          error={remove.error?.message}
          onCancel={closeDialog}
          onConfirm={() => remove.mutate(undefined, { onSuccess: () => setConfirming(false) })}
        />
      }
    >
      <Stack.Screen options={{ title: 'Schedule' }} />
      {body}
    </Screen>
  );
}
