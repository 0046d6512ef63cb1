/**
 * A preliminary heliocentric orbit from three astrometric observations: each observation's
 * observer from observerPosition.ts and its line of sight from RA/Dec, both turned from the
 * ICRF into the core's J2000 ecliptic (frameBias.ts), then Gauss's method (gaussMethod.ts)
 * about the Sun with light time. Every positive root of the eighth-degree equation is kept:
 * `solutions` lists them all, `best` is the one chosen (below), `alternatives` the other
 * valid ones, so a caller with more observations can judge between them.
 *
 * Choice among valid solutions (all three distances positive, refinement settled). Three
 * observations alone cannot tell them apart: each fits them exactly. So, when the caller
 * gives other observations (`check`), each valid solution is carried to them by two-body
 * motion (universal.ts) and the one with the smallest RMS of (Δα cos δ, Δδ) is chosen; the
 * RMS is reported (`checkRmsArcsec`) because it also tells when no root is right (three
 * places of a low-inclination body near opposition: measured on real data in
 * test/fit/preliminaryOrbitReal.test.ts). Without them: an elliptic orbit before a
 * hyperbolic one, then the larger ρ₂ (a spurious root of Gauss's equation lies on the
 * observer's side: Charlier's analysis of the multiple solutions, from memory).
 */
import { ARCSEC_PER_RAD, C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2 } from '../core/constants.js';
import { wrapPi } from '../core/math.js';
import { propagateTwoBody } from '../core/orbit/universal.js';
import type { Ephemeris } from '../core/types.js';
import { stateToSemimajorElements } from '../core/orbit/stateToElements.js';
import { ICRF_TO_ECLIPTIC_MATRIX, rotate3 } from './frameBias.js';
import { gaussOrbits, type GaussObservation, type GaussSolution } from './gaussMethod.js';
import { computeAstrometricPlace } from './astrometricPlace.js';
import { observerHeliocentricState } from './observerPosition.js';
import type { ObserverPlace, ObserverState } from './types.js';

/** One observation as the preliminary orbit needs it. */
export interface PreliminaryObservation {
  timeJdUtc: number;
  timeJdTT: number;
  raRad: number; // ICRF
  decRad: number; // ICRF
  observer: ObserverPlace;
}

/** A Gauss solution with its heliocentric ecliptic elements. */
export interface PreliminaryOrbitSolution extends GaussSolution {
  /** a (au; negative for e > 1), e, i, Ω, ω, M (rad) at `epoch` (JD TDB), J2000 ecliptic. */
  elements: Float64Array;
  /** RMS of (Δα cos δ, Δδ) over the `check` observations, arcsec; NaN without them or when not valid. */
  checkRmsArcsec: number;
}

export interface PreliminaryOrbitOptions {
  maxRefinements?: number; // Newton steps of Gauss's refinement, default 50
  check?: readonly PreliminaryObservation[]; // other observations to choose among the solutions by
}

export interface PreliminaryOrbit {
  best: PreliminaryOrbitSolution | null; // null when no solution is valid
  alternatives: PreliminaryOrbitSolution[]; // the other valid solutions
  solutions: PreliminaryOrbitSolution[]; // every root, valid or not, in ascending r₂
}

/** Gauss's preliminary orbit about the Sun from three observations in time order (see the file comment). */
export function preliminaryOrbit(obs: readonly PreliminaryObservation[], eph: Ephemeris, opts: PreliminaryOrbitOptions = {}): PreliminaryOrbit {
  const gauss: GaussObservation[] = obs.map((o) => {
    const s = observerHeliocentricState(o.observer, o.timeJdUtc, o.timeJdTT, eph);
    const los = new Float64Array(3);
    const observer = new Float64Array(3);
    const cd = Math.cos(o.decRad);
    rotate3(ICRF_TO_ECLIPTIC_MATRIX, [cd * Math.cos(o.raRad), cd * Math.sin(o.raRad), Math.sin(o.decRad)], 0, los, 0);
    rotate3(ICRF_TO_ECLIPTIC_MATRIX, s.positionIcrfAu, 0, observer, 0);
    return { t: s.jdTDB, lineOfSight: los, observer };
  });
  const check = opts.check ?? [];
  const checkObservers = check.map((o) => observerHeliocentricState(o.observer, o.timeJdUtc, o.timeJdTT, eph));
  const solutions = gaussOrbits(gauss, { mu: GM_SUN_AU3_PER_DAY2, cLight: C_AU_PER_DAY, maxRefinements: opts.maxRefinements }).map((s) => {
    const elements = new Float64Array(6).fill(NaN);
    const e = eccentricity(s.state);
    if (s.valid && e !== 1) stateToSemimajorElements(s.state, GM_SUN_AU3_PER_DAY2, elements);
    const checkRmsArcsec = s.valid && check.length > 0 ? rmsOver(s, check, checkObservers) : NaN;
    return { ...s, elements, checkRmsArcsec };
  });
  const valid = solutions.filter((s) => s.valid);
  if (check.length > 0) valid.sort((a, b) => a.checkRmsArcsec - b.checkRmsArcsec || b.rho[1] - a.rho[1]);
  else valid.sort((a, b) => rank(a) - rank(b) || b.rho[1] - a.rho[1]);
  return { best: valid[0] ?? null, alternatives: valid.slice(1), solutions };
}

/** RMS (arcsec) of (Δα cos δ, Δδ) of the observations against the solution carried by two-body motion. */
function rmsOver(s: GaussSolution, check: readonly PreliminaryObservation[], observers: readonly ObserverState[]): number {
  const body = (jd: number, out: Float64Array) => propagateTwoBody(s.state, jd - s.epoch, GM_SUN_AU3_PER_DAY2, out);
  let sum = 0;
  for (let k = 0; k < check.length; k++) {
    const p = computeAstrometricPlace(body, observers[k].positionIcrfAu, observers[k].jdTDB);
    const dRa = wrapPi(p.raRad - check[k].raRad) * Math.cos(check[k].decRad);
    const dDec = p.decRad - check[k].decRad;
    sum += dRa * dRa + dDec * dDec;
  }
  return Math.sqrt(sum / (2 * check.length)) * ARCSEC_PER_RAD;
}

function rank(s: PreliminaryOrbitSolution): number {
  return s.elements[1] < 1 ? 0 : 1;
}

/** Eccentricity of a heliocentric state (Laplace–Runge–Lenz vector; common practice). */
function eccentricity(st: Float64Array): number {
  const r = Math.hypot(st[0], st[1], st[2]);
  const v2 = st[3] * st[3] + st[4] * st[4] + st[5] * st[5];
  const rv = st[0] * st[3] + st[1] * st[4] + st[2] * st[5];
  const mu = GM_SUN_AU3_PER_DAY2;
  const ex = ((v2 - mu / r) * st[0] - rv * st[3]) / mu;
  const ey = ((v2 - mu / r) * st[1] - rv * st[4]) / mu;
  const ez = ((v2 - mu / r) * st[2] - rv * st[5]) / mu;
  return Math.hypot(ex, ey, ez);
}
