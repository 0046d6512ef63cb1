/**
 * Planted co-orbitals (1:1 mean-motion resonance) for the co-orbital detector: Earth
 * quasi-satellites, horseshoe and tadpole (L4/L5) orbits, Mars and Neptune Trojans.
 * Plausible initial conditions only: a close to the planet's mean a (PLANET_MEAN_A_AU,
 * Standish table) and the mean longitude λ = Ω + ω + M placed relative to the planet's mean
 * longitude at the epoch (planets.ts). Libration types in the co-orbital problem: Murray &
 * Dermott 1999 §3.9 (tadpole about ±60°, horseshoe spanning 180°, quasi-satellite λ − λ_p
 * near 0 with e larger than the a-offset); the ranges below are from memory.
 */
import { PLANET_MEAN_A_AU } from '../../src/core/constants.js';
import { placeLongitudes } from './outerPopulation.js';
import type { ScenarioPlanet } from './planets.js';
import type { Random } from './random.js';
import { normal, uniform, uniformAngleDeg } from './random.js';
import type { DemoElements } from './types.js';

export type CoorbitalKind = 'quasi-satellite' | 'horseshoe' | 'tadpole-L4' | 'tadpole-L5';

/** Planet mean longitudes at the epoch, deg. */
export type PlanetLongitudes = Readonly<Record<ScenarioPlanet, number>>;

function plantAt(random: Random, out: DemoElements, lambdaDeg: number): void {
  out.nodeDeg = uniformAngleDeg(random);
  placeLongitudes(out, lambdaDeg, uniformAngleDeg(random));
}

/** An Earth co-orbital of the given kind; returns λ − λ_E in degrees as planted. */
export function sampleEarthCoorbital(random: Random, kind: CoorbitalKind, lon: PlanetLongitudes, out: DemoElements): number {
  const aE = PLANET_MEAN_A_AU.earth;
  let dLambda: number;
  if (kind === 'quasi-satellite') {
    out.aAu = aE + normal(random, 0, 0.0004);
    out.e = uniform(random, 0.05, 0.2);
    out.iDeg = uniform(random, 0.5, 8);
    dLambda = uniform(random, -3, 3);
  } else if (kind === 'horseshoe') {
    out.aAu = aE + (random() < 0.5 ? -1 : 1) * uniform(random, 0.002, 0.01);
    out.e = uniform(random, 0.02, 0.15);
    out.iDeg = uniform(random, 0.5, 10);
    dLambda = (random() < 0.5 ? -1 : 1) * uniform(random, 120, 175);
  } else {
    out.aAu = aE + uniform(random, -0.003, 0.003);
    out.e = uniform(random, 0.05, 0.2);
    out.iDeg = uniform(random, 1, 20);
    dLambda = (kind === 'tadpole-L4' ? 60 : -60) + uniform(random, -5, 5);
  }
  plantAt(random, out, lon.earth + dLambda);
  out.H = uniform(random, 20, 26);
  return dLambda;
}

/** A Trojan of Mars or Neptune about L4 (+60°) or L5 (−60°); returns λ − λ_p, degrees. */
export function samplePlanetTrojan(
  random: Random, planet: 'mars' | 'neptune', l4: boolean, lon: PlanetLongitudes, out: DemoElements,
): number {
  if (planet === 'mars') {
    out.aAu = PLANET_MEAN_A_AU.mars + uniform(random, -0.002, 0.002);
    out.e = uniform(random, 0.01, 0.1);
    out.iDeg = uniform(random, 10, 30);
    out.H = uniform(random, 16, 20);
  } else {
    out.aAu = PLANET_MEAN_A_AU.neptune + uniform(random, -0.05, 0.05);
    out.e = uniform(random, 0.01, 0.1);
    out.iDeg = uniform(random, 1, 30);
    out.H = uniform(random, 7, 9.5);
  }
  const dLambda = (l4 ? 60 : -60) + uniform(random, planet === 'mars' ? -5 : -10, planet === 'mars' ? 5 : 10);
  plantAt(random, out, lon[planet] + dLambda);
  return dLambda;
}
