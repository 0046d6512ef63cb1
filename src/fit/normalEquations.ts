/**
 * One weighted least-squares step through the normal equations (common practice, e.g. Milani
 * & Gronchi 2010, Theory of Orbit Determination, ch. 5, from memory): with residuals r_i
 * (observed − computed, 2 per observation), design rows A_i = ∂(computed)/∂p and the inverse
 * W_i of each observation's 2×2 covariance Γ_i,
 *   N = Σ A_iᵀ W_i A_i,   g = Σ A_iᵀ W_i r_i,   Δp = N⁻¹ g,   C = N⁻¹,   χ² = Σ r_iᵀ W_i r_i.
 * The columns mix units (au, au/day, au/day², m²/kg), so N is scaled to unit diagonal,
 * D N D with D = diag(N_jj^−½), before it is decomposed (ml-matrix's symmetric eigenvalue
 * decomposition); the condition number reported is that of D N D, λ_max/λ_min. Singular when
 * λ_min ≤ 0 or the condition exceeds 1e13 (a tenth of what a double's 16 digits can resolve
 * in the solution's first three digits; common practice).
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** Condition number of the scaled normal matrix above which it counts as singular. */
export const MAX_CONDITION = 1e13;

export interface NormalSolution {
  correction: Float64Array; // Δp, m numbers
  covariance: Float64Array; // C = N⁻¹, m × m row-major; NaN when singular
  normal: Float64Array; // N, m × m row-major
  condition: number; // of D N D
  singular: boolean;
}

/** The 2×2 inverse of [[a, b], [b, d]] written as [w00, w01, w11]. */
export function inverse2(a: number, b: number, d: number): [number, number, number] {
  const det = a * d - b * b;
  return [d / det, -b / det, a / det];
}

/**
 * Solve the normal equations over the observations with `kept[i]`; `weights` holds
 * [w00, w01, w11] per observation (rad⁻²), `residuals` 2 per observation (rad), `design`
 * 2 × m per observation.
 */
export function solveNormalEquations(design: Float64Array, residuals: Float64Array, weights: Float64Array,
  kept: ArrayLike<boolean>, m: number): NormalSolution {
  const N = new Float64Array(m * m);
  const g = new Float64Array(m);
  const n = kept.length;
  for (let i = 0; i < n; i++) {
    if (!kept[i]) continue;
    const w00 = weights[3 * i], w01 = weights[3 * i + 1], w11 = weights[3 * i + 2];
    const o = 2 * m * i;
    const r0 = residuals[2 * i], r1 = residuals[2 * i + 1];
    for (let j = 0; j < m; j++) {
      const a0 = design[o + j], a1 = design[o + m + j];
      // row j of Aᵀ W: (a0 w00 + a1 w01, a0 w01 + a1 w11)
      const b0 = a0 * w00 + a1 * w01, b1 = a0 * w01 + a1 * w11;
      g[j] += b0 * r0 + b1 * r1;
      for (let k = j; k < m; k++) N[m * j + k] += b0 * design[o + k] + b1 * design[o + m + k];
    }
  }
  for (let j = 0; j < m; j++) for (let k = 0; k < j; k++) N[m * j + k] = N[m * k + j];
  const d = new Float64Array(m);
  for (let j = 0; j < m; j++) d[j] = N[m * j + j] > 0 ? 1 / Math.sqrt(N[m * j + j]) : 0;
  const scaled = new Matrix(m, m);
  for (let j = 0; j < m; j++) for (let k = 0; k < m; k++) scaled.set(j, k, d[j] * N[m * j + k] * d[k]);
  const covariance = new Float64Array(m * m).fill(NaN);
  const correction = new Float64Array(m).fill(NaN);
  if (d.some((x) => x === 0)) return { correction, covariance, normal: N, condition: Infinity, singular: true };
  const eig = new EigenvalueDecomposition(scaled, { assumeSymmetric: true });
  const lambda = eig.realEigenvalues;
  const V = eig.eigenvectorMatrix;
  let lo = Infinity, hi = 0;
  for (const l of lambda) { lo = Math.min(lo, l); hi = Math.max(hi, l); }
  const condition = lo > 0 ? hi / lo : Infinity;
  if (!(condition <= MAX_CONDITION)) return { correction, covariance, normal: N, condition, singular: true };
  // (D N D)⁻¹ = V Λ⁻¹ Vᵀ; C = D (D N D)⁻¹ D
  for (let j = 0; j < m; j++) {
    for (let k = 0; k < m; k++) {
      let s = 0;
      for (let q = 0; q < m; q++) s += (V.get(j, q) * V.get(k, q)) / lambda[q];
      covariance[m * j + k] = d[j] * s * d[k];
    }
  }
  for (let j = 0; j < m; j++) {
    let s = 0;
    for (let k = 0; k < m; k++) s += covariance[m * j + k] * g[k];
    correction[j] = s;
  }
  return { correction, covariance, normal: N, condition, singular: false };
}

/**
 * χ² of each observation's 2-D residual against the residual's own covariance (Carpino,
 * Milani & Chesley 2003, Icarus 166, 248, sec. 5, from memory): Γ − A C Aᵀ for an observation
 * in the fit, Γ + A C Aᵀ for one left out. `sigma2` holds [Γ00, Γ01, Γ11] per observation.
 */
export function observationChi2(design: Float64Array, residuals: Float64Array, sigma2: Float64Array,
  kept: ArrayLike<boolean>, covariance: Float64Array, m: number): Float64Array {
  const n = kept.length;
  const out = new Float64Array(n);
  const ac = new Float64Array(2 * m);
  for (let i = 0; i < n; i++) {
    const o = 2 * m * i;
    for (let row = 0; row < 2; row++) {
      for (let k = 0; k < m; k++) {
        let s = 0;
        for (let j = 0; j < m; j++) s += design[o + m * row + j] * covariance[m * j + k];
        ac[m * row + k] = s;
      }
    }
    let q00 = 0, q01 = 0, q11 = 0;
    for (let k = 0; k < m; k++) {
      q00 += ac[k] * design[o + k];
      q01 += ac[k] * design[o + m + k];
      q11 += ac[m + k] * design[o + m + k];
    }
    const sgn = kept[i] ? -1 : 1;
    const [w00, w01, w11] = inverse2(sigma2[3 * i] + sgn * q00, sigma2[3 * i + 1] + sgn * q01, sigma2[3 * i + 2] + sgn * q11);
    const r0 = residuals[2 * i], r1 = residuals[2 * i + 1];
    const chi = r0 * r0 * w00 + 2 * r0 * r1 * w01 + r1 * r1 * w11;
    // An observation that alone fixes a parameter has Γ − A C Aᵀ ≈ 0: its residual says nothing.
    out[i] = Number.isFinite(chi) && chi >= 0 ? chi : 0;
  }
  return out;
}
