import { chainOutput, dbmToMw, mwToDbm, reportedLevel } from '@/shared/domain/power';

// dBm = 10·log10(mW) (definition); the pairs 10 mW = 10 dBm, 200 mW ≈ 23 dBm, 1 W = 30 dBm, 5 W ≈ 37 dBm
// are the team's TRADE.md examples and follow from it.
describe('mwToDbm', () => {
  it.each([
    [1, 0],
    [10, 10],
    [200, 23.0103],
    [1000, 30],
    [5000, 36.9897],
  ])('when the power is %p mW, gives %p dBm', (mw, dbm) => {
    expect(mwToDbm(mw)).toBeCloseTo(dbm, 4);
    expect(dbmToMw(dbm)).toBeCloseTo(mw, 1);
  });
});

describe('chainOutput', () => {
  it('when a 10 dBm generator drives 3 dB of attenuation, a 20 dB amplifier and a 0.5 dB filter, gives 26.5 dBm and reports 27', () => {
    const r = chainOutput({ generatorDbm: 10, attenuatorDb: 3, amplifierGainDb: 20, filterLossDb: 0.5 });
    expect(r.outputDbm).toBeCloseTo(26.5, 9);
    expect(r.saturated).toBe(false);
    expect(r.steps.map((s) => s.label)).toEqual(['generator output', 'attenuator', 'amplifier gain', 'filter loss']);
    expect(r.report).toMatchObject({ reportedDbm: 27, rounded: true });
  });

  it('when the amplifier saturates, caps its output before the filter loss', () => {
    const r = chainOutput({ generatorDbm: 10, amplifierGainDb: 30, amplifierSaturationDbm: 33, filterLossDb: 1 });
    expect(r.saturated).toBe(true);
    expect(r.outputDbm).toBeCloseTo(32, 9);
    expect(r.steps.find((s) => s.label === 'amplifier saturation')?.levelDbm).toBe(33);
  });
});

describe('reportedLevel', () => {
  // allowed levels 0, 3, 7, 10, … 60 dBm: WSPR protocol description (K1JT)
  it.each([
    [23.01, 23],
    [24.9, 23],
    [25.1, 27],
    [36.99, 37],
    [-4, 0],
    [65, 60],
  ])('when the power is %p dBm, reports %i dBm', (dbm, level) => {
    expect(reportedLevel(dbm).reportedDbm).toBe(level);
  });
});
