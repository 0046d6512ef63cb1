/**
 * The eight-planet secular model at an epoch: masses from the DE430 GMs (constants.ts),
 * semimajor axes from the mean J2000 elements (constants.ts PLANET_MEAN_A_AU, Standish &
 * Williams), and (h, k, p, q) from each planet's osculating orbit at the epoch, taken from
 * its VSOP87B heliocentric J2000-ecliptic state (the Earth–Moon barycentre for the Earth),
 * with the planet's own Kepler constant GM_sun + GM_planet (as coorbital/planetPlane.ts).
 *
 * Why mean a and osculating (h, k, p, q): the matrices need the mean distances (osculating
 * a carries short-period terms, e.g. Saturn's from the great inequality); the vectors are
 * what the theory fits at the epoch, and mean vectors are not published by the ephemeris.
 *
 * Frequencies. The pure linear theory gives g_5 ≈ 3.73″/yr and g_6 ≈ 22.5″/yr where the
 * planets' observed secular frequencies are near 4.3 and 28″/yr: it lacks the terms of second
 * order in the masses from the near 5:2 commensurability of Jupiter and Saturn (the great
 * inequality). That moves the ν6 resonance (A = g_6) from about 2.05 au to 1.75 au. Option
 * `frequencies: 'corrected'` (the default) keeps the linear eigenvectors and amplitudes but
 * takes g_5 and g_6 from Brouwer & van Woerkom 1950, whose theory includes those terms
 * (BVW_G5_G6_ARCSEC_PER_YEAR); 'linear' keeps the theory's own values.
 */
import { PLANETS, PLANET_MEAN_A_AU, sunMassRatio, type PlanetName } from '../constants.js';
import { Vsop87Ephemeris } from '../ephemeris/vsop87Ephemeris.js';
import { planetKeplerGmAu3PerDay2 } from '../coorbital/resonantAngle.js';
import { stateToSemimajorElements } from '../orbit/stateToElements.js';
import { secularSystem } from './secularSystem.js';
import type { SecularModel, SecularPlanet } from './types.js';

/** One planet's secular description at epochJdTDB from VSOP87B. */
export function planetSecularElements(planet: PlanetName, epochJdTDB: number): SecularPlanet {
  const state = new Float64Array(6), el = new Float64Array(6);
  new Vsop87Ephemeris().helioState(planet === 'earth' ? 'emb' : planet, epochJdTDB, state, 0);
  stateToSemimajorElements(state, planetKeplerGmAu3PerDay2(planet), el);
  const e = el[1], si = Math.sin(el[2]), node = el[3], varpi = el[3] + el[4];
  return {
    name: planet, massRatio: 1 / sunMassRatio(planet), aAu: PLANET_MEAN_A_AU[planet],
    h: e * Math.sin(varpi), k: e * Math.cos(varpi), p: si * Math.sin(node), q: si * Math.cos(node),
  };
}

/**
 * g_5 and g_6 (arcsec/yr) of Brouwer & van Woerkom 1950, as tabulated in Murray & Dermott
 * 1999 (ch. 7, table of the eight-planet secular solution); values from memory.
 */
export const BVW_G5_G6_ARCSEC_PER_YEAR: readonly [number, number] = [4.30, 27.77];

export interface PlanetarySecularOptions {
  planets?: readonly PlanetName[]; // default all eight
  frequencies?: 'corrected' | 'linear'; // default 'corrected' (see the file comment); only with Jupiter and Saturn both present
}

/** Secular model of `planets` (default all eight, Mercury…Neptune) at epochJdTDB (VSOP87B span: J2000 ± 1 000 yr). */
export function planetarySecularModel(epochJdTDB: number, opts: PlanetarySecularOptions = {}): SecularModel {
  if (!Number.isFinite(epochJdTDB)) throw new RangeError(`planetarySecularModel: non-finite epoch ${epochJdTDB}`);
  const planets = opts.planets ?? PLANETS;
  const list = planets.map((p) => planetSecularElements(p, epochJdTDB));
  const jupiter = planets.indexOf('jupiter'), saturn = planets.indexOf('saturn');
  const model = secularSystem(list, epochJdTDB, jupiter >= 0 ? jupiter : undefined);
  if ((opts.frequencies ?? 'corrected') === 'corrected' && jupiter >= 0 && saturn >= 0) {
    model.eModes.frequencyArcsecPerYear[jupiter] = BVW_G5_G6_ARCSEC_PER_YEAR[0];
    model.eModes.frequencyArcsecPerYear[saturn] = BVW_G5_G6_ARCSEC_PER_YEAR[1];
  }
  return model;
}
