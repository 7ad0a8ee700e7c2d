import { compareDefaults, compareFormSchema, requestOf } from '@/components/analyses/compare-form-values';

const NOW = Date.UTC(2026, 11, 3, 6, 20);

describe('compare form values', () => {
  it('when opened, starts with the last 7 days, and for two periods the 7 days before against the last 7, in whole UTC hours', () => {
    const values = compareDefaults(NOW, 4);
    expect(values).toMatchObject({
      mode: 'two-stations',
      a: 4,
      b: null,
      from: '2026-11-26 07:00',
      to: '2026-12-03 07:00',
      aFrom: '2026-11-19 07:00',
      aTo: '2026-11-26 07:00',
      bFrom: '2026-11-26 07:00',
    });
  });

  it('when station B, the band or a readable time is missing, names each field to fix', () => {
    const result = compareFormSchema.safeParse({ ...compareDefaults(NOW, 4), to: 'tomorrow' });
    expect(result.success).toBe(false);
    const fields = Object.fromEntries(result.error!.issues.map((i) => [i.path.join('.'), i.message]));
    expect(fields).toEqual({ band: 'Choose a band', to: 'Write the end as YYYY-MM-DD HH:MM (UTC)', b: 'Choose station B' });
  });

  it('when the same station is chosen twice, or a period runs backwards or past 92 days, says so', () => {
    const same = compareFormSchema.safeParse({ ...compareDefaults(NOW, 4), b: 4, band: '20m' });
    expect(same.error!.issues.map((i) => i.path.join('.'))).toEqual(['b']);
    const backwards = compareFormSchema.safeParse({ ...compareDefaults(NOW, 4), b: 5, band: '20m', from: '2026-12-04 00:00' });
    expect(backwards.error!.issues.map((i) => i.message)).toEqual(['Choose a start before the end']);
    const long = compareFormSchema.safeParse({ ...compareDefaults(NOW, 4), b: 5, band: '20m', from: '2026-08-01 00:00' });
    expect(long.error!.issues.map((i) => i.message)).toEqual(['Choose a period of at most 92 days']);
  });

  it('when checked, becomes the API request in ISO UTC; two periods compare station A with itself', () => {
    expect(requestOf({ ...compareDefaults(NOW, 4), b: 5, band: '20m' })).toEqual({
      mode: 'two-stations',
      a: 4,
      b: 5,
      band: '20m',
      from: '2026-11-26T07:00:00.000Z',
      to: '2026-12-03T07:00:00.000Z',
    });
    expect(requestOf({ ...compareDefaults(NOW, 4), mode: 'two-periods', band: '40m' })).toMatchObject({ mode: 'two-periods', a: 4, b: 4 });
  });
});
