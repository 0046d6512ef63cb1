/**
 * Direct evaluation of the VSOP87 "B" series (Bretagnon & Francou 1988, A&A 202, 309):
 * heliocentric positions and analytic velocities of the eight planets.
 *
 * Frame: VSOP87B is referred to the dynamical ecliptic and equinox J2000 (fitted to DE200).
 * The rest of the core treats it as the J2000 ecliptic of the core's frame. The difference
 * to the ICRF-based ecliptic (ICRF equator tilted by the IAU 2006 obliquity) is a rotation
 * of order 0.1″: the VSOP87-to-FK5 rotation has off-diagonal elements of 1.9e-7–4.8e-7 rad
 * (0.04–0.10″; as used in astronomy-engine 2.1.19's ecliptic-to-equatorial matrix) and FK5
 * differs from the ICRF by ≈ 0.02″ (frame bias; from memory). In position that is ≲ 70 km
 * at 1 au and ≲ 2 000 km at Neptune; it is constant in time and common to all planets.
 *
 * Time argument: TDB Julian date; VSOP87 uses TDB (≈ TT to < 2 ms), τ = (JD − 2451545)/365250.
 */
import { J2000_JD } from '../constants.js';
import type { PlanetName } from '../constants.js';
import { VSOP87_MAX_POWER, vsop87Series } from './vsop87Series.js';
import type { Vsop87Series } from './vsop87Series.js';

/** Days per Julian millennium, the VSOP87 time unit. */
export const DAYS_PER_JULIAN_MILLENNIUM = 365_250;

const BLOCKS = VSOP87_MAX_POWER + 1;

/**
 * Spherical variables and their τ-derivatives: out = [L, B, R, dL/dτ, dB/dτ, dR/dτ]
 * (rad, rad, au; per Julian millennium). L is not wrapped.
 * d/dτ [τ^α A cos(B + Cτ)] = α τ^(α−1) A cos(B + Cτ) − τ^α A C sin(B + Cτ).
 */
export function vsop87Spherical(series: Vsop87Series, tau: number, out: Float64Array): void {
  const abc = series.abc;
  const blockStart = series.blockStart;
  for (let v = 0; v < 3; v++) {
    let value = 0;
    let rate = 0;
    let tauPow = 1; // τ^α
    let tauPowPrev = 0; // τ^(α−1), unused at α = 0
    for (let alpha = 0; alpha < BLOCKS; alpha++) {
      const first = blockStart[v * BLOCKS + alpha];
      const last = blockStart[v * BLOCKS + alpha + 1];
      let s = 0;
      let ds = 0;
      for (let k = 3 * first, end = 3 * last; k < end; k += 3) {
        const a = abc[k];
        const c = abc[k + 2];
        const arg = abc[k + 1] + c * tau;
        s += a * Math.cos(arg);
        ds -= a * c * Math.sin(arg);
      }
      value += tauPow * s;
      rate += tauPow * ds + alpha * tauPowPrev * s;
      tauPowPrev = tauPow;
      tauPow *= tau;
    }
    out[v] = value;
    out[v + 3] = rate;
  }
}

/**
 * Spherical (L, B, R and rates per day) → rectangular position (au) and velocity (au/day),
 * written to out[offset .. offset+5]. Chain rule on x = R cosB cosL, y = R cosB sinL,
 * z = R sinB.
 */
export function sphericalToRectangularState(lbr: Float64Array, out: Float64Array, offset: number): void {
  const l = lbr[0];
  const b = lbr[1];
  const r = lbr[2];
  const dl = lbr[3];
  const db = lbr[4];
  const dr = lbr[5];
  const cl = Math.cos(l);
  const sl = Math.sin(l);
  const cb = Math.cos(b);
  const sb = Math.sin(b);
  out[offset] = r * cb * cl;
  out[offset + 1] = r * cb * sl;
  out[offset + 2] = r * sb;
  out[offset + 3] = dr * cb * cl - r * sb * db * cl - r * cb * sl * dl;
  out[offset + 4] = dr * cb * sl - r * sb * db * sl + r * cb * cl * dl;
  out[offset + 5] = dr * sb + r * cb * db;
}

// Scratch for one evaluation; the functions below are synchronous and not recursive.
const lbrScratch = new Float64Array(6);

/**
 * Heliocentric J2000-ecliptic state of `planet` at `jdTDB` from the full VSOP87B series:
 * x, y, z (au), vx, vy, vz (au/day) into out[offset .. offset+5].
 */
export function vsop87HelioState(planet: PlanetName, jdTDB: number, out: Float64Array, offset = 0): void {
  const tau = (jdTDB - J2000_JD) / DAYS_PER_JULIAN_MILLENNIUM;
  vsop87Spherical(vsop87Series(planet), tau, lbrScratch);
  lbrScratch[3] /= DAYS_PER_JULIAN_MILLENNIUM;
  lbrScratch[4] /= DAYS_PER_JULIAN_MILLENNIUM;
  lbrScratch[5] /= DAYS_PER_JULIAN_MILLENNIUM;
  sphericalToRectangularState(lbrScratch, out, offset);
}
