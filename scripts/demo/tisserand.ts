/**
 * Tisserand parameter with respect to Jupiter, computed by the generator on its own,
 * independently of the detector, to decide which side of the thresholds a body lies.
 *
 * T_J = a_J/a + 2 cos i · sqrt((a/a_J)(1 − e²))
 * Murray & Dermott, Solar System Dynamics (1999), §3.4, Tisserand's relation written with the
 * perturber's semimajor axis a_J as unit of length (circular orbit of the perturber).
 */
import { PLANET_MEAN_A_AU, RAD_PER_DEG } from '../../src/core/constants.js';

/** Jupiter's mean semimajor axis, au (Standish table, PLANET_MEAN_A_AU.jupiter). */
export const A_JUPITER_AU = PLANET_MEAN_A_AU.jupiter;

/** T_J of an orbit; a in au (negative for hyperbolic orbits), i in degrees. */
export function tisserandJupiter(aAu: number, e: number, iDeg: number): number {
  const ratio = aAu / A_JUPITER_AU;
  return 1 / ratio + 2 * Math.cos(iDeg * RAD_PER_DEG) * Math.sqrt(ratio * (1 - e * e));
}

/** Zones where comet-like T_J is natural and the asteroid rule does not apply. */
export function inJupiterTrojanZone(aAu: number): boolean {
  return aAu >= 5.05 && aAu <= 5.35;
}

/** Hilda zone (3:2 resonance with Jupiter): a 3.7–4.2 au with e < 0.3 (natural Hildas also keep i < 19°). */
export function inHildaZone(aAu: number, e: number): boolean {
  return aAu >= 3.7 && aAu <= 4.2 && e < 0.3;
}

/**
 * True when the honest-truth rule applies to an asteroid-catalogue body: a < 4.8 au and
 * outside the Trojan and Hilda zones. Such natural bodies must have T_J ≥ 3.10.
 */
export function asteroidRuleApplies(aAu: number, e: number): boolean {
  return aAu > 0 && aAu < 4.8 && !inJupiterTrojanZone(aAu) && !inHildaZone(aAu, e);
}
