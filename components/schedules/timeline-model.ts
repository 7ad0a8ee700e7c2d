import type { BandId } from '@/shared/domain';

import { bandName, byFrequency } from './schedule-words';

const HOUR_MS = 3_600_000;

export type TimelineLane = { bandId: BandId; label: string; transmissions: number };

export type TimelineModel = {
  fromMs: number;
  toMs: number;
  nowMs: number;
  lanes: TimelineLane[];
  marks: { startMs: number; lane: number }[];
  /** every whole UTC hour inside the range */
  hourTicksMs: number[];
  hourLabel: (ms: number) => string;
};

/**
 * Lanes (one per band of the rotation, lowest frequency first) and marks for a 24-hour
 * UTC window. Bands in the rotation with no transmission in the window still get a lane.
 */
export function timelineModel(input: {
  transmissions: readonly { startMs: number; bandId: BandId }[];
  bands: readonly BandId[];
  fromMs: number;
  toMs: number;
  nowMs: number;
}): TimelineModel {
  // lane 0 is the bottom of the chart: lowest frequency at the bottom, highest on top
  const order = byFrequency([...input.bands, ...input.transmissions.map((t) => t.bandId)]);
  const laneOf = new Map(order.map((bandId, i) => [bandId, i]));
  const counts = new Map<BandId, number>();
  const marks: TimelineModel['marks'] = [];
  for (const t of input.transmissions) {
    if (t.startMs < input.fromMs || t.startMs >= input.toMs) continue;
    counts.set(t.bandId, (counts.get(t.bandId) ?? 0) + 1);
    marks.push({ startMs: t.startMs, lane: laneOf.get(t.bandId)! });
  }
  const lanes = order.map((bandId) => ({ bandId, label: bandName(bandId).replace(' ', '\u00a0'), transmissions: counts.get(bandId) ?? 0 }));
  const hourTicksMs: number[] = [];
  for (let t = Math.ceil(input.fromMs / HOUR_MS) * HOUR_MS; t <= input.toMs; t += HOUR_MS) hourTicksMs.push(t);
  return {
    fromMs: input.fromMs,
    toMs: input.toMs,
    nowMs: input.nowMs,
    lanes,
    marks,
    hourTicksMs,
    hourLabel: (ms) => `${String(new Date(ms).getUTCHours()).padStart(2, '0')}:00`,
  };
}

/** The window a timeline shows: from the start of the current UTC hour, 24 hours on. */
export function timelineWindow(nowMs: number) {
  const fromMs = Math.floor(nowMs / HOUR_MS) * HOUR_MS;
  return { fromMs, toMs: fromMs + 24 * HOUR_MS };
}
