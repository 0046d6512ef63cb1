import { describe, expect, it } from 'vitest';
import { chebyshevFit, chebyshevNode, chebyshevValue, chebyshevValue3 } from '../../src/core/series/chebyshev.js';

/** Coefficients of the Chebyshev interpolant of f on [-1, 1] with n nodes. */
function fit(f: (x: number) => number, n: number): Float64Array {
  const values = new Float64Array(n);
  for (let k = 0; k < n; k++) values[k] = f(chebyshevNode(k, n));
  const c = new Float64Array(n);
  chebyshevFit(values, 0, 1, n, c, 0);
  return c;
}

/** Modified Bessel function I_k(1) from its defining power series (Abramowitz & Stegun 9.6.10). */
function besselI1(k: number): number {
  let sum = 0;
  let term = 1;
  for (let j = 1; j <= k; j++) term /= 2 * j; // (1/2)^k / k!
  for (let m = 0; m < 30; m++) {
    sum += term;
    term *= 0.25 / ((m + 1) * (m + 1 + k));
  }
  return sum;
}

describe('Chebyshev fitting at the nodes (Numerical Recipes §5.8)', () => {
  it('reproduces the Chebyshev expansion of e^x: c_0 = I_0(1), c_k = 2 I_k(1)', () => {
    // Abramowitz & Stegun 9.6.34: e^{z cos θ} = I_0(z) + 2 Σ_k I_k(z) cos kθ, i.e. with
    // x = cos θ the Chebyshev coefficients of e^x are I_0(1) and 2 I_k(1).
    const c = fit(Math.exp, 16);
    let worst = 0;
    for (let k = 0; k < 10; k++) {
      const expected = (k === 0 ? 1 : 2) * besselI1(k);
      worst = Math.max(worst, Math.abs(c[k] - expected));
    }
    console.log(`e^x Chebyshev coefficients vs 2 I_k(1): worst ${worst.toExponential(2)}`);
    // Aliasing of the truncated tail (c_16 ~ 1e-17) plus rounding: a few ulps.
    expect(worst).toBeLessThan(1e-15);
  });

  it('recovers a cubic exactly: x³ − 2x + 1 = 1·T0 − (5/4)·T1 + (1/4)·T3', () => {
    // x³ = (3 T1 + T3)/4 (Mason & Handscomb 2003, §1.2; common practice).
    const c = fit((x) => x * x * x - 2 * x + 1, 6);
    const expected = [1, -1.25, 0, 0.25, 0, 0];
    for (let k = 0; k < 6; k++) expect(Math.abs(c[k] - expected[k])).toBeLessThan(1e-15);
  });

  it('evaluates values and derivatives of smooth functions to near machine precision', () => {
    const n = 24;
    const fx = (x: number) => Math.sin(3 * x + 0.4);
    const fy = (x: number) => Math.exp(-x) * Math.cos(2 * x);
    const fz = (x: number) => 1 / (2.5 - x);
    const dfx = (x: number) => 3 * Math.cos(3 * x + 0.4);
    const dfy = (x: number) => -Math.exp(-x) * (Math.cos(2 * x) + 2 * Math.sin(2 * x));
    const dfz = (x: number) => 1 / ((2.5 - x) * (2.5 - x));
    const coeffs = new Float64Array(3 * n);
    coeffs.set(fit(fx, n), 0);
    coeffs.set(fit(fy, n), n);
    coeffs.set(fit(fz, n), 2 * n);
    const out = new Float64Array(6);
    let worstValue = 0;
    let worstRate = 0;
    let worstClenshaw = 0;
    for (let k = 0; k <= 200; k++) {
      const x = -1 + k / 100;
      chebyshevValue3(coeffs, 0, n, x, 1, out, 0);
      worstValue = Math.max(worstValue, Math.abs(out[0] - fx(x)), Math.abs(out[1] - fy(x)), Math.abs(out[2] - fz(x)));
      worstRate = Math.max(worstRate, Math.abs(out[3] - dfx(x)), Math.abs(out[4] - dfy(x)), Math.abs(out[5] - dfz(x)));
      worstClenshaw = Math.max(worstClenshaw, Math.abs(chebyshevValue(coeffs, n, n, x) - out[1]));
    }
    console.log(`value ${worstValue.toExponential(2)}, derivative ${worstRate.toExponential(2)}, Clenshaw vs forward ${worstClenshaw.toExponential(2)}`);
    expect(worstValue).toBeLessThan(1e-14);
    // Loosened: differentiation multiplies the rounding of the fitted coefficients (~n·1e-16
    // each) by up to n² ≈ 600 at the interval ends; measured 2.7e-12 with n = 24 and 32 alike,
    // so it is a rounding floor, not truncation.
    expect(worstRate).toBeLessThan(1e-11);
    // Two summation orders of values up to e ≈ 2.7: a few ulps (ulp ≈ 4.4e-16).
    expect(worstClenshaw).toBeLessThan(4e-15);
  });

  it('scales derivatives and leaves the rate slots alone when derivScale is 0', () => {
    const n = 8;
    const coeffs = new Float64Array(3 * n);
    coeffs[1] = 1; // x-axis: T1(x) = x, derivative 1
    const out = new Float64Array(6).fill(-7);
    chebyshevValue3(coeffs, 0, n, 0.3, 0.25, out, 0);
    expect(out[0]).toBe(0.3);
    expect(out[3]).toBe(0.25);
    out.fill(-7);
    chebyshevValue3(coeffs, 0, n, 0.3, 0, out, 0);
    expect(out[3]).toBe(-7);
  });

  it('rejects a non-positive node count with RangeError', () => {
    expect(() => chebyshevFit(new Float64Array(1), 0, 1, 0, new Float64Array(1), 0)).toThrow(RangeError);
  });
});
