/**
 * Region-by-region HCM (invented points): each region at its own cutoff, families numbered
 * together by size then lowest member, and no family across a region edge (2.5 and 2.82 au,
 * common practice).
 */
import { describe, expect, it } from 'vitest';
import { clusterByRegion } from '../../../src/detect/families/clusterByRegion.js';
import { LABEL_MISSING, LABEL_NOISE } from '../../../src/detect/families/clusterLabels.js';
import { velocityDistanceMPerS } from '../../../src/detect/families/metricVelocity.js';

describe('clusterByRegion', () => {
  it('cuts at the resonances, uses each region\'s cutoff and numbers families together', () => {
    // Inner: three bodies 0.001 au apart in a (≈ 9 m/s at 2.4 au); a chain of four 0.001 au
    // apart across 2.5 au, split by the edge into an inner and a middle pair; outer: two
    // bodies 0.002 au apart; one body with a NaN element.
    const a = [2.400, 2.401, 2.402, 2.4985, 2.4995, 2.5005, 2.5015, 3.100, 3.102, NaN];
    const z = a.map(() => 0.1);
    const res = clusterByRegion(a, z, z, [20, 20, 5], 2);
    // The outer pair is ≈ 11 m/s apart: above the outer cutoff of 5 m/s, so noise.
    expect(velocityDistanceMPerS(3.1, 0.1, 0.1, 3.102, 0.1, 0.1, 3.101)).toBeGreaterThan(5);
    expect(Array.from(res.labels)).toEqual([0, 0, 0, 1, 1, 2, 2, LABEL_NOISE, LABEL_NOISE, LABEL_MISSING]);
    expect(Array.from(res.memberCounts)).toEqual([3, 2, 2]);
    expect(Array.from(res.familyRegion)).toEqual([0, 0, 1]);
    expect(Array.from(res.familyCutoffMPerS)).toEqual([20, 20, 20]);
    const loose = clusterByRegion(a, z, z, [20, 20, 30], 2);
    // At 30 m/s the outer pair is a family too: the fourth pair by lowest member index.
    expect(Array.from(loose.labels.slice(7, 9))).toEqual([3, 3]);
  });
});
