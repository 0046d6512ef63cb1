// The model comparison: likelihood-ratio p-values against scipy.stats.chi2.sf
// (test/fixtures/scipy-chi2/README.md); AIC and BIC by their definitions (Akaike 1974; Schwarz
// 1978); the preference rule on invented fit summaries (synthetic: the numbers are chosen to
// sit on either side of each threshold).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { compareModels, type ModelFitSummary } from '../../../src/fit/models/modelComparison.js';

const named: { dof: number; x: number; sf: number }[] = JSON.parse(
  readFileSync(new URL('../../fixtures/scipy-chi2/chi2Reference.json', import.meta.url), 'utf8'),
).chi2Named;
const sf = (dof: number, x: number): number => named.find((r) => r.dof === dof && r.x === x)!.sf;

const N = 400; // scalar residuals: 200 observations
const gravity: ModelFitSummary = { id: 'gravity', chiSquare: 420, nResiduals: N, nParams: 6, params: [] };
const thermal = (chiSquare: number, value = 3e-14, sigma = 1e-14): ModelFitSummary =>
  ({ id: 'thermal', chiSquare, nResiduals: N, nParams: 7, params: [{ name: 'A2', value, sigma }] });

describe('compareModels: Δχ², p-value, AIC, BIC', () => {
  it('gives the χ² tail with Δk degrees of freedom (scipy chi2.sf)', () => {
    const c = compareModels([
      gravity, thermal(411),
      { id: 'comet', chiSquare: 395, nResiduals: N, nParams: 8, params: [{ name: 'A1', value: 1, sigma: 1 }, { name: 'A2', value: 1, sigma: 1 }] },
    ]);
    const t = c.rows.find((r) => r.id === 'thermal')!;
    const k = c.rows.find((r) => r.id === 'comet')!;
    expect(t.deltaChiSquare).toBe(9);
    expect(t.deltaParams).toBe(1);
    expect(Math.abs(t.pValue - sf(1, 9)) / sf(1, 9)).toBeLessThan(1e-13);
    expect(k.deltaParams).toBe(2);
    expect(Math.abs(k.pValue - sf(2, 25)) / sf(2, 25)).toBeLessThan(1e-13);
    expect(c.rows.find((r) => r.id === 'gravity')!.pValue).toBeNaN();
  });
  it('AIC = χ² + 2k and BIC = χ² + k ln n (Akaike 1974; Schwarz 1978)', () => {
    const c = compareModels([gravity, thermal(411)]);
    const t = c.rows[1];
    expect(t.aic).toBe(411 + 14);
    expect(t.bic).toBeCloseTo(411 + 7 * Math.log(400), 12);
    expect(t.deltaBic).toBeCloseTo(-9 + Math.log(400), 12);
    expect(t.deltaAic).toBe(-7);
  });
  it('gives signal-to-noise |value|/σ of each parameter', () => {
    const c = compareModels([gravity, thermal(400, -4.5e-14, 1.5e-14)]);
    expect(c.rows[1].signals[0].signalToNoise).toBeCloseTo(3, 12);
  });
  it('a model no better than gravity gets p = 1', () => {
    const c = compareModels([gravity, thermal(420)]);
    expect(c.rows[1].pValue).toBe(1);
    expect(c.preferred).toBe('gravity');
  });
});

describe('compareModels: the preferred model', () => {
  it('prefers the model when p < threshold and its BIC is lower', () => {
    const c = compareModels([gravity, thermal(380)]);
    expect(c.preferred).toBe('thermal');
    expect(c.reason).toMatch(/^thermal: Δχ² = 40\.00 for 1 more parameter/);
  });
  it('keeps gravity when p < threshold but BIC is not lower (n = 40 000: ln n = 10.6 > Δχ² = 9.5)', () => {
    const big = 40_000;
    const c = compareModels([
      { ...gravity, nResiduals: big, chiSquare: 40_100 },
      { ...thermal(40_090.5), nResiduals: big },
    ]);
    const t = c.rows[1];
    expect(Math.abs(t.pValue - sf(1, 9.5)) / sf(1, 9.5)).toBeLessThan(1e-13);
    expect(t.pValue).toBeLessThan(0.0027);
    expect(t.deltaBic).toBeGreaterThan(0);
    expect(c.preferred).toBe('gravity');
    expect(c.reason).toMatch(/thermal reach p < 0.0027 but do not lower BIC/);
  });
  it('keeps gravity when BIC is lower but p is above the threshold, and follows a looser threshold', () => {
    // Δχ² = 8 with ln 400 = 5.99: BIC favours the model, p = 0.0047 > 0.0027.
    const fits = [gravity, thermal(412)];
    expect(compareModels(fits).preferred).toBe('gravity');
    expect(compareModels(fits, { pValueThreshold: 0.01 }).preferred).toBe('thermal');
  });
  it('among significant models takes the lowest BIC (one parameter beats two for a small gain)', () => {
    const comet: ModelFitSummary = { id: 'comet', chiSquare: 377, nResiduals: N, nParams: 8, params: [] };
    expect(compareModels([gravity, thermal(380), comet]).preferred).toBe('thermal');
    expect(compareModels([gravity, thermal(380), { ...comet, chiSquare: 360 }]).preferred).toBe('comet');
  });
  it('breaks a BIC tie by the smaller number of parameters', () => {
    // Both reach BIC 380 + 7 ln 400 exactly: the two-parameter model with Δχ² larger by ln 400.
    const tied: ModelFitSummary = { id: 'comet', chiSquare: 380 - Math.log(400), nResiduals: N, nParams: 8, params: [] };
    const c = compareModels([gravity, tied, thermal(380)]);
    expect(c.rows[1].bic).toBe(c.rows[2].bic);
    expect(c.preferred).toBe('thermal');
  });
  it('never prefers a fit that did not converge', () => {
    const c = compareModels([gravity, { ...thermal(300), converged: false }]);
    expect(c.preferred).toBe('gravity');
    expect(c.rows[1].eligible).toBe(false);
  });
  it('states the null hypothesis and the rule', () => {
    const c = compareModels([gravity]);
    expect(c.nullHypothesis).toMatch(/gravity only, with Gaussian residual errors of the assumed weights/);
    expect(c.rule).toBe('lowest BIC among gravity and the converged models with p-value < 0.0027');
  });
});

describe('compareModels: misuse', () => {
  it('refuses fits on different residuals, no gravity fit, or no extra parameter', () => {
    expect(() => compareModels([gravity, { ...thermal(400), nResiduals: N - 2 }])).toThrow(/not comparable/);
    expect(() => compareModels([thermal(400)])).toThrow(/exactly one 'gravity'/);
    expect(() => compareModels([gravity, { ...thermal(400), nParams: 6 }])).toThrow(RangeError);
    expect(() => compareModels([gravity], { pValueThreshold: 0 })).toThrow(RangeError);
  });
});
