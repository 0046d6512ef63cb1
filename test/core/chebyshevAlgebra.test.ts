import { describe, expect, it } from 'vitest';
import { chebyshevFit, chebyshevNode, chebyshevValue } from '../../src/core/series/chebyshev.js';
import {
  chebyshevDerivative, chebyshevFitMatrix, chebyshevNodeMatrix, chebyshevTimesLinear, matrixTimesVector,
} from '../../src/core/series/chebyshevAlgebra.js';

/** Coefficients of the n-node Chebyshev interpolant of f (chebyshev.ts, NR §5.8). */
function fit(f: (x: number) => number, n: number): Float64Array {
  const values = new Float64Array(n);
  for (let k = 0; k < n; k++) values[k] = f(chebyshevNode(k, n));
  const c = new Float64Array(n);
  chebyshevFit(values, 0, 1, n, c, 0);
  return c;
}

describe('operations on Chebyshev series', () => {
  it('multiplies by a + b x: (0.7 − 1.3 x) e^{x/2} against its own interpolant', () => {
    // Product formula x T_j = (T_{j−1} + T_{j+1})/2 (Mason & Handscomb 2003, eq. 2.38).
    const n = 24;
    const f = (x: number) => Math.exp(0.5 * x);
    const c = fit(f, n);
    const product = new Float64Array(n + 1);
    chebyshevTimesLinear(c, 0, n, 0.7, -1.3, product, 0);
    let worst = 0;
    for (let k = 0; k <= 100; k++) {
      const x = -1 + k / 50;
      worst = Math.max(worst, Math.abs(chebyshevValue(product, 0, n + 1, x) - (0.7 - 1.3 * x) * f(x)));
    }
    console.log(`(a + b x) f: worst ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-14);
  });

  it('differentiates: d/dx sin(3x + 0.4) = 3 cos(3x + 0.4) (NR eq. 5.9.2)', () => {
    const n = 30;
    const c = fit((x) => Math.sin(3 * x + 0.4), n);
    const d = new Float64Array(n);
    chebyshevDerivative(c, 0, n, d, 0);
    let worst = 0;
    for (let k = 0; k <= 100; k++) {
      const x = -1 + k / 50;
      worst = Math.max(worst, Math.abs(chebyshevValue(d, 0, n - 1, x) - 3 * Math.cos(3 * x + 0.4)));
    }
    console.log(`derivative: worst ${worst.toExponential(2)}`);
    // Loosened from 1e-14: differentiation scales coefficient rounding by up to n² ≈ 900.
    expect(worst).toBeLessThan(1e-12);
  });

  it('fitting and node matrices reproduce chebyshevFit and chebyshevValue', () => {
    const n = 16;
    const f = (x: number) => 1 / (2.2 - x);
    const values = new Float64Array(n);
    for (let k = 0; k < n; k++) values[k] = f(chebyshevNode(k, n));
    const direct = fit(f, n);
    const viaMatrix = new Float64Array(n);
    matrixTimesVector(chebyshevFitMatrix(n), n, n, values, 0, 1, viaMatrix, 0, 1);
    let worstFit = 0;
    for (let j = 0; j < n; j++) worstFit = Math.max(worstFit, Math.abs(viaMatrix[j] - direct[j]));
    const atNodes = new Float64Array(n);
    matrixTimesVector(chebyshevNodeMatrix(n, n), n, n, direct, 0, 1, atNodes, 0, 1);
    let worstEval = 0;
    for (let k = 0; k < n; k++) worstEval = Math.max(worstEval, Math.abs(atNodes[k] - chebyshevValue(direct, 0, n, chebyshevNode(k, n))));
    // Two summation orders of the same sums: a few ulps of values ≤ 0.84.
    expect(worstFit).toBeLessThan(1e-15);
    expect(worstEval).toBeLessThan(1e-15);
    // The interpolant passes through the samples (common practice).
    let worstInterp = 0;
    for (let k = 0; k < n; k++) worstInterp = Math.max(worstInterp, Math.abs(atNodes[k] - values[k]));
    expect(worstInterp).toBeLessThan(1e-15);
  });
});
