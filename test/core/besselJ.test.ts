import { describe, expect, it } from 'vitest';
import { besselJSequence, besselMillerStart } from '../../src/core/series/besselJ.js';

/**
 * J_n(x) from Bessel's integral, J_n(x) = (1/π) ∫_0^π cos(nθ − x sin θ) dθ (Abramowitz &
 * Stegun 1964, eq. 9.1.21), by the trapezoid rule on the full period [0, 2π], which is
 * exact to rounding for a trigonometric polynomial of degree below the point count
 * (common practice); 4 096 points cover n + |x| ≲ 2 000 with room to spare.
 */
function besselIntegral(n: number, x: number): number {
  const points = 4096;
  let sum = 0;
  for (let k = 0; k < points; k++) {
    const theta = (2 * Math.PI * k) / points;
    sum += Math.cos(n * theta - x * Math.sin(theta));
  }
  return sum / points;
}

describe('Bessel functions J_0 … J_{n−1} by Miller\'s backward recurrence (A&S §9.12)', () => {
  it('match Bessel\'s integral (A&S 9.1.21) for small, moderate, large and negative x', () => {
    const out = new Float64Array(120);
    let worst = 0;
    for (const x of [1e-6, 0.3, 1.14, 2.404825557695773, 7.5, 40, 95, -3.2]) {
      besselJSequence(x, 120, out);
      for (let n = 0; n < 120; n++) worst = Math.max(worst, Math.abs(out[n] - besselIntegral(n, x)));
    }
    console.log(`J_n(x), n < 120, vs Bessel's integral: worst ${worst.toExponential(2)}`);
    // Loosened from a few ulps: the reference's cosine arguments reach |x| = 95 rad, whose
    // rounding (95 × 1.1e-16 per sample) sets its own floor near 1e-14.
    expect(worst).toBeLessThan(2e-14);
  });

  it('reproduces tabulated values J_0(1) and J_1(1) (A&S Table 9.1)', () => {
    // A&S Table 9.1 (from memory, 10 digits): J_0(1) = 0.7651976866, J_1(1) = 0.4400505857.
    const out = new Float64Array(2);
    besselJSequence(1, 2, out);
    expect(Math.abs(out[0] - 0.7651976866)).toBeLessThan(1e-10);
    expect(Math.abs(out[1] - 0.4400505857)).toBeLessThan(1e-10);
  });

  it('gives J_0(0) = 1 and J_n(0) = 0, and a start order past both x and the count', () => {
    const out = new Float64Array(5).fill(7);
    besselJSequence(0, 5, out);
    expect(Array.from(out)).toEqual([1, 0, 0, 0, 0]);
    const start = besselMillerStart(50, 10);
    expect(start).toBeGreaterThan(50);
    expect(start % 2).toBe(0);
  });

  it('rejects bad counts, non-finite arguments and a start order below x with RangeError', () => {
    const out = new Float64Array(4);
    expect(() => besselJSequence(1, 0, out)).toThrow(RangeError);
    expect(() => besselJSequence(1, 5, out)).toThrow(RangeError);
    expect(() => besselJSequence(Number.NaN, 2, out)).toThrow(RangeError);
    expect(() => besselJSequence(30, 2, out, 10)).toThrow(/start order 10/);
  });
});
