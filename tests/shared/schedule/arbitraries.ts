/** fast-check generators for schedules, stations and units. */
import fc from 'fast-check';
import type { BandId } from '../../../shared/domain/bands';
import type { ActiveHoursUtc, Cadence, RotationStep, ScheduleRules } from '../../../shared/domain/schedule';
import type { StationSettings, UnitHardware } from '../../../shared/domain/workshop';
import { coveringFilter, unitWithFilters } from './fixtures';

export const POOL: readonly BandId[] = ['160m', '80m', '40m', '30m', '20m', '17m', '15m', '10m'];

export const hoursArb: fc.Arbitrary<ActiveHoursUtc | null> = fc.option(
  fc.record({ fromHour: fc.integer({ min: 0, max: 23 }), toHour: fc.integer({ min: 0, max: 24 }) }).filter((h) => h.fromHour !== h.toHour),
  { nil: null },
);

export const stepArb: fc.Arbitrary<RotationStep> = fc.record({
  bandId: fc.constantFrom(...POOL),
  slots: fc.integer({ min: 1, max: 30 }),
  activeHoursUtc: hoursArb,
});

export const cadenceArb: fc.Arbitrary<Cadence> = fc.oneof(
  fc.constant({ kind: 'every-slot' as const }),
  fc.record({ kind: fc.constant('every-nth' as const), nth: fc.integer({ min: 2, max: 30 }) }),
  fc.record({ kind: fc.constant('duty' as const), dutyPercent: fc.integer({ min: 1, max: 100 }) }),
);

export const dutyCadenceArb = fc.record({ kind: fc.constant('duty' as const), dutyPercent: fc.integer({ min: 1, max: 100 }) });

export const scheduleArb = (cadence: fc.Arbitrary<Cadence> = cadenceArb): fc.Arbitrary<ScheduleRules> =>
  fc.record({
    stationId: fc.integer({ min: 1, max: 100_000 }),
    steps: fc.array(stepArb, { minLength: 1, maxLength: 5 }),
    cadence,
    stagger: fc.record({ stepHz: fc.integer({ min: 0, max: 20 }), spanHz: fc.integer({ min: 0, max: 100 }) }),
    // start between 2026-11-25 and 2026-12-04; the tests look at December 2026
    startDate: fc.integer({ min: 24, max: 33 }).map((d) => new Date(Date.UTC(2026, 10, 1 + d)).toISOString().slice(0, 10)),
    endDate: fc.constant(null),
    paused: fc.constant(false),
  });

/** Who transmits: plain with a 4- or 6-character locator (Type 1, or Type 1/3), or compound (Type 2/3). */
export const identityArb = fc.constantFrom(
  { callsign: 'Q1IMW', locator: 'IO91' },
  { callsign: 'Q1IMW', locator: 'IO91wm' },
  { callsign: 'QA9ZZT', locator: 'JO22' },
  { callsign: 'Q2TRY/P', locator: 'FN42ab' },
);

type BandState = 'runs' | 'disabled' | 'no-filter' | 'filter-too-low';

/**
 * A station and unit where each pool band either runs, or is disabled, or has no filter,
 * or has a filter cutting off below the window; most bands run, so most plans are not empty.
 */
export const stationUnitArb: fc.Arbitrary<{ station: StationSettings; unit: UnitHardware }> = fc
  .record({
    identity: identityArb,
    audioOffsetHz: fc.double({ min: 1400, max: 1600, noNaN: true }),
    states: fc.array(fc.constantFrom<BandState>('runs', 'runs', 'runs', 'disabled', 'no-filter', 'filter-too-low'), {
      minLength: POOL.length,
      maxLength: POOL.length,
    }),
    calibration: fc.array(fc.option(fc.double({ min: -300, max: 300, noNaN: true }), { nil: null }), {
      minLength: POOL.length,
      maxLength: POOL.length,
    }),
  })
  .map(({ identity, audioOffsetHz, states, calibration }) => ({
    station: {
      ...identity,
      region: 'itu1' as const,
      audioOffsetHz,
      bands: POOL.map((bandId, i) => ({ bandId, enabled: states[i] !== 'disabled', calibrationOffsetHz: calibration[i] })),
    },
    unit: {
      ...unitWithFilters([]),
      filters: POOL.flatMap((bandId, i) => {
        if (states[i] === 'no-filter') return [];
        const filter = coveringFilter(bandId);
        return [states[i] === 'filter-too-low' ? { ...filter, cutoffHz: filter.cutoffHz * 0.8 } : filter];
      }),
    },
  }));
