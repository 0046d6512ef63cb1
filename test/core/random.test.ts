import { describe, expect, it } from 'vitest';
import { seededRandom, uniformArray } from '../../src/core/random.js';

describe('seeded random numbers (mulberry32)', () => {
  it('reproduces the reference generator’s first outputs for seed 0', () => {
    // mulberry32 as published by its author (public-domain C; from memory), seed 0:
    // first 32-bit output 1144304738, divided by 2^32.
    const r = seededRandom(0);
    expect(r() * 4_294_967_296).toBe(1_144_304_738);
  });

  it('is deterministic for a seed, differs across seeds, and stays in [0, 1)', () => {
    const a = uniformArray(seededRandom(42), 10_000);
    const b = uniformArray(seededRandom(42), 10_000);
    const c = uniformArray(seededRandom(43), 10_000);
    expect(a).toEqual(b);
    expect(a).not.toEqual(c);
    expect(Math.min(...a)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...a)).toBeLessThan(1);
    // Mean of 10 000 uniforms: 0.5 ± 4σ, σ = sqrt(1/12/10 000) ≈ 0.0029 (common practice).
    const mean = a.reduce((s, x) => s + x, 0) / a.length;
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * 0.0029);
  });

  it('refuses a non-integer seed', () => {
    expect(() => seededRandom(1.5)).toThrow(RangeError);
  });
});
