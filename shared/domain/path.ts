/**
 * Great-circle (geodesic) distance and initial bearing on the WGS84
 * ellipsoid, through geographiclib-geodesic (C. F. F. Karney's algorithms).
 * Locators are taken at the centre of the rectangle they name.
 */
import { Geodesic } from 'geographiclib-geodesic';
import { type Result } from './result';
import { locatorToLatLon, type LatLon } from './locator';

export type PathResult = { distanceKm: number; bearingDeg: number };

/** Distance and initial bearing (0–360°, clockwise from true north) from one point to another. */
export function pathBetween(from: LatLon, to: LatLon): PathResult {
  const r = Geodesic.WGS84.Inverse(from.lat, from.lon, to.lat, to.lon);
  const azimuth = r.azi1 ?? 0;
  return { distanceKm: (r.s12 ?? 0) / 1000, bearingDeg: ((azimuth % 360) + 360) % 360 };
}

export function pathBetweenLocators(fromLocator: string, toLocator: string): Result<PathResult & { from: LatLon; to: LatLon }> {
  const from = locatorToLatLon(fromLocator);
  if (!from.ok) return from;
  const to = locatorToLatLon(toLocator);
  if (!to.ok) return to;
  const a = { lat: from.lat, lon: from.lon };
  const b = { lat: to.lat, lon: to.lon };
  return { ok: true, ...pathBetween(a, b), from: a, to: b };
}
