/**
 * The contracts of the orbit fit (fitOrbit.ts): where it starts, its options, what it returns
 * and how it fails. Frame and units as in the core: heliocentric J2000 ecliptic (VSOP87's),
 * au, au/day, JD TDB; A1, A2, A3 au/day², A/m m²/kg; residuals and σ in arcsec.
 */
import type { PlanetName } from '../core/constants.js';
import type { NonGravLaw } from '../core/forces/nonGravLaw.js';
import type { OrbitElements } from '../core/propagate/propagateOrbit.js';
import type { Ephemeris } from '../core/types.js';
import type { ElementsWithSigma } from './elementsCovariance.js';
import type { ObservationSigma } from './observationWeights.js';
import type { FitParameter } from './trajectoryPartials.js';

/** Where the fit starts. */
export type OrbitFitStart =
  /** A heliocentric ecliptic state (au, au/day) at its epoch. */
  | { kind: 'state'; epochJdTDB: number; state: ArrayLike<number> }
  /** Osculating elements (src/core/propagate/propagateOrbit.ts's form) at their epoch. */
  | { kind: 'elements'; elements: OrbitElements }
  /** Gauss's method on three observations chooseThree.ts picks (arcs of at most 60, then 30, then 15 days). */
  | { kind: 'gauss' };

export interface OrbitFitOptions {
  /** Parameters solved for besides the state. Default none. */
  solveFor?: readonly FitParameter[];
  /** Radial law of A1, A2, A3. Default 'comet-water'. */
  law?: NonGravLaw;
  /** Starting (and, when not solved for, fixed) A1, A2, A3, A/m. Default all 0. */
  params?: ArrayLike<number>;
  /** Each observation's σ; default observationWeights.ts's scheme. */
  sigmas?: readonly ObservationSigma[];
  /** Outlier rejection: false for none, or its thresholds; default on with Carpino et al.'s. */
  reject?: false | { chi2Reject?: number; chi2Recover?: number };
  /** Gauss–Newton iterations per fit before it counts as diverged. Default 25. */
  maxIterations?: number;
  /**
   * Fit the arc in growing windows about the epoch (×4 each time) instead of all at once.
   * Default: on for a Gauss start (three observations' orbit is far from the whole arc's),
   * off otherwise.
   */
  growArc?: boolean;
  /** Perturbing planets; default all eight. */
  planets?: readonly PlanetName[];
  /** The Sun's 1PN term; default true. */
  relativity?: boolean;
  /** Planet positions; default a VSOP87B cache over the observations and the epoch. */
  ephemeris?: Ephemeris;
  /**
   * Indices into the observations of those left out of the fit: never used in it (not in χ²,
   * the normal equations, the start or the arc's windows), never recovered, reported with
   * status 'excluded' and their residuals at the solution (for the record). Default none.
   */
  exclude?: readonly number[];
}

/** One observation's outcome. */
export interface ObservationFit {
  /**
   * 'kept' in the fit, 'rejected' as an outlier, 'excluded' by the caller (options.exclude),
   * 'unusable' (no TT for the time: before 1972 the readers give none; an unusable observation
   * the caller excluded stays 'unusable').
   */
  status: 'kept' | 'rejected' | 'excluded' | 'unusable';
  /** Observed − computed, α cos δ and δ, arcsec (NaN when unusable, or excluded and its place could not be computed). */
  residualRaCosDecArcsec: number;
  residualDecArcsec: number;
  /** σ used (per-night factor included), arcsec. */
  sigmaRaCosDecArcsec: number;
  sigmaDecArcsec: number;
  /** χ² of the 2-D residual against its own covariance (normalEquations.ts; an excluded one's as left out); NaN when unusable. */
  chi2: number;
}

export interface OrbitFit {
  epochJdTDB: number;
  /** x, y, z (au), vx, vy, vz (au/day) at the epoch. */
  state: Float64Array;
  /** A1, A2, A3 (au/day²), A/m (m²/kg): fitted where solved for, else as given. */
  params: Float64Array;
  solveFor: readonly FitParameter[];
  /** Names of the covariance's rows: x, y, z, vx, vy, vz, then solveFor. */
  columns: readonly string[];
  /** m × m row-major, m = 6 + solveFor.length. */
  covariance: Float64Array;
  elements: ElementsWithSigma;
  chi2: number;
  degreesOfFreedom: number; // 2 × kept − m
  /** √(χ² / (2 × kept)): 1 when the residuals are as large as their σ. */
  normalizedRms: number;
  /** √(Σ w r² / Σ w) over both coordinates of the kept observations, arcsec. */
  weightedRmsArcsec: number;
  /** Unweighted RMS over both coordinates of the kept observations, arcsec. */
  rmsArcsec: number;
  kept: number;
  /** Outliers the fit set aside (never the excluded ones). */
  rejected: number;
  /** Usable observations the caller excluded. */
  excluded: number;
  unusable: number;
  observations: ObservationFit[];
  /** Gauss–Newton iterations (all windows and rejection rounds). */
  iterations: number;
  /** Rejections and recoveries made on the way (an observation may be rejected, then recovered; an excluded one is neither). */
  rejections: number;
  recoveries: number;
  /** Condition number of the scaled normal matrix at the end. */
  condition: number;
  /** What the fit started from: 'state', 'elements', or 'gauss …' with the arc and the root taken. */
  startedFrom: string;
}

/** Why a fit failed. */
export type OrbitFitFailure = 'too-few-observations' | 'diverged' | 'singular' | 'integration' | 'no-start';

/** The fit could not give an orbit; carries the numbers reached. */
export class OrbitFitError extends Error {
  readonly reason: OrbitFitFailure;
  readonly iterations: number;
  readonly lastChi2: number;
  readonly condition: number;
  constructor(reason: OrbitFitFailure, detail: string, iterations: number, lastChi2: number, condition: number) {
    super(`orbit fit failed (${reason}): ${detail}; ${iterations} iterations, last χ² ${formatNumber(lastChi2)}, condition ${formatNumber(condition)}`);
    this.name = 'OrbitFitError';
    this.reason = reason;
    this.iterations = iterations;
    this.lastChi2 = lastChi2;
    this.condition = condition;
  }
}

function formatNumber(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(4) : String(x);
}

/** An OrbitFitError's fields, as they cross a thread boundary (structured clone keeps no class). */
export interface OrbitFitErrorRecord {
  reason: OrbitFitFailure;
  message: string;
  iterations: number;
  lastChi2: number;
  condition: number;
}

export function orbitFitErrorRecord(e: OrbitFitError): OrbitFitErrorRecord {
  return { reason: e.reason, message: e.message, iterations: e.iterations, lastChi2: e.lastChi2, condition: e.condition };
}

/** The OrbitFitError of a record, with the message it had. */
export function rebuildOrbitFitError(r: OrbitFitErrorRecord): OrbitFitError {
  const e = new OrbitFitError(r.reason, '', r.iterations, r.lastChi2, r.condition);
  e.message = r.message;
  return e;
}
