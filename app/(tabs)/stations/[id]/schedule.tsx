import { Stack, useRouter } from 'expo-router';

import { useSessionQuery } from '@/components/auth/queries';
import { QueryBoundary } from '@/components/query/query-boundary';
import { useConfirmedMutation } from '@/components/query/use-confirmed-mutation';
import { useRouteId } from '@/components/query/use-route-id';
import { useDeleteScheduleMutation, usePatchScheduleMutation, useScheduleQuery } from '@/components/schedules/queries';
import { LazyScheduleEmpty as ScheduleEmpty, LazyScheduleSummary as ScheduleSummary } from '@/components/schedules/lazy-parts';
import { SavedSchedulePlan } from '@/components/schedules/saved-schedule-plan';
import { useStationQuery } from '@/components/stations/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useTickingClock } from '@/components/ui/use-ticking-clock';

export default function StationScheduleRoute() {
  const router = useRouter();
  const { id: stationId, raw: id, valid } = useRouteId();
  const me = useSessionQuery().data;
  const station = useStationQuery(stationId);
  const schedule = useScheduleQuery(stationId);
  const nowMs = useTickingClock(60_000);
  const patch = usePatchScheduleMutation(stationId);
  const remove = useConfirmedMutation(useDeleteScheduleMutation(stationId));
  const toEditor = (preset?: string) => router.push({ pathname: '/stations/[id]/schedule/edit', params: preset ? { id, preset } : { id } });

  return (
    <Screen
      overlay={
        <ConfirmDialog
          {...remove.dialog}
          title="Delete this schedule?"
          message={`“${schedule.data?.name ?? 'The schedule'}” will be removed and the station stops transmitting by plan. The station, its bands and calibration stay.`}
          confirmLabel="Delete schedule"
          destructive
          onConfirm={() => remove.confirm(undefined)}
        />
      }
    >
      <Stack.Screen options={{ title: 'Schedule' }} />
      <QueryBoundary
        query={station}
        noun="station"
        validId={valid}
        loadingLabel="Loading the schedule…"
        alongside={[{ query: schedule, errorTitle: 'The schedule could not be loaded' }]}
      >
        {(data) => {
          const readOnly = data.ownerId !== me?.id;
          if (!schedule.data) return <ScheduleEmpty station={data} readOnly={readOnly} nowMs={nowMs} onBuild={toEditor} />;
          return (
            <>
              <Text variant="mono" tone="primary">
                {data.name} · {data.callsign}
              </Text>
              <ScheduleSummary
                schedule={schedule.data}
                station={data}
                busy={patch.isPending}
                error={patch.error?.message}
                onEdit={readOnly ? undefined : () => toEditor()}
                onPause={readOnly ? undefined : () => patch.mutate({ paused: true })}
                onResume={readOnly ? undefined : () => patch.mutate({ paused: false })}
                onDelete={readOnly ? undefined : () => remove.ask()}
              />
              <SavedSchedulePlan stationId={stationId} schedule={schedule.data} nowMs={nowMs} />
            </>
          );
        }}
      </QueryBoundary>
    </Screen>
  );
}
