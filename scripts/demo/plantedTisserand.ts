/**
 * Planted Tisserand cases in the asteroid file: asteroids on cometary orbits (T_J ≤ 2.90,
 * a < 4.8 au, outside the Trojan and Hilda zones) and boundary cases (within 0.05 of 3 on
 * the comet-like side, 2.95 < T_J < 3, listed as 'boundary', not as anomalies: a screen
 * flags the wrong side of 3 only). Margins inside the thresholds (2.88; 2.955–2.995) keep
 * the rounding of the written elements from moving a body across.
 */
import type { Random } from './random.js';
import { rayleigh, uniform, uniformAngleDeg } from './random.js';
import { sampleUntil } from './sampleUntil.js';
import { asteroidRuleApplies, tisserandJupiter } from './tisserand.js';
import type { DemoElements } from './types.js';

export const PLANTED_COMET_LIKE_MAX_TJ = 2.88;
/** Boundary cases are generated with T_J in this range (comet-like side of 3). */
export const ASTEROID_BOUNDARY_TJ: readonly [number, number] = [2.955, 2.995];

export type CometLikeVariant = 'ordinary' | 'high-inclination' | 'retrograde';

function angles(random: Random, out: DemoElements): void {
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  out.meanAnomalyDeg = uniformAngleDeg(random);
}

function inclinationFor(random: Random, variant: CometLikeVariant): number {
  if (variant === 'retrograde') return uniform(random, 110, 170);
  if (variant === 'high-inclination') return uniform(random, 35, 75);
  return Math.min(rayleigh(random, 12), 30);
}

/** An asteroid on a cometary orbit: a 2.5–4.5 au, e 0.5–0.9, q ≥ 0.15 au, T_J ≤ 2.88. */
export function sampleCometLikeAsteroid(random: Random, variant: CometLikeVariant, out: DemoElements): void {
  sampleUntil(
    `comet-like asteroid (${variant})`,
    () => {
      out.aAu = uniform(random, 2.5, 4.5);
      out.e = uniform(random, 0.5, 0.9);
      out.iDeg = inclinationFor(random, variant);
      angles(random, out);
    },
    () => out.aAu * (1 - out.e) >= 0.15 && asteroidRuleApplies(out.aAu, out.e) &&
      tisserandJupiter(out.aAu, out.e, out.iDeg) <= PLANTED_COMET_LIKE_MAX_TJ,
    out,
  );
  out.H = uniform(random, 14, 19);
}

/** A boundary case in the asteroid file: a 2.2–4.5 au, 2.955 ≤ T_J ≤ 2.995. */
export function sampleBoundaryAsteroid(random: Random, out: DemoElements): void {
  sampleUntil(
    'boundary asteroid',
    () => {
      out.aAu = uniform(random, 2.2, 4.5);
      out.e = uniform(random, 0.1, 0.7);
      out.iDeg = Math.min(rayleigh(random, 12), 40);
      angles(random, out);
    },
    () => {
      const t = tisserandJupiter(out.aAu, out.e, out.iDeg);
      return asteroidRuleApplies(out.aAu, out.e) && t >= ASTEROID_BOUNDARY_TJ[0] && t <= ASTEROID_BOUNDARY_TJ[1];
    },
    out,
  );
  out.H = uniform(random, 13, 18);
}
