/**
 * Every pair of indexed points within `radius` (≤ the index's radius; distance ≤ radius
 * counts), each pair once, without looking at all pairs: a cell is paired with itself and with
 * the 13 of its 26 neighbours whose key is larger (the half shell), cells in key order.
 */
import { findCell, type GridIndex } from './gridIndex.js';

/** Called once per pair: ids i and j (i < j when in one cell) and their squared distance. */
export type PairVisitor = (i: number, j: number, distance2: number) => void;

/** The 13 neighbour offsets (dx, dy, dz) whose cell key exceeds the centre's. */
const HALF_SHELL: readonly (readonly [number, number, number])[] = (() => {
  const out: [number, number, number][] = [];
  for (let dx = -1; dx <= 1; dx++) for (let dy = -1; dy <= 1; dy++) for (let dz = -1; dz <= 1; dz++) {
    if (dx > 0 || (dx === 0 && (dy > 0 || (dy === 0 && dz > 0)))) out.push([dx, dy, dz]);
  }
  return out;
})();

/** Visit each pair within `radius` once; returns the number of pairs visited. */
export function forEachPairWithin(index: GridIndex, radius: number, visit: PairVisitor): number {
  if (!(radius >= 0) || radius > index.radius) {
    throw new RangeError(`forEachPairWithin: radius ${radius} outside [0, ${index.radius}] (the index's radius)`);
  }
  const { x, y, z, cellKeys, cellStarts, pointIds, nx, ny, nz } = index;
  const r2 = radius * radius;
  let pairs = 0;
  for (let c = 0; c < cellKeys.length; c++) {
    const key = cellKeys[c];
    const cz = key % nz, cxy = (key - cz) / nz, cy = cxy % ny, cx = (cxy - cy) / ny;
    const s = cellStarts[c], e = cellStarts[c + 1];
    for (let a = s; a < e; a++) {
      const p = pointIds[a];
      for (let b = a + 1; b < e; b++) {
        const q = pointIds[b];
        const dx = x[p] - x[q], dy = y[p] - y[q], dz = z[p] - z[q];
        const d2 = dx * dx + dy * dy + dz * dz;
        if (d2 <= r2) { visit(p, q, d2); pairs++; }
      }
    }
    for (const [ox, oy, oz] of HALF_SHELL) {
      const ix = cx + ox, iy = cy + oy, iz = cz + oz;
      if (ix < 0 || ix >= nx || iy < 0 || iy >= ny || iz < 0 || iz >= nz) continue;
      const d = findCell(cellKeys, (ix * ny + iy) * nz + iz, c + 1);
      if (d < 0) continue;
      pairs += crossPairs(index, s, e, cellStarts[d], cellStarts[d + 1], r2, visit);
    }
  }
  return pairs;
}

/** Pairs between two cells' runs of sorted ids [s1, e1) × [s2, e2). */
function crossPairs(index: GridIndex, s1: number, e1: number, s2: number, e2: number, r2: number, visit: PairVisitor): number {
  const { x, y, z, pointIds } = index;
  let pairs = 0;
  for (let a = s1; a < e1; a++) {
    const p = pointIds[a];
    const px = x[p], py = y[p], pz = z[p];
    for (let b = s2; b < e2; b++) {
      const q = pointIds[b];
      const dx = px - x[q], dy = py - y[q], dz = pz - z[q];
      const d2 = dx * dx + dy * dy + dz * dz;
      if (d2 <= r2) { visit(p, q, d2); pairs++; }
    }
  }
  return pairs;
}
