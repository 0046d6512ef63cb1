/**
 * The generalized Pareto distribution (GPD) of exceedances y ≥ 0 over a high threshold
 * (Pickands 1975, Ann. Stat. 3, 119: the limit law of exceedances of almost any continuous
 * distribution), with shape ξ and scale σ > 0:
 *
 *   S(y) = 1 − F(y) = (1 + ξ·y/σ)^(−1/ξ)   (ξ ≠ 0),   exp(−y/σ)   (ξ = 0),
 *
 * 0 beyond the upper end point y = −σ/ξ when ξ < 0. ξ > 0: a power-law (Pareto, Student-t) tail,
 * ξ = 0: exponential-like, ξ < 0: a bounded tail. Hosking & Wallis 1987 (Technometrics 29,
 * 339) write k = −ξ and α = σ.
 *
 * Parameters by probability-weighted moments (Hosking & Wallis 1987, §3, eq. for k̂ and α̂):
 * with a_s = E[Y (1 − F(Y))^s],  k = a₀/(a₀ − 2a₁) − 2,  σ = 2a₀a₁/(a₀ − 2a₁). The sample
 * moments are the unbiased ones (Landwehr, Matalas & Wallis 1979, Water Resour. Res. 15, 1055):
 * b₀ = mean, b₁ = Σ (j−1)/(n−1)·y₍ⱼ₎/n over the ascending order statistics, and a₀ = b₀,
 * a₁ = b₀ − b₁. In L-moments (λ₁ = b₀, λ₂ = 2b₁ − b₀) this is k = λ₁/λ₂ − 2, σ = (1 + k)λ₁,
 * which the tests check against SciPy's sample L-moments. The estimator has finite variance
 * for ξ < 1/2 (Hosking & Wallis 1987, §3); it needs no iteration and always returns.
 */

export interface GpdParameters {
  readonly shapeXi: number; // ξ (= −k of Hosking & Wallis)
  readonly scaleSigma: number; // σ > 0, in the units of the exceedances
}

/** Survival function S(y) = P(Y ≥ y) of the GPD; 1 for y ≤ 0, 0 beyond the end point (ξ < 0). */
export function gpdSurvival(p: GpdParameters, y: number): number {
  if (!(y > 0)) return 1;
  const z = y / p.scaleSigma;
  if (p.shapeXi === 0) return Math.exp(-z);
  const base = 1 + p.shapeXi * z;
  if (!(base > 0)) return 0;
  return Math.exp(-Math.log1p(p.shapeXi * z) / p.shapeXi);
}

/** The GPD quantile y with S(y) = survival (the inverse used to draw from it), survival in (0, 1]. */
export function gpdQuantileOfSurvival(p: GpdParameters, survival: number): number {
  if (p.shapeXi === 0) return -p.scaleSigma * Math.log(survival);
  return (p.scaleSigma / p.shapeXi) * Math.expm1(-p.shapeXi * Math.log(survival));
}

/**
 * PWM estimates from exceedances sorted ascending (all > 0 and finite), or null when the
 * moments admit no GPD (λ₂ ≤ 0: fewer than two distinct values). Needs at least 2 values.
 */
export function fitGpdPwmSorted(ySorted: ArrayLike<number>): GpdParameters | null {
  const n = ySorted.length;
  if (n < 2) throw new RangeError(`fitGpdPwmSorted: needs at least 2 exceedances, got ${n}`);
  let b0 = 0, b1 = 0;
  for (let j = 0; j < n; j++) {
    b0 += ySorted[j];
    b1 += (j / (n - 1)) * ySorted[j]; // (j−1)/(n−1) with j counted from 1
  }
  b0 /= n;
  b1 /= n;
  const l2 = 2 * b1 - b0;
  if (!(l2 > 0) || !Number.isFinite(b0)) return null;
  const k = b0 / l2 - 2;
  const sigma = (1 + k) * b0;
  if (!(sigma > 0)) return null;
  return { shapeXi: -k, scaleSigma: sigma };
}
