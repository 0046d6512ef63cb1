/**
 * Diameter of a minor body from its absolute magnitude H and geometric albedo p_V:
 *   D = 1329 km / √p_V · 10^(−H/5)
 * (Fowler & Chillemi 1992, IRAS Minor Planet Survey, Phillips Laboratory PL-TR-92-2049, p. 17;
 * Pravec & Harris 2007, Icarus 190, 250, eq. 3). 1329 km is the diameter of a body of p_V = 1
 * and H = 0 (the Sun's V magnitude −26.76 taken there).
 */

/**
 * Albedo range assumed when the albedo is unknown: 0.05 (dark, carbonaceous) to 0.50 (bright
 * and icy), the outer columns of the IAU Minor Planet Center's table "Conversion of Absolute
 * Magnitude to Diameter". A body darker than 0.05 is larger than the range says.
 */
export const ALBEDO_MIN = 0.05;
export const ALBEDO_MAX = 0.5;

/** 1329 km (Fowler & Chillemi 1992; Pravec & Harris 2007, eq. 3). */
export const DIAMETER_KM_AT_H0_P1 = 1329;

/** Diameter in km for absolute magnitude H and geometric albedo p (0 < p ≤ 1); NaN for a NaN H. */
export function diameterKmFromH(absMagH: number, albedo: number): number {
  if (!(albedo > 0 && albedo <= 1)) throw new RangeError(`diameterKmFromH: albedo must be in (0, 1], got ${albedo}`);
  if (Number.isNaN(absMagH)) return NaN;
  return (DIAMETER_KM_AT_H0_P1 / Math.sqrt(albedo)) * Math.pow(10, -absMagH / 5);
}

export interface DiameterRange {
  /** At the highest albedo. */
  minKm: number;
  /** At the lowest albedo. */
  maxKm: number;
  albedoMin: number;
  albedoMax: number;
}

/** The diameters H allows over an albedo range (default 0.05–0.50). */
export function diameterRangeKm(absMagH: number, albedoMin = ALBEDO_MIN, albedoMax = ALBEDO_MAX): DiameterRange {
  if (!(albedoMin > 0 && albedoMin <= albedoMax && albedoMax <= 1)) {
    throw new RangeError(`diameterRangeKm: bad albedo range ${albedoMin}–${albedoMax}`);
  }
  return {
    minKm: diameterKmFromH(absMagH, albedoMax), maxKm: diameterKmFromH(absMagH, albedoMin),
    albedoMin, albedoMax,
  };
}
