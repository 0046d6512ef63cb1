/**
 * The planets the demo places co-orbitals and Trojans against (Earth–Moon barycentre, Mars,
 * Jupiter, Neptune), taken as the co-orbital detector takes them: the osculating orbit from
 * the project's VSOP87B ephemeris state at the demo epoch (TDB), with the planet system's
 * heliocentric Kepler constant GM_sun + GM_planet (src/core/coorbital/planetPlane.ts through
 * src/detect/coorbitalZone.ts PlanetOrbitMemo). So a body planted at λ = λ_P + φ has, from its
 * written elements, the φ the detector's screen computes (up to the rounding of the line).
 */
import { SECONDS_PER_DAY } from '../../src/core/constants.js';
import type { PlanetOrbitAtEpoch } from '../../src/core/coorbital/planetPlane.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { tdbMinusTtSeconds } from '../../src/core/time/timeScales.js';
import { PlanetOrbitMemo } from '../../src/detect/coorbitalZone.js';
import { DEMO_EPOCH_JD_TT } from './scenario.js';

export type ScenarioPlanet = 'earth' | 'mars' | 'jupiter' | 'neptune';
export const SCENARIO_PLANETS: readonly ScenarioPlanet[] = ['earth', 'mars', 'jupiter', 'neptune'];

/** The planets' osculating orbits at the demo epoch. */
export type PlanetOrbits = Readonly<Record<ScenarioPlanet, PlanetOrbitAtEpoch>>;

/** The demo epoch on the TDB scale, converted as the detector's screen converts a catalogue epoch. */
export function demoEpochJdTDB(): number {
  return DEMO_EPOCH_JD_TT + tdbMinusTtSeconds(DEMO_EPOCH_JD_TT) / SECONDS_PER_DAY;
}

/** The osculating orbits of the scenario planets at the demo epoch (VSOP87B). */
export function demoPlanetOrbits(): PlanetOrbits {
  const memo = new PlanetOrbitMemo(new Vsop87Ephemeris());
  const jd = demoEpochJdTDB();
  return {
    earth: memo.at('earth', jd), mars: memo.at('mars', jd), jupiter: memo.at('jupiter', jd), neptune: memo.at('neptune', jd),
  };
}

/** A planet's osculating mean longitude at the demo epoch, degrees in [0, 360). */
export function planetLongitudeDeg(orbits: PlanetOrbits, planet: ScenarioPlanet): number {
  return (orbits[planet].meanLongitudeRad * 180) / Math.PI;
}
