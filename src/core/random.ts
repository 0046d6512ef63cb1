/**
 * Seeded pseudo-random numbers. Randomness is injected everywhere in the project: a function
 * takes a `Random` (uniform numbers in [0, 1)), never Math.random, so a seed fixes results
 * byte for byte (demo data, calibration resampling, benchmarks, property tests).
 */

/** A source of uniform deviates in [0, 1). */
export type Random = () => number;

/**
 * mulberry32: a 32-bit state generator by Tommy Ettinger (public domain, 2017), period 2^32.
 * Good for demo data, benchmarks and test sampling (not for cryptography, not for long
 * Monte-Carlo studies).
 */
export function seededRandom(seed: number): Random {
  if (!Number.isInteger(seed)) throw new RangeError(`seededRandom: seed must be an integer, got ${seed}`);
  let state = seed >>> 0;
  return function next(): number {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

/** `n` deviates from `random`, uniform in [lo, hi), in a new array. */
export function uniformArray(random: Random, n: number, lo = 0, hi = 1): Float64Array {
  const out = new Float64Array(n);
  for (let k = 0; k < n; k++) out[k] = lo + (hi - lo) * random();
  return out;
}

/**
 * Normal deviate with the given mean and σ by the Box–Muller transform (Box & Muller 1958,
 * Ann. Math. Stat. 29, 610). Two uniforms a call, one deviate (the second is discarded: no
 * hidden state between calls). With the defaults, the standard normal deviate itself.
 */
export function normalDeviate(random: Random, mean = 0, sigma = 1): number {
  const u1 = 1 - random(); // (0, 1]: the logarithm is finite
  const u2 = random();
  return mean + sigma * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}
