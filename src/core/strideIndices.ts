/**
 * Deterministic thinning of a sampled series: every k-th sample, the first and the last always
 * kept, so at most `maxPoints` remain and the same input always keeps the same samples.
 */

/** Indices 0, k, 2k, … and n − 1, with k the smallest stride leaving at most maxPoints of them. */
export function strideIndices(n: number, maxPoints: number): Uint32Array {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`sample count must be a whole number ≥ 0, got ${n}`);
  if (!Number.isInteger(maxPoints) || maxPoints < 2) {
    throw new RangeError(`maxPoints must be a whole number ≥ 2, got ${maxPoints}`);
  }
  if (n <= maxPoints) return Uint32Array.from({ length: n }, (_, i) => i);
  const stride = Math.ceil((n - 1) / (maxPoints - 1));
  const out: number[] = [];
  for (let i = 0; i < n - 1; i += stride) out.push(i);
  out.push(n - 1);
  return Uint32Array.from(out);
}
