/**
 * A deliberately simple propagation model of our own, for the demo data and the simulated listening posts:
 * SNR falls with distance and rises with power; each band prefers daylight or darkness at the path's midpoint
 * and has a skip zone. Not a prediction tool: it only makes believable patterns (bands by UTC hour, reach by power).
 */
import type { LatLon } from '../locator';
import { pathBetween } from '../path';

type BandHabit = { base: number; skipKm: number; dayDb: number; nightDb: number; dayRangeKm: number };

/** Our own rough habits per band (not sourced: a demo model). */
const HABITS: Record<string, BandHabit> = {
  '160m': { base: 0, skipKm: 0, dayDb: -25, nightDb: 4, dayRangeKm: 300 },
  '80m': { base: 2, skipKm: 0, dayDb: -14, nightDb: 5, dayRangeKm: 600 },
  '60m': { base: 3, skipKm: 0, dayDb: -8, nightDb: 4, dayRangeKm: 1000 },
  '40m': { base: 4, skipKm: 200, dayDb: -4, nightDb: 5, dayRangeKm: 1500 },
  '30m': { base: 4, skipKm: 400, dayDb: 0, nightDb: 3, dayRangeKm: 3000 },
  '20m': { base: 4, skipKm: 700, dayDb: 4, nightDb: -8, dayRangeKm: 20000 },
  '17m': { base: 3, skipKm: 900, dayDb: 4, nightDb: -14, dayRangeKm: 20000 },
  '15m': { base: 3, skipKm: 1000, dayDb: 3, nightDb: -18, dayRangeKm: 20000 },
  '12m': { base: 2, skipKm: 1200, dayDb: 2, nightDb: -22, dayRangeKm: 20000 },
  '10m': { base: 2, skipKm: 1400, dayDb: 1, nightDb: -25, dayRangeKm: 20000 },
};
const FALLBACK: BandHabit = { base: 2, skipKm: 500, dayDb: 0, nightDb: 0, dayRangeKm: 5000 };

/** The weakest SNR a decoder still gets (about −28 dB in 2500 Hz; from memory). */
export const DECODE_FLOOR_DB = -28;

/** The sun's elevation (degrees) at a place and UTC time: a low-precision textbook approximation. */
export function sunElevationDeg(at: LatLon, utcMs: number): number {
  const days = utcMs / 86_400_000 - 10_957.5; // days since 2000-01-01 12:00 UTC
  const rad = Math.PI / 180;
  const meanLon = (280.46 + 0.9856474 * days) % 360;
  const anomaly = ((357.528 + 0.9856003 * days) % 360) * rad;
  const eclipticLon = (meanLon + 1.915 * Math.sin(anomaly) + 0.02 * Math.sin(2 * anomaly)) * rad;
  const obliquity = (23.439 - 0.0000004 * days) * rad;
  const declination = Math.asin(Math.sin(obliquity) * Math.sin(eclipticLon));
  const rightAscension = Math.atan2(Math.cos(obliquity) * Math.sin(eclipticLon), Math.cos(eclipticLon));
  const siderealDeg = (280.46061837 + 360.98564736629 * days + at.lon) % 360;
  const hourAngle = siderealDeg * rad - rightAscension;
  const lat = at.lat * rad;
  return Math.asin(Math.sin(lat) * Math.sin(declination) + Math.cos(lat) * Math.cos(declination) * Math.cos(hourAngle)) / rad;
}

export type Hearing = { tx: LatLon; rx: LatLon; bandId: string; utcMs: number; powerDbm: number; random: () => number };

/** The SNR (whole dB) a receiver decodes a transmission at, or null when it does not decode it. */
export function modelledSnrDb({ tx, rx, bandId, utcMs, powerDbm, random }: Hearing): number | null {
  const habit = HABITS[bandId] ?? FALLBACK;
  const { distanceKm } = pathBetween(tx, rx);
  const midpoint = { lat: (tx.lat + rx.lat) / 2, lon: tx.lon + (((rx.lon - tx.lon + 540) % 360) - 180) / 2 };
  const daylight = sunElevationDeg(midpoint, utcMs) > -6;
  let snr = powerDbm - 30 + habit.base - 6 * Math.log2(Math.max(distanceKm, 50) / 500);
  snr += daylight ? habit.dayDb : habit.nightDb;
  if (daylight && distanceKm > habit.dayRangeKm) snr -= 12;
  if (distanceKm > 100 && distanceKm < habit.skipKm) snr -= 10;
  // fading and the receiver's own noise: about ±6 dB
  snr += (random() + random() + random() - 1.5) * 7;
  if (random() < 0.12) return null; // the receiver was busy, on another band or the slot was crowded
  const rounded = Math.round(snr);
  return rounded >= DECODE_FLOOR_DB ? Math.min(rounded, 25) : null;
}
