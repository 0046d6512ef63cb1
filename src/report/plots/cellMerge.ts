/**
 * Lossless thinning of a dense scatter at the chart's own resolution: of the points of one
 * class (one colour) whose positions fall in the same square cell of the plot area, only the
 * first (in the order given) is drawn. Every point left out lies within √2 cells of a drawn
 * point of its class, so with cells of 1 px and symbols wider than √2 px in radius it lies
 * inside a drawn symbol of its colour: the picture shows where every point is, and the number
 * of symbols is bounded by the plot area instead of by the number of points. Deterministic:
 * no randomness, the same input keeps the same points.
 */

/** A linear axis: the domain [lo, hi] drawn over `px` pixels. */
export interface PixelAxis {
  lo: number;
  hi: number; // > lo
  px: number; // plot extent in pixels
}

/** The cell along one axis of a value (cells of `cellPx` pixels), clamped into the axis. */
function cellOf(v: number, axis: PixelAxis, cellPx: number, cells: number): number {
  const c = Math.floor(((v - axis.lo) / (axis.hi - axis.lo)) * (axis.px / cellPx));
  return c < 0 ? 0 : c >= cells ? cells - 1 : c;
}

/**
 * Of `order` (point indices, in drawing order), those that are the first of their class in
 * their cell. `cls[i]` is the class of point i, an integer in [0, classes). Points with a
 * non-finite coordinate are skipped (the caller counts them).
 */
export function firstPerCell(
  order: ArrayLike<number>, x: ArrayLike<number>, y: ArrayLike<number>, cls: ArrayLike<number>, classes: number,
  xAxis: PixelAxis, yAxis: PixelAxis, cellPx: number,
): number[] {
  if (!(cellPx > 0) || !(xAxis.hi > xAxis.lo) || !(yAxis.hi > yAxis.lo) || !(xAxis.px > 0) || !(yAxis.px > 0)) {
    throw new RangeError(`firstPerCell: need cellPx > 0 and axes with hi > lo and px > 0, got cell ${cellPx}, x [${xAxis.lo}, ${xAxis.hi}] over ${xAxis.px} px, y [${yAxis.lo}, ${yAxis.hi}] over ${yAxis.px} px`);
  }
  if (!Number.isInteger(classes) || classes < 1) throw new RangeError(`firstPerCell: classes must be a whole number ≥ 1, got ${classes}`);
  const nx = Math.max(1, Math.ceil(xAxis.px / cellPx)), ny = Math.max(1, Math.ceil(yAxis.px / cellPx));
  const taken = new Uint8Array(classes * nx * ny);
  const kept: number[] = [];
  for (let t = 0; t < order.length; t++) {
    const i = order[t];
    if (!(Number.isFinite(x[i]) && Number.isFinite(y[i]))) continue;
    const c = cls[i];
    if (!(Number.isInteger(c) && c >= 0 && c < classes)) throw new RangeError(`firstPerCell: class of point ${i} is ${c}, outside [0, ${classes})`);
    const cell = (c * ny + cellOf(y[i], yAxis, cellPx, ny)) * nx + cellOf(x[i], xAxis, cellPx, nx);
    if (taken[cell] === 0) {
      taken[cell] = 1;
      kept.push(i);
    }
  }
  return kept;
}
