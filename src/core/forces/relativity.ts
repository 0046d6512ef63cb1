/**
 * The Sun's first post-Newtonian (Schwarzschild) acceleration on a test body in harmonic
 * (isotropic) coordinates. IERS Conventions 2010 (Petit & Luzum, IERS TN 36), eq. 10.12,
 * Schwarzschild term only (no Lense–Thirring, no de Sitter), with the PPN parameters
 * β = γ = 1 (Damour, Soffel & Xu 1991 framework):
 *   a = μ/(c² r³) { [2(β+γ) μ/r − γ v²] r + 2(1+γ)(r·v) v }
 *     = μ/(c² r³) { (4μ/r − v²) r + 4 (r·v) v }.
 * Its secular effect is the perihelion advance 6πμ/(c² a (1 − e²)) per orbit.
 */

/**
 * Adds the 1PN acceleration for heliocentric position (x, y, z) au and velocity
 * (vx, vy, vz) au/day to acc[o..o+2]. μ in au³/day², c in au/day. When gradR/gradV are
 * non-null, adds ∂a/∂r and ∂a/∂v (3×3 row-major).
 */
export function addSchwarzschildAcceleration(mu: number, cAuPerDay: number,
  x: number, y: number, z: number, vx: number, vy: number, vz: number,
  acc: Float64Array, o: number, gradR: Float64Array | null, gradV: Float64Array | null): void {
  const r2 = x * x + y * y + z * z;
  const r = Math.sqrt(r2);
  const v2 = vx * vx + vy * vy + vz * vz;
  const s = x * vx + y * vy + z * vz; // r·v
  const k = mu / (cAuPerDay * cAuPerDay * r2 * r); // μ/(c² r³)
  const f = (4 * mu) / r - v2;
  acc[o] += k * (f * x + 4 * s * vx);
  acc[o + 1] += k * (f * y + 4 * s * vy);
  acc[o + 2] += k * (f * z + 4 * s * vz);
  if (gradR === null || gradV === null) return;
  // ∂a/∂r = k [ f I − 4μ r rᵀ/r³ − 3 f r rᵀ/r² + 4 v vᵀ − 12 s v rᵀ/r² ]
  // ∂a/∂v = k [ −2 r vᵀ + 4 v rᵀ + 4 s I ]
  const crr = (-4 * mu) / (r2 * r) - (3 * f) / r2;
  const cvr = (-12 * s) / r2;
  for (let i = 0; i < 3; i++) {
    const ri = i === 0 ? x : i === 1 ? y : z;
    const vi = i === 0 ? vx : i === 1 ? vy : vz;
    for (let j = 0; j < 3; j++) {
      const rj = j === 0 ? x : j === 1 ? y : z;
      const vj = j === 0 ? vx : j === 1 ? vy : vz;
      const diag = i === j ? 1 : 0;
      gradR[3 * i + j] += k * (f * diag + crr * ri * rj + 4 * vi * vj + cvr * vi * rj);
      gradV[3 * i + j] += k * (-2 * ri * vj + 4 * vi * rj + 4 * s * diag);
    }
  }
}
