/**
 * Osculating heliocentric elements of a fitted state and their uncertainties: the state's
 * 6×6 covariance carried to (a, e, i, Ω, ω, M) through the Jacobian of the state → elements
 * map, C_el = J C Jᵀ (linear propagation of covariance, common practice). J by central
 * differences of stateToSemimajorElements (src/core/orbit), the angle differences wrapped to
 * (−π, π]; steps 1e-7 of the position's and the velocity's size.
 * Frame: the core's heliocentric J2000 ecliptic. Angles rad, a au.
 */
import { GM_SUN_AU3_PER_DAY2 } from '../core/constants.js';
import { wrapPi } from '../core/math.js';
import { stateToSemimajorElements } from '../core/orbit/stateToElements.js';

export interface ElementsWithSigma {
  /** a (au; negative for e > 1), e, i, Ω, ω, M (rad). */
  elements: Float64Array;
  /** 1σ of each, same units; NaN when the covariance is not known. */
  sigmas: Float64Array;
  /** 6 × 6 covariance of the elements, row-major. */
  covariance: Float64Array;
}

/** Elements of `state` with the covariance `stateCovariance` (6 × 6 row-major, or a leading 6 × 6 block of an m × m one when `m` is given). */
export function elementsWithSigma(state: ArrayLike<number>, stateCovariance: ArrayLike<number>, m = 6, mu = GM_SUN_AU3_PER_DAY2): ElementsWithSigma {
  const s = Float64Array.from(Array.from(state).slice(0, 6));
  const elements = new Float64Array(6);
  stateToSemimajorElements(s, mu, elements);
  const J = new Float64Array(36);
  const rScale = Math.hypot(s[0], s[1], s[2]), vScale = Math.hypot(s[3], s[4], s[5]);
  const plus = new Float64Array(6), minus = new Float64Array(6);
  for (let j = 0; j < 6; j++) {
    const h = 1e-7 * (j < 3 ? rScale : vScale);
    const sp = Float64Array.from(s), sm = Float64Array.from(s);
    sp[j] += h; sm[j] -= h;
    stateToSemimajorElements(sp, mu, plus);
    stateToSemimajorElements(sm, mu, minus);
    for (let i = 0; i < 6; i++) {
      const d = i >= 2 ? wrapPi(plus[i] - minus[i]) : plus[i] - minus[i];
      J[6 * i + j] = d / (2 * h);
    }
  }
  const covariance = new Float64Array(36);
  for (let i = 0; i < 6; i++) {
    for (let k = 0; k < 6; k++) {
      let sum = 0;
      for (let p = 0; p < 6; p++) for (let q = 0; q < 6; q++) sum += J[6 * i + p] * stateCovariance[m * p + q] * J[6 * k + q];
      covariance[6 * i + k] = sum;
    }
  }
  const sigmas = Float64Array.from({ length: 6 }, (_, i) => Math.sqrt(covariance[7 * i]));
  return { elements, sigmas, covariance };
}
