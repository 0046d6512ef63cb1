/**
 * Is a fitted semimajor-axis drift one a natural body of this size can have?
 *
 * The thermal drift scales from a reference body whose drift, size and density are measured
 * (the scaling of Farnocchia et al. 2013, Icarus 224, 1, and Del Vigna et al. 2018, A&A 617,
 * A61, which take Bennu as the reference; sections from memory):
 *   |da/dt|_max = |da/dt|_ref · (D_ref/D) · (ρ_ref/ρ) · (√a_ref (1 − e_ref²)) / (√a (1 − e²)) / |cos γ_ref|
 * The 1/(ρD) factor is the acceleration per unit mass of a sphere; the a, e factor is the
 * orbit average of transverseDrift.ts with A2 fixed; |cos γ| ≤ 1 for the obliquity γ. The maximum
 * takes the smallest diameter H allows (highest albedo) and the lowest density.
 * Reference (101955) Bennu: da/dt = −19.0 × 10⁻⁴ au/Myr and ρ = 1260 kg/m³ (Chesley et al.
 * 2014, Icarus 235, 5, abstract); D = 0.492 km and obliquity 178° (Nolan et al. 2013, Icarus 226,
 * 629; from memory); a = 1.12639 au, e = 0.20375 (osculating elements at 2011 Jan 1.0 TDB of the
 * published orbit).
 * The scaling leaves out thermal inertia, shape and spin: a drift up to `margin` (default 2) times
 * the maximum is called marginal, beyond it too large (the margin is this project's choice).
 */
import { ALBEDO_MAX, ALBEDO_MIN, diameterRangeKm } from './diameterFromH.js';
import { DENSITY_MIN_KG_PER_M3 } from './bulkDensity.js';

export const BENNU_DRIFT_AU_PER_MYR = 19.0e-4; // |da/dt|, Chesley et al. 2014
export const BENNU_DENSITY_KG_PER_M3 = 1260; // Chesley et al. 2014
export const BENNU_DIAMETER_KM = 0.492; // Nolan et al. 2013 (from memory)
export const BENNU_OBLIQUITY_DEG = 178; // Nolan et al. 2013 (from memory)
export const BENNU_A_AU = 1.12639;
export const BENNU_E = 0.20375;

export const DEFAULT_DRIFT_MARGIN = 2;

export type DriftVerdict = 'plausible' | 'marginal' | 'too-large' | 'unknown-size';

export interface DriftPlausibilityInput {
  /** Fitted ⟨da/dt⟩, au per million years (either sign). */
  driftAuPerMyr: number;
  aAu: number;
  e: number;
  /** Absolute magnitude; NaN when unknown. */
  absMagH: number;
  albedoMin?: number;
  albedoMax?: number;
  densityMinKgPerM3?: number;
  margin?: number;
}

export interface DriftPlausibility {
  verdict: DriftVerdict;
  /** |da/dt| / maximum; NaN when the size is unknown. */
  ratio: number;
  maxDriftAuPerMyr: number;
  /** The smallest diameter H allows, the one the maximum is for. */
  diameterMinKm: number;
  /** Plain words with the numbers. */
  text: string;
}

/** The largest |da/dt| (au/Myr) a natural body of diameter D and density ρ can have on orbit (a, e). */
export function maxNaturalDriftAuPerMyr(diameterKm: number, densityKgPerM3: number, aAu: number, e: number): number {
  if (!(diameterKm > 0) || !(densityKgPerM3 > 0)) throw new RangeError(`maxNaturalDrift: bad diameter ${diameterKm} km or density ${densityKgPerM3}`);
  if (!(aAu > 0) || !(e >= 0 && e < 1)) throw new RangeError(`maxNaturalDrift: bad orbit a=${aAu}, e=${e}`);
  const cosRef = Math.abs(Math.cos((BENNU_OBLIQUITY_DEG * Math.PI) / 180));
  const orbit = (Math.sqrt(BENNU_A_AU) * (1 - BENNU_E * BENNU_E)) / (Math.sqrt(aAu) * (1 - e * e));
  return (BENNU_DRIFT_AU_PER_MYR * (BENNU_DIAMETER_KM / diameterKm) * (BENNU_DENSITY_KG_PER_M3 / densityKgPerM3) * orbit) / cosRef;
}

function g3(x: number): string {
  return x.toPrecision(3);
}

/** Judges a fitted drift against the largest a natural body of this H can have. */
export function driftPlausibility(input: DriftPlausibilityInput): DriftPlausibility {
  const margin = input.margin ?? DEFAULT_DRIFT_MARGIN;
  const rhoMin = input.densityMinKgPerM3 ?? DENSITY_MIN_KG_PER_M3;
  if (!(margin >= 1)) throw new RangeError(`driftPlausibility: margin must be ≥ 1, got ${margin}`);
  if (!Number.isFinite(input.driftAuPerMyr)) throw new RangeError(`driftPlausibility: drift is not finite: ${input.driftAuPerMyr}`);
  const range = diameterRangeKm(input.absMagH, input.albedoMin ?? ALBEDO_MIN, input.albedoMax ?? ALBEDO_MAX);
  const drift = Math.abs(input.driftAuPerMyr);
  if (!Number.isFinite(range.minKm)) {
    return { verdict: 'unknown-size', ratio: NaN, maxDriftAuPerMyr: NaN, diameterMinKm: NaN,
      text: `|da/dt| = ${g3(drift)} au/Myr: no absolute magnitude, so no size to judge it by` };
  }
  const max = maxNaturalDriftAuPerMyr(range.minKm, rhoMin, input.aAu, input.e);
  const ratio = drift / max;
  const numbers = `|da/dt| = ${g3(drift)} au/Myr against at most ${g3(max)} au/Myr for D ≥ ${g3(range.minKm)} km`
    + ` (albedo ≤ ${range.albedoMax}) and ρ ≥ ${rhoMin} kg/m³`;
  if (ratio <= 1) return { verdict: 'plausible', ratio, maxDriftAuPerMyr: max, diameterMinKm: range.minKm, text: `plausible for a natural body of this size: ${numbers}` };
  if (ratio <= margin) {
    return { verdict: 'marginal', ratio, maxDriftAuPerMyr: max, diameterMinKm: range.minKm,
      text: `marginal: ${g3(ratio)} times the largest thermal drift of a natural body of this size, within the margin of ${margin}: ${numbers}` };
  }
  return { verdict: 'too-large', ratio, maxDriftAuPerMyr: max, diameterMinKm: range.minKm,
    text: `too large for a natural body of this size: ${g3(ratio)} times the largest thermal drift: ${numbers}` };
}
