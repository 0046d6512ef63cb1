/**
 * Every pair of indexed points within `radius` (≤ the index's radius; distance ≤ radius
 * counts), each pair once, without looking at all pairs: a cell is paired with itself and with
 * the 13 of its 26 neighbours whose key is larger (the half shell: dx = +1, or dx = 0 and
 * dy = +1, or dx = dy = 0 and dz = +1), cells in key order.
 */
import type { GridIndex } from './gridIndex.js';

/** Called once per pair: ids i and j (i < j when in one cell) and their squared distance. */
export type PairVisitor = (i: number, j: number, distance2: number) => void;

/**
 * The half shell as four neighbour columns (dx, dy) taken whole (dz = −1, 0, +1: three
 * consecutive keys), plus the next cell up the centre's own column (dz = +1).
 */
const HALF_SHELL_COLUMNS: readonly number[] = [0, 1, 1, -1, 1, 0, 1, 1]; // (dx, dy) pairs

/**
 * Visit each pair within `radius` once; returns the number of pairs visited. Cells are taken
 * in key order, so the first cell of each neighbour column only moves forward: one cursor per
 * column walks the sorted keys once (no search).
 */
export function forEachPairWithin(index: GridIndex, radius: number, visit: PairVisitor): number {
  if (!(radius >= 0) || radius > index.radius) {
    throw new RangeError(`forEachPairWithin: radius ${radius} outside [0, ${index.radius}] (the index's radius)`);
  }
  const { x, y, z, cellKeys, cellStarts, pointIds, nx, ny, nz } = index;
  const cells = cellKeys.length;
  const r2 = radius * radius;
  const cursor = new Int32Array(HALF_SHELL_COLUMNS.length / 2);
  let pairs = 0;
  for (let c = 0; c < cells; c++) {
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
    if (cz + 1 < nz && c + 1 < cells && cellKeys[c + 1] === key + 1) {
      pairs += crossPairs(index, s, e, cellStarts[c + 1], cellStarts[c + 2], r2, visit);
    }
    for (let m = 0; m < cursor.length; m++) {
      const ix = cx + HALF_SHELL_COLUMNS[2 * m], iy = cy + HALF_SHELL_COLUMNS[2 * m + 1];
      if (ix >= nx || iy < 0 || iy >= ny) continue;
      const base = (ix * ny + iy) * nz;
      const lo = base + (cz > 0 ? cz - 1 : 0), hi = base + (cz + 1 < nz ? cz + 1 : cz);
      let k = cursor[m];
      while (k < cells && cellKeys[k] < lo) k++;
      cursor[m] = k;
      for (; k < cells && cellKeys[k] <= hi; k++) {
        pairs += crossPairs(index, s, e, cellStarts[k], cellStarts[k + 1], r2, visit);
      }
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
