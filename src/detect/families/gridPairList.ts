/**
 * Every pair of points within a radius, kept as columns (the pairs gridPairs.ts visits, in
 * its order), so that the links at any smaller cutoff can be read again without a new grid:
 * the pairs within v ≤ radius are exactly those of the list with distance² ≤ v·v. The level
 * search of the quasi-random level (qrlCutoff.ts) tries many cutoffs below one radius.
 */
import { buildGridIndex } from './gridIndex.js';
import { forEachPairWithin } from './gridPairs.js';
import type { VelocitySpace } from './metricVelocity.js';

export interface PairList {
  readonly radius: number; // the pairs are all those with distance ≤ radius
  readonly count: number; // pairs held
  readonly first: Int32Array; // point ids, length ≥ count
  readonly second: Int32Array;
  readonly distance2: Float64Array; // squared distance of each pair, as gridPairs.ts computes it
  readonly indexedPoints: number; // points with finite coordinates (the others are in no pair)
  readonly points: number; // all points
}

/** The pairs of `space` within `radius` (m/s). */
export function pairsWithin(space: VelocitySpace, radius: number): PairList {
  const index = buildGridIndex(space.xMPerS, space.yMPerS, space.zMPerS, radius);
  let capacity = Math.max(1024, index.pointIds.length);
  let first = new Int32Array(capacity), second = new Int32Array(capacity), distance2 = new Float64Array(capacity);
  let count = 0;
  forEachPairWithin(index, radius, (i, j, d2) => {
    if (count === capacity) {
      capacity *= 2;
      first = grown(first, capacity); second = grown(second, capacity);
      const d = new Float64Array(capacity);
      d.set(distance2);
      distance2 = d;
    }
    first[count] = i; second[count] = j; distance2[count] = d2;
    count++;
  });
  return { radius, count, first, second, distance2, indexedPoints: index.pointIds.length, points: space.xMPerS.length };
}

function grown(a: Int32Array, capacity: number): Int32Array<ArrayBuffer> {
  const b = new Int32Array(capacity);
  b.set(a);
  return b;
}
