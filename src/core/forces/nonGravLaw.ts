/**
 * Radial laws g(r) that scale the non-gravitational parameters A1, A2, A3.
 *
 * 'comet-water': the water-ice sublimation law of Marsden, Sekanina & Yeomans 1973
 * (AJ 78, 211, eq. 4 and its constants):
 *   g(r) = α (r/r0)^(−m) (1 + (r/r0)^n)^(−k),
 *   α = 0.111262, r0 = 2.808 au, m = 2.15, n = 5.093, k = 4.6142, so that g(1 au) ≈ 1.
 * 'inverse-square': g(r) = (1 au / r)², the transverse thermal-drift (Yarkovsky-type) law
 * with exponent d = 2 of Farnocchia et al. 2013 (Icarus 224, 1, eq. 3: a_t = A2 (r0/r)^d,
 * r0 = 1 au).
 */
export type NonGravLaw = 'comet-water' | 'inverse-square';

/** Marsden, Sekanina & Yeomans 1973 constants (AJ 78, 211). */
export const MSY_ALPHA = 0.111262;
export const MSY_R0_AU = 2.808;
export const MSY_M = 2.15;
export const MSY_N = 5.093;
export const MSY_K = 4.6142;

/** g(r) for the comet water-ice law; r in au. */
export function marsdenG(rAu: number): number {
  const u = rAu / MSY_R0_AU;
  return MSY_ALPHA * Math.pow(u, -MSY_M) * Math.pow(1 + Math.pow(u, MSY_N), -MSY_K);
}

/**
 * g(r) and dg/dr (per au) of a law, written to out[o], out[o + 1].
 * d/dr of the comet law: g · (−m/r − k n uⁿ / (r (1 + uⁿ))), u = r/r0.
 */
export function nonGravG(law: NonGravLaw, rAu: number, out: Float64Array, o = 0): void {
  if (law === 'inverse-square') {
    const inv = 1 / rAu;
    out[o] = inv * inv;
    out[o + 1] = -2 * inv * inv * inv;
    return;
  }
  const u = rAu / MSY_R0_AU;
  const un = Math.pow(u, MSY_N);
  const g = MSY_ALPHA * Math.pow(u, -MSY_M) * Math.pow(1 + un, -MSY_K);
  out[o] = g;
  out[o + 1] = g * (-MSY_M / rAu - (MSY_K * MSY_N * un) / (rAu * (1 + un)));
}
