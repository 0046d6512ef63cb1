/**
 * Seeded sampling of test dates for the ephemeris tests (randomness injected, reproducible).
 * Generator: mulberry32 (a 32-bit multiply–xorshift generator; common practice).
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

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
