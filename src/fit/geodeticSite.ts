/**
 * A site given by geodetic longitude, latitude and height on the WGS84 ellipsoid, turned into
 * the parallax constants ρ cos φ′, ρ sin φ′ (Earth equatorial radii of 6378.1366 km, the unit
 * of the observatory-code table and of src/core/frames/observer.ts).
 *
 * WGS84: a = 6 378 137 m, 1/f = 298.257 223 563 (NIMA TR8350.2, 3rd ed. 2000, ch. 3; from
 * memory). Geodetic → geocentric (common practice; ERFA gc2gd/gd2gc use the same):
 *   N = a / √(1 − e² sin² φ),  e² = f (2 − f)
 *   ρ cos φ′ = (N + h) cos φ / R,  ρ sin φ′ = (N (1 − e²) + h) sin φ / R.
 * Tested against ERFA gd2gc (test/fit/observerPosition.test.ts).
 */
import { EARTH_EQUATORIAL_RADIUS_KM } from '../core/frames/observer.js';
import { RAD_PER_DEG } from '../core/constants.js';

/** WGS84 semimajor axis, m (NIMA TR8350.2; from memory). */
export const WGS84_A_M = 6378137;
/** WGS84 flattening (NIMA TR8350.2; from memory). */
export const WGS84_F = 1 / 298.257223563;

export interface ParallaxConstants {
  rhoCosPhiPrime: number; // Earth equatorial radii
  rhoSinPhiPrime: number; // Earth equatorial radii
}

/**
 * Parallax constants of a geodetic site. `altitudeM` NaN is taken as 0 m (a roving record
 * may leave it out: at most a few km, i.e. < 0.001 of an Earth radius). RangeError for a
 * latitude outside [−90°, 90°] or a non-finite latitude.
 */
export function geodeticToParallax(latitudeDeg: number, altitudeM: number): ParallaxConstants {
  if (!(Math.abs(latitudeDeg) <= 90)) throw new RangeError(`geodeticToParallax: latitude ${latitudeDeg}° is not in [−90°, 90°]`);
  const h = Number.isNaN(altitudeM) ? 0 : altitudeM;
  if (!Number.isFinite(h)) throw new RangeError(`geodeticToParallax: altitude ${altitudeM} m is not finite`);
  const phi = latitudeDeg * RAD_PER_DEG;
  const s = Math.sin(phi);
  const e2 = WGS84_F * (2 - WGS84_F);
  const n = WGS84_A_M / Math.sqrt(1 - e2 * s * s);
  const rM = EARTH_EQUATORIAL_RADIUS_KM * 1000;
  return {
    rhoCosPhiPrime: ((n + h) * Math.cos(phi)) / rM,
    rhoSinPhiPrime: ((n * (1 - e2) + h) * s) / rM,
  };
}
