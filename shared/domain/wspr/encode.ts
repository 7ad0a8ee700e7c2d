/**
 * Channel coding: 50 message bits + 31 zero tail bits through the K=32,
 * rate-1/2 convolutional code (polynomials 0xF2D05351, 0xE4613C47), bit-reversal
 * interleaving over 256 addresses, then symbol = sync + 2 × data bit
 * (WSPR protocol description, K1JT).
 */
import type { Result } from '../result';
import { formatMessage, parseMessage, type WsprMessageType } from './message';
import { packMessage, type PackedFields } from './pack';
import type { PowerRounding } from './power-levels';

export const SYMBOL_COUNT = 162;

/** The 162-bit sync vector (WSPR protocol description, K1JT). */
export const SYNC_VECTOR: readonly number[] = [
  1, 1, 0, 0, 0, 0, 0, 0, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0, 1, 0, 0, 1, 0, 1, 1, 1, 1, 0, 0, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0, 1, 0, 0, 0, 0, 0, 0,
  1, 0, 1, 1, 0, 0, 1, 1, 0, 1, 0, 0, 0, 1, 1, 0, 1, 0, 0, 0, 0, 1, 1, 0, 1, 0, 1, 0, 1, 0, 1, 0, 0, 1, 0, 0, 1, 0, 1, 1, 0, 0, 0, 1, 1, 0,
  1, 0, 1, 0, 0, 0, 1, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0, 0, 1, 1, 1, 0, 1, 1, 0, 0, 1, 1, 0, 1, 0, 0, 0, 1, 1, 1, 0, 0, 0, 0, 0, 1, 0, 1, 0, 0,
  1, 1, 0, 0, 0, 0, 0, 0, 0, 1, 1, 0, 1, 0, 1, 1, 0, 0, 0, 1, 1, 0, 0, 0,
];

const POLY_A = 0xf2d05351;
const POLY_B = 0xe4613c47;

// Tables built once: 8-bit parity, and for each coded bit the symbol slot it lands in.
const PARITY8 = new Uint8Array(256);
for (let i = 0; i < 256; i++) {
  let p = 0;
  for (let x = i; x; x >>= 1) p ^= x & 1;
  PARITY8[i] = p;
}
const SLOT_OF_CODED_BIT = new Uint8Array(SYMBOL_COUNT);
{
  let p = 0;
  for (let i = 0; i < 256 && p < SYMBOL_COUNT; i++) {
    let j = 0;
    for (let b = 0; b < 8; b++) if (i & (1 << b)) j |= 1 << (7 - b);
    if (j < SYMBOL_COUNT) SLOT_OF_CODED_BIT[p++] = j;
  }
}
const SYNC = Uint8Array.from(SYNC_VECTOR);

function parity32(x: number): number {
  x ^= x >>> 16;
  x ^= x >>> 8;
  return PARITY8[x & 0xff];
}

/** 162 channel symbols (0–3) for packed fields; writes into `out` when given. */
export function encodeFields(fields: PackedFields, out: Uint8Array = new Uint8Array(SYMBOL_COUNT)): Uint8Array {
  let reg = 0;
  let coded = 0;
  const push = (bit: number): void => {
    reg = (reg << 1) | bit;
    let slot = SLOT_OF_CODED_BIT[coded++];
    out[slot] = SYNC[slot] | (parity32(reg & POLY_A) << 1);
    slot = SLOT_OF_CODED_BIT[coded++];
    out[slot] = SYNC[slot] | (parity32(reg & POLY_B) << 1);
  };
  const n = fields.callsignField;
  const m = fields.locatorPowerField;
  for (let i = 27; i >= 0; i--) push((n >>> i) & 1);
  for (let i = 21; i >= 0; i--) push((m >>> i) & 1);
  for (let i = 0; i < 31; i++) push(0);
  return out;
}

export type EncodedMessage = {
  message: string;
  type: WsprMessageType;
  symbols: Uint8Array;
  fields: PackedFields;
  power: PowerRounding;
};

/** Message text → symbols. Power off the allowed levels is rounded and reported in `power`. */
export function encodeMessage(text: string): Result<EncodedMessage> {
  const parsed = parseMessage(text);
  if (!parsed.ok) return parsed;
  const fields = packMessage(parsed.message);
  return {
    ok: true,
    message: formatMessage(parsed.message),
    type: parsed.message.type,
    symbols: encodeFields(fields),
    fields,
    power: parsed.power,
  };
}

/** Low bit of each symbol: the sync vector, whatever the message. */
export function syncBits(symbols: ArrayLike<number>): number[] {
  return Array.from(symbols, (s) => s & 1);
}
