/**
 * Types of the co-orbital (1:1 mean-motion resonance) dynamics: the states a body's resonant
 * angle φ = λ − λ_P can be in, the averaged-problem prediction and the N-body history.
 * Angles in degrees in these records (they are read by people and written to files);
 * radians inside the computations. φ is wrapped to (−180°, 180°]; L4 leads the planet
 * (φ = +60°), L5 trails it (φ = −60°) (Murray & Dermott 1999, §3.6; common practice).
 */

/** Kinds of motion of φ. 'compound' mixes quasi-satellite with horseshoe or tadpole motion. */
export type CoorbitalState = 'quasi-satellite' | 'tadpole-L4' | 'tadpole-L5' | 'horseshoe' | 'compound' | 'passing';

export const COORBITAL_STATES: readonly CoorbitalState[] = [
  'quasi-satellite', 'tadpole-L4', 'tadpole-L5', 'horseshoe', 'compound', 'passing',
];

/**
 * The body's orbit shape the averaged problem is built at, relative to the planet's orbit
 * (the planet on a circular orbit of radius aP in the reference plane).
 */
export interface AveragedOrbitShape {
  e: number; // body eccentricity
  iRad: number; // inclination to the planet's orbital plane
  periRad: number; // argument of perihelion, from the node on the planet's plane
  nodeRad?: number; // longitude of the node in the planet's frame (default 0); the average over the planet's longitude does not depend on it
}

/** What the averaged co-orbital problem predicts for one body (phasePortrait.ts). */
export interface CoorbitalPrediction {
  state: CoorbitalState;
  centreDeg: number; // libration centre (the enclosed minimum of the potential; for horseshoe and compound the middle of the arc); NaN for passing
  phiMinDeg: number; // extent of φ along the level curve (turning points); NaN for passing. φ runs from phiMinDeg ∈ (−180°, 180°]
  phiMaxDeg: number; //   up to phiMaxDeg = phiMinDeg + arc length, so phiMaxDeg exceeds 180° for an arc across 180° (horseshoe)
  separatrixMargin: number; // 0 on a separatrix … 1 at the centre of a single well; passing: (L − max V)/(L − min V), 0 on the separatrix
  periodYears: number; // libration (or, passing, circulation) period from the level curve
  closeApproach: boolean; // the level curve comes within 3 Hill radii: averaging unreliable there
  compoundWith: 'horseshoe' | 'tadpole-L4' | 'tadpole-L5' | 'none'; // the non-quasi-satellite part of a compound orbit; 'none' otherwise
  maxOffsetRel: number; // largest |δa/aP| along the level curve (at its lowest potential)
  minDistanceHill: number; // closest approach to the planet along the level curve, in Hill radii (approximate; see phasePortrait.ts)
}

/** One stretch of the N-body history of φ in a single state (segments.ts). */
export interface CoorbitalSegment {
  state: CoorbitalState;
  startJdTDB: number;
  endJdTDB: number; // exclusive
  centreDeg: number; // mean of φ over the stretch (circular mean); NaN for passing
  amplitudeDeg: number; // half the range of φ over the stretch; NaN for passing
  periodYears: number; // mean libration period over the stretch; NaN when under one cycle
}

/** A temporary capture: geocentric two-body energy < 0 while within 3 Hill radii (capture.ts). */
export interface CaptureEpisode {
  startJdTDB: number;
  endJdTDB: number;
  minDistanceAu: number;
  revolutions: number; // turns about the planet in the frame rotating with the Sun–planet line
}

/** The N-body confirmation of one body (confirm.ts). */
export interface CoorbitalHistory {
  epochJdTDB: number;
  segments: CoorbitalSegment[]; // in time order, covering the whole integrated window
  stateAtEpoch: CoorbitalState;
  minDistanceAu: number; // closest approach to the planet over the window
  minDistanceJdTDB: number;
  captures: CaptureEpisode[]; // filled for Earth only
  series?: CoorbitalSeries; // only when asked for (ConfirmOptions.series)
}

/**
 * Samples of one N-body history, for plotting: plain arrays (they cross worker threads as
 * they are). φ over the whole window, thinned to at most SERIES_MAX_POINTS (confirm.ts):
 * every k-th φ sample with the first and the last. The path in the rotating frame is NOT
 * thinned (every k-th point of a loop made once a year aliases into a zigzag): it is the run
 * of consecutive φ samples centred on the epoch, at most PATH_MAX_POINTS (confirm.ts) long,
 * cut at the window's ends. The rotating frame is the one of
 * CoorbitalSamplingOptions.rotatingFrame (sampleCoorbital.ts): heliocentric position
 * projected on the J2000 ecliptic and turned by −(the planet's heliocentric longitude), so
 * the Sun is at the origin, the planet on +x, and L4 (60° ahead of it) at y > 0.
 */
export interface CoorbitalSeries {
  tYears: number[]; // Julian years from the epoch
  phiDeg: number[]; // φ = λ − λ_P wrapped to (−180, 180]
  pathTYears: number[]; // the path's times, Julian years from the epoch: consecutive φ samples
  xAu: number[]; // rotating frame, at pathTYears
  yAu: number[];
  planetDistanceAu: number; // the planet's mean distance on +x over the sampled window
  totalSamples: number; // φ samples before thinning
}
