/**
 * Step-size criteria of the Gauss–Radau integrator (gaussRadau.ts): the next step from the
 * b coefficients of the step just iterated. Both return a step with the sign of `dt`.
 */

/** A step is redone when the new one is below SAFETY × the old; it grows at most 1/SAFETY (Rein & Spiegel 2015 sec. 2.4). */
export const STEP_SAFETY = 0.25;

/**
 * Rein & Spiegel 2015 (MNRAS 446, 1424): b̃6 = max|b6| / max|F| over the components
 * [0, errorDim) (eq. 10), dt' = dt (ε / b̃6)^(1/7) (eq. 11); `at` is F at the last substep.
 */
export function stepFromB6Ratio(dt: number, n: number, errorDim: number, b: Float64Array, at: Float64Array,
  epsilon: number): number {
  let maxB6 = 0;
  let maxA = 0;
  for (let i = 0; i < errorDim; i++) {
    const bb = Math.abs(b[6 * n + i]);
    const aa = Math.abs(at[i]);
    if (bb > maxB6 || bb !== bb) maxB6 = bb;
    if (aa > maxA || aa !== aa) maxA = aa;
  }
  const errB6 = maxB6 === 0 ? 0 : maxB6 / maxA;
  return errB6 > 0 ? dt * Math.pow(epsilon / errB6, 1 / 7) : dt / STEP_SAFETY;
}

/**
 * Pham, Rein & Spiegel 2024 (Open J. Astrophys. 7, "Re-evaluating the timestep criterion of
 * IAS15", eqs. 11–13 (numbers from memory)): a timescale per body from the acceleration and
 * its first two time derivatives at the end of the step, all from the low-order b's,
 *   τ² = 2 |y⁽²⁾|² / (|y⁽³⁾|² + |y⁽²⁾| |y⁽⁴⁾|),   dt' = (7! ε)^(1/7) min τ,
 * with `stepFactor` = (7! ε)^(1/7). Bodies are groups of 3 components when errorDim is a
 * multiple of 3, else single components. For a circular orbit τ = 1/n, so ε = 1e-9 gives
 * ~36 steps per orbit like eq. 11 of 2015.
 */
export function stepFromDerivatives(dt: number, n: number, errorDim: number, b: Float64Array, a0: Float64Array,
  stepFactor: number): number {
  const group = errorDim % 3 === 0 ? 3 : 1;
  let minTau2 = Infinity;
  for (let k = 0; k < errorDim; k += group) {
    let y2 = 0, y3 = 0, y4 = 0;
    for (let i = k; i < k + group; i++) {
      const b0 = b[i], b1 = b[n + i], b2 = b[2 * n + i], b3 = b[3 * n + i];
      const b4 = b[4 * n + i], b5 = b[5 * n + i], b6 = b[6 * n + i];
      const f = a0[i] + b0 + b1 + b2 + b3 + b4 + b5 + b6; // F(h = 1)
      const d1 = b0 + 2 * b1 + 3 * b2 + 4 * b3 + 5 * b4 + 6 * b5 + 7 * b6; // dt · dF/dt
      const d2 = 2 * b1 + 6 * b2 + 12 * b3 + 20 * b4 + 30 * b5 + 42 * b6; // dt² · d²F/dt²
      y2 += f * f;
      y3 += d1 * d1;
      y4 += d2 * d2;
    }
    const tau2 = (2 * y2) / (y3 + Math.sqrt(y4 * y2)); // in units of dt²
    // Bodies with no usable timescale (0/0, or no force variation) do not vote; non-finite
    // forces were already caught by the corrector.
    if (tau2 > 0 && tau2 < minTau2) minTau2 = tau2;
  }
  if (minTau2 === Infinity) return dt / STEP_SAFETY;
  return Math.sqrt(minTau2) * dt * stepFactor;
}
