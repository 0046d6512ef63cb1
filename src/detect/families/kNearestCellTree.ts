/**
 * The k nearest among the points of one crowded grid cell (kNearestGrid.ts), through a k-d tree
 * over them (Bentley 1975, CACM 18, 509; Friedman, Bentley & Finkel 1977, ACM TOMS 3, 209; as
 * kdTreeNearest.ts, with k held): a query in a cell of m points otherwise reads all m, so a
 * cell's queries cost m² (a family core in proper elements put 5 000 bodies in one cell of a
 * grid sized for four a cell). It holds exactly what reading the cell's points one by one holds
 * (kNearest.ts readRun): the k smallest (squared distance, input index) pairs, the distance summed
 * as dx² + dy² + dz² from the same differences, the query's own point left out. A node is
 * visited when its box's squared distance is ≤ the k-th held (not <), so a tie in it is seen;
 * the box distance is a lower bound in floating point too, as rounding is monotone (common practice).
 */
import { boxDistanceSquared, nodeBox, selectAlongAxis } from './kdTreeSplit.js';
import { placePair } from './kNearestHeld.js';

/** Points a leaf holds at most (our choice: a few, as a grid cell). */
const LEAF_POINTS = 8;

export class KNearestCellTree {
  private readonly xyz: Float64Array; // the cell's points, interleaved, in tree order
  private readonly ids: Int32Array; // their input indices, in tree order
  private readonly box: Float64Array; // [min xyz, max xyz] of each node, at 6·((lo + hi) >>> 1)
  // the query's state during a search (one query at a time)
  private qx = 0; private qy = 0; private qz = 0; private exclude = -1; private k = 0;
  private d2: Float64Array = new Float64Array(0); private idx: Int32Array = new Int32Array(0); private base = 0; private held = 0;

  /** The points at sorted positions first … end − 1 (half-open) of a grid's sortedXyz and order. */
  constructor(sortedXyz: Float64Array, order: Uint32Array, first: number, end: number) {
    const m = end - first;
    const pts = sortedXyz.slice(3 * first, 3 * end);
    const ids = Int32Array.from(order.subarray(first, end));
    const perm = new Int32Array(m);
    for (let t = 0; t < m; t++) perm[t] = t;
    this.box = new Float64Array(6 * m);
    if (m > 0) build(pts, perm, this.box, 0, m);
    this.xyz = new Float64Array(3 * m);
    this.ids = new Int32Array(m);
    for (let t = 0; t < m; t++) {
      const s = perm[t];
      this.xyz[3 * t] = pts[3 * s]; this.xyz[3 * t + 1] = pts[3 * s + 1]; this.xyz[3 * t + 2] = pts[3 * s + 2];
      this.ids[t] = ids[s];
    }
  }

  /**
   * Holds in d2[base … base + k), idx[…] the k smallest (squared distance, index) pairs of the
   * cell's points to (qx, qy, qz), `exclude` left out, nearest first; returns how many it holds
   * (fewer than k only when the cell has fewer other points).
   */
  fill(qx: number, qy: number, qz: number, exclude: number, k: number, d2: Float64Array, idx: Int32Array, base: number): number {
    this.qx = qx; this.qy = qy; this.qz = qz; this.exclude = exclude; this.k = k;
    this.d2 = d2; this.idx = idx; this.base = base; this.held = 0;
    if (this.ids.length > 0) this.search(0, this.ids.length);
    return this.held;
  }

  private consider(t: number): void {
    const j = this.ids[t];
    if (j === this.exclude) return;
    const xyz = this.xyz, d2 = this.d2, idx = this.idx, base = this.base, k = this.k;
    const dx = xyz[3 * t] - this.qx, dy = xyz[3 * t + 1] - this.qy, dz = xyz[3 * t + 2] - this.qz;
    const dd = dx * dx + dy * dy + dz * dz;
    let m = this.held;
    if (m === k) {
      const w = base + k - 1;
      if (dd > d2[w] || (dd === d2[w] && j > idx[w])) return;
      m = k - 1;
    } else this.held++;
    placePair(d2, idx, base, m, dd, j);
  }

  /** Squared distance from the query to the box of node lo … hi − 1 (0 inside it). */
  private boxDistance(lo: number, hi: number): number {
    return boxDistanceSquared(this.box, 6 * ((lo + hi) >>> 1), this.qx, this.qy, this.qz);
  }

  /** Whether a node at this squared distance may hold a pair to keep. */
  private open(dist2: number): boolean {
    return this.held < this.k || dist2 <= this.d2[this.base + this.k - 1];
  }

  private search(lo: number, hi: number): void {
    if (hi - lo <= LEAF_POINTS) {
      for (let t = lo; t < hi; t++) this.consider(t);
      return;
    }
    const mid = (lo + hi) >>> 1;
    this.consider(mid);
    const left = mid > lo ? this.boxDistance(lo, mid) : Infinity;
    const right = hi > mid + 1 ? this.boxDistance(mid + 1, hi) : Infinity;
    if (left <= right) {
      if (left !== Infinity && this.open(left)) this.search(lo, mid);
      if (right !== Infinity && this.open(right)) this.search(mid + 1, hi);
    } else {
      if (right !== Infinity && this.open(right)) this.search(mid + 1, hi);
      if (left !== Infinity && this.open(left)) this.search(lo, mid);
    }
  }
}

/** Splits perm[lo … hi) at the median of its widest axis, recursively, storing each node's box. */
function build(pts: Float64Array, perm: Int32Array, box: Float64Array, lo: number, hi: number): void {
  const widest = nodeBox(pts, perm, lo, hi, box, 6 * ((lo + hi) >>> 1));
  if (hi - lo <= LEAF_POINTS) return;
  const mid = (lo + hi) >>> 1;
  selectAlongAxis(pts, perm, lo, hi - 1, mid, widest);
  build(pts, perm, box, lo, mid);
  build(pts, perm, box, mid + 1, hi);
}
