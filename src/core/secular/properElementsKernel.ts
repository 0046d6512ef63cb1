/**
 * Proper elements of one body from its osculating (a, e, i, Ω, ω) at the model epoch, and
 * its reliability code: the one computation behind the per-body and the columnar API.
 *
 * Linear theory (Murray & Dermott 1999, ch. 7; common practice for proper elements of the
 * first generation): the free (proper) vector is the osculating one minus the forced one at
 * the epoch, (h, k) − (h_0, k_0) and (p, q) − (p_0, q_0); proper e and sin i are their
 * lengths; the free frequencies are g = A and s = B; proper a is the osculating a (the
 * linear theory has no secular change of a; short-period terms of ~0.01 au are not removed).
 * The body's epoch is taken to be the model's (the forced vectors turn at g_i, s_i: a year's
 * offset moves g_6's phase by 28″, negligible against the theory's own error).
 */
import { meanMotionResonanceAt } from './meanMotionResonances.js';
import {
  BIT_HIGH_E, BIT_HIGH_I, BIT_MEAN_MOTION_RESONANCE, BIT_NOT_COMPUTED, BIT_OUTSIDE_RANGE, BIT_PLANET_CROSSING,
  BIT_SECULAR_RESONANCE, JUPITER_PERIHELION_AU, MARS_APHELION_AU, SECULAR_ALPHA_MAX, SECULAR_A_MAX_AU,
  SECULAR_A_MIN_AU, SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR, SECULAR_E_MAX, SECULAR_SIN_I_MAX,
} from './reliability.js';
import { interpolateParticleTable, particleTable, type ParticleTable } from './particleTable.js';
import { newTestParticleScratch, newTestParticleSecular, secularFromCoefficients, testParticleSecular, type TestParticleScratch, type TestParticleSecular } from './testParticle.js';
import type { SecularModel } from './types.js';

/** Working memory and results of the kernel (one per thread). */
export interface ProperScratch {
  particle: TestParticleScratch;
  table: ParticleTable; // the model's coefficients tabulated in a (particleTable.ts)
  secular: TestParticleSecular; // the particle's A, B, forced vectors, divisors
  eProper: number; sinIProper: number; // results of the last call
  mmr: number; // index into MAIN_BELT_RESONANCES, −1 when none
}

export function newProperScratch(model: SecularModel): ProperScratch {
  return { particle: newTestParticleScratch(model), table: particleTable(model), secular: newTestParticleSecular(), eProper: NaN, sinIProper: NaN, mmr: -1 };
}

function tooCloseToPlanet(model: SecularModel, aAu: number): boolean {
  for (const p of model.planets) if (Math.min(aAu, p.aAu) / Math.max(aAu, p.aAu) > SECULAR_ALPHA_MAX) return true;
  return false;
}

/**
 * Proper e, sin i into sc.eProper, sc.sinIProper (NaN when not computed) and the particle's
 * frequencies into sc.secular; returns the reliability code. Angles in radians.
 */
export function properElementsKernel(
  model: SecularModel, sc: ProperScratch, aAu: number, e: number, iRad: number, nodeRad: number, periRad: number,
): number {
  sc.eProper = NaN; sc.sinIProper = NaN; sc.mmr = -1;
  const s = sc.secular;
  s.gArcsecPerYear = NaN; s.sArcsecPerYear = NaN; s.hForced = NaN; s.kForced = NaN; s.pForced = NaN; s.qForced = NaN;
  let code = 0;
  if (!(aAu > 0 && e >= 0 && e < 1 && Number.isFinite(iRad + nodeRad + periRad))) return BIT_NOT_COMPUTED;
  if (aAu < SECULAR_A_MIN_AU || aAu > SECULAR_A_MAX_AU) code |= BIT_OUTSIDE_RANGE;
  if (aAu * (1 - e) < MARS_APHELION_AU || aAu * (1 + e) > JUPITER_PERIHELION_AU) code |= BIT_PLANET_CROSSING;
  if (e > SECULAR_E_MAX) code |= BIT_HIGH_E;
  const sinI = Math.sin(iRad);
  if (Math.abs(sinI) > SECULAR_SIN_I_MAX) code |= BIT_HIGH_I;
  sc.mmr = meanMotionResonanceAt(aAu);
  if (sc.mmr >= 0) code |= BIT_MEAN_MOTION_RESONANCE;
  if (tooCloseToPlanet(model, aAu)) return code | BIT_NOT_COMPUTED;
  if (interpolateParticleTable(sc.table, aAu, sc.particle.coef)) secularFromCoefficients(model, sc.particle.coef, s);
  else testParticleSecular(model, aAu, sc.particle, s);
  if (s.minDivisorG < SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR || s.minDivisorS < SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR) code |= BIT_SECULAR_RESONANCE;
  const varpi = nodeRad + periRad;
  sc.eProper = Math.hypot(e * Math.sin(varpi) - s.hForced, e * Math.cos(varpi) - s.kForced);
  sc.sinIProper = Math.hypot(sinI * Math.sin(nodeRad) - s.pForced, sinI * Math.cos(nodeRad) - s.qForced);
  if (sc.eProper > SECULAR_E_MAX) code |= BIT_HIGH_E;
  if (sc.sinIProper > SECULAR_SIN_I_MAX) code |= BIT_HIGH_I;
  return code;
}
