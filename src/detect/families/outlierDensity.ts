/**
 * Background density at a coarse scale: (weighted) counts of bodies in the cells of a coarse
 * grid, smoothed by the separable kernel [1, 2, 1]/4 along each axis (cells beyond the grid
 * count zero), divided by the cell volume: bodies per unit scaled volume. Read at a point by
 * trilinear interpolation between cell centres (clamped at the outer centres). The smoothing
 * kernel is common practice (binomial smoothing of histograms); it reaches one cell each way.
 */
import { boundsOf, gridDims } from './kNearestCellSize.js';
import { axisCell } from './kNearestGrid.js';

export interface CoarseDensity {
  readonly cellSize: number; // h, scaled units
  readonly origin: Float64Array; // lower corner of cell (0, 0, 0)
  readonly dims: Int32Array; // cells along each axis
  readonly count: Float64Array; // weighted bodies in each cell, not smoothed
  readonly density: Float64Array; // smoothed, bodies per unit scaled volume, per cell
}

/** Coarse density of points (interleaved xyz), each with weight 1 or weights[j]. */
export function coarseDensity(xyz: Float64Array, cellSizeH: number, weights?: Float64Array): CoarseDensity {
  const n = xyz.length / 3;
  if (weights !== undefined && weights.length !== n) throw new RangeError(`coarseDensity: ${weights.length} weights for ${n} points`);
  const b = boundsOf(xyz);
  const dims = gridDims(b, cellSizeH);
  const count = new Float64Array(dims[0] * dims[1] * dims[2]);
  for (let j = 0; j < n; j++) {
    const c = axisCell(xyz[3 * j], b[0], cellSizeH, dims[0]) +
      dims[0] * (axisCell(xyz[3 * j + 1], b[1], cellSizeH, dims[1]) + dims[1] * axisCell(xyz[3 * j + 2], b[2], cellSizeH, dims[2]));
    count[c] += weights === undefined ? 1 : weights[j];
  }
  let s: Float64Array = count.slice();
  for (let axis = 0; axis < 3; axis++) s = smoothAxis(s, dims, axis);
  const volume = cellSizeH ** 3;
  for (let c = 0; c < s.length; c++) s[c] /= volume;
  return { cellSize: cellSizeH, origin: b.slice(0, 3), dims, count, density: s };
}

/** [1, 2, 1]/4 along one axis, zero beyond the grid. */
function smoothAxis(v: Float64Array, dims: Int32Array, axis: number): Float64Array {
  const out = new Float64Array(v.length);
  const stride = axis === 0 ? 1 : axis === 1 ? dims[0] : dims[0] * dims[1];
  const n = dims[axis];
  for (let c = 0; c < v.length; c++) {
    const i = Math.floor(c / stride) % n;
    const lo = i > 0 ? v[c - stride] : 0;
    const hi = i < n - 1 ? v[c + stride] : 0;
    out[c] = 0.25 * lo + 0.5 * v[c] + 0.25 * hi;
  }
  return out;
}

/** Smoothed density at a point: trilinear between cell centres, clamped at the outer ones. */
export function densityAt(d: CoarseDensity, x: number, y: number, z: number): number {
  const h = d.cellSize;
  const nx = d.dims[0], ny = d.dims[1], nz = d.dims[2], nxy = nx * ny;
  const ux = centreCoordinate(x, d.origin[0], h, nx), uy = centreCoordinate(y, d.origin[1], h, ny);
  const uz = centreCoordinate(z, d.origin[2], h, nz);
  const ix = Math.min(Math.floor(ux), nx - 1), iy = Math.min(Math.floor(uy), ny - 1), iz = Math.min(Math.floor(uz), nz - 1);
  const fx = ux - ix, fy = uy - iy, fz = uz - iz; // 0 where clamped at the last centre
  const dx = ix < nx - 1 ? 1 : 0, dy = iy < ny - 1 ? nx : 0, dz = iz < nz - 1 ? nxy : 0;
  const v = d.density;
  const c = ix + nx * iy + nxy * iz;
  const y0 = (1 - fx) * v[c] + fx * v[c + dx], y1 = (1 - fx) * v[c + dy] + fx * v[c + dy + dx];
  const z0 = (1 - fy) * y0 + fy * y1;
  const y2 = (1 - fx) * v[c + dz] + fx * v[c + dz + dx], y3 = (1 - fx) * v[c + dz + dy] + fx * v[c + dz + dy + dx];
  return (1 - fz) * z0 + fz * ((1 - fy) * y2 + fy * y3);
}

/** Position in units of cells from the first cell centre, clamped to [0, n − 1]. */
function centreCoordinate(v: number, origin: number, h: number, n: number): number {
  const u = (v - origin) / h - 0.5;
  return u > 0 ? (u < n - 1 ? u : n - 1) : 0;
}
