/**
 * Geocentric Moon from the lunar theory ELP/MPP02 (Chapront & Francou 2003, A&A 404, 735;
 * series and method as in Chapront & Francou 2002, "The lunar theory ELP revisited",
 * elpmpp02.pdf), version fitted to DE405, in the truncated form shipped by the astronomia
 * package (4.2.0, data/elpMppDe.js).
 *
 * Series (T in Julian centuries TDB from J2000):
 *   V = Σ_α T^α Σ_k A_k sin(φ0 + φ1 T + φ2 T² + φ3 T³ + φ4 T⁴),
 *   longitude = W1(T) + V_L (arcsec → rad), latitude = V_B (arcsec), distance = V_R (km),
 * on the mean ecliptic of date; then rotated to the inertial mean ecliptic and equinox of
 * J2000 with the rotation built from Laskar's precession quantities P and Q (elpmpp02.pdf,
 * section on the transformation to the J2000 ecliptic). Velocities are analytic: d/dT of
 * every term, with the rate of the P, Q rotation included.
 * Time argument: TDB (the theory's own time scale).
 * Accuracy (test/core/ephemerisVsop87.test.ts, ephemerisAstronomyEngine.test.ts): this
 * truncated series is within 0.1 km of the complete ELP/MPP02 series over 1900–2100, and
 * within 16 km of astronomy-engine's independent (shorter) lunar series; the analytic
 * velocities match numerical differences to 3e-3 km/day.
 */
import elpData from 'astronomia/data/elpMppDe';
import { J2000_JD, DAYS_PER_JULIAN_CENTURY, ARCSEC_PER_RAD, EARTH_MOON_MASS_RATIO, KM_PER_AU } from '../constants.js';

/**
 * The Earth–Moon barycentre lies geocentric Moon / (1 + M_earth/M_moon) from the geocentre
 * (definition of the centre of mass; common practice): au of EMB offset per km of the Moon's.
 */
export const MOON_TO_EMB_AU_PER_KM = 1 / ((1 + EARTH_MOON_MASS_RATIO) * KM_PER_AU);

/** Powers of T present in the ELP/MPP02 series (α = 0..3). */
const BLOCKS = 4;
const ROW = 6; // A, φ0, φ1, φ2, φ3, φ4

interface ElpPacked {
  rows: Float64Array;
  blockStart: Int32Array; // variable v (0 L, 1 B, 2 R), power α: [v*4+α, v*4+α+1) in rows
  w1: Float64Array; // mean longitude polynomial coefficients (rad, rad/cy^k)
}

let packed: ElpPacked | undefined;

function pack(): ElpPacked {
  const variables = [elpData.L, elpData.B, elpData.R];
  const blockStart = new Int32Array(3 * BLOCKS + 1);
  let count = 0;
  for (let v = 0; v < 3; v++) {
    for (let alpha = 0; alpha < BLOCKS; alpha++) {
      blockStart[v * BLOCKS + alpha] = count;
      count += variables[v][String(alpha)]?.length ?? 0;
    }
  }
  blockStart[3 * BLOCKS] = count;
  const rows = new Float64Array(ROW * count);
  let k = 0;
  for (let v = 0; v < 3; v++) {
    for (let alpha = 0; alpha < BLOCKS; alpha++) {
      for (const row of variables[v][String(alpha)] ?? []) {
        for (let j = 0; j < ROW; j++) rows[k++] = row[j] ?? 0;
      }
    }
  }
  return { rows, blockStart, w1: Float64Array.from(elpData.W1) };
}

/**
 * The packed ELP/MPP02 series, for bulk evaluators: `rows` holds A, φ0..φ4 per term (A in
 * arcsec for L and B, km for R; φ in rad, T in centuries); the terms of variable v (0 L,
 * 1 B, 2 R) and power α occupy rows [blockStart[v*4+α], blockStart[v*4+α+1]). Each term is
 * A sin(φ0 + φ1 T + … + φ4 T⁴). Read-only.
 */
export function elpPackedSeries(): { readonly rows: Float64Array; readonly blockStart: Int32Array; readonly powers: number } {
  if (packed === undefined) packed = pack();
  return { rows: packed.rows, blockStart: packed.blockStart, powers: BLOCKS };
}

/** Value and d/dT of a polynomial with coefficients c (ascending powers) at t. */
function polyWithRate(c: ArrayLike<number>, t: number, out: Float64Array, at: number): void {
  let p = 0;
  let dp = 0;
  for (let j = c.length - 1; j >= 0; j--) {
    dp = dp * t + p;
    p = p * t + c[j];
  }
  out[at] = p;
  out[at + 1] = dp;
}

// Laskar's P and Q polynomials (elpmpp02.pdf, section 5), T in centuries.
const P_COEFFS = [0, 0.10180391e-4, 0.47020439e-6, -0.5417367e-9, -0.2507948e-11, 0.463486e-14];
const Q_COEFFS = [0, -0.113469002e-3, 0.12372674e-6, 0.12654170e-8, -0.1371808e-11, -0.320334e-14];

const lbr = new Float64Array(6); // L, B, R, dL/dT, dB/dT, dR/dT
const poly = new Float64Array(2);
const ofDate = new Float64Array(6);

/** Sum the three series and their T-derivatives into `lbr` (V_L, V_B in arcsec; V_R in km). */
function sumSeries(p: ElpPacked, t: number): void {
  const rows = p.rows;
  for (let v = 0; v < 3; v++) {
    let value = 0;
    let rate = 0;
    let tPow = 1;
    let tPowPrev = 0;
    for (let alpha = 0; alpha < BLOCKS; alpha++) {
      let s = 0;
      let ds = 0;
      const end = ROW * p.blockStart[v * BLOCKS + alpha + 1];
      for (let k = ROW * p.blockStart[v * BLOCKS + alpha]; k < end; k += ROW) {
        const phi = rows[k + 1] + t * (rows[k + 2] + t * (rows[k + 3] + t * (rows[k + 4] + t * rows[k + 5])));
        const dphi = rows[k + 2] + t * (2 * rows[k + 3] + t * (3 * rows[k + 4] + t * 4 * rows[k + 5]));
        s += rows[k] * Math.sin(phi);
        ds += rows[k] * Math.cos(phi) * dphi;
      }
      value += tPow * s;
      rate += tPow * ds + alpha * tPowPrev * s;
      tPowPrev = tPow;
      tPow *= t;
    }
    lbr[v] = value;
    lbr[v + 3] = rate;
  }
}

/**
 * Geocentric Moon, inertial mean ecliptic and equinox of J2000: x, y, z (km) and
 * vx, vy, vz (km/day) into out[offset .. offset+5]. `jdTDB`: Julian date, TDB.
 */
export function elpGeocentricMoonState(jdTDB: number, out: Float64Array, offset = 0): void {
  if (packed === undefined) packed = pack();
  const t = (jdTDB - J2000_JD) / DAYS_PER_JULIAN_CENTURY;
  sumSeries(packed, t);
  elpMoonStateFromSums(lbr, t, out, offset);
}

/**
 * Finish a Moon state from the summed series: `sums` = [V_L, V_B (arcsec), V_R (km), and
 * their d/dT per century] at T = `t` (Julian centuries TDB from J2000). Adds the mean
 * longitude W1, converts to rectangular coordinates on the ecliptic of date and rotates to
 * the J2000 ecliptic: x, y, z (km), vx, vy, vz (km/day) into out[offset .. offset+5].
 * `sums` is left unchanged. Shared by the direct evaluation and the bulk cache fill.
 */
export function elpMoonStateFromSums(sums: Float64Array, t: number, out: Float64Array, offset: number): void {
  if (packed === undefined) packed = pack();
  polyWithRate(packed.w1, t, poly, 0);
  const l = poly[0] + sums[0] / ARCSEC_PER_RAD;
  const dl = poly[1] + sums[3] / ARCSEC_PER_RAD;
  const b = sums[1] / ARCSEC_PER_RAD;
  const db = sums[4] / ARCSEC_PER_RAD;
  const r = sums[2], dr = sums[5];
  const cl = Math.cos(l), sl = Math.sin(l);
  const cb = Math.cos(b), sb = Math.sin(b);
  // Position and d/dT on the ecliptic of date (chain rule on spherical → rectangular).
  ofDate[0] = r * cb * cl;
  ofDate[1] = r * cb * sl;
  ofDate[2] = r * sb;
  ofDate[3] = dr * cb * cl - r * sb * db * cl - r * cb * sl * dl;
  ofDate[4] = dr * cb * sl - r * sb * db * sl + r * cb * cl * dl;
  ofDate[5] = dr * sb + r * cb * db;
  rotateToJ2000(t, out, offset);
}

/** Apply the P, Q rotation (and its T-derivative) to `ofDate`; velocities to km/day. */
function rotateToJ2000(t: number, out: Float64Array, offset: number): void {
  polyWithRate(P_COEFFS, t, poly, 0);
  const pp = poly[0], dp = poly[1];
  polyWithRate(Q_COEFFS, t, poly, 0);
  const q = poly[0], dq = poly[1];
  const sq = Math.sqrt(1 - pp * pp - q * q);
  const dsq = -(pp * dp + q * dq) / sq;
  const m11 = 1 - 2 * pp * pp, m12 = 2 * pp * q, m13 = 2 * pp * sq;
  const m21 = 2 * pp * q, m22 = 1 - 2 * q * q, m23 = -2 * q * sq;
  const m31 = -2 * pp * sq, m32 = 2 * q * sq, m33 = 1 - 2 * pp * pp - 2 * q * q;
  const d11 = -4 * pp * dp, d12 = 2 * (dp * q + pp * dq), d13 = 2 * (dp * sq + pp * dsq);
  const d22 = -4 * q * dq, d23 = -2 * (dq * sq + q * dsq);
  const d31 = -d13, d32 = -d23, d33 = d11 + d22;
  const x = ofDate[0], y = ofDate[1], z = ofDate[2];
  const vx = ofDate[3], vy = ofDate[4], vz = ofDate[5];
  const perDay = 1 / DAYS_PER_JULIAN_CENTURY;
  out[offset] = m11 * x + m12 * y + m13 * z;
  out[offset + 1] = m21 * x + m22 * y + m23 * z;
  out[offset + 2] = m31 * x + m32 * y + m33 * z;
  out[offset + 3] = (m11 * vx + m12 * vy + m13 * vz + d11 * x + d12 * y + d13 * z) * perDay;
  out[offset + 4] = (m21 * vx + m22 * vy + m23 * vz + d12 * x + d22 * y + d23 * z) * perDay;
  out[offset + 5] = (m31 * vx + m32 * vy + m33 * vz + d31 * x + d32 * y + d33 * z) * perDay;
}
