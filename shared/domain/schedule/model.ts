/**
 * The rules of a band rotation, as the domain sees them (the zod schema in
 * shared/schemas/schedule.ts produces exactly this shape).
 *
 * Words used throughout:
 *   step         one band in the rotation, holding `slots` transmissions in a row
 *   opportunity  a chance to transmit: one slot, or two consecutive slots for a
 *                station that alternates two message types (the pair is never split)
 *   cadence      which opportunities are used: all, every nth, or a duty share
 *   stagger      how the audio offset moves from transmission to transmission
 */
import type { BandId } from '../bands';

/** UTC hours [fromHour, toHour); toHour < fromHour wraps past midnight; equal hours never occur. */
export type ActiveHoursUtc = { fromHour: number; toHour: number };

export type RotationStep = {
  bandId: BandId;
  /** transmissions in a row on this band, 1–30 (a pair counts two; odd counts round up to whole pairs) */
  slots: number;
  activeHoursUtc: ActiveHoursUtc | null;
};

export type Cadence = { kind: 'every-slot' } | { kind: 'every-nth'; nth: number } | { kind: 'duty'; dutyPercent: number };

export type Stagger = { stepHz: number; spanHz: number };

export type ScheduleRules = {
  stationId: number | string;
  steps: readonly RotationStep[];
  cadence: Cadence;
  stagger: Stagger;
  /** first UTC day the schedule runs, YYYY-MM-DD */
  startDate: string;
  /** last UTC day it runs (inclusive), or null for open-ended */
  endDate: string | null;
  paused: boolean;
};

export const MIN_STEP_SLOTS = 1;
export const MAX_STEP_SLOTS = 30;
export const MAX_STEPS = 24;
export const MIN_NTH = 2;
export const MAX_NTH = 30;
export const MAX_STAGGER_STEP_HZ = 20;
export const MAX_STAGGER_SPAN_HZ = 100;

/** Above this share a schedule hogs the band (our rule). */
export const DUTY_BLOCK_PERCENT = 50;
/** About one slot in five: common practice, no source. */
export const DUTY_COMMON_PERCENT = 20;

/** Whether an hour of the UTC day (0–23) falls inside the active hours. */
export function hourIsActive(hours: ActiveHoursUtc | null, hourUtc: number): boolean {
  if (!hours) return true;
  const { fromHour, toHour } = hours;
  if (fromHour === toHour) return false;
  return fromHour < toHour ? hourUtc >= fromHour && hourUtc < toHour : hourUtc >= fromHour || hourUtc < toHour;
}

/** Number of active hours per day (0–24). */
export function activeHourCount(hours: ActiveHoursUtc | null): number {
  let n = 0;
  for (let h = 0; h < 24; h++) if (hourIsActive(hours, h)) n++;
  return n;
}

/** The share of opportunities the cadence uses, in percent. */
export function cadencePercent(cadence: Cadence): number {
  if (cadence.kind === 'every-slot') return 100;
  if (cadence.kind === 'every-nth') return 100 / cadence.nth;
  return cadence.dutyPercent;
}
