/**
 * A uniform grid hash over 3-D points: cubic cells of one size, each point filed under the
 * cell that holds it, points sorted by cell. Only occupied cells are stored (sorted keys and
 * their starts), so the memory is O(points) however sparse the space. Built for neighbour
 * searches within a radius no larger than the cell size: such neighbours lie in the 27 cells
 * around a point's own (gridQuery.ts, gridPairs.ts). Points with a non-finite coordinate are
 * left out and counted.
 *
 * Cell of a point: c = floor((x − min) / cellSize) per axis; key = (cx·ny + cy)·nz + cz, so
 * the cells of one (cx, cy) column are consecutive keys. The cell edge is the requested size
 * times (1 + 1e-9): a margin far above double rounding, so two points within the requested
 * radius never fall two cells apart through rounding of the subtraction and division (our
 * choice). That holds while every coordinate lies within 1e6 radii of zero (rounding ≤ 1e-16 of
 * the coordinate, well under 1e-9 of the radius); the build refuses coordinates beyond.
 */

/** The index; arrays are owned by it and never change after building. */
export interface GridIndex {
  readonly x: Float64Array;          // the caller's coordinates (not copied)
  readonly y: Float64Array;
  readonly z: Float64Array;
  readonly radius: number;           // the largest query radius the index answers
  readonly cellEdge: number;         // radius · (1 + 1e-9)
  readonly minX: number; readonly minY: number; readonly minZ: number;
  readonly nx: number; readonly ny: number; readonly nz: number; // cells along each axis
  readonly cellKeys: Float64Array;   // occupied cells, ascending keys
  readonly cellStarts: Int32Array;   // cellKeys.length + 1 entries; cell c holds pointIds[cellStarts[c] .. cellStarts[c+1])
  readonly pointIds: Int32Array;     // indexed points by cell key, then by id
  readonly leftOut: number;          // points with a non-finite coordinate, not indexed
}

const EDGE_MARGIN = 1 + 1e-9;
const MAX_REACH_IN_RADII = 1e6;

/** Build the grid over (x, y, z) for radius queries up to `radius` (same unit as x, y, z). */
export function buildGridIndex(x: Float64Array, y: Float64Array, z: Float64Array, radius: number): GridIndex {
  const n = x.length;
  if (y.length !== n || z.length !== n) throw new RangeError(`buildGridIndex: coordinate arrays differ in length (${n}, ${y.length}, ${z.length})`);
  if (!(radius > 0) || !Number.isFinite(radius)) throw new RangeError(`buildGridIndex: radius must be a positive finite number, got ${radius}`);
  const cellEdge = radius * EDGE_MARGIN;
  let minX = Infinity, minY = Infinity, minZ = Infinity, maxX = -Infinity, maxY = -Infinity, maxZ = -Infinity;
  let finite = 0;
  for (let k = 0; k < n; k++) {
    const a = x[k], b = y[k], c = z[k];
    if (!(Number.isFinite(a) && Number.isFinite(b) && Number.isFinite(c))) continue;
    finite++;
    if (a < minX) minX = a; if (a > maxX) maxX = a;
    if (b < minY) minY = b; if (b > maxY) maxY = b;
    if (c < minZ) minZ = c; if (c > maxZ) maxZ = c;
  }
  if (finite === 0) minX = minY = minZ = maxX = maxY = maxZ = 0;
  const reach = Math.max(-minX, maxX, -minY, maxY, -minZ, maxZ);
  if (reach > MAX_REACH_IN_RADII * radius) {
    throw new RangeError(`buildGridIndex: coordinates reach ${reach}, beyond ${MAX_REACH_IN_RADII} radii of ${radius} (cell rounding margin)`);
  }
  const nx = Math.floor((maxX - minX) / cellEdge) + 1;
  const ny = Math.floor((maxY - minY) / cellEdge) + 1;
  const nz = Math.floor((maxZ - minZ) / cellEdge) + 1;
  if (nx * ny * nz > Number.MAX_SAFE_INTEGER) {
    throw new RangeError(`buildGridIndex: ${nx}×${ny}×${nz} cells of ${radius} overflow the cell key; use a larger radius`);
  }
  const key = new Float64Array(n).fill(NaN);
  for (let k = 0; k < n; k++) {
    const a = x[k], b = y[k], c = z[k];
    if (!(Number.isFinite(a) && Number.isFinite(b) && Number.isFinite(c))) continue;
    const cx = Math.floor((a - minX) / cellEdge), cy = Math.floor((b - minY) / cellEdge), cz = Math.floor((c - minZ) / cellEdge);
    key[k] = (cx * ny + cy) * nz + cz;
  }
  const pointIds = sortIdsByKey(key, finite);
  const { cellKeys, cellStarts } = cellRuns(key, pointIds);
  return { x, y, z, radius, cellEdge, minX, minY, minZ, nx, ny, nz, cellKeys, cellStarts, pointIds, leftOut: n - finite };
}

/** Radix digits of a key sort: at most this many bits (our choice: 4 096 counters stay in the cache). */
const KEY_DIGIT_BITS_MAX = 12;

/** Ids of the points with a finite key, ordered by key then id. */
function sortIdsByKey(key: Float64Array, finite: number): Int32Array {
  const n = key.length;
  const ids = new Int32Array(finite);
  let m = 0;
  for (let k = 0; k < n; k++) if (key[k] === key[k]) ids[m++] = k;
  const idBits = Math.max(1, Math.ceil(Math.log2(n + 1)));
  let maxKey = 0;
  for (let k = 0; k < m; k++) if (key[ids[k]] > maxKey) maxKey = key[ids[k]];
  if (maxKey < 2 ** 32) return radixByKey(key, ids, maxKey);
  if ((maxKey + 1) * 2 ** idBits <= Number.MAX_SAFE_INTEGER) {
    // Fast path: key and id packed into one exact double, sorted by the typed-array sort.
    const packed = new Float64Array(m);
    const scale = 2 ** idBits;
    for (let k = 0; k < m; k++) packed[k] = key[ids[k]] * scale + ids[k];
    packed.sort();
    for (let k = 0; k < m; k++) ids[k] = packed[k] % scale;
    return ids;
  }
  return ids.sort((p, q) => key[p] - key[q] || p - q);
}

/**
 * Ids (ascending) ordered by their keys (whole numbers below 2³²), ties in id order: a
 * least-significant-digit radix sort (common practice), stable, so ids of one key stay ascending.
 * The packed-double sort above it took about 40 ms for the 400 000 bodies of a belt region,
 * about half the grid's build (CPU profile of the clustering); a few counting passes take a
 * fraction of that.
 */
function radixByKey(key: Float64Array, ids: Int32Array, maxKey: number): Int32Array {
  const m = ids.length;
  const bits = Math.max(1, Math.ceil(Math.log2(maxKey + 1)));
  const passes = Math.ceil(bits / KEY_DIGIT_BITS_MAX);
  const digitBits = Math.ceil(bits / passes);
  const mask = (1 << digitBits) - 1;
  let keys = new Uint32Array(m), order: Int32Array = ids;
  for (let t = 0; t < m; t++) keys[t] = key[ids[t]];
  let keys2 = new Uint32Array(m), order2: Int32Array = new Int32Array(m);
  const count = new Uint32Array(mask + 2);
  for (let pass = 0, shift = 0; pass < passes; pass++, shift += digitBits) {
    count.fill(0);
    for (let t = 0; t < m; t++) count[((keys[t] >>> shift) & mask) + 1]++;
    for (let d = 0; d <= mask; d++) count[d + 1] += count[d];
    for (let t = 0; t < m; t++) {
      const w = count[(keys[t] >>> shift) & mask]++;
      keys2[w] = keys[t];
      order2[w] = order[t];
    }
    [keys, keys2] = [keys2, keys];
    [order, order2] = [order2, order];
  }
  return order;
}

/** Distinct keys along the sorted ids and where each run starts. */
function cellRuns(key: Float64Array, ids: Int32Array): { cellKeys: Float64Array; cellStarts: Int32Array } {
  const m = ids.length;
  let cells = 0;
  for (let k = 0; k < m; k++) if (k === 0 || key[ids[k]] !== key[ids[k - 1]]) cells++;
  const cellKeys = new Float64Array(cells);
  const cellStarts = new Int32Array(cells + 1);
  let c = 0;
  for (let k = 0; k < m; k++) {
    if (k === 0 || key[ids[k]] !== key[ids[k - 1]]) {
      cellKeys[c] = key[ids[k]];
      cellStarts[c++] = k;
    }
  }
  cellStarts[cells] = m;
  return { cellKeys, cellStarts };
}

/** Position of `key` in `cellKeys[from..]` (binary search), or −1 when that cell is empty. */
export function findCell(cellKeys: Float64Array, key: number, from = 0): number {
  let lo = from, hi = cellKeys.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >>> 1;
    const v = cellKeys[mid];
    if (v < key) lo = mid + 1;
    else if (v > key) hi = mid - 1;
    else return mid;
  }
  return -1;
}
