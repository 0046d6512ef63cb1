import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { KdTreeNearest } from '../../../src/detect/families/kdTreeNearest.js';
import { buildKNearestGrid } from '../../../src/detect/families/kNearestGrid.js';
import { cellSizeForOccupancy } from '../../../src/detect/families/kNearestCellSize.js';
import { kNearestOf } from '../../../src/detect/families/kNearest.js';

/** Brute force over every point (common practice as the reference of a nearest-neighbour search): smallest squared distance, ties to the lower index. */
function bruteNearest(xyz: Float64Array, x: number, y: number, z: number): { index: number; d2: number } {
  let index = -1, d2 = Infinity;
  for (let j = 0; j < xyz.length / 3; j++) {
    const dx = xyz[3 * j] - x, dy = xyz[3 * j + 1] - y, dz = xyz[3 * j + 2] - z;
    const dd = dx * dx + dy * dy + dz * dz;
    if (dd < d2) { index = j; d2 = dd; }
  }
  return { index, d2 };
}

describe('KdTreeNearest', () => {
  it('equals brute force, ties by the lower index, on coarse lattices full of ties (property-based)', () => {
    const coordinate = fc.oneof(fc.integer({ min: 0, max: 4 }).map((v) => v / 2), fc.double({ min: -1, max: 3, noNaN: true }));
    fc.assert(
      fc.property(
        fc.array(fc.tuple(coordinate, coordinate, coordinate), { minLength: 1, maxLength: 200 }),
        fc.array(fc.tuple(coordinate, coordinate, coordinate), { minLength: 1, maxLength: 10 }),
        (pts, queries) => {
          const xyz = Float64Array.from(pts.flat());
          const tree = new KdTreeNearest(xyz);
          return queries.every(([x, y, z]) => {
            const want = bruteNearest(xyz, x, y, z);
            const got = tree.nearest(x, y, z);
            return got.index === want.index && got.distanceSquared === want.d2;
          });
        },
      ),
      { numRuns: 300 },
    );
  });

  it('gives the grid search\'s nearest, the same bits, for clumps and queries far from them (seeded, invented data)', () => {
    const random = seededRandom(7);
    const n = 3000;
    const xyz = new Float64Array(3 * n);
    for (let j = 0; j < n; j++) {
      const clump = j % 3; // three tight clumps far apart, as families in proper elements
      for (let c = 0; c < 3; c++) xyz[3 * j + c] = clump * 0.3 + (c === clump ? 0.1 : 0) + 0.002 * (random() - 0.5);
    }
    const tree = new KdTreeNearest(xyz);
    const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 4, 4 * n + 64));
    for (let q = 0; q < 200; q++) {
      const x = 1.5 * random() - 0.25, y = 1.5 * random() - 0.25, z = 1.5 * random() - 0.25;
      const viaGrid = kNearestOf(grid, Float64Array.of(x, y, z), 1);
      const got = tree.nearest(x, y, z);
      expect(got.index).toBe(viaGrid.index[0]);
      expect(Math.sqrt(got.distanceSquared)).toBe(viaGrid.distance[0]);
      expect(got.index).toBe(bruteNearest(xyz, x, y, z).index);
    }
  });

  it('has no nearest point in an empty set, and refuses coordinates that are not whole points (caller misuse)', () => {
    const got = new KdTreeNearest(new Float64Array(0)).nearest(0, 0, 0);
    expect(got.index).toBe(-1);
    expect(got.distanceSquared).toBeNaN();
    expect(() => new KdTreeNearest(new Float64Array(4))).toThrow(RangeError);
  });
});
