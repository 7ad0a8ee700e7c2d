/**
 * Ready-made schedules the editor offers, built from the bands the station has
 * enabled. Each preset is data plus a builder; the operator edits the result.
 */
import { BAND_IDS, type BandId } from '../bands';
import { locatorToLatLon } from '../locator';
import type { Cadence, RotationStep, Stagger } from './model';

export type PresetContext = {
  /** bands enabled on the station (any order) */
  enabledBands: readonly BandId[];
  /** the station's locator, to place "day" and "night" in UTC */
  locator?: string;
  /** first day, YYYY-MM-DD (the caller passes today) */
  startDate: string;
};

export type PresetSchedule = {
  name: string;
  steps: RotationStep[];
  cadence: Cadence;
  stagger: Stagger;
  startDate: string;
  endDate: null;
  paused: false;
};

export type SchedulePreset = {
  id: string;
  title: string;
  summary: string;
  /** how many enabled bands it needs */
  bandsNeeded: number;
  build: (context: PresetContext) => PresetSchedule;
};

const GENTLE: Cadence = { kind: 'duty', dutyPercent: 20 };
const DRIFTING: Stagger = { stepHz: 3, spanHz: 30 };

/** Lowest frequency first. */
const byFrequency = (bands: readonly BandId[]) => BAND_IDS.filter((id) => bands.includes(id));

/** Whole hours to add to local solar time to get UTC, from the locator's longitude (0 without one). */
export function utcShiftHours(locator: string | undefined): number {
  if (!locator) return 0;
  const found = locatorToLatLon(locator);
  return found.ok ? -Math.round(found.lon / 15) || 0 : 0; // || 0 turns −0 into 0
}
const utcHour = (localHour: number, shift: number) => (((localHour + shift) % 24) + 24) % 24;

/** Bands a single-band beacon is most often left on, most wanted first (common practice, no source). */
const SINGLE_BAND_LIKING: readonly BandId[] = ['20m', '30m', '40m', '17m', '80m', '15m', '10m'];

const schedule = (context: PresetContext, name: string, steps: RotationStep[]): PresetSchedule => ({
  name,
  steps,
  cadence: GENTLE,
  stagger: DRIFTING,
  startDate: context.startDate,
  endDate: null,
  paused: false,
});

export const SCHEDULE_PRESETS: readonly SchedulePreset[] = [
  {
    id: 'single-band',
    title: 'Single band, one slot in five',
    summary:
      'Stays on one band and uses about a fifth of the slots, chosen afresh each day; the audio offset drifts a few hertz between transmissions.',
    bandsNeeded: 1,
    build: (c) => {
      const bandId = SINGLE_BAND_LIKING.find((b) => c.enabledBands.includes(b)) ?? byFrequency(c.enabledBands)[0];
      return schedule(c, 'Single band', [{ bandId, slots: 1, activeHoursUtc: null }]);
    },
  },
  {
    id: 'day-and-night',
    title: 'Day and night pair',
    summary:
      'The highest enabled band from 07:00 to 19:00 local solar time, the lowest through the night; the hours are set in UTC from your locator.',
    bandsNeeded: 2,
    build: (c) => {
      const bands = byFrequency(c.enabledBands);
      const shift = utcShiftHours(c.locator);
      const dayFrom = utcHour(7, shift);
      const dayTo = utcHour(19, shift);
      return schedule(c, 'Day and night', [
        { bandId: bands[bands.length - 1], slots: 1, activeHoursUtc: { fromHour: dayFrom, toHour: dayTo } },
        { bandId: bands[0], slots: 1, activeHoursUtc: { fromHour: dayTo, toHour: dayFrom } },
      ]);
    },
  },
  {
    id: 'three-band-tour',
    title: 'Three-band tour',
    summary: 'Three enabled bands in turn, two transmissions each, about a fifth of the slots.',
    bandsNeeded: 3,
    build: (c) => {
      const bands = byFrequency(c.enabledBands);
      // spread the choice: lowest, middle and highest enabled band
      const picks = [bands[0], bands[Math.floor((bands.length - 1) / 2)], bands[bands.length - 1]];
      return schedule(
        c,
        'Three-band tour',
        picks.map((bandId) => ({ bandId, slots: 2, activeHoursUtc: null })),
      );
    },
  },
  {
    id: 'every-band',
    title: 'Every enabled band in turn',
    summary: 'One transmission on each enabled band, lowest to highest, then round again.',
    bandsNeeded: 2,
    build: (c) =>
      schedule(
        c,
        'Every band',
        byFrequency(c.enabledBands).map((bandId) => ({ bandId, slots: 1, activeHoursUtc: null })),
      ),
  },
];

/** The presets a station can use, each already built; presets needing more bands than enabled are left out. */
export function presetsFor(context: PresetContext): { preset: SchedulePreset; schedule: PresetSchedule }[] {
  const distinct = new Set(context.enabledBands).size;
  return SCHEDULE_PRESETS.filter((p) => distinct >= p.bandsNeeded).map((preset) => ({ preset, schedule: preset.build(context) }));
}
