/**
 * Comparison of non-gravitational models fitted to the same residuals against the
 * gravity-only fit: Δχ², the likelihood-ratio p-value, AIC and BIC, the signal-to-noise of each
 * parameter, and the preferred model by a stated rule.
 *
 * The p-value: with Gaussian errors of the assumed weights, −2 ln(L_gravity/L_model) = Δχ² =
 * χ²_gravity − χ²_model; for nested models (each model gives gravity only at zero parameters)
 * it follows a χ² distribution with Δk = k_model − k_gravity degrees of freedom when gravity
 * alone is true (Wilks 1938, Annals of Mathematical Statistics 9, 60). So p = Pr(χ²_Δk ≥ Δχ²):
 * the probability of a Δχ² at least this large under the null hypothesis "gravity only, errors
 * Gaussian with the assumed weights". It is not the probability that the model is true; with
 * mis-stated weights or unmodelled systematic errors it is too small.
 */
import { akaikeCriterion, bayesianCriterion } from './informationCriteria.js';
import { chiSquareSf } from './tailFunctions.js';

/** One fitted non-gravitational parameter with its 1σ uncertainty (from the fit's covariance). */
export interface FittedParameter {
  name: string;
  value: number;
  sigma: number;
}

/** What the comparison needs of one converged fit: numbers only. */
export interface ModelFitSummary {
  /** Model id ('gravity' for the reference fit; any label for the others, e.g. 'comet+A3'). */
  id: string;
  /** Σ (residual/σ)² over the residuals used, with the assumed weights. */
  chiSquare: number;
  /** Scalar residuals used (two per optical observation), after outlier rejection. */
  nResiduals: number;
  /** Fitted parameters, the six elements included. */
  nParams: number;
  /** The non-gravitational parameters (empty for gravity only). */
  params: readonly FittedParameter[];
  /** False when the fit did not converge: the model is listed but never preferred. Default true. */
  converged?: boolean;
}

export interface ModelComparisonOptions {
  /**
   * A model other than gravity may be preferred only if its p-value is below this. Default
   * 0.0027, the two-sided Gaussian 3σ level (for one parameter Δχ² = 9, S/N ≈ 3).
   */
  pValueThreshold?: number;
}

export const DEFAULT_P_VALUE_THRESHOLD = 0.0027;

export interface ParameterSignal {
  name: string;
  value: number;
  sigma: number;
  /** |value|/σ; NaN when σ is not a positive finite number. */
  signalToNoise: number;
}

export interface ModelComparisonRow {
  id: string;
  chiSquare: number;
  nParams: number;
  /** χ²_gravity − χ²_model (0 for gravity). */
  deltaChiSquare: number;
  /** k_model − k_gravity. */
  deltaParams: number;
  /** Pr(χ²_Δk ≥ Δχ²) under the null (see the file comment); NaN for gravity itself. */
  pValue: number;
  aic: number;
  bic: number;
  /** AIC − AIC_gravity, BIC − BIC_gravity: negative favours the model. */
  deltaAic: number;
  deltaBic: number;
  signals: ParameterSignal[];
  converged: boolean;
  /** Converged and (gravity, or p-value below the threshold). */
  eligible: boolean;
}

export interface ModelComparison {
  rows: ModelComparisonRow[];
  preferred: string;
  /** The rule, in one sentence. */
  rule: string;
  /** Why the preferred model was chosen, with its numbers. */
  reason: string;
  /** The null hypothesis the p-values refer to. */
  nullHypothesis: string;
}

export const COMPARISON_NULL_HYPOTHESIS =
  'gravity only, with Gaussian residual errors of the assumed weights';

function checkFit(f: ModelFitSummary): void {
  if (!(f.chiSquare >= 0) || !Number.isFinite(f.chiSquare)) throw new RangeError(`model '${f.id}': bad χ² ${f.chiSquare}`);
  if (!Number.isInteger(f.nResiduals) || f.nResiduals < 1) throw new RangeError(`model '${f.id}': bad residual count ${f.nResiduals}`);
  if (!Number.isInteger(f.nParams) || f.nParams < 0) throw new RangeError(`model '${f.id}': bad parameter count ${f.nParams}`);
}

function signalsOf(f: ModelFitSummary): ParameterSignal[] {
  return f.params.map((p) => ({
    name: p.name, value: p.value, sigma: p.sigma,
    signalToNoise: p.sigma > 0 && Number.isFinite(p.sigma) ? Math.abs(p.value) / p.sigma : NaN,
  }));
}

function rowOf(f: ModelFitSummary, g: ModelFitSummary, threshold: number): ModelComparisonRow {
  const isGravity = f === g;
  const deltaChiSquare = g.chiSquare - f.chiSquare;
  const deltaParams = f.nParams - g.nParams;
  if (!isGravity && deltaParams < 1) {
    throw new RangeError(`model '${f.id}': ${f.nParams} parameters, not more than gravity's ${g.nParams}`);
  }
  // A nested model cannot fit worse than gravity; Δχ² ≤ 0 means no improvement at all: p = 1.
  const pValue = isGravity ? NaN : chiSquareSf(deltaChiSquare, deltaParams);
  const aic = akaikeCriterion(f.chiSquare, f.nParams, f.nResiduals);
  const bic = bayesianCriterion(f.chiSquare, f.nParams, f.nResiduals);
  const converged = f.converged ?? true;
  return {
    id: f.id, chiSquare: f.chiSquare, nParams: f.nParams, deltaChiSquare, deltaParams, pValue,
    aic, bic,
    deltaAic: aic - akaikeCriterion(g.chiSquare, g.nParams, g.nResiduals),
    deltaBic: bic - bayesianCriterion(g.chiSquare, g.nParams, g.nResiduals),
    signals: signalsOf(f), converged,
    eligible: converged && (isGravity || pValue < threshold),
  };
}

function fmt(x: number): string {
  return Math.abs(x) >= 0.01 && Math.abs(x) < 1e5 ? x.toFixed(2) : x.toExponential(2);
}

/**
 * Compares every fit with the gravity-only fit (id 'gravity', exactly one, converged). All fits
 * must use the same residuals (same count). Rule: among gravity and the converged models whose
 * p-value is below the threshold, the one with the lowest BIC is preferred (ties: fewer
 * parameters, then the order given).
 */
export function compareModels(fits: readonly ModelFitSummary[], options: ModelComparisonOptions = {}): ModelComparison {
  const threshold = options.pValueThreshold ?? DEFAULT_P_VALUE_THRESHOLD;
  if (!(threshold > 0 && threshold <= 1)) throw new RangeError(`compareModels: p-value threshold must be in (0, 1], got ${threshold}`);
  const gravity = fits.filter((f) => f.id === 'gravity');
  if (gravity.length !== 1) throw new RangeError(`compareModels: need exactly one 'gravity' fit, got ${gravity.length}`);
  const g = gravity[0];
  if (g.converged === false) throw new RangeError('compareModels: the gravity-only fit did not converge');
  fits.forEach(checkFit);
  for (const f of fits) {
    if (f.nResiduals !== g.nResiduals) {
      throw new RangeError(`compareModels: model '${f.id}' used ${f.nResiduals} residuals, gravity ${g.nResiduals}: not comparable`);
    }
  }
  const rows = fits.map((f) => rowOf(f, g, threshold));
  let best = rows.find((r) => r.id === 'gravity')!;
  for (const r of rows) {
    if (!r.eligible || r === best) continue;
    if (r.bic < best.bic || (r.bic === best.bic && r.nParams < best.nParams)) best = r;
  }
  const rule = `lowest BIC among gravity and the converged models with p-value < ${threshold}`;
  return { rows, preferred: best.id, rule, reason: reasonFor(best, rows, threshold), nullHypothesis: COMPARISON_NULL_HYPOTHESIS };
}

function reasonFor(best: ModelComparisonRow, rows: readonly ModelComparisonRow[], threshold: number): string {
  if (best.id !== 'gravity') {
    return `${best.id}: Δχ² = ${fmt(best.deltaChiSquare)} for ${best.deltaParams} more parameter${best.deltaParams === 1 ? '' : 's'}`
      + ` (p = ${fmt(best.pValue)} < ${threshold}), BIC lower than gravity's by ${fmt(-best.deltaBic)}`;
  }
  const significant = rows.filter((r) => r.id !== 'gravity' && r.eligible);
  if (significant.length === 0) {
    return `gravity: no converged model has p-value < ${threshold}`;
  }
  return `gravity: ${significant.map((r) => r.id).join(', ')} reach p < ${threshold} but do not lower BIC`
    + ` (ΔBIC ${significant.map((r) => fmt(r.deltaBic)).join(', ')})`;
}
