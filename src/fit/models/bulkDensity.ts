/**
 * Bulk densities natural minor bodies can have, and the area-to-mass ratio of a sphere.
 *
 * 500–3500 kg/m³: from porous cometary nuclei (67P: 533 kg/m³, Pätzold et al. 2016, Nature 530,
 * 63) to dense stony asteroids; the measured bulk densities compiled by Carry 2012 (Planetary
 * and Space Science 73, 98) fall in this range except for a few metal-rich bodies (range
 * rounded; from memory of the compilation). Metal-rich bodies are denser, which only lowers
 * A/m and the thermal drift, so the range's lower end is what bounds them from above.
 */
export const DENSITY_MIN_KG_PER_M3 = 500;
export const DENSITY_MAX_KG_PER_M3 = 3500;

/**
 * Area-to-mass ratio of a homogeneous sphere, cross-section over mass:
 * A/m = (π D²/4) / (ρ π D³/6) = 3 / (2 ρ D), m²/kg for ρ in kg/m³ and D in m. Common practice.
 */
export function sphereAreaToMassM2PerKg(diameterM: number, densityKgPerM3: number): number {
  if (!(diameterM > 0) || !(densityKgPerM3 > 0)) {
    throw new RangeError(`sphereAreaToMass: diameter and density must be > 0, got ${diameterM} m, ${densityKgPerM3} kg/m³`);
  }
  return 3 / (2 * densityKgPerM3 * diameterM);
}
