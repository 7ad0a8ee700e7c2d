import * as ss from 'simple-statistics';
import { seededRandom } from '@/shared/domain/schedule/prng';
import { stabilitySeries, stabilityVerdict, type HeardSample, type TemperatureSample } from '@/shared/domain/reception';

const SLOT_MS = 120_000;
const T0 = Date.UTC(2026, 10, 30, 0, 0, 0);
const CARRIER_HZ = 14_097_100;

/** A unit warming from 15 to 35 °C over 50 transmissions; its frequency moves `hzPerC` per °C, ±1 Hz noise from 5 receivers. */
function warmingScene(seed: number, hzPerC: number) {
  const random = seededRandom(seed);
  const heard: HeardSample[] = [];
  const temperatures: TemperatureSample[] = [];
  for (let i = 0; i < 50; i++) {
    const slot = T0 + i * 5 * SLOT_MS;
    const temperatureC = 15 + (20 * i) / 49;
    temperatures.push({ atMs: slot + 60_000, temperatureC });
    for (let rx = 0; rx < 5; rx++)
      heard.push({ slotStartMs: slot, frequencyErrorHz: 3 + hzPerC * (temperatureC - 20) + (random() * 2 - 1), driftHz: 0 });
  }
  return { heard, temperatures };
}

describe('stability from reports', () => {
  it('finds a known warm-up slope and its temperature coefficient; the slope agrees with simple-statistics', () => {
    // truth: 0.6 Hz per °C on 14.0971 MHz = 6 Hz per 10 °C, 0.6 / 14.0971 ≈ 0.0426 ppm/°C
    const { heard, temperatures } = warmingScene(3, 0.6);
    const series = stabilitySeries(heard, temperatures);
    expect(series).toHaveLength(50);
    expect(series.every((p) => p.temperatureC !== null && p.reports === 5)).toBe(true);
    const verdict = stabilityVerdict(series, CARRIER_HZ);
    expect(verdict.kind).toBe('drifts');
    expect(Math.abs(verdict.hzPer10C! - 6)).toBeLessThan(0.5);
    expect(verdict.words).toMatch(/^drifts as it warms: about \d+\.\d Hz higher per 10 °C$/);
    expect(Math.abs(verdict.tempCoPpmPerC! - 0.6 / 14.0971)).toBeLessThan(0.004);
    // outside check: simple-statistics' linearRegression on the same points
    const slope = ss.linearRegression(series.map((p) => [p.temperatureC!, p.medianErrorHz])).m;
    expect(verdict.hzPer10C!).toBeCloseTo(Math.round(slope * 100) / 10, 6);
  });

  it('calls a temperature-compensated unit steady', () => {
    const { heard, temperatures } = warmingScene(4, 0.02);
    expect(stabilityVerdict(stabilitySeries(heard, temperatures), CARRIER_HZ).kind).toBe('steady');
  });

  it('says "too few reports" below ten transmissions, and judges by spread without temperatures', () => {
    const { heard } = warmingScene(5, 0.6);
    const few = stabilitySeries(heard.slice(0, 45), []);
    expect(few).toHaveLength(9);
    expect(stabilityVerdict(few, CARRIER_HZ)).toMatchObject({ kind: 'too-few', hzPer10C: null, tempCoPpmPerC: null });
    expect(stabilityVerdict(few, CARRIER_HZ).words).toBe('too few reports: 9 of 10 transmissions heard');
    // no heartbeats: the 12 Hz walk shows as wandering, without a coefficient
    const noTemps = stabilityVerdict(stabilitySeries(heard, []), CARRIER_HZ);
    expect(noTemps).toMatchObject({ kind: 'drifts', tempCoPpmPerC: null });
    expect(noTemps.words).toMatch(/no unit temperatures/);
  });
});
