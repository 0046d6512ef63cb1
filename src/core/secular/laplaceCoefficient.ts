/**
 * Laplace coefficients b_s^(j)(α) and their first derivative in α, for 0 ≤ α < 1.
 *
 * Definition (Murray & Dermott 1999, Solar System Dynamics, ch. 6; equation numbers not
 * quoted, from memory):
 *   b_s^(j)(α) = (1/π) ∫_0^{2π} cos(jψ) / (1 − 2α cos ψ + α²)^s dψ,
 * and its hypergeometric series, summed here:
 *   b_s^(j)(α) = 2 (s)_j / j! · α^j · Σ_n (s)_n (s+j)_n / (n! (j+1)_n) · α^{2n}
 * ((x)_n the rising factorial), i.e. 2 (s)_j/j! α^j ₂F₁(s, s+j; j+1; α²).
 * The derivative is the series differentiated term by term: d/dα α^{j+2n} = (j+2n) α^{j+2n−1}.
 *
 * Accuracy: the sum stops when the bound on the remaining tail (the last term times
 * r/(1−r), r the current term ratio, which decreases towards α² for s ≥ 1 − j) falls
 * below 1e-16 of the sum. Measured for s = 1/2…5/2, j = 0…3, α ≤ 0.95 (test/core/secularLaplace.test.ts):
 * within 1e-14 relative of SciPy's hypergeometric function, derivative within 1e-13 of
 * SciPy's quadrature. The term count
 * grows like 1/(1 − α²): ~40 terms at α = 0.6, ~400 at α = 0.95, ~4 000 at α = 0.995.
 */

/** Largest α accepted: beyond it the series needs more than ~10⁵ terms (two orbits touching). */
export const LAPLACE_ALPHA_MAX = 0.9999;
const MAX_TERMS = 200_000;
const REL_TOL = 1e-16;

function checkArgs(s: number, j: number, alpha: number): void {
  if (!(s > 0) || !Number.isFinite(s)) throw new RangeError(`Laplace coefficient: s must be > 0, got ${s}`);
  if (!Number.isInteger(j)) throw new RangeError(`Laplace coefficient: j must be an integer, got ${j}`);
  if (!(alpha >= 0 && alpha <= LAPLACE_ALPHA_MAX)) {
    throw new RangeError(`Laplace coefficient: α must lie in [0, ${LAPLACE_ALPHA_MAX}], got ${alpha}`);
  }
}

/** 2 (s)_j / j! (the leading factor of the series). */
function leadingFactor(s: number, j: number): number {
  let f = 2;
  for (let m = 0; m < j; m++) f *= (s + m) / (m + 1);
  return f;
}

/**
 * Sum of the series with weights w(n) = 1 (value) or (j + 2n) (derivative, times α^{j−1}
 * applied by the caller). Returns Σ_n c_n α^{2n} w(n).
 */
function seriesSum(s: number, j: number, alpha2: number, derivative: boolean): number {
  let c = 1; // c_n = (s)_n (s+j)_n / (n! (j+1)_n) α^{2n}
  let prev = derivative ? j : 1;
  let sum = prev;
  for (let n = 0; n < MAX_TERMS; n++) {
    c *= ((s + n) * (s + j + n) / ((n + 1) * (j + 1 + n))) * alpha2;
    const term = derivative ? c * (j + 2 * (n + 1)) : c;
    sum += term;
    if (term === 0) return sum;
    const q = prev > 0 ? term / prev : 1; // current term ratio, decreasing towards α² once n > s + j
    if (q < 1 && n > s + j && term * (q / (1 - q)) <= REL_TOL * Math.abs(sum)) return sum;
    prev = term;
  }
  throw new Error(`Laplace coefficient series did not converge: s=${s}, j=${j}, α²=${alpha2}, terms=${MAX_TERMS}, last sum=${sum}`);
}

/** b_s^(j)(α), 0 ≤ α ≤ LAPLACE_ALPHA_MAX; b_s^(−j) = b_s^(j). */
export function laplaceCoefficient(s: number, j: number, alpha: number): number {
  checkArgs(s, j, alpha);
  const jj = Math.abs(j);
  if (alpha === 0) return jj === 0 ? 2 : 0;
  return leadingFactor(s, jj) * alpha ** jj * seriesSum(s, jj, alpha * alpha, false);
}

/** d b_s^(j) / dα at α (0 ≤ α ≤ LAPLACE_ALPHA_MAX). */
export function laplaceCoefficientDerivative(s: number, j: number, alpha: number): number {
  checkArgs(s, j, alpha);
  const jj = Math.abs(j);
  if (alpha === 0) return jj === 1 ? leadingFactor(s, 1) : 0;
  // d/dα [α^j Σ c_n α^{2n}] = α^{j−1} Σ (j+2n) c_n α^{2n}
  return leadingFactor(s, jj) * alpha ** (jj - 1) * seriesSum(s, jj, alpha * alpha, true);
}
