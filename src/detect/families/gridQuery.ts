/**
 * Radius query on a grid index (gridIndex.ts): every indexed point within `radius` (≤ the
 * index's radius, distance ≤ radius counts) of a query point, searched in the 27 cells around
 * the query's cell in key order, written to a caller-owned buffer.
 */
import { findCell, type GridIndex } from './gridIndex.js';

/**
 * Write the ids of the points within `radius` of (qx, qy, qz) to `out` (cell order, ids
 * ascending within a cell) and return how many. `out` must have room for every indexed point
 * that can answer (its length is checked only as it fills).
 */
export function queryRadius(index: GridIndex, qx: number, qy: number, qz: number, radius: number, out: Int32Array): number {
  if (!(radius >= 0) || radius > index.radius) {
    throw new RangeError(`queryRadius: radius ${radius} outside [0, ${index.radius}] (the index's radius)`);
  }
  if (!(Number.isFinite(qx) && Number.isFinite(qy) && Number.isFinite(qz))) return 0;
  const { x, y, z, cellKeys, cellStarts, pointIds, nx, ny, nz, cellEdge } = index;
  const cx = Math.floor((qx - index.minX) / cellEdge);
  const cy = Math.floor((qy - index.minY) / cellEdge);
  const cz = Math.floor((qz - index.minZ) / cellEdge);
  const r2 = radius * radius;
  let count = 0;
  for (let ix = cx - 1; ix <= cx + 1; ix++) {
    if (ix < 0 || ix >= nx) continue;
    for (let iy = cy - 1; iy <= cy + 1; iy++) {
      if (iy < 0 || iy >= ny) continue;
      for (let iz = cz - 1; iz <= cz + 1; iz++) {
        if (iz < 0 || iz >= nz) continue;
        const c = findCell(cellKeys, (ix * ny + iy) * nz + iz);
        if (c < 0) continue;
        for (let k = cellStarts[c]; k < cellStarts[c + 1]; k++) {
          const p = pointIds[k];
          const dx = x[p] - qx, dy = y[p] - qy, dz = z[p] - qz;
          if (dx * dx + dy * dy + dz * dz <= r2) {
            if (count >= out.length) throw new RangeError(`queryRadius: output buffer of ${out.length} ids is full`);
            out[count++] = p;
          }
        }
      }
    }
  }
  return count;
}
