/**
 * Newtonian point-mass attraction and its gradient (the gravity gradient tensor), for a
 * massless test body in a heliocentric frame. Murray & Dermott 1999, Solar System Dynamics,
 * eq. 6.8 (heliocentric equations of motion: direct term −μ_j d/|d|³ and indirect term
 * −μ_j r_j/|r_j|³ from the acceleration of the Sun by planet j).
 * Jacobian layout everywhere in forces/: 3×3 row-major, J[3i + j] = ∂a_i/∂x_j.
 */

/**
 * Adds −μ d/|d|³ to acc[o..o+2] for the separation d = body − attractor (au), μ in au³/day².
 * When `grad` is non-null, adds ∂a/∂r = μ (3 d dᵀ/|d|⁵ − I/|d|³) to it.
 */
export function addPointMassAcceleration(mu: number, dx: number, dy: number, dz: number,
  acc: Float64Array, o: number, grad: Float64Array | null): void {
  const d2 = dx * dx + dy * dy + dz * dz;
  const d = Math.sqrt(d2);
  const f = mu / (d2 * d);
  acc[o] -= f * dx;
  acc[o + 1] -= f * dy;
  acc[o + 2] -= f * dz;
  if (grad !== null) {
    const g3 = (3 * f) / d2;
    grad[0] += g3 * dx * dx - f;
    grad[1] += g3 * dx * dy;
    grad[2] += g3 * dx * dz;
    grad[3] += g3 * dy * dx;
    grad[4] += g3 * dy * dy - f;
    grad[5] += g3 * dy * dz;
    grad[6] += g3 * dz * dx;
    grad[7] += g3 * dz * dy;
    grad[8] += g3 * dz * dz - f;
  }
}
