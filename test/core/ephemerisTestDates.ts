/**
 * Seeded sampling of test dates for the ephemeris tests (randomness injected, reproducible).
 * Generator: mulberry32 (a 32-bit multiply–xorshift generator; common practice).
 */
export { seededRandom } from '../../src/core/random.js';
import { seededRandom } from '../../src/core/random.js';

/** 1900 Jan 0.5 TT and 2100 Jan 1.5 TT as Julian dates (Meeus ch. 7). */
export const JD_1900 = 2_415_020.0;
export const JD_2100 = 2_488_070.0;

/** `count` uniformly random Julian dates in [startJd, endJd), from `seed`. */
export function randomDates(seed: number, count: number, startJd = JD_1900, endJd = JD_2100): Float64Array {
  const random = seededRandom(seed);
  const out = new Float64Array(count);
  for (let k = 0; k < count; k++) out[k] = startJd + random() * (endJd - startJd);
  return out;
}
