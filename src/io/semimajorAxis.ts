/**
 * The semimajor axis where an input gives another measure of the orbit's size instead,
 * shared by every reader (one formula, one place):
 * - from the mean daily motion n: Kepler's third law in the Gaussian system for a body of
 *   negligible mass, n = k a^(−3/2) (k = GAUSS_K, IAU 1976 defining value; Gauss 1809,
 *   Theoria Motus, book I art. 1–6, from memory), so a = (k / n)^(2/3) with n in rad/day;
 * - from the perihelion distance q: a = q / (1 − e) for an ellipse (conic geometry, common
 *   practice).
 * NaN where the input does not allow it (missing values, n ≤ 0, q ≤ 0, e ≥ 1).
 */
import { GAUSS_K, RAD_PER_DEG } from '../core/constants.js';

/** a in au from the mean daily motion in deg/day; NaN unless n > 0. */
export function semimajorAxisFromMeanMotion(meanMotionDegPerDay: number): number {
  if (!(meanMotionDegPerDay > 0)) return NaN;
  return Math.cbrt((GAUSS_K / (meanMotionDegPerDay * RAD_PER_DEG)) ** 2); // a = (k/n)^(2/3)
}

/** a in au from the perihelion distance in au and the eccentricity; NaN unless q > 0, e < 1. */
export function semimajorAxisFromPerihelion(qAu: number, e: number): number {
  return qAu > 0 && e < 1 ? qAu / (1 - e) : NaN;
}
