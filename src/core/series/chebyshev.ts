/**
 * Chebyshev approximation on [-1, 1]: fitting at the Chebyshev nodes and evaluation with
 * derivatives. Press, Teukolsky, Vetterling & Flannery, Numerical Recipes, 3rd ed. (2007),
 * §5.8 "Chebyshev Approximation", eqs. 5.8.4–5.8.7 (nodes and coefficients) and §5.9
 * (derivative); Mason & Handscomb, Chebyshev Polynomials (2003), ch. 6 (interpolation at the
 * zeros of T_n, near-minimax). Convention here: f(x) ≈ Σ_{j=0}^{n-1} c_j T_j(x), with c_0
 * already halved (Numerical Recipes keeps c_0 whole and subtracts c_0/2 at evaluation).
 */

/** The k-th of n Chebyshev nodes, x_k = cos(π (k + ½) / n), k = 0..n−1 (NR eq. 5.8.4). */
export function chebyshevNode(k: number, n: number): number {
  return Math.cos((Math.PI * (k + 0.5)) / n);
}

/**
 * Coefficients c_0..c_{n−1} of the degree-(n−1) interpolant through f(x_k), k = 0..n−1,
 * where f(x_k) = values[first + k*stride]: c_j = (2/n) Σ_k f(x_k) cos(π j (k + ½)/n)
 * (NR eq. 5.8.7), c_0 halved. Written to coeffs[coeffOffset .. coeffOffset+n−1].
 */
export function chebyshevFit(
  values: ArrayLike<number>, first: number, stride: number, n: number,
  coeffs: Float64Array, coeffOffset: number,
): void {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`chebyshevFit: n must be a positive integer, got ${n}`);
  for (let j = 0; j < n; j++) {
    let sum = 0;
    for (let k = 0; k < n; k++) {
      sum += values[first + k * stride] * Math.cos((Math.PI * j * (k + 0.5)) / n);
    }
    coeffs[coeffOffset + j] = ((j === 0 ? 1 : 2) * sum) / n;
  }
}

/** Σ c_j T_j(x) by Clenshaw's recurrence (NR eq. 5.8.11, with c_0 pre-halved). */
export function chebyshevValue(coeffs: ArrayLike<number>, offset: number, n: number, x: number): number {
  let b1 = 0;
  let b2 = 0;
  for (let j = n - 1; j >= 1; j--) {
    const b0 = 2 * x * b1 - b2 + coeffs[offset + j];
    b2 = b1;
    b1 = b0;
  }
  return x * b1 - b2 + coeffs[offset];
}

/**
 * Value and d/dx of three series stored back to back (axis a at offset + a*n), at x in
 * [-1, 1]. Values go to out[outOffset .. +2]; when `derivScale` is not 0, derivatives
 * times derivScale (e.g. dx/dt = 2/segment length) go to out[outOffset+3 .. +5].
 * Forward recurrences T_{k+1} = 2x T_k − T_{k−1} and T'_{k+1} = 2 T_k + 2x T'_k − T'_{k−1}
 * (the three-term recurrence, Mason & Handscomb 2003, §1.2, and its term-by-term
 * derivative), stable for |x| ≤ 1.
 */
export function chebyshevValue3(
  coeffs: Float64Array, offset: number, n: number, x: number,
  derivScale: number, out: Float64Array, outOffset: number,
): void {
  const o1 = offset + n;
  const o2 = offset + 2 * n;
  let t0 = 1, t1 = x; // T_{k-1}, T_k
  let d0 = 0, d1 = 1; // T'_{k-1}, T'_k
  let px = coeffs[offset], py = coeffs[o1], pz = coeffs[o2];
  let vx = 0, vy = 0, vz = 0;
  for (let k = 1; k < n; k++) {
    px += coeffs[offset + k] * t1;
    py += coeffs[o1 + k] * t1;
    pz += coeffs[o2 + k] * t1;
    vx += coeffs[offset + k] * d1;
    vy += coeffs[o1 + k] * d1;
    vz += coeffs[o2 + k] * d1;
    const t2 = 2 * x * t1 - t0;
    const d2 = 2 * t1 + 2 * x * d1 - d0;
    t0 = t1; t1 = t2;
    d0 = d1; d1 = d2;
  }
  out[outOffset] = px;
  out[outOffset + 1] = py;
  out[outOffset + 2] = pz;
  if (derivScale !== 0) {
    out[outOffset + 3] = vx * derivScale;
    out[outOffset + 4] = vy * derivScale;
    out[outOffset + 5] = vz * derivScale;
  }
}
