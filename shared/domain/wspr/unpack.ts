/**
 * The inverse of pack.ts: 50 message bits back to a message, as a receiver
 * reads them (WSPR protocol description; the reference decoder's unpk_).
 */
import { refuse, type Result } from '../result';
import { fieldsFromBytes, type PackedFields } from './pack';
import { isWsprPowerLevel } from './power-levels';
import type { WsprMessage } from './message';

const CHARS = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ ';
/** Type 3 carries only a hash: resolve it to the callsign heard earlier, or leave it unresolved. */
export type HashResolver = (hash: number) => string | undefined;

export type UnpackedMessage = WsprMessage | { type: 3; callsign: null; hash: number; locator: string; powerDbm: number };

/** Six characters (with spaces) from a 28-bit field, or null if the value is not a callsign field. */
export function unpackSixCharacters(n: number): string | null {
  if (n < 0 || n >= 37 * 36 * 10 * 27 * 27 * 27) return null;
  const out = new Array<string>(6);
  for (let i = 5; i >= 3; i--) {
    out[i] = CHARS[(n % 27) + 10];
    n = Math.floor(n / 27);
  }
  out[2] = CHARS[n % 10];
  n = Math.floor(n / 10);
  out[1] = CHARS[n % 36];
  out[0] = CHARS[Math.floor(n / 36)];
  return out.join('');
}

function unpackLocator4(value: number): string | null {
  if (value >= 180 * 180) return null;
  const lonPart = 179 - Math.floor(value / 180);
  const latPart = value % 180;
  return (
    String.fromCharCode(65 + Math.floor(lonPart / 10)) +
    String.fromCharCode(65 + Math.floor(latPart / 10)) +
    String(lonPart % 10) +
    String(latPart % 10)
  );
}

function unpackAddOn(value: number, base: string): string | null {
  if (value < 60000) {
    let rest = value;
    let prefix = '';
    for (let i = 0; i < 3; i++) {
      prefix = CHARS[rest % 37] + prefix;
      rest = Math.floor(rest / 37);
    }
    return `${prefix.trim()}/${base}`;
  }
  const nc = value - 60000;
  if (nc <= 35) return `${base}/${CHARS[nc]}`;
  if (nc <= 125) return `${base}/${nc - 26}`;
  return null;
}

export function unpackFields(fields: PackedFields, resolveHash?: HashResolver): Result<{ message: UnpackedMessage }> {
  const six = unpackSixCharacters(fields.callsignField);
  if (six === null) return refuse('The callsign field holds no callsign.');
  const m = fields.locatorPowerField;
  const ntype = (m & 127) - 64;
  const upper = m >>> 7;

  if (ntype >= 0) {
    const lastDigit = ntype % 10;
    if (lastDigit === 0 || lastDigit === 3 || lastDigit === 7) {
      const locator = unpackLocator4(upper);
      if (locator === null) return refuse('The locator field holds no locator.');
      return { ok: true, message: { type: 1, callsign: six.trim(), locator, powerDbm: ntype } };
    }
    // Type 2: power + 1 + overflow bit
    const addOnBit = lastDigit > 7 ? lastDigit - 8 : lastDigit > 3 ? lastDigit - 4 : lastDigit - 1;
    const powerDbm = ntype - 1 - addOnBit;
    const callsign = unpackAddOn(upper + 32768 * addOnBit, six.trim());
    if (callsign === null || !isWsprPowerLevel(powerDbm)) return refuse('The add-on field holds no prefix or suffix.');
    return { ok: true, message: { type: 2, callsign, powerDbm } };
  }

  const powerDbm = -(ntype + 1);
  if (!isWsprPowerLevel(powerDbm)) return refuse('The power field holds no WSPR power level.');
  const locator = six[5] + six.slice(0, 5);
  if (!/^[A-R]{2}[0-9]{2}[A-X]{2}$/.test(locator)) return refuse('The locator field holds no 6-character locator.');
  const hash = upper & 0x7fff;
  const callsign = resolveHash?.(hash);
  return callsign !== undefined
    ? { ok: true, message: { type: 3, callsign, locator, powerDbm } }
    : { ok: true, message: { type: 3, callsign: null, hash, locator, powerDbm } };
}

export function unpackBytes(bytes: ArrayLike<number>, resolveHash?: HashResolver): Result<{ message: UnpackedMessage }> {
  return unpackFields(fieldsFromBytes(bytes), resolveHash);
}
