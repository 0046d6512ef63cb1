/**
 * Period of the motion of φ along a level curve of the averaged 1:1 problem
 * (phasePortrait.ts), from dφ/dt = −(3/2) n_P x and x(φ)² = (8/3) μ (L − V(φ)):
 *
 *   libration:    T = 2 ∫_{φlo}^{φhi} dφ / ((3/2) n_P |x(φ)|)
 *   circulation:  T =   ∮           dφ / ((3/2) n_P |x(φ)|)   (one turn of φ: the synodic period)
 *
 * (derived; see the co-orbital design note §1.2 eq. 2 and §1.4 item 7). The inverse-square-root
 * ends of the libration integral are removed by φ = φlo + (φhi − φlo)(1 − cos t)/2, t ∈ [0, π]:
 * the integrand in t is then smooth and even about both ends, so the midpoint rule in t
 * converges fast (common practice). Checked against the small-amplitude tadpole period
 * 2π/(n_P √(27μ/4)) (Murray & Dermott 1999 ch. 3, from memory) in
 * test/core/coorbitalPrediction.test.ts.
 *
 * At the bottom of a well, where L − V is lost in rounding, the linearised motion is used:
 * d²φ/dt² = −3 μ n_P² V''(φc) (φ − φc), so T = P / √(3 μ V'') (derived from eqs. 2–3 of the
 * design note; at L4, V'' = 9/4 gives the tadpole limit above).
 */
import { DAYS_PER_JULIAN_YEAR } from '../constants.js';
import { TWO_PI } from '../math.js';
import { interpolatePeriodic } from './periodicGrid.js';

export const DEFAULT_PERIOD_NODES = 256;

function checkPlanet(mu: number, planetPeriodDays: number): void {
  if (!(mu > 0 && mu < 1)) throw new RangeError(`libration period: mass ratio μ ${mu} outside (0, 1)`);
  if (!(planetPeriodDays > 0 && Number.isFinite(planetPeriodDays))) throw new RangeError(`libration period: planet period ${planetPeriodDays} d is not positive`);
}

/**
 * Libration period in Julian years between turning points loRad < hiRad (roots of V = level
 * on the interpolated grid values). NaN if the level dips below V inside the arc (a feature
 * narrower than the grid) or is not finite.
 */
export function librationPeriodYears(
  values: Float64Array, n: number, level: number, loRad: number, hiRad: number,
  mu: number, planetPeriodDays: number, nodes = DEFAULT_PERIOD_NODES,
): number {
  checkPlanet(mu, planetPeriodDays);
  if (!Number.isFinite(level) || !(hiRad > loRad)) return NaN;
  const halfWidthRad = 0.5 * (hiRad - loRad);
  const dt = Math.PI / nodes;
  let sum = 0;
  for (let k = 0; k < nodes; k++) {
    const t = (k + 0.5) * dt;
    const gap = level - interpolatePeriodic(values, n, loRad + halfWidthRad * (1 - Math.cos(t)));
    if (!(gap > 0)) return NaN;
    sum += Math.sin(t) / Math.sqrt(gap);
  }
  // ∫ dφ/|x| = ∫ (Δ/2) sin t dt / √((8/3) μ (L − V))
  const integralRad = (halfWidthRad * dt * sum) / Math.sqrt((8 / 3) * mu);
  return (2 * integralRad) / (1.5 * meanMotionRadPerDay(planetPeriodDays)) / DAYS_PER_JULIAN_YEAR;
}

/** Circulation period in Julian years: the midpoint rule over the whole periodic grid. */
export function circulationPeriodYears(values: Float64Array, n: number, level: number, mu: number, planetPeriodDays: number): number {
  checkPlanet(mu, planetPeriodDays);
  if (!Number.isFinite(level)) return NaN;
  let sum = 0;
  for (let j = 0; j < n; j++) {
    const gap = level - values[j];
    if (gap === 0) return Infinity; // on the separatrix: the body takes for ever to cross the maximum
    if (!(gap > 0)) return NaN;
    sum += 1 / Math.sqrt(gap);
  }
  const integralRad = ((TWO_PI / n) * sum) / Math.sqrt((8 / 3) * mu);
  return integralRad / (1.5 * meanMotionRadPerDay(planetPeriodDays)) / DAYS_PER_JULIAN_YEAR;
}

/**
 * Below L − V_min = LINEAR_LIMIT_DEPTH · max(1, |V_min|) the linearised period is used: there the
 * rounding of L − V (~1e-16 |V|/depth relative) would exceed the amplitude term the linear
 * period leaves out (~depth). Both are ~1e-8 at the switch.
 */
export const LINEAR_LIMIT_DEPTH = 1e-7;

/** Whether a well of this depth is best timed by its linearised period. */
export function isLinearLimit(level: number, bottomValue: number): boolean {
  return level - bottomValue < LINEAR_LIMIT_DEPTH * Math.max(1, Math.abs(bottomValue));
}

/**
 * Small-amplitude period in Julian years at a minimum of V, T = P/√(3 μ V''), with V'' by the
 * central difference of the interpolated values over one grid step (error O(h²), ~1e-5 relative).
 */
export function smallAmplitudePeriodYears(values: Float64Array, n: number, centreRad: number, mu: number, planetPeriodDays: number): number {
  checkPlanet(mu, planetPeriodDays);
  const h = TWO_PI / n;
  const v0 = interpolatePeriodic(values, n, centreRad);
  const curvature = (interpolatePeriodic(values, n, centreRad + h) - 2 * v0 + interpolatePeriodic(values, n, centreRad - h)) / (h * h);
  if (!(curvature > 0)) return NaN;
  return planetPeriodDays / Math.sqrt(3 * mu * curvature) / DAYS_PER_JULIAN_YEAR;
}

function meanMotionRadPerDay(periodDays: number): number {
  return TWO_PI / periodDays;
}
