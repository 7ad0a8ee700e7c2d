/** Small order statistics for the analyses (pure; no outside library at run time). */

/**
 * The p-quantile of values already sorted ascending, by linear interpolation between order statistics
 * (Hyndman and Fan's definition 7, the default of R's quantile and numpy.percentile).
 */
export function quantileSorted(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) throw new Error('A quantile needs at least one value');
  const position = (sorted.length - 1) * p;
  const lower = Math.floor(position);
  const upper = Math.ceil(position);
  return sorted[lower] + (position - lower) * (sorted[upper] - sorted[lower]);
}

const ascending = (values: readonly number[]) => [...values].sort((a, b) => a - b);

export const median = (values: readonly number[]): number => quantileSorted(ascending(values), 0.5);

/** Upper quartile minus lower quartile: where the middle half of the values lies. */
export function interquartileRange(values: readonly number[]): number {
  const sorted = ascending(values);
  return quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25);
}

/** Least-squares line y = intercept + slope · x; null when x does not vary. */
export function leastSquares(points: readonly { x: number; y: number }[]): { slope: number; intercept: number } | null {
  if (points.length < 2) return null;
  const meanX = points.reduce((sum, p) => sum + p.x, 0) / points.length;
  const meanY = points.reduce((sum, p) => sum + p.y, 0) / points.length;
  let sxx = 0;
  let sxy = 0;
  for (const p of points) {
    sxx += (p.x - meanX) ** 2;
    sxy += (p.x - meanX) * (p.y - meanY);
  }
  if (sxx === 0) return null;
  const slope = sxy / sxx;
  return { slope, intercept: meanY - slope * meanX };
}
