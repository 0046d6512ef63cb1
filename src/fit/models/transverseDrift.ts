/**
 * The mean drift of the semimajor axis caused by a transverse acceleration A2·(1 au/r)², the
 * thermal (Yarkovsky-type) model, from Gauss's equation for da/dt averaged over one orbit:
 *   ⟨da/dt⟩ = 2 A2 (1 − e²) / (n p²) · (1 au)²,   p = a (1 − e²)
 *           = 2 A2 (1 au)² / (n a² (1 − e²))
 * (Farnocchia et al. 2013, Icarus 224, 1, the d = 2 case of their averaged drift; section from memory).
 * n = k / a^{3/2} the mean motion (rad/day) of a massless body about the Sun, k the Gaussian
 * constant. A2 in au/day², a in au; the drift in au/day, au/Myr (Julian years) or m/yr.
 * The sign follows A2: positive (prograde rotation) drifts outward.
 */
import { DAYS_PER_JULIAN_YEAR, GAUSS_K, M_PER_AU } from '../../core/constants.js';

/** Days per million Julian years. */
const DAYS_PER_MYR = DAYS_PER_JULIAN_YEAR * 1e6;

function check(aAu: number, e: number): void {
  if (!(aAu > 0) || !Number.isFinite(aAu)) throw new RangeError(`transverse drift: a must be > 0 au, got ${aAu}`);
  if (!(e >= 0 && e < 1)) throw new RangeError(`transverse drift: e must be in [0, 1), got ${e}`);
}

/** Factor f with ⟨da/dt⟩ (au/day) = f · A2 (au/day²). */
function driftPerA2(aAu: number, e: number): number {
  check(aAu, e);
  const n = GAUSS_K / Math.pow(aAu, 1.5);
  return 2 / (n * aAu * aAu * (1 - e * e));
}

/** ⟨da/dt⟩ in au/day for A2 in au/day². */
export function driftAuPerDayFromA2(a2AuPerDay2: number, aAu: number, e: number): number {
  return a2AuPerDay2 * driftPerA2(aAu, e);
}

/** ⟨da/dt⟩ in au per million Julian years for A2 in au/day². */
export function driftAuPerMyrFromA2(a2AuPerDay2: number, aAu: number, e: number): number {
  return driftAuPerDayFromA2(a2AuPerDay2, aAu, e) * DAYS_PER_MYR;
}

/** ⟨da/dt⟩ in metres per Julian year for A2 in au/day². */
export function driftMPerYrFromA2(a2AuPerDay2: number, aAu: number, e: number): number {
  return driftAuPerDayFromA2(a2AuPerDay2, aAu, e) * DAYS_PER_JULIAN_YEAR * M_PER_AU;
}

/** A2 in au/day² giving the drift ⟨da/dt⟩ (au per million Julian years). */
export function a2FromDriftAuPerMyr(driftAuPerMyr: number, aAu: number, e: number): number {
  return driftAuPerMyr / DAYS_PER_MYR / driftPerA2(aAu, e);
}
