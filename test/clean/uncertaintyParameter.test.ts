import { describe, expect, it } from 'vitest';
import { uncertaintyFromRunoff, uncertaintyRunoffArcsecPerDecade } from '../../src/clean/uncertaintyParameter.js';

// The published meaning of U (from memory): logarithmic runoff scale, U = 9 ↔ 180° per decade,
// U = 0 ↔ under 1″, each step a factor 648000^(1/9) ≈ 4.42.
describe('uncertainty parameter U', () => {
  it('U = 9 allows 180° (648 000″) of runoff per decade, U = 0 one arcsecond', () => {
    expect(uncertaintyRunoffArcsecPerDecade(9)).toBeCloseTo(648_000, 6);
    expect(uncertaintyRunoffArcsecPerDecade(0)).toBe(1);
  });

  it('steps by a factor of about 4.42', () => {
    const r = uncertaintyRunoffArcsecPerDecade(5) / uncertaintyRunoffArcsecPerDecade(4);
    expect(r).toBeCloseTo(4.42, 2);
    // U = 5 allows about 0.47° (from memory of the published table): 1 692″.
    expect(uncertaintyRunoffArcsecPerDecade(5)).toBeCloseTo(1692, -1);
  });

  it('inverts its bound', () => {
    for (let u = 0; u <= 9; u++) {
      expect(uncertaintyFromRunoff(uncertaintyRunoffArcsecPerDecade(u))).toBe(u);
      expect(uncertaintyFromRunoff(uncertaintyRunoffArcsecPerDecade(u) * 1.01)).toBe(Math.min(9, u + 1));
    }
  });

  it('refuses values outside 0..9', () => {
    expect(() => uncertaintyRunoffArcsecPerDecade(10)).toThrow(RangeError);
    expect(() => uncertaintyRunoffArcsecPerDecade(2.5)).toThrow(RangeError);
  });
});
