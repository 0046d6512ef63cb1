/**
 * The k-nearest search shared with worker threads gives the rows of the serial search bit for
 * bit, and so the same isolation scores and null tail fractions. The outside check of the rows
 * is brute force (kNearest.test.ts holds the serial search to it; here, for random point sets,
 * the worker rows are held to brute force directly and to the serial rows). The workers are
 * made to do the whole search (the calling thread claims nothing) with small claims, so rows
 * come from several threads in an order that varies from run to run. Invented point sets.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { kNearestAll, kNearestOfFirst } from '../../../src/detect/families/kNearest.js';
import { cellSizeForOccupancy } from '../../../src/detect/families/kNearestCellSize.js';
import { buildKNearestGrid } from '../../../src/detect/families/kNearestGrid.js';
import { startKNearestThreads, type ThreadedKNearest } from '../../../src/detect/families/kNearestThreads.js';
import { DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers } from '../../../src/detect/families/outliers.js';

/** Points on a lattice of 1/4 (exact ties, duplicates) and free ones, in a 3 × 2 × 2 box. */
function points(n: number, seed: number): Float64Array {
  const r = seededRandom(seed);
  const xyz = new Float64Array(3 * n);
  for (let j = 0; j < 3 * n; j++) xyz[j] = j % 6 < 3 ? Math.floor(r() * 12) / 4 : 2 * r();
  return xyz;
}

/** The k smallest (squared distance, index) pairs of point j among the others, by brute force. */
function bruteRow(xyz: Float64Array, j: number, k: number): number[] {
  const pairs: [number, number][] = [];
  for (let q = 0; q < xyz.length / 3; q++) {
    if (q === j) continue;
    const dx = xyz[3 * q] - xyz[3 * j], dy = xyz[3 * q + 1] - xyz[3 * j + 1], dz = xyz[3 * q + 2] - xyz[3 * j + 2];
    pairs.push([dx * dx + dy * dy + dz * dz, q]);
  }
  pairs.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  return pairs.slice(0, k).flatMap(([d2, q]) => [Math.sqrt(d2), q]);
}

describe('k nearest on worker threads', () => {
  let workersOnly: ThreadedKNearest;
  let shared: ThreadedKNearest;
  beforeAll(async () => {
    workersOnly = await startKNearestThreads(3, { chunkPositions: 37, callerClaims: false });
    shared = await startKNearestThreads(2);
  });
  afterAll(async () => {
    await workersOnly.close();
    await shared.close();
  });

  it('equal brute force for every point, computed by the workers alone', () => {
    const xyz = points(1500, 7);
    const k = 6;
    const got = workersOnly.all(buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 3, 4 * 1500 + 64)), k);
    expect(workersOnly.workerClaims()).toBeGreaterThanOrEqual(Math.ceil(1500 / 37));
    for (let j = 0; j < 1500; j++) {
      const row: number[] = [];
      for (let m = 0; m < k; m++) row.push(got.distance[j * k + m], got.index[j * k + m]);
      expect(row, `point ${j}`).toEqual(bruteRow(xyz, j, k));
    }
  });

  it('equal the serial rows bit for bit, all points and the first m, on 2 and on 3 threads', () => {
    const xyz = points(20_000, 8);
    const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 4, 4 * 20_000 + 64));
    const serialAll = kNearestAll(grid, 8);
    const serialFirst = kNearestOfFirst(grid, xyz, 3000, 8);
    for (const search of [workersOnly, shared]) {
      const all = search.all(grid, 8);
      expect(Buffer.from(all.distance.buffer).equals(Buffer.from(serialAll.distance.buffer))).toBe(true);
      expect(Array.from(all.index)).toEqual(Array.from(serialAll.index));
      const first = search.ofFirst(grid, xyz, 3000, 8);
      expect(Buffer.from(first.distance.buffer).equals(Buffer.from(serialFirst.distance.buffer))).toBe(true);
      expect(Array.from(first.index)).toEqual(Array.from(serialFirst.index));
    }
  });

  it('give the same isolation scores and null tail fractions as one thread (synthetic belt)', () => {
    const r = seededRandom(3);
    const n = 6000;
    const a = Float64Array.from({ length: n }, () => 2.2 + 1.0 * r());
    const e = Float64Array.from({ length: n }, () => 0.25 * r());
    const s = Float64Array.from({ length: n }, () => 0.25 * r());
    const one = properOutliers(a, e, s, seededRandom(11));
    const more = properOutliers(a, e, s, seededRandom(11), DEFAULT_PROPER_OUTLIER_OPTIONS, workersOnly);
    for (const key of ['score', 'nullTailFraction', 'nearestDistanceMps', 'kthDistanceMps', 'neighbourDistanceMps', 'backgroundDensity'] as const) {
      expect(Buffer.from(more[key].buffer).equals(Buffer.from(one[key].buffer)), key).toBe(true);
    }
    expect(Array.from(more.neighbourIndex)).toEqual(Array.from(one.neighbourIndex));
  });

  it('refuse a k the points cannot supply and a bad thread count (caller misuse)', async () => {
    const xyz = points(5, 9);
    const grid = buildKNearestGrid(xyz, 1);
    expect(() => shared.all(grid, 5)).toThrow(RangeError);
    expect(() => shared.ofFirst(grid, xyz, 6, 2)).toThrow(RangeError);
    await expect(startKNearestThreads(0)).rejects.toThrow(RangeError);
  });
});
