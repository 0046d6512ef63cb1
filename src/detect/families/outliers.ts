/**
 * Isolation outliers in proper-element space, one call: scaled coordinates (outlierMetric.ts),
 * isolation scores (outlierScore.ts), a smooth background of the catalogue, families included
 * (outlierBackground.ts), and calibration against synthetic catalogues drawn from it
 * (outlierCalibration.ts). Pure computation; randomness comes from the injected generator.
 *
 * Selection: `scored` (optional, 1 per body) marks the bodies to score; the others — bodies
 * whose proper elements are not trusted, set apart from the families — still occupy space: they
 * are neighbours in the k-nearest search, count in the coarse background and carry kernels of
 * the null background, but get no tail fraction (NaN). Removing them instead would leave
 * hard-edged holes in the observed catalogue where the smooth null has soft edges, and the
 * bodies on a hole's rim would come up as isolated (test/detect/families/outlierSelection.test.ts).
 * The null catalogues undergo the same selection (outlierNullReplicate.ts).
 *
 * For a later stage that names the nearest family: each body's k nearest other bodies (input
 * indices and velocity distances, nearest first) and its scaled coordinates; with family labels
 * per body, the nearest labelled neighbour or the distance to a family's members follow.
 */
import type { Random } from '../../core/random.js';
import { orbitalSpeedMPerS } from './metricVelocity.js';
import { scaledProperCoordinates } from './outlierMetric.js';
import { buildOutlierBackground } from './outlierBackground.js';
import { calibrateIsolation, nullCataloguePlan, nullCountsAtLeast, nullFalseAlarmProbs, nullTailFractions, type OutlierCalibration } from './outlierCalibration.js';
import type { UpperTailFitResult } from '../tailExtrapolation.js';
import { DEFAULT_ISOLATION_OPTIONS, isolationScores, type IsolationOptions, type IsolationScores } from './outlierScore.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { SERIAL_NULL_REPLICATES, type NullReplicateRunner } from './outlierNullReplicate.js';

export interface ProperOutlierOptions extends IsolationOptions {
  replicates: number; // at most this many synthetic null catalogues (outlierCalibration.ts nullCataloguePlan)
  weightCap: number; // family down-weighting of the null background: w = min(1, cap·ρ_bg/ρ_k); Infinity (default): none
  nullScoresWanted?: number; // null scores to pool, about; default below
}

/**
 * Null scores pooled by default: 400 000 (fewer only when replicates·N is smaller), a
 * resolution of 1/400 001 = 2.5·10⁻⁶ — far below the smallest threshold offered (0.01), with
 * about 4 000 null scores above the 0.01 point. From 1.5 million bodies: 2 catalogues, 200 000
 * scored in each; from 89 622: 5 catalogues, 80 000 in each; from 20 000: 20 catalogues in full;
 * from 12 500 scored bodies up, the whole 400 000 (at most 32 catalogues). Scoring every body of
 * 8 catalogues of 1.5 million took 71 s.
 */
export const DEFAULT_NULL_SCORES_WANTED = 400_000;

/**
 * Defaults: at most 32 null catalogues, about 400 000 null scores (DEFAULT_NULL_SCORES_WANTED), no
 * family down-weighting (weight cap ∞: the null draws from every body, families included).
 *
 * Weight cap, measured (scripts/diagnostics/familiesCalibration.ts on the benchmark's main-belt
 * dump, 8% family members, the default seed): bodies tested below false-alarm probability 0.01,
 * at 1.5 M rows 2.34% with cap 8, 1.94% with cap 32, 1.01% with none (0.05: 4.86%); at 300 000
 * rows 1.24% and 0.96%; on the 89 622 real proper elements 1.08% and 0.92%. Cap 8 was chosen
 * before on a heavy-tailed density with no family (cap 2 took its smooth peak for a family:
 * 1.8–2.0% there, cap 8 1.1–1.3%, none 0.79%); on a catalogue with dense families any cap leaves
 * their surroundings looking emptier in the catalogue than in the null (outlierBackground.ts).
 *
 * At most 32 catalogues rather than 8: a catalogue of 20 000 bodies got 160 000 null scores from 8,
 * and the tail fit beyond them put the demo's planted isolated bodies at false-alarm
 * probabilities 1.6–3.0·10⁻⁵; from 400 000 (20 catalogues) at 0.63–1.4·10⁻⁵, the fit reaching
 * from its top 1 000 scores (0.25% of the pool rather than 0.63%) less far. The tail fraction at
 * 0.01 moved by less than its binomial σ (0.79% and 0.80% of the demo's 11 819 bodies tested).
 * A small catalogue's null catalogues cost little (20 of 20 000 bodies: about a second).
 */
export const DEFAULT_PROPER_OUTLIER_OPTIONS: Readonly<ProperOutlierOptions> = { ...DEFAULT_ISOLATION_OPTIONS, replicates: 32, weightCap: Infinity };

export interface ProperOutliers {
  readonly k: number;
  readonly score: Float64Array; // ln(ρ_bg·V_k/k), larger = more isolated
  readonly nullTailFraction: Float64Array; // (1 + #{null ≥ score})/(n + 1); NaN for a body not scored
  readonly falseAlarmProb: Float64Array; // the tail fraction, or beyond the null sample's resolution the tail fit's extrapolation; NaN for a body not scored
  readonly falseAlarmFrom: Uint8Array; // how: TAIL_FROM_* codes of tailExtrapolation.ts
  readonly scored: Uint8Array; // 1 where the body was scored (all when no selection was given)
  readonly nearestDistanceMps: Float64Array; // n·a·|δz| to the nearest other body, m/s
  readonly kthDistanceMps: Float64Array; // to the k-th nearest, m/s
  readonly neighbourIndex: Int32Array; // k nearest per body, row-major (body·k + m), input indices
  readonly neighbourDistanceMps: Float64Array; // the same, m/s
  readonly backgroundDensity: Float64Array; // ρ_bg, bodies per unit scaled volume
  readonly scaledXyz: Float64Array; // (√(5/4)·ln a, √2·e, √2·sin i) per body, interleaved
  readonly nullModel: string; // one sentence
  readonly nullScores: number; // size of the pooled null sample
  readonly tail: UpperTailFitResult; // the null sample's upper-tail fit
}

/**
 * Scores, background, calibration, null tail fractions and false-alarm probabilities of a
 * catalogue in scaled coordinates; with `scored`, only the marked bodies are scored (NaN elsewhere);
 * `search`: on which threads the k-nearest searches run, `runner`: the null catalogues (the same
 * numbers on any).
 */
export function calibratedIsolation(
  xyz: Float64Array, random: Random, options: ProperOutlierOptions, scored: Uint8Array | null = null, search: KNearestSearch = SERIAL_KNEAREST,
  runner: NullReplicateRunner = SERIAL_NULL_REPLICATES,
): {
  scores: IsolationScores; calibration: OutlierCalibration; nullTailFraction: Float64Array; falseAlarmProb: Float64Array; falseAlarmFrom: Uint8Array;
} {
  const n = xyz.length / 3;
  const k = options.k;
  if (!Number.isInteger(k) || k < 1 || k >= n) throw new RangeError(`calibratedIsolation: k must be an integer from 1 to ${n - 1}, got ${k}`);
  if (scored !== null && scored.length !== n) throw new RangeError(`calibratedIsolation: ${scored.length} scored marks for ${n} bodies`);
  const nScored = scored === null ? n : scored.reduce((s, v) => s + (v !== 0 ? 1 : 0), 0);
  if (nScored < 1) throw new RangeError('calibratedIsolation: no body is marked to be scored');
  const scores = isolationScores(xyz, options, search);
  const background = buildOutlierBackground(xyz, scores, options.weightCap, scored);
  const plan = nullCataloguePlan(nScored, options.replicates, options.nullScoresWanted ?? DEFAULT_NULL_SCORES_WANTED);
  const calibration = calibrateIsolation(background, n, options, plan.replicates, random, plan.scoredPerReplicate, search, runner);
  const counts = nullCountsAtLeast(scores.score, calibration); // read by both below: found once
  const nullTailFraction = nullTailFractions(scores.score, calibration, counts);
  const fap = nullFalseAlarmProbs(scores.score, calibration, counts);
  if (scored !== null) {
    for (let j = 0; j < n; j++) if (scored[j] === 0) { nullTailFraction[j] = NaN; fap.p[j] = NaN; }
  }
  return { scores, calibration, nullTailFraction, falseAlarmProb: fap.p, falseAlarmFrom: fap.from };
}

export function properOutliers(
  aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, random: Random,
  options: ProperOutlierOptions = DEFAULT_PROPER_OUTLIER_OPTIONS, scored: Uint8Array | null = null,
  search: KNearestSearch = SERIAL_KNEAREST, runner: NullReplicateRunner = SERIAL_NULL_REPLICATES,
): ProperOutliers {
  const xyz = scaledProperCoordinates(aAu, e, sinI);
  const n = aAu.length;
  const k = options.k;
  const { scores, calibration, nullTailFraction, falseAlarmProb, falseAlarmFrom } = calibratedIsolation(xyz, random, options, scored, search, runner);
  const neighbourDistanceMps = new Float64Array(n * k);
  const nearestDistanceMps = new Float64Array(n);
  const kthDistanceMps = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const v = orbitalSpeedMPerS(aAu[j]);
    for (let m = 0; m < k; m++) neighbourDistanceMps[j * k + m] = v * scores.neighbours.distance[j * k + m];
    nearestDistanceMps[j] = neighbourDistanceMps[j * k];
    kthDistanceMps[j] = neighbourDistanceMps[j * k + k - 1];
  }
  return {
    k,
    score: scores.score,
    nullTailFraction,
    falseAlarmProb,
    falseAlarmFrom,
    scored: scored ?? new Uint8Array(n).fill(1),
    nearestDistanceMps,
    kthDistanceMps,
    neighbourIndex: scores.neighbours.index,
    neighbourDistanceMps,
    backgroundDensity: scores.backgroundDensity,
    scaledXyz: xyz,
    nullModel: calibration.nullModel,
    nullScores: calibration.nullScoresSorted.length,
    tail: calibration.tail,
  };
}
