import { presetsFor, SCHEDULE_PRESETS, utcShiftHours, validateSchedule } from '../../../shared/domain/schedule';
import { scheduleInput } from '../../../shared/schemas/schedule';
import { rules, stationOn, unitWithFilters } from './fixtures';

describe('schedule presets', () => {
  const enabledBands = ['40m', '20m', '30m', '80m'] as const;
  const context = { enabledBands: [...enabledBands], locator: 'JO22', startDate: '2026-12-02' };

  it.each(SCHEDULE_PRESETS.map((p) => [p.id]))(
    'when the %s preset is built, passes the schedule schema and the editor checks without a block',
    (id) => {
      const built = presetsFor(context).find((p) => p.preset.id === id)!.schedule;
      expect(scheduleInput.safeParse(built).success).toBe(true);
      const station = stationOn([...enabledBands], { locator: 'JO22' });
      const issues = validateSchedule({ schedule: rules({ ...built }), station, unit: unitWithFilters([...enabledBands]) });
      expect(issues.filter((i) => i.level === 'block')).toEqual([]);
    },
  );

  it('when the station has one band, offers only the presets that need one band', () => {
    expect(presetsFor({ ...context, enabledBands: ['30m'] }).map((p) => p.preset.id)).toEqual(['single-band']);
  });

  it('when building the day and night pair, puts the highest band in the day and the lowest at night', () => {
    const built = presetsFor(context).find((p) => p.preset.id === 'day-and-night')!.schedule;
    // JO22 is centred at 5° E: local solar time is UTC, so 07–19 stays 07–19 UTC
    expect(built.steps).toEqual([
      { bandId: '20m', slots: 1, activeHoursUtc: { fromHour: 7, toHour: 19 } },
      { bandId: '80m', slots: 1, activeHoursUtc: { fromHour: 19, toHour: 7 } },
    ]);
  });

  it.each([
    ['JO22', 0],
    ['FN42', 5],
    ['PM95', -9],
    [undefined, 0],
  ])('when the locator is %s, day hours shift by %i h to reach UTC', (locator, shift) => {
    expect(utcShiftHours(locator)).toBe(shift);
  });

  it('when building the three-band tour, takes the lowest, a middle and the highest enabled band', () => {
    const built = presetsFor(context).find((p) => p.preset.id === 'three-band-tour')!.schedule;
    expect(built.steps.map((s) => s.bandId)).toEqual(['80m', '40m', '20m']);
  });
});
