/**
 * Samplers of the inner-solar-system asteroid classes drawn in osculating elements:
 * Hungarias, Mars-crossers and near-Earth objects (Apollo, Aten, Amor). The main belt is
 * drawn in proper elements (mainBeltBackground.ts). Shapes are the
 * common practice of the trade; the numbers (ranges, scales) are from memory and only need
 * to look like the real belt, not to match it.
 * Class boundaries (common practice): NEO q < 1.3 au; Apollo a > 1 au, q < 1.017 au;
 * Aten a < 1 au, Q > 0.983 au; Amor 1.017 < q < 1.3 au; Mars-crosser 1.3 < q < 1.666 au.
 */
import type { Random } from './random.js';
import { rayleigh, uniform, uniformAngleDeg } from './random.js';
import type { DemoElements } from './types.js';

function randomAngles(random: Random, out: DemoElements): void {
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  out.meanAnomalyDeg = uniformAngleDeg(random);
}

/** Hungarias: a 1.78–2.0 au, e 0.02–0.18, i 16–34°. */
export function sampleHungaria(random: Random, out: DemoElements): void {
  out.aAu = uniform(random, 1.78, 2.0);
  out.e = uniform(random, 0.02, 0.18);
  out.iDeg = uniform(random, 16, 34);
  randomAngles(random, out);
}

/**
 * Shared shape of the q-bounded samplers: a and q uniform in their ranges (in that order,
 * which fixes the demo's random sequence), e = 1 − q/a, i Rayleigh capped at iMaxDeg.
 */
function sampleAQ(random: Random, out: DemoElements, aLo: number, aHi: number, qLo: number, qHi: number, iSigmaDeg: number, iMaxDeg: number): void {
  const a = uniform(random, aLo, aHi);
  const q = uniform(random, qLo, qHi);
  out.aAu = a;
  out.e = 1 - q / a;
  out.iDeg = Math.min(rayleigh(random, iSigmaDeg), iMaxDeg);
  randomAngles(random, out);
}

/** Mars-crossers: 1.3 < q < 1.666 au, a 1.6–3.3 au, i Rayleigh 10°. */
export function sampleMarsCrosser(random: Random, out: DemoElements): void {
  sampleAQ(random, out, 1.7, 3.3, 1.3, 1.666, 10, 45);
}

/** Apollo: a 1.0–2.8 au, q < 1.017 au (q ≥ 0.1 au), i Rayleigh 12°. */
export function sampleApollo(random: Random, out: DemoElements): void {
  sampleAQ(random, out, 1.02, 2.8, 0.1, 1.017, 12, 70);
}

/** Aten: a 0.6–1.0 au, Q > 0.983 au, e ≤ 0.8, i Rayleigh 12°. */
export function sampleAten(random: Random, out: DemoElements): void {
  const a = uniform(random, 0.6, 0.9999);
  const eMin = Math.max(0.983 / a - 1, 0.01);
  out.aAu = a;
  out.e = uniform(random, eMin, Math.max(eMin + 0.05, 0.8));
  out.iDeg = Math.min(rayleigh(random, 12), 70);
  randomAngles(random, out);
}

/** Amor: a 1.1–3.3 au, 1.017 < q < 1.3 au (and e ≥ 0.02), i Rayleigh 12°. */
export function sampleAmor(random: Random, out: DemoElements): void {
  const a = uniform(random, 1.1, 3.3);
  const q = uniform(random, 1.017, Math.min(1.3, 0.98 * a));
  out.aAu = a;
  out.e = 1 - q / a;
  out.iDeg = Math.min(rayleigh(random, 12), 70);
  randomAngles(random, out);
}
