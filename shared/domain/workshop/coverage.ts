/**
 * Which installed low-pass filter serves a band. A filter covers a band when it is
 * fitted for that band, passes the whole receive window (cut-off above its top edge)
 * and starts cutting before the second harmonic (cut-off below twice the dial).
 */
import type { Band, BandId } from '../bands';

export type InstalledFilter = {
  bands: readonly BandId[];
  type: string;
  order: number;
  cutoffHz: number;
};

export type Coverage = { covered: true; filter: InstalledFilter; index: number } | { covered: false; reason: string };

export function filterCoverage(filters: readonly InstalledFilter[], band: Band): Coverage {
  const fitted = filters.map((filter, index) => ({ filter, index })).filter(({ filter }) => filter.bands.includes(band.id));
  if (fitted.length === 0) {
    return {
      covered: false,
      reason: `No low-pass filter for ${band.name} is installed on this unit. Fit one before enabling ${band.name}.`,
    };
  }
  const usable = fitted.find(({ filter }) => filter.cutoffHz >= band.windowHighHz && filter.cutoffHz < 2 * band.dialHz);
  if (usable) return { covered: true, ...usable };
  const { filter } = fitted[0];
  const mhz = (hz: number) => `${(hz / 1e6).toFixed(3)} MHz`;
  return filter.cutoffHz < band.windowHighHz
    ? {
        covered: false,
        reason: `The ${band.name} filter cuts off at ${mhz(filter.cutoffHz)}, below the transmit window (${mhz(band.windowHighHz)}): it would block the signal.`,
      }
    : {
        covered: false,
        reason: `The ${band.name} filter cuts off at ${mhz(filter.cutoffHz)}, above the second harmonic (${mhz(2 * band.dialHz)}): it would not suppress harmonics.`,
      };
}

/**
 * What is wrong with one filter's cut-off for each band it claims to serve, in words (empty = fine): below the band's window it
 * blocks the signal; at or above twice the dial it lets the second harmonic through. Judged on the default (Region 1) band plan.
 */
export function cutoffProblems(filter: { bands: readonly BandId[]; cutoffHz: number }, bands: readonly Band[]): string[] {
  if (!Number.isFinite(filter.cutoffHz) || filter.cutoffHz <= 0) return [];
  const mhz = (hz: number) => `${(hz / 1e6).toFixed(3)} MHz`;
  return bands
    .filter((band) => filter.bands.includes(band.id))
    .flatMap((band) =>
      filter.cutoffHz < band.windowHighHz
        ? [`${mhz(filter.cutoffHz)} is below the ${band.name} window (${mhz(band.windowHighHz)}): this filter would block ${band.name}.`]
        : filter.cutoffHz >= 2 * band.dialHz
          ? [
              `${mhz(filter.cutoffHz)} is above ${band.name}’s second harmonic (${mhz(2 * band.dialHz)}): harmonics would pass. Aim between ${mhz(band.windowHighHz)} and ${mhz(2 * band.dialHz)}.`,
            ]
          : [],
    );
}
