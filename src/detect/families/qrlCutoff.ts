/**
 * Cutoff velocity from the quasi-random level (QRL; Zappalà et al. 1995, Icarus 116, 291;
 * used region by region in Nesvorný et al. 2015, Asteroids IV, p. 297): the largest cutoff at
 * which random backgrounds with the set's own large-scale density (qrlBackground.ts) make no
 * group of N_min or more members. Above it, groups of that size arise by chance alone.
 *
 * For each background the level is found by bisection on the cutoff (the largest linked
 * group only grows with the cutoff); the QRL is the lowest level over the backgrounds, so no
 * background forms such a group at or below it. Deterministic for a seed.
 */
import { seededRandom } from '../../core/random.js';
import { createUnionFind, unite, type UnionFind } from './clusterUnionFind.js';
import { pairsWithin, type PairList } from './gridPairList.js';
import { toVelocitySpace, type VelocitySpace } from './metricVelocity.js';
import { shuffledBackground } from './qrlBackground.js';
import { coarseCellBackground, type CoarseCell } from './qrlBackgroundCells.js';

export interface QrlOptions {
  readonly minMembers: number;     // N_min of the families the cutoff is for
  readonly aRefAu: number;         // reference a of the metric (metricVelocity.ts)
  readonly backgrounds: number;    // random backgrounds drawn
  readonly seed: number;           // seeds the backgrounds
  /**
   * How backgrounds are drawn: e and sin i permuted within a bins of this width
   * (qrlBackground.ts), or each body uniform in its box of a coarse grid (qrlBackgroundCells.ts).
   */
  readonly background: { readonly binWidthAu: number } | { readonly cell: CoarseCell };
  readonly resolutionMPerS: number; // bisection stops when the bracket is this narrow
}

export interface QrlResult {
  readonly cutoffMPerS: number;          // the QRL: no background has a group ≥ N_min at this cutoff
  readonly perBackgroundMPerS: Float64Array; // each background's level
}

/** Upper end of the first bracket and the most it may be doubled to (m/s); our choice. */
const FIRST_HIGH_M_PER_S = 16;
const HIGHEST_M_PER_S = 16_384;
/**
 * Radius of the first pair list: the first bracket's upper end, so no pair beyond the first
 * cutoff tried is listed unless that cutoff forms no group (the list is then made again at each
 * doubling). The pairs within a radius grow as its cube: on the 1.5 M-row bench dump, whose
 * background levels lie at 8.5–12 m/s, a first list at twice the bracket (32 m/s) held 8 times
 * the pairs the search reads and the levels took 4.6 s CPU against 2.2–2.5 s for this one (our
 * choice; the levels are the same, the list only decides which pairs are at hand).
 */
const FIRST_LIST_M_PER_S = FIRST_HIGH_M_PER_S;

/** The QRL of the bodies (a, e, sin i). */
export function quasiRandomLevel(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, opts: QrlOptions): QrlResult {
  const spaces = qrlBackgroundSpaces(aAu, e, sinI, opts);
  const perBackgroundMPerS = Float64Array.from(spaces, (space) => groupLevel(space, opts.minMembers, opts.resolutionMPerS));
  let cutoffMPerS = Infinity;
  for (const v of perBackgroundMPerS) if (v < cutoffMPerS) cutoffMPerS = v;
  return { cutoffMPerS, perBackgroundMPerS };
}

/**
 * The random backgrounds of the bodies in velocity space, drawn in order from one generator
 * seeded with opts.seed: the spaces quasiRandomLevel takes the levels of.
 */
export function qrlBackgroundSpaces(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, opts: QrlOptions): VelocitySpace[] {
  if (!Number.isInteger(opts.minMembers) || opts.minMembers < 2) throw new RangeError(`quasiRandomLevel: minMembers must be an integer ≥ 2, got ${opts.minMembers}`);
  if (!Number.isInteger(opts.backgrounds) || opts.backgrounds < 1) throw new RangeError(`quasiRandomLevel: backgrounds must be a positive integer, got ${opts.backgrounds}`);
  if (!(opts.resolutionMPerS > 0)) throw new RangeError(`quasiRandomLevel: resolution must be positive m/s, got ${opts.resolutionMPerS}`);
  const random = seededRandom(opts.seed);
  const spaces: VelocitySpace[] = [];
  for (let b = 0; b < opts.backgrounds; b++) {
    const bg = 'cell' in opts.background
      ? coarseCellBackground(aAu, e, sinI, opts.background.cell, random)
      : shuffledBackground(aAu, e, sinI, opts.background.binWidthAu, random);
    spaces.push(toVelocitySpace(bg.aAu, bg.e, bg.sinI, opts.aRefAu));
  }
  return spaces;
}

/**
 * The levels of many spaces: each one's groupLevel, NaN where that throws a RangeError (no
 * level: too few bodies). Serial, or shared with worker threads (familiesThreads.ts); the
 * same numbers either way.
 */
export type LevelRunner = (spaces: readonly VelocitySpace[], minMembers: number, resolution: number) => Float64Array;

/** groupLevel, or NaN where it throws a RangeError. */
export function levelOrNaN(space: VelocitySpace, minMembers: number, resolution: number): number {
  try {
    return groupLevel(space, minMembers, resolution);
  } catch (err) {
    if (err instanceof RangeError) return NaN;
    throw err;
  }
}

export const SERIAL_LEVELS: LevelRunner = (spaces, minMembers, resolution) =>
  Float64Array.from(spaces, (space) => levelOrNaN(space, minMembers, resolution));

/**
 * Largest cutoff (to `resolution`) at which the largest linked group is under `minMembers`.
 * The pairs within the bracket's upper end are found once (gridPairList.ts) and each cutoff
 * tried is read from them (the links at v are the pairs with d² ≤ v·v): the same answers as
 * linking the bodies anew at every cutoff (clusterHcm.ts linkComponents), tested equal, at the
 * cost of one grid per doubling of the bracket instead of one per cutoff tried.
 */
export function groupLevel(space: VelocitySpace, minMembers: number, resolution: number): number {
  let lo = 0;
  let hi = FIRST_HIGH_M_PER_S;
  let pairs = pairsWithin(space, FIRST_LIST_M_PER_S);
  const uf = createUnionFind(pairs.points);
  while (!formsGroup(pairs, hi, minMembers, uf)) {
    lo = hi;
    hi *= 2;
    if (hi > HIGHEST_M_PER_S) throw new RangeError(`quasiRandomLevel: no group of ${minMembers} forms below ${HIGHEST_M_PER_S} m/s (too few bodies?)`);
    if (hi > pairs.radius) pairs = pairsWithin(space, hi);
  }
  while (hi - lo > resolution) {
    const mid = 0.5 * (lo + hi);
    if (formsGroup(pairs, mid, minMembers, uf)) hi = mid; else lo = mid;
  }
  return lo;
}

/**
 * Whether the links at `cutoff` (≤ the list's radius) make a group of `minMembers` or more;
 * a single indexed point is a group of one (as linkComponents counts). `uf` is scratch.
 */
function formsGroup(pairs: PairList, cutoff: number, minMembers: number, uf: UnionFind): boolean {
  if ((pairs.indexedPoints > 0 ? 1 : 0) >= minMembers) return true;
  for (let k = 0; k < uf.parent.length; k++) uf.parent[k] = k;
  uf.size.fill(1);
  const r2 = cutoff * cutoff;
  const { first, second, distance2 } = pairs;
  for (let p = 0; p < pairs.count; p++) {
    if (distance2[p] <= r2 && unite(uf, first[p], second[p]) >= minMembers) return true;
  }
  return false;
}
