/**
 * The k nearest held for one query while points are read (kNearest.ts, kNearestCellTree.ts):
 * (squared distance, input index) pairs in d2[base …], idx[base …], ascending, ties by the
 * lower index, so that the pairs held are always the k smallest of those read, whatever the order
 * they are read in (common practice: insertion into a short sorted list).
 */

/** Places the pair (dd, j) at slot m or below, shifting the larger pairs in slots below m up one place (slot m is free: a new slot, or the k-th dropped). */
export function placePair(d2: Float64Array, idx: Int32Array, base: number, m: number, dd: number, j: number): void {
  while (m > 0 && (d2[base + m - 1] > dd || (d2[base + m - 1] === dd && idx[base + m - 1] > j))) {
    d2[base + m] = d2[base + m - 1];
    idx[base + m] = idx[base + m - 1];
    m--;
  }
  d2[base + m] = dd;
  idx[base + m] = j;
}
