/**
 * Centred running mean of a sampled series over a time window (a boxcar filter; common
 * practice). Used on the unwrapped resonant angle with a window of one planet period, which
 * damps the short-period terms of the planet's perturbation (period ≲ the synodic and orbital
 * periods) while a libration of decades to centuries passes almost unchanged (design note on
 * the co-orbital detector, §6 [design]). Near the ends the window is cut to the samples there.
 */

/**
 * out[k] = mean of values[j] over the samples with |t_j − t_k| ≤ windowDays/2. Times sorted
 * ascending (JD, any scale). `scratch` needs n + 1 numbers (prefix sums); pass one to avoid
 * the allocation. Sums are of values − values[0], so large unwrapped angles keep their digits.
 */
export function runningMeanInto(
  timesJd: Float64Array, values: Float64Array, windowDays: number, out: Float64Array, scratch?: Float64Array,
): void {
  const n = timesJd.length;
  if (values.length < n || out.length < n) throw new RangeError(`runningMean: need ${n} values and outputs`);
  if (!(windowDays >= 0) || !Number.isFinite(windowDays)) throw new RangeError(`runningMean: bad window ${windowDays} d`);
  if (n === 0) return;
  const prefix = scratch ?? new Float64Array(n + 1);
  if (prefix.length < n + 1) throw new RangeError(`runningMean: scratch needs ${n + 1} numbers`);
  const v0 = values[0];
  prefix[0] = 0;
  for (let k = 0; k < n; k++) prefix[k + 1] = prefix[k] + (values[k] - v0);
  const half = windowDays / 2;
  let lo = 0, hi = 0; // window [lo, hi) for sample k
  for (let k = 0; k < n; k++) {
    const t = timesJd[k];
    while (timesJd[lo] < t - half) lo++;
    if (hi < k + 1) hi = k + 1;
    while (hi < n && timesJd[hi] <= t + half) hi++;
    out[k] = v0 + (prefix[hi] - prefix[lo]) / (hi - lo);
  }
}
