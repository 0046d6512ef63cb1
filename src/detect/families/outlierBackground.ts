/**
 * The smooth background the null catalogues are drawn from: a variable-kernel density of the
 * observed catalogue (Breiman, Meisel & Purcell 1977, Technometrics 19, 135: each point's
 * kernel as wide as the distance to its k-th nearest neighbour), drawn from as a smoothed
 * bootstrap (Silverman 1986, Density Estimation, §6.4.1):
 *  - an observed body is picked with probability proportional to its weight: by default
 *    (weight cap ∞) every body weighs 1, families included, so the null holds the families and
 *    their surroundings as the catalogue does (the plain smoothed bootstrap). With a finite cap
 *    the weight is w = min(1, cap·ρ_bg/ρ_k) = min(1, cap·e^score) (outlierScore.ts): a body whose
 *    k-nearest density exceeds `cap` times the coarse background counts only as much as that
 *    excess allows, which down-weights families without a family list. That is no longer the
 *    default: a down-weighted family leaves its place in the null emptier than in the catalogue,
 *    while the score's coarse background near a family still counts the family's bodies, so the
 *    non-members around a dense family (within about two coarse cells) score as isolated in the
 *    catalogue and not in the null (measured on the 1.5 M-row main-belt benchmark dump with
 *    8% family members: cap 8 put 2.34% of the bodies tested below false-alarm probability 0.01,
 *    three quarters of them within 800 m/s of a family member, where 9% of the bodies tested
 *    lie; with no cap 1.01%;
 *    scripts/diagnostics/familiesCalibration.ts, test/detect/families/outlierFamilyHalo.test.ts);
 *  - the new body is placed uniformly in the ball of radius r_k around it (a bounded kernel:
 *    no Gaussian shape is assumed anywhere), the ball point found by rejection from the cube;
 *  - e and sin i cannot be negative: a draw below 0 on those axes is reflected back (the
 *    reflection method at a boundary, Silverman 1986, §2.10).
 * Deviates used per body, in order: one to pick, then three per cube trial until one lies in
 * the ball. A body with r_k = 0 (exact ties) is copied unchanged.
 *
 * The pick inverts the running sum of the weights: the first body whose running sum exceeds
 * u·Σw. A guide table (Chen & Asau 1974, AIIE Transactions 6, 163; Devroye 1986, Non-Uniform
 * Random Variate Generation, §III.2, from memory) holds that first body for each of n equal
 * slices of [0, Σw), so a pick starts there and steps a body or two instead of a binary search
 * through all n (cache misses on a million-body catalogue: the draw took twice as long as on a
 * catalogue of 90 000). It returns exactly the body the search would: the same draws bit for bit.
 */
import type { Random } from '../../core/random.js';
import type { IsolationScores } from './outlierScore.js';

export interface OutlierBackground {
  readonly xyz: Float64Array; // the observed scaled coordinates the kernels sit on
  readonly radius: Float64Array; // kernel radius of each, r_k
  readonly cumulative: Float64Array; // running sum of the weights
  readonly weightCap: number; // cap in w = min(1, cap·ρ_bg/ρ_k); Infinity: every weight 1 (cumulative[j] = j + 1, which the draws rely on)
  readonly weightedBodies: number; // Σ w over the catalogue
  readonly guide: Uint32Array; // guide[i]: first body whose running sum exceeds i·Σw/guide.length
  readonly scoredParent: Uint8Array | null; // 1 where the observed body is scored; null: every body is
}

/** Background from a catalogue (scaled xyz), its isolation scores and which of its bodies are scored (default: all). */
export function buildOutlierBackground(xyz: Float64Array, scores: IsolationScores, weightCap: number, scoredParent: Uint8Array | null = null): OutlierBackground {
  if (!(weightCap > 0)) throw new RangeError(`buildOutlierBackground: weight cap must be > 0, got ${weightCap}`);
  const n = xyz.length / 3;
  if (scores.score.length !== n) throw new RangeError(`buildOutlierBackground: ${scores.score.length} scores for ${n} bodies`);
  if (scoredParent !== null && scoredParent.length !== n) throw new RangeError(`buildOutlierBackground: ${scoredParent.length} scored marks for ${n} bodies`);
  const k = scores.neighbours.k;
  const radius = new Float64Array(n);
  const cumulative = new Float64Array(n);
  let sum = 0;
  for (let j = 0; j < n; j++) {
    radius[j] = scores.neighbours.distance[j * k + k - 1];
    sum += weightCap === Infinity ? 1 : Math.min(1, weightCap * Math.exp(scores.score[j])); // ∞·e^−∞ would be NaN
    cumulative[j] = sum;
  }
  return { xyz, radius, cumulative, weightCap, weightedBodies: sum, guide: guideTable(cumulative), scoredParent };
}

/** guide[i] = first position whose running sum exceeds i·total/n, one slice per body (a walk through both arrays). */
function guideTable(cumulative: Float64Array): Uint32Array {
  const n = cumulative.length;
  const guide = new Uint32Array(n);
  const total = n > 0 ? cumulative[n - 1] : 0;
  let s = 0;
  for (let i = 0; i < n; i++) {
    const u = (i / n) * total;
    while (s < n - 1 && cumulative[s] <= u) s++;
    guide[i] = s;
  }
  return guide;
}

/** n bodies drawn independently from the background, scaled xyz interleaved; each one's parent body into `parentOut` when given (length ≥ n). */
export function drawFromBackground(bg: OutlierBackground, n: number, random: Random, parentOut?: Int32Array): Float64Array {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`drawFromBackground: n must be a whole number, got ${n}`);
  if (parentOut !== undefined && parentOut.length < n) throw new RangeError(`drawFromBackground: parent buffer of ${parentOut.length} for ${n} bodies`);
  const out = new Float64Array(3 * n);
  const total = bg.cumulative[bg.cumulative.length - 1];
  const last = bg.cumulative.length - 1;
  // Weight cap ∞ (the default): every weight 1, so the running sum at position s is s + 1 exactly
  // (integers, exact in doubles) and the first position above u is ⌊u⌋: the body the guide
  // table finds, without its two reads at random places (a third of the draw's time on the bench
  // dump's 1.5 M bodies: 1.15 → 0.85 s CPU).
  const unitWeights = bg.weightCap === Infinity;
  for (let j = 0; j < n; j++) {
    const u = random() * total;
    const s = unitWeights ? Math.min(Math.floor(u), last) : firstAbove(bg.cumulative, bg.guide, u, total);
    if (parentOut !== undefined) parentOut[j] = s;
    const r = bg.radius[s];
    let dx: number, dy: number, dz: number;
    do {
      dx = 2 * random() - 1;
      dy = 2 * random() - 1;
      dz = 2 * random() - 1;
    } while (dx * dx + dy * dy + dz * dz > 1);
    out[3 * j] = bg.xyz[3 * s] + r * dx;
    out[3 * j + 1] = Math.abs(bg.xyz[3 * s + 1] + r * dy);
    out[3 * j + 2] = Math.abs(bg.xyz[3 * s + 2] + r * dz);
  }
  return out;
}

/**
 * First position whose running sum exceeds u (u in [0, total]; the last position if none does).
 * Starts at the guide entry of u's slice and steps back or forward, so rounding in the slice
 * index cannot change the answer.
 */
function firstAbove(cumulative: Float64Array, guide: Uint32Array, u: number, total: number): number {
  const last = cumulative.length - 1;
  const slice = Math.floor((u / total) * guide.length);
  let s = guide[slice >= 0 ? (slice <= last ? slice : last) : 0]; // NaN (all weights 0) → 0
  while (s > 0 && cumulative[s - 1] > u) s--;
  while (s < last && cumulative[s] <= u) s++;
  return s;
}
