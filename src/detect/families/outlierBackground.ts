/**
 * The smooth background the null catalogues are drawn from: a variable-kernel density of the
 * observed catalogue (Breiman, Meisel & Purcell 1977, Technometrics 19, 135: each point's
 * kernel as wide as the distance to its k-th nearest neighbour), drawn from as a smoothed
 * bootstrap (Silverman 1986, Density Estimation, §6.4.1):
 *  - an observed body is picked with probability proportional to its weight
 *    w = min(1, cap·ρ_bg/ρ_k) = min(1, cap·e^score) (outlierScore.ts): a body whose
 *    k-nearest density exceeds `cap` times the coarse background (a family member, a clump)
 *    counts only as much as that excess allows, so families are down-weighted without a
 *    family list;
 *  - the new body is placed uniformly in the ball of radius r_k around it (a bounded kernel:
 *    no Gaussian shape is assumed anywhere), the ball point found by rejection from the cube;
 *  - e and sin i cannot be negative: a draw below 0 on those axes is reflected back (the
 *    reflection method at a boundary, Silverman 1986, §2.10).
 * Deviates used per body, in order: one to pick, then three per cube trial until one lies in
 * the ball. A body with r_k = 0 (exact ties) is copied unchanged.
 */
import type { Random } from '../../core/random.js';
import type { IsolationScores } from './outlierScore.js';

export interface OutlierBackground {
  readonly xyz: Float64Array; // the observed scaled coordinates the kernels sit on
  readonly radius: Float64Array; // kernel radius of each, r_k
  readonly cumulative: Float64Array; // running sum of the weights
  readonly weightCap: number; // cap in w = min(1, cap·ρ_bg/ρ_k)
  readonly weightedBodies: number; // Σ w over the catalogue
}

/** Background from a catalogue (scaled xyz) and its isolation scores. */
export function buildOutlierBackground(xyz: Float64Array, scores: IsolationScores, weightCap: number): OutlierBackground {
  if (!(weightCap > 0)) throw new RangeError(`buildOutlierBackground: weight cap must be > 0, got ${weightCap}`);
  const n = xyz.length / 3;
  if (scores.score.length !== n) throw new RangeError(`buildOutlierBackground: ${scores.score.length} scores for ${n} bodies`);
  const k = scores.neighbours.k;
  const radius = new Float64Array(n);
  const cumulative = new Float64Array(n);
  let sum = 0;
  for (let j = 0; j < n; j++) {
    radius[j] = scores.neighbours.distance[j * k + k - 1];
    sum += Math.min(1, weightCap * Math.exp(scores.score[j]));
    cumulative[j] = sum;
  }
  return { xyz, radius, cumulative, weightCap, weightedBodies: sum };
}

/** n bodies drawn independently from the background, scaled xyz interleaved. */
export function drawFromBackground(bg: OutlierBackground, n: number, random: Random): Float64Array {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`drawFromBackground: n must be a whole number, got ${n}`);
  const out = new Float64Array(3 * n);
  const total = bg.cumulative[bg.cumulative.length - 1];
  for (let j = 0; j < n; j++) {
    const s = firstAbove(bg.cumulative, random() * total);
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

/** First position whose running sum exceeds u (u in [0, total)). */
function firstAbove(cumulative: Float64Array, u: number): number {
  let lo = 0;
  let hi = cumulative.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (cumulative[mid] > u) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
