import { amplifierSupply, estimateExposure, generalPublicLimitWPerM2 } from '@/shared/domain/bench';

describe('amplifierSupply', () => {
  // P = V·I; heat = DC in + drive − RF out (energy conservation); efficiency = RF out / DC in
  it('when a 12 V amplifier draws 0.5 A for 2 W out, takes 6 W, sheds 4 W and needs a heatsink and a 0.8 A fuse', () => {
    const r = amplifierSupply({ rfOutputW: 2, supplyV: 12, supplyA: 0.5 });
    expect(r).toMatchObject({ ok: true, dcInputW: 6, heatW: 4, needsHeatsink: true });
    if (!r.ok) return;
    expect(r.efficiency).toBeCloseTo(1 / 3, 9);
    // 1.5 × 0.5 A = 0.75 A → the next IEC 60127 rating, 0.8 A (series from memory; factor common practice, no source)
    expect(r.fuseA).toBe(0.8);
    expect(r.cautions.join(' ')).toMatch(/heatsink/);
  });

  it('when only the efficiency is known, works the draw out from it: 1 W at 50 % from 5 V is 2 W, 0.4 A', () => {
    const r = amplifierSupply({ rfOutputW: 1, supplyV: 5, efficiency: 0.5 });
    expect(r).toMatchObject({ ok: true, dcInputW: 2, heatW: 1, needsHeatsink: false });
    if (r.ok) expect(r.currentA).toBeCloseTo(0.4, 9);
  });

  it('when the supply cannot deliver the RF output, refuses', () => {
    expect(amplifierSupply({ rfOutputW: 5, supplyV: 5, supplyA: 0.5 }).ok).toBe(false);
    expect(amplifierSupply({ rfOutputW: 1 }).ok).toBe(false);
  });
});

describe('generalPublicLimitWPerM2', () => {
  // 47 CFR § 1.1310 Table 1 (ii), general population: 0.3–1.34 MHz 100 mW/cm²; 1.34–30 MHz 180/f²;
  // 30–300 MHz 0.2; 300–1500 MHz f/1500; 1.5–100 GHz 1.0 mW/cm²; 1 mW/cm² = 10 W/m²
  it.each([
    [474_200, 1000],
    [14_097_100, (180 / 14.0971 ** 2) * 10],
    [28_126_100, (180 / 28.1261 ** 2) * 10],
    [50_294_500, 2],
    [144_490_500, 2],
    [432e6, (432 / 1500) * 10],
  ])('when the frequency is %i Hz, the limit is %p W/m²', (hz, limit) => {
    expect(generalPublicLimitWPerM2(hz)).toBeCloseTo(limit, 6);
  });

  it('when the frequency is below the table (2200 m), gives no limit', () => {
    expect(generalPublicLimitWPerM2(137_500)).toBeNull();
  });
});

describe('estimateExposure', () => {
  it('when 0.2 W feeds a 2.15 dBi dipole on 20 m at 20 % duty, gives EIRP 0.328 W and the far-field distance to the limit', () => {
    const r = estimateExposure({ powerW: 0.2, gainDbi: 2.15, frequencyHz: 14_097_100, duty: 0.2 });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // EIRP = P · 10^(G/10) = 0.2 · 10^0.215 = 0.32812 W
    expect(r.eirpW).toBeCloseTo(0.2 * 10 ** 0.215, 9);
    expect(r.limitWPerM2).toBeCloseTo(9.0576, 3);
    // S = EIRP · duty / (4π r²) solved for r, and the density there is the limit
    expect((r.eirpW * 0.2) / (4 * Math.PI * r.distanceM ** 2)).toBeCloseTo(r.limitWPerM2, 9);
    expect(r.distanceM).toBeCloseTo(0.024, 4);
    // OET Bulletin 65 ground reflection: × 2.56 in density, × 1.6 in distance (from memory)
    expect(r.distanceWithGroundReflectionM / r.distanceM).toBeCloseTo(1.6, 9);
    expect(r.source).toMatch(/1\.1310/);
    // λ/2π at 14.1 MHz is 3.38 m: the estimate falls in the near field and says so
    expect(r.inNearField).toBe(true);
    expect(r.cautions.join(' ')).toMatch(/near field/);
  });

  it('when 3 dB of feed-line loss is added, the EIRP halves', () => {
    const a = estimateExposure({ powerW: 5, gainDbi: 0, frequencyHz: 7_040_100 });
    const b = estimateExposure({ powerW: 5, gainDbi: 0, frequencyHz: 7_040_100, lossDb: 3 });
    expect(a.ok && b.ok && b.eirpW / a.eirpW).toBeCloseTo(10 ** -0.3, 9);
  });

  it.each([
    [{ powerW: 0, gainDbi: 0, frequencyHz: 7e6 }, /power/],
    [{ powerW: 1, gainDbi: 0, frequencyHz: 7e6, duty: 1.5 }, /share of time/],
    [{ powerW: 1, gainDbi: 0, frequencyHz: 137_500 }, /outside the table/],
  ])('when given %j, refuses and says why', (input, reason) => {
    const r = estimateExposure(input);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(reason);
  });
});
