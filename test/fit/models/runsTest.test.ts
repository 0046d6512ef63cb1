// The runs test on residual signs: the normal approximation against statsmodels'
// runstest_1samp (cutoff 0, no continuity correction), the exact distribution against the
// count over every arrangement of the signs (test/fixtures/statsmodels-runs/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runsProbability, runsTest } from '../../../src/fit/models/runsTest.js';

const ref = JSON.parse(readFileSync(new URL('../../fixtures/statsmodels-runs/runsReference.json', import.meta.url), 'utf8'));

describe('runsTest: normal approximation (statsmodels runstest_1samp)', () => {
  // Measured: z identical to the last bit, p within 1e-15 relative; bounds 1e-12.
  for (const s of ref.normalApproximation as { name: string; residuals: number[]; z: number; pTwoSided: number }[]) {
    it(`${s.name}: z and the two-sided p`, () => {
      const r = runsTest(s.residuals);
      expect(Math.abs(r.z - s.z)).toBeLessThan(1e-12);
      expect(Math.abs(r.pTwoSidedNormal - s.pTwoSided) / s.pTwoSided).toBeLessThan(1e-12);
      expect(r.nPositive + r.nNegative).toBe(s.residuals.length);
    });
  }
  it('the trend leaves too few runs, the alternating sequence too many', () => {
    const byName = Object.fromEntries((ref.normalApproximation as { name: string; residuals: number[] }[]).map((s) => [s.name, runsTest(s.residuals)]));
    expect(byName.trend80.pFewRunsNormal).toBeLessThan(1e-4);
    expect(byName.trend80.pFewRunsExact).toBeLessThan(1e-4);
    expect(byName.alternating30.runs).toBe(30);
    expect(byName.alternating30.pFewRunsExact).toBeGreaterThan(0.999);
    expect(byName.independent60.pFewRunsNormal).toBeGreaterThan(0.05);
  });
});

describe('runsTest: exact distribution (Swed & Eisenhart 1943; counted over every arrangement)', () => {
  // Measured worst 2e-15 absolute; bound 1e-13.
  it('P(R = r) matches the enumeration', () => {
    for (const e of ref.exactPmf as { n1: number; n2: number; runs: number[]; pmf: number[] }[]) {
      e.runs.forEach((r, i) => {
        expect(Math.abs(runsProbability(r, e.n1, e.n2) - e.pmf[i]), `(${e.n1}, ${e.n2}) R=${r}`).toBeLessThan(1e-13);
        expect(Math.abs(runsProbability(r, e.n2, e.n1) - e.pmf[i])).toBeLessThan(1e-13);
      });
    }
  });
  it('the exact lower tail is the sum of the enumerated probabilities up to the observed runs', () => {
    // 5 positive then 6 negative: 2 runs, the least possible; then split into 4 runs.
    const e = (ref.exactPmf as { n1: number; n2: number; pmf: number[] }[]).find((x) => x.n1 === 5 && x.n2 === 6)!;
    const two = runsTest([1, 2, 3, 4, 5, -1, -2, -3, -4, -5, -6]);
    expect(two.runs).toBe(2);
    expect(two.pFewRunsExact).toBeCloseTo(e.pmf[0], 15);
    const four = runsTest([1, 2, 3, -1, -2, -3, 4, 5, -4, -5, -6]);
    expect(four.runs).toBe(4);
    expect(four.pFewRunsExact).toBeCloseTo(e.pmf[0] + e.pmf[1] + e.pmf[2], 15);
  });
});

describe('runsTest: edge cases', () => {
  it('leaves exact zeros out and counts them', () => {
    const r = runsTest([0.5, 0, 0.3, -0.2, 0, -0.1, 0.4]);
    expect(r.zeros).toBe(2);
    expect(r.n).toBe(5);
    expect(r.runs).toBe(3);
  });
  it('gives NaN statistics when every residual has one sign', () => {
    const r = runsTest([1, 2, 3]);
    expect(r.runs).toBe(1);
    expect(r.z).toBeNaN();
    expect(r.pFewRunsExact).toBeNaN();
  });
  it('sums the exact tail up to n = 200 signs and leaves it NaN beyond', () => {
    const signs = (n: number) => Array.from({ length: n }, (_, i) => (Math.floor(i / 10) % 2 === 0 ? 1 : -1));
    expect(runsTest(signs(200)).pFewRunsExact).toBeGreaterThanOrEqual(0);
    expect(runsTest(signs(200)).pFewRunsExact).toBeLessThan(1e-6);
    expect(runsTest(signs(201)).pFewRunsExact).toBeNaN();
    expect(runsTest(signs(201)).pFewRunsNormal).toBeLessThan(1e-6);
  });
  it('refuses NaN residuals', () => {
    expect(() => runsTest([1, NaN, -1])).toThrow(RangeError);
  });
});
