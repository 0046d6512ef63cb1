/**
 * How the k-nearest rows of a grid are computed: on this thread (SERIAL_KNEAREST), or shared
 * with worker threads (familiesThreads.ts). Both give the rows of kNearest.ts bit for bit; the
 * isolation scores and their null calibration take one and never see the difference.
 */
import { kNearestAll, kNearestOfFirst, type KNearestResult } from './kNearest.js';
import type { KNearestGrid } from './kNearestGrid.js';

export interface KNearestSearch {
  /** kNearestAll(grid, k). */
  all(grid: KNearestGrid, k: number): KNearestResult;
  /** kNearestOfFirst(grid, inputXyz, m, k). */
  ofFirst(grid: KNearestGrid, inputXyz: Float64Array, m: number, k: number): KNearestResult;
}

export const SERIAL_KNEAREST: KNearestSearch = { all: kNearestAll, ofFirst: kNearestOfFirst };
