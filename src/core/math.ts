/**
 * Safe numeric primitives in one place: clamped inverse trig, angle wrapping,
 * compensated summation, stable variance. Every other file uses these.
 */

export const TWO_PI = 2 * Math.PI;

/** asin with its argument clamped to [-1, 1] (guards rounding just past ±1). */
export function asinClamped(x: number): number {
  return Math.asin(x > 1 ? 1 : x < -1 ? -1 : x);
}

/** acos with its argument clamped to [-1, 1]. */
export function acosClamped(x: number): number {
  return Math.acos(x > 1 ? 1 : x < -1 ? -1 : x);
}

/**
 * Angle wrapped into [0, 2π). A remainder just below 0 (above −1e-16 rad) would round to 2π
 * when 2π is added; it is returned as 0, the same direction inside the range.
 */
export function wrapTwoPi(rad: number): number {
  const r = rad % TWO_PI;
  if (!(r < 0)) return r;
  const w = r + TWO_PI;
  return w < TWO_PI ? w : 0;
}

/** Angle wrapped into [-π, π); an angle already in that range comes back unchanged (exactly). */
export function wrapPi(rad: number): number {
  if (rad >= -Math.PI && rad < Math.PI) return rad;
  return wrapTwoPi(rad + Math.PI) - Math.PI;
}

/** Degrees wrapped into [0, 360) (a remainder just below 0 gives 0, as in wrapTwoPi). */
export function wrapDeg360(deg: number): number {
  const r = deg % 360;
  if (!(r < 0)) return r;
  const w = r + 360;
  return w < 360 ? w : 0;
}

/** Neumaier's compensated sum (Neumaier 1974, ZAMM 54, 39). */
export function sumCompensated(values: ArrayLike<number>): number {
  let sum = 0;
  let c = 0;
  for (let k = 0; k < values.length; k++) {
    const v = values[k];
    const t = sum + v;
    c += Math.abs(sum) >= Math.abs(v) ? sum - t + v : v - t + sum;
    sum = t;
  }
  return sum + c;
}

/** Mean and sample variance by Welford's method (Welford 1962, Technometrics 4, 419). */
export function meanVariance(values: ArrayLike<number>): { mean: number; variance: number } {
  let mean = 0;
  let m2 = 0;
  for (let k = 0; k < values.length; k++) {
    const d = values[k] - mean;
    mean += d / (k + 1);
    m2 += d * (values[k] - mean);
  }
  return { mean, variance: values.length > 1 ? m2 / (values.length - 1) : NaN };
}

/** Median of an ascending-sorted array; NaN when empty. */
export function medianSorted(sorted: ArrayLike<number>): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = n >> 1;
  return n % 2 ? sorted[h] : 0.5 * (sorted[h - 1] + sorted[h]);
}

/**
 * INV_FACTORIAL[n] = 1/n! for n = 0..21: the coefficients of the series in stumpff.ts and
 * kepler.ts. The running product 1·2·…·n is exact in a double up to 22! (the odd part of n!
 * stays below 2^53), so each entry carries the single rounding of 1/n!.
 */
export const INV_FACTORIAL: Float64Array = (() => {
  const t = new Float64Array(22);
  let f = 1;
  t[0] = 1;
  for (let n = 1; n < t.length; n++) {
    f *= n;
    t[n] = 1 / f;
  }
  return t;
})();

/** Euclidean norm of a 3-vector stored at offset `o` of `v`. */
export function norm3(v: ArrayLike<number>, o = 0): number {
  return Math.hypot(v[o], v[o + 1], v[o + 2]);
}
