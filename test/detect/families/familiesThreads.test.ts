/**
 * The k-nearest search shared with worker threads gives the rows of the serial search bit for
 * bit, and so the same isolation scores and null tail fractions; the QRL levels shared with
 * them are the serial levels (a background with no level is NaN on both). The outside check of the rows
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
import { startFamiliesThreads, type FamiliesThreads } from '../../../src/detect/families/familiesThreads.js';
import { toVelocitySpace } from '../../../src/detect/families/metricVelocity.js';
import { qrlBackgroundSpaces, SERIAL_LEVELS } from '../../../src/detect/families/qrlCutoff.js';
import { DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers } from '../../../src/detect/families/outliers.js';
import { clusterFamilies } from '../../../src/detect/familiesCluster.js';
import { SERIAL_PROPER } from '../../../src/detect/familiesScreen.js';
import { newProperColumns } from '../../../src/core/secular/properElementsColumns.js';
import { PROPER_SHARED_MIN_ROWS } from '../../../src/detect/families/familiesThreads.js';

/** Points on a lattice of 1/4 (exact ties, duplicates) and free ones, in a 3 × 2 × 2 box. */
function points(n: number, seed: number): Float64Array {
  const r = seededRandom(seed);
  const xyz = new Float64Array(3 * n);
  for (let j = 0; j < 3 * n; j++) xyz[j] = j % 6 < 3 ? Math.floor(r() * 12) / 4 : 2 * r();
  return xyz;
}

/** n bodies uniform in a from aMin over aSpan au, e and sin i in [0, 0.25) (invented). */
function uniformBelt(seed: number, n: number, aMin: number, aSpan: number): { a: Float64Array; e: Float64Array; s: Float64Array } {
  const r = seededRandom(seed);
  const a = new Float64Array(n), e = new Float64Array(n), s = new Float64Array(n);
  for (let j = 0; j < n; j++) { a[j] = aMin + aSpan * r(); e[j] = 0.25 * r(); s[j] = 0.25 * r(); }
  return { a, e, s };
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

describe('the families stage on worker threads', () => {
  let workersOnly: FamiliesThreads;
  let shared: FamiliesThreads;
  beforeAll(async () => {
    workersOnly = await startFamiliesThreads(3, { chunkPositions: 37, callerClaims: false });
    shared = await startFamiliesThreads(2);
  });
  afterAll(async () => {
    await workersOnly.close();
    await shared.close();
  });

  it('equal brute force for every point, computed by the workers alone', () => {
    const xyz = points(1500, 7);
    const k = 6;
    const got = workersOnly.search.all(buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 3, 4 * 1500 + 64)), k);
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
      const all = search.search.all(grid, 8);
      expect(Buffer.from(all.distance.buffer).equals(Buffer.from(serialAll.distance.buffer))).toBe(true);
      expect(Array.from(all.index)).toEqual(Array.from(serialAll.index));
      const first = search.search.ofFirst(grid, xyz, 3000, 8);
      expect(Buffer.from(first.distance.buffer).equals(Buffer.from(serialFirst.distance.buffer))).toBe(true);
      expect(Array.from(first.index)).toEqual(Array.from(serialFirst.index));
    }
  });

  it('give the same isolation scores, null tail fractions and false-alarm probabilities as one thread, null catalogues drawn and scored on other threads (synthetic belt, with and without a selection)', () => {
    const { a, e, s } = uniformBelt(3, 6000, 2.2, 1.0);
    const every7th = Uint8Array.from({ length: a.length }, (_, j) => (j % 7 === 0 ? 0 : 1)); // bodies set apart occupy space, unscored
    for (const scored of [null, every7th]) {
      const one = properOutliers(a, e, s, seededRandom(11), DEFAULT_PROPER_OUTLIER_OPTIONS, scored);
      for (const threads of [workersOnly, shared]) {
        const claimsBefore = threads.workerClaims();
        const more = properOutliers(a, e, s, seededRandom(11), DEFAULT_PROPER_OUTLIER_OPTIONS, scored, threads.search, threads.nullReplicates);
        if (threads === workersOnly) expect(threads.workerClaims() - claimsBefore).toBeGreaterThanOrEqual(DEFAULT_PROPER_OUTLIER_OPTIONS.replicates);
        for (const key of ['score', 'nullTailFraction', 'falseAlarmProb', 'nearestDistanceMps', 'kthDistanceMps', 'neighbourDistanceMps', 'backgroundDensity'] as const) {
          expect(Buffer.from(more[key].buffer).equals(Buffer.from(one[key].buffer)), key).toBe(true);
        }
        expect(Array.from(more.neighbourIndex)).toEqual(Array.from(one.neighbourIndex));
        expect(more.nullScores).toBe(one.nullScores);
      }
    }
  });

  it('give the QRL levels of one thread, NaN where a background has no level (synthetic belt)', () => {
    const { a, e, s } = uniformBelt(4, 3000, 2.55, 0.25);
    const spaces = qrlBackgroundSpaces(a, e, s, { minMembers: 10, aRefAu: 2.675, backgrounds: 5, seed: 2, background: { cell: { aAu: 0.02, e: 0.02, sinI: 0.02 } }, resolutionMPerS: 0.5 });
    // two points alone make no group of 10 below the highest cutoff tried: no level (NaN)
    spaces.push(toVelocitySpace(Float64Array.of(2.6, 2.7), Float64Array.of(0.1, 0.1), Float64Array.of(0.1, 0.1), 2.675));
    const serial = SERIAL_LEVELS(spaces, 10, 0.5);
    expect(Number.isNaN(serial[5])).toBe(true);
    expect(serial.subarray(0, 5).every((v) => v > 0)).toBe(true);
    const claimed = workersOnly.workerClaims();
    expect(Array.from(workersOnly.levels(spaces, 10, 0.5))).toEqual(Array.from(serial));
    expect(workersOnly.workerClaims() - claimed).toBe(spaces.length);
    expect(Array.from(shared.levels(spaces, 10, 0.5))).toEqual(Array.from(serial));
  });

  it('cluster on a worker while the calling thread searches: the serial clustering, and the search done meanwhile (synthetic belt with two tight clumps)', () => {
    const { a, e, s } = uniformBelt(5, 4000, 2.3, 0.9);
    const r = seededRandom(6);
    for (let j = 0; j < 300; j++) { // two clumps of 150 within 0.002 in each element (invented)
      const c = j < 150 ? 0 : 1;
      a[j] = 2.45 + 0.4 * c + 0.002 * r(); e[j] = 0.1 + 0.002 * r(); s[j] = 0.05 + 0.05 * c + 0.002 * r();
    }
    const opts = { cutoffMPerS: null, minMembers: 20, seed: 3 };
    const serial = clusterFamilies(a, e, s, opts);
    expect(serial.table.length).toBeGreaterThanOrEqual(2);
    const xyz = points(5000, 10);
    const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 4, 4 * 5000 + 64));
    const rows = kNearestAll(grid, 8);
    for (const threads of [workersOnly, shared]) {
      const claimed = threads.workerClaims();
      const later = threads.clusterAside(a, e, s, opts);
      const meanwhile = threads.search.all(grid, 8); // with 2 threads: the calling thread's own, while the worker clusters
      expect(Buffer.from(meanwhile.distance.buffer).equals(Buffer.from(rows.distance.buffer))).toBe(true);
      const got = later();
      expect(threads.workerClaims() - claimed).toBeGreaterThanOrEqual(1); // the clustering, on a worker
      expect(Array.from(got.labels)).toEqual(Array.from(serial.labels));
      expect(got.regionCutoffMPerS).toEqual(serial.regionCutoffMPerS);
      expect(Array.from(got.familyRegion)).toEqual(Array.from(serial.familyRegion));
      expect(got.table.map((f) => [f.id, Array.from(f.members), f.cutoffMPerS, f.aAu.median])).toEqual(serial.table.map((f) => [f.id, Array.from(f.members), f.cutoffMPerS, f.aAu.median]));
    }
  });

  it('give the proper elements of one thread, rows shared in blocks (synthetic osculating main belt, some rows not computable)', () => {
    const n = PROPER_SHARED_MIN_ROWS + 2345;
    const r = seededRandom(12);
    const col = (f: () => number) => Float64Array.from({ length: n }, f);
    const cols = {
      a: col(() => 1.5 + 2.2 * r()), e: col(() => (r() < 0.01 ? 1.2 : 0.35 * r())), i: col(() => 0.5 * r()),
      node: col(() => 2 * Math.PI * r()), peri: col(() => 2 * Math.PI * r()),
    };
    const epochJdTT = 2461000.5;
    const serial = newProperColumns(n);
    SERIAL_PROPER(epochJdTT, cols, serial);
    for (const threads of [workersOnly, shared]) {
      const claimed = threads.workerClaims();
      const out = newProperColumns(n);
      threads.proper(epochJdTT, cols, out);
      if (threads === workersOnly) expect(threads.workerClaims() - claimed).toBeGreaterThanOrEqual(2);
      for (const key of ['aAu', 'e', 'sinI', 'gArcsecPerYear', 'sArcsecPerYear', 'reliability'] as const) {
        expect(Buffer.from(out[key].buffer).equals(Buffer.from(serial[key].buffer)), key).toBe(true);
      }
    }
    expect(serial.reliability.some((c) => c !== 0) && serial.reliability.some((c) => c === 0)).toBe(true);
  });

  it('refuse a k the points cannot supply and a bad thread count (caller misuse)', async () => {
    const xyz = points(5, 9);
    const grid = buildKNearestGrid(xyz, 1);
    expect(() => shared.search.all(grid, 5)).toThrow(RangeError);
    expect(() => shared.search.ofFirst(grid, xyz, 6, 2)).toThrow(RangeError);
    await expect(startFamiliesThreads(0)).rejects.toThrow(RangeError);
  });
});
