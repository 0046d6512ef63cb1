/**
 * Turning points of a sampled series with hysteresis (a zigzag filter; common practice): an
 * extreme counts only once the series has come back from it by at least `hysteresis`, so
 * wiggles smaller than that never make a turning point. Used on the smoothed resonant angle,
 * where the turning points bound the libration half-cycles (design note on the co-orbital
 * detector, §6 [design]). The first and last samples are ends, never turning points.
 */

/**
 * Indices of the turning points of `values` into `out` (ascending; maxima and minima
 * alternate); returns their count. `out` needs as many entries as there are samples at most.
 * NaN samples are skipped.
 */
export function turningPointsInto(values: Float64Array, hysteresis: number, out: Int32Array): number {
  if (!(hysteresis > 0) || !Number.isFinite(hysteresis)) throw new RangeError(`turningPoints: bad hysteresis ${hysteresis}`);
  const n = values.length;
  let first = 0;
  while (first < n && !Number.isFinite(values[first])) first++;
  if (first >= n) return 0;
  let hiIdx = first, loIdx = first;
  let dir = 0; // +1 rising (tracking a maximum), −1 falling (tracking a minimum), 0 not yet known
  let count = 0;
  for (let k = first + 1; k < n; k++) {
    const v = values[k];
    if (!Number.isFinite(v)) continue;
    if (dir >= 0 && v > values[hiIdx]) hiIdx = k;
    if (dir <= 0 && v < values[loIdx]) loIdx = k;
    if (dir >= 0 && values[hiIdx] - v >= hysteresis) {
      if (dir > 0) out[count++] = hiIdx; // with dir 0 the maximum is the start itself
      dir = -1;
      loIdx = k;
    } else if (dir <= 0 && v - values[loIdx] >= hysteresis) {
      if (dir < 0) out[count++] = loIdx;
      dir = 1;
      hiIdx = k;
    }
  }
  return count;
}
