/**
 * Calibration of isolation scores against a stated null model, with no distribution assumed:
 * `replicates` synthetic catalogues of the observed size are drawn from the smooth background
 * (outlierBackground.ts) with the injected seeded generator, scored exactly as the observed
 * one (outlierScore.ts), and pooled. A body's null tail fraction is the fraction of pooled
 * null scores at least as high as its score, with the plus-one rule (r + 1)/(n + 1)
 * (Davison & Hinkley 1997, eq. 4.11; empiricalTail.ts). It estimates the false-alarm
 * probability of the null model; it is itself a tail fraction of a finite null sample, at
 * least 1/(n + 1). Same background, generator state and options → the same numbers, bit for bit.
 */
import type { Random } from '../../core/random.js';
import { upperTailFraction } from '../empiricalTail.js';
import { drawFromBackground, type OutlierBackground } from './outlierBackground.js';
import { isolationScores, type IsolationOptions } from './outlierScore.js';

export interface OutlierCalibration {
  readonly nullScoresSorted: Float64Array; // pooled null scores, ascending
  readonly replicates: number; // synthetic catalogues scored
  readonly catalogueSize: number; // bodies in each
  readonly nullModel: string; // the null model in one sentence, for outputs
}

export function calibrateIsolation(
  bg: OutlierBackground, catalogueSize: number, opts: IsolationOptions, replicates: number, random: Random,
): OutlierCalibration {
  if (!Number.isInteger(replicates) || replicates < 1) throw new RangeError(`calibrateIsolation: replicates must be a positive integer, got ${replicates}`);
  const pooled = new Float64Array(replicates * catalogueSize);
  for (let r = 0; r < replicates; r++) {
    const synthetic = drawFromBackground(bg, catalogueSize, random);
    pooled.set(isolationScores(synthetic, opts).score, r * catalogueSize);
  }
  pooled.sort();
  return { nullScoresSorted: pooled, replicates, catalogueSize, nullModel: nullModelSentence(bg, catalogueSize, opts, replicates) };
}

/** Null tail fraction of each score: (1 + #{null ≥ s}) / (n + 1). */
export function nullTailFractions(scores: Float64Array, cal: OutlierCalibration): Float64Array {
  const out = new Float64Array(scores.length);
  for (let j = 0; j < scores.length; j++) out[j] = upperTailFraction(cal.nullScoresSorted, scores[j]);
  return out;
}

function nullModelSentence(bg: OutlierBackground, n: number, opts: IsolationOptions, replicates: number): string {
  return `Null model: ${n} bodies drawn independently from a smooth background in scaled proper-element space ` +
    `(√(5/4)·ln a, √2·e, √2·sin i): each a point uniform in the ball around an observed body as wide as its ${opts.k}-th neighbour distance, ` +
    `that body picked with weight min(1, ${bg.weightCap}·background/k-nearest density) so that families do not shape it, ` +
    `e and sin i reflected at 0; ${replicates} such catalogues scored as the observed one.`;
}
