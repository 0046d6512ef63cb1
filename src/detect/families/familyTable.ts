/**
 * The family table: for each family of a labelling (clusterHcm.ts), its members, centre
 * (median proper elements, as published family tables give them) and extent (min/max and
 * the 5 % and 95 % quantiles of a, e and sin i), with the cutoff it was found at. Rows in
 * family id order.
 */
import { medianSorted } from '../../core/math.js';
import { quantileSorted } from './familyTableQuantile.js';

/** Spread of one element over a family's members. */
export interface ElementExtent {
  readonly median: number;
  readonly min: number;
  readonly max: number;
  readonly p05: number; // 5 % quantile (familyTableQuantile.ts)
  readonly p95: number; // 95 % quantile
}

export interface FamilyRow {
  readonly id: number;
  readonly memberCount: number;
  readonly members: Int32Array;  // body indices, ascending
  readonly aAu: ElementExtent;
  readonly e: ElementExtent;
  readonly sinI: ElementExtent;
  readonly cutoffMPerS: number;
}

/**
 * One row per family id 0..max(labels); bodies with negative labels belong to none.
 * `cutoffMPerS`: one cutoff for all families, or one per family id (clusterByRegion.ts).
 */
export function buildFamilyTable(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, labels: Int32Array, cutoffMPerS: number | ArrayLike<number>): FamilyRow[] {
  const n = labels.length;
  if (aAu.length !== n || e.length !== n || sinI.length !== n) throw new RangeError(`buildFamilyTable: columns and labels differ in length`);
  let families = 0;
  for (let k = 0; k < n; k++) if (labels[k] >= families) families = labels[k] + 1;
  const counts = new Int32Array(families);
  for (let k = 0; k < n; k++) if (labels[k] >= 0) counts[labels[k]]++;
  const members = Array.from(counts, (c) => new Int32Array(c));
  const fill = new Int32Array(families);
  for (let k = 0; k < n; k++) if (labels[k] >= 0) members[labels[k]][fill[labels[k]]++] = k;
  if (typeof cutoffMPerS !== 'number' && cutoffMPerS.length < families) {
    throw new RangeError(`buildFamilyTable: ${cutoffMPerS.length} cutoffs for ${families} families`);
  }
  return members.map((ids, id) => ({
    id,
    memberCount: ids.length,
    members: ids,
    aAu: extentOf(aAu, ids),
    e: extentOf(e, ids),
    sinI: extentOf(sinI, ids),
    cutoffMPerS: typeof cutoffMPerS === 'number' ? cutoffMPerS : cutoffMPerS[id],
  }));
}

function extentOf(column: ArrayLike<number>, ids: Int32Array): ElementExtent {
  const v = new Float64Array(ids.length);
  for (let k = 0; k < ids.length; k++) v[k] = column[ids[k]];
  v.sort();
  return {
    median: medianSorted(v),
    min: v.length ? v[0] : NaN,
    max: v.length ? v[v.length - 1] : NaN,
    p05: quantileSorted(v, 0.05),
    p95: quantileSorted(v, 0.95),
  };
}
