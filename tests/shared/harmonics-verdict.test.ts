import { bandFor } from '@/shared/domain/bands';
import { harmonicsVerdict, type UnitHardware } from '@/shared/domain/workshop/on-air';
import { cutoffProblems, type Coverage } from '@/shared/domain/workshop/coverage';

const band40 = (() => {
  const found = bandFor('40m', 'itu1');
  if (!found.ok) throw new Error(found.reason);
  return found.band;
})();

const unit: UnitHardware = {
  generatorKind: 'pll',
  referenceHz: 25_000_000,
  tolerancePpm: 10,
  tempCoPpmPerC: null,
  disciplined: false,
  generatorLevelDbm: 10,
  attenuatorDb: 0,
  amplifier: null,
  filters: [],
  dutyCycle: 0.5,
};

describe('harmonicsVerdict: the summary states the worst harmonic’s margin, not only the limit', () => {
  it('with a filter that passes, names the worst harmonic, its level below the carrier, the limit and the margin', () => {
    const filter = { bands: ['40m' as const], type: 'chebyshev-0.1', order: 5, cutoffHz: 7_600_000 };
    const coverage: Coverage = { covered: true, filter, index: 0 };
    const verdict = harmonicsVerdict(band40, { ...unit, filters: [filter] }, coverage, 10);
    expect(verdict.pass).toBe(true);
    const worst = verdict.harmonics
      .filter((h) => h.resultDbc !== null && h.rawDbc !== null)
      .reduce((w, h) => (h.resultDbc! > w.resultDbc! ? h : w));
    const below = (-worst.resultDbc!).toFixed(1);
    const spare = (-worst.resultDbc! - verdict.limit.limitDb).toFixed(1);
    expect(verdict.summary).toContain(
      `is ${below} dB below the carrier; the limit is ${verdict.limit.limitDb.toFixed(1)} dB, so there are ${spare} dB to spare`,
    );
  });

  it('without a filter, the worst is the 3rd harmonic at about 9.5 dB below the carrier and the verdict fails', () => {
    const verdict = harmonicsVerdict(band40, unit, { covered: false, reason: 'none' }, 10);
    expect(verdict.pass).toBe(false);
    // A 50 % square wave's 3rd harmonic is 1/3 of the fundamental: 20·log10(1/3) = −9.54 dB (Fourier series of a square wave,
    // any signals textbook, e.g. Oppenheim & Willsky, Signals and Systems, example 3.5).
    expect(verdict.summary).toContain('the 3rd is only 9.5 dB below the carrier');
  });
});

describe('cutoffProblems: a filter whose cut-off cannot serve a band it claims', () => {
  const bands = [band40];
  // 40 m: WSPR dial 7.0386 MHz, window top dial + 1600 Hz (common practice, no source); second harmonic at twice the dial.
  it('names a cut-off below the window (it would block the band)', () => {
    expect(cutoffProblems({ bands: ['40m'], cutoffHz: 6_000_000 }, bands)[0]).toMatch(
      /6\.000 MHz is below the 40 m window .*would block 40 m/,
    );
  });
  it('names a cut-off at or above the second harmonic (harmonics would pass) and says where to aim', () => {
    const [problem] = cutoffProblems({ bands: ['40m'], cutoffHz: 15_000_000 }, bands);
    expect(problem).toMatch(/15\.000 MHz is above 40 m’s second harmonic \(14\.077 MHz\): harmonics would pass/);
  });
  it('has nothing to say about a cut-off between the two', () => {
    expect(cutoffProblems({ bands: ['40m'], cutoffHz: 7_600_000 }, bands)).toEqual([]);
  });
});
