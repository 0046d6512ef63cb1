/**
 * The families stage's velocity metric as a Euclidean space, for neighbour searches.
 *
 * Zappalà, Cellino, Farinella & Knežević 1990 (AJ 100, 2030, eq. 2 with k1 = 5/4, k2 = k3 = 2):
 *   d = n·a·√(5/4 (δa/a)² + 2 (δe)² + 2 (δ sin i)²)
 * Here each body gets the scaled coordinates z = (√(5/4)·ln a, √2·e, √2·sin i) (dimensionless),
 * so that |δz| is the square root above with δa/a read as δ ln a, and d = n·a·|δz|.
 * Departures, both small for neighbours: δ ln a = δa/ā + O((δa/ā)³/12) with ā the pair's mean
 * semimajor axis (a series expansion of ln(a₂/a₁) = 2 artanh(δa/(a₁+a₂))); and n·a is taken at
 * the body a distance is measured from, not at a mean of the pair (relative difference
 * |δa|/(2a), under 0.4% for neighbours within 0.02 au at 2.5 au). Neighbours are therefore
 * ranked by |δz| and their distances converted to m/s with the body's own n·a.
 */
import { METRIC_K_A, METRIC_K_E, METRIC_K_SIN_I } from './metricVelocity.js';

/** Weight of ln a in the scaled coordinates: √k1, k1 = 5/4 (Zappalà et al. 1990; metricVelocity.ts). */
export const SCALED_A_WEIGHT = Math.sqrt(METRIC_K_A);
/** Weight of e and of sin i: √k2 = √k3 = √2 (Zappalà et al. 1990; metricVelocity.ts). */
export const SCALED_E_WEIGHT = Math.sqrt(METRIC_K_E);
export const SCALED_SIN_I_WEIGHT = Math.sqrt(METRIC_K_SIN_I);

/**
 * Scaled coordinates of proper elements, interleaved [z0, z1, z2] per body (length 3N).
 * Every value must be finite and a > 0: proper elements with a missing value cannot be placed
 * (RangeError naming the first such body).
 */
export function scaledProperCoordinates(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>): Float64Array {
  const n = aAu.length;
  if (e.length !== n || sinI.length !== n) {
    throw new RangeError(`scaledProperCoordinates: lengths differ (a ${n}, e ${e.length}, sin i ${sinI.length})`);
  }
  const out = new Float64Array(3 * n);
  for (let j = 0; j < n; j++) {
    const a = aAu[j];
    if (!(a > 0) || !Number.isFinite(a) || !Number.isFinite(e[j]) || !Number.isFinite(sinI[j])) {
      throw new RangeError(`scaledProperCoordinates: body ${j} has no usable proper elements (a=${a}, e=${e[j]}, sin i=${sinI[j]})`);
    }
    out[3 * j] = SCALED_A_WEIGHT * Math.log(a);
    out[3 * j + 1] = SCALED_E_WEIGHT * e[j];
    out[3 * j + 2] = SCALED_SIN_I_WEIGHT * sinI[j];
  }
  return out;
}

