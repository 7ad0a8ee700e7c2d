import fc from 'fast-check';
import { bandFor } from '../../../shared/domain/bands';
import { commandFrequencyHz, producedFrequencyHz } from '../../../shared/domain/calibration';
import {
  airtimeByDay,
  allowedOffsetRange,
  compilePlan,
  effectiveDuty,
  expandCompiled,
  expandPlan,
  hourIsActive,
  nextTransmissions,
  type PlannedTransmission,
  type ScheduleRules,
} from '../../../shared/domain/schedule';
import { TONE_SPACING_HZ } from '../../../shared/domain/tones';
import { TX_DURATION_MS } from '../../../shared/domain/timing';
import { filterCoverage, type StationSettings, type UnitHardware } from '../../../shared/domain/workshop';
import { cadenceArb, dutyCadenceArb, scheduleArb, stationUnitArb } from './arbitraries';
import { DAY_MS, DEC_2_2026, HOUR_MS, rules, stationOn, unitWithFilters } from './fixtures';

// WSPR protocol description (K1JT): a slot is two minutes from an even UTC minute, the
// transmission starts one second in, and receivers decode dial + 1400 … 1600 Hz.
const SLOT_MS = 120_000;
const START_IN_SLOT_MS = 1_000;
const WINDOW_LOW_HZ = 1400;
const WINDOW_HIGH_HZ = 1600;

const bands = (txs: readonly PlannedTransmission[]) => txs.map((t) => t.bandId);
const week = { fromMs: DEC_2_2026, toMs: DEC_2_2026 + 7 * DAY_MS };
const day = { fromMs: DEC_2_2026, toMs: DEC_2_2026 + DAY_MS };

/** Straightforward definition: a step may run when its band is enabled and a fitted filter covers it. */
function stepRunnable(station: StationSettings, unit: UnitHardware, bandId: PlannedTransmission['bandId']) {
  const found = bandFor(bandId, station.region);
  if (!found.ok) return false;
  const setting = station.bands.find((b) => b.bandId === bandId);
  return Boolean(setting?.enabled) && filterCoverage(unit.filters, found.band).covered;
}

describe('expandPlan, worked cases', () => {
  const station = stationOn(['20m', '40m', '30m']);
  const unit = unitWithFilters(['20m', '40m', '30m']);

  it.each([
    ['every slot', { kind: 'every-slot' as const }, 720],
    ['every 5th slot', { kind: 'every-nth' as const, nth: 5 }, 144],
    ['every 7th slot', { kind: 'every-nth' as const, nth: 7 }, 103],
    ['a 20 % share', { kind: 'duty' as const, dutyPercent: 20 }, 144],
    ['a 3 % share', { kind: 'duty' as const, dutyPercent: 3 }, 21],
  ])('when the cadence is %s over one UTC day, plans %i transmissions', (_label, cadence, expected) => {
    // the count for 3 % carries fractions over days: 21 or 22 in a day, 151.2 a week
    const r = expandPlan({ schedule: rules({ cadence }), station, unit, ...day });
    expect(Math.abs(r.transmissions.length - expected)).toBeLessThanOrEqual(cadence.kind === 'duty' ? 1 : 0);
    expect(r.quiet).toEqual([]);
  });

  it('when the rotation is 20 m for two slots then 40 m for one, sends them in that order', () => {
    const schedule = rules({
      cadence: { kind: 'every-slot' },
      steps: [
        { bandId: '20m', slots: 2, activeHoursUtc: null },
        { bandId: '40m', slots: 1, activeHoursUtc: null },
      ],
    });
    const r = expandPlan({ schedule, station, unit, fromMs: DEC_2_2026, toMs: DEC_2_2026 + 6 * SLOT_MS });
    expect(bands(r.transmissions)).toEqual(['20m', '20m', '40m', '20m', '20m', '40m']);
    expect(r.transmissions[0].startUtc).toBe('2026-12-02T00:00:01.000Z');
  });

  it('when a 6-character locator is planned with one-slot steps, sends each Type 1/Type 3 pair in consecutive slots on one band', () => {
    const schedule = rules({
      cadence: { kind: 'every-slot' },
      steps: [
        { bandId: '20m', slots: 1, activeHoursUtc: null },
        { bandId: '40m', slots: 1, activeHoursUtc: null },
      ],
    });
    const r = expandPlan({
      schedule,
      station: { ...station, locator: 'IO91wm' },
      unit,
      fromMs: DEC_2_2026,
      toMs: DEC_2_2026 + 4 * SLOT_MS,
    });
    expect(r.transmissions.map((t) => `${t.bandId} ${t.messageType} ${t.messageText}`)).toEqual([
      '20m 1 Q1IMW IO91 23',
      '20m 3 <Q1IMW> IO91WM 23',
      '40m 1 Q1IMW IO91 23',
      '40m 3 <Q1IMW> IO91WM 23',
    ]);
  });

  it('when a pair is planned every 5th opportunity, a pair goes out every 10 slots (one in five of the slots)', () => {
    const schedule = rules({ cadence: { kind: 'every-nth', nth: 5 } });
    const r = expandPlan({ schedule, station: { ...station, locator: 'IO91wm' }, unit, ...day });
    expect(r.transmissions).toHaveLength(144);
    expect((r.transmissions[2].startMs - r.transmissions[0].startMs) / SLOT_MS).toBe(10);
  });

  it('when a step is on a disabled band and another on an unfiltered band, skips both and says why', () => {
    const schedule = rules({
      steps: [
        { bandId: '20m', slots: 1, activeHoursUtc: null },
        { bandId: '17m', slots: 1, activeHoursUtc: null },
        { bandId: '30m', slots: 1, activeHoursUtc: null },
      ],
    });
    const r = expandPlan({ schedule, station, unit: unitWithFilters(['20m', '40m']), ...day });
    expect(new Set(bands(r.transmissions))).toEqual(new Set(['20m']));
    expect(r.skippedSteps).toEqual([
      { stepIndex: 1, bandId: '17m', reason: expect.stringContaining('17 m is not enabled on this station') },
      { stepIndex: 2, bandId: '30m', reason: expect.stringContaining('No low-pass filter for 30 m') },
    ]);
  });

  it.each([
    ['paused', { schedule: rules({ paused: true }) }, 'paused'],
    ['suspended', { schedule: rules(), suspended: true }, 'suspended'],
    ['asked before the start date', { schedule: rules({ startDate: '2026-12-10' }) }, 'before-start'],
    ['asked after the end date', { schedule: rules({ startDate: '2026-11-01', endDate: '2026-11-30' }) }, 'after-end'],
    ['left with no usable step', { schedule: rules({ steps: [{ bandId: '6m', slots: 1, activeHoursUtc: null }] }) }, 'no-usable-step'],
  ])('when %s, plans nothing and gives the reason', (_label, extra, code) => {
    const r = expandPlan({ station, unit, ...day, ...extra });
    expect(r.transmissions).toEqual([]);
    expect(r.quiet.map((q) => q.code)).toContain(code);
    expect(r.quiet.every((q) => q.message.length > 10)).toBe(true);
  });

  it('when the callsign cannot be sent, plans nothing and gives the encoder’s reason', () => {
    const r = expandPlan({ schedule: rules(), station: { ...station, callsign: 'Q2TRY/P', locator: 'FN42' }, unit, ...day });
    expect(r.transmissions).toEqual([]);
    expect(r.quiet[0]).toMatchObject({ code: 'messages', message: expect.stringContaining('6 characters') });
  });

  it('when a share is drawn for two stations on the same day, the stations get different slots but each the same slots every time', () => {
    const a = expandPlan({ schedule: rules({ stationId: 11 }), station, unit, ...day }).transmissions.map((t) => t.startMs);
    const again = expandPlan({ schedule: rules({ stationId: 11 }), station, unit, ...day }).transmissions.map((t) => t.startMs);
    const b = expandPlan({ schedule: rules({ stationId: 12 }), station, unit, ...day }).transmissions.map((t) => t.startMs);
    expect(again).toEqual(a);
    expect(b).not.toEqual(a);
  });

  it('when staggered by 3 Hz over 30 Hz, moves the offset 3 Hz per transmission within 1485–1515 Hz', () => {
    const schedule = rules({ cadence: { kind: 'every-slot' }, stagger: { stepHz: 3, spanHz: 30 } });
    const offsets = expandPlan({ schedule, station, unit, fromMs: DEC_2_2026, toMs: DEC_2_2026 + 40 * SLOT_MS }).transmissions.map(
      (t) => t.audioOffsetHz,
    );
    expect(Math.min(...offsets)).toBeGreaterThanOrEqual(1485);
    expect(Math.max(...offsets)).toBeLessThanOrEqual(1515);
    for (let i = 1; i < offsets.length; i++) expect(Math.abs(offsets[i] - offsets[i - 1])).toBeCloseTo(3, 9);
  });

  it('when the offset sits at the top of the window, folds the stagger back inside and warns', () => {
    const schedule = rules({ cadence: { kind: 'every-slot' }, stagger: { stepHz: 5, spanHz: 60 } });
    const r = expandPlan({ schedule, station: { ...station, audioOffsetHz: 1600 }, unit, ...day });
    const { highHz } = allowedOffsetRange();
    expect(Math.max(...r.transmissions.map((t) => t.audioOffsetHz))).toBeLessThanOrEqual(highHz);
    expect(r.warnings.join()).toContain('folds it back');
  });

  it('when a band is calibrated +40 Hz, commands 40 Hz lower so the carrier lands where planned', () => {
    const calibrated = stationOn(['20m'], {}, () => 40);
    const [t] = expandPlan({ schedule: rules({ cadence: { kind: 'every-slot' } }), station: calibrated, unit, ...day }).transmissions;
    expect(t.carrierHz).toBe(14_095_600 + 1500);
    expect(t.commandHz).toBeCloseTo(t.carrierHz - 40, 6);
  });
});

describe('expandPlan, properties', () => {
  it('when any schedule is expanded, every transmission starts 1 s after an even UTC minute', () => {
    fc.assert(
      fc.property(scheduleArb(), stationUnitArb, ({ ...schedule }, { station, unit }) => {
        for (const t of expandPlan({ schedule, station, unit, ...day }).transmissions) {
          const at = new Date(t.startMs);
          if (at.getUTCMinutes() % 2 !== 0 || at.getUTCSeconds() !== 1 || at.getUTCMilliseconds() !== 0) return false;
          if (t.startMs % SLOT_MS !== START_IN_SLOT_MS || t.startUtc !== at.toISOString()) return false;
        }
        return true;
      }),
      { numRuns: 1000 },
    );
  });

  it('when any schedule is expanded, never transmits on a disabled band or one no filter covers', () => {
    fc.assert(
      fc.property(scheduleArb(), stationUnitArb, (schedule, { station, unit }) =>
        expandPlan({ schedule, station, unit, ...day }).transmissions.every((t) => stepRunnable(station, unit, t.bandId)),
      ),
      { numRuns: 1000 },
    );
  });

  // A band's calibration is the generator's measured error in Hz, positive = it radiates high (the
  // station's definition); a generator told f then radiates f + error, so the command must be carrier − error.
  // Written out here rather than through the code's own correction, so a sign error there is caught.
  it('when any schedule is expanded, all four tones as radiated after calibration sit inside the window', () => {
    fc.assert(
      fc.property(scheduleArb(), stationUnitArb, (schedule, { station, unit }) =>
        expandPlan({ schedule, station, unit, ...day }).transmissions.every((t) => {
          const errorHz = station.bands.find((b) => b.bandId === t.bandId)?.calibrationOffsetHz ?? 0;
          if (Math.abs(t.commandHz - (t.carrierHz - errorHz)) > 1e-6) return false;
          const radiatedCarrier = t.commandHz + errorHz;
          return [0, 1, 2, 3].every((k) => {
            const radiated = radiatedCarrier + k * TONE_SPACING_HZ;
            return radiated >= t.dialHz + WINDOW_LOW_HZ && radiated <= t.dialHz + WINDOW_HIGH_HZ;
          });
        }),
      ),
      { numRuns: 1000 },
    );
  });

  it('when the generator runs 10 ppm fast, the command is the carrier divided by 1.00001 (definition of ppm)', () => {
    // 14 097 100 Hz / (1 + 10e-6) = 14 096 959.03… Hz; a reversed sign would give 14 097 240.97 Hz
    expect(commandFrequencyHz(14_097_100, { referenceErrorPpm: 10 })).toBeCloseTo(14_096_959.0304, 3);
    expect(producedFrequencyHz(14_096_959.0304, { referenceErrorPpm: 10 })).toBeCloseTo(14_097_100, 3);
  });

  it('when a range [a, c) is split at b, expanding [a, b) then [b, c) gives the same plan', () => {
    fc.assert(
      fc.property(
        scheduleArb(),
        stationUnitArb,
        fc.integer({ min: 0, max: 2 * DAY_MS }),
        fc.integer({ min: 0, max: 2 * DAY_MS }),
        fc.integer({ min: 0, max: 2 * DAY_MS }),
        (schedule, { station, unit }, x, y, z) => {
          const [a, b, c] = [x, y, z].sort((p, q) => p - q).map((v) => DEC_2_2026 + v);
          const plan = compilePlan({ schedule, station, unit });
          const whole = expandCompiled(plan, a, c).transmissions;
          const parts = [...expandCompiled(plan, a, b).transmissions, ...expandCompiled(plan, b, c).transmissions];
          // compared as JSON: deep equality of thousands of objects is slow in the matcher
          const wholeJson = JSON.stringify(whole);
          // a fresh expansion of the same schedule and dates gives the same plan too
          const fresh = expandPlan({ schedule, station, unit, fromMs: a, toMs: c }).transmissions;
          return JSON.stringify(parts) === wholeJson && JSON.stringify(fresh) === wholeJson;
        },
      ),
      { numRuns: 1000 },
    );
  });

  it('when steps have active hours, no transmission falls outside its step’s hours', () => {
    fc.assert(
      fc.property(scheduleArb(cadenceArb), stationUnitArb, (schedule, { station, unit }) =>
        expandPlan({ schedule, station, unit, ...day }).transmissions.every((t) =>
          hourIsActive(schedule.steps[t.stepIndex].activeHoursUtc, new Date(t.startMs).getUTCHours()),
        ),
      ),
      { numRuns: 1000 },
    );
  });

  it('when the station alternates two message types, each first message is followed in the next slot by the second on the same band', () => {
    fc.assert(
      fc.property(scheduleArb(), stationUnitArb, (schedule, { station, unit }) => {
        const txs = expandPlan({ schedule, station, unit, ...day }).transmissions;
        const types = new Set(txs.map((t) => t.messageType));
        if (station.locator.length === 4) return txs.every((t) => t.messageType === 1 && t.messageIndex === 0);
        if (txs.length % 2 !== 0) return false;
        for (let i = 0; i < txs.length; i += 2) {
          const [first, second] = [txs[i], txs[i + 1]];
          if (second.startMs - first.startMs !== SLOT_MS || first.bandId !== second.bandId) return false;
          if (first.messageType !== (station.callsign.includes('/') ? 2 : 1) || second.messageType !== 3) return false;
        }
        return txs.length === 0 || types.has(3);
      }),
      { numRuns: 1000 },
    );
  });

  it('when the cadence is a share, the week’s transmissions are within 1 % of it, counted over the slots the schedule can use', () => {
    // a week is 5040 slots per run, so fewer runs than the day-long properties
    fc.assert(
      fc.property(scheduleArb(dutyCadenceArb), stationUnitArb, (schedule, { station, unit }) => {
        const s = { ...schedule, startDate: '2026-12-02' } as ScheduleRules;
        const r = expandPlan({ schedule: s, station, unit, ...week });
        // straightforward count of usable slots: hours where some runnable step is active
        const runnable = s.steps.filter((step) => stepRunnable(station, unit, step.bandId));
        let usable = 0;
        for (let t = week.fromMs; t < week.toMs; t += SLOT_MS) {
          if (runnable.some((step) => hourIsActive(step.activeHoursUtc, new Date(t).getUTCHours()))) usable++;
        }
        if (r.quiet.length || usable === 0) return r.transmissions.length === 0;
        expect(r.usableSlots).toBe(usable);
        const target = (s.cadence as { dutyPercent: number }).dutyPercent / 100;
        expect(Math.abs(r.transmissions.length / usable - target)).toBeLessThanOrEqual(0.01);
        return true;
      }),
      { numRuns: 200 },
    );
  });
});

describe('preview helpers', () => {
  const station = stationOn(['20m', '40m']);
  const unit = unitWithFilters(['20m', '40m']);
  const schedule = rules({
    cadence: { kind: 'every-nth', nth: 5 },
    steps: [
      { bandId: '20m', slots: 1, activeHoursUtc: { fromHour: 6, toHour: 18 } },
      { bandId: '40m', slots: 1, activeHoursUtc: { fromHour: 18, toHour: 6 } },
    ],
  });

  it('when a day and night pair runs a day, gives each band its minutes on the air', () => {
    const r = expandPlan({ schedule, station, unit, ...day });
    const rows = airtimeByDay(r.transmissions);
    expect(rows).toEqual([
      { dateUtc: '2026-12-02', bandId: '20m', transmissions: 72, minutesOnAir: (72 * TX_DURATION_MS) / 60_000 },
      { dateUtc: '2026-12-02', bandId: '40m', transmissions: 72, minutesOnAir: (72 * TX_DURATION_MS) / 60_000 },
    ]);
    expect(effectiveDuty(r)).toEqual({ ofAllSlots: 0.2, ofUsableSlots: 0.2 });
  });

  it('when asked for the next transmissions, returns them from now on, as the expansion has them', () => {
    const now = DEC_2_2026 + 5 * HOUR_MS + 17_000;
    const next = nextTransmissions({ schedule, station, unit }, now, 5);
    const expanded = expandPlan({ schedule, station, unit, fromMs: now, toMs: now + DAY_MS }).transmissions.slice(0, 5);
    expect(next).toEqual(expanded);
    expect(next[0].startMs).toBeGreaterThanOrEqual(now);
  });

  it('when the schedule starts next week, the next transmissions start on its first day', () => {
    const next = nextTransmissions({ schedule: { ...schedule, startDate: '2026-12-09' }, station, unit }, DEC_2_2026, 1);
    expect(next[0].startUtc.slice(0, 10)).toBe('2026-12-09');
  });
});

describe('symbols reference', () => {
  it('when a plan is expanded, each messageIndex points at that message’s 162 symbols', () => {
    const station = stationOn(['20m'], { locator: 'IO91wm' });
    const r = expandPlan({ schedule: rules({ cadence: { kind: 'every-nth', nth: 5 } }), station, unit: unitWithFilters(['20m']), ...day });
    expect(r.messages.map((m) => m.text)).toEqual(['Q1IMW IO91 23', '<Q1IMW> IO91WM 23']);
    for (const t of r.transmissions) {
      expect(r.messages[t.messageIndex]).toMatchObject({ text: t.messageText, type: t.messageType });
      expect(r.messages[t.messageIndex].symbols).toHaveLength(162);
    }
  });
});
