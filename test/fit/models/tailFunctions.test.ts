// χ² and normal tails, ln Γ and the regularized incomplete gamma against SciPy 1.10.1
// (test/fixtures/scipy-chi2/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { gammaP, gammaQ, lnGamma } from '../../../src/fit/models/incompleteGamma.js';
import { chiSquareSf, normalSf, normalTwoSidedSf } from '../../../src/fit/models/tailFunctions.js';

const ref = JSON.parse(readFileSync(new URL('../../fixtures/scipy-chi2/chi2Reference.json', import.meta.url), 'utf8'));

function worstRelative(rows: { got: number; want: number }[]): number {
  return rows.reduce((w, r) => Math.max(w, Math.abs(r.got - r.want) / Math.abs(r.want)), 0);
}

describe('chiSquareSf (scipy.stats.chi2.sf)', () => {
  // Measured worst 1.0e-14 relative over dof 1–4 and p from 0.5 to 1e-15; bound 1e-13.
  it('matches over dof 1–4 down to p = 1e-15', () => {
    const rows = (ref.chi2Sf as { dof: number; x: number; sf: number }[]).map((r) => ({ got: chiSquareSf(r.x, r.dof), want: r.sf }));
    expect(rows.length).toBe(4 * 19); // 16 tail levels and 3 small x per dof
    const worst = worstRelative(rows);
    console.log(`chi2.sf: worst relative error ${worst.toExponential(2)} over ${rows.length} points`);
    expect(worst).toBeLessThan(1e-13);
    expect(Math.min(...rows.map((r) => r.want))).toBeLessThan(1.1e-15);
  });
  it('is 1 at x ≤ 0, NaN for NaN, and refuses a bad dof', () => {
    expect(chiSquareSf(0, 2)).toBe(1);
    expect(chiSquareSf(-3, 1)).toBe(1);
    expect(chiSquareSf(NaN, 1)).toBeNaN();
    expect(() => chiSquareSf(1, 0)).toThrow(RangeError);
  });
});

describe('lnGamma and the regularized incomplete gamma (scipy.special)', () => {
  // Measured worst 7e-16 absolute; bound 1e-14.
  it('lnGamma matches gammaln for a = 0.5 … 200', () => {
    for (const r of ref.gammaln as { a: number; lnGamma: number }[]) {
      expect(Math.abs(lnGamma(r.a) - r.lnGamma), `a=${r.a}`).toBeLessThan(1e-14 * Math.max(1, Math.abs(r.lnGamma)));
    }
  });
  // Measured worst 5e-15 relative; bound 1e-13.
  it('gammaQ matches gammaincc on both sides of x = a + 1, and P + Q = 1', () => {
    const rows = (ref.gammaincc as { a: number; x: number; q: number }[]).map((r) => ({ got: gammaQ(r.a, r.x), want: r.q }));
    expect(worstRelative(rows)).toBeLessThan(1e-13);
    for (const r of ref.gammaincc as { a: number; x: number }[]) {
      expect(Math.abs(gammaP(r.a, r.x) + gammaQ(r.a, r.x) - 1)).toBeLessThan(1e-14);
    }
  });
  it('refuses a ≤ 0 and x < 0', () => {
    expect(() => gammaQ(0, 1)).toThrow(RangeError);
    expect(() => gammaP(1, -1)).toThrow(RangeError);
    expect(() => lnGamma(-0.5)).toThrow(RangeError);
  });
});

describe('normal tails (scipy.stats.norm.sf)', () => {
  // Measured worst 8e-15 relative; bound 1e-13.
  it('normalSf matches, and the two-sided tail is twice the one-sided one', () => {
    const rows = (ref.normalSf as { z: number; sf: number }[]).map((r) => ({ got: normalSf(r.z), want: r.sf }));
    expect(worstRelative(rows)).toBeLessThan(1e-13);
    for (const r of ref.normalSf as { z: number; sf: number }[]) {
      expect(normalTwoSidedSf(-r.z)).toBeCloseTo(2 * r.sf, 14);
      expect(normalSf(-r.z)).toBeCloseTo(1 - r.sf, 14);
    }
  });
});
