/**
 * Maidenhead locators: field (2 letters A–R, 20° × 10°), square (2 digits,
 * 2° × 1°), subsquare (2 letters A–X, 5′ × 2.5′), extended square (2 digits,
 * 0.5′ × 0.25′). A locator names a rectangle; positions are its centre.
 */
import { refuse, type Result } from './result';

export type LocatorPrecision = 2 | 4 | 6 | 8;
export type LatLon = { lat: number; lon: number };

/** [lon, lat] size of each pair's cell in degrees */
const CELL_DEG: readonly [number, number][] = [
  [20, 10],
  [2, 1],
  [2 / 24, 1 / 24],
  [2 / 240, 1 / 240],
];

const ordinal = ['1st', '2nd', '3rd', '4th', '5th', '6th', '7th', '8th'];

/** Checks a locator and returns it in the usual writing (FN31pr12). */
export function validateLocator(text: string): Result<{ locator: string; precision: LocatorPrecision }> {
  const raw = text.trim();
  if (![2, 4, 6, 8].includes(raw.length)) {
    return refuse(`A locator has 2, 4, 6 or 8 characters (JN, JN58, JN58td, JN58td25); '${raw}' has ${raw.length}.`);
  }
  const up = raw.toUpperCase();
  for (let i = 0; i < up.length; i++) {
    const ch = up[i];
    const pair = Math.floor(i / 2);
    if (pair === 0 && !(ch >= 'A' && ch <= 'R')) {
      return refuse(`The ${ordinal[i]} character of '${raw}' must be a letter A–R (the field); '${ch}' is not.`);
    }
    if ((pair === 1 || pair === 3) && !(ch >= '0' && ch <= '9')) {
      return refuse(`The ${ordinal[i]} character of '${raw}' must be a digit 0–9; '${ch}' is not.`);
    }
    if (pair === 2 && !(ch >= 'A' && ch <= 'X')) {
      return refuse(`The ${ordinal[i]} character of '${raw}' must be a letter A–X (the subsquare); '${ch}' is not.`);
    }
  }
  const locator = up.slice(0, 4) + up.slice(4, 6).toLowerCase() + up.slice(6);
  return { ok: true, locator, precision: raw.length as LocatorPrecision };
}

/** Centre of the rectangle a locator names. */
export function locatorToLatLon(text: string): Result<{ locator: string } & LatLon> {
  const valid = validateLocator(text);
  if (!valid.ok) return valid;
  const up = valid.locator.toUpperCase();
  let lon = -180;
  let lat = -90;
  const pairs = up.length / 2;
  for (let p = 0; p < pairs; p++) {
    const base = p % 2 === 0 ? 65 : 48; // letters for pairs 1 and 3, digits for 2 and 4
    lon += (up.charCodeAt(2 * p) - base) * CELL_DEG[p][0];
    lat += (up.charCodeAt(2 * p + 1) - base) * CELL_DEG[p][1];
  }
  lon += CELL_DEG[pairs - 1][0] / 2;
  lat += CELL_DEG[pairs - 1][1] / 2;
  return { ok: true, locator: valid.locator, lat, lon };
}

/**
 * The cell index of an offset within a range of cells `size` wide, and the offset left inside that cell.
 * A remainder within a rounding error of the next boundary (a cell centre computed back from a locator)
 * counts as that boundary; the nudge is far below any position a receiver or GPS gives (1e-12 of a cell),
 * and the index and remainder are clamped so neither can go negative or past the last cell.
 */
function cellOf(offset: number, size: number, last: number): [index: number, remainder: number] {
  let index = Math.floor(offset / size);
  if ((index + 1) * size - offset <= size * 1e-12) index += 1;
  index = Math.max(0, Math.min(index, last));
  return [index, Math.max(0, offset - index * size)];
}

/** The locator of a position, to 2, 4, 6 or 8 characters. */
export function latLonToLocator(position: LatLon, precision: number = 6): Result<{ locator: string }> {
  const { lat, lon } = position;
  if (!Number.isFinite(lat) || lat < -90 || lat > 90) return refuse(`Latitude must be between −90 and 90 degrees; got ${lat}.`);
  if (!Number.isFinite(lon) || lon < -180 || lon > 180) return refuse(`Longitude must be between −180 and 180 degrees; got ${lon}.`);
  if (![2, 4, 6, 8].includes(precision)) return refuse(`Precision must be 2, 4, 6 or 8 characters; got ${precision}.`);
  // the north pole and the antimeridian fall in the last cell, not past it
  let x = Math.min(lon + 180, 360 - 1e-9) % 360;
  let y = Math.min(lat + 90, 180 - 1e-9);
  let out = '';
  for (let p = 0; p < precision / 2; p++) {
    const [w, h] = CELL_DEG[p];
    const last = p === 0 ? 17 : p === 2 ? 23 : 9;
    const [ci, rx] = cellOf(x, w, last);
    const [cj, ry] = cellOf(y, h, last);
    out +=
      p % 2 === 0 ? String.fromCharCode((p === 2 ? 97 : 65) + ci) + String.fromCharCode((p === 2 ? 97 : 65) + cj) : String(ci) + String(cj);
    x = rx;
    y = ry;
  }
  return { ok: true, locator: out };
}
