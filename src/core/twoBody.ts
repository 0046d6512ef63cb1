/**
 * Orbital elements ↔ heliocentric state vectors (any central mass `mu`), for every conic.
 *
 * Primary form, valid for all e ≥ 0: perihelion elements (q, e, i, Ω, ω, T) — perihelion
 * distance, eccentricity, inclination, longitude of the ascending node, argument of
 * perihelion, time of perihelion passage. Helpers for the semimajor-axis form (a, e, i, Ω,
 * ω, M) cover e ≠ 1, with a < 0 for hyperbolic orbits (a = q / (1 − e)).
 *
 * Orientation: r = R3(Ω) R1(i) R3(ω) r_orbital, the P and Q vectors of Danby 1988 §6.4
 * (eq. 6.4.11) / Murray & Dermott 1999 eq. 2.122.
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
import { GM_SUN_AU3_PER_DAY2 } from './constants.js';
import { wrapTwoPi } from './math.js';
import { solveKeplerElliptic, solveKeplerHyperbolic } from './kepler.js';
import { meanFromTrue, perihelionTimeOffsetDays } from './anomaly.js';
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
const EL = new Float64Array(6); // scratch: elements

function checkAngles(name: string, iRad: number, nodeRad: number, periRad: number): void {
  if (!Number.isFinite(iRad) || !Number.isFinite(nodeRad) || !Number.isFinite(periRad)) {
    throw new RangeError(`${name}: non-finite angle i=${iRad}, node=${nodeRad}, peri=${periRad}`);
  }
}

/** P (toward perihelion) and Q (90° ahead in the orbit plane) into PQ. Danby 1988 eq. 6.4.11. */
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
 * form (e > 1, a < 0). Orbit-plane formulas: Danby 1988 eq. 6.3.15–6.3.17 and 6.5.7, with
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

/**
 * Perihelion elements [q, e, i, Ω, ω, T] of the state at `epochJd`, written to
 * out[offset..offset+5]. Danby 1988 §6.8 (angular momentum, Laplace–Runge–Lenz vector);
 * q = h² / (μ (1 + e)) keeps precision for every e.
 */
export function stateToPerihelionElements(
  state: Float64Array, epochJd: number, mu: number, out: Float64Array, offset = 0, stateOffset = 0,
): void {
  if (!Number.isFinite(epochJd)) throw new RangeError(`stateToPerihelionElements: non-finite epoch ${epochJd}`);
  shapeAndTrueAnomaly(state, stateOffset, mu, out, offset);
  const q = out[offset], e = out[offset + 1], nu = out[offset + 5];
  if (e === 1) {
    out[offset + 5] = epochJd - perihelionTimeOffsetDays(nu, q, e, mu);
  } else {
    const aAbs = q / Math.abs(1 - e);
    const m = meanAnomalyOfState(state, stateOffset, nu, aAbs, e, mu);
    out[offset + 5] = epochJd - m * Math.sqrt((aAbs * aAbs * aAbs) / mu);
  }
}

/**
 * Mean anomaly of a state on a non-parabolic orbit. From ν in general; far out on a
 * hyperbola (|sinh H| > 1), where ν nears the asymptote and tan(ν/2) loses the digits,
 * from r·v = √(μ|a|) e sinh H instead (Danby 1988 §6.5, the analogue of r·v = √(μa) e sin E).
 */
function meanAnomalyOfState(state: Float64Array, o: number, nu: number, aAbs: number, e: number, mu: number): number {
  if (e > 1) {
    const rv = state[o] * state[o + 3] + state[o + 1] * state[o + 4] + state[o + 2] * state[o + 5];
    const eSinhH = rv / Math.sqrt(mu * aAbs);
    if (Math.abs(eSinhH) > e) return eSinhH - Math.asinh(eSinhH / e);
  }
  return meanFromTrue(nu, e);
}

/** [q, e, i, Ω, ω, ν] of a state into out (shared by both element forms). */
function shapeAndTrueAnomaly(state: Float64Array, stateOffset: number, mu: number, out: Float64Array, offset: number): void {
  const x = state[stateOffset], y = state[stateOffset + 1], z = state[stateOffset + 2];
  const vx = state[stateOffset + 3], vy = state[stateOffset + 4], vz = state[stateOffset + 5];
  const r = Math.hypot(x, y, z);
  if (!(r > 0 && Number.isFinite(r) && Number.isFinite(vx + vy + vz) && mu > 0 && Number.isFinite(mu))) {
    throw new RangeError(`state to elements: bad input r=(${x}, ${y}, ${z}) v=(${vx}, ${vy}, ${vz}) mu=${mu}`);
  }
  const hx = y * vz - z * vy, hy = z * vx - x * vz, hz = x * vy - y * vx;
  const hxy = Math.hypot(hx, hy);
  const h = Math.hypot(hxy, hz);
  if (!(h > 0)) throw new RangeError('state to elements: rectilinear orbit (zero angular momentum)');
  const iRad = Math.atan2(hxy, hz);
  const node = hxy === 0 ? 0 : wrapTwoPi(Math.atan2(hx, -hy));
  // Node direction N and M = ĥ × N in the orbit plane.
  const nx = Math.cos(node), ny = Math.sin(node);
  const ux = hx / h, uy = hy / h, uz = hz / h;
  const mx = -uz * ny, my = uz * nx, mz = ux * ny - uy * nx;
  // Eccentricity vector e = ((v² − μ/r) r − (r·v) v) / μ.
  const v2 = vx * vx + vy * vy + vz * vz;
  const rv = x * vx + y * vy + z * vz;
  const ka = v2 - mu / r;
  const ex = (ka * x - rv * vx) / mu, ey = (ka * y - rv * vy) / mu, ez = (ka * z - rv * vz) / mu;
  const e = Math.hypot(ex, ey, ez);
  const peri = e === 0 ? 0 : wrapTwoPi(Math.atan2(ex * mx + ey * my + ez * mz, ex * nx + ey * ny));
  // True anomaly from the perihelion direction P = cos ω N + sin ω M, Q = ĥ × P.
  const cw = Math.cos(peri), sw = Math.sin(peri);
  const px = cw * nx + sw * mx, py = cw * ny + sw * my, pz = sw * mz;
  const qx = uy * pz - uz * py, qy = uz * px - ux * pz, qz = ux * py - uy * px;
  const nu = Math.atan2(x * qx + y * qy + z * qz, x * px + y * py + z * pz);
  const q = (h * h) / (mu * (1 + e));
  out[offset] = q;
  out[offset + 1] = e;
  out[offset + 2] = iRad;
  out[offset + 3] = node;
  out[offset + 4] = peri;
  out[offset + 5] = nu;
}

/**
 * Semimajor-axis elements [a, e, i, Ω, ω, M] at the state's epoch (M in [0, 2π) when e < 1).
 * RangeError for e = 1 exactly (no finite a).
 */
export function stateToSemimajorElements(
  state: Float64Array, mu: number, out: Float64Array, offset = 0, stateOffset = 0,
): void {
  shapeAndTrueAnomaly(state, stateOffset, mu, EL, 0);
  const q = EL[0], e = EL[1];
  if (e === 1) throw new RangeError('stateToSemimajorElements: parabolic orbit (e = 1) has no finite a');
  const m = meanAnomalyOfState(state, stateOffset, EL[5], q / Math.abs(1 - e), e, mu);
  out[offset] = q / (1 - e);
  out[offset + 1] = e;
  out[offset + 2] = EL[2];
  out[offset + 3] = EL[3];
  out[offset + 4] = EL[4];
  out[offset + 5] = e < 1 ? wrapTwoPi(m) : m;
}

/** Object form of perihelionElementsToState (allocates the result; not for hot loops). */
export function stateFromPerihelion(el: PerihelionElements, epochJd: number, mu = GM_SUN_AU3_PER_DAY2): Float64Array {
  const out = new Float64Array(6);
  perihelionElementsToState(el.qAu, el.e, el.iRad, el.nodeRad, el.periRad, el.tpJd, epochJd, mu, out);
  return out;
}

/** Object form of stateToPerihelionElements. */
export function perihelionFromState(state: Float64Array, epochJd: number, mu = GM_SUN_AU3_PER_DAY2): PerihelionElements {
  stateToPerihelionElements(state, epochJd, mu, EL);
  return { qAu: EL[0], e: EL[1], iRad: EL[2], nodeRad: EL[3], periRad: EL[4], tpJd: EL[5] };
}

/** Object form of semimajorElementsToState. */
export function stateFromSemimajor(el: SemimajorElements, mu = GM_SUN_AU3_PER_DAY2): Float64Array {
  const out = new Float64Array(6);
  semimajorElementsToState(el.aAu, el.e, el.iRad, el.nodeRad, el.periRad, el.meanAnomalyRad, mu, out);
  return out;
}

/** Object form of stateToSemimajorElements. */
export function semimajorFromState(state: Float64Array, mu = GM_SUN_AU3_PER_DAY2): SemimajorElements {
  stateToSemimajorElements(state, mu, EL);
  return { aAu: EL[0], e: EL[1], iRad: EL[2], nodeRad: EL[3], periRad: EL[4], meanAnomalyRad: EL[5] };
}
