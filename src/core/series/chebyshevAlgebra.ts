/**
 * Operations on Chebyshev series f(x) = Σ_{j=0}^{n−1} c_j T_j(x) on [−1, 1] (c_0 already
 * halved, as in chebyshev.ts) used to build cache segments from series in bulk:
 * multiplication by a linear polynomial, differentiation, and the fitting and evaluation
 * matrices at the Chebyshev nodes, so a fit costs n² multiply-adds and no cosines.
 */
import { chebyshevNode } from './chebyshev.js';

/**
 * out = (a + b x) · f, lengths n → n + 1, using x T_0 = T_1 and
 * x T_j = (T_{j−1} + T_{j+1}) / 2 for j ≥ 1 (Mason & Handscomb 2003, Chebyshev Polynomials,
 * eq. 2.38, the product formula T_1 T_j). `out` must not overlap `c`.
 */
export function chebyshevTimesLinear(
  c: Float64Array, cOffset: number, n: number, a: number, b: number,
  out: Float64Array, outOffset: number,
): void {
  for (let j = 0; j <= n; j++) out[outOffset + j] = j < n ? a * c[cOffset + j] : 0;
  if (n === 0) return;
  out[outOffset + 1] += b * c[cOffset];
  for (let j = 1; j < n; j++) {
    const half = 0.5 * b * c[cOffset + j];
    out[outOffset + j - 1] += half;
    out[outOffset + j + 1] += half;
  }
}

/**
 * Coefficients of f'(x) (length n − 1, c_0 convention as above) into out: the recurrence
 * c'_{j−1} = c'_{j+1} + 2 j c_j from j = n−1 down (Numerical Recipes 3rd ed. §5.9,
 * eq. 5.9.2), with the c'_0 halving of our convention. `out` must not overlap `c`.
 */
export function chebyshevDerivative(c: Float64Array, cOffset: number, n: number, out: Float64Array, outOffset: number): void {
  if (n < 2) {
    out[outOffset] = 0;
    return;
  }
  let next2 = 0; // c'_{j+1}
  let next1 = 0; // c'_j
  for (let j = n - 1; j >= 1; j--) {
    const d = next2 + 2 * j * c[cOffset + j]; // c'_{j−1}
    out[outOffset + j - 1] = d;
    next2 = next1;
    next1 = d;
  }
  out[outOffset] *= 0.5;
}

/**
 * Evaluation matrix at the n Chebyshev nodes for series of up to `terms` coefficients:
 * E[k*terms + j] = T_j(x_k), x_k = cos(π (k + ½) / n) (NR eq. 5.8.4), by the three-term
 * recurrence.
 */
export function chebyshevNodeMatrix(n: number, terms: number): Float64Array {
  const e = new Float64Array(n * terms);
  for (let k = 0; k < n; k++) {
    const x = chebyshevNode(k, n);
    let t0 = 1;
    let t1 = x;
    for (let j = 0; j < terms; j++) {
      e[k * terms + j] = t0;
      const t2 = 2 * x * t1 - t0;
      t0 = t1;
      t1 = t2;
    }
  }
  return e;
}

/**
 * Fitting matrix F[j*n + k] = (2 − δ_j0)/n · cos(π j (k + ½)/n), so that the coefficients of
 * the interpolant through f(x_k) are c_j = Σ_k F[j*n+k] f(x_k) (NR eq. 5.8.7, c_0 halved),
 * the same interpolant as chebyshevFit.
 */
export function chebyshevFitMatrix(n: number): Float64Array {
  const f = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    const w = (j === 0 ? 1 : 2) / n;
    for (let k = 0; k < n; k++) f[j * n + k] = w * Math.cos((Math.PI * j * (k + 0.5)) / n);
  }
  return f;
}

/** out[outOffset + j*outStride] = Σ_k m[j*cols + k] v[vOffset + k*vStride], j < rows. */
export function matrixTimesVector(
  m: Float64Array, rows: number, cols: number,
  v: Float64Array, vOffset: number, vStride: number,
  out: Float64Array, outOffset: number, outStride: number,
): void {
  for (let j = 0; j < rows; j++) {
    let s = 0;
    const row = j * cols;
    for (let k = 0; k < cols; k++) s += m[row + k] * v[vOffset + k * vStride];
    out[outOffset + j * outStride] = s;
  }
}
