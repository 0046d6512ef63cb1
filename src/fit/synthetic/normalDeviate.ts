/**
 * Standard normal deviates from the project's seeded uniform stream (src/core/random.ts) by
 * the Box–Muller transform (Box & Muller 1958, Ann. Math. Stat. 29, 610). Each call draws two
 * uniforms and returns one deviate (the second is discarded: no hidden state between calls).
 */
import type { Random } from '../../core/random.js';

export function normalDeviate(random: Random): number {
  const u1 = 1 - random(); // (0, 1]: the logarithm is finite
  const u2 = random();
  return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}
