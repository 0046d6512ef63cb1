/**
 * Seeded pseudo-random numbers for the demo generator. Randomness is injected: every
 * sampler takes a `Random` (a function returning uniform numbers in [0, 1)), never
 * Math.random, so a seed fixes the output byte for byte.
 */

export type { Random } from '../../src/core/random.js';
import { seededRandom, type Random } from '../../src/core/random.js';

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

/**
 * Standard normal deviate by the Box–Muller transform (Box & Muller 1958, Ann. Math.
 * Stat. 29, 610). One deviate per call (the second is discarded: no hidden state).
 */
export function normal(random: Random, mean = 0, sigma = 1): number {
  const u1 = 1 - random(); // (0, 1]: log is finite
  const u2 = random();
  return mean + sigma * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

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
