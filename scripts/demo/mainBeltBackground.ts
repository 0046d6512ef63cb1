/**
 * The main-belt background in proper elements: one smooth density, no edges or holes made
 * by the generator. Proper a from a mixture of three normal laws (inner, middle and outer
 * belt), proper e and sin i from Rayleigh laws; none truncated. The shapes only need to look
 * like a belt (numbers our choice, from memory of the proper-element histograms): the real
 * belt's Kirkwood gaps are not carved, so bodies drawn inside a mean-motion band, near a
 * secular resonance, crossing Mars's orbit or with e or sin i above the theory's limits are
 * drawn like any other, and set apart by the families stage itself. The only cut is the
 * demo's honest-truth rule on T_J (population.ts), which redraws a body only in the sparse
 * outer corner (a ≳ 3.45 au with larger e or i).
 */
import type { ProperPlant } from './properToOsculating.js';
import type { Random } from './random.js';
import { normal, pickWeighted, rayleigh } from './random.js';

/** Proper a mixture: [centre au, σ au] and weights (our choice). */
const A_COMPONENTS: readonly (readonly [number, number])[] = [[2.36, 0.16], [2.76, 0.15], [3.08, 0.14]];
const A_WEIGHTS = [0.38, 0.34, 0.28];
/** Rayleigh scales of proper e and sin i (our choice: modes 0.10 and 0.09, i.e. about 5°). */
export const BACKGROUND_E_SCALE = 0.085;
export const BACKGROUND_SIN_I_SCALE = 0.065;

export function sampleBackgroundProper(random: Random, out: ProperPlant): void {
  const [centre, sigma] = A_COMPONENTS[pickWeighted(random, A_WEIGHTS)];
  out.aAu = normal(random, centre, sigma);
  out.e = rayleigh(random, BACKGROUND_E_SCALE);
  out.sinI = Math.min(0.99, rayleigh(random, BACKGROUND_SIN_I_SCALE));
}

/** The density sampleBackgroundProper draws from, per unit a (au), e and sin i (the sin i cap at 0.99 ignored). */
export function backgroundDensity(aAu: number, e: number, sinI: number): number {
  let pa = 0;
  A_COMPONENTS.forEach(([centre, sigma], k) => {
    pa += (A_WEIGHTS[k] / (sigma * Math.sqrt(2 * Math.PI))) * Math.exp(-0.5 * ((aAu - centre) / sigma) ** 2);
  });
  const rayleighPdf = (x: number, s: number): number => (x > 0 ? (x / (s * s)) * Math.exp((-x * x) / (2 * s * s)) : 0);
  return pa * rayleighPdf(e, BACKGROUND_E_SCALE) * rayleighPdf(sinI, BACKGROUND_SIN_I_SCALE);
}
