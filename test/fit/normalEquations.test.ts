// Weighted least squares (src/fit/normalEquations.ts) against closed forms: the weighted
// straight-line fit y = a + b x and its parameter variances (Press et al., Numerical Recipes,
// 2nd ed., §15.2, eqs. 15.2.6 and 15.2.9, from memory), and the residual χ² of an observation
// in the fit against the same observation judged from the fit without it (for a linear model
// the two are equal: the leave-one-out identity, common practice). Data invented.
import { describe, expect, it } from 'vitest';
import { observationChi2, solveNormalEquations, inverse2 } from '../../src/fit/normalEquations.js';

const x = [0.5, 1.3, 2.0, 3.1, 4.4, 5.0, 6.7];
const y = [1.9, 3.2, 4.1, 6.5, 8.4, 9.9, 13.8];
const s = [0.2, 0.3, 0.2, 0.4, 0.3, 0.5, 0.6];

/** One observation a row: row 0 is y = a + b x, row 1 empty (design 0, residual 0, σ 1). */
function problem(a0: number, b0: number) {
  const n = x.length;
  const design = new Float64Array(4 * n), residuals = new Float64Array(2 * n), weights = new Float64Array(3 * n), sigma2 = new Float64Array(3 * n);
  for (let i = 0; i < n; i++) {
    design.set([1, x[i], 0, 0], 4 * i);
    residuals.set([y[i] - (a0 + b0 * x[i]), 0], 2 * i);
    sigma2.set([s[i] * s[i], 0, 1], 3 * i);
    weights.set(inverse2(s[i] * s[i], 0, 1), 3 * i);
  }
  return { design, residuals, weights, sigma2 };
}

describe('weighted least squares', () => {
  it('the straight line: a, b and their variances as the closed form gives them', () => {
    let S = 0, Sx = 0, Sy = 0, Sxx = 0, Sxy = 0;
    x.forEach((xi, i) => { const w = 1 / s[i] ** 2; S += w; Sx += w * xi; Sy += w * y[i]; Sxx += w * xi * xi; Sxy += w * xi * y[i]; });
    const D = S * Sxx - Sx * Sx;
    const a = (Sxx * Sy - Sx * Sxy) / D, b = (S * Sxy - Sx * Sy) / D;
    const { design, residuals, weights } = problem(0.3, 1.1); // a start off the solution: the correction reaches it in one step
    const sol = solveNormalEquations(design, residuals, weights, x.map(() => true), 2);
    expect(sol.singular).toBe(false);
    expect(0.3 + sol.correction[0]).toBeCloseTo(a, 12);
    expect(1.1 + sol.correction[1]).toBeCloseTo(b, 12);
    expect(sol.covariance[0]).toBeCloseTo(Sxx / D, 14);
    expect(sol.covariance[3]).toBeCloseTo(S / D, 14);
    expect(sol.covariance[1]).toBeCloseTo(-Sx / D, 14);
    expect(sol.condition).toBeGreaterThan(1);
  });

  it('a kept observation’s χ² equals its χ² judged from the fit without it', () => {
    const { design, residuals, weights, sigma2 } = problem(0, 0);
    const all = x.map(() => true);
    const fitAll = solveNormalEquations(design, residuals, weights, all, 2);
    const at = (p: Float64Array) => Float64Array.from(x.flatMap((xi, i) => [y[i] - (p[0] + p[1] * xi), 0]));
    const chiIn = observationChi2(design, at(fitAll.correction), sigma2, all, fitAll.covariance, 2);
    for (let k = 0; k < x.length; k++) {
      const without = all.map((_, i) => i !== k);
      const fitOut = solveNormalEquations(design, residuals, weights, without, 2);
      const chiOut = observationChi2(design, at(fitOut.correction), sigma2, without, fitOut.covariance, 2);
      expect(chiIn[k]).toBeCloseTo(chiOut[k], 9);
    }
    expect(Math.max(...chiIn)).toBeGreaterThan(0.5); // not all trivially zero
  });

  it('a design with two equal columns is singular', () => {
    const n = 4;
    const design = new Float64Array(2 * 2 * n), residuals = new Float64Array(2 * n).fill(1e-6), weights = new Float64Array(3 * n);
    for (let i = 0; i < n; i++) { design.set([i + 1, i + 1, 2 * i, 2 * i], 4 * i); weights.set([1, 0, 1], 3 * i); }
    const sol = solveNormalEquations(design, residuals, weights, [true, true, true, true], 2);
    expect(sol.singular).toBe(true);
    expect(Number.isNaN(sol.covariance[0])).toBe(true);
  });
});
