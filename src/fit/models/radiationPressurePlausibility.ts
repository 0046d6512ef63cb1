/**
 * Is a fitted area-to-mass ratio one a natural body of this size can have?
 *
 * The radiation-pressure acceleration is a = C_R·(S/c)·(A/m)·(1 au/r)², S = 1361 W/m² the
 * nominal solar irradiance at 1 au (IAU 2015 Resolution B3) and c the speed of light: the core's
 * radiationPressureMPerS2 (src/core/forces/radiationPressure.ts), checked against those two
 * numbers in the tests. The fit sees only C_R·A/m (nongravModels.ts assumes C_R = 1).
 * A natural body taken as a homogeneous sphere has A/m = 3/(2ρD) (bulkDensity.ts). Its largest
 * effective value C_R·A/m takes the smallest diameter H allows (highest albedo), the lowest
 * density, and C_R = 2 (full specular reflection, the most momentum light can give a passive
 * surface; common practice). Above that maximum by more than `artificialFactor` (default 3, this
 * project's choice) the fitted value is "far above natural bodies of this size": what a light,
 * hollow object — a spent rocket stage, a spacecraft panel — shows.
 */
import { radiationPressureMPerS2 } from '../../core/forces/radiationPressure.js';
import { ALBEDO_MAX, ALBEDO_MIN, diameterRangeKm } from './diameterFromH.js';
import { DENSITY_MAX_KG_PER_M3, DENSITY_MIN_KG_PER_M3, sphereAreaToMassM2PerKg } from './bulkDensity.js';

/** Largest radiation-pressure coefficient of a passive surface (full specular reflection). Common practice. */
export const CR_MAX = 2;
export const DEFAULT_ARTIFICIAL_FACTOR = 3;

export type AreaToMassVerdict = 'natural' | 'above-natural' | 'artificial-like' | 'negative' | 'unknown-size';

export interface AreaToMassInput {
  /** Fitted effective area-to-mass ratio C_R·A/m, m²/kg. */
  areaToMassM2PerKg: number;
  absMagH: number;
  albedoMin?: number;
  albedoMax?: number;
  densityMinKgPerM3?: number;
  densityMaxKgPerM3?: number;
  artificialFactor?: number;
}

export interface AreaToMassPlausibility {
  verdict: AreaToMassVerdict;
  /** The fitted value over the natural maximum; NaN when the size is unknown. */
  ratio: number;
  /** Natural range of C_R·A/m for this H: smallest (big, dense, C_R = 1) and largest. */
  naturalMinM2PerKg: number;
  naturalMaxM2PerKg: number;
  /** The radiation-pressure acceleration at 1 au the fitted value gives, m/s². */
  accelerationAt1AuMPerS2: number;
  text: string;
}

function g3(x: number): string {
  return x.toPrecision(3);
}

/** Judges a fitted C_R·A/m against the natural bodies of this absolute magnitude. */
export function areaToMassPlausibility(input: AreaToMassInput): AreaToMassPlausibility {
  const am = input.areaToMassM2PerKg;
  if (!Number.isFinite(am)) throw new RangeError(`areaToMassPlausibility: A/m is not finite: ${am}`);
  const factor = input.artificialFactor ?? DEFAULT_ARTIFICIAL_FACTOR;
  if (!(factor >= 1)) throw new RangeError(`areaToMassPlausibility: factor must be ≥ 1, got ${factor}`);
  const rhoMin = input.densityMinKgPerM3 ?? DENSITY_MIN_KG_PER_M3;
  const rhoMax = input.densityMaxKgPerM3 ?? DENSITY_MAX_KG_PER_M3;
  const range = diameterRangeKm(input.absMagH, input.albedoMin ?? ALBEDO_MIN, input.albedoMax ?? ALBEDO_MAX);
  const acc = radiationPressureMPerS2(am, 1, 1);
  const out = (verdict: AreaToMassVerdict, ratio: number, lo: number, hi: number, text: string): AreaToMassPlausibility =>
    ({ verdict, ratio, naturalMinM2PerKg: lo, naturalMaxM2PerKg: hi, accelerationAt1AuMPerS2: acc, text });
  if (am < 0) return out('negative', NaN, NaN, NaN, `A/m = ${g3(am)} m²/kg is negative: a push toward the Sun is not radiation pressure`);
  if (!Number.isFinite(range.minKm)) {
    return out('unknown-size', NaN, NaN, NaN, `A/m = ${g3(am)} m²/kg: no absolute magnitude, so no size to judge it by`);
  }
  const lo = sphereAreaToMassM2PerKg(range.maxKm * 1000, rhoMax);
  const hi = CR_MAX * sphereAreaToMassM2PerKg(range.minKm * 1000, rhoMin);
  const ratio = am / hi;
  const numbers = `A/m = ${g3(am)} m²/kg against ${g3(lo)}–${g3(hi)} m²/kg for a natural body of`
    + ` D = ${g3(range.minKm * 1000)}–${g3(range.maxKm * 1000)} m and ρ = ${rhoMin}–${rhoMax} kg/m³`;
  if (ratio <= 1) return out('natural', ratio, lo, hi, `within what natural bodies of this size can have: ${numbers}`);
  if (ratio <= factor) {
    return out('above-natural', ratio, lo, hi, `above natural bodies of this size (${g3(ratio)} times the largest): only a body smaller or lighter than assumed: ${numbers}`);
  }
  return out('artificial-like', ratio, lo, hi,
    `far above natural bodies of this size (${g3(ratio)} times the largest): the signature of a light, hollow, artificial object: ${numbers}`);
}
