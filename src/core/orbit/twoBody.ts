/**
 * Orbital elements → heliocentric state vectors (any central mass `mu`), for every conic;
 * the inverse is stateToElements.ts.
 *
 * Primary form, valid for all e ≥ 0: perihelion elements (q, e, i, Ω, ω, T) — perihelion
 * distance, eccentricity, inclination, longitude of the ascending node, argument of
 * perihelion, time of perihelion passage. Helpers for the semimajor-axis form (a, e, i, Ω,
 * ω, M) cover e ≠ 1, with a < 0 for hyperbolic orbits (a = q / (1 − e)).
 *
 * Orientation: r = R3(Ω) R1(i) R3(ω) r_orbital, the P and Q vectors (Danby 1988 ch. 6;
 * Murray & Dermott 1999 §2.8 — sections from memory).
 *
 * Conventions where an angle is undefined (documented, tested):
 *   - i = 0 or 180° (angular momentum along ±z exactly): Ω = 0, and ω is measured from the
 *     x axis (so for i = 0 it is the longitude of perihelion ϖ);
 *   - e = 0: ω = 0, and T is the time of passage through the node (or the x axis);
 *   - T is the perihelion passage nearest the epoch (elliptic |M| ≤ π).
 * Rectilinear orbits (zero angular momentum) are refused with a RangeError.
 *
 * Buffers: states are 6 numbers (x, y, z in au; vx, vy, vz in au/day); perihelion elements
 * are written as [q, e, i, Ω, ω, T] and semimajor-axis elements as [a, e, i, Ω, ω, M]
 * (angles in rad, times as Julian dates in the caller's scale, normally TDB).
 */
import { GM_SUN_AU3_PER_DAY2 } from '../constants.js';
import { solveKeplerElliptic, solveKeplerHyperbolic } from './kepler.js';
import { propagateTwoBody } from './universal.js';

/** Perihelion elements. Angles in rad; tpJd and epochs in one time scale (TDB for dynamics). */
export interface PerihelionElements {
  qAu: number;
  e: number;
  iRad: number;
  nodeRad: number;
  periRad: number;
  tpJd: number;
}

/** Semimajor-axis elements at an epoch (e ≠ 1; aAu < 0 when e > 1). */
export interface SemimajorElements {
  aAu: number;
  e: number;
  iRad: number;
  nodeRad: number;
  periRad: number;
  meanAnomalyRad: number;
}

const PQ = new Float64Array(6); // scratch: P and Q unit vectors
const PERI = new Float64Array(6); // scratch: perihelion state

function checkAngles(name: string, iRad: number, nodeRad: number, periRad: number): void {
  if (!Number.isFinite(iRad) || !Number.isFinite(nodeRad) || !Number.isFinite(periRad)) {
    throw new RangeError(`${name}: non-finite angle i=${iRad}, node=${nodeRad}, peri=${periRad}`);
  }
}

/** P (toward perihelion) and Q (90° ahead in the orbit plane) into PQ. Danby 1988 ch. 6. */
function orientation(iRad: number, nodeRad: number, periRad: number): void {
  const cO = Math.cos(nodeRad), sO = Math.sin(nodeRad);
  const cw = Math.cos(periRad), sw = Math.sin(periRad);
  const ci = Math.cos(iRad), si = Math.sin(iRad);
  PQ[0] = cO * cw - sO * sw * ci;
  PQ[1] = sO * cw + cO * sw * ci;
  PQ[2] = sw * si;
  PQ[3] = -cO * sw - sO * cw * ci;
  PQ[4] = -sO * sw + cO * cw * ci;
  PQ[5] = cw * si;
}

function writeState(out: Float64Array, o: number, x: number, y: number, vx: number, vy: number): void {
  out[o] = PQ[0] * x + PQ[3] * y;
  out[o + 1] = PQ[1] * x + PQ[4] * y;
  out[o + 2] = PQ[2] * x + PQ[5] * y;
  out[o + 3] = PQ[0] * vx + PQ[3] * vy;
  out[o + 4] = PQ[1] * vx + PQ[4] * vy;
  out[o + 5] = PQ[2] * vx + PQ[5] * vy;
}

/**
 * State at `epochJd` from perihelion elements, any e ≥ 0: the perihelion state
 * (r = q P, v = √(μ(1+e)/q) Q) carried to the epoch by universal-variable propagation.
 */
export function perihelionElementsToState(
  qAu: number, e: number, iRad: number, nodeRad: number, periRad: number, tpJd: number,
  epochJd: number, mu: number, out: Float64Array, offset = 0,
): void {
  checkAngles('perihelionElementsToState', iRad, nodeRad, periRad);
  if (!Number.isFinite(qAu) || !Number.isFinite(e) || !Number.isFinite(tpJd) || !Number.isFinite(epochJd)) {
    throw new RangeError(`perihelionElementsToState: non-finite q=${qAu}, e=${e}, T=${tpJd}, epoch=${epochJd}`);
  }
  if (!(qAu > 0)) throw new RangeError(`perihelionElementsToState: q=${qAu} au must be > 0`);
  if (!(e >= 0)) throw new RangeError(`perihelionElementsToState: e=${e} must be ≥ 0`);
  if (!(mu > 0 && Number.isFinite(mu))) throw new RangeError(`perihelionElementsToState: mu=${mu} must be > 0`);
  orientation(iRad, nodeRad, periRad);
  writeState(PERI, 0, qAu, 0, 0, Math.sqrt((mu * (1 + e)) / qAu));
  propagateTwoBody(PERI, epochJd - tpJd, mu, out, 0, offset);
}

/**
 * State from semimajor-axis elements by Kepler's equation (e < 1, a > 0) or its hyperbolic
 * form (e > 1, a < 0). Orbit-plane formulas: Danby 1988 ch. 6, with
 * cos E − e written (1 − e) − 2 sin²(E/2) (and the hyperbolic analogue) so that positions
 * near perihelion keep their precision when e is close to 1.
 */
export function semimajorElementsToState(
  aAu: number, e: number, iRad: number, nodeRad: number, periRad: number, meanAnomalyRad: number,
  mu: number, out: Float64Array, offset = 0,
): void {
  checkAngles('semimajorElementsToState', iRad, nodeRad, periRad);
  if (!Number.isFinite(aAu) || !Number.isFinite(e) || !Number.isFinite(meanAnomalyRad)) {
    throw new RangeError(`semimajorElementsToState: non-finite a=${aAu}, e=${e}, M=${meanAnomalyRad}`);
  }
  if (!(e >= 0)) throw new RangeError(`semimajorElementsToState: e=${e} must be ≥ 0`);
  if (e === 1) throw new RangeError('semimajorElementsToState: e = 1 has no finite a; use perihelion elements');
  if (e < 1 && !(aAu > 0)) throw new RangeError(`semimajorElementsToState: a=${aAu} au must be > 0 for e=${e} < 1`);
  if (e > 1 && !(aAu < 0)) throw new RangeError(`semimajorElementsToState: a=${aAu} au must be < 0 for e=${e} > 1`);
  if (!(mu > 0 && Number.isFinite(mu))) throw new RangeError(`semimajorElementsToState: mu=${mu} must be > 0`);
  orientation(iRad, nodeRad, periRad);
  if (e < 1) {
    const E = solveKeplerElliptic(meanAnomalyRad, e);
    const c = Math.cos(E), s = Math.sin(E);
    const h = Math.sin(0.5 * E);
    const vers = 2 * h * h; // 1 − cos E without cancellation
    const b = Math.sqrt((1 - e) * (1 + e));
    const r = aAu * (1 - e + e * vers); // a (1 − e cos E)
    const k = Math.sqrt(mu * aAu) / r;
    writeState(out, offset, aAu * (1 - e - vers), aAu * b * s, -k * s, k * b * c);
  } else {
    const A = -aAu;
    const H = solveKeplerHyperbolic(meanAnomalyRad, e);
    const ch = Math.cosh(H), sh = Math.sinh(H);
    const hh = Math.sinh(0.5 * H);
    const vers = 2 * hh * hh; // cosh H − 1 without cancellation
    const b = Math.sqrt((e - 1) * (e + 1));
    const r = A * (e - 1 + e * vers); // |a| (e cosh H − 1)
    const k = Math.sqrt(mu * A) / r;
    writeState(out, offset, A * (e - 1 - vers), A * b * sh, -k * sh, k * b * ch);
  }
}

/** Object form of perihelionElementsToState (allocates the result; not for hot loops). */
export function stateFromPerihelion(el: PerihelionElements, epochJd: number, mu = GM_SUN_AU3_PER_DAY2): Float64Array {
  const out = new Float64Array(6);
  perihelionElementsToState(el.qAu, el.e, el.iRad, el.nodeRad, el.periRad, el.tpJd, epochJd, mu, out);
  return out;
}

/** Object form of semimajorElementsToState. */
export function stateFromSemimajor(el: SemimajorElements, mu = GM_SUN_AU3_PER_DAY2): Float64Array {
  const out = new Float64Array(6);
  semimajorElementsToState(el.aAu, el.e, el.iRad, el.nodeRad, el.periRad, el.meanAnomalyRad, mu, out);
  return out;
}

// The inverse conversions live in stateToElements.ts; re-exported here for callers that
// import both directions from this file.
export { perihelionFromState, semimajorFromState, stateToPerihelionElements, stateToSemimajorElements } from './stateToElements.js';
