/**
 * The steps of a k-d tree over interleaved 3-D points that the trees of this folder share
 * (kdTreeNearest.ts, kNearestCellTree.ts; Bentley 1975, CACM 18, 509; Friedman, Bentley &
 * Finkel 1977, ACM TOMS 3, 209): a node's tight bounding box and the axis its points spread
 * most along, the median along that axis by Hoare's selection, and a query's squared distance
 * to a box. `perm` holds point indices into `xyz` in tree order; a node is the run perm[lo … hi).
 */

/** Stores the box of the points perm[lo … hi) at box[b … b + 6) (min x, y, z, max x, y, z); returns the axis along which they spread most. */
export function nodeBox(xyz: Float64Array, perm: Int32Array, lo: number, hi: number, box: Float64Array, b: number): number {
  let widest = 0, spread = -1;
  for (let c = 0; c < 3; c++) {
    let min = Infinity, max = -Infinity;
    for (let t = lo; t < hi; t++) {
      const v = xyz[3 * perm[t] + c];
      if (v < min) min = v;
      if (v > max) max = v;
    }
    box[b + c] = min;
    box[b + 3 + c] = max;
    if (max - min > spread) { spread = max - min; widest = c; }
  }
  return widest;
}

/** Reorders perm[left … right] so that perm[k] holds the k-th smallest along `ax`, smaller or equal before it, larger or equal after (Hoare's selection). */
export function selectAlongAxis(xyz: Float64Array, perm: Int32Array, left: number, right: number, k: number, ax: number): void {
  while (right > left) {
    const pivot = xyz[3 * perm[(left + right) >>> 1] + ax];
    let i = left, j = right;
    while (i <= j) {
      while (xyz[3 * perm[i] + ax] < pivot) i++;
      while (xyz[3 * perm[j] + ax] > pivot) j--;
      if (i <= j) {
        const t = perm[i]; perm[i] = perm[j]; perm[j] = t;
        i++; j--;
      }
    }
    if (k <= j) right = j;
    else if (k >= i) left = i;
    else return;
  }
}

/**
 * Squared distance from (x, y, z) to the box at box[b … b + 6) (0 inside it): per-axis gaps,
 * squared and summed in that order, a lower bound of the squared distance of every point in it
 * in floating point too, as rounding is monotone (common practice).
 */
export function boxDistanceSquared(box: Float64Array, b: number, x: number, y: number, z: number): number {
  const gx = x < box[b] ? box[b] - x : x > box[b + 3] ? x - box[b + 3] : 0;
  const gy = y < box[b + 1] ? box[b + 1] - y : y > box[b + 4] ? y - box[b + 4] : 0;
  const gz = z < box[b + 2] ? box[b + 2] - z : z > box[b + 5] ? z - box[b + 5] : 0;
  return gx * gx + gy * gy + gz * gz;
}
