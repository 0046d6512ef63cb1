/**
 * Cell size of a uniform grid over 3-D points, chosen from the points' own density: the mean
 * number of points per occupied cell should come near `perCell`. A first guess from the
 * bounding box, h = ∛(V·perCell/N), is corrected three times by the occupancy it gives (a
 * clumped set fills only part of its box), h ← h·∛(perCell / mean occupancy). The grid never
 * has more than `maxCells` cells (h grows until it fits). Common practice for grid indices:
 * a few points a cell, so that a query reads few empty cells and few points.
 */

/** Axis-aligned bounds of interleaved 3-D points: [minX, minY, minZ, maxX, maxY, maxZ]. */
export function boundsOf(xyz: Float64Array): Float64Array {
  const b = Float64Array.of(Infinity, Infinity, Infinity, -Infinity, -Infinity, -Infinity);
  for (let p = 0; p < xyz.length; p += 3) {
    for (let c = 0; c < 3; c++) {
      const v = xyz[p + c];
      if (v < b[c]) b[c] = v;
      if (v > b[3 + c]) b[3 + c] = v;
    }
  }
  return b;
}

/** Cells along each axis for cell size h over bounds b (at least one). */
export function gridDims(b: Float64Array, h: number): Int32Array {
  const d = new Int32Array(3);
  for (let c = 0; c < 3; c++) d[c] = Math.max(1, Math.floor((b[3 + c] - b[c]) / h) + 1);
  return d;
}

export function cellSizeForOccupancy(xyz: Float64Array, perCell: number, maxCells: number): number {
  const n = xyz.length / 3;
  if (!(n >= 1) || !Number.isInteger(n)) throw new RangeError(`cellSizeForOccupancy: need whole 3-D points, got ${xyz.length} values`);
  if (!(perCell > 0) || !(maxCells >= 1)) throw new RangeError(`cellSizeForOccupancy: perCell ${perCell}, maxCells ${maxCells}`);
  const b = boundsOf(xyz);
  const ext = [b[3] - b[0], b[4] - b[1], b[5] - b[2]];
  const largest = Math.max(ext[0], ext[1], ext[2]);
  if (!(largest > 0)) return 1; // all points coincide: any cell holds them all
  // Flat extents count as a tenth of the largest so the volume is not zero.
  const volume = ext.reduce((v, x) => v * Math.max(x, largest / 10), 1);
  const hMin = smallestCellSize(b, Math.cbrt(volume / maxCells), maxCells);
  let h = Math.max(hMin, Math.cbrt((volume * perCell) / n));
  for (let pass = 0; pass < 3; pass++) {
    h = Math.max(hMin, h * Math.cbrt(perCell / (n / occupiedCells(xyz, b, h))));
  }
  return h;
}

/** From a guess, the cell size grown by 5% steps until the grid has at most maxCells cells. */
function smallestCellSize(b: Float64Array, guess: number, maxCells: number): number {
  let h = guess;
  while (cellCount(b, h) > maxCells) h *= 1.05;
  return h;
}

function cellCount(b: Float64Array, h: number): number {
  const d = gridDims(b, h);
  return d[0] * d[1] * d[2];
}

/** Number of distinct cells the points fall in (a mark per cell; the grid has at most maxCells). */
function occupiedCells(xyz: Float64Array, b: Float64Array, h: number): number {
  const d = gridDims(b, h);
  const marks = new Uint8Array(d[0] * d[1] * d[2]);
  let occupied = 0;
  for (let p = 0; p < xyz.length; p += 3) {
    const ix = Math.min(d[0] - 1, Math.floor((xyz[p] - b[0]) / h));
    const iy = Math.min(d[1] - 1, Math.floor((xyz[p + 1] - b[1]) / h));
    const iz = Math.min(d[2] - 1, Math.floor((xyz[p + 2] - b[2]) / h));
    const c = ix + d[0] * (iy + d[1] * iz);
    if (marks[c] === 0) {
      marks[c] = 1;
      occupied++;
    }
  }
  return occupied;
}
