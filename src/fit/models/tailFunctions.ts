/**
 * Upper tails (survival functions) of the χ² and standard normal distributions, from the
 * regularized upper incomplete gamma Q (incompleteGamma.ts):
 *   χ²_k:  Pr(X > x) = Q(k/2, x/2)                 (Press et al. 2007, Numerical Recipes 3rd ed., §6.2, eq. 6.2.18)
 *   N(0,1): Pr(Z > z) = ½ erfc(z/√2), erfc(y) = Q(½, y²) for y ≥ 0   (ibid., §6.2, eq. 6.2.9)
 */
import { gammaQ } from './incompleteGamma.js';

/** Pr(X > x) for X ~ χ² with `dof` degrees of freedom (dof > 0); 1 for x ≤ 0. */
export function chiSquareSf(x: number, dof: number): number {
  if (!(dof > 0) || !Number.isFinite(dof)) throw new RangeError(`chiSquareSf: dof must be finite and > 0, got ${dof}`);
  if (Number.isNaN(x)) return NaN;
  if (x <= 0) return 1;
  return gammaQ(dof / 2, x / 2);
}

/** Pr(Z > z) for Z ~ N(0, 1). */
export function normalSf(z: number): number {
  if (Number.isNaN(z)) return NaN;
  const half = 0.5 * gammaQ(0.5, (z * z) / 2);
  return z >= 0 ? half : 1 - half;
}

/** Pr(|Z| > |z|) for Z ~ N(0, 1): the two-sided tail. */
export function normalTwoSidedSf(z: number): number {
  if (Number.isNaN(z)) return NaN;
  return gammaQ(0.5, (z * z) / 2);
}
