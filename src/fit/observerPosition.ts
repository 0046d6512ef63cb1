/**
 * Heliocentric position and velocity of the observer at an observation, ICRF equatorial, au
 * and au/day.
 *
 *   r_obs = M · r_Earth,ecliptic + Bᵀ · r_site,J2000     (frameBias.ts)
 *
 * M turns the core's (VSOP87's) ecliptic to the ICRF (through the FK5), B is the frame bias.
 *
 * - r_Earth: the geocentre from the project's planetary ephemeris, body 'earth' (VSOP87B
 *   Earth: the geocentre itself, not the Earth–Moon barycentre, which lies about 4 700 km
 *   away; checked against ERFA epv00 in test/fit/observerPosition.test.ts), at TDB.
 * - r_site: a fixed site from its parallax constants through
 *   src/core/frames/observer.ts (IAU 2006 precession, GMST with UT1 ≈ UTC, no nutation or
 *   polar motion: ≤ 0.8 km in the worst case, its header); a roving site through
 *   geodeticSite.ts (WGS84) and the same; a space-based observer's geocentric vector as the
 *   record gives it (taken as ICRF; it has no velocity, so the velocity is NaN).
 * - TDB = TT + (TDB − TT) at the geocentre (src/core/time/timeScales.ts, ~10 µs); the
 *   topocentric part of TDB − TT (< 2 µs) is left out.
 * Error budget of r_obs against a modern ephemeris: the ephemeris' Earth (VSOP87 truncated as
 * the core keeps it, a few km; measured in the test) plus the site model's ≤ 0.8 km.
 */
import { KM_PER_AU, SECONDS_PER_DAY } from '../core/constants.js';
import { observerGeocentricState } from '../core/frames/observer.js';
import { tdbMinusTtSeconds } from '../core/time/timeScales.js';
import type { Ephemeris } from '../core/types.js';
import { ECLIPTIC_TO_ICRF_MATRIX, J2000_TO_ICRF_MATRIX, rotate3 } from './frameBias.js';
import { geodeticToParallax } from './geodeticSite.js';
import type { ObserverPlace, ObserverState } from './types.js';

const EARTH = new Float64Array(6); // scratch, rewritten on every call
const SITE = new Float64Array(6); // scratch, rewritten on every call

/** TDB Julian date of a TT Julian date (geocentric TDB − TT, timeScales.ts). */
export function jdTTToTDB(jdTT: number): number {
  return jdTT + tdbMinusTtSeconds(jdTT) / SECONDS_PER_DAY;
}

/**
 * The observer's heliocentric ICRF state at the instant given in UTC (for the Earth's
 * rotation, UT1 ≈ UTC) and TT (for everything else). RangeError for non-finite times or a
 * time outside the ephemeris' span.
 */
export function observerHeliocentricState(place: ObserverPlace, jdUtc: number, jdTT: number, eph: Ephemeris): ObserverState {
  if (!Number.isFinite(jdUtc) || !Number.isFinite(jdTT)) {
    throw new RangeError(`observerHeliocentricState: non-finite time jdUtc=${jdUtc} jdTT=${jdTT}`);
  }
  const jdTDB = jdTTToTDB(jdTT);
  eph.helioState('earth', jdTDB, EARTH, 0);
  const position = new Float64Array(3);
  const velocity = new Float64Array(3);
  rotate3(ECLIPTIC_TO_ICRF_MATRIX, EARTH, 0, position, 0);
  rotate3(ECLIPTIC_TO_ICRF_MATRIX, EARTH, 3, velocity, 0);
  if (place.kind === 'space') {
    for (let k = 0; k < 3; k++) {
      if (!Number.isFinite(place.geocentricKm[k])) {
        throw new RangeError(`observerHeliocentricState: non-finite geocentric position ${place.geocentricKm.join(', ')} km`);
      }
      position[k] += place.geocentricKm[k] / KM_PER_AU;
    }
    velocity.fill(NaN);
    return { positionIcrfAu: position, velocityIcrfAuPerDay: velocity, jdTDB };
  }
  siteGeocentricJ2000(place, jdUtc, jdTT);
  rotate3(J2000_TO_ICRF_MATRIX, SITE, 0, SITE, 0);
  rotate3(J2000_TO_ICRF_MATRIX, SITE, 3, SITE, 3);
  for (let k = 0; k < 3; k++) {
    position[k] += SITE[k];
    velocity[k] += SITE[k + 3];
  }
  return { positionIcrfAu: position, velocityIcrfAuPerDay: velocity, jdTDB };
}

/** The geocentric J2000-mean-equatorial state of a fixed or geodetic site into SITE. */
function siteGeocentricJ2000(place: Exclude<ObserverPlace, { kind: 'space' }>, jdUtc: number, jdTT: number): void {
  if (place.kind === 'site') {
    observerGeocentricState(place.longitudeDegE, place.rhoCosPhiPrime, place.rhoSinPhiPrime, jdUtc, jdTT, 'equatorial', SITE, 0);
  } else if (place.kind === 'geodetic') {
    const p = geodeticToParallax(place.latitudeDeg, place.altitudeM);
    observerGeocentricState(place.longitudeDegE, p.rhoCosPhiPrime, p.rhoSinPhiPrime, jdUtc, jdTT, 'equatorial', SITE, 0);
  } else {
    throw new TypeError(`observerHeliocentricState: unknown observer kind '${String((place as { kind: unknown }).kind)}'`);
  }
}
