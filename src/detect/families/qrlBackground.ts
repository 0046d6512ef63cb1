/**
 * A smooth random background with the large-scale density of a set of proper elements, for
 * the quasi-random level (qrlCutoff.ts): bodies are binned in a, and within each bin the e
 * values and the sin i values are each permuted at random among the bin's bodies. The
 * distribution of a is kept exactly, and so are the distributions of e and of sin i within
 * each a bin, while the clumps that families make in (a, e, sin i) together are broken up.
 * After the quasi-random populations of Zappalà et al. 1995 (Icarus 116, 291), which draw
 * each element from its observed distribution; the binning in a is our choice.
 */
import type { Random } from '../../core/random.js';

/** Background elements; a is the input's (copied), e and sin i permuted within a bins. */
export interface Background {
  readonly aAu: Float64Array;
  readonly e: Float64Array;
  readonly sinI: Float64Array;
}

/** A copy of the three columns to draw a background into; `caller` names the misuse. */
export function copyColumns(caller: string, aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>): Background {
  if (e.length !== aAu.length || sinI.length !== aAu.length) {
    throw new RangeError(`${caller}: columns differ in length (a ${aAu.length}, e ${e.length}, sin i ${sinI.length})`);
  }
  return { aAu: Float64Array.from(aAu), e: Float64Array.from(e), sinI: Float64Array.from(sinI) };
}

/** One background from `random`; bins of `binWidthAu` in a. Rows with NaN a keep their values. */
export function shuffledBackground(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, binWidthAu: number, random: Random): Background {
  const out = copyColumns('shuffledBackground', aAu, e, sinI);
  const n = aAu.length;
  if (!(binWidthAu > 0)) throw new RangeError(`shuffledBackground: bin width must be positive au, got ${binWidthAu}`);
  const bin = new Float64Array(n);
  const ids: number[] = [];
  for (let k = 0; k < n; k++) {
    bin[k] = Math.floor(aAu[k] / binWidthAu);
    if (bin[k] === bin[k]) ids.push(k);
  }
  ids.sort((p, q) => bin[p] - bin[q] || p - q);
  for (let s = 0; s < ids.length;) {
    let t = s + 1;
    while (t < ids.length && bin[ids[t]] === bin[ids[s]]) t++;
    permuteAt(out.e, e, ids, s, t, random);
    permuteAt(out.sinI, sinI, ids, s, t, random);
    s = t;
  }
  return out;
}

/** out[ids[k]] = src[ids[π(k)]] for k in [s, t), π a uniform random permutation (Fisher–Yates). */
function permuteAt(out: Float64Array, src: ArrayLike<number>, ids: number[], s: number, t: number, random: Random): void {
  const m = t - s;
  const perm = new Int32Array(m);
  for (let k = 0; k < m; k++) perm[k] = k;
  for (let k = m - 1; k > 0; k--) {
    const j = Math.floor(random() * (k + 1));
    const tmp = perm[k]; perm[k] = perm[j]; perm[j] = tmp;
  }
  for (let k = 0; k < m; k++) out[ids[s + k]] = src[ids[s + perm[k]]];
}
