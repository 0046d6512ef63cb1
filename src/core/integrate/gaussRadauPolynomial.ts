/**
 * The arithmetic of one Gauss–Radau step on plain arrays (Everhart 1985, IAU Colloq. 83,
 * pp. 185–202; equation numbers from memory of the paper): the position and velocity
 * polynomials, the divided-difference update of g and b, and the prediction of the next
 * step's b. Arrays hold 7 coefficients × n components as b[m * n + i]. The integrator
 * (gaussRadau.ts) owns the arrays and the step logic.
 */
import { B_TO_G, G_TO_B, RADAU_INV_DIFF } from './gaussRadauSpacings.js';

/**
 * Position and velocity at the fraction h of a step of `dt` (Everhart 1985 eqs. 9–10) from
 * the start state x0, v0, a0 and the step's b, into outX[ox + i] and outV[ov + i].
 */
export function evalRadauPolynomial(h: number, dt: number, n: number, x0: Float64Array, v0: Float64Array,
  a0: Float64Array, b: Float64Array, outX: Float64Array, outV: Float64Array, ox: number, ov: number): void {
  const hdt = h * dt;
  const h2dt2 = hdt * hdt;
  for (let i = 0; i < n; i++) {
    const b0 = b[i], b1 = b[n + i], b2 = b[2 * n + i], b3 = b[3 * n + i];
    const b4 = b[4 * n + i], b5 = b[5 * n + i], b6 = b[6 * n + i];
    // x(h) = x0 + h dt v0 + (h dt)^2 [a0/2 + b0 h/6 + b1 h^2/12 + … + b6 h^7/72]
    const px = ((((((b6 * (1 / 72) * h + b5 * (1 / 56)) * h + b4 * (1 / 42)) * h + b3 * (1 / 30)) * h
      + b2 * (1 / 20)) * h + b1 * (1 / 12)) * h + b0 * (1 / 6)) * h + a0[i] * 0.5;
    // v(h) = v0 + h dt [a0 + b0 h/2 + b1 h^2/3 + … + b6 h^7/8]
    const pv = ((((((b6 * 0.125 * h + b5 * (1 / 7)) * h + b4 * (1 / 6)) * h + b3 * 0.2) * h
      + b2 * 0.25) * h + b1 * (1 / 3)) * h + b0 * 0.5) * h + a0[i];
    outX[ox + i] = x0[i] + (hdt * v0[i] + h2dt2 * px);
    outV[ov + i] = v0[i] + hdt * pv;
  }
}

/**
 * b and g for a step of q times the last accepted one (Everhart 1985 eq. 13): F(1 + q h')
 * of the last step re-expanded in h', plus the correction b − e that the last prediction
 * missed. Writes the bare prediction to `e` for the next call.
 */
export function predictRadauB(q: number, n: number, bDone: Float64Array, eDone: Float64Array,
  b: Float64Array, e: Float64Array, g: Float64Array): void {
  const bd = bDone, ed = eDone;
  const q2 = q * q, q3 = q2 * q, q4 = q3 * q, q5 = q4 * q, q6 = q5 * q, q7 = q6 * q;
  for (let i = 0; i < n; i++) {
    const b0 = bd[i], b1 = bd[n + i], b2 = bd[2 * n + i], b3 = bd[3 * n + i];
    const b4 = bd[4 * n + i], b5 = bd[5 * n + i], b6 = bd[6 * n + i];
    // Binomial coefficients C(m+1, j+1).
    const e0 = q * (b6 * 7 + b5 * 6 + b4 * 5 + b3 * 4 + b2 * 3 + b1 * 2 + b0);
    const e1 = q2 * (b6 * 21 + b5 * 15 + b4 * 10 + b3 * 6 + b2 * 3 + b1);
    const e2 = q3 * (b6 * 35 + b5 * 20 + b4 * 10 + b3 * 4 + b2);
    const e3 = q4 * (b6 * 35 + b5 * 15 + b4 * 5 + b3);
    const e4 = q5 * (b6 * 21 + b5 * 6 + b4);
    const e5 = q6 * (b6 * 7 + b5);
    const e6 = q7 * b6;
    b[i] = e0 + (b0 - ed[i]);
    b[n + i] = e1 + (b1 - ed[n + i]);
    b[2 * n + i] = e2 + (b2 - ed[2 * n + i]);
    b[3 * n + i] = e3 + (b3 - ed[3 * n + i]);
    b[4 * n + i] = e4 + (b4 - ed[4 * n + i]);
    b[5 * n + i] = e5 + (b5 - ed[5 * n + i]);
    b[6 * n + i] = e6 + (b6 - ed[6 * n + i]);
    e[i] = e0; e[n + i] = e1; e[2 * n + i] = e2; e[3 * n + i] = e3;
    e[4 * n + i] = e4; e[5 * n + i] = e5; e[6 * n + i] = e6;
    // g from b (Everhart eq. 8).
    for (let k = 0; k < 7; k++) {
      let s = 0;
      for (let m = k; m < 7; m++) s += B_TO_G[7 * m + k] * b[m * n + i];
      g[k * n + i] = s;
    }
  }
}

/**
 * Divided-difference update of g at substep s (1…7) from the force `at` there, and the
 * matching change of b (Everhart eq. 7). At s = 7 writes the largest |Δg6| = |Δb6| of the
 * components [0, ne) to deltaB6[0] and of [ne, n) to deltaB6[1] (NaN propagates).
 */
export function updateRadauCoefficients(s: number, n: number, ne: number, at: Float64Array, a0: Float64Array,
  g: Float64Array, b: Float64Array, deltaB6: Float64Array): void {
  const k = s - 1; // g index being refined
  const base = 7 * s;
  let maxDelta = 0;
  let maxDeltaVar = 0;
  for (let i = 0; i < n; i++) {
    // g_k = F[h0, h1, …, h_s] by the divided-difference recursion.
    let tmp = (at[i] - a0[i]) * RADAU_INV_DIFF[base];
    for (let j = 1; j < s; j++) tmp = (tmp - g[(j - 1) * n + i]) * RADAU_INV_DIFF[base + j];
    const idx = k * n + i;
    const delta = tmp - g[idx];
    g[idx] = tmp;
    for (let m = 0; m <= k; m++) b[m * n + i] += G_TO_B[7 * k + m] * delta;
    if (s === 7) {
      const ad = Math.abs(delta);
      if (i < ne) {
        if (ad > maxDelta || ad !== ad) maxDelta = ad;
      } else if (ad > maxDeltaVar || ad !== ad) maxDeltaVar = ad;
    }
  }
  if (s === 7) {
    deltaB6[0] = maxDelta;
    deltaB6[1] = maxDeltaVar;
  }
}
