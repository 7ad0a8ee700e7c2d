import { bandContaining, bandFor, bandsFor, BAND_TABLE } from '@/shared/domain/bands';

// Dial frequencies: conventional WSPR dial frequencies (from memory; team TRADE.md), window dial + 1400 … 1600 Hz
// (WSPR protocol description, K1JT).
describe('bandFor', () => {
  it.each([
    ['2200m', 'itu1', 136_000],
    ['630m', 'itu2', 474_200],
    ['40m', 'itu2', 7_038_600],
    ['20m', 'itu3', 14_095_600],
    ['60m', 'itu2', 5_287_200],
    ['60m', 'itu1', 5_364_700],
    ['4m', 'itu1', 70_091_000],
    ['2m', 'itu1', 144_489_000],
  ] as const)('when asked for %s in %s, gives dial %i Hz and its 200 Hz window', (id, region, dialHz) => {
    expect(bandFor(id, region)).toMatchObject({
      ok: true,
      band: { dialHz, windowLowHz: dialHz + 1400, windowHighHz: dialHz + 1600 },
    });
  });

  it.each([
    ['4m', 'itu2'],
    ['4m', 'itu3'],
  ] as const)('when %s has no allocation in %s, refuses', (id, region) => {
    expect(bandFor(id, region)).toMatchObject({ ok: false });
  });

  it('when the band is unknown, refuses and lists the bands', () => {
    const r = bandFor('11m');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/2200m.*2m/);
  });
});

describe('bandsFor', () => {
  it('when every band is listed, each window lies inside its band edges', () => {
    for (const region of ['itu1', 'itu2', 'itu3'] as const) {
      for (const band of bandsFor(region)) {
        expect(band.windowLowHz).toBeGreaterThanOrEqual(band.bandLowHz);
        expect(band.windowHighHz).toBeLessThanOrEqual(band.bandHighHz);
      }
    }
  });

  it('when every table entry is read, each value names a source', () => {
    for (const entry of BAND_TABLE) {
      expect(entry.dialHz.source.length).toBeGreaterThan(10);
      expect(entry.edgesHz.source.length).toBeGreaterThan(10);
    }
  });

  it('when given a frequency inside 30 m, finds 30 m', () => {
    expect(bandContaining(10_140_200)?.id).toBe('30m');
  });
});
