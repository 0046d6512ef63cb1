/**
 * Types of the synthetic astrometry generator: the truth it is given (orbit, non-gravitational
 * terms), the stations that observe, the rules of when a body can be observed, and what comes
 * out. Lengths au, times JD (scale in the name), angles rad unless the name says deg/arcsec.
 * Everything made here is invented data for tests and demos, never an outside truth.
 */
import type { OrbitElements } from '../../core/propagate/propagateOrbit.js';
import type { NonGravLaw } from '../../core/forces/nonGravLaw.js';
import type { AstrometryObservation, ObservatorySite } from '../../io/astrometry/types.js';

/** The body's truth: osculating elements (epoch in TDB) and its non-gravitational terms. */
export interface SyntheticTruth {
  elements: OrbitElements;
  /** A1, A2, A3 (au/day²) under `nonGravLaw`; null for none. */
  nonGravAuPerDay2: readonly [number, number, number] | null;
  nonGravLaw: NonGravLaw; // radial law of A1–A3 (src/core/forces/nonGravLaw.ts)
  areaToMassM2PerKg: number; // radiation pressure A/m; 0 for none
  radiationPressureCoefficient: number; // C_R (1 = absorber)
  relativity: boolean; // the Sun's 1PN term in the truth dynamics
}

/** One observing station: a fixed site of the observatory-code table, its noise, its years. */
export interface SyntheticStation {
  site: ObservatorySite; // fixedSite must be true
  sigmaArcsec: number; // 1σ of each of Δ(α cos δ) and Δδ, arcsec
  note2: string; // 80-column note 2 of its records ('C' CCD, 'P' photographic, …)
  fromJdUtc: number; // first night it observes (−Infinity: always)
  toJdUtc: number; // last night it observes (Infinity: always)
}

/** When a body counts as observable from a station (all must hold at the instant). */
export interface VisibilityRules {
  minSolarElongationDeg: number; // Sun–observer–body angle
  maxSunAltitudeDeg: number; // the Sun below this (e.g. −12°: nautical twilight over)
  minBodyAltitudeDeg: number; // the body above this
}

/** How a night's observations are laid out. */
export interface CadenceRules {
  perNightMin: number; // observations in one station's night (a tracklet), inclusive
  perNightMax: number;
  spacingMinMinutes: number; // between consecutive observations of a tracklet
  spacingMaxMinutes: number;
  scanStepMinutes: number; // the night is scanned for visibility at this step
  apparitionGapDays: number; // candidate nights further apart than this start a new apparition
}

export interface SyntheticRequest {
  truth: SyntheticTruth;
  stations: readonly SyntheticStation[];
  startJdUtc: number; // first night considered (inclusive)
  endJdUtc: number; // last (exclusive)
  count: number; // observations wanted
  seed: number; // the generator's one seed: same request, same observations, bit for bit
  outlierRate: number; // share of observations displaced as outliers, 0..1
  outlierArcsec: readonly [number, number]; // their displacement, uniform in [lo, hi], random direction
  visibility?: Partial<VisibilityRules>;
  cadence?: Partial<CadenceRules>;
  dateDecimals?: 5 | 6; // times are drawn on this grid of the UTC day (as the 80-column record writes them); default 6
}

/** One synthetic observation: what a reader would give, plus its truth. */
export interface SyntheticObservation {
  observation: AstrometryObservation; // noisy place, sigma fields set, file '' and line 0
  trueRaRad: number; // the model's astrometric place before noise
  trueDecRad: number;
  noiseRaCosDecArcsec: number; // the displacement added (outliers included)
  noiseDecArcsec: number;
  outlier: boolean;
  apparition: number; // 0-based apparition index
  tracklet: number; // 0-based tracklet index (one station's night)
  sunAltitudeDeg: number; // at the observation, for checks
  bodyAltitudeDeg: number;
  solarElongationDeg: number;
  distanceAu: number; // observer → body
}

export interface SyntheticResult {
  observations: SyntheticObservation[]; // in time order
  candidateNights: number; // station-nights with a usable window
  apparitions: number;
  tracklets: number;
  requested: number;
  shortBy: number; // observations that could not be placed (every candidate night used)
}
