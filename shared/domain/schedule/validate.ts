/**
 * Checks for the schedule editor. `block` stops the schedule from being saved or
 * run; `warn` is shown beside the step. Messages say what to change.
 */
import { commandForBand, producedFrequencyHz, thermalDriftHz } from '../calibration';
import { checkTonesInWindow } from '../tones';
import { rotationFilterProblem } from '../workshop/filter-selection';

import { WARM_UP_DEG_C, stationMessages, type StationSettings, type UnitHardware } from '../workshop/on-air';
import { dayNumber } from './dates';
import { activeHourCount, cadencePercent, DUTY_BLOCK_PERCENT, DUTY_COMMON_PERCENT, type ScheduleRules } from './model';
import { allowedOffsetRange, foldInto } from './offsets';
import { checkStep } from './steps';

export type ScheduleIssue = { level: 'block' | 'warn'; stepIndex?: number; message: string };

const fmt = (hz: number) => (Math.round(hz * 10) / 10).toString();

export function validateSchedule(input: { schedule: ScheduleRules; station: StationSettings; unit: UnitHardware | null }): ScheduleIssue[] {
  const { schedule, station, unit } = input;
  const issues: ScheduleIssue[] = [];
  const block = (message: string, stepIndex?: number) =>
    issues.push({ level: 'block', message, ...(stepIndex === undefined ? {} : { stepIndex }) });
  const warn = (message: string, stepIndex?: number) =>
    issues.push({ level: 'warn', message, ...(stepIndex === undefined ? {} : { stepIndex }) });

  if (schedule.steps.length === 0) block('Add at least one band to the rotation.');
  const rotation = rotationFilterProblem(
    unit,
    schedule.steps.map((s) => s.bandId),
    station.region,
  );
  if (rotation) block(rotation);
  const messages = stationMessages(station, unit);
  if (!messages.ok) block(`The station's messages cannot be built: ${messages.reason}`);
  const pair = messages.ok && messages.messages.length === 2;

  const range = allowedOffsetRange();
  const base = station.audioOffsetHz;
  const spread = schedule.stagger.stepHz > 0 ? schedule.stagger.spanHz / 2 : 0;
  let usableSteps = 0;

  schedule.steps.forEach((step, i) => {
    const check = checkStep(step, station, unit);
    if (!check.ok) return block(check.reason, i);
    const { band, calibrated, calibrationOffsetHz } = check.stepBand;
    const hours = step.activeHoursUtc;
    if (hours && activeHourCount(hours) === 0) {
      return block(
        `The active hours ${hours.fromHour}:00 to ${hours.toHour}:00 UTC never occur: set different hours, or clear them to run all day.`,
        i,
      );
    }
    usableSteps++;
    // the station's own offset, with the tones as radiated after calibration (correction applied, so they land as planned)
    const calibration = { referenceErrorPpm: 0, bandOffsetHz: calibrationOffsetHz };
    const radiated = commandForBand(band.dialHz, base, calibration).commandTonesHz.map((f) => producedFrequencyHz(f, calibration));
    const window = checkTonesInWindow(band.dialHz, radiated);
    if (!window.inside) {
      block(
        `On ${band.name} the audio offset ${fmt(base)} Hz with this band's calibration puts a tone ${fmt(-window.marginHz)} Hz outside the window (dial + 1400 … 1600 Hz): set the station's offset between ${fmt(range.lowHz)} and ${fmt(range.highHz)} Hz.`,
        i,
      );
    } else if (base - spread < range.lowHz || base + spread > range.highHz) {
      warn(
        `The stagger reaches past the edge of the ${band.name} window; those offsets fold back inside (between ${fmt(range.lowHz)} and ${fmt(range.highHz)} Hz). Narrow the span or move the offset towards 1500 Hz to keep the pattern even.`,
        i,
      );
    }
    const carrierHz = band.dialHz + base;
    if (!calibrated) {
      const possibleHz = unit && !unit.disciplined ? (carrierHz * unit.tolerancePpm) / 1e6 : 0;
      const worst = Math.max(foldInto(base + spread, range) - range.lowHz, range.highHz - foldInto(base - spread, range));
      warn(
        possibleHz > 0
          ? `${band.name} has no calibration: with the unit's stated ±${unit!.tolerancePpm} ppm the signal could land up to ${fmt(possibleHz)} Hz from where it is planned${possibleHz > worst ? ', outside the window' : ''}. Calibrate ${band.name} before relying on this step.`
          : `${band.name} has no calibration: measure it once to confirm the tones land inside the window.`,
        i,
      );
    }
    if (unit && !unit.disciplined && unit.tempCoPpmPerC !== null) {
      const driftHz = thermalDriftHz(carrierHz, unit.tempCoPpmPerC, WARM_UP_DEG_C);
      const room = Math.min(foldInto(base - spread, range) - range.lowHz, range.highHz - foldInto(base + spread, range)) + 2;
      if (driftHz > room) {
        warn(
          `On ${band.name} a warm-up of ${WARM_UP_DEG_C} °C moves the signal about ${fmt(driftHz)} Hz, more than the ${fmt(Math.max(0, room))} Hz of room to the window edge: let the unit warm up before its first slot, or use a steadier reference.`,
          i,
        );
      }
    }
    if (pair && step.slots > 1 && step.slots % 2 === 1) {
      warn(
        `This station sends its two message types as a pair on the same band, so this step's ${step.slots} slots become ${step.slots + 1} (whole pairs).`,
        i,
      );
    }
  });
  if (schedule.steps.length > 0 && usableSteps === 0) block('No step of the rotation can transmit: fix the steps marked above.');

  const sharePercent = cadencePercent(schedule.cadence);
  if (sharePercent > DUTY_BLOCK_PERCENT) {
    block(
      `Transmitting in ${fmt(sharePercent)} % of the slots hogs the band: other stations near your frequency get few clear slots. Use at most ${DUTY_BLOCK_PERCENT} %; about one slot in five (${DUTY_COMMON_PERCENT} %) is common practice.`,
    );
  } else if (sharePercent > DUTY_COMMON_PERCENT + 1e-9) {
    warn(
      `${fmt(sharePercent)} % of the slots is more than the usual one slot in five (${DUTY_COMMON_PERCENT} %): fine for a short test, heavy for a permanent beacon.`,
    );
  }

  const start = dayNumber(schedule.startDate);
  const end = schedule.endDate === null ? null : dayNumber(schedule.endDate);
  if (start === null) block('Give the start date as YYYY-MM-DD.');
  if (schedule.endDate !== null && end === null) block('Give the end date as YYYY-MM-DD, or clear it.');
  if (start !== null && end !== null && end < start)
    block(`The end date ${schedule.endDate} is before the start date ${schedule.startDate}: move it later, or clear it.`);
  if (schedule.paused) warn('The schedule is paused: nothing goes on the air until you resume it.');
  return issues;
}
