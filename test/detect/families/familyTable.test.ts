/**
 * The family table on a hand-made labelling (invented data). Quantiles: linear interpolation
 * between order statistics, Hyndman & Fan 1996 definition 7, the default of NumPy's
 * percentile and R's quantile (from memory); the expected values are worked by hand.
 */
import { describe, expect, it } from 'vitest';
import { buildFamilyTable } from '../../../src/detect/families/familyTable.js';
import { quantileSorted } from '../../../src/detect/families/familyTableQuantile.js';

describe('family table', () => {
  it('members, median centre, extent and cutoff per family', () => {
    const a = [2.1, 2.2, 2.9, 2.3, 2.4, 3.0, 2.5];
    const e = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7];
    const s = [0.01, 0.02, 0.03, 0.04, 0.05, 0.06, 0.07];
    const labels = Int32Array.from([0, 0, 1, -1, 0, 1, -2]);
    const t = buildFamilyTable(a, e, s, labels, Float64Array.from([40, 55]));
    expect(t.length).toBe(2);
    expect(Array.from(t[0].members)).toEqual([0, 1, 4]);
    expect(t[0].memberCount).toBe(3);
    expect(t[0].aAu.median).toBeCloseTo(2.2, 12);
    expect(t[0].aAu.min).toBe(2.1);
    expect(t[0].aAu.max).toBe(2.4);
    // Sorted a 2.1, 2.2, 2.4: h = 2·0.05 = 0.1 → 2.1 + 0.1·0.1 = 2.11; h = 1.9 → 2.2 + 0.9·0.2 = 2.38.
    expect(t[0].aAu.p05).toBeCloseTo(2.11, 12);
    expect(t[0].aAu.p95).toBeCloseTo(2.38, 12);
    expect(t[0].e.median).toBeCloseTo(0.2, 12);
    expect(t[1].sinI.median).toBeCloseTo(0.045, 12);
    expect(t[0].cutoffMPerS).toBe(40);
    expect(t[1].cutoffMPerS).toBe(55);
    expect(buildFamilyTable(a, e, s, labels, 60)[1].cutoffMPerS).toBe(60);
  });

  it('quantiles at the ends and of one value; misuse refused', () => {
    expect(quantileSorted([1, 2, 3, 4], 0)).toBe(1);
    expect(quantileSorted([1, 2, 3, 4], 1)).toBe(4);
    expect(quantileSorted([1, 2, 3, 4], 0.5)).toBe(2.5);
    expect(quantileSorted([7], 0.95)).toBe(7);
    expect(Number.isNaN(quantileSorted([], 0.5))).toBe(true);
    expect(() => quantileSorted([1], 1.5)).toThrow(RangeError);
    expect(() => buildFamilyTable([1], [1], [1], Int32Array.from([0]), [])).toThrow(RangeError);
  });
});
