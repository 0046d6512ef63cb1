/**
 * Disjoint sets over 0..n−1 in typed arrays: union by size, path halving (Tarjan & van
 * Leeuwen 1984), near-constant time per operation. Holds the connected components of the
 * single-linkage graph.
 */
export interface UnionFind {
  readonly parent: Int32Array; // parent[k] === k for a root
  readonly size: Int32Array;   // members under each root (meaningful at roots only)
}

/** n singleton sets. */
export function createUnionFind(n: number): UnionFind {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`createUnionFind: n must be a non-negative integer, got ${n}`);
  const parent = new Int32Array(n);
  for (let k = 0; k < n; k++) parent[k] = k;
  return { parent, size: new Int32Array(n).fill(1) };
}

/** The root of k's set (halving the path on the way). */
export function findRoot(uf: UnionFind, k: number): number {
  const parent = uf.parent;
  while (parent[k] !== k) {
    parent[k] = parent[parent[k]];
    k = parent[k];
  }
  return k;
}

/** Merge the sets of i and j; returns the size of the merged set. */
export function unite(uf: UnionFind, i: number, j: number): number {
  let ri = findRoot(uf, i), rj = findRoot(uf, j);
  if (ri === rj) return uf.size[ri];
  if (uf.size[ri] < uf.size[rj] || (uf.size[ri] === uf.size[rj] && rj < ri)) { const t = ri; ri = rj; rj = t; }
  uf.parent[rj] = ri;
  uf.size[ri] += uf.size[rj];
  return uf.size[ri];
}
