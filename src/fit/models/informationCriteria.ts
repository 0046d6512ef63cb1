/**
 * Information criteria of a least-squares fit with Gaussian errors of known (assumed) weights,
 * for which −2 ln L = χ² + a constant shared by every model fitted to the same residuals:
 *   AIC = χ² + 2k          (Akaike 1974, IEEE Trans. Automatic Control 19, 716)
 *   BIC = χ² + k ln n      (Schwarz 1978, Annals of Statistics 6, 461)
 * k the number of fitted parameters, n the number of scalar residuals (two per optical
 * observation: α cos δ and δ). Only differences between models fitted to the same residuals
 * mean anything; the shared constant is left out.
 */

function check(chiSquare: number, nParams: number, nResiduals: number): void {
  if (!(chiSquare >= 0)) throw new RangeError(`information criterion: χ² must be ≥ 0, got ${chiSquare}`);
  if (!Number.isInteger(nParams) || nParams < 0) throw new RangeError(`information criterion: bad parameter count ${nParams}`);
  if (!Number.isInteger(nResiduals) || nResiduals < 1) throw new RangeError(`information criterion: bad residual count ${nResiduals}`);
}

/** Akaike's information criterion, χ² + 2k. */
export function akaikeCriterion(chiSquare: number, nParams: number, nResiduals: number): number {
  check(chiSquare, nParams, nResiduals);
  return chiSquare + 2 * nParams;
}

/** Schwarz's Bayesian information criterion, χ² + k ln n. */
export function bayesianCriterion(chiSquare: number, nParams: number, nResiduals: number): number {
  check(chiSquare, nParams, nResiduals);
  return chiSquare + nParams * Math.log(nResiduals);
}
