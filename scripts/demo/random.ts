/**
 * Seeded pseudo-random numbers for the demo generator. Randomness is injected: every
 * sampler takes a `Random` (a function returning uniform numbers in [0, 1)), never
 * Math.random, so a seed fixes the output byte for byte.
 */

export type { Random } from '../../src/core/random.js';
import { normalDeviate, seededRandom, type Random } from '../../src/core/random.js';

/** The demo's generator: the project's seeded mulberry32 (src/core/random.ts). */
export function mulberry32(seed: number): Random {
  return seededRandom(seed);
}

/** Uniform deviate in [lo, hi). */
export function uniform(random: Random, lo: number, hi: number): number {
  return lo + (hi - lo) * random();
}

/** Integer in [lo, hi] (both inclusive). */
export function uniformInt(random: Random, lo: number, hi: number): number {
  return lo + Math.floor((hi - lo + 1) * random());
}

/** Normal deviate (Box–Muller): the project's own, src/core/random.ts. */
export const normal = normalDeviate;

/** Rayleigh deviate with scale sigma (inverse CDF: sigma·sqrt(−2 ln U)). */
export function rayleigh(random: Random, sigma: number): number {
  return sigma * Math.sqrt(-2 * Math.log(1 - random()));
}

/** Index chosen with probability proportional to weights[k]. */
export function pickWeighted(random: Random, weights: readonly number[]): number {
  let total = 0;
  for (let k = 0; k < weights.length; k++) total += weights[k];
  let u = random() * total;
  for (let k = 0; k < weights.length; k++) {
    u -= weights[k];
    if (u < 0) return k;
  }
  return weights.length - 1;
}

/** Angle in degrees uniform in [0, 360). */
export function uniformAngleDeg(random: Random): number {
  return 360 * random();
}
