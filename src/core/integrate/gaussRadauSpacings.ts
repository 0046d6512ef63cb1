/**
 * Gauss–Radau spacings on [0, 1] and the coefficient tables of the 15th-order integrator.
 *
 * Everhart 1985, "An efficient integrator that uses Gauss-Radau spacings", in Dynamics of
 * Comets: Their Origin and Evolution (IAU Colloq. 83), pp. 185–202: the acceleration over a
 * step is a degree-7 polynomial in the normalised time h = (t - t0)/dt,
 *   F(h) = F0 + b0 h + b1 h^2 + … + b6 h^7                                   (Everhart eq. 4)
 * and equivalently in Newton (divided-difference) form through the substep nodes,
 *   F(h) = F0 + g0 h + g1 h (h - h1) + … + g6 h (h - h1)…(h - h6)            (Everhart eq. 5)
 * The spacings h1…h7 are the Gauss–Radau nodes (fixed left end point) of order 8 on [0, 1]:
 * the zeros of [P7(x) + P8(x)]/(1 + x) with x = 2h - 1 (Abramowitz & Stegun 1964, 25.4.31).
 * The tables below are derived from the spacings at module load (no transcribed digits
 * beyond the spacings themselves, which are checked against the Legendre polynomials in tests).
 */

/** h0 = 0 and the seven Gauss–Radau spacings h1…h7 (Everhart 1985, Table of spacings). */
export const RADAU_SPACINGS: Float64Array = Float64Array.of(
  0,
  0.0562625605369221464656521910318,
  0.180240691736892364987579942780,
  0.352624717113169637373907769648,
  0.547153626330555383001448554766,
  0.734210177215410531523210605558,
  0.885320946839095768090359771030,
  0.977520613561287501891174488626,
);

/**
 * Reciprocal node differences for the divided-difference recursion:
 * RADAU_INV_DIFF[7 * n + j] = 1 / (h_n - h_j) for 0 ≤ j < n ≤ 7.
 */
export const RADAU_INV_DIFF: Float64Array = (() => {
  const out = new Float64Array(64);
  for (let n = 1; n < 8; n++) {
    for (let j = 0; j < n; j++) out[7 * n + j] = 1 / (RADAU_SPACINGS[n] - RADAU_SPACINGS[j]);
  }
  return out;
})();

/**
 * G_TO_B[7 * k + m] = coefficient of h^(m+1) in P_k(h) = h (h - h1)…(h - hk), so that
 * b_m = Σ_{k ≥ m} G_TO_B[7k + m] g_k (Everhart eq. 7, the "c" coefficients).
 */
export const G_TO_B: Float64Array = (() => {
  const out = new Float64Array(49);
  // poly[p] = coefficient of h^p in the running product, starting from P_0 = h.
  const poly = new Float64Array(9);
  poly[1] = 1;
  for (let k = 0; k < 7; k++) {
    if (k > 0) {
      const hk = RADAU_SPACINGS[k];
      for (let p = k + 1; p >= 1; p--) poly[p] = poly[p - 1] - hk * poly[p];
      poly[0] = 0;
    }
    for (let m = 0; m <= k; m++) out[7 * k + m] = poly[m + 1];
  }
  return out;
})();

/**
 * B_TO_G[7 * m + k]: the inverse map, g_k = Σ_{m ≥ k} B_TO_G[7m + k] b_m (Everhart eq. 8,
 * the "d" coefficients), by back substitution of the unit upper-triangular G_TO_B.
 */
export const B_TO_G: Float64Array = (() => {
  // U[m][k] = G_TO_B[7k + m] (nonzero for m ≤ k, U[m][m] = 1); solve U X = I for X = U^-1.
  const inv = new Float64Array(49);
  for (let col = 0; col < 7; col++) {
    for (let row = 6; row >= 0; row--) {
      let s = row === col ? 1 : 0;
      for (let k = row + 1; k < 7; k++) s -= G_TO_B[7 * k + row] * inv[7 * k + col];
      inv[7 * row + col] = s; // X[row][col]: g_row = Σ_col X[row][col] b_col
    }
  }
  const out = new Float64Array(49);
  for (let k = 0; k < 7; k++) for (let m = 0; m < 7; m++) out[7 * m + k] = inv[7 * k + m];
  return out;
})();
