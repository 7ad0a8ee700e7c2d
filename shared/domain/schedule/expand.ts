/**
 * Turns a schedule into the exact transmissions for any time range.
 *
 * How the timeline is built (all in UTC, all from absolute numbers, so the plan
 * for a slot never depends on the range asked for):
 * - Time is cut into opportunities of F slots, F = the number of message types
 *   the station alternates (1, or 2 for Type 1/3 or Type 2/3 pairs), aligned to
 *   even slots. A pair goes out in two consecutive slots on the same band.
 * - An opportunity is usable when at least one valid step is active at its hour.
 * - The cadence picks opportunities: every one, every nth counted from the start
 *   date, or for a duty share a pseudo-random choice per UTC day seeded by
 *   `${stationId}:${yyyy-mm-dd}`: the day's usable opportunities are cut into equal
 *   strata and one is drawn from each. The number per day is carried over days
 *   (floor(duty · U · day) differences), so a week is within one opportunity of target.
 * - The k-th picked opportunity (counted from the start date) goes to the step at
 *   rotation position k mod L, where each valid step holds ceil(slots / F) positions;
 *   a step outside its active hours passes its turn to the next active step.
 * - The audio offset of transmission t = k · F + j follows the stagger (offsets.ts).
 */
import type { BandId } from '../bands';
import { commandFrequencyHz } from '../calibration';
import { SLOT_MS, TX_START_OFFSET_MS } from '../timing';
import type { MessageOnAir, StationSettings, UnitHardware } from '../workshop/on-air';
import { stationMessages } from '../workshop/on-air';
import { dateOfDay, dayNumber, dayOfMs, SLOTS_PER_DAY, SLOTS_PER_HOUR } from './dates';
import { hourIsActive, type RotationStep, type ScheduleRules } from './model';
import { staggeredOffsetHz } from './offsets';
import { hashText, seededRandom } from './prng';
import { checkStep, type StepBand } from './steps';

export type PlannedTransmission = {
  startMs: number;
  startUtc: string;
  bandId: BandId;
  dialHz: number;
  audioOffsetHz: number;
  /** tone 0 as radiated: dial + audio offset */
  carrierHz: number;
  /** what to tell the generator for tone 0, after the band's calibration */
  commandHz: number;
  /** index into the station's messages (their symbols are looked up by it) */
  messageIndex: number;
  messageText: string;
  messageType: number;
  stepIndex: number;
};

export type SkippedStep = { stepIndex: number; bandId: BandId; reason: string };
export type QuietReason = {
  code: 'paused' | 'suspended' | 'before-start' | 'after-end' | 'no-usable-step' | 'messages' | 'bad-dates';
  message: string;
};

export type PlanInput = {
  schedule: ScheduleRules;
  station: StationSettings;
  unit: UnitHardware | null;
  /** a club admin stopped the station */
  suspended?: boolean;
  /** the station's messages when already encoded (a fleet run); else computed here */
  messages?: readonly MessageOnAir[];
};

type ActiveStep = { stepIndex: number; step: RotationStep; stepBand: StepBand };

export type CompiledPlan = {
  input: PlanInput;
  messages: readonly MessageOnAir[];
  slotsPerOpportunity: number;
  steps: ActiveStep[];
  /** rotation position → index into steps */
  rotation: Int32Array;
  /** opportunity-of-day indices that some step may use */
  usableOfDay: Int32Array;
  usableByHour: boolean[];
  startDay: number;
  endDay: number;
  skippedSteps: SkippedStep[];
  warnings: string[];
  /** reasons nothing at all can be planned (paused, suspended, no step, …) */
  blocked: QuietReason[];
};

/** Checks the steps and messages once; expandCompiled then works for any range. */
export function compilePlan(input: PlanInput): CompiledPlan {
  const { schedule, station, unit } = input;
  const skippedSteps: SkippedStep[] = [];
  const warnings: string[] = [];
  const blocked: QuietReason[] = [];
  if (schedule.paused) blocked.push({ code: 'paused', message: 'The schedule is paused: resume it to transmit.' });
  if (input.suspended)
    blocked.push({ code: 'suspended', message: 'The station is suspended by a club admin: nothing goes on the air until it is lifted.' });

  let messages: readonly MessageOnAir[] = input.messages ?? [];
  if (!input.messages) {
    const planned = stationMessages(station, unit);
    if (planned.ok) messages = planned.messages;
    else blocked.push({ code: 'messages', message: planned.reason });
  }
  const slotsPerOpportunity = Math.max(1, Math.min(2, messages.length || 1));

  const steps: ActiveStep[] = [];
  schedule.steps.forEach((step, stepIndex) => {
    const check = checkStep(step, station, unit);
    if (!check.ok) {
      skippedSteps.push({ stepIndex, bandId: step.bandId, reason: check.reason });
      return;
    }
    if (step.activeHoursUtc && step.activeHoursUtc.fromHour === step.activeHoursUtc.toHour) {
      skippedSteps.push({
        stepIndex,
        bandId: step.bandId,
        reason: `Its active hours (${step.activeHoursUtc.fromHour}:00 to ${step.activeHoursUtc.toHour}:00 UTC) never occur.`,
      });
      return;
    }
    const { band, calibrated, range } = check.stepBand;
    if (!calibrated) warnings.push(`${band.name} has no calibration: the tones go out where the uncorrected generator puts them.`);
    if (station.audioOffsetHz < range.lowHz || station.audioOffsetHz > range.highHz) {
      warnings.push(
        `The audio offset ${station.audioOffsetHz} Hz would put a tone outside the window on ${band.name}: the plan folds it back between ${range.lowHz} and ${range.highHz.toFixed(1)} Hz.`,
      );
    }
    steps.push({ stepIndex, step, stepBand: check.stepBand });
  });
  if (steps.length === 0 && schedule.steps.length > 0) {
    blocked.push({ code: 'no-usable-step', message: 'No step of the rotation can transmit: see the skipped steps.' });
  }

  const positions: number[] = [];
  steps.forEach((s, i) => {
    const held = Math.ceil(s.step.slots / slotsPerOpportunity);
    for (let p = 0; p < held; p++) positions.push(i);
  });
  const usableByHour = Array.from({ length: 24 }, (_, h) => steps.some((s) => hourIsActive(s.step.activeHoursUtc, h)));
  const perDay = SLOTS_PER_DAY / slotsPerOpportunity;
  const usable: number[] = [];
  for (let o = 0; o < perDay; o++) if (usableByHour[Math.floor((o * slotsPerOpportunity) / SLOTS_PER_HOUR)]) usable.push(o);

  const startDay = dayNumber(schedule.startDate);
  const endDay = schedule.endDate === null ? Infinity : dayNumber(schedule.endDate);
  if (startDay === null || endDay === null || endDay < startDay) {
    blocked.push({ code: 'bad-dates', message: 'The start and end dates must be real dates (YYYY-MM-DD), the end not before the start.' });
  }
  // dedupe repeated warnings (the same band in several steps)
  const uniqueWarnings = [...new Set(warnings)];
  return {
    input,
    messages,
    slotsPerOpportunity,
    steps,
    rotation: Int32Array.from(positions),
    usableOfDay: Int32Array.from(usable),
    usableByHour,
    startDay: startDay ?? 0,
    endDay: endDay ?? -1,
    skippedSteps,
    warnings: uniqueWarnings,
    blocked,
  };
}

/** Opportunities picked on one day, as [opportunity-of-day, ordinal] pairs in time order. */
function pickedOnDay(plan: CompiledPlan, day: number): { ofDay: number; ordinal: number }[] {
  const { cadence, stationId } = plan.input.schedule;
  const perDay = SLOTS_PER_DAY / plan.slotsPerOpportunity;
  const out: { ofDay: number; ordinal: number }[] = [];
  if (cadence.kind === 'duty') {
    const usable = plan.usableOfDay;
    const u = usable.length;
    const carried = (d: number) => Math.floor((cadence.dutyPercent * u * d) / 100);
    const count = carried(day + 1) - carried(day);
    const random = seededRandom(hashText(`${stationId}:${dateOfDay(day)}`));
    const base = carried(day) - carried(plan.startDay);
    for (let i = 0; i < count; i++) {
      const lo = Math.floor((i * u) / count);
      const hi = Math.floor(((i + 1) * u) / count);
      out.push({ ofDay: usable[lo + Math.floor(random() * (hi - lo))], ordinal: base + i });
    }
    return out;
  }
  const nth = cadence.kind === 'every-nth' ? cadence.nth : 1;
  const anchor = plan.startDay * perDay;
  const first = day * perDay;
  // first opportunity of the day on the cadence
  let o = first + ((((anchor - first) % nth) + nth) % nth);
  for (; o < first + perDay; o += nth) {
    const ofDay = o - first;
    if (plan.usableByHour[Math.floor((ofDay * plan.slotsPerOpportunity) / SLOTS_PER_HOUR)]) {
      out.push({ ofDay, ordinal: (o - anchor) / nth });
    }
  }
  return out;
}

function stepFor(plan: CompiledPlan, ordinal: number, hourUtc: number): ActiveStep {
  const n = plan.steps.length;
  let i = plan.rotation[ordinal % plan.rotation.length];
  for (let tries = 0; tries < n; tries++, i = (i + 1) % n) {
    if (hourIsActive(plan.steps[i].step.activeHoursUtc, hourUtc)) return plan.steps[i];
  }
  return plan.steps[i]; // unreachable for usable opportunities
}

export type PlanResult = {
  transmissions: PlannedTransmission[];
  /** the station's messages with their 162 symbols; a transmission's messageIndex points here */
  messages: readonly MessageOnAir[];
  skippedSteps: SkippedStep[];
  warnings: string[];
  /** why some or all of the range has no transmissions */
  quiet: QuietReason[];
  /** slots in the range on days the schedule runs */
  slotsInSchedule: number;
  /** of those, slots at hours some step may use */
  usableSlots: number;
};

/** Transmissions whose start lies in [fromMs, toMs). */
export function expandCompiled(plan: CompiledPlan, fromMs: number, toMs: number): PlanResult {
  const result: PlanResult = {
    transmissions: [],
    messages: plan.messages,
    skippedSteps: plan.skippedSteps,
    warnings: plan.warnings,
    quiet: [...plan.blocked],
    slotsInSchedule: 0,
    usableSlots: 0,
  };
  if (!(toMs > fromMs)) return result;
  // slot s starts transmitting at s · SLOT_MS + 1 s
  const firstSlot = Math.ceil((fromMs - TX_START_OFFSET_MS) / SLOT_MS);
  const lastSlot = Math.ceil((toMs - TX_START_OFFSET_MS) / SLOT_MS) - 1;
  if (lastSlot < firstSlot) return result;
  const firstDay = Math.floor(firstSlot / SLOTS_PER_DAY);
  const lastDay = Math.floor(lastSlot / SLOTS_PER_DAY);
  const { startDay, endDay } = plan;
  const { schedule } = plan.input;
  if (firstDay < startDay && !plan.blocked.some((b) => b.code === 'bad-dates')) {
    result.quiet.push({ code: 'before-start', message: `The schedule starts on ${schedule.startDate}: nothing is planned before then.` });
  }
  if (lastDay > endDay && !plan.blocked.some((b) => b.code === 'bad-dates')) {
    result.quiet.push({ code: 'after-end', message: `The schedule ended on ${schedule.endDate}: nothing is planned after that day.` });
  }
  const fromDay = Math.max(firstDay, startDay);
  const toDay = Math.min(lastDay, endDay);
  const f = plan.slotsPerOpportunity;
  for (let day = fromDay; day <= toDay; day++) {
    const lo = Math.max(firstSlot, day * SLOTS_PER_DAY);
    const hi = Math.min(lastSlot, day * SLOTS_PER_DAY + SLOTS_PER_DAY - 1);
    result.slotsInSchedule += hi - lo + 1;
    for (let s = lo; s <= hi; s++) if (plan.usableByHour[Math.floor((s - day * SLOTS_PER_DAY) / SLOTS_PER_HOUR)]) result.usableSlots++;
  }
  if (plan.blocked.length || plan.steps.length === 0) return result;

  const station = plan.input.station;
  for (let day = fromDay; day <= toDay; day++) {
    const daySlot = day * SLOTS_PER_DAY;
    for (const { ofDay, ordinal } of pickedOnDay(plan, day)) {
      const slot0 = daySlot + ofDay * f;
      if (slot0 + f - 1 < firstSlot || slot0 > lastSlot) continue;
      const { stepIndex, stepBand } = stepFor(plan, ordinal, Math.floor((ofDay * f) / SLOTS_PER_HOUR));
      const { band } = stepBand;
      for (let j = 0; j < f; j++) {
        const slot = slot0 + j;
        if (slot < firstSlot || slot > lastSlot) continue;
        const startMs = slot * SLOT_MS + TX_START_OFFSET_MS;
        const audioOffsetHz = staggeredOffsetHz(station.audioOffsetHz, schedule.stagger, ordinal * f + j, stepBand.range);
        const carrierHz = band.dialHz + audioOffsetHz;
        const message = plan.messages[j];
        result.transmissions.push({
          startMs,
          startUtc: new Date(startMs).toISOString(),
          bandId: band.id,
          dialHz: band.dialHz,
          audioOffsetHz,
          carrierHz,
          commandHz: commandFrequencyHz(carrierHz, { referenceErrorPpm: 0, bandOffsetHz: stepBand.calibrationOffsetHz }),
          messageIndex: j,
          messageText: message.text,
          messageType: message.type,
          stepIndex,
        });
      }
    }
  }
  return result;
}

/** The transmissions of a schedule whose start lies in [fromMs, toMs), with what was skipped and why. */
export function expandPlan(input: PlanInput & { fromMs: number; toMs: number }): PlanResult {
  return expandCompiled(compilePlan(input), input.fromMs, input.toMs);
}

/** The next `count` transmissions starting at or after `nowMs`, looking ahead at most `horizonDays`. */
export function nextTransmissions(input: PlanInput, nowMs: number, count: number, horizonDays = 31): PlannedTransmission[] {
  const plan = compilePlan(input);
  const out: PlannedTransmission[] = [];
  if (plan.blocked.length || count <= 0) return out;
  const dayMs = SLOTS_PER_DAY * SLOT_MS;
  const startMs = Math.max(nowMs, plan.startDay * dayMs);
  for (let from = startMs, d = 0; d < horizonDays && out.length < count; d++, from += dayMs) {
    if (dayOfMs(from) > plan.endDay) break;
    out.push(...expandCompiled(plan, from, from + dayMs).transmissions);
  }
  return out.slice(0, count);
}
