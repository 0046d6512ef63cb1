/**
 * The hierarchical clustering method (HCM) at one cutoff: single linkage in velocity space
 * (metricVelocity.ts). Two bodies closer than the cutoff (d ≤ v_c) are linked; the connected
 * components with at least N_min members are families (Zappalà et al. 1990, 1995; the trade's
 * standard family-finding method).
 *
 * Equivalence with DBSCAN (Ester et al. 1996) with eps = v_c and minPts = 2, minPts counting
 * the point itself as in its definition: a point is core when it has at least one other point
 * within eps, so every point of a linked component of ≥ 2 points is core, the DBSCAN clusters
 * are exactly those components and the isolated points are noise (no border points exist).
 * HCM with N_min = 2 is therefore DBSCAN(eps = v_c, minPts = 2); with N_min > 2 it is that
 * DBSCAN with clusters under N_min members turned to noise. Tested against a reference DBSCAN.
 */
import { createUnionFind, unite, type UnionFind } from './clusterUnionFind.js';
import { labelComponents, type FamilyLabels } from './clusterLabels.js';
import { buildGridIndex } from './gridIndex.js';
import { forEachPairWithin } from './gridPairs.js';
import type { VelocitySpace } from './metricVelocity.js';

/** Families found at one cutoff. */
export interface HcmResult extends FamilyLabels {
  readonly cutoffMPerS: number;
  readonly minMembers: number;
  readonly linkedPairs: number;      // pairs within the cutoff
  readonly largestGroup: number;     // members of the largest component (families or not)
}

/** Components of the link graph at `cutoffMPerS`, with the pair count. */
export function linkComponents(space: VelocitySpace, cutoffMPerS: number): { uf: UnionFind; placed: Uint8Array; linkedPairs: number; largestGroup: number } {
  const n = space.xMPerS.length;
  const index = buildGridIndex(space.xMPerS, space.yMPerS, space.zMPerS, cutoffMPerS);
  const uf = createUnionFind(n);
  let largestGroup = index.pointIds.length > 0 ? 1 : 0;
  const linkedPairs = forEachPairWithin(index, cutoffMPerS, (i, j) => {
    const s = unite(uf, i, j);
    if (s > largestGroup) largestGroup = s;
  });
  const placed = new Uint8Array(n);
  for (let k = 0; k < index.pointIds.length; k++) placed[index.pointIds[k]] = 1;
  return { uf, placed, linkedPairs, largestGroup };
}

/** HCM families at cutoff `cutoffMPerS` with at least `minMembers` members each. */
export function clusterHcm(space: VelocitySpace, cutoffMPerS: number, minMembers: number): HcmResult {
  if (!(cutoffMPerS > 0)) throw new RangeError(`clusterHcm: cutoff must be a positive speed in m/s, got ${cutoffMPerS}`);
  const { uf, placed, linkedPairs, largestGroup } = linkComponents(space, cutoffMPerS);
  const { labels, memberCounts } = labelComponents(uf, minMembers, placed);
  return { labels, memberCounts, cutoffMPerS, minMembers, linkedPairs, largestGroup };
}
