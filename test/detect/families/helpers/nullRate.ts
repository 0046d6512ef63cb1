/**
 * How often tail fractions fall at or below α, against the binomial uncertainty of that rate.
 * Under a correctly calibrated null, a body's null tail fraction is ≤ α with probability α; over N bodies the
 * observed rate has standard deviation √(α(1 − α)/N) (binomial, common practice), and the
 * threshold itself is read from a pooled null sample of size N_null, adding α(1 − α)/N_null to
 * the variance (the sampling variance of an empirical quantile's level, common practice).
 */
export interface NullRate { alpha: number; rate: number; sigma: number; within: boolean }

export function nullRate(fractions: Float64Array, alpha: number, nullSize: number, sigmas = 3): NullRate {
  let hits = 0;
  for (let j = 0; j < fractions.length; j++) if (fractions[j] <= alpha) hits++;
  const rate = hits / fractions.length;
  const sigma = Math.sqrt(alpha * (1 - alpha) * (1 / fractions.length + 1 / nullSize));
  return { alpha, rate, sigma, within: Math.abs(rate - alpha) <= sigmas * sigma };
}

export function describeRate(r: NullRate): string {
  return `α = ${r.alpha}: observed ${(100 * r.rate).toFixed(3)}% ± ${(100 * r.sigma).toFixed(3)}% (1σ)`;
}
