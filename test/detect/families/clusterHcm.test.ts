/**
 * HCM single linkage against brute force: the connected components of the graph "distance ≤
 * cutoff" found by looking at every pair (allowed in tests only) and a depth-first search,
 * no union–find and no grid. Random sets from the suite's fast-check seed, with duplicates.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { clusterHcm } from '../../../src/detect/families/clusterHcm.js';
import { LABEL_MISSING, LABEL_NOISE } from '../../../src/detect/families/clusterLabels.js';
import type { VelocitySpace } from '../../../src/detect/families/metricVelocity.js';

function space(pts: number[][]): VelocitySpace {
  return { xMPerS: Float64Array.from(pts, (p) => p[0]), yMPerS: Float64Array.from(pts, (p) => p[1]), zMPerS: Float64Array.from(pts, (p) => p[2]), aRefAu: 2.75 };
}

/** Components by depth-first search over all pairs; labels per the documented ordering rule. */
function bruteLabels(pts: number[][], cutoff: number, minMembers: number): Int32Array {
  const n = pts.length;
  const comp = new Int32Array(n).fill(-1);
  const comps: number[][] = [];
  for (let s = 0; s < n; s++) {
    if (comp[s] >= 0 || pts[s].some((v) => Number.isNaN(v))) continue;
    const members = [s];
    comp[s] = comps.length;
    for (let h = 0; h < members.length; h++) {
      const p = pts[members[h]];
      for (let q = 0; q < n; q++) {
        if (comp[q] >= 0 || pts[q].some((v) => Number.isNaN(v))) continue;
        const d = (p[0] - pts[q][0]) ** 2 + (p[1] - pts[q][1]) ** 2 + (p[2] - pts[q][2]) ** 2;
        if (d <= cutoff * cutoff) { comp[q] = comps.length; members.push(q); }
      }
    }
    comps.push(members);
  }
  // Families: ≥ minMembers, ordered by size (desc), then lowest member index.
  const fam = comps.map((m, c) => ({ c, size: m.length, low: Math.min(...m) })).filter((f) => f.size >= minMembers);
  fam.sort((a, b) => b.size - a.size || a.low - b.low);
  const idOf = new Map(fam.map((f, id) => [f.c, id]));
  return Int32Array.from(pts, (p, k) => (p.some((v) => Number.isNaN(v)) ? LABEL_MISSING : idOf.get(comp[k]) ?? LABEL_NOISE));
}

const pointArb = fc.oneof(
  { weight: 8, arbitrary: fc.tuple(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true })).map((t) => [...t]) },
  { weight: 2, arbitrary: fc.tuple(fc.integer({ min: 0, max: 10 }), fc.integer({ min: 0, max: 10 }), fc.integer({ min: 0, max: 10 })).map((t) => t.map((v) => v * 10)) },
  { weight: 1, arbitrary: fc.constant([NaN, 1, 1]) },
);
const cloudArb = fc.array(pointArb, { maxLength: 150 }).chain((pts) =>
  fc.array(fc.nat(), { maxLength: 30 }).map((picks) => (pts.length ? [...pts, ...picks.map((k) => [...pts[k % pts.length]])] : pts)),
);

describe('HCM single linkage against brute force', () => {
  it('labels identical to brute-force components, ordered by size then lowest member', () => {
    fc.assert(
      fc.property(cloudArb, fc.constantFrom(5, 10, 12.5, 25), fc.integer({ min: 1, max: 6 }), (pts, cutoff, minMembers) => {
        const got = clusterHcm(space(pts), cutoff, minMembers);
        const want = bruteLabels(pts, cutoff, minMembers);
        expect(Array.from(got.labels)).toEqual(Array.from(want));
        const counts = Array.from(got.memberCounts);
        for (let id = 0; id < counts.length; id++) expect(counts[id]).toBe(want.filter((l) => l === id).length);
      }),
      { numRuns: 300 },
    );
  });

  it('larger families first; equal sizes ordered by their lowest member index', () => {
    // Two groups of equal size: the one holding point 0 is family 0.
    const pts = [[100, 0, 0], [0, 0, 0], [1, 0, 0], [101, 0, 0], [50, 50, 50]];
    expect(Array.from(clusterHcm(space(pts), 2, 2).labels)).toEqual([0, 1, 1, 0, LABEL_NOISE]);
    // The larger group comes first whatever its lowest index.
    const pts2 = [[100, 0, 0], [0, 0, 0], [1, 0, 0], [2, 0, 0], [101, 0, 0]];
    expect(Array.from(clusterHcm(space(pts2), 2, 2).labels)).toEqual([1, 0, 0, 0, 1]);
  });

  it('refuses a non-positive cutoff and a minimum under one member', () => {
    expect(() => clusterHcm(space([[0, 0, 0]]), 0, 2)).toThrow(RangeError);
    expect(() => clusterHcm(space([[0, 0, 0]]), 1, 0)).toThrow(RangeError);
  });
});
