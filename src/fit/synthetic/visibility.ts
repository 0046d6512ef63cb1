/**
 * When a body can be observed from a station: the Sun below a set altitude (night), the body
 * above a set altitude, and the body far enough from the Sun in the sky (solar elongation).
 * Geometry in the core's heliocentric J2000 ecliptic: the Earth from the ephemeris, the site
 * from its parallax constants and the core's Earth rotation (src/core/frames/observer.ts:
 * IAU 2006 precession and GMST, UT1 ≈ UTC). Approximations, each far below what decides a
 * night: the zenith is taken along the geocentric site vector (geocentric, not geodetic,
 * vertical: ≤ 0.19°, the largest difference of the two latitudes, from memory), directions are
 * geometric (no light time, aberration or refraction: refraction lifts a body at 20° altitude
 * by about 0.04°, common practice), and the Sun is a point.
 */
import { DEG_PER_RAD } from '../../core/constants.js';
import { observerGeocentricState } from '../../core/frames/observer.js';
import { acosClamped, asinClamped } from '../../core/math.js';
import type { Ephemeris } from '../../core/types.js';
import type { ObservatorySite } from '../../io/astrometry/types.js';
import type { VisibilityRules } from './types.js';

/**
 * Defaults: elongation > 70° (the brief's 60°–90° band; surveys rarely point nearer the Sun,
 * common practice), Sun below −12° (nautical twilight over, common practice), body above 20°
 * (airmass below about 2.9, common practice).
 */
export const DEFAULT_VISIBILITY: VisibilityRules = Object.freeze({
  minSolarElongationDeg: 70,
  maxSunAltitudeDeg: -12,
  minBodyAltitudeDeg: 20,
});

export interface ObservingGeometry {
  sunAltitudeDeg: number;
  bodyAltitudeDeg: number;
  solarElongationDeg: number;
}

const EARTH = new Float64Array(6); // scratch, rewritten on every call
const SITE = new Float64Array(6); // scratch, rewritten on every call

/** Geometry of the body at heliocentric ecliptic position `body[o..o+2]` (au) from `site`. */
export function observingGeometry(site: ObservatorySite, jdUtc: number, jdTT: number, jdTDB: number, eph: Ephemeris,
  body: ArrayLike<number>, o = 0): ObservingGeometry {
  if (!site.fixedSite || !(Math.hypot(site.rhoCosPhiPrime, site.rhoSinPhiPrime) > 0)) {
    throw new RangeError(`observingGeometry: station ${site.code} has no fixed site on the Earth's surface`);
  }
  eph.helioState('earth', jdTDB, EARTH, 0);
  observerGeocentricState(site.longitudeDegE, site.rhoCosPhiPrime, site.rhoSinPhiPrime, jdUtc, jdTT, 'ecliptic', SITE, 0);
  const zr = Math.hypot(SITE[0], SITE[1], SITE[2]);
  const zx = SITE[0] / zr, zy = SITE[1] / zr, zz = SITE[2] / zr;
  const ox = EARTH[0] + SITE[0], oy = EARTH[1] + SITE[1], oz = EARTH[2] + SITE[2]; // observer, heliocentric
  const sr = Math.hypot(ox, oy, oz);
  const sx = -ox / sr, sy = -oy / sr, sz = -oz / sr; // towards the Sun
  const px = body[o] - ox, py = body[o + 1] - oy, pz = body[o + 2] - oz;
  const pr = Math.hypot(px, py, pz);
  const bx = px / pr, by = py / pr, bz = pz / pr; // towards the body
  return {
    sunAltitudeDeg: asinClamped(zx * sx + zy * sy + zz * sz) * DEG_PER_RAD,
    bodyAltitudeDeg: asinClamped(zx * bx + zy * by + zz * bz) * DEG_PER_RAD,
    solarElongationDeg: acosClamped(sx * bx + sy * by + sz * bz) * DEG_PER_RAD,
  };
}

/** True when every rule holds. */
export function isObservable(g: ObservingGeometry, rules: VisibilityRules): boolean {
  return g.solarElongationDeg > rules.minSolarElongationDeg && g.sunAltitudeDeg < rules.maxSunAltitudeDeg
    && g.bodyAltitudeDeg > rules.minBodyAltitudeDeg;
}
