/**
 * Frequency stability from what receivers heard: per transmission the median heard error and reported drift, beside
 * the unit's temperature from its heartbeats; a least-squares line of error against temperature gives Hz per °C and
 * the crystal's temperature coefficient (ppm/°C = Hz per °C / carrier MHz).
 */
import { interquartileRange, leastSquares, median } from './statistics';

/** Fewer transmissions heard than this give "too few reports" (our rule). */
export const MIN_STABILITY_TRANSMISSIONS = 10;
/** The temperature must have moved at least this much to say anything about warming (our rule). */
export const MIN_TEMPERATURE_SPAN_C = 3;
/** Less than this many Hz per 10 °C (or this IQR without temperatures) counts as steady (our rule). */
export const STEADY_HZ = 2;

export type HeardSample = { slotStartMs: number; frequencyErrorHz: number; driftHz: number };
export type TemperatureSample = { atMs: number; temperatureC: number };

export type StabilityPoint = {
  slotStartMs: number;
  medianErrorHz: number;
  medianDriftHz: number;
  reports: number;
  temperatureC: number | null;
};

export type StabilityVerdict = {
  kind: 'steady' | 'drifts' | 'too-few';
  words: string;
  /** change of the heard frequency for a 10 °C warm-up, Hz; null without enough temperatures */
  hzPer10C: number | null;
  /** the size of the crystal's temperature coefficient, ppm/°C; null without enough temperatures */
  tempCoPpmPerC: number | null;
};

/** A heartbeat counts for a transmission when it is this close in time (our rule: heartbeats come every few minutes). */
const TEMPERATURE_MATCH_MS = 15 * 60_000;

/** One point per heard transmission, with the nearest heartbeat temperature within 15 minutes. */
export function stabilitySeries(heard: readonly HeardSample[], temperatures: readonly TemperatureSample[]): StabilityPoint[] {
  const bySlot = new Map<number, HeardSample[]>();
  for (const h of heard) bySlot.set(h.slotStartMs, [...(bySlot.get(h.slotStartMs) ?? []), h]);
  const temps = [...temperatures].sort((a, b) => a.atMs - b.atMs);
  return [...bySlot.entries()]
    .sort(([a], [b]) => a - b)
    .map(([slotStartMs, samples]) => {
      let nearest: TemperatureSample | null = null;
      for (const t of temps) {
        if (
          Math.abs(t.atMs - slotStartMs) <= TEMPERATURE_MATCH_MS &&
          (!nearest || Math.abs(t.atMs - slotStartMs) < Math.abs(nearest.atMs - slotStartMs))
        ) {
          nearest = t;
        }
      }
      return {
        slotStartMs,
        medianErrorHz: median(samples.map((s) => s.frequencyErrorHz)),
        medianDriftHz: median(samples.map((s) => s.driftHz)),
        reports: samples.length,
        temperatureC: nearest ? nearest.temperatureC : null,
      };
    });
}

/** "steady", "drifts as it warms: about N Hz per 10 °C" or "too few reports", from the series on one carrier. */
export function stabilityVerdict(points: readonly StabilityPoint[], carrierHz: number): StabilityVerdict {
  if (points.length < MIN_STABILITY_TRANSMISSIONS) {
    return {
      kind: 'too-few',
      words: `too few reports: ${points.length} of ${MIN_STABILITY_TRANSMISSIONS} transmissions heard`,
      hzPer10C: null,
      tempCoPpmPerC: null,
    };
  }
  const warm = points.filter((p): p is StabilityPoint & { temperatureC: number } => p.temperatureC !== null);
  const span = warm.length ? Math.max(...warm.map((p) => p.temperatureC)) - Math.min(...warm.map((p) => p.temperatureC)) : 0;
  const line =
    warm.length >= MIN_STABILITY_TRANSMISSIONS && span >= MIN_TEMPERATURE_SPAN_C
      ? leastSquares(warm.map((p) => ({ x: p.temperatureC, y: p.medianErrorHz })))
      : null;
  if (line) {
    const hzPer10C = Math.round(line.slope * 10 * 10) / 10;
    const tempCoPpmPerC = Math.round((Math.abs(line.slope) / carrierHz) * 1e6 * 1000) / 1000;
    if (Math.abs(hzPer10C) < STEADY_HZ) {
      return { kind: 'steady', words: `steady: under ${STEADY_HZ} Hz per 10 °C over ${span.toFixed(1)} °C`, hzPer10C, tempCoPpmPerC };
    }
    const way = hzPer10C > 0 ? 'higher' : 'lower';
    return {
      kind: 'drifts',
      words: `drifts as it warms: about ${Math.abs(hzPer10C).toFixed(1)} Hz ${way} per 10 °C`,
      hzPer10C,
      tempCoPpmPerC,
    };
  }
  const spreadHz = interquartileRange(points.map((p) => p.medianErrorHz));
  return spreadHz < STEADY_HZ
    ? { kind: 'steady', words: 'steady: the heard frequency stays within a couple of hertz', hzPer10C: null, tempCoPpmPerC: null }
    : {
        kind: 'drifts',
        words: `wanders: the middle half of the transmissions spreads over ${spreadHz.toFixed(1)} Hz (no unit temperatures to compare)`,
        hzPer10C: null,
        tempCoPpmPerC: null,
      };
}
