/**
 * Where the audio offset may go on a band, and how the stagger moves it.
 * The receive window is dial + 1400 … 1600 Hz (WSPR protocol description);
 * tone 0 sits at the offset and tone 3 three tone spacings above it, so the
 * offset must stay in [1400, 1600 − 3 · 12000/8192] Hz, less an edge guard.
 */
import { TONE_COUNT, TONE_SPACING_HZ, WINDOW_HIGH_OFFSET_HZ, WINDOW_LOW_OFFSET_HZ } from '../tones';
import type { Stagger } from './model';

/** Room kept between the outer tones and the window edges (our choice). */
export const EDGE_GUARD_HZ = 2;

export type OffsetRange = { lowHz: number; highHz: number };

/** The audio offsets (tone 0 above the dial) that keep all four tones inside the window. */
export function allowedOffsetRange(edgeGuardHz = EDGE_GUARD_HZ): OffsetRange {
  return {
    lowHz: WINDOW_LOW_OFFSET_HZ + edgeGuardHz,
    highHz: WINDOW_HIGH_OFFSET_HZ - (TONE_COUNT - 1) * TONE_SPACING_HZ - edgeGuardHz,
  };
}

/** Reflects a value into [low, high] like a ball between two walls (a fold, not a clamp). */
export function foldInto(value: number, range: OffsetRange): number {
  const width = range.highHz - range.lowHz;
  if (width <= 0) return range.lowHz;
  if (value >= range.lowHz && value <= range.highHz) return value;
  const period = 2 * width;
  const pos = (((value - range.lowHz) % period) + period) % period;
  return range.lowHz + (pos <= width ? pos : period - pos);
}

/**
 * The audio offset of the transmission with the given ordinal: the offset
 * walks up by stepHz per transmission across a span centred on the base, turns
 * back at the span's ends (a triangle), then folds into the allowed range.
 */
export function staggeredOffsetHz(baseOffsetHz: number, stagger: Stagger, ordinal: number, range: OffsetRange): number {
  let raw = baseOffsetHz;
  if (stagger.spanHz > 0 && stagger.stepHz > 0) {
    const period = 2 * stagger.spanHz;
    const pos = (ordinal * stagger.stepHz) % period;
    raw = baseOffsetHz - stagger.spanHz / 2 + (pos <= stagger.spanHz ? pos : period - pos);
  }
  return foldInto(raw, range);
}
