/**
 * Heliocentric state vectors → orbital elements, for every conic: the inverse of
 * twoBody.ts, whose file comment gives the element forms, buffers and the conventions for
 * angles that the state leaves undefined (i = 0 or 180°, e = 0).
 */
import { GM_SUN_AU3_PER_DAY2 } from '../constants.js';
import { wrapTwoPi } from '../math.js';
import { meanFromTrue, perihelionTimeOffsetDays } from './anomaly.js';
import type { PerihelionElements, SemimajorElements } from './twoBody.js';

const EL = new Float64Array(6); // scratch: elements

/**
 * Perihelion elements [q, e, i, Ω, ω, T] of the state at `epochJd`, written to
 * out[offset..offset+5]. Danby 1988 ch. 6 (angular momentum, Laplace–Runge–Lenz vector);
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
 * from r·v = √(μ|a|) e sinh H instead (Danby 1988 ch. 6, the analogue of r·v = √(μa) e sin E).
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

/** Object form of stateToPerihelionElements. */
export function perihelionFromState(state: Float64Array, epochJd: number, mu = GM_SUN_AU3_PER_DAY2): PerihelionElements {
  stateToPerihelionElements(state, epochJd, mu, EL);
  return { qAu: EL[0], e: EL[1], iRad: EL[2], nodeRad: EL[3], periRad: EL[4], tpJd: EL[5] };
}

/** Object form of stateToSemimajorElements. */
export function semimajorFromState(state: Float64Array, mu = GM_SUN_AU3_PER_DAY2): SemimajorElements {
  stateToSemimajorElements(state, mu, EL);
  return { aAu: EL[0], e: EL[1], iRad: EL[2], nodeRad: EL[3], periRad: EL[4], meanAnomalyRad: EL[5] };
}
