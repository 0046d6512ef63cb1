/**
 * Yarkovsky drift of a family member's semimajor axis since the break-up, a spread ∝ 1/D:
 *   δa = (da/dt)₁ · (1 km / D) · cos γ · age,
 * with (da/dt)₁ the largest drift rate of a 1 km body, cos γ uniform in [−1, 1] (spin axes
 * isotropic at the break-up; the real obliquities drift towards 0° and 180° later, ignored
 * here) and D from H and the albedo (diameterFromH). The rate is from memory: of order
 * 2 × 10⁻⁴ au/Myr for a 1 km main-belt body (Bottke et al. 2006, Annu. Rev. Earth Planet.
 * Sci. 34, 157), taken the same everywhere in the belt (our simplification).
 */
import type { Random } from './random.js';

/** Largest Yarkovsky drift rate of a 1 km body, au/Myr (from memory, see the file comment). */
export const YARKOVSKY_AU_PER_MYR_1KM = 2e-4;

/**
 * Diameter in km from absolute magnitude H and geometric albedo p_V:
 * D = 1329 km / √p_V · 10^(−H/5) (Fowler & Chillemi 1992; common practice).
 */
export function diameterFromH(H: number, albedo: number): number {
  if (!(albedo > 0)) throw new RangeError(`diameterFromH: albedo must be positive, got ${albedo}`);
  return (1329 / Math.sqrt(albedo)) * 10 ** (-H / 5);
}

export function yarkovskyDriftAu(random: Random, H: number, albedo: number, ageMyr: number): { driftAu: number; diameterKm: number } {
  const diameterKm = diameterFromH(H, albedo);
  const cosGamma = 2 * random() - 1;
  return { driftAu: (YARKOVSKY_AU_PER_MYR_1KM * ageMyr * cosGamma) / diameterKm, diameterKm };
}
