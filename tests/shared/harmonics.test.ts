import { defaultSpuriousLimitDb, requiredFilterAttenuation, squareWaveHarmonics } from '@/shared/domain/harmonics';
import { spuriousRequirement } from '@/shared/domain/workshop/spurious';

// Fourier series of a rectangular wave: harmonic n ∝ |sin(πnD)|/n (standard result); an ideal square
// wave's 3rd harmonic is 20·log10(1/3) = −9.54 dBc, 5th 20·log10(1/5) = −13.98 dBc.
describe('squareWaveHarmonics', () => {
  it.each([
    [3, -9.5424],
    [5, -13.9794],
    [7, -16.902],
  ])('when the duty cycle is 50 %%, the harmonic %i is %p dBc', (n, dbc) => {
    const h = squareWaveHarmonics(7e6, { upTo: 9 }).find((x) => x.harmonic === n);
    expect(h?.levelDbc).toBeCloseTo(dbc, 3);
  });

  it('when the duty cycle is 50 %, the even harmonics vanish', () => {
    expect(
      squareWaveHarmonics(7e6)
        .filter((h) => h.harmonic % 2 === 0)
        .every((h) => h.levelDbc === null),
    ).toBe(true);
  });

  it('when the duty cycle is 25 %, the 2nd harmonic is −3.01 dBc and the 4th vanishes', () => {
    const h = squareWaveHarmonics(7e6, { dutyCycle: 0.25 });
    expect(h[0].levelDbc).toBeCloseTo(-3.0103, 3);
    expect(h[2].levelDbc).toBeNull();
  });
});

describe('requiredFilterAttenuation', () => {
  // US 47 CFR 97.307(d): 43 dB below the fundamental under 30 MHz; 97.307(e): 60 dB for 30–225 MHz
  it.each([
    [7.04e6, 43],
    [28.1e6, 43],
    [50.3e6, 60],
    [144.49e6, 60],
  ])('when the fundamental is %p Hz, uses the %i dB limit', (f, limit) => {
    expect(defaultSpuriousLimitDb(f)).toBe(limit);
  });

  it('when a 40 m square wave must meet 43 dB, needs 33.46 dB at the 3rd harmonic', () => {
    const third = requiredFilterAttenuation(7.04e6).find((h) => h.harmonic === 3);
    expect(third?.requiredAttenuationDb).toBeCloseTo(33.4576, 3);
  });

  it('when the caller passes its own limit, uses it', () => {
    expect(requiredFilterAttenuation(7.04e6, { limitDb: 50 })[1].requiredAttenuationDb).toBeCloseTo(40.4576, 3);
  });
});

describe('spuriousRequirement', () => {
  it('when the station is in region 2, counts harmonics from the real carrier and applies 47 CFR 97.307(e)', () => {
    // 47 CFR 97.307(e): below 30 MHz, spurious emissions at least 43 dB below the fundamental's mean power
    const r = spuriousRequirement({ region: 'itu2', carrierHz: 14_095_600 + 1520, powerW: 0.2 });
    expect(r.limit).toMatchObject({ limitDb: 43, source: expect.stringContaining('97.307') });
    const third = r.harmonics.find((h) => h.harmonic === 3)!;
    expect(third.frequencyHz).toBe(3 * (14_095_600 + 1520));
    // ideal square wave: 3rd harmonic 20·log10(1/3) = −9.54 dBc, so 43 − 9.54 = 33.46 dB to add
    expect(third.requiredAttenuationDb).toBeCloseTo(43 - 9.5424, 3);
  });

  it('when the station is in region 1, uses the ITU formula for its power, and a given limit overrides both', () => {
    // ITU Radio Regulations Appendix 3 (from memory): 43 + 10·log10(P/W), at most 50 dBc below 30 MHz
    expect(spuriousRequirement({ region: 'itu1', carrierHz: 7_040_100, powerW: 0.2 }).limit.limitDb).toBeCloseTo(36.0103, 3);
    expect(spuriousRequirement({ region: 'itu1', carrierHz: 7_040_100, powerW: 100 }).limit.limitDb).toBe(50);
    expect(spuriousRequirement({ region: 'itu1', carrierHz: 7_040_100, powerW: 0.2, limitDb: 60 }).limit.limitDb).toBe(60);
  });
});
