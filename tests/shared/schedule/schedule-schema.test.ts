import { applySchedulePatch, scheduleInput, schedulePatch, type Schedule } from '../../../shared/schemas/schedule';

const valid = {
  steps: [{ bandId: '20m', slots: 2 }],
  cadence: { kind: 'duty', dutyPercent: 20 },
  startDate: '2026-12-02',
};

const messagesOf = (value: unknown, schema = scheduleInput) => {
  const r = schema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('scheduleInput', () => {
  it('when given only steps, cadence and start date, fills the defaults', () => {
    const r = scheduleInput.parse(valid);
    expect(r).toEqual({
      name: 'Band rotation',
      steps: [{ bandId: '20m', slots: 2, activeHoursUtc: null }],
      cadence: { kind: 'duty', dutyPercent: 20 },
      stagger: { stepHz: 0, spanHz: 0 },
      startDate: '2026-12-02',
      endDate: null,
      paused: false,
    });
  });

  it.each([
    ['no steps', { ...valid, steps: [] }, 'steps: Add at least one band to the rotation'],
    ['a step of 0 slots', { ...valid, steps: [{ bandId: '20m', slots: 0 }] }, 'steps.0.slots: A step holds at least 1 slot'],
    [
      'a step of 31 slots',
      { ...valid, steps: [{ bandId: '20m', slots: 31 }] },
      'steps.0.slots: A step holds at most 30 slots in a row (one hour): add another step for more',
    ],
    ['an unknown band', { ...valid, steps: [{ bandId: '11m', slots: 1 }] }, 'steps.0.bandId: Use one of'],
    [
      'hours that never occur',
      { ...valid, steps: [{ bandId: '40m', slots: 1, activeHoursUtc: { fromHour: 5, toHour: 5 } }] },
      'steps.0.activeHoursUtc.toHour: The starting and ending hours are the same',
    ],
    [
      'an hour of 25',
      { ...valid, steps: [{ bandId: '40m', slots: 1, activeHoursUtc: { fromHour: 20, toHour: 25 } }] },
      'steps.0.activeHoursUtc.toHour: The ending hour is at most 24',
    ],
    ['every 1st slot', { ...valid, cadence: { kind: 'every-nth', nth: 1 } }, 'cadence.nth: n is at least 2 (use “every slot” for 1)'],
    ['a duty of 0 %', { ...valid, cadence: { kind: 'duty', dutyPercent: 0 } }, 'cadence.dutyPercent: Use at least 1 % of the slots'],
    ['an unknown cadence', { ...valid, cadence: { kind: 'sometimes' } }, 'cadence.kind: Choose how often to transmit'],
    [
      'a stagger step of 25 Hz',
      { ...valid, stagger: { stepHz: 25, spanHz: 40 } },
      'stagger.stepHz: Move the offset by at most 20 Hz per transmission',
    ],
    ['a stagger span of 150 Hz', { ...valid, stagger: { stepHz: 2, spanHz: 150 } }, 'stagger.spanHz: Keep the stagger within 100 Hz'],
    ['30 February', { ...valid, startDate: '2026-02-30' }, 'startDate: Give the start date as YYYY-MM-DD, a real calendar day (UTC)'],
    [
      'an end before the start',
      { ...valid, endDate: '2026-12-01' },
      'endDate: The end date 2026-12-01 is before the start date 2026-12-02',
    ],
  ])('when given %s, refuses with a message saying what to fix', (_label, value, expected) => {
    expect(messagesOf(value).join('\n')).toContain(expected);
  });

  it('when hours wrap past midnight, accepts them', () => {
    expect(messagesOf({ ...valid, steps: [{ bandId: '80m', slots: 1, activeHoursUtc: { fromHour: 20, toHour: 6 } }] })).toEqual([]);
  });
});

describe('schedulePatch', () => {
  it('when only pause is sent, returns only pause (no defaults filled in)', () => {
    expect(schedulePatch.parse({ paused: true })).toEqual({ paused: true });
  });

  it('when an unknown field is sent, names it', () => {
    expect(messagesOf({ paused: true, colour: 'red' }, schedulePatch as never).join()).toContain('remove colour');
  });

  it('when applied to a stored schedule, keeps the unsent fields and checks the whole again', () => {
    const stored: Schedule = { ...scheduleInput.parse(valid), id: 4, stationId: 9, createdAt: 'c', updatedAt: 'u' };
    const ok = applySchedulePatch(stored, schedulePatch.parse({ paused: true }));
    expect(ok.success && ok.data).toEqual({ ...stored, paused: true });
    const bad = applySchedulePatch(stored, schedulePatch.parse({ endDate: '2026-11-30' }));
    expect(bad.success).toBe(false);
  });
});
