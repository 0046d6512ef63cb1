/**
 * Empirical calibration: the fraction of a reference sample at least as extreme as a value.
 * With the sample sorted once, each query is a binary search. The estimate for a value
 * beyond every sample member is 1/(n+1) rather than 0 (the usual plus-one rule for
 * empirical p-values: Davison & Hinkley 1997, Bootstrap Methods, eq. 4.11).
 */

/** Number of entries of ascending `sorted` that are ≤ x. */
export function countAtMost(sorted: Float64Array, x: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** (1 + #{s ≤ x}) / (n + 1): how often the reference sample is at least this low. */
export function lowerTailFraction(sorted: Float64Array, x: number): number {
  return (1 + countAtMost(sorted, x)) / (sorted.length + 1);
}

/** (1 + #{s ≥ x}) / (n + 1): how often the reference sample is at least this high. */
export function upperTailFraction(sorted: Float64Array, x: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return (1 + sorted.length - lo) / (sorted.length + 1);
}
