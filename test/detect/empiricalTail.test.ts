import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  countAtMost, lowerTailFraction, memberLowerTailFraction, memberUpperTailFraction, upperTailFraction,
} from '../../src/detect/empiricalTail.js';

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

  it('a sample member: the plus-one rule over the other members, brute force (property-based)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -5, max: 5 }), { minLength: 1, maxLength: 100 }), fc.nat(), (xs, pick) => {
        const j = pick % xs.length;
        const x = xs[j];
        const others = xs.filter((_, k) => k !== j);
        const sorted = Float64Array.from(xs).sort();
        // Davison & Hinkley 1997 eq. 4.11 with the n − 1 others as the reference sample.
        return memberLowerTailFraction(sorted, x) === (1 + others.filter((v) => v <= x).length) / (others.length + 1) &&
          memberUpperTailFraction(sorted, x) === (1 + others.filter((v) => v >= x).length) / (others.length + 1);
      }),
    );
  });

  it('a value that is not a member is misuse', () => {
    expect(() => memberLowerTailFraction(Float64Array.from([1, 2]), 0)).toThrow(RangeError);
    expect(() => memberUpperTailFraction(Float64Array.from([1, 2]), 3)).toThrow(RangeError);
  });
});
