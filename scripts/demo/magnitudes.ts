/**
 * Absolute magnitudes drawn from a power law: cumulative number N(<H) ∝ 10^(αH) between
 * hMin and hMax. A slope α near 0.3–0.5 is the common practice for asteroid populations
 * over most of the observed range (from memory); the demo uses one α per population class.
 */
import type { Random } from './random.js';

/** H from the truncated power law by inverse-CDF sampling. */
export function samplePowerLawH(random: Random, hMin: number, hMax: number, alpha: number): number {
  if (!(hMax > hMin) || !(alpha > 0)) {
    throw new RangeError(`samplePowerLawH: need hMax > hMin and alpha > 0, got ${hMin}, ${hMax}, ${alpha}`);
  }
  const lo = 10 ** (alpha * hMin);
  const hi = 10 ** (alpha * hMax);
  return Math.log10(lo + random() * (hi - lo)) / alpha;
}
