/**
 * Quasi-random level: the random background keeps the large-scale density it is built from
 * (checked by counting, per a bin, the multisets of e and sin i), the level search finds the
 * cutoff at which a group first forms on hand-placed points, and on a synthetic belt with one
 * planted family (invented data) HCM at the QRL finds the plant and no background group.
 */
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { clusterHcm } from '../../../src/detect/families/clusterHcm.js';
import { toVelocitySpace } from '../../../src/detect/families/metricVelocity.js';
import { shuffledBackground } from '../../../src/detect/families/qrlBackground.js';
import { coarseCellBackground } from '../../../src/detect/families/qrlBackgroundCells.js';
import { groupLevel, quasiRandomLevel } from '../../../src/detect/families/qrlCutoff.js';
import { BELT_REGION_EDGES_AU, regionMembers, regionOfAu } from '../../../src/detect/families/qrlRegion.js';

function syntheticBelt(seed: number, background: number, planted: number): { a: Float64Array; e: Float64Array; s: Float64Array } {
  const r = seededRandom(seed);
  const n = background + planted;
  const a = new Float64Array(n), e = new Float64Array(n), s = new Float64Array(n);
  for (let k = 0; k < background; k++) { a[k] = 2.55 + 0.25 * r(); e[k] = 0.25 * r(); s[k] = 0.3 * r(); }
  // A tight planted family: about 30 m/s across at a ≈ 2.7 au.
  for (let k = background; k < n; k++) { a[k] = 2.68 + 0.002 * r(); e[k] = 0.12 + 0.001 * r(); s[k] = 0.15 + 0.001 * r(); }
  return { a, e, s };
}

describe('random background', () => {
  it('keeps a, and the e and sin i values of each a bin, and breaks the (e, sin i) pairs', () => {
    const { a, e, s } = syntheticBelt(3, 2000, 100);
    const bg = shuffledBackground(a, e, s, 0.05, seededRandom(11));
    expect(Array.from(bg.aAu)).toEqual(Array.from(a));
    const byBin = (col: ArrayLike<number>) => {
      const m = new Map<number, number[]>();
      for (let k = 0; k < a.length; k++) { const b = Math.floor(a[k] / 0.05); (m.get(b) ?? m.set(b, []).get(b)!).push(col[k]); }
      return [...m.entries()].sort((x, y) => x[0] - y[0]).map(([b, v]) => [b, v.sort((x, y) => x - y)]);
    };
    expect(byBin(bg.e)).toEqual(byBin(e));
    expect(byBin(bg.sinI)).toEqual(byBin(s));
    let samePairs = 0;
    for (let k = 0; k < a.length; k++) if (bg.e[k] === e[k] && bg.sinI[k] === s[k]) samePairs++;
    expect(samePairs).toBeLessThan(a.length / 10);
    // Deterministic for a seed.
    expect(Array.from(shuffledBackground(a, e, s, 0.05, seededRandom(11)).e)).toEqual(Array.from(bg.e));
  });
});

describe('coarse-cell background', () => {
  it('keeps the count of bodies in every box and moves each body only within its box', () => {
    const { a, e, s } = syntheticBelt(4, 2000, 100);
    const cell = { aAu: 0.02, e: 0.02, sinI: 0.02 };
    const bg = coarseCellBackground(a, e, s, cell, seededRandom(9));
    const box = (x: number, w: number) => Math.floor(x / w);
    let moved = 0;
    for (let k = 0; k < a.length; k++) {
      expect([box(bg.aAu[k], cell.aAu), box(bg.e[k], cell.e), box(bg.sinI[k], cell.sinI)]).toEqual([box(a[k], cell.aAu), box(e[k], cell.e), box(s[k], cell.sinI)]);
      if (bg.e[k] !== e[k]) moved++;
    }
    expect(moved).toBe(a.length);
    // The planted family (0.002 au × 0.001 × 0.001) is spread over its box: its spread in e grows.
    const spread = (c: Float64Array) => Math.max(...c.subarray(2000)) - Math.min(...c.subarray(2000));
    expect(spread(bg.e)).toBeGreaterThan(0.01);
    expect(Array.from(coarseCellBackground(a, e, s, cell, seededRandom(9)).sinI)).toEqual(Array.from(bg.sinI));
  });
});

describe('level search', () => {
  it('finds the cutoff at which the first group of N_min forms (hand-placed points)', () => {
    // Along x: gaps 10, 3 | 87 | 4, 2.5 → three linked at 4 (100, 104, 106.5), at 10 on the left.
    const x = Float64Array.from([0, 10, 13, 100, 104, 106.5]);
    const zero = new Float64Array(6);
    const space = { xMPerS: x, yMPerS: zero, zMPerS: zero, aRefAu: 2.75 };
    const v = groupLevel(space, 3, 0.01);
    expect(v).toBeLessThan(4);
    expect(v).toBeGreaterThanOrEqual(4 - 0.01);
    expect(groupLevel(space, 4, 0.01)).toBeGreaterThanOrEqual(87 - 0.01);
  });

  it('HCM at the QRL finds a planted family and no group of the smooth background (synthetic)', () => {
    const { a, e, s } = syntheticBelt(5, 4000, 60);
    const q = quasiRandomLevel(a, e, s, { minMembers: 10, aRefAu: 2.675, backgrounds: 3, seed: 1, background: { binWidthAu: 0.05 }, resolutionMPerS: 0.5 });
    expect(q.perBackgroundMPerS.length).toBe(3);
    expect(q.cutoffMPerS).toBe(Math.min(...q.perBackgroundMPerS));
    const res = clusterHcm(toVelocitySpace(a, e, s, 2.675), q.cutoffMPerS, 10);
    expect(res.memberCounts.length).toBe(1);
    let planted = 0;
    for (let k = 4000; k < 4060; k++) if (res.labels[k] === 0) planted++;
    expect(planted).toBe(60);
    expect(res.memberCounts[0]).toBeLessThan(60 + 10);
    // The same seed gives the same level.
    expect(quasiRandomLevel(a, e, s, { minMembers: 10, aRefAu: 2.675, backgrounds: 3, seed: 1, background: { binWidthAu: 0.05 }, resolutionMPerS: 0.5 }).cutoffMPerS).toBe(q.cutoffMPerS);
  });
});

describe('belt regions', () => {
  it('split at the 3:1 and 5:2 resonances, 2.5 and 2.82 au (common practice)', () => {
    expect(BELT_REGION_EDGES_AU).toEqual([2.5, 2.82]);
    expect([2.3, 2.5, 2.81, 2.82, 3.1, NaN].map(regionOfAu)).toEqual([0, 1, 1, 2, 2, -1]);
    expect(Array.from(regionMembers([2.3, 2.9, 2.6, 2.2, NaN], 0))).toEqual([0, 3]);
  });
});
