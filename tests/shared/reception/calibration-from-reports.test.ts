import * as ss from 'simple-statistics';
import { seededRandom } from '@/shared/domain/schedule/prng';
import {
  calibrationFromReports,
  heardWindow,
  interquartileRange,
  leastSquares,
  median,
  MIN_RECEIVERS,
  MIN_REPORTS,
  type HeardError,
} from '@/shared/domain/reception';
import { toneFrequenciesHz } from '@/shared/domain/tones';

describe('median and interquartile range', () => {
  // Outside check: the npm package simple-statistics 7 (median, interquartileRange: linear interpolation, R type 7).
  it('agree with simple-statistics on fixed and random samples', () => {
    const random = seededRandom(14);
    const samples: number[][] = [
      [3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20],
      [0, 1, 2, 3],
      [5],
      [-2.5, 4, 4, 4, 1.25, 99],
      ...Array.from({ length: 40 }, (_, i) => Array.from({ length: 1 + i * 3 }, () => (random() - 0.5) * 100)),
    ];
    for (const sample of samples) {
      expect(median(sample)).toBeCloseTo(ss.median(sample), 10);
      expect(interquartileRange(sample)).toBeCloseTo(ss.interquartileRange(sample), 10);
    }
  });

  it('gives the worked example of simple-statistics’ own documentation', () => {
    // simple-statistics docs: interquartileRange([0, 1, 2, 3]) = 1.5; quantileSorted([3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20], 0.5) = 9
    expect(interquartileRange([0, 1, 2, 3])).toBe(1.5);
    expect(median([3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20])).toBe(9);
  });

  it('fits a least-squares line like simple-statistics’ linearRegression', () => {
    const random = seededRandom(7);
    const points = Array.from({ length: 30 }, (_, i) => ({ x: i + random(), y: 2 - 0.8 * i + random() * 3 }));
    const ours = leastSquares(points)!;
    const theirs = ss.linearRegression(points.map((p) => [p.x, p.y]));
    expect(ours.slope).toBeCloseTo(theirs.m, 10);
    expect(ours.intercept).toBeCloseTo(theirs.b, 10);
    expect(
      leastSquares([
        { x: 1, y: 2 },
        { x: 1, y: 3 },
      ]),
    ).toBeNull();
  });
});

/** Heard errors from receivers that each read the station off by `truthHz`, with uniform noise of ±noiseHz. */
function syntheticReports(seed: number, truthHz: number, noiseHz: number, receivers: number, perReceiver: number): HeardError[] {
  const random = seededRandom(seed);
  return Array.from({ length: receivers * perReceiver }, (_, i) => ({
    rxCallsign: `Q${i % receivers}RX`,
    frequencyErrorHz: truthHz + (random() * 2 - 1) * noiseHz,
  }));
}

describe('calibration from reports', () => {
  it('finds a station radiating 37 Hz high from 20 receivers with ±3 Hz noise, within 1 Hz', () => {
    for (const seed of [1, 2, 3, 42, 2026]) {
      const heard = syntheticReports(seed, 37, 3, 20, 5);
      const result = calibrationFromReports('20m', 0, heard);
      expect(result.enough).toBe(true);
      expect(result.receivers).toBe(20);
      expect(result.reports).toBe(100);
      expect(Math.abs(result.proposedOffsetHz! - 37)).toBeLessThan(1);
      // uniform ±3 Hz: the interquartile range is about 3 Hz, so no disagreement warning
      expect(result.spreadHz!).toBeGreaterThan(2);
      expect(result.spreadHz!).toBeLessThan(4);
      expect(result.warning).toBeNull();
    }
  });

  it('adds what the current correction still misses to it (positive = radiates high)', () => {
    // the station's true error is +37 Hz; it already corrects 30 Hz, so receivers hear it 7 Hz high
    const heard = syntheticReports(5, 7, 3, 20, 3);
    const result = calibrationFromReports('40m', 30, heard);
    expect(Math.abs(result.medianErrorHz! - 7)).toBeLessThan(1);
    expect(Math.abs(result.proposedOffsetHz! - 37)).toBeLessThan(1);
    expect(result.proposedOffsetHz).toBeCloseTo(30 + result.medianErrorHz!, 1);
  });

  it('refuses with too few reports or receivers, in words, never with a number', () => {
    const fewReports = calibrationFromReports('20m', 0, syntheticReports(9, 37, 3, 2, 3));
    expect(fewReports).toMatchObject({
      enough: false,
      reports: 6,
      receivers: 2,
      medianErrorHz: null,
      spreadHz: null,
      proposedOffsetHz: null,
    });
    expect(fewReports.reason).toMatch(/^too few reports: 6 of 10 from 2 of 3 receivers/);
    // enough reports but from two receivers only
    const twoReceivers = calibrationFromReports('20m', 0, syntheticReports(9, 37, 3, 2, 30));
    expect(twoReceivers.proposedOffsetHz).toBeNull();
    expect(twoReceivers.reason).toMatch(/60 of 10 from 2 of 3 receivers/);
    // one short of the minimum reports from enough receivers
    const nine = calibrationFromReports('20m', 0, syntheticReports(9, 37, 3, MIN_RECEIVERS, 3));
    expect(nine.reports).toBe(MIN_REPORTS - 1);
    expect(nine.proposedOffsetHz).toBeNull();
    expect(calibrationFromReports('20m', 0, []).reason).toMatch(/0 of 10 from 0 of 3/);
  });

  it('warns when receivers disagree by more than a few hertz', () => {
    const heard = [
      ...syntheticReports(3, 10, 1, 5, 4),
      ...syntheticReports(4, 30, 1, 5, 4).map((h) => ({ ...h, rxCallsign: `${h.rxCallsign}B` })),
    ];
    const result = calibrationFromReports('20m', 0, heard);
    expect(result.enough).toBe(true);
    expect(result.warning).toMatch(/Receivers disagree/);
  });

  it('puts the heard tones where the median error says', () => {
    // 14 095 600 Hz dial, carrier +1500 Hz, heard 37 Hz high: tone 0 at dial + 1537 Hz
    const window = heardWindow(14_095_600, 14_097_100, 37);
    expect(window.tonesHz).toEqual(toneFrequenciesHz(14_097_137));
    expect(window.lowMarginHz).toBeCloseTo(137, 6);
  });
});
