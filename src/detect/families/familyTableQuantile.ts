/**
 * Quantile of an ascending-sorted array by linear interpolation between order statistics:
 * Q(p) = x[h⌋] + (h − ⌊h⌋)(x[⌊h⌋+1] − x[⌊h⌋]), h = (n − 1) p (Hyndman & Fan 1996, Am. Stat.
 * 50, 361, definition 7). NaN when empty.
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantileSorted: p must lie in [0, 1], got ${p}`);
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  if (lo >= n - 1) return sorted[n - 1];
  return sorted[lo] + (h - lo) * (sorted[lo + 1] - sorted[lo]);
}
