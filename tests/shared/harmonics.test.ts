import { defaultSpuriousLimitDb, requiredFilterAttenuation, squareWaveHarmonics } from '@/shared/domain/harmonics';

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
