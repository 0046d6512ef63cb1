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
 *
 * With a selection (the background marks which observed bodies are scored), the null bodies
 * scored are those drawn from a scored parent (outlierNullReplicate.ts); a catalogue may then
 * hold fewer than `scoredPerReplicate` of them, and the pool is what they give.
 *
 * Beyond the pool's resolution, the false-alarm probability comes from a generalized Pareto fit
 * to the pool's upper tail (tailExtrapolation.ts), fitted once here: `nullFalseAlarmProbs`.
 */
import type { Random } from '../../core/random.js';
import { countsAtLeast } from '../tailCountsAtLeast.js';
import { fitUpperTail, upperTailProbabilities, type UpperTailFitResult } from '../tailExtrapolation.js';
import type { OutlierBackground } from './outlierBackground.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { SERIAL_NULL_REPLICATES, type NullReplicateRunner } from './outlierNullReplicate.js';
import type { IsolationOptions } from './outlierScore.js';

export interface OutlierCalibration {
  readonly nullScoresSorted: Float64Array; // pooled null scores, ascending
  readonly replicates: number; // synthetic catalogues scored
  readonly catalogueSize: number; // bodies in each
  readonly scoredPerReplicate: number; // bodies scored in each (its first ones), at most
  readonly nullModel: string; // the null model in one sentence, for outputs
  readonly tail: UpperTailFitResult; // peaks-over-threshold fit of the pooled scores' upper tail
}

/**
 * Exceedances the tail fit starts from: 1 000 rather than the 250 of Knijnenburg et al. 2009,
 * because the pool is large (about 400 000: 1 000 exceedances are its top 0.25%). Measured on 30
 * samples of 400 000 Pareto (ξ = 1/3) deviates: the extrapolated P at a true 10⁻⁶ came out
 * within a factor 83 of it starting from 250, within 3.5 starting from 1 000 (Student-t, 3
 * degrees of freedom: 13 and 7.6; exponential: 3.5 and 3.5). A pool smaller than 4 000 starts
 * from a quarter of its size (at least 50).
 */
export const NULL_TAIL_EXCEEDANCES = 1000;

function tailStart(poolSize: number): number {
  return Math.max(50, Math.min(NULL_TAIL_EXCEEDANCES, Math.floor(poolSize / 4)));
}

export function calibrateIsolation(
  bg: OutlierBackground, catalogueSize: number, opts: IsolationOptions, replicates: number, random: Random,
  scoredPerReplicate: number = catalogueSize, search: KNearestSearch = SERIAL_KNEAREST, runner: NullReplicateRunner = SERIAL_NULL_REPLICATES,
): OutlierCalibration {
  if (!Number.isInteger(replicates) || replicates < 1) throw new RangeError(`calibrateIsolation: replicates must be a positive integer, got ${replicates}`);
  if (!Number.isInteger(scoredPerReplicate) || scoredPerReplicate < 1) {
    throw new RangeError(`calibrateIsolation: bodies scored per replicate must be a positive integer, got ${scoredPerReplicate}`);
  }
  const scored = Math.min(scoredPerReplicate, catalogueSize);
  const seeds = replicateSeeds(random, replicates);
  const pooled = concatenated(runner(bg, catalogueSize, opts, scored, seeds, search));
  pooled.sort();
  return {
    nullScoresSorted: pooled, replicates, catalogueSize, scoredPerReplicate: scored,
    nullModel: nullModelSentence(bg, catalogueSize, opts, replicates, scored),
    tail: fitUpperTail(pooled, tailStart(pooled.length)),
  };
}

/**
 * Seed of each null catalogue's own stream: the r-th 32-bit number drawn from the injected
 * generator. The catalogues are then independent of the order (and thread) they are drawn in,
 * and the whole calibration still follows from the one seed.
 */
export function replicateSeeds(random: Random, replicates: number): Uint32Array {
  const seeds = new Uint32Array(replicates);
  for (let r = 0; r < replicates; r++) seeds[r] = Math.floor(random() * 0x1_0000_0000);
  return seeds;
}

function concatenated(parts: readonly Float64Array[]): Float64Array {
  const out = new Float64Array(parts.reduce((s, p) => s + p.length, 0));
  let at = 0;
  for (const p of parts) { out.set(p, at); at += p.length; }
  return out;
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

/**
 * False-alarm probability of each score under the null model: the null tail fraction, or beyond
 * the pool's resolution the tail fit's extrapolation; `from` says which (tailExtrapolation.ts codes).
 */
export function nullFalseAlarmProbs(scores: Float64Array, cal: OutlierCalibration, counts?: Int32Array): { p: Float64Array; from: Uint8Array } {
  return upperTailProbabilities(cal.nullScoresSorted, cal.tail.fit, scores, counts);
}

/**
 * The pooled null scores at least as high as each score, #{null ≥ s}: what nullTailFractions and
 * nullFalseAlarmProbs both read, found once for the two (through a guide table, tailCountsAtLeast.ts).
 */
export function nullCountsAtLeast(scores: Float64Array, cal: OutlierCalibration): Int32Array {
  return countsAtLeast(cal.nullScoresSorted, scores);
}

/** Null tail fraction of each score: (1 + #{null ≥ s}) / (n + 1); `counts` from nullCountsAtLeast when at hand. */
export function nullTailFractions(scores: Float64Array, cal: OutlierCalibration, counts: Int32Array = nullCountsAtLeast(scores, cal)): Float64Array {
  if (counts.length !== scores.length) throw new RangeError(`nullTailFractions: ${counts.length} counts for ${scores.length} scores`);
  const out = new Float64Array(scores.length);
  for (let j = 0; j < scores.length; j++) out[j] = (1 + counts[j]) / (cal.nullScoresSorted.length + 1);
  return out;
}

function nullModelSentence(bg: OutlierBackground, n: number, opts: IsolationOptions, replicates: number, scored: number): string {
  const selected = bg.scoredParent !== null;
  const which = selected
    ? `in each, the first ${scored} bodies drawn from a scored body (at most) scored as the observed ones, against their whole catalogue, the others occupying space as the observed bodies set apart do`
    : scored === n ? 'scored as the observed one' : `the first ${scored} bodies of each scored as the observed ones, against their whole catalogue`;
  return `Null model: ${n} bodies drawn independently from a smooth background in scaled proper-element space ` +
    `(√(5/4)·ln a, √2·e, √2·sin i): each a point uniform in the ball around an observed body ` +
    `${selected ? '(scored or set apart: every body that occupies space) ' : ''}as wide as its ${opts.k}-th neighbour distance, ` +
    `${nullPickClause(bg.weightCap)}, ` +
    `e and sin i reflected at 0; ${replicates} such catalogues, ${which}.`;
}

/**
 * How the null background picks the observed body a draw is placed around, in words: every body
 * alike (weight cap ∞, families included), or down-weighted by the cap.
 */
export function nullPickClause(weightCap: number): string {
  return weightCap === Infinity
    ? 'that body picked with equal probability among them, family members included (the null holds the families as the catalogue does)'
    : `that body picked with weight min(1, ${weightCap}·background/k-nearest density) so that families do not shape it`;
}
