/**
 * The Hodges–Lehmann estimate of a median difference and its Wilcoxon signed-rank confidence interval.
 * Source: M. Hollander and D. A. Wolfe, Nonparametric Statistical Methods (2nd ed., Wiley 1999), §3.2 (the estimator:
 * the median of the n(n+1)/2 Walsh averages) and §3.3 (the interval: the Cα-th smallest and Cα-th largest Walsh
 * averages, Cα = n(n+1)/2 + 1 − t(α/2) from the exact null distribution of T+, or its large-sample approximation
 * Cα ≈ n(n+1)/4 − z(α/2)·√(n(n+1)(2n+1)/24)).
 * The k-th Walsh average is found by bisection with an O(n) count, so no n² list is built for long periods.
 */

/** Up to this many pairs the null distribution of T+ is counted exactly; above it the normal approximation is used. */
export const EXACT_SIGNED_RANK_MAX_N = 50;
/** z(0.025), the standard normal's upper 2.5 % point (any normal table). */
export const Z_975 = 1.959963984540054;

/** P(T+ = t) for t = 0 … n(n+1)/2 under the null hypothesis (every sign equally likely), counted by dynamic programming. */
export function signedRankNullDistribution(n: number): number[] {
  const max = (n * (n + 1)) / 2;
  let counts = new Array<number>(max + 1).fill(0);
  counts[0] = 1;
  for (let rank = 1; rank <= n; rank++) {
    const next = counts.slice();
    for (let t = rank; t <= max; t++) next[t] += counts[t - rank];
    counts = next;
  }
  const total = 2 ** n;
  return counts.map((c) => c / total);
}

/** Wilcoxon's T+: the sum of the ranks of |d| over the positive differences (zeros dropped, ties given mid-ranks). */
export function signedRankStatistic(differences: number[]): number {
  const nonZero = differences.filter((d) => d !== 0).map((d) => ({ d, abs: Math.abs(d) }));
  nonZero.sort((a, b) => a.abs - b.abs);
  let sum = 0;
  for (let i = 0; i < nonZero.length;) {
    let j = i;
    while (j + 1 < nonZero.length && nonZero[j + 1].abs === nonZero[i].abs) j++;
    const midRank = (i + j) / 2 + 1;
    for (let k = i; k <= j; k++) if (nonZero[k].d > 0) sum += midRank;
    i = j + 1;
  }
  return sum;
}

/** Cα for a two-sided 95 % interval from n pairs: exact up to EXACT_SIGNED_RANK_MAX_N, normal approximation above. 0 = none possible. */
export function signedRankCriticalIndex(n: number): number {
  if (n > EXACT_SIGNED_RANK_MAX_N) {
    return Math.floor((n * (n + 1)) / 4 - Z_975 * Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24));
  }
  const probabilities = signedRankNullDistribution(n);
  // the largest C with P(T+ ≤ C − 1) ≤ 0.025: the interval [W(C), W(M+1−C)] then covers at least 95 %
  let below = 0;
  let c = 0;
  for (let t = 0; t < probabilities.length; t++) {
    below += probabilities[t];
    if (below > 0.025 + 1e-12) break;
    c = t + 1;
  }
  return c;
}

/** How many Walsh averages (x[i] + x[j]) / 2, i ≤ j, are at most `value`; `sorted` ascending. */
function countWalshAtMost(sorted: number[], value: number): number {
  let count = 0;
  let j = sorted.length - 1;
  for (let i = 0; i < sorted.length; i++) {
    while (j >= i && sorted[i] + sorted[j] > 2 * value) j--;
    if (j < i) break;
    count += j - i + 1;
  }
  return count;
}

/** The largest Walsh average that is at most `value`. */
function largestWalshAtMost(sorted: number[], value: number): number {
  let best = -Infinity;
  let j = sorted.length - 1;
  for (let i = 0; i < sorted.length; i++) {
    while (j >= i && sorted[i] + sorted[j] > 2 * value) j--;
    if (j < i) break;
    best = Math.max(best, (sorted[i] + sorted[j]) / 2);
  }
  return best;
}

/** The k-th smallest (1-based) of the n(n+1)/2 Walsh averages of `sorted`. */
export function kthWalshAverage(sorted: number[], k: number): number {
  let low = sorted[0];
  let high = sorted[sorted.length - 1];
  if (countWalshAtMost(sorted, low) >= k) return low;
  for (let step = 0; step < 200 && high - low > 1e-12 * Math.max(1, Math.abs(high)); step++) {
    const mid = (low + high) / 2;
    if (countWalshAtMost(sorted, mid) >= k) high = mid;
    else low = mid;
  }
  return largestWalshAtMost(sorted, high);
}

export type SignedRankEstimate = { n: number; estimate: number; ci95: [number, number] | null };

/** The Hodges–Lehmann estimate of the differences' centre and, when n allows one, its 95 % signed-rank interval. */
export function hodgesLehmann(differences: number[]): SignedRankEstimate | null {
  const n = differences.length;
  if (n === 0) return null;
  const sorted = [...differences].sort((a, b) => a - b);
  const walshCount = (n * (n + 1)) / 2;
  const estimate =
    walshCount % 2 === 1
      ? kthWalshAverage(sorted, (walshCount + 1) / 2)
      : (kthWalshAverage(sorted, walshCount / 2) + kthWalshAverage(sorted, walshCount / 2 + 1)) / 2;
  const c = signedRankCriticalIndex(n);
  const ci95: [number, number] | null = c >= 1 ? [kthWalshAverage(sorted, c), kthWalshAverage(sorted, walshCount + 1 - c)] : null;
  return { n, estimate, ci95 };
}
