/**
 * The main mean-motion resonances of the asteroid belt, where the secular theory (which
 * averages over the mean longitudes) does not hold.
 *
 * Centres from Kepler's third law (common practice): a body whose mean motion is p/q times
 * the planet's has a = a_P (q/p)^{2/3} (1 + m_P/M_sun)^{−1/3} (the planet's Kepler constant
 * includes its own mass; the body's does not), a_P the planet's mean semimajor axis
 * (constants.ts). Half-widths in osculating a are from memory of the gaps in the semimajor-axis
 * histogram of the numbered asteroids at their typical e ≈ 0.1–0.2 (the true width grows with
 * e, roughly as √e for first-order resonances), widened by ≈ 0.005 au for the short-period
 * oscillation of osculating a in the outer belt. A resonance with a half-width below that
 * noise is left out (high-order ones such as Jupiter's 8:3 and 9:5).
 */
import { PLANET_MEAN_A_AU, sunMassRatio, type PlanetName } from '../constants.js';

export interface MeanMotionResonance {
  planet: PlanetName;
  p: number; // body's mean motion : planet's = p : q
  q: number;
  halfWidthAu: number;
  centreAu: number;
  label: string; // "3:1 with Jupiter"
}

function resonance(planet: PlanetName, p: number, q: number, halfWidthAu: number): MeanMotionResonance {
  const centreAu = PLANET_MEAN_A_AU[planet] * (q / p) ** (2 / 3) * (1 + 1 / sunMassRatio(planet)) ** (-1 / 3);
  const name = planet[0].toUpperCase() + planet.slice(1);
  return { planet, p, q, halfWidthAu, centreAu, label: `${p}:${q} with ${name}` };
}

/** The resonances screened, inner to outer (half-widths: see the file comment, from memory). */
export const MAIN_BELT_RESONANCES: readonly MeanMotionResonance[] = [
  resonance('jupiter', 4, 1, 0.015), // 2.065 au, inner edge of the belt beside ν6
  resonance('jupiter', 7, 2, 0.008), // 2.256 au
  resonance('mars', 1, 2, 0.006), // 2.419 au, the one Mars resonance in the belt strong enough to mark
  resonance('jupiter', 3, 1, 0.03), // 2.502 au, the Kirkwood gap 2.47–2.53 au
  resonance('jupiter', 5, 2, 0.025), // 2.825 au
  resonance('jupiter', 7, 3, 0.012), // 2.958 au
  resonance('jupiter', 9, 4, 0.006), // 3.030 au
  resonance('jupiter', 11, 5, 0.006), // 3.075 au
  resonance('jupiter', 2, 1, 0.05), // 3.278 au, the Hecuba gap
  resonance('jupiter', 7, 4, 0.008), // 3.579 au
  resonance('jupiter', 5, 3, 0.012), // 3.702 au
  resonance('jupiter', 3, 2, 0.06), // 3.970 au, the Hildas librate here
  resonance('jupiter', 4, 3, 0.04), // 4.293 au, Thule
];

/** Index into MAIN_BELT_RESONANCES of the resonance whose band holds aAu, or −1. */
export function meanMotionResonanceAt(aAu: number): number {
  for (let r = 0; r < MAIN_BELT_RESONANCES.length; r++) {
    const res = MAIN_BELT_RESONANCES[r];
    if (Math.abs(aAu - res.centreAu) <= res.halfWidthAu) return r;
  }
  return -1;
}
