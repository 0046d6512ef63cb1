/**
 * A uniform grid over 3-D points for k-nearest-neighbour queries: points sorted by cell
 * (counting sort), so the points of cell c are sorted positions cellStart[c] … cellStart[c+1]
 * (half-open) and a row of cells along x is one contiguous run. Cell index
 * c = ix + nx·(iy + ny·iz); cell (ix, iy, iz) spans [origin + i·h, origin + (i+1)·h) per axis.
 */
import { boundsOf, gridDims } from './kNearestCellSize.js';

export interface KNearestGrid {
  readonly count: number; // points
  readonly cellSize: number; // h, in the points' units
  readonly origin: Float64Array; // lower corner of cell (0, 0, 0)
  readonly dims: Int32Array; // cells along x, y, z
  readonly cellStart: Uint32Array; // length cells + 1
  readonly order: Uint32Array; // input index of the point at each sorted position
  readonly sortedXyz: Float64Array; // interleaved coordinates in sorted order
}

/** Cell index along one axis of a coordinate, clamped into the grid. */
export function axisCell(v: number, origin: number, h: number, n: number): number {
  const i = Math.floor((v - origin) / h);
  return i < 0 ? 0 : i >= n ? n - 1 : i;
}

export function buildKNearestGrid(xyz: Float64Array, cellSizeH: number): KNearestGrid {
  const n = xyz.length / 3;
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`buildKNearestGrid: need whole 3-D points, got ${xyz.length} values`);
  if (!(cellSizeH > 0) || !Number.isFinite(cellSizeH)) throw new RangeError(`buildKNearestGrid: cell size ${cellSizeH}`);
  const b = boundsOf(xyz);
  if (!Number.isFinite(b[0] + b[1] + b[2] + b[3] + b[4] + b[5])) throw new RangeError('buildKNearestGrid: coordinates must be finite');
  const dims = gridDims(b, cellSizeH);
  const cells = dims[0] * dims[1] * dims[2];
  if (cells > 2 ** 31) throw new RangeError(`buildKNearestGrid: ${cells} cells; choose a larger cell size`);
  const cellOf = new Uint32Array(n);
  const cellStart = new Uint32Array(cells + 1);
  for (let j = 0; j < n; j++) {
    const ix = axisCell(xyz[3 * j], b[0], cellSizeH, dims[0]);
    const iy = axisCell(xyz[3 * j + 1], b[1], cellSizeH, dims[1]);
    const iz = axisCell(xyz[3 * j + 2], b[2], cellSizeH, dims[2]);
    const c = ix + dims[0] * (iy + dims[1] * iz);
    cellOf[j] = c;
    cellStart[c + 1]++;
  }
  for (let c = 0; c < cells; c++) cellStart[c + 1] += cellStart[c];
  const fill = cellStart.slice(0, cells);
  const order = new Uint32Array(n);
  const sortedXyz = new Float64Array(3 * n);
  for (let j = 0; j < n; j++) {
    const p = fill[cellOf[j]]++;
    order[p] = j;
    sortedXyz[3 * p] = xyz[3 * j];
    sortedXyz[3 * p + 1] = xyz[3 * j + 1];
    sortedXyz[3 * p + 2] = xyz[3 * j + 2];
  }
  return { count: n, cellSize: cellSizeH, origin: b.slice(0, 3), dims, cellStart, order, sortedXyz };
}
