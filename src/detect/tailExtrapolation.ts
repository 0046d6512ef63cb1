/**
 * Tail probabilities beyond the resolution of a finite null sample, by peaks over threshold
 * (Knijnenburg, Wessels, Reinders & Shmulevich 2009, Bioinformatics 25, i161, "Fewer
 * permutations, more accurate P-values"):
 *  - a generalized Pareto distribution (tailGpd.ts) is fitted to the exceedances of the
 *    N_exc largest values of the null sample over a threshold t halfway between the N_exc-th
 *    and the (N_exc + 1)-th largest; N_exc starts at 250;
 *  - the fit is checked by the Anderson–Darling statistic (tailGoodnessOfFit.ts); when it is
 *    rejected at the 0.05 level, N_exc is lowered by 10 and the fit tried again (down to
 *    TAIL_EXCEEDANCES_MIN, our choice; the paper's lower limit is not restated here);
 *  - a value x with fewer than 10 null values at least as high gets
 *    P(X ≥ x) ≈ (N_exc / N) · S_GPD(x − t); any other value, or every value when no fit was
 *    accepted, keeps the plain tail fraction (1 + #{null ≥ x}) / (N + 1) (empiricalTail.ts).
 * Departure: the paper uses maximum likelihood; the parameters here come from probability-
 * weighted moments (Hosking & Wallis 1987, cited in the paper as the alternative), which need no
 * iteration, and the goodness of fit's p-value from a parametric bootstrap for that estimator.
 * Second departure, for false-alarm probabilities that err high rather than low: a fitted ξ < 0
 * (a bounded tail) is not extrapolated with; the exponential tail (ξ = 0) is used instead.
 * Measured (30 samples of 400 000 exponential deviates, 250 exceedances): PWM put ξ between
 * −0.19 and +0.16, and with the negative ones the extrapolated P at a true 10⁻⁶ came out up to
 * 280 times too small (the end point fell just beyond it); with the exponential in their place
 * the worst was 2.4 times too small, 3.5 times too large.
 *
 * An extrapolated probability is a model estimate, not a count: below 1/(N + 1) nothing in the
 * null sample supports it but the fitted tail shape. Pure functions of data in, data out.
 */
import { countAtLeast, upperTailFraction } from './empiricalTail.js';
import { countsAtLeast } from './tailCountsAtLeast.js';
import { gpdFitPValue } from './tailGoodnessOfFit.js';
import { fitGpdPwmSorted, gpdSurvival, type GpdParameters } from './tailGpd.js';

/** First number of exceedances tried (Knijnenburg et al. 2009). */
export const TAIL_EXCEEDANCES_START = 250;
/** Step down when a fit is rejected, per 250 exceedances at the start (Knijnenburg et al. 2009: 10 from 250). */
export const TAIL_EXCEEDANCES_STEP_PER_250 = 10;
/** Fewest exceedances fitted (our choice: below 50 the shape ξ is too loose to extrapolate with). */
export const TAIL_EXCEEDANCES_MIN = 50;
/** A fit whose goodness-of-fit p-value is below this is rejected (Knijnenburg et al. 2009). */
export const TAIL_FIT_REJECT_BELOW = 0.05;
/** The fit replaces the plain fraction for values with fewer than this many null values as high (Knijnenburg et al. 2009). */
export const TAIL_FIT_BELOW_COUNT = 10;

export interface UpperTailFit {
  readonly thresholdT: number; // t, in the units of the sample
  readonly exceedances: number; // N_exc: sample values above t
  readonly sampleSize: number; // N
  readonly gpd: GpdParameters; // of the exceedances x − t
  readonly extrapolateWith: GpdParameters; // gpd, or the exponential tail (ξ = 0, σ = mean exceedance) when gpd.shapeXi < 0
  readonly fitPValue: number; // Anderson–Darling, parametric bootstrap
}

export interface UpperTailFitResult {
  readonly fit: UpperTailFit | null; // null: no fit accepted (or the sample too small)
  readonly attempts: number; // numbers of exceedances tried
  readonly bestRejectedPValue: number; // the highest goodness-of-fit p-value among rejected fits; NaN when none was rejected
}

/**
 * Peaks-over-threshold fit of the upper tail of an ascending sample, by the procedure above,
 * starting from `startExceedances` (default 250, the paper's; a larger start steps down in
 * proportion: 40 at a time from 1 000).
 */
export function fitUpperTail(sortedAsc: Float64Array, startExceedances: number = TAIL_EXCEEDANCES_START): UpperTailFitResult {
  if (!Number.isInteger(startExceedances) || startExceedances < TAIL_EXCEEDANCES_MIN) {
    throw new RangeError(`fitUpperTail: start exceedances must be an integer ≥ ${TAIL_EXCEEDANCES_MIN}, got ${startExceedances}`);
  }
  const n = sortedAsc.length;
  const step = Math.max(1, Math.round((startExceedances / 250) * TAIL_EXCEEDANCES_STEP_PER_250));
  let attempts = 0, bestRejected = NaN;
  for (let nExc = startExceedances; nExc >= TAIL_EXCEEDANCES_MIN; nExc -= step) {
    if (nExc >= n) continue;
    attempts++;
    const t = 0.5 * (sortedAsc[n - nExc] + sortedAsc[n - nExc - 1]);
    if (!Number.isFinite(t)) continue;
    const y = new Float64Array(nExc);
    for (let j = 0; j < nExc; j++) y[j] = sortedAsc[n - nExc + j] - t; // ascending
    if (!(y[0] > 0) || !Number.isFinite(y[nExc - 1])) continue; // ties at t, or infinite values
    const gpd = fitGpdPwmSorted(y);
    if (gpd === null) continue;
    const fitPValue = gpdFitPValue(y, gpd);
    if (fitPValue >= TAIL_FIT_REJECT_BELOW) {
      return { fit: { thresholdT: t, exceedances: nExc, sampleSize: n, gpd, extrapolateWith: notLighterThanExponential(gpd, y), fitPValue }, attempts, bestRejectedPValue: bestRejected };
    }
    if (!(fitPValue <= bestRejected)) bestRejected = fitPValue;
  }
  return { fit: null, attempts, bestRejectedPValue: bestRejected };
}

/**
 * The fitted GPD, or for a fitted ξ < 0 (a bounded tail) the exponential tail with the
 * exceedances' mean as its scale (the maximum-likelihood exponential; common practice).
 */
function notLighterThanExponential(gpd: GpdParameters, y: Float64Array): GpdParameters {
  if (gpd.shapeXi >= 0) return gpd;
  let sum = 0;
  for (let j = 0; j < y.length; j++) sum += y[j];
  return { shapeXi: 0, scaleSigma: sum / y.length };
}

/** How a tail probability was obtained. */
export const TAIL_FROM_FRACTION = 0; // plain (1 + count) / (N + 1)
export const TAIL_FROM_FIT = 1; // extrapolated by the GPD fit
export const TAIL_FROM_FRACTION_BEYOND_FIT = 2; // the fit's value underflows to 0 this far out: the plain fraction, an upper bound

/** P(X ≥ x) estimated from the ascending null sample and its tail fit (or null), with how it was obtained. */
export function upperTailProbability(sortedAsc: Float64Array, fit: UpperTailFit | null, x: number): { p: number; from: number } {
  if (fit !== null && fit.sampleSize !== sortedAsc.length) {
    throw new RangeError(`upperTailProbability: the fit is of a sample of ${fit.sampleSize}, not ${sortedAsc.length}`);
  }
  if (fit === null || countAtLeast(sortedAsc, x) >= TAIL_FIT_BELOW_COUNT) return { p: upperTailFraction(sortedAsc, x), from: TAIL_FROM_FRACTION };
  const p = (fit.exceedances / fit.sampleSize) * gpdSurvival(fit.extrapolateWith, x - fit.thresholdT);
  if (p > 0) return { p, from: TAIL_FROM_FIT };
  return { p: upperTailFraction(sortedAsc, x), from: TAIL_FROM_FRACTION_BEYOND_FIT };
}

/**
 * upperTailProbability of each value, into new columns: the same numbers, with the counts of the
 * sample at least as high found once per value and through a guide table (tailCountsAtLeast.ts).
 * `counts`: those counts when the caller has them already (countsAtLeast(sortedAsc, xs)).
 */
export function upperTailProbabilities(
  sortedAsc: Float64Array, fit: UpperTailFit | null, xs: ArrayLike<number>, counts: Int32Array = countsAtLeast(sortedAsc, xs),
): { p: Float64Array; from: Uint8Array } {
  if (fit !== null && fit.sampleSize !== sortedAsc.length) {
    throw new RangeError(`upperTailProbabilities: the fit is of a sample of ${fit.sampleSize}, not ${sortedAsc.length}`);
  }
  if (counts.length !== xs.length) throw new RangeError(`upperTailProbabilities: ${counts.length} counts for ${xs.length} values`);
  const n = sortedAsc.length;
  const p = new Float64Array(xs.length);
  const from = new Uint8Array(xs.length); // TAIL_FROM_FRACTION (0) unless set below
  for (let j = 0; j < xs.length; j++) {
    const fraction = (1 + counts[j]) / (n + 1); // upperTailFraction
    if (fit === null || counts[j] >= TAIL_FIT_BELOW_COUNT) { p[j] = fraction; continue; }
    const extrapolated = (fit.exceedances / fit.sampleSize) * gpdSurvival(fit.extrapolateWith, xs[j] - fit.thresholdT);
    if (extrapolated > 0) { p[j] = extrapolated; from[j] = TAIL_FROM_FIT; } else { p[j] = fraction; from[j] = TAIL_FROM_FRACTION_BEYOND_FIT; }
  }
  return { p, from };
}
