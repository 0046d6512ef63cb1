/**
 * A secular model from planets given with their masses, semimajor axes and (h, k, p, q) at
 * an epoch: the matrices (secularMatrices.ts) and their modes fitted to those vectors
 * (secularModes.ts). For the Sun's planets at a date see planetarySecularModel.ts.
 */
import { secularMatrices } from './secularMatrices.js';
import { secularModes } from './secularModes.js';
import type { SecularModel, SecularPlanet } from './types.js';

/** zeroModePlanet: index of the planet whose inclination mode is the zero one (Jupiter: s_5 = 0, common practice); default the most massive. */
export function secularSystem(planets: readonly SecularPlanet[], epochJdTDB = NaN, zeroModePlanet?: number): SecularModel {
  const n = planets.length;
  const { A, B } = secularMatrices(planets.map((p) => p.massRatio), planets.map((p) => p.aAu));
  let z = zeroModePlanet ?? 0;
  if (zeroModePlanet === undefined) for (let j = 1; j < n; j++) if (planets[j].massRatio > planets[z].massRatio) z = j;
  const eModes = secularModes(A, n, planets.map((p) => p.h), planets.map((p) => p.k));
  const iModes = secularModes(B, n, planets.map((p) => p.p), planets.map((p) => p.q), z);
  return { epochJdTDB, planets, A, B, eModes, iModes };
}
