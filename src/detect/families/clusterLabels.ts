/**
 * Family labels from connected components: components of at least `minMembers` points are
 * families, numbered 0, 1, … by member count (largest first), ties by their lowest member
 * index; every other point is noise. Deterministic for a given partition, whatever order the
 * pairs were joined in.
 */
import { findRoot, type UnionFind } from './clusterUnionFind.js';

/** Label of a point in no family (a component smaller than the minimum). */
export const LABEL_NOISE = -1;
/** Label of a point that could not be placed (a NaN element). */
export const LABEL_MISSING = -2;

/** Labels and member counts of the families. */
export interface FamilyLabels {
  readonly labels: Int32Array;       // family id, LABEL_NOISE or LABEL_MISSING per point
  readonly memberCounts: Int32Array; // members of family id
}

/**
 * Number the components of `uf` with ≥ `minMembers` members. `placed[k] === 0` marks a point
 * left out of the clustering (LABEL_MISSING); omit `placed` when every point took part.
 */
export function labelComponents(uf: UnionFind, minMembers: number, placed?: Uint8Array): FamilyLabels {
  if (!Number.isInteger(minMembers) || minMembers < 1) throw new RangeError(`labelComponents: minMembers must be a positive integer, got ${minMembers}`);
  const n = uf.parent.length;
  const roots: number[] = [];  // roots of families, found at their lowest member
  const rootLabel = new Int32Array(n).fill(LABEL_NOISE);
  const labels = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    if (placed !== undefined && placed[k] === 0) continue;
    const r = findRoot(uf, k);
    if (uf.size[r] >= minMembers && rootLabel[r] === LABEL_NOISE) {
      rootLabel[r] = roots.length; // first-seen order = lowest member index
      roots.push(r);
    }
  }
  const order = roots.map((r, firstSeen) => ({ r, firstSeen, size: uf.size[r] }));
  order.sort((p, q) => q.size - p.size || p.firstSeen - q.firstSeen);
  const memberCounts = new Int32Array(order.length);
  order.forEach((o, id) => { rootLabel[o.r] = id; memberCounts[id] = o.size; });
  for (let k = 0; k < n; k++) {
    if (placed !== undefined && placed[k] === 0) { labels[k] = LABEL_MISSING; continue; }
    const r = findRoot(uf, k);
    labels[k] = uf.size[r] >= minMembers ? rootLabel[r] : LABEL_NOISE;
  }
  return { labels, memberCounts };
}
