/**
 * The isolation score of each body in scaled proper-element space (outlierMetric.ts):
 *
 *   score = ln( ρ_bg(x) · V_k / k ),   V_k = (4π/3) r_k³,
 *
 * r_k the distance to the body's k-th nearest other body (the local density estimate k / V_k,
 * Loftsgaarden & Quesenberry 1965, Ann. Math. Stat. 36, 1049) and ρ_bg the background density
 * at a coarser scale: the catalogue's own counts in a coarse grid (about `backgroundPerCell`
 * bodies a cell), smoothed over neighbouring cells (outlierDensity.ts), each body counted at
 * most `clumpCap` times its coarse surroundings over its own neighbourhood's density, so that a
 * dense family does not raise the background of the bodies around it (outlierClumpWeights.ts;
 * Infinity: every body counts 1). The score is the log of
 * how many background bodies the k-nearest ball "should" hold over the k it does: 0 where the
 * body is as crowded as its surroundings, positive where it is emptier. A body in a sparse but
 * smooth region is not raised for the sparseness alone, since ρ_bg falls with it. No
 * distribution is assumed for the score: its meaning comes from calibration
 * (outlierCalibration.ts). Exact ties at r_k = 0 give −∞ (the least isolated).
 *
 * Measured limits (test/detect/families/outlierScore.test.ts and trials): where the density falls
 * smoothly by 20 across a box, 0.43% of the sparsest quarter is raised at α = 0.01 (the k-th
 * distance alone: 16%). At a sharp step the coarse cells straddling it mix the dense side in:
 * beside a region ten times denser, 9.5% of a sparse uniform region came up at α = 0.01.
 * Two other backgrounds were tried and dropped: the 32nd neighbour (a ball 1.6 times wider)
 * handled the step (1.7%) but is too close in scale to tell a family core from its
 * surroundings (bodies at the centre of Eos came up) and its neighbour search cost 3.6–7 times
 * as much; the 16th neighbour among every 16th body was noisier and failed the step, the
 * planted bodies and the family centres.
 */
import { cellSizeForOccupancy } from './kNearestCellSize.js';
import { buildKNearestGrid } from './kNearestGrid.js';
import type { KNearestResult } from './kNearest.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { clumpWeightedDensity } from './outlierClumpWeights.js';
import { densityAt, type CoarseDensity } from './outlierDensity.js';

export interface IsolationOptions {
  k: number; // neighbours: the k-th sets the local density
  gridPerCell: number; // mean bodies per occupied cell of the neighbour grid
  backgroundPerCell: number; // mean bodies per occupied cell of the coarse background grid
  clumpCap: number; // a body counts in the coarse background at most cap·ρ_bg/ρ_fine (outlierClumpWeights.ts); Infinity: every body 1
}

/**
 * Defaults (common practice for k-nearest density scores: k of order 10; clump cap 8, measured in
 * outlierClumpWeights.ts; grids chosen from
 * measured cost, the neighbours found do not depend on them). The k nearest of 1.5 million
 * bodies with cells skipped beyond the k-th distance (kNearest.ts): 4 bodies a cell 3.4–3.7 s,
 * 2 a cell 3.5 s (without the skipping 3.9–4.0 s) at load average 1.8; on a loaded machine
 * (load average 5–7) 4 a cell 4.1–4.9 s, 2 a cell 6.1–6.4 s, 8 a cell 5.1–5.6 s.
 */
export const DEFAULT_ISOLATION_OPTIONS: Readonly<IsolationOptions> = { k: 8, gridPerCell: 4, backgroundPerCell: 200, clumpCap: 8 };

/** Re-estimates of the coarse background with the clump weights (outlierClumpWeights.ts; our choice: the first starts from a background the clumps inflate). */
export const CLUMP_PASSES = 2;

export interface IsolationScores {
  readonly score: Float64Array; // ln(ρ_bg · V_k / k), per body
  readonly neighbours: KNearestResult; // scaled distances and indices of the k nearest
  readonly backgroundDensity: Float64Array; // ρ_bg at each body, bodies per unit scaled volume
  readonly background: CoarseDensity; // the coarse grid it was read from
}

/** Scores a catalogue of scaled coordinates (interleaved xyz). Needs more than k bodies. `search`: on which threads (the same rows). */
export function isolationScores(xyz: Float64Array, opts: IsolationOptions, search: KNearestSearch = SERIAL_KNEAREST): IsolationScores {
  const n = xyz.length / 3;
  const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, opts.gridPerCell, maxCellsFor(n)));
  const background = clumpWeightedDensity(xyz, grid, cellSizeForOccupancy(xyz, opts.backgroundPerCell, maxCellsFor(n)), opts.clumpCap, CLUMP_PASSES);
  // The background before the search (independent: the same numbers in either order): the search
  // is shared with the worker threads and the background is not, and in the families stage a
  // worker is still clustering when the scoring starts (familiesThreads.ts). Estimating the
  // background first and then joining the shared search leaves no thread idle; the other order
  // left the worker idle while this thread estimated the background alone (about 0.8 s CPU on
  // the 1.5 M-row bench dump).
  const neighbours = search.all(grid, opts.k);
  const backgroundDensity = new Float64Array(n);
  const score = scoresFrom(xyz, n, neighbours, background, backgroundDensity);
  return { score, neighbours, backgroundDensity, background };
}

/**
 * The scores of the first m bodies only, each against the whole catalogue (its k nearest
 * among all n, the background from all n): the first m entries isolationScores would give,
 * bit for bit. For null catalogues of independent draws, whose first m bodies are a random
 * sample of them.
 */
export function isolationScoresOfFirst(xyz: Float64Array, opts: IsolationOptions, m: number, search: KNearestSearch = SERIAL_KNEAREST): Float64Array {
  const n = xyz.length / 3;
  const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, opts.gridPerCell, maxCellsFor(n)));
  const neighbours = search.ofFirst(grid, xyz, m, opts.k);
  const background = clumpWeightedDensity(xyz, grid, cellSizeForOccupancy(xyz, opts.backgroundPerCell, maxCellsFor(n)), opts.clumpCap, CLUMP_PASSES);
  return scoresFrom(xyz, m, neighbours, background, new Float64Array(m));
}

function maxCellsFor(n: number): number {
  return 4 * n + 64;
}

/** Scores of bodies 0 … m−1 from their neighbours' rows; fills backgroundDensity (length m). */
function scoresFrom(xyz: Float64Array, m: number, neighbours: KNearestResult, background: CoarseDensity, backgroundDensity: Float64Array): Float64Array {
  const score = new Float64Array(m);
  const k = neighbours.k;
  for (let j = 0; j < m; j++) {
    const rho = densityAt(background, xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2]);
    const rk = neighbours.distance[j * k + k - 1];
    backgroundDensity[j] = rho;
    score[j] = Math.log((rho * (4 * Math.PI / 3) * rk * rk * rk) / k);
  }
  return score;
}
