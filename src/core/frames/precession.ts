/**
 * IAU 2006 precession matrix from the J2000 mean equator and equinox to the mean equator
 * and equinox of date, from the equatorial precession angles ζ_A, z_A, θ_A of Capitaine,
 * Wallace & Chapront 2003 (A&A 412, 567, "P03"); IERS Conventions 2010, ch. 5:
 *   P = R3(−z_A) · R2(θ_A) · R3(−ζ_A)
 *   ζ_A =  2.650545″ + 2306.083227″ t + 0.2988499″ t² + 0.01801828″ t³ − 0.000005971″ t⁴ − 0.0000003173″ t⁵
 *   z_A = −2.650545″ + 2306.077181″ t + 1.0927348″ t² + 0.01826837″ t³ − 0.000028596″ t⁴ − 0.0000002904″ t⁵
 *   θ_A =              2004.191903″ t − 0.4294934″ t² − 0.04182264″ t³ − 0.000007089″ t⁴ − 0.0000001274″ t⁵
 * t in Julian centuries of TT from J2000. Frame bias is not included.
 */
import { DAYS_PER_JULIAN_CENTURY, J2000_JD, RAD_PER_ARCSEC } from '../constants.js';

/**
 * Write the 3×3 precession matrix P (row-major) at the TT date into out[offset..offset+8].
 * r_of_date = P · r_J2000; r_J2000 = Pᵀ · r_of_date.
 */
export function precessionMatrixP03(jdTT: number, out: Float64Array, offset = 0): void {
  const t = (jdTT - J2000_JD) / DAYS_PER_JULIAN_CENTURY;
  const zeta =
    (2.650545 + t * (2306.083227 + t * (0.2988499 + t * (0.01801828 + t * (-0.000005971 + t * -0.0000003173))))) *
    RAD_PER_ARCSEC;
  const z =
    (-2.650545 + t * (2306.077181 + t * (1.0927348 + t * (0.01826837 + t * (-0.000028596 + t * -0.0000002904))))) *
    RAD_PER_ARCSEC;
  const theta =
    t * (2004.191903 + t * (-0.4294934 + t * (-0.04182264 + t * (-0.000007089 + t * -0.0000001274)))) * RAD_PER_ARCSEC;
  const cz = Math.cos(zeta), sz = Math.sin(zeta);
  const cZ = Math.cos(z), sZ = Math.sin(z);
  const ct = Math.cos(theta), st = Math.sin(theta);
  // The explicit product R3(−z)·R2(θ)·R3(−ζ) (common practice).
  out[offset + 0] = cZ * ct * cz - sZ * sz;
  out[offset + 1] = -cZ * ct * sz - sZ * cz;
  out[offset + 2] = -cZ * st;
  out[offset + 3] = sZ * ct * cz + cZ * sz;
  out[offset + 4] = -sZ * ct * sz + cZ * cz;
  out[offset + 5] = -sZ * st;
  out[offset + 6] = st * cz;
  out[offset + 7] = -st * sz;
  out[offset + 8] = ct;
}
