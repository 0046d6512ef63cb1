/**
 * The linear (Laplace–Lagrange) secular theory's coefficient matrices for N planets around a
 * central mass: A (eccentricity) and B (inclination), in arcsec/yr.
 *
 * Murray & Dermott 1999, Solar System Dynamics, ch. 7 (the N-planet secular solution;
 * equation numbers from memory, not quoted), with α_jk = min(a_j, a_k)/max(a_j, a_k) and
 * ᾱ_jk = α_jk when planet k is outside j (a_k > a_j), 1 when it is inside:
 *   A_jj = + n_j/4 · Σ_{k≠j} m_k/(m_c + m_j) · α_jk ᾱ_jk · b_{3/2}^(1)(α_jk)
 *   A_jk = − n_j/4 · m_k/(m_c + m_j) · α_jk ᾱ_jk · b_{3/2}^(2)(α_jk)
 *   B_jj = − n_j/4 · Σ_{k≠j} m_k/(m_c + m_j) · α_jk ᾱ_jk · b_{3/2}^(1)(α_jk)
 *   B_jk = + n_j/4 · m_k/(m_c + m_j) · α_jk ᾱ_jk · b_{3/2}^(1)(α_jk)
 * The theory is first order in the masses and second order in e and sin i: no mean-motion
 * terms (so no Jupiter–Saturn great-inequality correction), no e⁴ or e² sin² i terms.
 */
import { ARCSEC_PER_RAD, DAYS_PER_JULIAN_YEAR, GAUSS_K } from '../constants.js';
import { laplaceCoefficient } from './laplaceCoefficient.js';

/** Mean motion (arcsec/yr) on a Kepler orbit of semimajor axis aAu about the Sun plus `massRatio` (m/M_sun). Kepler's third law, k² = GM_sun in au³/day². */
export function meanMotionArcsecPerYear(aAu: number, massRatio = 0): number {
  return GAUSS_K * Math.sqrt((1 + massRatio) / (aAu * aAu * aAu)) * DAYS_PER_JULIAN_YEAR * ARCSEC_PER_RAD;
}

/**
 * α ᾱ b_{3/2}^(1)(α) and α ᾱ b_{3/2}^(2)(α) of a body at aAu perturbed by a body at
 * perturberAAu, into out[0], out[1] (the geometric factors of both matrices).
 */
export function secularPairFactors(aAu: number, perturberAAu: number, out: Float64Array): void {
  const inner = perturberAAu < aAu; // perturber inside: ᾱ = 1
  const alpha = inner ? perturberAAu / aAu : aAu / perturberAAu;
  const aBar = inner ? 1 : alpha;
  out[0] = alpha * aBar * laplaceCoefficient(1.5, 1, alpha);
  out[1] = alpha * aBar * laplaceCoefficient(1.5, 2, alpha);
}

/** A and B as row-major N×N Float64Arrays (arcsec/yr). massRatios: m_k/m_c; aAu: semimajor axes. */
export function secularMatrices(massRatios: readonly number[], aAu: readonly number[]): { A: Float64Array; B: Float64Array } {
  const n = massRatios.length;
  if (aAu.length !== n || n < 2) throw new RangeError(`secularMatrices: need ≥ 2 planets with one mass and one a each, got ${n} and ${aAu.length}`);
  const A = new Float64Array(n * n), B = new Float64Array(n * n);
  const f = new Float64Array(2);
  for (let j = 0; j < n; j++) {
    const nj4 = meanMotionArcsecPerYear(aAu[j], massRatios[j]) / 4;
    for (let k = 0; k < n; k++) {
      if (k === j) continue;
      if (!(aAu[k] !== aAu[j])) throw new RangeError(`secularMatrices: planets ${j} and ${k} share a = ${aAu[j]} au`);
      secularPairFactors(aAu[j], aAu[k], f);
      const c = nj4 * (massRatios[k] / (1 + massRatios[j]));
      A[j * n + j] += c * f[0];
      A[j * n + k] = -c * f[1];
      B[j * n + j] -= c * f[0];
      B[j * n + k] = c * f[0];
    }
  }
  return { A, B };
}
