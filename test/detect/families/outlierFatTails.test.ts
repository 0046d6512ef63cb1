// Fat tails: a synthetic catalogue whose density has heavy (Student-t) tails. A score that
// assumes a Gaussian background flags far more than α; the calibrated isolation score does not.
import { describe, expect, it } from 'vitest';
import { seededRandom, type Random } from '../../../src/core/random.js';
import { calibratedIsolation, DEFAULT_PROPER_OUTLIER_OPTIONS } from '../../../src/detect/families/outliers.js';
import { describeRate, nullRate } from './helpers/nullRate.js';

/** Standard normal deviate by the Box–Muller transform (Box & Muller 1958, Ann. Math. Stat. 29, 610). */
function normal(random: Random): number {
  return Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

/**
 * N points of an isotropic 3-D Student-t with ν = 3 (a normal vector divided by √(χ²_ν/ν),
 * the definition of the multivariate t, common practice), scale 0.02 scaled units, centred on
 * (1.0, 0.2, 0.2) (a ≈ 2.45 au, e ≈ sin i ≈ 0.14) and kept inside a box of half-width 0.19, so
 * e and sin i stay positive. Invented data for a synthetic test.
 */
function studentTCatalogue(n: number, random: Random): Float64Array {
  const out = new Float64Array(3 * n);
  for (let j = 0; j < n;) {
    let chi2 = 0;
    for (let t = 0; t < 3; t++) chi2 += normal(random) ** 2;
    const f = 0.02 / Math.sqrt(chi2 / 3);
    const x = normal(random) * f, y = normal(random) * f, z = normal(random) * f;
    if (Math.max(Math.abs(x), Math.abs(y), Math.abs(z)) > 0.19) continue;
    out.set([1 + x, 0.2 + y, 0.2 + z], 3 * j++);
  }
  return out;
}

/** The fraction a Gaussian background flags: squared Mahalanobis distance from the sample mean
 * and covariance beyond the χ²₃ quantile. */
function gaussianFlagged(xyz: Float64Array, chi2Quantile: number): number {
  const n = xyz.length / 3;
  const m = [0, 0, 0];
  for (let j = 0; j < n; j++) for (let c = 0; c < 3; c++) m[c] += xyz[3 * j + c] / n;
  const C = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
  for (let j = 0; j < n; j++) for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) C[r][c] += (xyz[3 * j + r] - m[r]) * (xyz[3 * j + c] - m[c]) / (n - 1);
  const [[a, b, c], [d, e, f], [g, h, i]] = C;
  const det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
  const inv = [[e * i - f * h, c * h - b * i, b * f - c * e], [f * g - d * i, a * i - c * g, c * d - a * f], [d * h - e * g, b * g - a * h, a * e - b * d]];
  let flagged = 0;
  for (let j = 0; j < n; j++) {
    const v = [xyz[3 * j] - m[0], xyz[3 * j + 1] - m[1], xyz[3 * j + 2] - m[2]];
    let q = 0;
    for (let r = 0; r < 3; r++) for (let s = 0; s < 3; s++) q += (v[r] * inv[r][s] * v[s]) / det;
    if (q > chi2Quantile) flagged++;
  }
  return flagged / n;
}

describe('a heavy-tailed background', () => {
  it('a Gaussian-assumption score flags several times α; the calibrated score stays near α', () => {
    const n = 30_000;
    const xyz = studentTCatalogue(n, seededRandom(1));
    // χ²₃ upper 1% point (SciPy 1.17.1: scipy.stats.chi2.ppf(0.99, 3) = 11.344866730144373).
    const gaussian = gaussianFlagged(xyz, 11.344866730144373);
    const run = calibratedIsolation(xyz, seededRandom(51), { ...DEFAULT_PROPER_OUTLIER_OPTIONS, replicates: 4 });
    const at01 = nullRate(run.nullTailFraction, 0.01, run.calibration.nullScoresSorted.length);
    const at05 = nullRate(run.nullTailFraction, 0.05, run.calibration.nullScoresSorted.length);
    console.log(`Student-t ν = 3, ${n} bodies: Gaussian background flags ${(100 * gaussian).toFixed(2)}% at α = 0.01; ` +
      `calibrated ${describeRate(at01)}; ${describeRate(at05)}`);
    expect(gaussian).toBeGreaterThan(3 * 0.01); // measured 4.9–5.0% over three catalogues
    // The background is re-estimated from the catalogue, so the rate is near, not exactly, α:
    // measured 1.19% at α = 0.01 and 5.89% at 0.05 (the default null, every body drawn alike,
    // and the score's clump weights, which clip some of the sharp peak; without them 0.79%, 5.47%);
    // bounds 1.5α and 1.25α. With families down-weighted it was 1.10–1.27% and 5.49–5.65% over
    // three catalogues at a cap of 8, 1.8–2.0% at α = 0.01 at a cap of 2.
    expect(at01.rate).toBeLessThan(1.5 * 0.01);
    expect(at01.rate).toBeGreaterThan(0.5 * 0.01);
    expect(at05.rate).toBeLessThan(1.25 * 0.05);
    expect(at05.rate).toBeGreaterThan(0.75 * 0.05);
  });
});
