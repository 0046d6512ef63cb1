/**
 * The test-particle coefficients (testParticle.ts: A, ν_i, μ_i) tabulated in a for one model,
 * so that a catalogue of millions of bodies needs no Laplace series per body. They are smooth
 * functions of a between the planets (the divisors A − g_i, which are not, are applied after
 * interpolation), so 4-point Lagrange interpolation on a 0.0005 au grid reproduces the direct
 * values within 2.2e-10 of each coefficient's largest value over 1.7–4.85 au (measured in
 * test/core/secularTheory.test.ts; largest near 1.7 au, where Mars's terms change fastest).
 * The grid spans 1.56–4.9 au (Mars's α ≤ 0.977, Jupiter's ≤ 0.942); bodies outside it are
 * computed directly.
 */
import { particleCoefficientCount, particleCoefficients } from './testParticle.js';
import type { SecularModel } from './types.js';

export const PARTICLE_TABLE_MIN_AU = 1.56;
export const PARTICLE_TABLE_MAX_AU = 4.9;
export const PARTICLE_TABLE_STEP_AU = 0.0005;

export interface ParticleTable {
  minAu: number; stepAu: number; nodes: number;
  stride: number; // values per node (particleCoefficientCount)
  values: Float64Array; // nodes × stride, node k at a = minAu + k·stepAu
}

const cache = new WeakMap<SecularModel, ParticleTable>();

/** The model's table, built at first use (≈ 6 700 direct evaluations) and kept with the model. */
export function particleTable(model: SecularModel): ParticleTable {
  let t = cache.get(model);
  if (t) return t;
  const stride = particleCoefficientCount(model);
  const nodes = Math.round((PARTICLE_TABLE_MAX_AU - PARTICLE_TABLE_MIN_AU) / PARTICLE_TABLE_STEP_AU) + 1;
  const values = new Float64Array(nodes * stride), f = new Float64Array(2);
  for (let k = 0; k < nodes; k++) particleCoefficients(model, PARTICLE_TABLE_MIN_AU + k * PARTICLE_TABLE_STEP_AU, f, values, k * stride);
  t = { minAu: PARTICLE_TABLE_MIN_AU, stepAu: PARTICLE_TABLE_STEP_AU, nodes, stride, values };
  cache.set(model, t);
  return t;
}

/**
 * Interpolated coefficients at aAu into out[0…stride−1]; false (out untouched) when aAu is
 * not between the second and the second-to-last node.
 */
export function interpolateParticleTable(t: ParticleTable, aAu: number, out: Float64Array): boolean {
  const x = (aAu - t.minAu) / t.stepAu;
  const k = Math.floor(x);
  if (!(k >= 1 && k <= t.nodes - 3)) return false;
  const u = x - k; // in [0, 1): nodes k−1, k, k+1, k+2 at u = −1, 0, 1, 2
  // 4-point Lagrange weights (Abramowitz & Stegun 25.2.13)
  const w0 = (-u * (u - 1) * (u - 2)) / 6, w1 = ((u + 1) * (u - 1) * (u - 2)) / 2;
  const w2 = (-(u + 1) * u * (u - 2)) / 2, w3 = ((u + 1) * u * (u - 1)) / 6;
  const s = t.stride, v = t.values, b = (k - 1) * s;
  for (let c = 0; c < s; c++) out[c] = w0 * v[b + c] + w1 * v[b + s + c] + w2 * v[b + 2 * s + c] + w3 * v[b + 3 * s + c];
  return true;
}
