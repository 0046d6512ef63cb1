/**
 * Types of `check`: one designation's astrometry fitted with gravity only and with each
 * requested non-gravitational model, the models compared, the preferred one guarded against
 * artefacts of the astrometry and judged for physical plausibility, and one verdict sentence.
 * Units: residuals and σ in arcsec, A1–A3 au/day², C_R·A/m m²/kg, times JD.
 */
import type { AstrometryObservation } from '../../io/astrometry/types.js';
import type { OrbitFit, OrbitFitStart } from '../orbitFitTypes.js';
import type {
  AreaToMassPlausibility, DriftPlausibility, LeaveOneStationOutResult, ModelComparison, NongravModel, NongravModelId,
  RunsTestResult, StationMeansResult,
} from '../models/index.js';

export interface CheckOptions {
  /** Non-gravitational models fitted besides gravity only, in this order. */
  models: readonly Exclude<NongravModelId, 'gravity'>[];
  /** Where the gravity-only fit starts (an elements row, or Gauss's method). */
  start: OrbitFitStart;
  /** Absolute magnitude H of the body; NaN when unknown (no size to judge plausibility by). */
  absMagH: number;
  /** Stations refitted in the leave-one-station-out test: those holding at least this share of the usable observations. */
  stationMinShare: number;
  /** A model other than gravity may be preferred only below this p-value (compareModels' default when absent). */
  pValueThreshold?: number;
  /**
   * Threads for the fits after gravity only (models, comparison refits, leave-one-station-out
   * refits): an integer ≥ 1; the result is the same for any number. Default 1 (this thread).
   */
  threads?: number;
  /** Told what is being fitted, one line at a time (the CLI shows it on stderr). */
  onProgress?: (message: string) => void;
}

/** Why an observation of the designation was set aside before the fit, or its outcome in the comparison. */
export type CheckObservationStatus = 'kept' | 'rejected' | 'unusable';

/** One model fitted to the comparison set of observations. */
export interface CheckModelFit {
  id: NongravModelId;
  model: NongravModel;
  /** The fit whose residuals are reported (the comparison fit: every model on the same observations). */
  fit: OrbitFit;
  /** Outliers this model's own fit (with rejection) set aside. */
  ownRejected: number;
  /** The non-gravitational parameters with their 1σ, in the model's order. */
  params: { name: string; unit: string; value: number; sigma: number }[];
  /** Σ rᵀ Γ⁻¹ r over the comparison set, Γ the assumed 2 × 2 error covariance. */
  chi2: number;
  /** Scalar residuals in the comparison (2 per kept observation). */
  nResiduals: number;
  kept: number;
  rejected: number;
  /** Unweighted and weighted RMS over both coordinates of the comparison set, arcsec. */
  rmsArcsec: number;
  weightedRmsArcsec: number;
  /** Per fitted observation: kept in the comparison set, rejected as an outlier, or unusable (no TT). */
  status: CheckObservationStatus[];
}

/** A model whose fit failed: listed with the failure's message, never preferred. */
export interface CheckModelFailure {
  id: NongravModelId;
  message: string;
}

export interface CheckGuards {
  /** The model the guards were run on (the preferred one). */
  model: NongravModelId;
  stationMeans: StationMeansResult;
  runsRaCosDec: RunsTestResult;
  runsDec: RunsTestResult;
  /** Only for a preferred non-gravitational model; null for gravity. */
  leaveOneStationOut: LeaveOneStationOutResult | null;
  /** The parameter the leave-one-station-out test watched ('' when not run). */
  watchedParameter: string;
  /** Stations held too few observations to be refitted without (below stationMinShare). */
  stationsNotRefitted: string[];
}

export interface CheckPlausibility {
  /** thermal: the drift ⟨da/dt⟩ of the fitted A2 and its judgement. */
  thermal: { a2AuPerDay2: number; driftAuPerMyr: number; driftSigmaAuPerMyr: number; judgement: DriftPlausibility } | null;
  /** srp: the fitted C_R·A/m and its judgement. */
  srp: { areaToMassM2PerKg: number; sigmaM2PerKg: number; assumedCR: number; judgement: AreaToMassPlausibility } | null;
}

export interface CheckResult {
  designation: string;
  /** Observations fitted (the designation's, placed, in range, no duplicates), in input order. */
  observations: AstrometryObservation[];
  /** Each one's σ before any leaving out, arcsec. */
  sigmaRaCosDecArcsec: Float64Array;
  sigmaDecArcsec: Float64Array;
  fits: CheckModelFit[];
  failures: CheckModelFailure[];
  /** Which fit's outliers define the comparison set, and the rule. */
  comparisonSetFrom: NongravModelId;
  comparisonSetRule: string;
  /** Set when gravity only failed from the start given and was fitted from a model's solution. */
  gravityRestart: { from: NongravModelId; firstFailure: string } | null;
  comparison: ModelComparison;
  preferred: NongravModelId;
  guards: CheckGuards;
  plausibility: CheckPlausibility;
  verdict: string;
}
