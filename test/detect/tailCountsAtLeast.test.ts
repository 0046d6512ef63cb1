// Counts of a sample at least as high as each of many values, through a guide table
// (src/detect/tailCountsAtLeast.ts), against a brute-force count of the same sample (common
// practice: the count is its own definition), and the bulk tail probabilities built on them
// against the one-value function.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { seededRandom } from '../../src/core/random.js';
import { countsAtLeast, countsAtLeastUnsorted } from '../../src/detect/tailCountsAtLeast.js';
import { fitUpperTail, upperTailProbabilities, upperTailProbability } from '../../src/detect/tailExtrapolation.js';

/** #{s ≥ x} by brute force; NaN counts every value, as a binary search on `s < x` does. */
const brute = (xs: readonly number[], x: number): number => (Number.isNaN(x) ? xs.length : xs.filter((v) => !(v < x)).length);

const value = fc.oneof(
  fc.double({ min: -10, max: 10, noNaN: true }),
  fc.integer({ min: -3, max: 3 }), // ties
  fc.constantFrom(-Infinity, Infinity, -0, 0),
);

describe('counts at least as high, through a guide table', () => {
  it('equal a brute-force count for samples with ties, infinities and NaN, and queries inside and outside their range (property-based)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(value, fc.constant(NaN)), { maxLength: 300 }), fc.array(fc.oneof(value, fc.constant(NaN), fc.double({ min: -12, max: 12 })), { maxLength: 60 }), (sample, queries) => {
        const sorted = Float64Array.from(sample).sort();
        const got = countsAtLeast(sorted, queries);
        const list = Array.from(sorted);
        return queries.every((x, j) => got[j] === brute(list, x));
      }),
      { numRuns: 500 },
    );
  });

  it('equal a brute-force count on a large smooth sample with clumps (invented data)', () => {
    const r = seededRandom(5);
    const sample = Array.from({ length: 20_000 }, (_, j) => (j % 5 === 0 ? Math.round(10 * r()) / 10 : -Math.log(1 - r())));
    const sorted = Float64Array.from(sample).sort();
    const list = Array.from(sorted);
    const queries = Array.from({ length: 400 }, (_, j) => (j % 4 === 0 ? list[Math.floor(r() * list.length)] : 12 * r() - 1));
    const got = countsAtLeast(sorted, queries);
    queries.forEach((x, j) => expect(got[j], `query ${x}`).toBe(brute(list, x)));
  });
});

describe('counts at least as high against a sample left unsorted', () => {
  it('equal a brute-force count, values drawn from the sample and not, ties, infinities and NaN (property-based)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(value, fc.constant(NaN)), { maxLength: 300 }), fc.array(fc.oneof(value, fc.constant(NaN)), { maxLength: 40 }), fc.array(fc.nat(), { maxLength: 20 }), (sample, others, picks) => {
        const queries = [...others, ...(sample.length > 0 ? picks.map((t) => sample[t % sample.length]) : [])];
        const got = countsAtLeastUnsorted(sample, queries);
        return queries.every((x, j) => got[j] === brute(sample, x));
      }),
      { numRuns: 500 },
    );
  });
});

describe('tail probabilities in bulk', () => {
  it('are upperTailProbability value by value, bit for bit, inside the sample, beyond it and through the tail fit (exponential sample, invented)', () => {
    const r = seededRandom(9);
    const sorted = Float64Array.from({ length: 40_000 }, () => -Math.log(1 - r())).sort();
    const fit = fitUpperTail(sorted, 250).fit;
    expect(fit).not.toBeNull();
    const xs = Float64Array.from({ length: 3000 }, (_, j) => (j % 3 === 0 ? sorted[Math.floor(r() * sorted.length)] : 30 * r() - 1));
    xs[0] = Infinity; xs[1] = -Infinity; xs[2] = NaN; xs[3] = 500; // the fit underflows this far out
    for (const f of [fit, null]) {
      const bulk = upperTailProbabilities(sorted, f, xs);
      xs.forEach((x, j) => {
        const one = upperTailProbability(sorted, f, x);
        expect([bulk.p[j], bulk.from[j]], `x = ${x}`).toEqual([one.p, one.from]);
      });
    }
  });
});
