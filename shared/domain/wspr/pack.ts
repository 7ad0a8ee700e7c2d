/**
 * Source encoding: a message into 50 bits, a 28-bit callsign field N and a
 * 22-bit locator/power field M (WSPR protocol description, K1JT; the
 * reference encoder's pack_call / pack_grid4_power / pack_prefix).
 */
import { paddedCallsign } from './callsign';
import { callsignHash } from './hash';
import type { WsprMessage } from './message';

export type PackedFields = { callsignField: number; locatorPowerField: number };

/** 0–9 → 0–9, A–Z → 10–35, space → 36. */
function charValue(code: number): number {
  if (code >= 48 && code <= 57) return code - 48;
  if (code >= 65 && code <= 90) return code - 55;
  return 36;
}

/** Letters (or space) after the digit: A–Z → 0–25, space → 26. */
const tailValue = (code: number): number => charValue(code) - 10;

/** N for a six-character field (a padded callsign, or a rotated 6-character locator in Type 3). */
export function packSixCharacters(six: string): number {
  let n = charValue(six.charCodeAt(0));
  n = n * 36 + charValue(six.charCodeAt(1));
  n = n * 10 + charValue(six.charCodeAt(2));
  n = n * 27 + tailValue(six.charCodeAt(3));
  n = n * 27 + tailValue(six.charCodeAt(4));
  n = n * 27 + tailValue(six.charCodeAt(5));
  return n;
}

/** N for a plain callsign (already validated). */
export function packCallsign(base: string): number {
  const six = paddedCallsign(base);
  if (six === null) throw new Error(`'${base}' cannot be packed as a WSPR callsign`);
  return packSixCharacters(six);
}

/** The 15-bit locator value of a 4-character locator. */
export function packLocator4(locator: string): number {
  const lon = locator.charCodeAt(0) - 65;
  const lat = locator.charCodeAt(1) - 65;
  const lonSquare = locator.charCodeAt(2) - 48;
  const latSquare = locator.charCodeAt(3) - 48;
  return (179 - 10 * lon - lonSquare) * 180 + 10 * lat + latSquare;
}

/**
 * The 15-bit add-on value and its overflow bit for a compound callsign.
 * Prefix: three characters base 37 (right-aligned, space = 36), below 60000.
 * Suffix: 60000 + 0…35 for one character, 60000 + 26 + 10…99 for two digits.
 * Values of 32768 and more keep their low 15 bits and set `overflow`.
 */
export function packAddOn(prefix: string | undefined, suffix: string | undefined): { value: number; overflow: 0 | 1 } {
  let full: number;
  if (prefix !== undefined) {
    const three = prefix.padStart(3, ' ');
    full = 0;
    for (let i = 0; i < 3; i++) full = full * 37 + charValue(three.charCodeAt(i));
  } else if (suffix !== undefined && suffix.length === 1) {
    full = 60000 + charValue(suffix.charCodeAt(0));
  } else if (suffix !== undefined) {
    full = 60000 + 26 + Number(suffix);
  } else {
    throw new Error('a compound callsign needs a prefix or a suffix');
  }
  return full >= 32768 ? { value: full - 32768, overflow: 1 } : { value: full, overflow: 0 };
}

function splitCompound(callsign: string): { base: string; prefix?: string; suffix?: string } {
  const slash = callsign.indexOf('/');
  const left = callsign.slice(0, slash);
  const right = callsign.slice(slash + 1);
  // same reading as validateCallsign: a short right side is a suffix
  if (right.length <= 2 || left.length > 3) return { base: left, suffix: right };
  return { base: right, prefix: left };
}

/** Packs a validated message (see parseMessage). */
export function packMessage(message: WsprMessage): PackedFields {
  switch (message.type) {
    case 1:
      return {
        callsignField: packCallsign(message.callsign),
        locatorPowerField: packLocator4(message.locator) * 128 + message.powerDbm + 64,
      };
    case 2: {
      const parts = splitCompound(message.callsign);
      const addOn = packAddOn(parts.prefix, parts.suffix);
      return {
        callsignField: packCallsign(parts.base),
        locatorPowerField: addOn.value * 128 + message.powerDbm + 1 + addOn.overflow + 64,
      };
    }
    case 3: {
      // "FK52UD" is sent as the six characters "K52UDF" in the callsign field
      const rotated = message.locator.slice(1) + message.locator[0];
      return {
        callsignField: packSixCharacters(rotated),
        locatorPowerField: callsignHash(message.callsign) * 128 - (message.powerDbm + 1) + 64,
      };
    }
  }
}

/** The 50 bits as 7 bytes, most significant first (the last byte holds 2 bits). */
export function packedBytes(fields: PackedFields): Uint8Array {
  const n = fields.callsignField;
  const m = fields.locatorPowerField;
  return Uint8Array.of(
    (n >>> 20) & 0xff,
    (n >>> 12) & 0xff,
    (n >>> 4) & 0xff,
    ((n & 0x0f) << 4) | ((m >>> 18) & 0x0f),
    (m >>> 10) & 0xff,
    (m >>> 2) & 0xff,
    (m & 0x03) << 6,
  );
}

export function fieldsFromBytes(bytes: ArrayLike<number>): PackedFields {
  const b = (i: number): number => bytes[i] & 0xff;
  const callsignField = ((b(0) << 20) | (b(1) << 12) | (b(2) << 4) | (b(3) >>> 4)) >>> 0;
  const locatorPowerField = (((b(3) & 0x0f) << 18) | (b(4) << 10) | (b(5) << 2) | (b(6) >>> 6)) >>> 0;
  return { callsignField, locatorPowerField };
}

export function bytesToHex(bytes: ArrayLike<number>): string {
  return Array.from(bytes, (x) => x.toString(16).toUpperCase().padStart(2, '0')).join(' ');
}
