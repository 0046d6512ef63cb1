import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildKNearestGrid } from '../../../src/detect/families/kNearestGrid.js';
import { cellSizeForOccupancy } from '../../../src/detect/families/kNearestCellSize.js';
import { CROWDED_CELL_POINTS, kNearestAll, kNearestOf, kNearestOfFirst } from '../../../src/detect/families/kNearest.js';
import { KNearestCellTree } from '../../../src/detect/families/kNearestCellTree.js';
import { orbitalSpeedMPerS } from '../../../src/detect/families/metricVelocity.js';
import { scaledProperCoordinates } from '../../../src/detect/families/outlierMetric.js';

/** Brute force over all pairs: the k smallest (squared distance, index) pairs, same arithmetic. */
function bruteForce(points: Float64Array, qx: number, qy: number, qz: number, exclude: number, k: number) {
  const pairs: [number, number][] = [];
  for (let j = 0; j < points.length / 3; j++) {
    if (j === exclude) continue;
    const dx = points[3 * j] - qx, dy = points[3 * j + 1] - qy, dz = points[3 * j + 2] - qz;
    pairs.push([dx * dx + dy * dy + dz * dz, j]);
  }
  pairs.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  return pairs.slice(0, k).map(([d2, j]) => [Math.sqrt(d2), j]);
}

// Points on a coarse lattice (many exact ties and duplicates) or anywhere, clumped or spread.
const coordinate = fc.oneof(fc.integer({ min: 0, max: 6 }).map((v) => v / 4), fc.double({ min: -1, max: 3, noNaN: true }));
const pointSet = fc.array(fc.tuple(coordinate, coordinate, coordinate), { minLength: 2, maxLength: 120 });

// Crowded: most points in a tight clump (a family core), many of them on a lattice (ties,
// duplicates), the rest spread; cells sized for many points so that cells hold more than
// CROWDED_CELL_POINTS and are searched through a k-d tree of their points.
const clumped = fc.oneof(fc.integer({ min: 0, max: 3 }).map((v) => 1 + v / 64), fc.double({ min: 1, max: 1.05, noNaN: true }));
const crowdedSet = fc.tuple(
  fc.array(fc.tuple(clumped, clumped, clumped), { minLength: CROWDED_CELL_POINTS + 2, maxLength: 260 }),
  fc.array(fc.tuple(coordinate, coordinate, coordinate), { maxLength: 60 }),
).map(([core, rest]) => [...core, ...rest]);

describe('k nearest neighbours through a grid', () => {
  it('in crowded cells (k-d tree of the points of the cell) equal brute force exactly, ties by lower index, all points and the first m (property-based)', () => {
    fc.assert(
      fc.property(crowdedSet, fc.integer({ min: 1, max: 12 }), fc.integer({ min: 70, max: 400 }), fc.nat(), (pts, k, perCell, mPick) => {
        const xyz = Float64Array.from(pts.flat());
        const n = pts.length;
        const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, perCell, 4 * n + 64));
        let crowded = false;
        for (let c = 0; c + 1 < grid.cellStart.length; c++) if (grid.cellStart[c + 1] - grid.cellStart[c] > CROWDED_CELL_POINTS) crowded = true;
        expect(crowded).toBe(true);
        const m = mPick % (n + 1);
        const all = kNearestAll(grid, k), first = kNearestOfFirst(grid, xyz, m, k);
        for (let j = 0; j < n; j++) {
          const want = bruteForce(xyz, xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2], j, k);
          for (let t = 0; t < k; t++) {
            if (all.distance[j * k + t] !== want[t][0] || all.index[j * k + t] !== want[t][1]) return false;
            if (j < m && (first.distance[j * k + t] !== want[t][0] || first.index[j * k + t] !== want[t][1])) return false;
          }
        }
        return true;
      }),
      { numRuns: 150 },
    );
  });

  it('the k-d tree of a crowded cell holds the k smallest (squared distance, index) pairs of its points, the query itself left out (brute force)', () => {
    fc.assert(
      fc.property(crowdedSet, fc.integer({ min: 1, max: 12 }), fc.nat(), (pts, k, pick) => {
        const xyz = Float64Array.from(pts.flat());
        const n = pts.length;
        const order = Uint32Array.from({ length: n }, (_, j) => j);
        const tree = new KNearestCellTree(xyz, order, 0, n);
        const q = pick % n;
        const d2 = new Float64Array(k), idx = new Int32Array(k);
        const held = tree.fill(xyz[3 * q], xyz[3 * q + 1], xyz[3 * q + 2], q, k, d2, idx, 0);
        const want = bruteForce(xyz, xyz[3 * q], xyz[3 * q + 1], xyz[3 * q + 2], q, k);
        return held === Math.min(k, n - 1) && want.every(([d, j], t) => Math.sqrt(d2[t]) === d && idx[t] === j);
      }),
      { numRuns: 300 },
    );
  });

  it('equal brute force exactly, ties by lower index, any cell size (property-based; common practice: brute force is the definition)', () => {
    fc.assert(
      fc.property(pointSet, fc.integer({ min: 1, max: 12 }), fc.double({ min: 0.5, max: 20, noNaN: true }), (pts, kWanted, perCell) => {
        const xyz = Float64Array.from(pts.flat());
        const n = pts.length;
        const k = Math.min(kWanted, n - 1);
        const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, perCell, 4 * n + 64));
        const got = kNearestAll(grid, k);
        for (let j = 0; j < n; j++) {
          const want = bruteForce(xyz, xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2], j, k);
          for (let m = 0; m < k; m++) {
            if (got.distance[j * k + m] !== want[m][0] || got.index[j * k + m] !== want[m][1]) return false;
          }
        }
        return true;
      }),
      { numRuns: 300 },
    );
  });

  it('queries away from the points, inside and outside the grid, equal brute force (property-based)', () => {
    fc.assert(
      fc.property(pointSet, fc.array(fc.tuple(fc.double({ min: -5, max: 8, noNaN: true }), coordinate, coordinate), { minLength: 1, maxLength: 10 }),
        fc.integer({ min: 1, max: 5 }), (pts, queries, kWanted) => {
          const xyz = Float64Array.from(pts.flat());
          const k = Math.min(kWanted, pts.length);
          const q = Float64Array.from(queries.flat());
          const got = kNearestOf(buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 2, 1000)), q, k);
          return queries.every((qq, t) => bruteForce(xyz, qq[0], qq[1], qq[2], -1, k)
            .every(([d, j], m) => got.distance[t * k + m] === d && got.index[t * k + m] === j));
        }),
      { numRuns: 200 },
    );
  });

  it('of the first m points only, equal brute force for those points (property-based)', () => {
    fc.assert(
      fc.property(pointSet, fc.integer({ min: 1, max: 12 }), fc.integer({ min: 0, max: 120 }), (pts, kWanted, mWanted) => {
        const xyz = Float64Array.from(pts.flat());
        const n = pts.length;
        const k = Math.min(kWanted, n - 1), m = Math.min(mWanted, n);
        const got = kNearestOfFirst(buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 2, 4 * n + 64)), xyz, m, k);
        if (got.distance.length !== m * k) return false;
        for (let j = 0; j < m; j++) {
          const want = bruteForce(xyz, xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2], j, k);
          for (let t = 0; t < k; t++) if (got.distance[j * k + t] !== want[t][0] || got.index[j * k + t] !== want[t][1]) return false;
        }
        return true;
      }),
      { numRuns: 200 },
    );
    const grid = buildKNearestGrid(Float64Array.of(0, 0, 0, 1, 1, 1, 2, 2, 2), 1);
    expect(() => kNearestOfFirst(grid, Float64Array.of(0, 0, 0, 1, 1, 1, 2, 2, 2), 4, 1)).toThrow(RangeError);
    expect(() => kNearestOfFirst(grid, Float64Array.of(0, 0, 0), 1, 1)).toThrow(RangeError);
  });

  it('rejects a k the points cannot supply', () => {
    const grid = buildKNearestGrid(Float64Array.of(0, 0, 0, 1, 1, 1), 1);
    expect(() => kNearestAll(grid, 2)).toThrow(RangeError);
    expect(() => kNearestAll(grid, 0)).toThrow(RangeError);
  });
});

describe('the velocity metric in scaled coordinates', () => {
  it('n·a at 1 au is the Earth’s mean orbital speed, 29.78 km/s (NASA Earth fact sheet)', () => {
    expect(orbitalSpeedMPerS(1)).toBeCloseTo(29_780, -1); // within 5 m/s of the published 29.78 km/s
  });

  it('n·a·|δz| agrees with d = n·a·√(5/4 (δa/a)² + 2 δe² + 2 δ(sin i)²) for close pairs (Zappalà et al. 1990, AJ 100, 2030)', () => {
    const a = [2.5, 2.52], e = [0.1, 0.105], s = [0.1, 0.098];
    const z = scaledProperCoordinates(a, e, s);
    const dz = Math.hypot(z[3] - z[0], z[4] - z[1], z[5] - z[2]);
    const aMean = (a[0] + a[1]) / 2;
    const published = orbitalSpeedMPerS(aMean) * Math.sqrt(1.25 * ((a[1] - a[0]) / aMean) ** 2 + 2 * (e[1] - e[0]) ** 2 + 2 * (s[1] - s[0]) ** 2);
    // Measured: 0.4% apart (n·a at the first body, not the pair's mean: |δa|/(2a) = 0.4%); bound 0.5%.
    expect(Math.abs(orbitalSpeedMPerS(a[0]) * dz / published - 1)).toBeLessThan(0.005);
    expect(published).toBeGreaterThan(100); // about 160 m/s: a neighbour distance of the trade's scale
  });

  it('refuses proper elements with a missing value, naming the body', () => {
    expect(() => scaledProperCoordinates([2.5, NaN], [0.1, 0.1], [0.1, 0.1])).toThrow('body 1');
  });
});
