/**
 * A test particle (massless body) in the planets' secular field: its free frequencies A and
 * B, and the forced (h, k, p, q) at the model epoch.
 *
 * Murray & Dermott 1999, ch. 7 (secular perturbations of a test particle; equation numbers
 * from memory, not quoted), masses m_j/M_sun, α_j ᾱ_j as in secularMatrices.ts:
 *   A   = + n/4 Σ_j m_j α_j ᾱ_j b_{3/2}^(1)(α_j)       (= g, the free precession rate of ϖ)
 *   A_j = − n/4 m_j α_j ᾱ_j b_{3/2}^(2)(α_j)
 *   B   = − A                                           (= s, the free regression rate of Ω)
 *   B_j = + n/4 m_j α_j ᾱ_j b_{3/2}^(1)(α_j)
 *   h_0 = − Σ_i ν_i/(A − g_i) sin(g_i t + β_i),  k_0 the same with cos,  ν_i = Σ_j A_j e_ji
 *   p_0 = − Σ_i μ_i/(B − s_i) sin(s_i t + γ_i),  q_0 the same with cos,  μ_i = Σ_j B_j I_ji
 * At the epoch (t = 0) e_ji sin β_i = E_ji x_i (secularModes.ts), so
 *   h_0 = − Σ_i (Σ_j A_j E_ji) x_i/(A − g_i), and likewise for k_0, p_0, q_0.
 */
import { secularPairFactors, meanMotionArcsecPerYear } from './secularMatrices.js';
import type { SecularModel } from './types.js';

/** What the theory says about a particle at one semimajor axis (fields filled by testParticleSecular). */
export interface TestParticleSecular {
  gArcsecPerYear: number; // A
  sArcsecPerYear: number; // B
  hForced: number; kForced: number; pForced: number; qForced: number; // at the model epoch
  minDivisorG: number; // min_i |A − g_i|, arcsec/yr
  modeG: number; // its mode index i (0-based: 5 = g_6)
  minDivisorS: number; // min over modes with s_i ≠ 0 of |B − s_i|, arcsec/yr
  modeS: number;
}

export function newTestParticleSecular(): TestParticleSecular {
  return { gArcsecPerYear: NaN, sArcsecPerYear: NaN, hForced: NaN, kForced: NaN, pForced: NaN, qForced: NaN, minDivisorG: NaN, modeG: -1, minDivisorS: NaN, modeS: -1 };
}

/** Scratch a caller keeps per thread: the per-body coefficients and the pair factors. */
export interface TestParticleScratch { coef: Float64Array; f: Float64Array }

/** Length of a coefficient record: A, then ν_i (N values), then μ_i (N values). */
export function particleCoefficientCount(model: SecularModel): number {
  return 1 + 2 * model.planets.length;
}

export function newTestParticleScratch(model: SecularModel): TestParticleScratch {
  return { coef: new Float64Array(particleCoefficientCount(model)), f: new Float64Array(2) };
}

/**
 * The coefficients that depend on a alone, into out[o…]: A, then ν_i = Σ_j A_j E_ji and
 * μ_i = Σ_j B_j I_ji for each mode i (smooth in a away from the planets: no divisors yet).
 */
export function particleCoefficients(model: SecularModel, aAu: number, f: Float64Array, out: Float64Array, o = 0): void {
  const planets = model.planets, n = planets.length;
  const n4 = meanMotionArcsecPerYear(aAu) / 4;
  const em = model.eModes.vectors, im = model.iModes.vectors;
  let A = 0;
  for (let i = 0; i < 2 * n; i++) out[o + 1 + i] = 0;
  for (let j = 0; j < n; j++) {
    secularPairFactors(aAu, planets[j].aAu, f);
    const c = n4 * planets[j].massRatio;
    A += c * f[0];
    const aj = -c * f[1], bj = c * f[0];
    for (let i = 0; i < n; i++) {
      out[o + 1 + i] += aj * em[j * n + i];
      out[o + 1 + n + i] += bj * im[j * n + i];
    }
  }
  out[o] = A;
}

/** Frequencies, forced vectors at the epoch and smallest divisors from a coefficient record. */
export function secularFromCoefficients(model: SecularModel, coef: Float64Array, out: TestParticleSecular, o = 0): void {
  const n = model.planets.length, em = model.eModes, im = model.iModes;
  const A = coef[o], B = -A;
  let h0 = 0, k0 = 0, p0 = 0, q0 = 0, dg = Infinity, mg = -1, ds = Infinity, ms = -1;
  for (let i = 0; i < n; i++) {
    const nu = coef[o + 1 + i], mu = coef[o + 1 + n + i];
    const divG = A - em.frequencyArcsecPerYear[i], divS = B - im.frequencyArcsecPerYear[i];
    h0 -= (nu * em.sinPhaseAmplitude[i]) / divG;
    k0 -= (nu * em.cosPhaseAmplitude[i]) / divG;
    p0 -= (mu * im.sinPhaseAmplitude[i]) / divS;
    q0 -= (mu * im.cosPhaseAmplitude[i]) / divS;
    if (Math.abs(divG) < dg) { dg = Math.abs(divG); mg = i; }
    if (im.frequencyArcsecPerYear[i] !== 0 && Math.abs(divS) < ds) { ds = Math.abs(divS); ms = i; }
  }
  out.gArcsecPerYear = A; out.sArcsecPerYear = B;
  out.hForced = h0; out.kForced = k0; out.pForced = p0; out.qForced = q0;
  out.minDivisorG = dg; out.modeG = mg; out.minDivisorS = ds; out.modeS = ms;
}

/**
 * Fill `out` for a particle at aAu, directly from the Laplace series (must differ from every
 * planet's a; RangeError from the Laplace coefficients when α > 0.9999).
 */
export function testParticleSecular(model: SecularModel, aAu: number, scratch: TestParticleScratch, out: TestParticleSecular): void {
  particleCoefficients(model, aAu, scratch.f, scratch.coef, 0);
  secularFromCoefficients(model, scratch.coef, out, 0);
}
