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

/** Scratch a caller keeps per thread: per-planet A_j, B_j and the pair factors. */
export interface TestParticleScratch { aj: Float64Array; bj: Float64Array; f: Float64Array }

export function newTestParticleScratch(model: SecularModel): TestParticleScratch {
  const n = model.planets.length;
  return { aj: new Float64Array(n), bj: new Float64Array(n), f: new Float64Array(2) };
}

/**
 * Fill `out` for a particle at aAu (must differ from every planet's a; throws RangeError
 * from the Laplace coefficients when a planet's orbit is closer than α = 0.9999).
 */
export function testParticleSecular(model: SecularModel, aAu: number, scratch: TestParticleScratch, out: TestParticleSecular): void {
  const planets = model.planets, n = planets.length;
  const n4 = meanMotionArcsecPerYear(aAu) / 4;
  let A = 0;
  for (let j = 0; j < n; j++) {
    secularPairFactors(aAu, planets[j].aAu, scratch.f);
    const c = n4 * planets[j].massRatio;
    A += c * scratch.f[0];
    scratch.aj[j] = -c * scratch.f[1];
    scratch.bj[j] = c * scratch.f[0];
  }
  const B = -A;
  const em = model.eModes, im = model.iModes;
  let h0 = 0, k0 = 0, p0 = 0, q0 = 0, dg = Infinity, mg = -1, ds = Infinity, ms = -1;
  for (let i = 0; i < n; i++) {
    let nu = 0, mu = 0;
    for (let j = 0; j < n; j++) {
      nu += scratch.aj[j] * em.vectors[j * n + i];
      mu += scratch.bj[j] * im.vectors[j * n + i];
    }
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
