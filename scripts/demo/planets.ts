/**
 * Mean longitudes of the planets the demo scenario places bodies against (Earth–Moon
 * barycentre, Mars, Jupiter, Neptune), for plausible initial conditions only.
 *
 * Source: E. M. Standish, "Keplerian Elements for Approximate Positions of the Major
 * Planets" (JPL Solar System Dynamics), Table 1 (valid 1800–2050 AD): mean longitude L0
 * (deg) and its rate (deg per Julian century) at J2000, longitude of perihelion ϖ and of
 * the node Ω (deg), J2000 ecliptic and equinox. The same table gives PLANET_MEAN_A_AU etc.
 * in src/core/constants.ts; the L, ϖ, Ω values below were written from memory of that
 * table and then checked digit for digit against a published verbatim copy of Table 1
 * (the test also compares L with Meeus's Table 31.A mean longitudes through astronomia).
 * Approximation: mean elements only (no periodic terms), so a planet's true longitude can
 * differ from its mean longitude by the equation of centre, up to about 2e rad (≈ 1.9° for
 * Earth, ≈ 5.5° for Jupiter).
 */
import { DAYS_PER_JULIAN_CENTURY, J2000_JD } from '../../src/core/constants.js';
import { wrapDeg360 } from '../../src/core/math.js';

export type ScenarioPlanet = 'earth' | 'mars' | 'jupiter' | 'neptune';

interface MeanLongitudeTerms {
  l0Deg: number; // mean longitude at J2000
  rateDegPerCentury: number; // dL/dT
  periLongitudeDeg: number; // ϖ at J2000
  nodeDeg: number; // Ω at J2000
}

/** Standish Table 1 (1800–2050 AD); 'earth' is the Earth–Moon barycentre row. */
export const STANDISH_MEAN_LONGITUDE: Readonly<Record<ScenarioPlanet, MeanLongitudeTerms>> = {
  earth: { l0Deg: 100.46457166, rateDegPerCentury: 35999.37244981, periLongitudeDeg: 102.93768193, nodeDeg: 0 },
  mars: { l0Deg: -4.55343205, rateDegPerCentury: 19140.30268499, periLongitudeDeg: -23.94362959, nodeDeg: 49.55953891 },
  jupiter: { l0Deg: 34.39644051, rateDegPerCentury: 3034.74612775, periLongitudeDeg: 14.72847983, nodeDeg: 100.47390909 },
  neptune: { l0Deg: -55.12002969, rateDegPerCentury: 218.45945325, periLongitudeDeg: 44.96476227, nodeDeg: 131.78422574 },
};

/** Mean longitude (deg, [0, 360), J2000 ecliptic and equinox) of a planet at a JD (TT). */
export function planetMeanLongitudeDeg(planet: ScenarioPlanet, jdTT: number): number {
  const t = STANDISH_MEAN_LONGITUDE[planet];
  const centuries = (jdTT - J2000_JD) / DAYS_PER_JULIAN_CENTURY;
  return wrapDeg360(t.l0Deg + t.rateDegPerCentury * centuries);
}
