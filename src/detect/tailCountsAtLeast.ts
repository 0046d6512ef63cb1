/**
 * #{s ≥ x} for many values x against one ascending sample: the counts empiricalTail.ts's
 * countAtLeast gives, bit for bit, without a binary search through the whole sample for each.
 * A guide table (Chen & Asau 1974, AIIE Transactions 6, 163; as outlierBackground.ts uses it)
 * cuts the sample's finite range into as many equal slices as it has finite values and holds the
 * first sample position of each slice, so a query searches its own slice, a few positions, in
 * place of some 19 steps through 400 000 values that miss the cache (1.2 million queries took a
 * second this way). Why the slice bounds the answer: the slice of a value, ⌊(v − lo)·scale⌋, never
 * decreases as v grows, so every sample value in an earlier slice is below x and every one in a
 * later slice above it. Values outside the finite range, ±∞ and NaN take the plain binary search.
 */
import { countAtLeast } from './empiricalTail.js';

/** counts[j] = #{s in sortedAsc : s ≥ xs[j]} (a NaN query counts the whole sample, as countAtLeast does). */
export function countsAtLeast(sortedAsc: Float64Array, xs: ArrayLike<number>): Int32Array {
  const n = sortedAsc.length;
  const out = new Int32Array(xs.length);
  let f0 = 0, f1 = n; // finite values at positions f0 … f1 − 1 (−∞ sorts first; +∞ and NaN last)
  while (f0 < n && sortedAsc[f0] === -Infinity) f0++;
  while (f1 > f0 && !Number.isFinite(sortedAsc[f1 - 1])) f1--;
  const lo = sortedAsc[f0], hi = sortedAsc[f1 - 1];
  const slices = f1 - f0;
  const scale = slices / (hi - lo);
  if (slices < 2 || !(scale > 0 && scale < Infinity && hi - lo < Infinity)) { // one value, or a range too narrow or too wide for floating point
    for (let j = 0; j < xs.length; j++) out[j] = countAtLeast(sortedAsc, xs[j]);
    return out;
  }
  const sliceOf = (v: number): number => Math.min(slices - 1, Math.floor((v - lo) * scale));
  const first = new Uint32Array(slices + 1); // first[b]: first position whose slice is ≥ b (f1 if none)
  let p = f0;
  for (let b = 0; b <= slices; b++) {
    while (p < f1 && sliceOf(sortedAsc[p]) < b) p++;
    first[b] = p;
  }
  for (let j = 0; j < xs.length; j++) {
    const x = xs[j];
    if (!(x >= lo && x <= hi)) { out[j] = countAtLeast(sortedAsc, x); continue; }
    const b = sliceOf(x);
    let a = first[b], c = first[b + 1];
    while (a < c) {
      const mid = (a + c) >>> 1;
      if (sortedAsc[mid] < x) a = mid + 1;
      else c = mid;
    }
    out[j] = n - a;
  }
  return out;
}

/**
 * countsAtLeast for a few values against a large sample that is not sorted: the values are
 * sorted instead, and each sample value s adds one to the values at or below it, found by a
 * binary search through them; a running sum from the top gives each value's count. The counts
 * of a sorted copy of the sample, without sorting it (1.2 million isolation scores took longer to
 * sort than their 25 000 candidates take this way). A NaN in the sample counts as at least as
 * high as any value, as in a sorted sample, where it sorts last.
 */
export function countsAtLeastUnsorted(sample: ArrayLike<number>, xs: ArrayLike<number>): Int32Array {
  const q = xs.length;
  const sortedXs = Float64Array.from(xs).sort();
  const below = new Int32Array(q + 1); // below[t]: sample values with exactly t of the sorted values ≤ them
  for (let j = 0; j < sample.length; j++) {
    const s = sample[j];
    if (Number.isNaN(s)) { below[q]++; continue; }
    let a = 0, c = q; // first sorted value > s
    while (a < c) {
      const mid = (a + c) >>> 1;
      if (sortedXs[mid] <= s) a = mid + 1;
      else c = mid;
    }
    below[a]++;
  }
  const atLeastRank = new Int32Array(q + 1); // atLeastRank[i]: sample values ≥ the i-th smallest value
  for (let t = q - 1; t >= 0; t--) atLeastRank[t] = atLeastRank[t + 1] + below[t + 1];
  const out = new Int32Array(q);
  for (let j = 0; j < q; j++) {
    const x = xs[j];
    if (Number.isNaN(x)) { out[j] = sample.length; continue; }
    let a = 0, c = q; // first sorted value ≥ x: its rank's count is x's
    while (a < c) {
      const mid = (a + c) >>> 1;
      if (sortedXs[mid] < x) a = mid + 1;
      else c = mid;
    }
    out[j] = atLeastRank[a];
  }
  return out;
}
