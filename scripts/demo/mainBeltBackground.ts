/**
 * The main-belt background in proper elements: one smooth density, no edges or holes made
 * by the generator except the empty pockets below. Proper a from a mixture of three normal
 * laws (inner, middle and outer belt), proper e and sin i from Rayleigh laws; none truncated.
 * The shapes only need to look like a belt (numbers our choice, from memory of the
 * proper-element histograms): the real belt's Kirkwood gaps are not carved, so bodies drawn
 * inside a mean-motion band, near a secular resonance, crossing Mars's orbit or with e or
 * sin i above the theory's limits are drawn like any other, and set apart by the families
 * stage itself. The demo's honest-truth rule on T_J (population.ts) redraws a body only in
 * the sparse outer corner (a ≳ 3.45 au with larger e or i).
 *
 * Empty pockets (POCKETS): balls in the families metric (Zappalà et al. 1990, the scaled
 * coordinates of outlierMetric.ts, velocity n·a at the pocket centre's a) where a drawn
 * background body is drawn again, so the background holds none there. Each holds one planted
 * isolated body at its centre (plantedOutliers.ts): "isolated outliers in empty regions", where
 * the smooth density predicts many bodies and there are none. Outside the pockets the density
 * is the smooth one times 1 / (1 − Σ pocket probabilities) (about 1.34 here).
 */
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT } from '../../src/detect/families/outlierMetric.js';
import type { ProperPlant } from './properToOsculating.js';
import type { Random } from './random.js';
import { normal, pickWeighted, rayleigh } from './random.js';

/** Proper a mixture: [centre au, σ au] and weights (our choice). */
const A_COMPONENTS: readonly (readonly [number, number])[] = [[2.36, 0.16], [2.76, 0.15], [3.08, 0.14]];
const A_WEIGHTS = [0.38, 0.34, 0.28];
/**
 * Rayleigh scales (= modes) of proper e and sin i (our choice, from memory of the main belt's
 * proper-element histograms: e mostly 0.02–0.25, sin i mostly 0.02–0.3, i.e. 1°–17°). sin i:
 * 0.08 (mode 4.6°), between the 0.065 the demo once used and a belt-like 0.10: with 0.10 the
 * demo's background came out at 6.0 % below α = 0.05 (+5σ, test/cli/familiesDemo.test.ts).
 */
export const BACKGROUND_E_SCALE = 0.085;
export const BACKGROUND_SIN_I_SCALE = 0.08;

/** An empty pocket: centre in proper elements and radius in the families metric. */
export interface Pocket { aAu: number; e: number; sinI: number; radiusMPerS: number }

/**
 * The pockets (our choice, measured on the default seed). Centres in the populated part of the
 * belt, where the stage trusts the theory (families.ts lists the a zones), each ball clear of
 * the e and sin i edges (at least 0.03 from 0, at most 0.27 and 0.26 at its rim), of the planted
 * families' parents (by at least the radius plus 500 m/s) and of each other (disjoint in the
 * scaled coordinates); test/demo/demoPockets.test.ts checks these. The balls are wide and reach
 * across mean-motion bands: the detector's coarse background (cells about 0.14 in the scaled
 * coordinates, some 2 500 m/s) reads the belt's core at a quarter to a third of the smooth
 * density, and its null's upper tail (exponential above a score of about 1.2, scale about 0.37)
 * puts a false-alarm probability of 2.6e-5 — what a Benjamini–Hochberg q below 0.05 over ~11 700
 * bodies tested needs for six bodies — near a score of 3.4–3.5. Measured on the default seed:
 * scores 3.45–3.58, false-alarm probabilities 2.0–2.8e-5, q 0.047 for all six; thin margins.
 * The pockets turn away about a quarter of the background's draws (pocketProbability sums to 0.25).
 */
export const POCKETS: readonly Pocket[] = [
  { aAu: 2.67, e: 0.135, sinI: 0.135, radiusMPerS: 1150 },
  { aAu: 2.86, e: 0.08, sinI: 0.085, radiusMPerS: 1170 },
  { aAu: 2.46, e: 0.08, sinI: 0.095, radiusMPerS: 1290 },
  { aAu: 3.01, e: 0.145, sinI: 0.145, radiusMPerS: 1210 },
  { aAu: 2.44, e: 0.185, sinI: 0.085, radiusMPerS: 1470 },
  { aAu: 2.46, e: 0.09, sinI: 0.2, radiusMPerS: 1510 },
];

/** Distance in the families metric from a pocket's centre, m/s (velocity at the centre's a). */
export function pocketDistanceMPerS(p: Pocket, aAu: number, e: number, sinI: number): number {
  const dz = Math.hypot(SCALED_A_WEIGHT * Math.log(aAu / p.aAu), SCALED_E_WEIGHT * (e - p.e), SCALED_SIN_I_WEIGHT * (sinI - p.sinI));
  return orbitalSpeedMPerS(p.aAu) * dz;
}

/** Index of the pocket holding a place, −1 for none. */
export function pocketOf(aAu: number, e: number, sinI: number): number {
  for (let k = 0; k < POCKETS.length; k++) if (pocketDistanceMPerS(POCKETS[k], aAu, e, sinI) < POCKETS[k].radiusMPerS) return k;
  return -1;
}

function sampleSmooth(random: Random, out: ProperPlant): void {
  const [centre, sigma] = A_COMPONENTS[pickWeighted(random, A_WEIGHTS)];
  out.aAu = normal(random, centre, sigma);
  out.e = rayleigh(random, BACKGROUND_E_SCALE);
  out.sinI = Math.min(0.99, rayleigh(random, BACKGROUND_SIN_I_SCALE));
}

/** Most draws of one background body (a pocket holds well under 1 % of the law: never reached). */
const MAX_DRAWS = 1000;

/**
 * One background body: the smooth law, drawn again while it falls in a pocket. `carved[k]`,
 * when given, counts the draws pocket k turned away.
 */
export function sampleBackgroundProper(random: Random, out: ProperPlant, carved?: number[]): void {
  for (let d = 0; d < MAX_DRAWS; d++) {
    sampleSmooth(random, out);
    const k = pocketOf(out.aAu, out.e, out.sinI);
    if (k < 0) return;
    if (carved) carved[k]++;
  }
  throw new Error(`sampleBackgroundProper: ${MAX_DRAWS} draws all fell in pockets`);
}

/** The smooth density sampleBackgroundProper draws from before carving, per unit a (au), e and sin i (the sin i cap at 0.99 ignored). */
export function backgroundDensity(aAu: number, e: number, sinI: number): number {
  let pa = 0;
  A_COMPONENTS.forEach(([centre, sigma], k) => {
    pa += (A_WEIGHTS[k] / (sigma * Math.sqrt(2 * Math.PI))) * Math.exp(-0.5 * ((aAu - centre) / sigma) ** 2);
  });
  const rayleighPdf = (x: number, s: number): number => (x > 0 ? (x / (s * s)) * Math.exp((-x * x) / (2 * s * s)) : 0);
  return pa * rayleighPdf(e, BACKGROUND_E_SCALE) * rayleighPdf(sinI, BACKGROUND_SIN_I_SCALE);
}

/** Quadrature points per axis across a pocket's bounding cube (our choice: the midpoint rule converges far below 1 % here). */
const QUADRATURE_STEPS = 40;

/**
 * Probability that one draw of the smooth law lands in a pocket: the density integrated over
 * the ball by the midpoint rule on a cube of QUADRATURE_STEPS³ cells in the scaled
 * coordinates, each cell's volume taken to (a, e, sin i) by the Jacobian
 * da de d(sin i) = a / (√(5/4) · √2 · √2) dz³. Times the background bodies drawn, this is the
 * count the pocket would hold uncarved.
 */
export function pocketProbability(p: Pocket): number {
  const r = p.radiusMPerS / orbitalSpeedMPerS(p.aAu);
  const h = (2 * r) / QUADRATURE_STEPS;
  const z0 = SCALED_A_WEIGHT * Math.log(p.aAu), z1 = SCALED_E_WEIGHT * p.e, z2 = SCALED_SIN_I_WEIGHT * p.sinI;
  let sum = 0;
  for (let i = 0; i < QUADRATURE_STEPS; i++) {
    const x = -r + (i + 0.5) * h;
    for (let j = 0; j < QUADRATURE_STEPS; j++) {
      const y = -r + (j + 0.5) * h;
      for (let k = 0; k < QUADRATURE_STEPS; k++) {
        const z = -r + (k + 0.5) * h;
        if (x * x + y * y + z * z >= r * r) continue;
        const a = Math.exp((z0 + x) / SCALED_A_WEIGHT);
        sum += backgroundDensity(a, (z1 + y) / SCALED_E_WEIGHT, (z2 + z) / SCALED_SIN_I_WEIGHT) * (a / (SCALED_A_WEIGHT * SCALED_E_WEIGHT * SCALED_SIN_I_WEIGHT));
      }
    }
  }
  return sum * h * h * h;
}
