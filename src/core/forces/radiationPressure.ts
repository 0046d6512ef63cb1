/**
 * Solar radiation pressure on a body of area-to-mass ratio A/m (m²/kg) and radiation
 * pressure coefficient C_R (1 = perfect absorber), radial and falling off as 1/r²:
 *   a = C_R · (S/c) · (A/m) · (1 au / r)² ê_R
 * with S the nominal total solar irradiance at 1 au (IAU 2015 Resolution B3: 1361 W m⁻²) and
 * c the speed of light: the "cannonball" model of Montenbruck & Gill 2000, Satellite Orbits,
 * sec. 3.4 (section number from memory), scaled by the inverse square of the Sun distance.
 */
import { C_M_PER_S, M_PER_AU, SECONDS_PER_DAY, SOLAR_IRRADIANCE_1AU_W_PER_M2 } from '../constants.js';

/** m/s² → au/day². */
export const AU_PER_DAY2_PER_M_PER_S2 = (SECONDS_PER_DAY * SECONDS_PER_DAY) / M_PER_AU;

/** Radiation pressure at 1 au, (S/c), in N/m² = Pa. */
export const SOLAR_PRESSURE_1AU_PA = SOLAR_IRRADIANCE_1AU_W_PER_M2 / C_M_PER_S;

/** Radial acceleration magnitude at distance rAu, m/s². */
export function radiationPressureMPerS2(areaToMassM2PerKg: number, cr: number, rAu: number): number {
  return (cr * SOLAR_PRESSURE_1AU_PA * areaToMassM2PerKg) / (rAu * rAu);
}

/**
 * Adds the radiation-pressure acceleration for position r = pos[p..p+2] (au) to acc[o..o+2]
 * (au/day²). With `grad` non-null adds ∂a/∂r = K (I/r³ − 3 r rᵀ/r⁵) (K = C_R (S/c)(A/m) in
 * au³/day² units); with `partial` non-null writes ∂a/∂(A/m) to partial[q..q+2].
 */
export function addRadiationPressure(areaToMassM2PerKg: number, cr: number, pos: Float64Array, p: number,
  acc: Float64Array, o: number, grad: Float64Array | null, partial: Float64Array | null, q: number): void {
  const x = pos[p], y = pos[p + 1], z = pos[p + 2];
  const r2 = x * x + y * y + z * z;
  const r = Math.sqrt(r2);
  const unit = cr * SOLAR_PRESSURE_1AU_PA * AU_PER_DAY2_PER_M_PER_S2; // per (m²/kg), at 1 au
  const f = unit / (r2 * r); // a = f (A/m) r_vec
  const k = f * areaToMassM2PerKg;
  acc[o] += k * x;
  acc[o + 1] += k * y;
  acc[o + 2] += k * z;
  if (partial !== null) {
    partial[q] = f * x;
    partial[q + 1] = f * y;
    partial[q + 2] = f * z;
  }
  if (grad !== null) {
    const k3 = (3 * k) / r2;
    grad[0] += k - k3 * x * x; grad[1] -= k3 * x * y; grad[2] -= k3 * x * z;
    grad[3] -= k3 * y * x; grad[4] += k - k3 * y * y; grad[5] -= k3 * y * z;
    grad[6] -= k3 * z * x; grad[7] -= k3 * z * y; grad[8] += k - k3 * z * z;
  }
}
