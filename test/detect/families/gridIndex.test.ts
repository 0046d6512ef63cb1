/**
 * The grid index against brute force (every pair looked at; allowed in tests only) on random
 * point sets, seeded by the suite's fast-check seed: points on a lattice of the cell size (so
 * many lie exactly on cell boundaries and exactly one radius apart), free points, and repeated
 * points. Brute force is the outside check here: the definition of "within r" (distance ≤ r).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildGridIndex } from '../../../src/detect/families/gridIndex.js';
import { queryRadius } from '../../../src/detect/families/gridQuery.js';
import { forEachPairWithin } from '../../../src/detect/families/gridPairs.js';

interface Cloud { x: Float64Array; y: Float64Array; z: Float64Array }

/** Random cloud: lattice points (spacing `radius`), free points and copies of earlier points. */
const cloudArb = (radius: number) =>
  fc.array(
    fc.oneof(
      fc.tuple(fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 })).map(([i, j, k]) => ({ kind: 'lattice' as const, p: [i * radius, j * radius, k * radius] })),
      fc.tuple(fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true })).map((p) => ({ kind: 'free' as const, p })),
      fc.nat().map((k) => ({ kind: 'copy' as const, k })),
    ),
    { minLength: 0, maxLength: 120 },
  ).map((items) => {
    const pts: number[][] = [];
    for (const it of items) {
      if (it.kind === 'copy') { if (pts.length) pts.push([...pts[it.k % pts.length]]); }
      else pts.push(it.p);
    }
    return { x: Float64Array.from(pts, (p) => p[0]), y: Float64Array.from(pts, (p) => p[1]), z: Float64Array.from(pts, (p) => p[2]) } as Cloud;
  });

function d2(c: Cloud, i: number, j: number): number {
  const dx = c.x[i] - c.x[j], dy = c.y[i] - c.y[j], dz = c.z[i] - c.z[j];
  return dx * dx + dy * dy + dz * dz;
}

function brutePairs(c: Cloud, r: number): string[] {
  const out: string[] = [];
  for (let i = 0; i < c.x.length; i++) for (let j = i + 1; j < c.x.length; j++) if (d2(c, i, j) <= r * r) out.push(`${i}-${j}`);
  return out;
}

describe('grid index against brute force', () => {
  for (const radius of [1, 0.7]) {
    it(`pairs within the radius, each once (radius ${radius}, lattice spacing = radius)`, () => {
      fc.assert(
        fc.property(cloudArb(radius), fc.double({ min: 0.2, max: 1, noNaN: true }), (c, frac) => {
          const index = buildGridIndex(c.x, c.y, c.z, radius);
          for (const r of [radius, radius * frac]) {
            const got: string[] = [];
            const count = forEachPairWithin(index, r, (i, j, dist2) => {
              expect(dist2).toBe(d2(c, i, j));
              got.push(i < j ? `${i}-${j}` : `${j}-${i}`);
            });
            expect(count).toBe(got.length);
            expect(new Set(got).size).toBe(got.length);
            expect(got.sort()).toEqual(brutePairs(c, r).sort());
          }
        }),
        { numRuns: 200 },
      );
    });

    it(`radius queries return exactly the points within the radius (radius ${radius})`, () => {
      fc.assert(
        fc.property(cloudArb(radius), fc.tuple(fc.double({ min: -4, max: 4, noNaN: true }), fc.double({ min: -4, max: 4, noNaN: true }), fc.double({ min: -4, max: 4, noNaN: true })), (c, [qx, qy, qz]) => {
          const index = buildGridIndex(c.x, c.y, c.z, radius);
          const out = new Int32Array(c.x.length);
          // Query at a free point and at each lattice/duplicate point of the cloud.
          const queries = [[qx, qy, qz], ...Array.from(c.x, (_, k) => [c.x[k], c.y[k], c.z[k]])];
          for (const [px, py, pz] of queries) {
            const m = queryRadius(index, px, py, pz, radius, out);
            const want: number[] = [];
            for (let k = 0; k < c.x.length; k++) {
              const dx = c.x[k] - px, dy = c.y[k] - py, dz = c.z[k] - pz;
              if (dx * dx + dy * dy + dz * dz <= radius * radius) want.push(k);
            }
            expect(Array.from(out.subarray(0, m)).sort((a, b) => a - b)).toEqual(want);
          }
        }),
        { numRuns: 100 },
      );
    });
  }

  it('files the points by cell key, then by id, whatever the width of the keys (radix passes: one, several; a key beyond 32 bits)', () => {
    // The definition of the order checked directly: each point's key from its cell, (cx·ny + cy)·nz + cz.
    for (const spread of [3, 100, 100_000]) {
      fc.assert(
        fc.property(fc.array(fc.tuple(fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.double({ min: -1, max: 1, noNaN: true }), fc.boolean()), { maxLength: 300 }), (raw) => {
          // half the points drawn again near earlier ones, so that cells hold several ids
          const pts = raw.map(([a, b, c, near], t) => (near && t > 0 ? [raw[t >> 1][0] * spread + a * 0.3, raw[t >> 1][1] * spread, raw[t >> 1][2] * spread] : [a * spread, b * spread, c * spread]));
          const c: Cloud = { x: Float64Array.from(pts, (p) => p[0]), y: Float64Array.from(pts, (p) => p[1]), z: Float64Array.from(pts, (p) => p[2]) };
          const g = buildGridIndex(c.x, c.y, c.z, 1);
          const keyOf = (k: number) => (Math.floor((c.x[k] - g.minX) / g.cellEdge) * g.ny + Math.floor((c.y[k] - g.minY) / g.cellEdge)) * g.nz + Math.floor((c.z[k] - g.minZ) / g.cellEdge);
          const want = Array.from(c.x, (_, k) => k).sort((p, q) => keyOf(p) - keyOf(q) || p - q);
          expect(Array.from(g.pointIds)).toEqual(want);
          const keys = [...new Set(want.map(keyOf))];
          expect(Array.from(g.cellKeys)).toEqual(keys);
          for (let t = 0; t < keys.length; t++) for (let a = g.cellStarts[t]; a < g.cellStarts[t + 1]; a++) expect(keyOf(g.pointIds[a])).toBe(keys[t]);
        }),
        { numRuns: 60 },
      );
    }
  });

  it('points with a NaN coordinate are left out and counted, never paired', () => {
    const x = Float64Array.from([0, 0, NaN, 0.1]);
    const y = Float64Array.from([0, 0, 0, NaN]);
    const z = Float64Array.from([0, 0, 0, 0]);
    const index = buildGridIndex(x, y, z, 1);
    expect(index.leftOut).toBe(2);
    const pairs: number[][] = [];
    forEachPairWithin(index, 1, (i, j) => pairs.push([i, j]));
    expect(pairs).toEqual([[0, 1]]);
  });

  it('refuses a query radius beyond the index radius and a non-positive radius', () => {
    const c = Float64Array.from([0, 1]);
    const index = buildGridIndex(c, c, c, 1);
    expect(() => queryRadius(index, 0, 0, 0, 1.5, new Int32Array(2))).toThrow(RangeError);
    expect(() => forEachPairWithin(index, 2, () => {})).toThrow(RangeError);
    expect(() => buildGridIndex(c, c, c, 0)).toThrow(RangeError);
  });
});
