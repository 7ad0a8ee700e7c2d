import type { Schedule } from '@/shared/schemas';

import { QueryBoundary } from '../query/query-boundary';
import { LazySchedulePreviewPanel as SchedulePreviewPanel } from './lazy-parts';
import { previewFromPlan, previewRange } from './preview-model';
import { usePlanQuery } from './queries';

export type SavedSchedulePlanProps = { stationId: number; schedule: Schedule; nowMs: number };

/** The saved schedule's plan as the server computes it: the next transmissions and the week's preview. */
export function SavedSchedulePlan({ stationId, schedule, nowMs }: SavedSchedulePlanProps) {
  const plan = usePlanQuery(stationId, previewRange(nowMs));
  return (
    <QueryBoundary query={plan} noun="plan">
      {(data) => (
        <SchedulePreviewPanel
          preview={previewFromPlan(
            data,
            schedule.steps.map((s) => s.bandId),
            nowMs,
          )}
          upcoming={data.transmissions}
          quietMessage={data.quiet.map((q) => q.message).join(' ') || undefined}
        />
      )}
    </QueryBoundary>
  );
}
