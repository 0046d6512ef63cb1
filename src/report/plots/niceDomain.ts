/**
 * An axis domain that holds every value and ends on round numbers: the step is 1, 2 or 5
 * times a power of ten giving about `ticks` intervals over the data's range, the ends the
 * multiples of it just outside the data (common practice for chart axes). Fixed by the
 * caller instead of left to the chart library, so the caller knows where each value lands.
 */

/** [lo, hi] with lo ≤ min and hi ≥ max on multiples of a round step; `floor` bounds lo from below (e.g. 0 for e). */
export function niceDomain(min: number, max: number, ticks = 8, floor = -Infinity): [number, number] {
  if (!(Number.isFinite(min) && Number.isFinite(max) && min <= max)) {
    throw new RangeError(`niceDomain: need finite min ≤ max, got ${min}, ${max}`);
  }
  if (!(Number.isInteger(ticks) && ticks >= 1)) throw new RangeError(`niceDomain: ticks must be a whole number ≥ 1, got ${ticks}`);
  const range = max > min ? max - min : Math.abs(max) * 0.01 || 0.01; // one value: a small span around it
  const raw = range / ticks;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const f = raw / mag;
  const step = mag * (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10);
  const round = (v: number) => Number(v.toPrecision(12)); // 0.30000000000000004 → 0.3
  let lo = round(Math.floor(min / step) * step);
  let hi = round(Math.ceil(max / step) * step);
  if (hi <= lo) { lo = round(lo - step); hi = round(hi + step); }
  return [Math.max(lo, floor), hi];
}
