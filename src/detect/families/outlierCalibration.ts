/**
 * Calibration of isolation scores against a stated null model, with no distribution assumed:
 * `replicates` synthetic catalogues of the observed size are drawn from the smooth background
 * (outlierBackground.ts) with the injected seeded generator, scored exactly as the observed
 * one (outlierScore.ts), and pooled. Only the first `scoredPerReplicate` bodies of each are
 * scored (each against its whole catalogue): the bodies are independent draws, so these are a
 * random sample of the catalogue's scores, and the tail needs a few hundred thousand null
 * scores, not all of them (scoring is most of the cost: 8 catalogues of 1.5 million bodies
 * took 71 s scored in full). A body's null tail fraction is the fraction of pooled
 * null scores at least as high as its score, with the plus-one rule (r + 1)/(n + 1)
 * (Davison & Hinkley 1997, eq. 4.11; empiricalTail.ts). It estimates the false-alarm
 * probability of the null model; it is itself a tail fraction of a finite null sample, at
 * least 1/(n + 1). Same background, generator state and options → the same numbers, bit for bit.
 */
import type { Random } from '../../core/random.js';
import { upperTailFraction } from '../empiricalTail.js';
import { drawFromBackground, type OutlierBackground } from './outlierBackground.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { isolationScoresOfFirst, type IsolationOptions } from './outlierScore.js';

export interface OutlierCalibration {
  readonly nullScoresSorted: Float64Array; // pooled null scores, ascending
  readonly replicates: number; // synthetic catalogues scored
  readonly catalogueSize: number; // bodies in each
  readonly scoredPerReplicate: number; // bodies scored in each (its first ones)
  readonly nullModel: string; // the null model in one sentence, for outputs
}

export function calibrateIsolation(
  bg: OutlierBackground, catalogueSize: number, opts: IsolationOptions, replicates: number, random: Random,
  scoredPerReplicate: number = catalogueSize, search: KNearestSearch = SERIAL_KNEAREST,
): OutlierCalibration {
  if (!Number.isInteger(replicates) || replicates < 1) throw new RangeError(`calibrateIsolation: replicates must be a positive integer, got ${replicates}`);
  if (!Number.isInteger(scoredPerReplicate) || scoredPerReplicate < 1) {
    throw new RangeError(`calibrateIsolation: bodies scored per replicate must be a positive integer, got ${scoredPerReplicate}`);
  }
  const scored = Math.min(scoredPerReplicate, catalogueSize);
  const pooled = new Float64Array(replicates * scored);
  for (let r = 0; r < replicates; r++) {
    const synthetic = drawFromBackground(bg, catalogueSize, random);
    pooled.set(isolationScoresOfFirst(synthetic, opts, scored, search), r * scored);
  }
  pooled.sort();
  return {
    nullScoresSorted: pooled, replicates, catalogueSize, scoredPerReplicate: scored,
    nullModel: nullModelSentence(bg, catalogueSize, opts, replicates, scored),
  };
}

/** Fewest null catalogues a plan uses (when `maxReplicates` allows): not every null score from one draw (common practice). */
export const MIN_NULL_CATALOGUES = 2;

/**
 * How many null catalogues of `catalogueSize` bodies to draw, and how many of each to score,
 * for about `nullScoresWanted` null scores: as few catalogues as give them (at least
 * MIN_NULL_CATALOGUES, at most maxReplicates), the scores spread evenly over them. Each
 * catalogue costs a draw and a grid of all its bodies, so a large catalogue needs few.
 */
export function nullCataloguePlan(catalogueSize: number, maxReplicates: number, nullScoresWanted: number): { replicates: number; scoredPerReplicate: number } {
  for (const [name, v] of [['catalogue size', catalogueSize], ['replicates', maxReplicates], ['null scores wanted', nullScoresWanted]] as const) {
    if (!Number.isInteger(v) || v < 1) throw new RangeError(`nullCataloguePlan: ${name} must be a positive integer, got ${v}`);
  }
  const replicates = Math.min(maxReplicates, Math.max(MIN_NULL_CATALOGUES, Math.ceil(nullScoresWanted / catalogueSize)));
  return { replicates, scoredPerReplicate: Math.min(catalogueSize, Math.ceil(nullScoresWanted / replicates)) };
}

/** Null tail fraction of each score: (1 + #{null ≥ s}) / (n + 1). */
export function nullTailFractions(scores: Float64Array, cal: OutlierCalibration): Float64Array {
  const out = new Float64Array(scores.length);
  for (let j = 0; j < scores.length; j++) out[j] = upperTailFraction(cal.nullScoresSorted, scores[j]);
  return out;
}

function nullModelSentence(bg: OutlierBackground, n: number, opts: IsolationOptions, replicates: number, scored: number): string {
  const which = scored === n ? 'scored as the observed one' : `the first ${scored} bodies of each scored as the observed ones, against their whole catalogue`;
  return `Null model: ${n} bodies drawn independently from a smooth background in scaled proper-element space ` +
    `(√(5/4)·ln a, √2·e, √2·sin i): each a point uniform in the ball around an observed body as wide as its ${opts.k}-th neighbour distance, ` +
    `that body picked with weight min(1, ${bg.weightCap}·background/k-nearest density) so that families do not shape it, ` +
    `e and sin i reflected at 0; ${replicates} such catalogues, ${which}.`;
}
