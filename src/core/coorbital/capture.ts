/**
 * Temporary capture by a planet (used for the Earth), from sampled planetocentric motion.
 *
 * Definitions, as seen (design note on the co-orbital detector, §4):
 *  - Fedorets, Granvik et al. 2014 (DPS 46, 403.05, abstract) [seen]: "a natural Earth
 *    satellite ... is on an elliptic geocentric orbit within 0.03 au from the Earth"; a
 *    temporarily-captured orbiter (TCO) makes "at least one full revolution around the Earth
 *    in a coordinate system co-rotating with the Sun", a temporarily-captured flyby fails to.
 *  - Granvik, Vaubaillon & Jedicke 2012 (Icarus, doi 10.1016/j.icarus.2011.12.003, abstract)
 *    [seen]: a TCO is "an object that makes at least one revolution around the Earth in a
 *    co-rotating coordinate system".
 *  - Fedorets, Granvik & Jedicke 2017 (Icarus 285, 83, abstract) [seen]: flybys are
 *    "gravitationally bound" but "fail to make a complete orbit".
 *  - The wording "planetocentric Keplerian energy E < 0 while within three Hill radii" is
 *    from memory of Granvik et al. 2012 (not seen).
 * Criterion used here: two-body energy ε = v²/2 − GM/r < 0 about the planet and r < 3 r_H
 * (for the Earth–Moon system 3 r_H ≈ 0.030 au, the 0.03 au above). Revolutions: the turning
 * of the planetocentric direction in the frame rotating with the Sun–planet line (x towards
 * the planet from the Sun, z along the planet's heliocentric orbital angular momentum), in
 * turns; ≥ 1 makes a TCO in the sense above. 'earth' = the Earth–Moon barycentre with the
 * Earth + Moon GM (constants.ts), since the definitions above do not say which [design].
 */
import { GM_SUN_AU3_PER_DAY2, PLANET_MEAN_A_AU, planetGmAu3PerDay2, type PlanetName } from '../constants.js';
import { TWO_PI, wrapPi } from '../math.js';
import type { CaptureEpisode } from './types.js';

/** Capture zone, in Hill radii (from memory of Granvik et al. 2012; see above). */
export const CAPTURE_HILL_RADII = 3;

/**
 * Hill radius r_H = a (μ/3)^(1/3) with μ = GM_planet / GM_sun and a the planet's mean
 * semimajor axis (Murray & Dermott 1999, §3.13 — section from memory; common practice).
 * Earth–Moon system: 0.0100 au.
 */
export function hillRadiusAu(planet: PlanetName): number {
  return PLANET_MEAN_A_AU[planet] * Math.cbrt(planetGmAu3PerDay2(planet) / GM_SUN_AU3_PER_DAY2 / 3);
}

/** Per-sample planetocentric quantities (columns, one entry per sample). */
export interface PlanetocentricSeries {
  distanceAu: Float64Array;
  energyAu2PerDay2: Float64Array; // two-body energy per unit mass about the planet
  rotatingAngleRad: Float64Array; // direction in the frame rotating with the Sun–planet line
}

export function createPlanetocentricSeries(n: number): PlanetocentricSeries {
  return { distanceAu: new Float64Array(n), energyAu2PerDay2: new Float64Array(n), rotatingAngleRad: new Float64Array(n) };
}

/**
 * Fill sample k of `out` from heliocentric states of the body and the planet (6 numbers each
 * from the offsets; au, au/day) and the planet's GM (au³/day²). With `angleWithinAu` the
 * rotating-frame angle is computed only for a bound sample (energy < 0) closer than that, and
 * is NaN elsewhere: findCaptureEpisodes reads it nowhere else when its maxDistanceAu is no
 * larger, and a long run saves two norms and an arctangent on most samples.
 */
export function planetocentricSampleInto(
  body: Float64Array, bodyOffset: number, planet: Float64Array, planetOffset: number, gmAu3PerDay2: number,
  out: PlanetocentricSeries, k: number, angleWithinAu?: number,
): void {
  const dx = body[bodyOffset] - planet[planetOffset];
  const dy = body[bodyOffset + 1] - planet[planetOffset + 1];
  const dz = body[bodyOffset + 2] - planet[planetOffset + 2];
  const du = body[bodyOffset + 3] - planet[planetOffset + 3];
  const dv = body[bodyOffset + 4] - planet[planetOffset + 4];
  const dw = body[bodyOffset + 5] - planet[planetOffset + 5];
  const r = Math.hypot(dx, dy, dz);
  out.distanceAu[k] = r;
  const energy = 0.5 * (du * du + dv * dv + dw * dw) - gmAu3PerDay2 / r;
  out.energyAu2PerDay2[k] = energy;
  if (angleWithinAu !== undefined && !(energy < 0 && r < angleWithinAu)) {
    out.rotatingAngleRad[k] = NaN;
    return;
  }
  // Rotating frame: x̂ = r_P/|r_P|, ẑ = (r_P × v_P)/|…|, ŷ = ẑ × x̂.
  const px = planet[planetOffset], py = planet[planetOffset + 1], pz = planet[planetOffset + 2];
  const pu = planet[planetOffset + 3], pv = planet[planetOffset + 4], pw = planet[planetOffset + 5];
  const hx = py * pw - pz * pv, hy = pz * pu - px * pw, hz = px * pv - py * pu;
  // ŷ ∝ h × r_P (same direction as ẑ × x̂); the common scale does not change atan2.
  const yx = hy * pz - hz * py, yy = hz * px - hx * pz, yz = hx * py - hy * px;
  const rp = Math.hypot(px, py, pz), yn = Math.hypot(yx, yy, yz);
  out.rotatingAngleRad[k] = Math.atan2((dx * yx + dy * yy + dz * yz) / yn, (dx * px + dy * py + dz * pz) / rp);
}

/**
 * Capture episodes: maximal runs of samples with energy < 0 and distance < maxDistanceAu.
 * An episode starts at its first such sample and ends (exclusive) at the first sample after
 * it (the last sample when it runs to the end). Revolutions from the summed wrapped steps of
 * the rotating-frame angle, so samples must be dense against the planetocentric period.
 */
export function findCaptureEpisodes(
  timesJd: Float64Array, series: PlanetocentricSeries, maxDistanceAu: number,
): CaptureEpisode[] {
  const n = timesJd.length;
  const { distanceAu: r, energyAu2PerDay2: en, rotatingAngleRad: th } = series;
  const episodes: CaptureEpisode[] = [];
  let k = 0;
  while (k < n) {
    if (!(en[k] < 0 && r[k] < maxDistanceAu)) { k++; continue; }
    const start = k;
    let minD = r[k], turnRad = 0;
    k++;
    while (k < n && en[k] < 0 && r[k] < maxDistanceAu) {
      turnRad += wrapPi(th[k] - th[k - 1]);
      if (r[k] < minD) minD = r[k];
      k++;
    }
    episodes.push({
      startJdTDB: timesJd[start], endJdTDB: timesJd[Math.min(k, n - 1)], minDistanceAu: minD,
      revolutions: Math.abs(turnRad) / TWO_PI,
    });
  }
  return episodes;
}
