/**
 * When linear secular theory cannot be trusted for a body: the reasons, as bits of one
 * reliability code (0 = none found), with their ids and thresholds. A body with any bit set
 * carries the flag `proper-unreliable`; its proper elements are still given where they
 * could be computed, never silently trusted.
 */
import { PLANET_MEAN_A_AU, PLANET_MEAN_E } from '../constants.js';

export const PROPER_UNRELIABLE_FLAG = 'proper-unreliable';

/**
 * Range of a the theory is used in: Mars's aphelion region below, the zone where Jupiter's
 * α > 0.8 and the second-order expansion fails above (chosen; the classical main belt is
 * 2.1–3.3 au, its outer part to the 3:2 resonance at 3.97 au, common practice).
 */
export const SECULAR_A_MIN_AU = 1.7;
export const SECULAR_A_MAX_AU = 4.2;
/** Orbit crosses Mars's or Jupiter's: q below Mars's aphelion or Q above Jupiter's perihelion (mean J2000 elements, constants.ts). */
export const MARS_APHELION_AU = PLANET_MEAN_A_AU.mars * (1 + PLANET_MEAN_E.mars);
export const JUPITER_PERIHELION_AU = PLANET_MEAN_A_AU.jupiter * (1 - PLANET_MEAN_E.jupiter);
/**
 * The theory is of second order in e and sin i: beyond these the neglected fourth-order
 * terms (e⁴, e² sin² i, relative size e², sin² i ≈ 0.09) exceed ~10 % of the kept ones
 * (chosen from that estimate; the Hungarias, Phocaeas and Pallas lie beyond the i limit).
 */
export const SECULAR_E_MAX = 0.3;
export const SECULAR_SIN_I_MAX = 0.3; // i ≈ 17.5°
/**
 * Small divisors: |A − g_i| or |B − s_i| below this (arcsec/yr) marks a secular resonance
 * (ν_i, ν_1i). Chosen: near ν6 (dA/da ≈ 26″/yr per au at 2 au) it spans ±0.08 au, about
 * the band where the forced eccentricity of the theory exceeds 0.1 (measured in
 * test/core/secularTheory.test.ts).
 */
export const SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR = 2;
/** Largest a ratio to any planet for which the theory is evaluated at all (Laplace series cost and meaning). */
export const SECULAR_ALPHA_MAX = 0.98;

export const RELIABILITY_REASONS = [
  { id: 'outside-range', text: `semimajor axis outside ${SECULAR_A_MIN_AU}–${SECULAR_A_MAX_AU} au, where the linear theory is used` },
  { id: 'planet-crossing', text: `orbit crosses Mars's (q < ${MARS_APHELION_AU.toFixed(3)} au) or Jupiter's (Q > ${JUPITER_PERIHELION_AU.toFixed(3)} au)` },
  { id: 'high-eccentricity', text: `eccentricity above ${SECULAR_E_MAX} (second-order theory)` },
  { id: 'high-inclination', text: `sin i above ${SECULAR_SIN_I_MAX} (second-order theory)` },
  { id: 'secular-resonance', text: `within ${SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR}″/yr of a secular resonance (small divisor A − g_i or B − s_i)` },
  { id: 'mean-motion-resonance', text: 'inside a mean-motion resonance band' },
  { id: 'not-computed', text: `not computed: bad elements (a ≤ 0, e ≥ 1 or missing) or a within a factor ${SECULAR_ALPHA_MAX} of a planet's` },
] as const;
export type ReliabilityReasonId = (typeof RELIABILITY_REASONS)[number]['id'];

/** Bit of a reason in the reliability code. */
export function reliabilityBit(id: ReliabilityReasonId): number {
  return 1 << RELIABILITY_REASONS.findIndex((r) => r.id === id);
}

export const BIT_OUTSIDE_RANGE = 1, BIT_PLANET_CROSSING = 2, BIT_HIGH_E = 4, BIT_HIGH_I = 8;
export const BIT_SECULAR_RESONANCE = 16, BIT_MEAN_MOTION_RESONANCE = 32, BIT_NOT_COMPUTED = 64;

/** Reason ids set in a reliability code, in RELIABILITY_REASONS order. */
export function reliabilityReasonIds(code: number): ReliabilityReasonId[] {
  return RELIABILITY_REASONS.filter((_, b) => code & (1 << b)).map((r) => r.id);
}
