/**
 * The averaged-problem prediction for every screened body (core/coorbital), in entry order,
 * with one workspace (grid and buffers) for all of them.
 */
import { createCoorbitalWorkspace, predictCoorbital } from '../core/coorbital/predictCoorbital.js';
import type { CoorbitalPrediction } from '../core/coorbital/types.js';
import { planetKeplerGmAu3PerDay2 } from '../core/coorbital/resonantAngle.js';
import { planetMassRatio, type ZoneEntry } from './coorbitalZone.js';

/** Osculating period of the planet (days) from its a at the body's epoch, with GM_sun + GM_planet (Kepler's third law). */
function planetPeriodDaysOf(e: ZoneEntry): number {
  return 2 * Math.PI * Math.sqrt(e.planetAAu ** 3 / planetKeplerGmAu3PerDay2(e.planet));
}

export function predictEntries(entries: readonly ZoneEntry[]): CoorbitalPrediction[] {
  const workspace = createCoorbitalWorkspace();
  return entries.map((e) => predictCoorbital(e.shape, e.x, e.phiRad, planetMassRatio(e.planet), planetPeriodDaysOf(e), { workspace }));
}
