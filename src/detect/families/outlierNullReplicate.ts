/**
 * One null catalogue and its scores: `catalogueSize` bodies drawn from the background
 * (outlierBackground.ts), and up to `scored` of them scored exactly as the observed bodies are
 * (outlierScore.ts), each against the whole null catalogue. When the background marks which
 * observed bodies are scored (the observed catalogue's selection), only null bodies drawn from
 * a scored parent are scored: the first `scored` of those in draw order (independent draws, so a
 * random sample of them), the others still occupy space for the neighbour search and the coarse
 * background, as the observed bodies set apart do. Without marks: the first `scored` bodies.
 * Data in, data out (the generator is advanced by the draws), for a caller on any thread;
 * `search`: which threads the k-nearest searches run on (the same numbers on any).
 *
 * A calibration's catalogues (NullReplicateRunner): catalogue r is drawn from its own stream,
 * seeded by seeds[r], so the catalogues can be drawn and scored on different threads at once
 * (familiesThreads.ts) with the numbers of the serial runner below, bit for bit.
 */
import { seededRandom, type Random } from '../../core/random.js';
import { drawFromBackground, type OutlierBackground } from './outlierBackground.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { isolationScoresOfFirst, type IsolationOptions } from './outlierScore.js';

export function nullReplicateScores(bg: OutlierBackground, catalogueSize: number, opts: IsolationOptions, scored: number, random: Random,
  search: KNearestSearch = SERIAL_KNEAREST,
): Float64Array {
  if (bg.scoredParent === null) return isolationScoresOfFirst(drawFromBackground(bg, catalogueSize, random), opts, Math.min(scored, catalogueSize), search);
  const parent = new Int32Array(catalogueSize);
  const drawn = drawFromBackground(bg, catalogueSize, random, parent);
  return isolationScoresOfFirst(scoredFirst(drawn, parent, bg.scoredParent), opts, Math.min(scored, countScored(parent, bg.scoredParent)), search);
}

/** Scores of each null catalogue r (seeded by seeds[r]), in order; `search` for the serial runner's k-nearest searches. */
export type NullReplicateRunner = (
  bg: OutlierBackground, catalogueSize: number, opts: IsolationOptions, scored: number, seeds: Uint32Array, search: KNearestSearch,
) => Float64Array[];

/** The catalogues one after another on this thread (each one's k-nearest searches on `search`). */
export const SERIAL_NULL_REPLICATES: NullReplicateRunner = (bg, catalogueSize, opts, scored, seeds, search) =>
  Array.from(seeds, (seed) => nullReplicateScores(bg, catalogueSize, opts, scored, seededRandom(seed), search));

function countScored(parent: Int32Array, mark: Uint8Array): number {
  let m = 0;
  for (let j = 0; j < parent.length; j++) if (mark[parent[j]] !== 0) m++;
  return m;
}

/** The drawn bodies reordered: those of scored parents first, then the rest, each group in draw order. */
function scoredFirst(xyz: Float64Array, parent: Int32Array, mark: Uint8Array): Float64Array {
  const out = new Float64Array(xyz.length);
  let m = 0;
  for (let pass = 1; pass >= 0; pass--) {
    for (let j = 0; j < parent.length; j++) {
      if ((mark[parent[j]] !== 0 ? 1 : 0) !== pass) continue;
      out[3 * m] = xyz[3 * j]; out[3 * m + 1] = xyz[3 * j + 1]; out[3 * m + 2] = xyz[3 * j + 2];
      m++;
    }
  }
  return out;
}
