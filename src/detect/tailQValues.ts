/**
 * False-discovery-rate adjusted levels (q-values) over a family of tests, by the step-up
 * procedure of Benjamini & Hochberg 1995 (JRSS B 57, 289) in its adjusted form (Yekutieli &
 * Benjamini 1999, J. Stat. Plan. Inference 82, 171, eq. 3; common practice):
 *
 *   q₍ᵢ₎ = min over j ≥ i of  min(1, m·p₍ⱼ₎ / j),   p₍₁₎ ≤ … ≤ p₍ₘ₎ the m tail probabilities.
 *
 * Listing every test with q < Q is the procedure at level Q: when the tail probabilities are
 * valid (uniform or conservative under the null) and independent or positively dependent, the
 * expected share of false discoveries among those listed is at most Q·m₀/m (m₀ the true nulls).
 * A q-value is that adjusted level — the smallest Q at which a test would be listed — not the
 * probability that a listed body is real.
 */
import { ascendingOrderOfNonNegative } from './tailAscendingOrder.js';

/**
 * q-values of p (length m, every entry in [0, 1]); with `tested`, only the marked entries form
 * the family (m = their count) and the others get NaN. Ties share the same q.
 */
export function benjaminiHochbergQValues(p: ArrayLike<number>, tested: Uint8Array | null = null): Float64Array {
  if (tested !== null && tested.length !== p.length) throw new RangeError(`benjaminiHochbergQValues: ${tested.length} marks for ${p.length} values`);
  let m = 0;
  for (let j = 0; j < p.length; j++) {
    if (tested !== null && tested[j] === 0) continue;
    if (!(p[j] >= 0 && p[j] <= 1)) throw new RangeError(`benjaminiHochbergQValues: entry ${j} is ${p[j]}, not a tail probability in [0, 1]`);
    m++;
  }
  const positions = new Uint32Array(m);
  m = 0;
  for (let j = 0; j < p.length; j++) if (tested === null || tested[j] !== 0) positions[m++] = j;
  const idx = ascendingOrderOfNonNegative(p, positions); // by p, ties by position
  const q = new Float64Array(p.length).fill(NaN);
  let running = 1;
  for (let r = m - 1; r >= 0; r--) {
    const v = (m * p[idx[r]]) / (r + 1);
    if (v < running) running = v;
    q[idx[r]] = running;
  }
  return q;
}
