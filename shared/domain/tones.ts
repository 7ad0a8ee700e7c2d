/**
 * The four WSPR tones. Convention used throughout Faintline:
 *   carrier (tone 0) = dial frequency + audio offset,
 *   tone k = carrier + k · 12000/8192 Hz, k = 0 … 3,
 * so the signal spans 3 × 1.4648 ≈ 4.39 Hz above the carrier (about 6 Hz
 * occupied). The receive window is dial + 1400 … 1600 Hz (WSPR protocol
 * description, K1JT).
 */

export const TONE_SPACING_HZ = 12000 / 8192;
export const TONE_COUNT = 4;
export const WINDOW_LOW_OFFSET_HZ = 1400;
export const WINDOW_HIGH_OFFSET_HZ = 1600;

export function toneFrequenciesHz(carrierHz: number): [number, number, number, number] {
  return [0, 1, 2, 3].map((k) => carrierHz + k * TONE_SPACING_HZ) as [number, number, number, number];
}

export type WindowCheck = {
  windowLowHz: number;
  windowHighHz: number;
  tonesHz: number[];
  inside: boolean;
  /** distance of the lowest tone above the window's lower edge (negative = outside) */
  lowMarginHz: number;
  /** distance of the highest tone below the window's upper edge (negative = outside) */
  highMarginHz: number;
  /** the smaller of the two: how far the signal may still move before a tone leaves the window */
  marginHz: number;
};

/** Whether all tones sit inside dial + 1400 … 1600 Hz, and by how much. */
export function checkTonesInWindow(dialHz: number, tonesHz: readonly number[]): WindowCheck {
  const windowLowHz = dialHz + WINDOW_LOW_OFFSET_HZ;
  const windowHighHz = dialHz + WINDOW_HIGH_OFFSET_HZ;
  const lowMarginHz = Math.min(...tonesHz) - windowLowHz;
  const highMarginHz = windowHighHz - Math.max(...tonesHz);
  const marginHz = Math.min(lowMarginHz, highMarginHz);
  return { windowLowHz, windowHighHz, tonesHz: [...tonesHz], inside: marginHz >= 0, lowMarginHz, highMarginHz, marginHz };
}
