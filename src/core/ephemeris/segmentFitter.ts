/**
 * The seam between the Chebyshev cache (ephemerisCache.ts) and sources that can fit many
 * cache segments at once faster than sampling them one node at a time (the VSOP87/ELP series:
 * vsop87SegmentFitter.ts). A source that does not offer it is sampled at the Chebyshev nodes.
 */
import type { Ephemeris, EphemerisBody } from '../types.js';

/** A body's segment grid in the cache: segment s covers [startJdTDB + s·segmentDays, +segmentDays). */
export interface SegmentGrid {
  readonly startJdTDB: number;
  readonly segmentDays: number;
  readonly segmentCount: number;
  /** Chebyshev coefficients per axis and segment (n). */
  readonly coefficients: number;
}

export interface SegmentFitterOptions {
  /** true: also fit velocities (coefficients for vx, vy, vz follow x, y, z; stride 6n). */
  readonly fitVelocities: boolean;
  /**
   * Worst-case bound (au) of the position error the fitter may add to the fit itself by
   * leaving out negligible series terms; 0 keeps every term.
   */
  readonly toleranceAu: number;
}

export interface SegmentFitter {
  /**
   * Fit segments [first, first + count) of the grid: coefficients of x, y, z (then vx, vy, vz
   * when fitting velocities), c_0 halved as in chebyshev.ts, n per axis, segment s at
   * coeffs[s * stride ..]. Results depend only on (first, count) and the grid, never on
   * what was fitted before.
   */
  fitSegments(first: number, count: number, coeffs: Float64Array, stride: number): void;
  /** Series terms the fitter keeps and the bound of what it leaves out (au). */
  readonly termsKept: number;
  readonly termsTotal: number;
  readonly droppedBoundAu: number;
}

export interface SegmentFitterSource {
  createSegmentFitter(body: EphemerisBody, grid: SegmentGrid, opts: SegmentFitterOptions): SegmentFitter;
}

/** true when `source` can fit segments in bulk. */
export function hasSegmentFitter(source: Ephemeris): source is Ephemeris & SegmentFitterSource {
  return typeof (source as Partial<SegmentFitterSource>).createSegmentFitter === 'function';
}
