/**
 * WSPR slot timing in UTC (WSPR protocol description, K1JT): a slot is two
 * minutes starting on an even minute; the transmission starts 1 s in and lasts
 * 162 symbols of 8192/12000 s (≈ 110.6 s). All inputs are instants given by
 * the caller (Date or epoch milliseconds); nothing here reads the clock.
 */

export const SLOT_MS = 120_000;
export const TX_START_OFFSET_MS = 1_000;
export const SYMBOL_PERIOD_MS = (8192 / 12000) * 1000;
export const SYMBOLS_PER_TRANSMISSION = 162;
export const TX_DURATION_MS = SYMBOLS_PER_TRANSMISSION * SYMBOL_PERIOD_MS;

export type Instant = Date | number;

export const toMs = (at: Instant): number => (typeof at === 'number' ? at : at.getTime());

/** Start of the slot containing `at` (epoch ms; epoch 0 is an even minute). */
export function slotStartMs(at: Instant): number {
  const ms = toMs(at);
  return ms - (((ms % SLOT_MS) + SLOT_MS) % SLOT_MS);
}

/** First slot start strictly after `at`. */
export function nextSlotStartMs(at: Instant): number {
  return slotStartMs(at) + SLOT_MS;
}

/** First slot start at or after `at` (the slot now starting counts). */
export function slotStartAtOrAfterMs(at: Instant): number {
  const start = slotStartMs(at);
  return start === toMs(at) ? start : start + SLOT_MS;
}

/**
 * Slot starts in [from, to), every `everyNth` slot counted from the first one
 * (everyNth = 5 gives one slot in five). Returns a typed array for speed.
 */
export function slotsInRange(from: Instant, to: Instant, everyNth = 1): Float64Array {
  const first = slotStartAtOrAfterMs(from);
  const end = toMs(to);
  const step = SLOT_MS * Math.max(1, Math.floor(everyNth));
  const count = end > first ? Math.ceil((end - first) / step) : 0;
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) out[i] = first + i * step;
  return out;
}

export type SlotPosition = {
  slotStartMs: number;
  transmissionStartMs: number;
  transmissionEndMs: number;
  /** ms since the slot started */
  msIntoSlot: number;
  phase: 'before-transmission' | 'transmitting' | 'after-transmission';
  /** 0–161 while transmitting, else null */
  symbolIndex: number | null;
  /** ms since the current symbol started, while transmitting */
  msIntoSymbol: number | null;
};

/** Where an instant falls within its slot and transmission. */
export function slotPosition(at: Instant): SlotPosition {
  const ms = toMs(at);
  const start = slotStartMs(ms);
  const txStart = start + TX_START_OFFSET_MS;
  const txEnd = txStart + TX_DURATION_MS;
  const base = { slotStartMs: start, transmissionStartMs: txStart, transmissionEndMs: txEnd, msIntoSlot: ms - start };
  if (ms < txStart) return { ...base, phase: 'before-transmission', symbolIndex: null, msIntoSymbol: null };
  if (ms >= txEnd) return { ...base, phase: 'after-transmission', symbolIndex: null, msIntoSymbol: null };
  const intoTx = ms - txStart;
  const symbolIndex = Math.min(SYMBOLS_PER_TRANSMISSION - 1, Math.floor(intoTx / SYMBOL_PERIOD_MS));
  return { ...base, phase: 'transmitting', symbolIndex, msIntoSymbol: intoTx - symbolIndex * SYMBOL_PERIOD_MS };
}
