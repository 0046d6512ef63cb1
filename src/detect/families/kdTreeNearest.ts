/**
 * The nearest of a fixed set of 3-D points to arbitrary query points, through a k-d tree
 * (Bentley 1975, CACM 18, 509; Friedman, Bentley & Finkel 1977, ACM TOMS 3, 209): each node
 * splits its points at the median of the axis along which they spread most and keeps the tight
 * bounding box of its points; a query visits the nearer child first and a child at all only if
 * its box is no farther than the best distance found. Unlike a uniform grid, its cost does not
 * grow with the empty space between a query and the points (clumped points, far queries); tight
 * boxes rather than the splitting planes' regions keep that space out of the bounds too.
 *
 * Exact, with the grid search's tie rule (kNearest.ts): the point with the smallest squared
 * distance (dx² + dy² + dz², summed in that order), and among equal ones the lowest index. A
 * box is visited when its squared distance is ≤ the best (not <), so a tie in it is seen. The
 * box distance (per-axis gaps, squared and summed in the same order) is a lower bound of every
 * point's squared distance in floating point too, as rounding is monotone (common practice).
 */
import { boxDistanceSquared, nodeBox, selectAlongAxis } from './kdTreeSplit.js';

/** Points a leaf holds at most (our choice: a few, as a grid cell). */
const LEAF_POINTS = 8;

export class KdTreeNearest {
  private readonly xyz: Float64Array;
  private readonly perm: Int32Array; // point indices in tree order
  private readonly axis: Uint8Array; // splitting axis of the internal node whose median sits at this position
  private readonly box: Float64Array; // [minX, minY, minZ, maxX, maxY, maxZ] of each node, at 6·((lo + hi) >>> 1)
  // the query's state during a search (one query at a time)
  private qx = 0; private qy = 0; private qz = 0;
  private best = Infinity; private bestIndex = -1;

  /** `xyz`: interleaved coordinates of the points (not copied; must not change). */
  constructor(xyz: Float64Array) {
    if (xyz.length % 3 !== 0) throw new RangeError(`KdTreeNearest: ${xyz.length} coordinates are not whole 3-D points`);
    const n = xyz.length / 3;
    this.xyz = xyz;
    this.perm = new Int32Array(n);
    for (let j = 0; j < n; j++) this.perm[j] = j;
    this.axis = new Uint8Array(n);
    this.box = new Float64Array(6 * n);
    if (n > 0) this.build(0, n);
  }

  get size(): number {
    return this.perm.length;
  }

  /** Index and squared distance of the point nearest to (x, y, z); −1 and NaN when there is none. */
  nearest(x: number, y: number, z: number): { index: number; distanceSquared: number } {
    if (this.perm.length === 0) return { index: -1, distanceSquared: NaN };
    this.qx = x; this.qy = y; this.qz = z;
    this.best = Infinity; this.bestIndex = -1;
    this.search(0, this.perm.length);
    return { index: this.bestIndex, distanceSquared: this.best };
  }

  private build(lo: number, hi: number): void {
    const ax = this.fillBox(lo, hi);
    if (hi - lo <= LEAF_POINTS) return;
    const mid = (lo + hi) >>> 1;
    selectAlongAxis(this.xyz, this.perm, lo, hi - 1, mid, ax);
    this.axis[mid] = ax;
    this.build(lo, mid);
    this.build(mid + 1, hi);
  }

  /** Stores the node's bounding box; returns the axis along which its points spread most. */
  private fillBox(lo: number, hi: number): number {
    return nodeBox(this.xyz, this.perm, lo, hi, this.box, 6 * ((lo + hi) >>> 1));
  }

  private consider(j: number): void {
    const xyz = this.xyz;
    const dx = xyz[3 * j] - this.qx, dy = xyz[3 * j + 1] - this.qy, dz = xyz[3 * j + 2] - this.qz;
    const dd = dx * dx + dy * dy + dz * dz;
    if (dd < this.best || (dd === this.best && j < this.bestIndex)) { this.best = dd; this.bestIndex = j; }
  }

  /** Squared distance from the query to the box of node perm[lo … hi) (0 inside it). */
  private boxDistance(lo: number, hi: number): number {
    return boxDistanceSquared(this.box, 6 * ((lo + hi) >>> 1), this.qx, this.qy, this.qz);
  }

  private search(lo: number, hi: number): void {
    if (hi - lo <= LEAF_POINTS) {
      for (let t = lo; t < hi; t++) this.consider(this.perm[t]);
      return;
    }
    const mid = (lo + hi) >>> 1;
    this.consider(this.perm[mid]);
    const left = mid > lo ? this.boxDistance(lo, mid) : Infinity;
    const right = hi > mid + 1 ? this.boxDistance(mid + 1, hi) : Infinity;
    if (left <= right) {
      if (left <= this.best) this.search(lo, mid);
      if (right <= this.best) this.search(mid + 1, hi);
    } else {
      if (right <= this.best) this.search(mid + 1, hi);
      if (left <= this.best) this.search(lo, mid);
    }
  }
}
