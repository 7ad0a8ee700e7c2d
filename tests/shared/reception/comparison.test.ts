import { cumulativeStdNormalProbability, median } from 'simple-statistics';
import { compareCells, MIN_PAIRS, sectorOf, type SideCell } from '@/shared/domain/reception/comparison';
import { snrPerWattDb } from '@/shared/domain/reception';
import {
  hodgesLehmann,
  signedRankCriticalIndex,
  signedRankNullDistribution,
  signedRankStatistic,
  Z_975,
} from '@/shared/domain/reception/signed-rank';
import { seededRandom } from '@/shared/domain/schedule/prng';

/** Every Walsh average (x_i + x_j) / 2, i ≤ j, listed the slow way (Hollander & Wolfe, Nonparametric Statistical Methods, eq. 3.17). */
function allWalshAverages(values: number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) for (let j = i; j < values.length; j++) out.push((values[i] + values[j]) / 2);
  return out.sort((a, b) => a - b);
}

/** Standard normal deviates from a seeded uniform generator (Box–Muller transform). */
function normalDeviates(seed: number) {
  const uniform = seededRandom(seed);
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

// R's documentation of wilcox.test (package stats), example from Hollander & Wolfe (1973), p. 29 f.: Hamilton depression
// scale at the first (x) and second (y) visit of 9 patients; paired, alternative "greater" gives V = 40, p-value = 0.01953
// (the R example's printed output, from memory).
const HW_X = [1.83, 0.5, 1.62, 2.48, 1.68, 1.88, 1.55, 3.06, 1.3];
const HW_Y = [0.878, 0.647, 0.598, 2.0, 1.06, 1.29, 1.06, 3.14, 1.29];
const HW_D = HW_X.map((x, i) => x - HW_Y[i]);

describe('Wilcoxon signed-rank interval and Hodges–Lehmann estimate', () => {
  it('when given the Hollander & Wolfe depression-scale example, finds T+ = 40 and the exact one-sided p of 0.01953', () => {
    expect(signedRankStatistic(HW_D)).toBe(40);
    const probabilities = signedRankNullDistribution(9);
    const atLeast40 = probabilities.slice(40).reduce((sum, p) => sum + p, 0);
    expect(atLeast40).toBeCloseTo(0.01953, 5);
  });

  it('when the null distribution is counted, agrees with enumerating all 2^n sign patterns', () => {
    // independent check: every one of the 2^n equally likely sign patterns, summed by brute force
    for (const n of [1, 5, 9, 12]) {
      const counts = new Array<number>((n * (n + 1)) / 2 + 1).fill(0);
      for (let mask = 0; mask < 2 ** n; mask++) {
        let t = 0;
        for (let rank = 1; rank <= n; rank++) if (mask & (1 << (rank - 1))) t += rank;
        counts[t] += 1;
      }
      expect(signedRankNullDistribution(n)).toEqual(counts.map((c) => c / 2 ** n));
    }
  });

  it('when n = 9, takes the 6th smallest and 6th largest Walsh averages (P(T+ ≤ 5) = 10/512 ≤ 0.025 < P(T+ ≤ 6) = 14/512)', () => {
    expect(signedRankCriticalIndex(9)).toBe(6);
    const walsh = allWalshAverages(HW_D);
    const found = hodgesLehmann(HW_D)!;
    // the estimate is the median of the Walsh averages, taken with simple-statistics
    expect(found.estimate).toBeCloseTo(median(walsh), 10);
    expect(found.ci95![0]).toBeCloseTo(walsh[5], 10);
    expect(found.ci95![1]).toBeCloseTo(walsh[walsh.length - 6], 10);
  });

  it('when n is at most 5, gives no 95 % interval at all (even all signs alike has probability 1/32 > 0.025)', () => {
    expect(signedRankCriticalIndex(5)).toBe(0);
    expect(hodgesLehmann([1, 2, 3, 4, 5])!.ci95).toBeNull();
    expect(signedRankCriticalIndex(6)).toBe(1);
  });

  it('when n is large, uses the normal approximation of Hollander & Wolfe (3.28), z(0.025) checked with simple-statistics’ normal table', () => {
    // z(0.025) = 1.959964 in any standard normal table (from memory); simple-statistics' table gives Φ(z) = 0.975
    expect(cumulativeStdNormalProbability(Z_975)).toBeCloseTo(0.975, 3);
    expect(Z_975).toBeCloseTo(1.959964, 6);
    for (const n of [51, 100, 400]) {
      const approx = (n * (n + 1)) / 4 - 1.959964 * Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24);
      expect(signedRankCriticalIndex(n)).toBe(Math.floor(approx));
    }
    // at the switch the exact and the approximate index differ by at most one
    const n = 50;
    const approx = Math.floor((n * (n + 1)) / 4 - Z_975 * Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24));
    expect(Math.abs(signedRankCriticalIndex(n) - approx)).toBeLessThanOrEqual(1);
  });

  it('when there are hundreds of differences, the k-th Walsh average found by bisection matches the full sorted list', () => {
    const noise = normalDeviates(20261203);
    const values = Array.from({ length: 301 }, () => 1.5 + 2 * noise());
    const walsh = allWalshAverages(values);
    const found = hodgesLehmann(values)!;
    expect(found.estimate).toBeCloseTo(median(walsh), 9);
    const c = signedRankCriticalIndex(values.length);
    expect(found.ci95![0]).toBeCloseTo(walsh[c - 1], 9);
    expect(found.ci95![1]).toBeCloseTo(walsh[walsh.length - c], 9);
  });
});

/** Cells of one report each: `receivers` receivers heard in each of `hours` hours, all at one bearing and distance. */
function cells(
  next: () => number,
  {
    receivers,
    hours,
    bearingDeg,
    distanceKm,
    trueDeltaDb,
    prefix,
  }: Record<'receivers' | 'hours' | 'bearingDeg' | 'distanceKm' | 'trueDeltaDb', number> & { prefix: string },
) {
  const a: SideCell[] = [];
  const b: SideCell[] = [];
  for (let r = 0; r < receivers; r++) {
    const pathLossDb = -10 - 8 * next(); // each receiver has its own level
    for (let h = 0; h < hours; h++) {
      const common = { rxCallsign: `${prefix}${r}`, rxLocator: 'JO22', hourKey: 500_000 + h, reports: 1, distanceKm, bearingDeg };
      a.push({ ...common, snrWattDb: pathLossDb + 2 * next() });
      b.push({ ...common, snrWattDb: pathLossDb + trueDeltaDb + 2 * next() });
    }
  }
  return { a, b };
}

describe('compareCells', () => {
  it('when referred to 1 W, a report of −15 dB at 23 dBm (200 mW) reads −8 dB', () => {
    // 30 dBm = 1 W by the definition of dBm (common practice, no source)
    expect(snrPerWattDb(-15, 23)).toBe(-8);
    expect(snrPerWattDb(-20, 30)).toBe(-20);
  });

  it('when bearings are given, sorts them into the eight 45° sectors', () => {
    expect([0, 22.4, 22.5, 90, 180, 269, 315, 337.5, 359.9].map(sectorOf)).toEqual(['N', 'N', 'NE', 'E', 'S', 'W', 'NW', 'N', 'N']);
  });

  it('when B is truly 3 dB stronger with 2 dB noise per report, finds the median within 0.5 dB and an interval containing 3', () => {
    const noise = normalDeviates(14);
    const west = cells(noise, { receivers: 30, hours: 14, bearingDeg: 270, distanceKm: 1200, trueDeltaDb: 3, prefix: 'QW' });
    const east = cells(noise, { receivers: 2, hours: 2, bearingDeg: 95, distanceKm: 800, trueDeltaDb: 3, prefix: 'QE' });
    const found = compareCells([...west.a, ...east.a], [...west.b, ...east.b]);
    expect(found.pairs).toBe(30 * 14 + 4);
    expect(found.commonReports).toBe(2 * found.pairs);
    expect(found.commonReceivers).toBe(32);
    expect(Math.abs(found.medianDeltaDb! - 3)).toBeLessThan(0.5);
    expect(found.ci95![0]).toBeLessThan(3);
    expect(found.ci95![1]).toBeGreaterThan(3);
    const westSector = found.bySector.find((s) => s.key === 'W')!;
    expect(westSector).toMatchObject({ pairs: 420, enough: true });
    expect(found.bySector.find((s) => s.key === 'E')).toMatchObject({ pairs: 4, enough: false, medianDeltaDb: null, ci95: null });
    expect(found.verdict).toMatch(/^B is \d\.\d dB stronger \(\d\.\d to \d\.\d dB\), from 848 common reports\./);
    expect(found.verdict).toContain('towards the west');
    expect(found.verdict).toContain('too few towards the east to say');
    expect(found.byDistance.find((d) => d.key === '500-1500')).toMatchObject({ pairs: 424, enough: true });
  });

  it('when many directions have enough pairs, the verdict names the three best supported and points to the table for the rest', () => {
    const noise = normalDeviates(21);
    const sides = [0, 45, 90, 135, 180].map((bearingDeg, i) =>
      cells(noise, { receivers: 4 + i, hours: 5, bearingDeg, distanceKm: 900, trueDeltaDb: 3, prefix: `QS${i}` }),
    );
    const found = compareCells(
      sides.flatMap((x) => x.a),
      sides.flatMap((x) => x.b),
    );
    expect(found.bySector.filter((s) => s.enough).map((s) => s.key)).toEqual(['N', 'NE', 'E', 'SE', 'S']);
    // the most pairs are towards E, SE and S (6, 7 and 8 receivers × 5 hours)
    expect(found.verdict).toMatch(
      /towards the east; .* towards the south-east; .* towards the south\. 2 more directions in the table by direction\.$/,
    );
    expect(found.verdict).not.toContain('towards the north');
  });

  it('when the true difference is 0, the interval contains 0 and the verdict says "no clear difference"', () => {
    const noise = normalDeviates(7);
    const { a, b } = cells(noise, { receivers: 20, hours: 6, bearingDeg: 10, distanceKm: 300, trueDeltaDb: 0, prefix: 'QN' });
    const found = compareCells(a, b);
    expect(found.ci95![0]).toBeLessThanOrEqual(0);
    expect(found.ci95![1]).toBeGreaterThanOrEqual(0);
    expect(found.verdict).toMatch(/^No clear difference/);
  });

  it('when fewer than the minimum receiver-hours were heard by both, says "too few" and gives no number', () => {
    const noise = normalDeviates(3);
    const { a, b } = cells(noise, { receivers: 3, hours: 3, bearingDeg: 200, distanceKm: 2000, trueDeltaDb: 5, prefix: 'QF' });
    expect(a.length).toBeLessThan(MIN_PAIRS);
    const found = compareCells(a, b);
    expect(found).toMatchObject({ pairs: 9, enough: false, medianDeltaDb: null, ci95: null });
    expect(found.verdict).toMatch(/^Too few to say/);
    expect(found.verdict).not.toMatch(/dB/);
    expect(found.bySector.every((s) => s.medianDeltaDb === null)).toBe(true);
  });

  it('when receivers heard only one side, lists them per side and leaves them out of the pairs', () => {
    const base = { rxLocator: 'IO91', reports: 3, distanceKm: 900, bearingDeg: 280, snrWattDb: -12 };
    const found = compareCells(
      [
        { ...base, rxCallsign: 'Q1AA', hourKey: 1 },
        { ...base, rxCallsign: 'Q2BB', hourKey: 1 },
      ],
      [
        { ...base, rxCallsign: 'Q1AA', hourKey: 2 },
        { ...base, rxCallsign: 'Q3CC', hourKey: 1, reports: 5 },
      ],
    );
    expect(found.pairs).toBe(0);
    expect(found.onlyA.map((r) => r.rxCallsign)).toEqual(['Q2BB']);
    expect(found.onlyB).toEqual([{ rxCallsign: 'Q3CC', rxLocator: 'IO91', reports: 5, distanceKm: 900 }]);
  });
});
