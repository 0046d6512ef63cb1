// Tail probabilities beyond a null sample's resolution (peaks over threshold, generalized Pareto
// fit) against distributions whose tails are known exactly, and the GPD pieces against SciPy
// (test/fixtures/scipy/tailReference.json; provenance in test/fixtures/scipy/README.md).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { seededRandom, type Random } from '../../src/core/random.js';
import { fitGpdPwmSorted, gpdQuantileOfSurvival, gpdSurvival } from '../../src/detect/tailGpd.js';
import { andersonDarlingGpd, gpdFitPValue } from '../../src/detect/tailGoodnessOfFit.js';
import {
  fitUpperTail, TAIL_FROM_FIT, TAIL_FROM_FRACTION, upperTailProbabilities, upperTailProbability,
} from '../../src/detect/tailExtrapolation.js';
import { upperTailFraction } from '../../src/detect/empiricalTail.js';

const ref = JSON.parse(readFileSync(new URL('../fixtures/scipy/tailReference.json', import.meta.url), 'utf8'));

const gauss = (r: Random): number => Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r()); // Box & Muller 1958
/** Student-t with 3 degrees of freedom: Z / √(χ²₃/3) (common practice). */
const student3 = (r: Random): number => gauss(r) / Math.sqrt((gauss(r) ** 2 + gauss(r) ** 2 + gauss(r) ** 2) / 3);
/** Its survival function in closed form (from memory; checked against SciPy's t.sf below). */
const student3Sf = (x: number): number => 0.5 - (x / (Math.sqrt(3) * (1 + (x * x) / 3)) + Math.atan(x / Math.sqrt(3))) / Math.PI;
const bisect = (sf: (x: number) => number, p: number): number => {
  let lo = 0, hi = 1e7;
  for (let i = 0; i < 200; i++) { const m = 0.5 * (lo + hi); if (sf(m) > p) lo = m; else hi = m; }
  return lo;
};

const KNOWN: { name: string; draw: (r: Random) => number; sf: (x: number) => number; factor: Record<string, number> }[] = [
  // Bounds: about 1.5 times the worst ratio measured over 30 seeds of 400 000 draws (1 000
  // exceedances at the start): exponential 3.5 at 10⁻⁶ and 8.3 at 10⁻⁷, Pareto 3.5 and 6.2,
  // Student-t 7.6 and 21 (its tail reaches the GPD form slowly).
  { name: 'exponential', draw: (r) => -Math.log(1 - r()), sf: (x) => Math.exp(-x), factor: { '1e-6': 5, '1e-7': 12 } },
  { name: 'Pareto, index 3 (ξ = 1/3)', draw: (r) => Math.pow(1 - r(), -1 / 3), sf: (x) => Math.pow(x, -3), factor: { '1e-6': 5, '1e-7': 10 } },
  { name: 'Student-t, 3 degrees of freedom', draw: student3, sf: student3Sf, factor: { '1e-6': 12, '1e-7': 30 } },
];

describe('generalized Pareto pieces', () => {
  it('survival function equals SciPy genpareto.sf within 1e-13 relative', () => {
    let worst = 0;
    for (const c of ref.genparetoSf) {
      const got = gpdSurvival({ shapeXi: c.xi, scaleSigma: c.sigma }, c.y);
      worst = Math.max(worst, c.sf === 0 ? Math.abs(got) : Math.abs(got / c.sf - 1));
    }
    console.log(`GPD survival vs SciPy: worst relative difference ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-13);
  });

  it('the quantile inverts the survival function', () => {
    for (const xi of [-0.2, 0, 0.4]) {
      for (const s of [0.9, 1e-3, 1e-9]) expect(gpdSurvival({ shapeXi: xi, scaleSigma: 2 }, gpdQuantileOfSurvival({ shapeXi: xi, scaleSigma: 2 }, s)) / s).toBeCloseTo(1, 10);
    }
  });

  it('probability-weighted moments give ξ, σ from the sample L-moments SciPy computes (k = λ₁/λ₂ − 2, σ = (1 + k)λ₁)', () => {
    const y = Float64Array.from(ref.gpdSample.values as number[]).sort();
    const fit = fitGpdPwmSorted(y)!;
    const k = ref.gpdSample.l1 / ref.gpdSample.l2 - 2; // Hosking & Wallis 1987, in L-moments (Hosking 1990)
    expect(fit.shapeXi).toBeCloseTo(-k, 12);
    expect(fit.scaleSigma).toBeCloseTo((1 + k) * ref.gpdSample.l1, 12);
    // and lands near the parameters the sample was drawn with (250 values: σ(ξ̂) ≈ 0.08)
    expect(Math.abs(fit.shapeXi - ref.gpdSample.xi)).toBeLessThan(0.25);
    expect(Math.abs(fit.scaleSigma / ref.gpdSample.sigma - 1)).toBeLessThan(0.3);
  });

  it('the goodness of fit accepts GPD samples at about its level and rejects a two-humped sample', () => {
    const random = seededRandom(77);
    let accepted = 0;
    for (let t = 0; t < 20; t++) {
      const y = Float64Array.from({ length: 250 }, () => gpdQuantileOfSurvival({ shapeXi: 0.1, scaleSigma: 1 }, 1 - random())).sort();
      if (gpdFitPValue(y, fitGpdPwmSorted(y)!) >= 0.05) accepted++;
    }
    expect(accepted).toBeGreaterThanOrEqual(16); // binomial(20, 0.95): P(< 16) ≈ 0.3% (common practice)
    const humps = Float64Array.from({ length: 250 }, (_, j) => (j < 125 ? 0.1 : 5) + 0.05 * random()).sort();
    expect(gpdFitPValue(humps, fitGpdPwmSorted(humps)!)).toBeLessThan(0.05);
    expect(andersonDarlingGpd([0.5, 1, 3], { shapeXi: -0.5, scaleSigma: 1 })).toBe(Infinity); // 3 beyond the end point 2
  });
});

describe('tail probabilities beyond the null sample', () => {
  const N = 400_000;
  for (const d of KNOWN) {
    it(`${d.name}: extrapolated P(X ≥ x) within the stated factor of the exact one at 10⁻⁶ and 10⁻⁷ (3 samples of ${N})`, () => {
      for (const seed of [1, 2, 3]) {
        const r = seededRandom(seed);
        const sample = Float64Array.from({ length: N }, () => d.draw(r)).sort();
        const fit = fitUpperTail(sample, 1000).fit;
        expect(fit).not.toBeNull();
        for (const level of ['1e-6', '1e-7']) {
          const x = bisect(d.sf, Number(level));
          const got = upperTailProbability(sample, fit, x);
          const ratio = got.p / d.sf(x);
          console.log(`${d.name}, seed ${seed}: at exact ${level} got ${got.p.toExponential(2)} (ratio ${ratio.toFixed(2)}; ξ ${fit!.gpd.shapeXi.toFixed(3)}, ${fit!.exceedances} exceedances)`);
          expect(got.from).toBe(TAIL_FROM_FIT);
          expect(Math.max(ratio, 1 / ratio)).toBeLessThan(d.factor[level]);
        }
      }
    });
  }

  it('Student-t closed form equals SciPy t.sf (3 degrees of freedom) within 1e-8 relative', () => {
    // 1e-8: at x = 300 the closed form subtracts from 0.5 a number within 1e-8 of it (measured 2e-9).
    for (const c of ref.studentT3Sf) expect(Math.abs(student3Sf(c.x) / c.sf - 1)).toBeLessThan(1e-8);
  });

  it('keeps the plain tail fraction where 10 or more null values are as high, and everywhere when no fit is accepted', () => {
    const r = seededRandom(9);
    const sample = Float64Array.from({ length: 50_000 }, () => -Math.log(1 - r())).sort();
    const fit = fitUpperTail(sample).fit!;
    const x10 = sample[sample.length - 10]; // 10 values ≥ it
    expect(upperTailProbability(sample, fit, x10)).toEqual({ p: upperTailFraction(sample, x10), from: TAIL_FROM_FRACTION });
    const x9 = sample[sample.length - 9];
    const beyond = upperTailProbability(sample, fit, x9);
    expect(beyond.from).toBe(TAIL_FROM_FIT);
    expect(beyond.p / (10 / 50_001)).toBeGreaterThan(0.4); // continues the empirical tail there (within its Poisson noise)
    expect(beyond.p / (10 / 50_001)).toBeLessThan(2.5);
    // No fit: a sample whose top 320 are eight tight clumps of 40 (at 1, 2, …, 8) above a
    // uniform body: a staircase no GPD fits at any number of exceedances from 250 to 50.
    const humps = Float64Array.from({ length: 2_000 }, (_, j) => (j < 320 ? 1 + Math.floor(j / 40) + 1e-6 * r() : 0.5 * r())).sort();
    const none = fitUpperTail(humps);
    expect(none.fit).toBeNull();
    expect(none.attempts).toBe(21); // 250, 240, …, 50
    const cols = upperTailProbabilities(humps, none.fit, [20, 7.5]);
    expect([...cols.from]).toEqual([TAIL_FROM_FRACTION, TAIL_FROM_FRACTION]);
    expect(cols.p[0]).toBe(1 / 2_001);
  });

  it('a bounded tail (uniform sample: fitted ξ < 0) is extrapolated as exponential, never lighter', () => {
    const r = seededRandom(10);
    const sample = Float64Array.from({ length: 100_000 }, () => r()).sort();
    const fit = fitUpperTail(sample).fit!;
    expect(fit.gpd.shapeXi).toBeLessThan(-0.5); // the uniform's exact tail: ξ = −1 (common practice)
    expect(fit.extrapolateWith.shapeXi).toBe(0);
    const p = upperTailProbability(sample, fit, 1.0005).p; // beyond the end point of the true distribution
    expect(p).toBeGreaterThan(0);
  });
});
