// The order of tail probabilities by value, ties by position (src/detect/tailAscendingOrder.ts,
// a radix sort on the bit patterns), against the comparison sort it stands for (common practice:
// Array.prototype.sort with the comparator (p[x] − p[y]) || (x − y)).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ascendingOrderOfNonNegative } from '../../src/detect/tailAscendingOrder.js';

const byComparator = (p: ArrayLike<number>, positions: number[]): number[] => [...positions].sort((x, y) => p[x] - p[y] || x - y);

describe('ascending order of non-negative values', () => {
  it('is the comparison sort by value then position, with ties, −0, 0, 1, subnormals and a subset of positions (property-based)', () => {
    const v = fc.oneof(
      fc.double({ min: 0, max: 1, noNaN: true }),
      fc.constantFrom(0, -0, 1, 5e-324, 2.5e-6, 0.5),
      fc.integer({ min: 0, max: 4 }).map((k) => k / 4), // ties
    );
    fc.assert(
      fc.property(fc.array(v, { maxLength: 400 }), fc.array(fc.boolean(), { maxLength: 400 }), (p, keep) => {
        const positions = p.map((_, j) => j).filter((j) => keep[j] ?? true);
        const got = Array.from(ascendingOrderOfNonNegative(p, Uint32Array.from(positions)));
        expect(got).toEqual(byComparator(p, positions));
      }),
      { numRuns: 500 },
    );
  });

  it('orders values spread over every digit of the bit patterns (tail fractions of a sample of 400 001, and tiny extrapolated ones)', () => {
    const p: number[] = [];
    for (let j = 0; j < 50_000; j++) p.push(j % 7 === 0 ? Math.pow(10, -3 - (j % 300) / 10) : ((j * 7919) % 400_001 + 1) / 400_001);
    const positions = p.map((_, j) => j);
    expect(Array.from(ascendingOrderOfNonNegative(p, Uint32Array.from(positions)))).toEqual(byComparator(p, positions));
  });
});
