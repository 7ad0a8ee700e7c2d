import { validateSchedule, type ScheduleIssue } from '../../../shared/domain/schedule';
import { rules, stationOn, unitWithFilters } from './fixtures';

const station = stationOn(['20m', '40m', '30m']);
const unit = unitWithFilters(['20m', '40m', '30m']);
const step = (bandId: '20m' | '40m' | '30m' | '17m' | '10m', extra = {}) => ({ bandId, slots: 1, activeHoursUtc: null, ...extra });
const issues = (list: ScheduleIssue[]) => list.map((i) => `${i.level}${i.stepIndex === undefined ? '' : ` #${i.stepIndex}`}: ${i.message}`);

describe('validateSchedule', () => {
  it('when the schedule is sound (calibrated bands, one slot in five), reports nothing', () => {
    expect(validateSchedule({ schedule: rules(), station, unit })).toEqual([]);
  });

  it.each([
    [
      'a band no filter covers',
      { steps: [step('20m'), step('30m')] },
      unitWithFilters(['20m', '40m']),
      station,
      'block #1: No low-pass filter for 30 m',
    ],
    [
      'a band not enabled on the station',
      { steps: [step('17m')] },
      unitWithFilters(['17m']),
      station,
      'block #0: 17 m is not enabled on this station',
    ],
    ['a station without a unit', {}, null, station, 'block #0: The station has no unit'],
    [
      'active hours that never occur',
      { steps: [step('40m', { activeHoursUtc: { fromHour: 4, toHour: 4 } })] },
      unit,
      station,
      'block #0: The active hours 4:00 to 4:00 UTC never occur',
    ],
    [
      'an offset whose top tone is past 1600 Hz',
      {},
      unit,
      { ...station, audioOffsetHz: 1598 },
      "block #0: On 20 m the audio offset 1598 Hz with this band's calibration puts a tone 2.4 Hz outside the window",
    ],
    ['every slot', { cadence: { kind: 'every-slot' as const } }, unit, station, 'block: Transmitting in 100 % of the slots hogs the band'],
    [
      'a 60 % share',
      { cadence: { kind: 'duty' as const, dutyPercent: 60 } },
      unit,
      station,
      'block: Transmitting in 60 % of the slots hogs the band',
    ],
    [
      'every other slot (50 %)',
      { cadence: { kind: 'every-nth' as const, nth: 2 } },
      unit,
      station,
      'warn: 50 % of the slots is more than the usual one slot in five',
    ],
    [
      'every 4th slot',
      { cadence: { kind: 'every-nth' as const, nth: 4 } },
      unit,
      station,
      'warn: 25 % of the slots is more than the usual one slot in five',
    ],
    [
      'an uncalibrated band',
      {},
      unit,
      stationOn(['20m'], {}, () => null),
      "warn #0: 20 m has no calibration: with the unit's stated ±10 ppm the signal could land up to 141 Hz",
    ],
    [
      'an uncalibrated 10 m band',
      { steps: [step('10m')] },
      unitWithFilters(['10m']),
      stationOn(['10m'], {}, () => null),
      'up to 281.3 Hz from where it is planned, outside the window',
    ],
    [
      'a stagger past the window edge',
      { stagger: { stepHz: 4, spanHz: 80 } },
      unit,
      { ...station, audioOffsetHz: 1570 },
      'warn #0: The stagger reaches past the edge of the 20 m window',
    ],
    [
      'a warm-up drift larger than the room',
      {},
      unitWithFilters(['20m'], { tempCoPpmPerC: 1.2 }),
      station,
      'warn #0: On 20 m a warm-up of 10 °C moves the signal about 169.2 Hz',
    ],
    [
      'three slots for a pair',
      { steps: [step('20m', { slots: 3 })] },
      unit,
      { ...station, locator: 'IO91wm' },
      "warn #0: This station sends its two message types as a pair on the same band, so this step's 3 slots become 4",
    ],
    ['a paused schedule', { paused: true }, unit, station, 'warn: The schedule is paused'],
    [
      'an end before the start',
      { startDate: '2026-12-05', endDate: '2026-12-01' },
      unit,
      station,
      'block: The end date 2026-12-01 is before the start date 2026-12-05',
    ],
    [
      'a compound callsign with a 4-character locator',
      {},
      unit,
      { ...station, callsign: 'Q2TRY/P', locator: 'FN42' },
      "block: The station's messages cannot be built",
    ],
  ])('when the schedule has %s, says so', (_label, extra, u, st, expected) => {
    expect(issues(validateSchedule({ schedule: rules(extra), station: st, unit: u })).join('\n')).toContain(expected);
  });

  it('when every step is blocked, also says that nothing can transmit', () => {
    const list = validateSchedule({ schedule: rules({ steps: [step('17m')] }), station, unit });
    expect(list.at(-1)).toEqual({ level: 'block', message: 'No step of the rotation can transmit: fix the steps marked above.' });
  });

  it('when a 20 % share is chosen, does not warn (one slot in five is common practice, no source)', () => {
    const list = validateSchedule({ schedule: rules({ cadence: { kind: 'every-nth', nth: 5 } }), station, unit });
    expect(list).toEqual([]);
  });
});
