/**
 * The trade's velocity metric between bodies in proper-element space (a, e, sin i):
 *
 *   d = n·a · √( k_a (δa/a)² + k_e (δe)² + k_i (δ sin i)² ),  k_a = 5/4, k_e = 2, k_i = 2
 *
 * Zappalà, Cellino, Farinella & Knežević 1990, AJ 100, 2030 (the "standard metric" of the
 * hierarchical clustering method; weights as published there). n·a = √(GM_sun / a) is the
 * circular orbital speed at a (Kepler's third law, n² a³ = GM).
 *
 * Which a: one reference a for the whole set being clustered (a region of the belt), used
 * both in n·a and in δa/a. Common practice is the mean a of the pair or of the family; a fixed
 * reference turns d into a plain Euclidean distance between transformed points (below), which
 * is what the grid index needs. Across a belt region (2.5 → 2.82 au) the factor √(aRef/a)
 * that a per-pair choice would change stays within about ±6 %.
 */
import { GM_SUN_NOMINAL_M3_PER_S2, M_PER_AU } from '../../core/constants.js';

/** Weight of (δa/a)²: Zappalà et al. 1990. */
export const METRIC_K_A = 5 / 4;
/** Weight of (δe)²: Zappalà et al. 1990. */
export const METRIC_K_E = 2;
/** Weight of (δ sin i)²: Zappalà et al. 1990. */
export const METRIC_K_SIN_I = 2;

/** Circular orbital speed n·a = √(GM_sun / a) in m/s at semimajor axis `aAu` (Kepler's third law). */
export function orbitalSpeedMPerS(aAu: number): number {
  if (!(aAu > 0)) throw new RangeError(`orbitalSpeedMPerS: a must be a positive number of au, got ${aAu}`);
  return Math.sqrt(GM_SUN_NOMINAL_M3_PER_S2 / (aAu * M_PER_AU));
}

/**
 * The metric between two bodies in m/s with n·a and δa/a taken at `aRefAu` (see the file
 * comment). NaN when any element is NaN.
 */
export function velocityDistanceMPerS(
  a1Au: number, e1: number, sinI1: number,
  a2Au: number, e2: number, sinI2: number,
  aRefAu: number,
): number {
  const da = (a1Au - a2Au) / aRefAu;
  const de = e1 - e2;
  const ds = sinI1 - sinI2;
  return orbitalSpeedMPerS(aRefAu) * Math.sqrt(METRIC_K_A * da * da + METRIC_K_E * de * de + METRIC_K_SIN_I * ds * ds);
}

/** Bodies as points whose Euclidean distances are the velocity metric, in m/s. */
export interface VelocitySpace {
  readonly xMPerS: Float64Array; // n·a·√k_a · a/aRef
  readonly yMPerS: Float64Array; // n·a·√k_e · e
  readonly zMPerS: Float64Array; // n·a·√k_i · sin i
  readonly aRefAu: number;       // the reference a of n·a and δa/a
}

/**
 * Transform proper elements into velocity space at `aRefAu`: |p − q| equals
 * velocityDistanceMPerS(…, aRefAu). NaN elements give NaN coordinates (the grid leaves such
 * points out).
 */
export function toVelocitySpace(aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>, aRefAu: number): VelocitySpace {
  const n = aAu.length;
  if (e.length !== n || sinI.length !== n) {
    throw new RangeError(`toVelocitySpace: columns differ in length (a ${n}, e ${e.length}, sin i ${sinI.length})`);
  }
  const v = orbitalSpeedMPerS(aRefAu);
  const ka = (v * Math.sqrt(METRIC_K_A)) / aRefAu;
  const ke = v * Math.sqrt(METRIC_K_E);
  const ki = v * Math.sqrt(METRIC_K_SIN_I);
  const xMPerS = new Float64Array(n);
  const yMPerS = new Float64Array(n);
  const zMPerS = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    xMPerS[k] = ka * aAu[k];
    yMPerS[k] = ke * e[k];
    zMPerS[k] = ki * sinI[k];
  }
  return { xMPerS, yMPerS, zMPerS, aRefAu };
}
