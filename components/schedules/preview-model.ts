import type { BandId } from '@/shared/domain';
import { DAY_MS, expandPlan, type PlanResult, type ScheduleRules } from '@/shared/domain/schedule';
import type { Station, Unit } from '@/shared/schemas';

import { utcDate } from '../ui/format';
import { timelineModel, timelineWindow, type TimelineModel } from './timeline-model';

/** The days a preview covers: today and tomorrow (UTC), whole days, so minutes per day are true totals. */
export const PREVIEW_DAYS = 2;

export function previewRange(nowMs: number) {
  const fromMs = Math.floor(nowMs / DAY_MS) * DAY_MS;
  const toMs = fromMs + PREVIEW_DAYS * DAY_MS;
  const days = Array.from({ length: PREVIEW_DAYS }, (_, i) => utcDate(fromMs + i * DAY_MS));
  return { fromMs, toMs, fromIso: new Date(fromMs).toISOString(), toIso: new Date(toMs).toISOString(), days };
}

export type SchedulePreview = {
  plan: Pick<PlanResult, 'transmissions' | 'slotsInSchedule' | 'usableSlots' | 'quiet' | 'skippedSteps' | 'warnings'>;
  timeline: TimelineModel;
  days: string[];
};

/** Timeline and figures from a plan over previewRange (the server's or one computed here). */
export function previewFromPlan(plan: SchedulePreview['plan'], bands: readonly BandId[], nowMs: number): SchedulePreview {
  const window = timelineWindow(nowMs);
  return {
    plan,
    timeline: timelineModel({ transmissions: plan.transmissions, bands, ...window, nowMs }),
    days: previewRange(nowMs).days,
  };
}

/**
 * The live preview of a draft: the same expansion the server runs, so what the editor
 * shows is what the device will get. Paused drafts are expanded as if running.
 */
export function previewDraft(input: {
  schedule: Omit<ScheduleRules, 'stationId'>;
  station: Station;
  unit: Unit | null;
  nowMs: number;
}): SchedulePreview {
  const range = previewRange(input.nowMs);
  const result = expandPlan({
    schedule: { ...input.schedule, paused: false, stationId: input.station.id },
    station: input.station,
    unit: input.unit,
    suspended: input.station.suspension !== null,
    fromMs: range.fromMs,
    toMs: range.toMs,
  });
  return previewFromPlan(
    result,
    input.schedule.steps.map((s) => s.bandId),
    input.nowMs,
  );
}
