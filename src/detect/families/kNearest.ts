/**
 * k nearest neighbours through a grid (kNearestGrid.ts), never all pairs. The cells around a
 * query are read in expanding cubic shells (Chebyshev rings of cells); after each shell, a
 * point not yet read lies outside the cube of cells read, so at least as far from the query as
 * the nearest face of that cube that has cells beyond it. The search stops once the k-th
 * distance found is below that bound (or the cube covers the grid): the k found are then
 * certain. Ties are broken by the lower input index, so the result is one defined set:
 * the k smallest (distance, index) pairs. Common practice for grid indices.
 *
 * A crowded cell (more than CROWDED_CELL_POINTS points: a family core) is not read point by
 * point for each of its own queries: a k-d tree over its points (kNearestCellTree.ts), built once
 * for the run of its queries, gives what reading it would hold, and the shells go on from there.
 * On a 1.5 M-row main-belt dump, 7% of the bodies sat in cells of more than 256 (up to 5 287).
 */
import { KNearestCellTree } from './kNearestCellTree.js';
import { placePair } from './kNearestHeld.js';
import { axisCell, type KNearestGrid } from './kNearestGrid.js';

/** Distances (ascending) and input indices of each query's k nearest, row-major (query·k + m). */
export interface KNearestResult {
  readonly k: number;
  readonly distance: Float64Array; // Euclidean, in the points' units
  readonly index: Int32Array; // input index of the neighbour
}

/** The bound is shrunk by this relative amount against rounding in cell edges (common practice). */
const BOUND_SHRINK = 1 - 1e-12;

/** A cell with more points than this is searched through a k-d tree of them for its own queries (our choice, measured: see kNearestSortedRange). */
export const CROWDED_CELL_POINTS = 64;

/** Each grid point's k nearest other points. Needs k < number of points. */
export function kNearestAll(grid: KNearestGrid, k: number): KNearestResult {
  checkK(k, grid.count - 1);
  const distance = new Float64Array(grid.count * k);
  const index = new Int32Array(grid.count * k);
  kNearestSortedRange(grid, k, grid.count, 0, grid.count, distance, index);
  return finishKNearest(k, distance, index);
}

/**
 * The k nearest other points of the first m points of the grid's input (interleaved xyz, the
 * array the grid was built from): the same rows kNearestAll gives those points, bit for bit,
 * at the cost of m searches instead of all.
 */
export function kNearestOfFirst(grid: KNearestGrid, inputXyz: Float64Array, m: number, k: number): KNearestResult {
  checkK(k, grid.count - 1);
  checkOfFirst(grid, inputXyz, m);
  const distance = new Float64Array(m * k);
  const index = new Int32Array(m * k);
  kNearestSortedRange(grid, k, m, 0, grid.count, distance, index);
  return finishKNearest(k, distance, index);
}

/**
 * The rows of the grid points at sorted positions pFirst … pEnd − 1 (half-open) whose input
 * index is below m, as kNearestAll gives them but with squared distances (finishKNearest takes
 * the roots): row j at d2[j·k …], idx[j·k …]. Queries go in grid order, so neighbouring queries
 * read the same cells (a catalogue's input order is random in space). Each row depends on the
 * grid and its point alone, so any split of the positions gives the same rows: worker threads
 * share the positions this way (familiesThreads.ts).
 */
export function kNearestSortedRange(
  grid: KNearestGrid, k: number, m: number, pFirst: number, pEnd: number, d2: Float64Array, idx: Int32Array,
): void {
  const xyz = grid.sortedXyz;
  const order = grid.order;
  const [nx, ny, nz] = grid.dims;
  let treeCell = -1, tree: KNearestCellTree | null = null;
  for (let p = pFirst; p < pEnd; p++) {
    const j = order[p];
    if (j >= m) continue;
    const qx = xyz[3 * p], qy = xyz[3 * p + 1], qz = xyz[3 * p + 2];
    const h = grid.cellSize;
    const c = axisCell(qx, grid.origin[0], h, nx) + nx * (axisCell(qy, grid.origin[1], h, ny) + ny * axisCell(qz, grid.origin[2], h, nz));
    const inCell = grid.cellStart[c + 1] - grid.cellStart[c];
    if (inCell <= CROWDED_CELL_POINTS || inCell <= k) {
      searchOne(grid, qx, qy, qz, p, k, d2, idx, j * k, 0);
      continue;
    }
    if (c !== treeCell) { tree = new KNearestCellTree(xyz, order, grid.cellStart[c], grid.cellStart[c + 1]); treeCell = c; }
    tree!.fill(qx, qy, qz, j, k, d2, idx, j * k); // the own cell, as shell 0 would read it: k held
    searchOne(grid, qx, qy, qz, p, k, d2, idx, j * k, k);
  }
}

/** The k nearest grid points of arbitrary query points (interleaved xyz). Needs k ≤ grid points. */
export function kNearestOf(grid: KNearestGrid, queryXyz: Float64Array, k: number): KNearestResult {
  checkK(k, grid.count);
  const m = Math.floor(queryXyz.length / 3);
  const distance = new Float64Array(m * k);
  const index = new Int32Array(m * k);
  for (let q = 0; q < m; q++) searchOne(grid, queryXyz[3 * q], queryXyz[3 * q + 1], queryXyz[3 * q + 2], -1, k, distance, index, q * k, 0);
  return finishKNearest(k, distance, index);
}

/** RangeError unless m is a whole number of the grid's points and inputXyz the grid's input. */
export function checkOfFirst(grid: KNearestGrid, inputXyz: Float64Array, m: number): void {
  if (!Number.isInteger(m) || m < 0 || m > grid.count || inputXyz.length !== 3 * grid.count) {
    throw new RangeError(`kNearestOfFirst: m must be a whole number up to ${grid.count} with the grid's ${grid.count} input points, got m = ${m} and ${inputXyz.length / 3} points`);
  }
}

export function checkK(k: number, available: number): void {
  if (!Number.isInteger(k) || k < 1 || k > available) {
    throw new RangeError(`k nearest: k must be an integer from 1 to ${available}, got ${k}`);
  }
}

/** Squared distances were kept during the search; return distances (in place). */
export function finishKNearest(k: number, d2: Float64Array, index: Int32Array): KNearestResult {
  for (let t = 0; t < d2.length; t++) d2[t] = Math.sqrt(d2[t]);
  return { k, distance: d2, index };
}

/**
 * Fills d2[base … base+k) and idx[…] with one query's k nearest (squared distances), the point at
 * sorted position `excludeAt` left out (−1: none). `held`: 0,
 * or k when the query's own cell has been read already (those k held there): the shells then
 * start at 1, after the bound of shell 0 is checked.
 */
function searchOne(
  g: KNearestGrid, qx: number, qy: number, qz: number, excludeAt: number, k: number,
  d2: Float64Array, idx: Int32Array, base: number, held: number,
): void {
  const h = g.cellSize;
  const nx = g.dims[0], ny = g.dims[1], nz = g.dims[2];
  const ox = g.origin[0], oy = g.origin[1], oz = g.origin[2];
  const cx = axisCell(qx, ox, h, nx), cy = axisCell(qy, oy, h, ny), cz = axisCell(qz, oz, h, nz);
  // Once k are held, a row of cells (or a cell) whose box lies farther than the k-th distance
  // is skipped: its points cannot enter. Box edges are moved out by `slack` against rounding
  // in the cell of a point (common practice; skipping fewer cells only costs time).
  const slack = 1e-9 * (Math.abs(ox) + Math.abs(oy) + Math.abs(oz) + (nx + ny + nz) * h);
  let found = held;
  for (let r = held === 0 ? 0 : 1; ; r++) {
    const x0 = cx - r, x1 = cx + r, y0 = cy - r, y1 = cy + r, z0 = cz - r, z1 = cz + r;
    if (r === 1 && held > 0 && shellDone(g, qx, qy, qz, cx, cx, cy, cy, cz, cz, d2[base + k - 1])) return;
    for (let z = Math.max(0, z0); z <= Math.min(nz - 1, z1); z++) {
      const gz = gapTo(qz, oz + z * h, oz + (z + 1) * h, slack);
      for (let y = Math.max(0, y0); y <= Math.min(ny - 1, y1); y++) {
        const row = nx * (y + ny * z);
        let xa = Math.max(0, x0), xb = Math.min(nx - 1, x1);
        if (found === k) {
          const gy = gapTo(qy, oy + y * h, oy + (y + 1) * h, slack);
          const left = d2[base + k - 1] - gy * gy - gz * gz; // k-th squared distance less the row's gap in y and z
          if (left < 0) continue;
          const w = Math.sqrt(left) + slack;
          xa = Math.max(xa, Math.floor((qx - w - ox) / h));
          xb = Math.min(xb, Math.floor((qx + w - ox) / h));
          if (xa > xb) continue;
        }
        if (z === z0 || z === z1 || y === y0 || y === y1) {
          found = readRun(g, row + xa, row + xb, qx, qy, qz, excludeAt, k, d2, idx, base, found);
        } else {
          if (x0 >= 0 && x0 >= xa && x0 <= xb) found = readRun(g, row + x0, row + x0, qx, qy, qz, excludeAt, k, d2, idx, base, found);
          if (x1 < nx && x1 >= xa && x1 <= xb) found = readRun(g, row + x1, row + x1, qx, qy, qz, excludeAt, k, d2, idx, base, found);
        }
      }
    }
    if (found === k ? shellDone(g, qx, qy, qz, x0, x1, y0, y1, z0, z1, d2[base + k - 1]) : cubeBound(g, qx, qy, qz, x0, x1, y0, y1, z0, z1) === Infinity) return;
  }
}

/**
 * Distance from the query to the nearest face of the cube of cells x0 … x1, y0 … y1, z0 … z1
 * that has cells beyond it: every point not read lies at least that far. Infinity when the cube
 * covers the grid.
 */
function cubeBound(g: KNearestGrid, qx: number, qy: number, qz: number, x0: number, x1: number, y0: number, y1: number, z0: number, z1: number): number {
  const h = g.cellSize;
  const [ox, oy, oz] = g.origin;
  const [nx, ny, nz] = g.dims;
  let bound = Infinity;
  if (x0 > 0) bound = Math.min(bound, qx - (ox + x0 * h));
  if (x1 < nx - 1) bound = Math.min(bound, ox + (x1 + 1) * h - qx);
  if (y0 > 0) bound = Math.min(bound, qy - (oy + y0 * h));
  if (y1 < ny - 1) bound = Math.min(bound, oy + (y1 + 1) * h - qy);
  if (z0 > 0) bound = Math.min(bound, qz - (oz + z0 * h));
  if (z1 < nz - 1) bound = Math.min(bound, oz + (z1 + 1) * h - qz);
  return bound;
}

/** With k held, the k-th at squared distance kth2: whether no point beyond the cube can enter. */
function shellDone(g: KNearestGrid, qx: number, qy: number, qz: number, x0: number, x1: number, y0: number, y1: number, z0: number, z1: number, kth2: number): boolean {
  const bound = cubeBound(g, qx, qy, qz, x0, x1, y0, y1, z0, z1);
  return bound === Infinity || (bound > 0 && kth2 < bound * bound * BOUND_SHRINK);
}

/** Distance from v to the interval [lo, hi] less slack, 0 inside or within slack of it. */
function gapTo(v: number, lo: number, hi: number, slack: number): number {
  const gap = v < lo ? lo - v : v > hi ? v - hi : 0;
  return gap > slack ? gap - slack : 0;
}

/** Reads the points of cells cFirst … cLast (inclusive, contiguous in sorted order); returns how many are held. */
function readRun(
  g: KNearestGrid, cFirst: number, cLast: number, qx: number, qy: number, qz: number, excludeAt: number,
  k: number, d2: Float64Array, idx: Int32Array, base: number, held: number,
): number {
  const xyz = g.sortedXyz;
  const end = g.cellStart[cLast + 1];
  const order = g.order;
  for (let p = g.cellStart[cFirst]; p < end; p++) {
    if (p === excludeAt) continue;
    const dx = xyz[3 * p] - qx, dy = xyz[3 * p + 1] - qy, dz = xyz[3 * p + 2] - qz;
    const dd = dx * dx + dy * dy + dz * dz;
    let m = held;
    if (m === k) {
      const w = base + k - 1;
      if (dd > d2[w] || (dd === d2[w] && order[p] > idx[w])) continue; // the index is read only for a point that may enter
      m = k - 1;
    } else held++;
    placePair(d2, idx, base, m, dd, order[p]);
  }
  return held;
}
