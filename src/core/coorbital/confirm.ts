/**
 * N-body confirmation of co-orbital motion: integrate a body over epoch ± window with the full
 * force model (sampleCoorbital.ts), segment its resonant angle φ = λ − λ_P (segments.ts), find
 * its closest approach to the planet and, for the Earth, its temporary captures (capture.ts).
 * Design note on the co-orbital detector, §4 and §6 [design]. The epoch's state and the
 * segments are the N-body judge of the averaged prediction; beyond a few centuries chaotic
 * bodies give clone-dependent labels (2010 TK7: "Chaos limits the accuracy ... over timescales
 * greater than about 250 yr", Connors et al. 2011 [seen in the note]).
 * Input: heliocentric J2000-ecliptic states (au, au/day) at `epochJdTDB`. 'earth' is the
 * Earth–Moon barycentre with the Earth + Moon GM.
 */
import { strideIndices } from '../strideIndices.js';
import { DAYS_PER_JULIAN_YEAR, type PlanetName } from '../constants.js';
import { wrapPi } from '../math.js';
import type { Ephemeris } from '../types.js';
import { CAPTURE_HILL_RADII, findCaptureEpisodes, hillRadiusAu } from './capture.js';
import {
  createWindowEphemeris, DEFAULT_WINDOW_YEARS, planetPeriodDays, sampleCoorbitalMotion,
  type CoorbitalSamples, type CoorbitalSampling, type CoorbitalSamplingOptions,
} from './sampleCoorbital.js';
import { segmentResonantAngle } from './segments.js';
import type { CoorbitalHistory, CoorbitalSegment, CoorbitalSeries, CoorbitalState } from './types.js';

export interface ConfirmOptions extends CoorbitalSamplingOptions {
  /** Turning-point hysteresis of the smoothed φ (deg); default segments.ts. */
  hysteresisDeg?: number;
  /** Also return thinned φ and rotating-frame series (CoorbitalHistory.series); default false. */
  series?: boolean;
}

/** Most φ samples kept in a CoorbitalSeries: enough for a chart, small to pass between threads [design]. */
export const SERIES_MAX_POINTS = 2000;
/**
 * Longest rotating-frame path in a CoorbitalSeries, in consecutive φ samples: with the Earth's
 * φ step of at most P/20 (~18 d) about ±75 years around the epoch, a few quasi-satellite
 * loops or most of a tadpole cycle, each yearly epicycle drawn with 20 points or more [design].
 */
export const PATH_MAX_POINTS = 3000;

/** φ (rad, unwrapped) as degrees on (−180, 180]; NaN stays NaN. */
function wrappedDeg(phiRad: number): number {
  let d = (-wrapPi(-phiRad) * 180) / Math.PI; // −wrapPi(−x) lies in (−π, π]
  if (d > 180) d = 180;
  if (d <= -180) d += 360;
  return d;
}

/** The chart series of one body (sampled with rotatingFrame): thinned φ, unthinned path about the epoch. */
function seriesOf(sampling: CoorbitalSampling, s: CoorbitalSamples, epochJdTDB: number): CoorbitalSeries {
  const t = sampling.phiTimesJd;
  const keep = Array.from(strideIndices(t.length, SERIES_MAX_POINTS));
  const r = sampling.planetDistanceAu!;
  let sum = 0;
  for (let k = 0; k < r.length; k++) sum += r[k];
  const [from, to] = pathRange(t, epochJdTDB);
  const path = Array.from({ length: to - from }, (_, j) => from + j);
  const years = (k: number): number => (t[k] - epochJdTDB) / DAYS_PER_JULIAN_YEAR;
  return {
    tYears: keep.map(years),
    phiDeg: keep.map((k) => wrappedDeg(s.phiUnwrappedRad[k])),
    pathTYears: path.map(years),
    xAu: path.map((k) => s.rotatingXAu![k]),
    yAu: path.map((k) => s.rotatingYAu![k]),
    planetDistanceAu: sum / r.length,
    totalSamples: t.length,
  };
}

/** Indices [from, to) of at most PATH_MAX_POINTS consecutive samples centred on the epoch, within the grid. */
function pathRange(t: Float64Array, epochJdTDB: number): [number, number] {
  let centre = 0;
  while (centre + 1 < t.length && t[centre + 1] <= epochJdTDB) centre++;
  const n = Math.min(PATH_MAX_POINTS, t.length);
  const from = Math.max(0, Math.min(centre - Math.floor(n / 2), t.length - n));
  return [from, from + n];
}

/** The capture zone (au): CAPTURE_HILL_RADII Hill radii (capture.ts). */
function captureZoneOf(planet: PlanetName): number {
  return CAPTURE_HILL_RADII * hillRadiusAu(planet);
}

/** The state of the segment holding `jd` (the last one when jd is at the very end). */
function stateAt(segments: readonly CoorbitalSegment[], jd: number): CoorbitalState {
  for (const s of segments) if (jd >= s.startJdTDB && jd < s.endJdTDB) return s.state;
  return segments[segments.length - 1].state;
}

/** History of one sampled body. */
function historyOf(
  sampling: CoorbitalSampling, s: CoorbitalSamples, epochJdTDB: number, planet: PlanetName, periodDays: number,
  hysteresisDeg: number | undefined, series: boolean,
): CoorbitalHistory {
  const t = sampling.phiTimesJd;
  // No elliptic heliocentric orbit at any sample (φ all NaN): not bound to the Sun, hence
  // not co-orbital over the window [design].
  const segments: CoorbitalSegment[] = Number.isFinite(s.phiUnwrappedRad[0])
    ? segmentResonantAngle(t, s.phiUnwrappedRad, { smoothingDays: periodDays, hysteresisDeg })
    : [{ state: 'passing', startJdTDB: t[0], endJdTDB: t[t.length - 1], centreDeg: NaN, amplitudeDeg: NaN, periodYears: NaN }];
  const captures = planet === 'earth'
    ? findCaptureEpisodes(sampling.timesJd, s.planetocentric, captureZoneOf(planet))
    : [];
  return {
    epochJdTDB, segments, stateAtEpoch: stateAt(segments, epochJdTDB),
    minDistanceAu: s.minDistanceAu, minDistanceJdTDB: s.minDistanceJdTDB, captures,
    ...(series ? { series: seriesOf(sampling, s, epochJdTDB) } : {}),
  };
}

/**
 * Confirm (or not) the co-orbital motion of independent bodies that share an epoch, in one
 * force model: `states` holds 6 numbers per body. One history per body, in input order.
 */
export function confirmCoorbitalBatch(
  states: Float64Array, epochJdTDB: number, planet: PlanetName, opts: ConfirmOptions = {},
): CoorbitalHistory[] {
  const windowDays = (opts.windowYears ?? DEFAULT_WINDOW_YEARS) * DAYS_PER_JULIAN_YEAR;
  const eph: Ephemeris = opts.ephemeris ?? createWindowEphemeris(epochJdTDB - windowDays, epochJdTDB + windowDays);
  const series = opts.series ?? false;
  // The rotating-frame angle serves the captures alone: within their zone for the Earth, nowhere else.
  const captureZoneAu = planet === 'earth' ? captureZoneOf(planet) : 0;
  const sampling = sampleCoorbitalMotion(states, epochJdTDB, planet, { ...opts, ephemeris: eph, rotatingFrame: series, captureZoneAu });
  // Smoothing window: one orbital period of the planet (design note §6 [design]).
  const periodDays = planetPeriodDays(eph, planet, epochJdTDB);
  return sampling.bodies.map((s) => historyOf(sampling, s, epochJdTDB, planet, periodDays, opts.hysteresisDeg, series));
}

/** Confirm (or not) the co-orbital motion of one body: its state (6 numbers) at `epochJdTDB`. */
export function confirmCoorbital(
  state: Float64Array, epochJdTDB: number, planet: PlanetName, opts: ConfirmOptions = {},
): CoorbitalHistory {
  if (state.length !== 6) throw new RangeError(`confirmCoorbital: a state is 6 numbers, got ${state.length}`);
  return confirmCoorbitalBatch(state, epochJdTDB, planet, opts)[0];
}
