/**
 * A preliminary heliocentric orbit from three astrometric observations: each observation's
 * observer from observerPosition.ts and its line of sight from RA/Dec, both turned from the
 * ICRF into the core's J2000 ecliptic (frameBias.ts), then Gauss's method (gaussMethod.ts)
 * about the Sun with light time. Every positive root of the eighth-degree equation is kept:
 * `solutions` lists them all, `best` is the one chosen (below), `alternatives` the other
 * valid ones, so a caller with more observations can judge between them.
 *
 * Choice among valid solutions (all three distances positive, refinement settled): an
 * elliptic orbit before a hyperbolic one, then the larger ρ₂: a spurious root of Gauss's
 * equation lies on the observer's side (Charlier's analysis of the multiple solutions, from
 * memory). Three observations alone cannot tell the solutions apart: each fits them exactly.
 */
import { GM_SUN_AU3_PER_DAY2, C_AU_PER_DAY } from '../core/constants.js';
import type { Ephemeris } from '../core/types.js';
import { stateToSemimajorElements } from '../core/orbit/stateToElements.js';
import { ICRF_TO_ECLIPTIC_MATRIX, rotate3 } from './frameBias.js';
import { gaussOrbits, type GaussObservation, type GaussSolution } from './gaussMethod.js';
import { observerHeliocentricState } from './observerPosition.js';
import type { ObserverPlace } from './types.js';

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
}

export interface PreliminaryOrbit {
  best: PreliminaryOrbitSolution | null; // null when no solution is valid
  alternatives: PreliminaryOrbitSolution[]; // the other valid solutions
  solutions: PreliminaryOrbitSolution[]; // every root, valid or not, in ascending r₂
}

/** Gauss's preliminary orbit about the Sun from three observations in time order (see the file comment). */
export function preliminaryOrbit(obs: readonly PreliminaryObservation[], eph: Ephemeris, maxRefinements = 50): PreliminaryOrbit {
  const gauss: GaussObservation[] = obs.map((o) => {
    const s = observerHeliocentricState(o.observer, o.timeJdUtc, o.timeJdTT, eph);
    const los = new Float64Array(3);
    const observer = new Float64Array(3);
    const cd = Math.cos(o.decRad);
    rotate3(ICRF_TO_ECLIPTIC_MATRIX, [cd * Math.cos(o.raRad), cd * Math.sin(o.raRad), Math.sin(o.decRad)], 0, los, 0);
    rotate3(ICRF_TO_ECLIPTIC_MATRIX, s.positionIcrfAu, 0, observer, 0);
    return { t: s.jdTDB, lineOfSight: los, observer };
  });
  const solutions = gaussOrbits(gauss, { mu: GM_SUN_AU3_PER_DAY2, cLight: C_AU_PER_DAY, maxRefinements }).map((s) => {
    const elements = new Float64Array(6).fill(NaN);
    const e = eccentricity(s.state);
    if (s.valid && e !== 1) stateToSemimajorElements(s.state, GM_SUN_AU3_PER_DAY2, elements);
    return { ...s, elements };
  });
  const valid = solutions.filter((s) => s.valid).sort((a, b) => rank(a) - rank(b) || b.rho[1] - a.rho[1]);
  return { best: valid[0] ?? null, alternatives: valid.slice(1), solutions };
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
