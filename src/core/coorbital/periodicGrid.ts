/**
 * A function of an angle known on a uniform periodic grid (values[j] at φ_j = j · 2π/n):
 * interpolation between the points, the crossing of a level, and a minimum between two angles.
 * Used for the averaged potential V(φ) of the co-orbital problem, which the grid samples at
 * 0.5°; features narrower than one step are not resolved.
 */
import { TWO_PI, wrapTwoPi } from '../math.js';

/**
 * values at φ (rad, any turn) by four-point Lagrange interpolation on the surrounding cell
 * (common practice; error O(h⁴) for a smooth function). Where a stencil point is not finite
 * (the planet itself, V = ∞) it falls back to linear interpolation on the cell, which gives
 * +∞ if either end of the cell is +∞ — never a finite value across an infinite barrier.
 */
export function interpolatePeriodic(values: Float64Array, n: number, phiRad: number): number {
  const t = (wrapTwoPi(phiRad) * n) / TWO_PI;
  let j = Math.floor(t);
  const f = t - j;
  if (j >= n) j -= n;
  const v0 = values[j], v1 = values[j + 1 < n ? j + 1 : 0];
  if (f === 0) return v0;
  const vm = values[j > 0 ? j - 1 : n - 1], v2 = values[j + 2 < n ? j + 2 : j + 2 - n];
  if (!Number.isFinite(vm) || !Number.isFinite(v0) || !Number.isFinite(v1) || !Number.isFinite(v2)) {
    if (v0 === Infinity || v1 === Infinity) return Infinity;
    return v0 + f * (v1 - v0);
  }
  const fm1 = f - 1, fm2 = f - 2, fp1 = f + 1;
  return (-f * fm1 * fm2 * vm) / 6 + (fp1 * fm1 * fm2 * v0) / 2 - (fp1 * f * fm2 * v1) / 2 + (fp1 * f * fm1 * v2) / 6;
}

const BISECTION_TOLERANCE_RAD = 1e-13;
const BISECTION_MAX_ITERATIONS = 200;

/**
 * The angle in [allowedRad, barredRad] (either order) where the interpolated values cross
 * `level`, given values ≤ level at allowedRad and > level at barredRad. Bisection (always
 * converges; 1e-13 rad).
 */
export function crossLevel(values: Float64Array, n: number, level: number, allowedRad: number, barredRad: number): number {
  let a = allowedRad, b = barredRad;
  for (let it = 0; it < BISECTION_MAX_ITERATIONS && Math.abs(b - a) > BISECTION_TOLERANCE_RAD; it++) {
    const mid = 0.5 * (a + b);
    if (interpolatePeriodic(values, n, mid) <= level) a = mid;
    else b = mid;
  }
  return a;
}

const GOLDEN = (Math.sqrt(5) - 1) / 2;
const GOLDEN_TOLERANCE_RAD = 1e-9; // the location of a quadratic minimum is fixed only to ~√ε relative
const GOLDEN_MAX_ITERATIONS = 100; // (2π) · 0.618^100 ≈ 1e-20 rad: the tolerance is met first

/** Angle of the least interpolated value on [loRad, hiRad] (golden-section search; common practice). */
export function minimiseBetween(values: Float64Array, n: number, loRad: number, hiRad: number): number {
  let a = loRad, b = hiRad;
  let c = b - GOLDEN * (b - a), d = a + GOLDEN * (b - a);
  let fc = interpolatePeriodic(values, n, c), fd = interpolatePeriodic(values, n, d);
  for (let it = 0; it < GOLDEN_MAX_ITERATIONS && b - a > GOLDEN_TOLERANCE_RAD; it++) {
    if (fc <= fd) {
      b = d; d = c; fd = fc;
      c = b - GOLDEN * (b - a); fc = interpolatePeriodic(values, n, c);
    } else {
      a = c; c = d; fc = fd;
      d = a + GOLDEN * (b - a); fd = interpolatePeriodic(values, n, d);
    }
  }
  return 0.5 * (a + b);
}

/** values[j] with j taken modulo n (any integer j). */
export function atIndex(values: Float64Array, n: number, j: number): number {
  const k = j % n;
  return values[k < 0 ? k + n : k];
}
