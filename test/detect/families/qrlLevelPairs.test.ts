/**
 * The level search reads every cutoff it tries from one list of pairs (gridPairList.ts). Its
 * answer must be the one of linking the bodies anew at each cutoff tried (clusterHcm.ts
 * linkComponents, the definition of HCM's links: d ≤ v), restated here as the outside check,
 * on random point sets (fast-check, the suite's seed): lattice points exactly a cutoff apart,
 * free points and repeated points. The pair list itself is checked against brute force (every
 * pair looked at; allowed in tests only).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { linkComponents } from '../../../src/detect/families/clusterHcm.js';
import { pairsWithin } from '../../../src/detect/families/gridPairList.js';
import type { VelocitySpace } from '../../../src/detect/families/metricVelocity.js';
import { groupLevel } from '../../../src/detect/families/qrlCutoff.js';

/** The level search as first written: a new grid and union-find at every cutoff tried. */
function groupLevelByRelinking(space: VelocitySpace, minMembers: number, resolution: number): number {
  const formsGroup = (v: number): boolean => linkComponents(space, v).largestGroup >= minMembers;
  let lo = 0;
  let hi = 16;
  while (!formsGroup(hi)) {
    lo = hi;
    hi *= 2;
    if (hi > 16_384) throw new RangeError('no group');
  }
  while (hi - lo > resolution) {
    const mid = 0.5 * (lo + hi);
    if (formsGroup(mid)) hi = mid; else lo = mid;
  }
  return lo;
}

/** Points in m/s: lattice points 5 m/s apart, free points within ±60 m/s, copies of earlier ones. */
const spaceArb = fc.array(
  fc.oneof(
    fc.tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: -6, max: 6 }), fc.integer({ min: -6, max: 6 })).map(([i, j, k]) => ({ copy: -1, p: [5 * i, 5 * j, 5 * k] })),
    fc.tuple(fc.double({ min: -60, max: 60, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true })).map((p) => ({ copy: -1, p })),
    fc.nat().map((k) => ({ copy: k, p: [0, 0, 0] })),
  ),
  { minLength: 1, maxLength: 150 },
).map((items): VelocitySpace => {
  const pts: number[][] = [];
  for (const it of items) pts.push(it.copy >= 0 && pts.length ? [...pts[it.copy % pts.length]] : it.p);
  return { xMPerS: Float64Array.from(pts, (p) => p[0]), yMPerS: Float64Array.from(pts, (p) => p[1]), zMPerS: Float64Array.from(pts, (p) => p[2]), aRefAu: 2.75 };
});

describe('level search from one pair list', () => {
  it('gives the level of relinking at every cutoff (random point sets)', () => {
    fc.assert(
      fc.property(spaceArb, fc.integer({ min: 2, max: 12 }), fc.constantFrom(0.01, 0.5, 3), (space, minMembers, resolution) => {
        let expected: number | string, got: number | string;
        try { expected = groupLevelByRelinking(space, minMembers, resolution); } catch { expected = 'no group'; }
        try { got = groupLevel(space, minMembers, resolution); } catch { got = 'no group'; }
        expect(got).toBe(expected);
      }),
      { numRuns: 300 },
    );
  });

  it('holds every pair within the radius, each once, with its squared distance (brute force)', () => {
    fc.assert(
      fc.property(spaceArb, fc.constantFrom(5, 7.5, 20), (space, radius) => {
        const list = pairsWithin(space, radius);
        const got: string[] = [];
        for (let p = 0; p < list.count; p++) {
          const i = Math.min(list.first[p], list.second[p]), j = Math.max(list.first[p], list.second[p]);
          const dx = space.xMPerS[i] - space.xMPerS[j], dy = space.yMPerS[i] - space.yMPerS[j], dz = space.zMPerS[i] - space.zMPerS[j];
          expect(list.distance2[p]).toBe(dx * dx + dy * dy + dz * dz);
          got.push(`${i}-${j}`);
        }
        const want: string[] = [];
        const n = space.xMPerS.length;
        for (let i = 0; i < n; i++) {
          for (let j = i + 1; j < n; j++) {
            const dx = space.xMPerS[i] - space.xMPerS[j], dy = space.yMPerS[i] - space.yMPerS[j], dz = space.zMPerS[i] - space.zMPerS[j];
            if (dx * dx + dy * dy + dz * dz <= radius * radius) want.push(`${i}-${j}`);
          }
        }
        expect(got.sort()).toEqual(want.sort());
      }),
      { numRuns: 200 },
    );
  });
});
