/**
 * Geocentric position and velocity of an observatory from its longitude and parallax
 * constants (ρ cos φ′, ρ sin φ′ in Earth equatorial radii, as the observatory-code table
 * gives them), in the ICRF equatorial frame or the J2000 ecliptic frame.
 *
 * Model: r_J2000 = Pᵀ · R3(−GMST) · r_terrestrial, with P the IAU 2006 precession
 * (precession.ts) and GMST the IAU 2006 mean sidereal time (earthRotation.ts), UT1 ≈ UTC.
 * Left out, with the position error each causes for a site on the equator:
 *   - nutation apart from what GMST absorbs: the part the equation of the equinoxes does
 *     not cancel tilts the pole by up to √((Δψ sin ε)² + Δε²) ≈ 11.5″ → ≤ 0.36 km;
 *   - UT1 − UTC (kept below 0.9 s by the IERS): 0.9 s × 0.465 km/s ≤ 0.42 km;
 *   - polar motion (≲ 0.5″): ≤ 0.016 km; frame bias (23 mas): 0.7 m.
 * So about 0.8 km in the worst case; the test against the full IAU 2006/2000A model with
 * UT1 = UTC shows the nutation part alone.
 */
import { KM_PER_AU, SECONDS_PER_DAY } from '../constants.js';
import { TWO_PI } from '../math.js';
import { gmst06Rad } from './earthRotation.js';
import { precessionMatrixP03 } from './precession.js';
import { equatorialToEclipticInPlace } from './frames.js';

/** Earth equatorial radius, km. IERS Conventions 2010, Table 1.1 (a_E = 6 378 136.6 m). */
export const EARTH_EQUATORIAL_RADIUS_KM = 6378.1366;
const EARTH_RADIUS_AU = EARTH_EQUATORIAL_RADIUS_KM / KM_PER_AU;
/** Earth rotation rate in rad/day, from the ERA rate (IERS Conventions 2010, ch. 5). */
export const EARTH_ROTATION_RAD_PER_DAY = TWO_PI * 1.00273781191135448;
/** The same in rad/s. */
export const EARTH_ROTATION_RAD_PER_S = EARTH_ROTATION_RAD_PER_DAY / SECONDS_PER_DAY;

export type ObserverFrame = 'equatorial' | 'ecliptic';

const P = new Float64Array(9); // scratch, fully rewritten on every call

/**
 * Write the observer's geocentric state (x, y, z in au; vx, vy, vz in au/day) into
 * out[offset..offset+5]. `jdUt1` may be a UTC Julian date (UT1 ≈ UTC, see file comment).
 */
export function observerGeocentricState(
  longitudeDegE: number,
  rhoCosPhiPrime: number,
  rhoSinPhiPrime: number,
  jdUt1: number,
  jdTT: number,
  frame: ObserverFrame,
  out: Float64Array,
  offset = 0,
): void {
  if (![longitudeDegE, rhoCosPhiPrime, rhoSinPhiPrime, jdUt1, jdTT].every(Number.isFinite)) {
    throw new RangeError(
      `observerGeocentricState: non-finite input lon=${longitudeDegE} ρcosφ′=${rhoCosPhiPrime} ρsinφ′=${rhoSinPhiPrime} jdUt1=${jdUt1} jdTT=${jdTT}`,
    );
  }
  const angle = gmst06Rad(jdUt1, 0, jdTT, 0) + (longitudeDegE * Math.PI) / 180;
  const rc = rhoCosPhiPrime * EARTH_RADIUS_AU;
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  // Mean equator and equinox of date; velocity = ω ẑ × r.
  const x = rc * c, y = rc * s, z = rhoSinPhiPrime * EARTH_RADIUS_AU;
  const vx = -EARTH_ROTATION_RAD_PER_DAY * y, vy = EARTH_ROTATION_RAD_PER_DAY * x;
  precessionMatrixP03(jdTT, P);
  // Pᵀ: J2000 = Pᵀ · date (column k of P dotted with the vector).
  out[offset] = P[0] * x + P[3] * y + P[6] * z;
  out[offset + 1] = P[1] * x + P[4] * y + P[7] * z;
  out[offset + 2] = P[2] * x + P[5] * y + P[8] * z;
  out[offset + 3] = P[0] * vx + P[3] * vy;
  out[offset + 4] = P[1] * vx + P[4] * vy;
  out[offset + 5] = P[2] * vx + P[5] * vy;
  if (frame === 'ecliptic') {
    equatorialToEclipticInPlace(out, offset);
    equatorialToEclipticInPlace(out, offset + 3);
  } else if (frame !== 'equatorial') {
    throw new TypeError(`observerGeocentricState: unknown frame '${String(frame)}'`);
  }
}
