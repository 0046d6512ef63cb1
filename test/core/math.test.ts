// The safe numeric primitives of src/core/math.ts against outside references: exact sums,
// means, variances and medians from mathjs (general-purpose library, BigNumber at 120 digits
// where exactness matters), Neumaier's own example, and the definitions of the angle ranges.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { all, create, median } from 'mathjs';
import {
  acosClamped, asinClamped, INV_FACTORIAL, meanVariance, medianSorted, norm3, sumCompensated, TWO_PI, wrapDeg360, wrapPi,
  wrapTwoPi,
} from '../../src/core/math.js';

const big = create(all, { number: 'BigNumber', precision: 120 });
const EPS = Number.EPSILON;

describe('angle wrapping', () => {
  it('stays inside [0, 2π), [−π, π) and [0, 360) even for remainders just below 0', () => {
    // Before the fix −1e-20 came back as 2π and −1e-15° as 360: outside the documented range.
    expect(wrapTwoPi(-1e-20)).toBe(0);
    expect(wrapTwoPi(-TWO_PI * 3 - 1e-17)).toBeLessThan(TWO_PI);
    expect(wrapDeg360(-1e-15)).toBe(0);
    expect(wrapPi(Math.PI)).toBe(-Math.PI);
    // An angle already in [−π, π) is returned exactly (it used to lose digits to + π − π).
    expect(wrapPi(1e-20)).toBe(1e-20);
    expect(wrapPi(-3)).toBe(-3);
  });

  it('moves an angle by whole turns only (property; the definitions, common practice)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), (x) => {
        const w = wrapTwoPi(x);
        expect(w >= 0 && w < TWO_PI).toBe(true);
        const turns = (x - w) / TWO_PI;
        // x − w is a whole number of turns up to the rounding of x (ulp(1e4) ≈ 2e-12).
        expect(Math.abs(turns - Math.round(turns))).toBeLessThan(1e-12);
        const p = wrapPi(x);
        expect(p >= -Math.PI && p < Math.PI).toBe(true);
        expect(Math.abs(Math.cos(p) - Math.cos(x))).toBeLessThan(1e-12);
        const d = wrapDeg360(x);
        expect(d >= 0 && d < 360).toBe(true);
        expect(Math.abs((x - d) / 360 - Math.round((x - d) / 360))).toBeLessThan(1e-12);
      }),
      { numRuns: 2000, seed: 21 },
    );
  });
});

describe('clamped inverse trigonometry', () => {
  it('maps arguments rounded just past ±1 to the end points instead of NaN', () => {
    expect(asinClamped(1 + 1e-15)).toBe(Math.PI / 2);
    expect(asinClamped(-1 - 1e-15)).toBe(-Math.PI / 2);
    expect(acosClamped(1 + 1e-15)).toBe(0);
    expect(acosClamped(-1 - 1e-15)).toBe(Math.PI);
    expect(asinClamped(0.5)).toBe(Math.asin(0.5));
  });
});

describe('compensated sum (Neumaier 1974)', () => {
  it("Neumaier's example 1 + 1e100 + 1 − 1e100 = 2, where plain and Kahan summation give 0 (from memory)", () => {
    expect(sumCompensated([1, 1e100, 1, -1e100])).toBe(2);
  });

  it('matches the exact sum (mathjs BigNumber, 120 digits) to ε|S| + nε²Σ|x| (Neumaier 1974 bound; property)', () => {
    let worst = 0;
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.integer({ min: -10, max: 10 })), { minLength: 1, maxLength: 200 }),
        (pairs) => {
          const xs = pairs.map(([m, p]) => m * 10 ** p);
          let exact = big.bignumber(0);
          let abs = 0;
          for (const x of xs) {
            exact = big.add(exact, big.bignumber(x)) as typeof exact;
            abs += Math.abs(x);
          }
          const s = Number(exact);
          const err = Math.abs(sumCompensated(xs) - s);
          const bound = EPS * Math.abs(s) + xs.length * EPS * EPS * abs + 1e-300;
          worst = Math.max(worst, err / bound);
          expect(err).toBeLessThanOrEqual(bound);
        },
      ),
      { numRuns: 300, seed: 22 },
    );
    console.log(`compensated sum vs exact: worst error ${worst.toFixed(2)} of the bound`);
  });
});

describe('mean and variance (Welford 1962)', () => {
  it('agree with mathjs mean and unbiased variance, also around a large offset (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 2, maxLength: 100 }),
        fc.constantFrom(0, 1e6, 2_461_200.5),
        (xs, offset) => {
          const data = xs.map((x) => x + offset);
          const { mean, variance } = meanVariance(data);
          // Exact reference: the same doubles in 120-digit arithmetic.
          const b = data.map((x) => big.bignumber(x));
          const refMean = Number(big.mean(b));
          const refVar = Number(big.variance(b));
          // A running mean rounds once per value: n ε (|mean| + spread), spread ≤ 20 here.
          expect(Math.abs(mean - refMean)).toBeLessThanOrEqual(data.length * EPS * (Math.abs(refMean) + 20));
          // Updating formulas err by about n ε κ · variance, κ = √(1 + mean²/variance) (Chan,
          // Golub & LeVeque 1983, Am. Stat. 37, 242; from memory); with |x − offset| ≤ 10 that is
          // at most n ε (|offset| + 10) · 10, taken twice for the constant.
          const tol = data.length * EPS * (Math.abs(offset) + 10) * 20 + 1e-300;
          expect(Math.abs(variance - refVar)).toBeLessThanOrEqual(tol);
        },
      ),
      { numRuns: 300, seed: 23 },
    );
  });

  it('variance is NaN for fewer than two values (the missing-value policy)', () => {
    expect(Number.isNaN(meanVariance([3]).variance)).toBe(true);
    expect(meanVariance([3]).mean).toBe(3);
  });
});

describe('median of a sorted array', () => {
  it('agrees with mathjs median for odd and even lengths; NaN when empty (property)', () => {
    fc.assert(
      // Integers: mathjs compares with a relative tolerance (1e-12), so near-equal doubles
      // would let it pick a neighbour; distinct integers it orders exactly, and the average
      // of two of them is exact, so the medians must be identical.
      fc.property(fc.array(fc.integer({ min: -1_000_000, max: 1_000_000 }), { minLength: 1, maxLength: 50 }), (xs) => {
        const sorted = Float64Array.from(xs).sort();
        expect(medianSorted(sorted)).toBe(median(xs));
      }),
      { numRuns: 500, seed: 24 },
    );
    expect(Number.isNaN(medianSorted([]))).toBe(true);
  });
});

describe('norm3', () => {
  it('(2, 3, 6) has length 7 and (1, 4, 8) length 9 (Pythagorean quadruples, common practice), at any offset', () => {
    expect(norm3([2, 3, 6])).toBe(7);
    expect(norm3(new Float64Array([0, 0, 1, 4, 8]), 2)).toBe(9);
  });
});

describe('inverse factorials', () => {
  it('1/n! for n = 0..21 is the correctly rounded value (mathjs BigNumber factorial, 120 digits)', () => {
    for (let n = 0; n < INV_FACTORIAL.length; n++) {
      // Number() of the 120-digit quotient is the double nearest to 1/n!.
      expect(INV_FACTORIAL[n], `1/${n}!`).toBe(Number(big.divide(1, big.factorial(big.bignumber(n)))));
    }
  });
});
