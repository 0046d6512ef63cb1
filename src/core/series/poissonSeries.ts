/**
 * Poisson series in one generic form, for bulk evaluation (poissonChebyshev.ts):
 *   V_v(t) = Σ_α t^α Σ_k A_k cos(φ_k(t))   (or sin, for the lunar theory),
 *   φ_k(t) = p_0 + p_1 t + … + p_D t^D,
 * with t in the theory's own time unit from J2000. VSOP87 (Bretagnon & Francou 1988) has
 * linear phases B + C τ in Julian millennia; ELP/MPP02 (Chapront & Francou 2003) has quartic
 * phases in Julian centuries and sine terms. Built once per theory from the packed arrays
 * the direct evaluators use, so both paths read the same coefficients.
 */
import type { PlanetName } from '../constants.js';
import { DAYS_PER_JULIAN_CENTURY } from '../constants.js';
import { VSOP87_MAX_POWER, vsop87Series } from '../ephemeris/vsop87Series.js';
import { elpPackedSeries } from '../ephemeris/elpMoon.js';

export interface PoissonSeries {
  /** Number of variables (3: longitude, latitude, distance). */
  readonly variables: number;
  /** Blocks per variable, one per power α = 0..powers−1. */
  readonly powers: number;
  /** Terms of variable v, power α: [blockStart[v*powers+α], blockStart[v*powers+α+1]). */
  readonly blockStart: Int32Array;
  /** A_k, in the variable's unit (rad, arcsec, au or km). */
  readonly amplitude: Float64Array;
  /** Phase polynomial coefficients p_0..p_D of term k at k*(D+1) (rad, rad per unit^d). */
  readonly phase: Float64Array;
  /** D, the degree of the phase polynomials (1 = linear). */
  readonly phaseDegree: number;
  /** true: terms are A sin φ; false: A cos φ. */
  readonly sine: boolean;
  /** Days per time unit of t (365 250 for VSOP87, 36 525 for ELP/MPP02). */
  readonly daysPerUnit: number;
}

const vsopCache = new Map<PlanetName, PoissonSeries>();
let elpCache: PoissonSeries | undefined;

/** VSOP87B series of `planet` (L, B in rad; R in au; τ in Julian millennia TDB). */
export function vsop87PoissonSeries(planet: PlanetName): PoissonSeries {
  let s = vsopCache.get(planet);
  if (s === undefined) {
    const packed = vsop87Series(planet);
    const count = packed.termCount;
    const amplitude = new Float64Array(count);
    const phase = new Float64Array(2 * count);
    for (let k = 0; k < count; k++) {
      amplitude[k] = packed.abc[3 * k];
      phase[2 * k] = packed.abc[3 * k + 1];
      phase[2 * k + 1] = packed.abc[3 * k + 2];
    }
    s = {
      variables: 3, powers: VSOP87_MAX_POWER + 1, blockStart: packed.blockStart,
      amplitude, phase, phaseDegree: 1, sine: false, daysPerUnit: 365_250,
    };
    vsopCache.set(planet, s);
  }
  return s;
}

/** ELP/MPP02 series (V_L, V_B in arcsec; V_R in km; T in Julian centuries TDB). */
export function elpPoissonSeries(): PoissonSeries {
  if (elpCache === undefined) {
    const { rows, blockStart, powers } = elpPackedSeries();
    const count = rows.length / 6;
    const amplitude = new Float64Array(count);
    const phase = new Float64Array(5 * count);
    for (let k = 0; k < count; k++) {
      amplitude[k] = rows[6 * k];
      for (let d = 0; d < 5; d++) phase[5 * k + d] = rows[6 * k + 1 + d];
    }
    elpCache = {
      variables: 3, powers, blockStart, amplitude, phase, phaseDegree: 4, sine: true,
      daysPerUnit: DAYS_PER_JULIAN_CENTURY,
    };
  }
  return elpCache;
}
