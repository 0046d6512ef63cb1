import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { countAtMost, lowerTailFraction, upperTailFraction } from '../../src/detect/empiricalTail.js';

// Empirical p-values with the plus-one rule (Davison & Hinkley 1997, eq. 4.11): (1 + #as extreme)/(n + 1).
describe('empirical tail fractions', () => {
  it('match a brute-force count (property-based)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { maxLength: 200 }), fc.double({ min: -11, max: 11, noNaN: true }), (xs, x) => {
        const sorted = Float64Array.from(xs).sort();
        const lo = xs.filter((v) => v <= x).length;
        const hi = xs.filter((v) => v >= x).length;
        return countAtMost(sorted, x) === lo &&
          lowerTailFraction(sorted, x) === (1 + lo) / (xs.length + 1) &&
          upperTailFraction(sorted, x) === (1 + hi) / (xs.length + 1);
      }),
    );
  });

  it('never reports zero: beyond every sample value the estimate is 1/(n+1)', () => {
    const sorted = Float64Array.from([1, 2, 3]);
    expect(lowerTailFraction(sorted, 0)).toBe(0.25);
    expect(upperTailFraction(sorted, 4)).toBe(0.25);
  });
});
