/**
 * States at and near the planet's triangular Lagrange points, for demonstrations and
 * synthetic checks: the planet's heliocentric state turned by an angle about its orbital
 * angular momentum. At ±60° this is Lagrange's equilateral solution of the three-body problem
 * (Murray & Dermott 1999, §3.5–3.8 — sections from memory; common practice): Sun, planet and
 * a massless body at the corners of an equilateral triangle, for any eccentricity of the
 * planet, the heliocentric vectors being turned copies of the planet's. Another angle puts
 * the body on the same orbit shape at φ ≈ that angle with δa ≈ 0, i.e. at a turning point
 * of a tadpole (or horseshoe) libration.
 */

/**
 * The state (6 numbers: au, au/day) at out[0..5]: `planetState` (heliocentric, 6 numbers)
 * turned by `angleRad` about r × v (positive: ahead of the planet, towards L4). Rodrigues'
 * rotation formula (common practice).
 */
export function turnedAboutOrbitNormal(planetState: Float64Array, angleRad: number, out: Float64Array): void {
  const [x, y, z, vx, vy, vz] = planetState;
  const hx = y * vz - z * vy, hy = z * vx - x * vz, hz = x * vy - y * vx;
  const h = Math.hypot(hx, hy, hz);
  if (!(h > 0)) throw new RangeError('turnedAboutOrbitNormal: the state has no angular momentum');
  const kx = hx / h, ky = hy / h, kz = hz / h;
  const c = Math.cos(angleRad), s = Math.sin(angleRad);
  for (let o = 0; o < 6; o += 3) {
    const ax = planetState[o], ay = planetState[o + 1], az = planetState[o + 2];
    const kDotA = kx * ax + ky * ay + kz * az;
    out[o] = ax * c + (ky * az - kz * ay) * s + kx * kDotA * (1 - c);
    out[o + 1] = ay * c + (kz * ax - kx * az) * s + ky * kDotA * (1 - c);
    out[o + 2] = az * c + (kx * ay - ky * ax) * s + kz * kDotA * (1 - c);
  }
}
