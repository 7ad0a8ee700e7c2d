/**
 * The 15-bit callsign hash of Type 3 messages: Bob Jenkins' lookup3
 * `hashlittle()` over the callsign's ASCII bytes, seed 146, masked to 15 bits
 * (WSPR protocol; the reference decoder's nhash).
 */

const rot = (x: number, k: number): number => (x << k) | (x >>> (32 - k));

/** lookup3 hashlittle() (byte-wise path, identical on little-endian machines); returns an unsigned 32-bit value. */
export function hashLittle(text: string, seed: number): number {
  let length = text.length;
  let a = (0xdeadbeef + length + seed) | 0;
  let b = a;
  let c = a;
  let o = 0;
  const k = (i: number): number => text.charCodeAt(o + i) & 0xff;
  while (length > 12) {
    a = (a + (k(0) | (k(1) << 8) | (k(2) << 16) | (k(3) << 24))) | 0;
    b = (b + (k(4) | (k(5) << 8) | (k(6) << 16) | (k(7) << 24))) | 0;
    c = (c + (k(8) | (k(9) << 8) | (k(10) << 16) | (k(11) << 24))) | 0;
    // mix(a, b, c)
    a = (a - c) | 0;
    a ^= rot(c, 4);
    c = (c + b) | 0;
    b = (b - a) | 0;
    b ^= rot(a, 6);
    a = (a + c) | 0;
    c = (c - b) | 0;
    c ^= rot(b, 8);
    b = (b + a) | 0;
    a = (a - c) | 0;
    a ^= rot(c, 16);
    c = (c + b) | 0;
    b = (b - a) | 0;
    b ^= rot(a, 19);
    a = (a + c) | 0;
    c = (c - b) | 0;
    c ^= rot(b, 4);
    b = (b + a) | 0;
    length -= 12;
    o += 12;
  }
  if (length === 0) return c >>> 0;
  // the tail: add the remaining 1…12 bytes (the C switch falls through)
  if (length >= 12) c = (c + (k(11) << 24)) | 0;
  if (length >= 11) c = (c + (k(10) << 16)) | 0;
  if (length >= 10) c = (c + (k(9) << 8)) | 0;
  if (length >= 9) c = (c + k(8)) | 0;
  if (length >= 8) b = (b + (k(7) << 24)) | 0;
  if (length >= 7) b = (b + (k(6) << 16)) | 0;
  if (length >= 6) b = (b + (k(5) << 8)) | 0;
  if (length >= 5) b = (b + k(4)) | 0;
  if (length >= 4) a = (a + (k(3) << 24)) | 0;
  if (length >= 3) a = (a + (k(2) << 16)) | 0;
  if (length >= 2) a = (a + (k(1) << 8)) | 0;
  a = (a + k(0)) | 0;
  // final(a, b, c)
  c ^= b;
  c = (c - rot(b, 14)) | 0;
  a ^= c;
  a = (a - rot(c, 11)) | 0;
  b ^= a;
  b = (b - rot(a, 25)) | 0;
  c ^= b;
  c = (c - rot(b, 16)) | 0;
  a ^= c;
  a = (a - rot(c, 4)) | 0;
  b ^= a;
  b = (b - rot(a, 14)) | 0;
  c ^= b;
  c = (c - rot(b, 24)) | 0;
  return c >>> 0;
}

export const CALLSIGN_HASH_SEED = 146;

/** 15-bit hash of a full callsign as sent in Type 3 (e.g. "PJ4/K1ABC"). */
export function callsignHash(callsign: string): number {
  return hashLittle(callsign, CALLSIGN_HASH_SEED) & 0x7fff;
}
