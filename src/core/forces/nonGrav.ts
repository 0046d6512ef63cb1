/**
 * Non-gravitational acceleration in the orbit's radial–transverse–normal frame
 * (Marsden, Sekanina & Yeomans 1973, AJ 78, 211, eq. 1):
 *   a = g(r) (A1 ê_R + A2 ê_T + A3 ê_N),
 *   ê_R = r/r,  ê_N = (r × v)/|r × v|,  ê_T = ê_N × ê_R = (r² v − (r·v) r)/(r |r × v|).
 * A1, A2, A3 in au/day² (the acceleration at r = 1 au when g(1) = 1).
 * Partials for the variational equations: ∂a/∂A_k = g ê_k; ∂a/∂r and ∂a/∂v from the
 * derivative of a unit vector u = w/|w|:  du = (I − u uᵀ) dw / |w|  (common practice).
 */
import { nonGravG, type NonGravLaw } from './nonGravLaw.js';

/**
 * Scratch for addNonGravAcceleration, owned by the caller: 3 unit vectors, g and g', and
 * two 3×3 work matrices. Allocate once with `new Float64Array(NONGRAV_SCRATCH)`.
 */
export const NONGRAV_SCRATCH = 32;

/**
 * Writes the unit vectors ê_R, ê_T, ê_N into s[0..8] and g, dg/dr into s[9], s[10] for
 * heliocentric position r (au) and velocity v (au/day) stored at pos[p..p+2], vel[p..p+2].
 * Returns r.
 */
export function rtnFrame(law: NonGravLaw, pos: Float64Array, vel: Float64Array, p: number,
  s: Float64Array): number {
  const x = pos[p], y = pos[p + 1], z = pos[p + 2];
  const vx = vel[p], vy = vel[p + 1], vz = vel[p + 2];
  const r = Math.sqrt(x * x + y * y + z * z);
  const hx = y * vz - z * vy, hy = z * vx - x * vz, hz = x * vy - y * vx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  s[0] = x / r; s[1] = y / r; s[2] = z / r;
  s[6] = hx / hn; s[7] = hy / hn; s[8] = hz / hn;
  // ê_T = ê_N × ê_R
  s[3] = s[7] * s[2] - s[8] * s[1];
  s[4] = s[8] * s[0] - s[6] * s[2];
  s[5] = s[6] * s[1] - s[7] * s[0];
  nonGravG(law, r, s, 9);
  return r;
}

/**
 * Adds g(A1 ê_R + A2 ê_T + A3 ê_N) to acc[o..o+2]. When gradR/gradV are non-null, adds
 * ∂a/∂r and ∂a/∂v; when `partials` is non-null, writes ∂a/∂A1, ∂a/∂A2, ∂a/∂A3 to
 * partials[q..q+8]. `s` is caller scratch of NONGRAV_SCRATCH numbers.
 */
export function addNonGravAcceleration(law: NonGravLaw, a1: number, a2: number, a3: number,
  pos: Float64Array, vel: Float64Array, p: number, acc: Float64Array, o: number,
  gradR: Float64Array | null, gradV: Float64Array | null, partials: Float64Array | null, q: number,
  s: Float64Array): void {
  const r = rtnFrame(law, pos, vel, p, s);
  const g = s[9];
  const dg = s[10];
  for (let i = 0; i < 3; i++) acc[o + i] += g * (a1 * s[i] + a2 * s[3 + i] + a3 * s[6 + i]);
  if (partials !== null) {
    for (let i = 0; i < 3; i++) {
      partials[q + i] = g * s[i];
      partials[q + 3 + i] = g * s[3 + i];
      partials[q + 6 + i] = g * s[6 + i];
    }
  }
  if (gradR === null || gradV === null) return;
  const x = pos[p], y = pos[p + 1], z = pos[p + 2];
  const vx = vel[p], vy = vel[p + 1], vz = vel[p + 2];
  const hx = y * vz - z * vy, hy = z * vx - x * vz, hz = x * vy - y * vx;
  const hn = Math.sqrt(hx * hx + hy * hy + hz * hz);
  const sv = x * vx + y * vy + z * vz;
  const r2 = r * r;
  // (1) g' (A1 ê_R + A2 ê_T + A3 ê_N) ê_Rᵀ
  for (let i = 0; i < 3; i++) {
    const w = dg * (a1 * s[i] + a2 * s[3 + i] + a3 * s[6 + i]);
    for (let j = 0; j < 3; j++) gradR[3 * i + j] += w * s[j];
  }
  // (2) g A1 dê_R/dr = g A1 (I − ê_R ê_Rᵀ)/r
  const cR = (g * a1) / r;
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) gradR[3 * i + j] += cR * ((i === j ? 1 : 0) - s[i] * s[j]);
  }
  const m = 11; // work matrix at s[11..19]
  // (3) g A3 dê_N: dh/dr = −[v]×, dh/dv = [r]×, scaled by (I − ê_N ê_Nᵀ)/|h|
  if (a3 !== 0) {
    crossMatrix(-vx, -vy, -vz, s, m);
    addProjected(s, 6, m, (g * a3) / hn, gradR);
    crossMatrix(x, y, z, s, m);
    addProjected(s, 6, m, (g * a3) / hn, gradV);
  }
  // (4) g A2 dê_T: w = r² v − (r·v) r, |w| = r |h|;
  //     dw/dr = 2 v rᵀ − r vᵀ − (r·v) I,  dw/dv = r² I − r rᵀ
  if (a2 !== 0) {
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        s[m + 3 * i + j] = 2 * vel[p + i] * pos[p + j] - pos[p + i] * vel[p + j] - (i === j ? sv : 0);
      }
    }
    addProjected(s, 3, m, (g * a2) / (r * hn), gradR);
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) s[m + 3 * i + j] = (i === j ? r2 : 0) - pos[p + i] * pos[p + j];
    }
    addProjected(s, 3, m, (g * a2) / (r * hn), gradV);
  }
}

/** s[m..m+8] = [w]×, the matrix of w × (·). */
function crossMatrix(wx: number, wy: number, wz: number, s: Float64Array, m: number): void {
  s[m] = 0; s[m + 1] = -wz; s[m + 2] = wy;
  s[m + 3] = wz; s[m + 4] = 0; s[m + 5] = -wx;
  s[m + 6] = -wy; s[m + 7] = wx; s[m + 8] = 0;
}

/** out += c (I − u uᵀ) M, with u = s[uo..uo+2] and M = s[m..m+8]. */
function addProjected(s: Float64Array, uo: number, m: number, c: number, out: Float64Array): void {
  const u0 = s[uo], u1 = s[uo + 1], u2 = s[uo + 2];
  for (let j = 0; j < 3; j++) {
    const m0 = s[m + j], m1 = s[m + 3 + j], m2 = s[m + 6 + j];
    const dot = u0 * m0 + u1 * m1 + u2 * m2; // (uᵀ M)_j
    out[j] += c * (m0 - u0 * dot);
    out[3 + j] += c * (m1 - u1 * dot);
    out[6 + j] += c * (m2 - u2 * dot);
  }
}
