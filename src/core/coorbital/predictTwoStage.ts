/**
 * The co-orbital prediction in two stages, for whole catalogues: the averaged problem on a
 * coarse grid first, kept when it is decisive; otherwise the prediction on the default (fine)
 * grid of predictCoorbital.ts, which is then the answer exactly.
 *
 * The coarse result is kept (project choice; figures at COARSE_PHI_COUNT) when
 *   - its level is far from every separatrix: separatrixMargin ≥ COARSE_ACCEPT_MARGIN, well
 *     above the largest coarse-vs-fine difference of the margin measured, so the level cannot
 *     lie across a separatrix of the fine grid;
 *   - its level curve stays well away from the planet: the least distance along it, less twice
 *     the sampling bound of the coarse grid (distanceSamplingBound), is still beyond the
 *     close-approach radius, so closeApproach is false on both grids (twice: the motion
 *     relative to the planet per unit of λ_P reaches about 2e + sin i, the epicycle about the
 *     guiding centre being 2e long along the track; common practice); the barrier about the
 *     planet is about as wide in φ as that distance (averagedDisturbing.ts), so the arc's ends
 *     are sampled by several coarse steps;
 *   - its period is finite.
 * Everything else (near a separatrix, close approaches, features narrower than the coarse grid
 * that leave the period undefined) is predicted again on the fine grid.
 */
import { CLOSE_APPROACH_HILL_RADII, createCoorbitalWorkspace, hillRadiusRel, predictCoorbital, type CoorbitalWorkspace } from './predictCoorbital.js';
import type { AveragedOrbitShape, CoorbitalPrediction } from './types.js';

/**
 * Coarse grid: 1° in φ and 40 planet longitudes (12× fewer distance evaluations than the fine
 * 720 × 240, half the Kepler solves). Measured against the fine grid with
 * scripts/bench/coorbitalTwoStage.ts on the 63 180 bodies the co-orbital benchmark screens in
 * its 1.5 M-row synthetic dump (all eight planets; 59 477 near Jupiter), 2026-12-03: the coarse
 * grid decided 59 999 (all but 285 of Jupiter's; a quarter or less of the other planets',
 * whose Hill radii are 1.5–15× smaller); among them no state and no close-approach flag changed,
 * the separatrix margin moved by at most 0.044, periods by at most 9.0e-4 (relative) for
 * e ≤ 0.6 and i ≤ 30° and 2.4e-3 beyond (a Mars body at e = 0.92), turning points and centres
 * by 0.003° (e ≤ 0.6) and 0.84° (a Mars quasi-satellite at e = 0.83), the largest offset by
 * 1.5e-3 and the least distance by 3.7e-2 (relative). CPU time on one thread: 0.32 ms a body
 * against 1.95 ms for the fine grid alone (ratio 6.2; load average ≈ 3 from other work).
 */
export const COARSE_PHI_COUNT = 360;
export const COARSE_PLANET_SAMPLES = 40;
/**
 * Planets of μ ≥ GIANT_MASS_RATIO (Jupiter 9.5e-4, Saturn 2.9e-4; not Uranus 4.4e-5 or Neptune
 * 5.1e-5) get a coarser first grid, 2° in φ and 45 planet longitudes (half the evaluations
 * again): their Hill radii, 0.04–0.07 a_P, and their wide libration zones make the features of
 * V(φ) broad (averagedDisturbing.ts). Measured with scripts/bench/coorbitalTwoStage.ts on the
 * 12 590 bodies screened in a 300 000-row dump of the benchmark's population (11 802 near
 * Jupiter), 2026-12-03: CPU 0.283 ms a body against 0.369 ms with the 1° × 40 grid for all
 * (ratio 1.30); among the bodies kept on a coarse grid no state or close-approach flag changed;
 * for e ≤ 0.6 and i ≤ 30° periods moved by at most 2.5e-3 (relative; 2.9e-4 with 1° × 40),
 * angles by 5.4e-3°, the largest offset by 5.1e-3.
 */
export const GIANT_MASS_RATIO = 1e-4;
export const GIANT_COARSE_PHI_COUNT = 180;
export const GIANT_COARSE_PLANET_SAMPLES = 45;
/**
 * Nodes of the coarse stage's period integral (librationPeriod.ts; 256 on the fine grid): on the
 * coarse grid's kept bodies (every 8th of the benchmark's) periods moved by at most 1e-7
 * relative from 256 nodes (64 nodes: 1e-4).
 */
export const COARSE_PERIOD_NODES = 128;
/** Least separatrix margin of a coarse result that is kept (header): 3.4× the largest margin difference measured, 0.044. */
export const COARSE_ACCEPT_MARGIN = 0.15;
/** Safety factor on the sampling bound of the least distance (project choice). */
const DISTANCE_SLACK_FACTOR = 2;

/** Both grids' buffers, and counts of the bodies predicted and of those predicted again on the fine grid. */
export interface TwoStageWorkspace {
  coarse: CoorbitalWorkspace;
  coarseGiant: CoorbitalWorkspace; // the coarse stage for μ ≥ GIANT_MASS_RATIO

  fine: CoorbitalWorkspace;
  predicted: number;
  refined: number;
}

/** The default coarse grids, or others (tests and benchmarks: to show what a too coarse grid does). */
export function createTwoStageWorkspace(
  coarsePhiCount = COARSE_PHI_COUNT, coarsePlanetSamples = COARSE_PLANET_SAMPLES,
  giantPhiCount = GIANT_COARSE_PHI_COUNT, giantPlanetSamples = GIANT_COARSE_PLANET_SAMPLES,
): TwoStageWorkspace {
  return {
    coarse: createCoorbitalWorkspace(coarsePhiCount, coarsePlanetSamples),
    coarseGiant: createCoorbitalWorkspace(giantPhiCount, giantPlanetSamples),
    fine: createCoorbitalWorkspace(), predicted: 0, refined: 0,
  };
}

/**
 * Upper bound (units of a_P) of how much a grid's sampled least distance may exceed the true
 * one: half a λ_P step of the relative motion, (π/N)(e + sin i), plus half a φ step, π/N_φ
 * (phasePortrait.ts, minDistanceOnArc).
 */
export function distanceSamplingBound(shape: AveragedOrbitShape, phiCount: number, planetSamples: number): number {
  return (Math.PI / planetSamples) * (shape.e + Math.abs(Math.sin(shape.iRad))) + Math.PI / phiCount;
}

/** Whether a prediction made on a (phiCount, planetSamples) grid is kept (header). */
export function coarseIsDecisive(p: CoorbitalPrediction, shape: AveragedOrbitShape, mu: number, phiCount: number, planetSamples: number): boolean {
  if (!(p.separatrixMargin >= COARSE_ACCEPT_MARGIN) || !Number.isFinite(p.periodYears) || p.closeApproach) return false;
  const hill = hillRadiusRel(mu);
  const slack = DISTANCE_SLACK_FACTOR * distanceSamplingBound(shape, phiCount, planetSamples);
  return p.minDistanceHill * hill - slack >= CLOSE_APPROACH_HILL_RADII * hill;
}

/** predictCoorbital's prediction through the two stages (header); the same arguments, with a two-stage workspace. */
export function predictCoorbitalTwoStage(
  shape: AveragedOrbitShape, x0: number, phi0Rad: number, muPlanet: number, planetPeriodDays: number, ws: TwoStageWorkspace,
): CoorbitalPrediction {
  ws.predicted++;
  const first = muPlanet >= GIANT_MASS_RATIO ? ws.coarseGiant : ws.coarse;
  const coarse = predictCoorbital(shape, x0, phi0Rad, muPlanet, planetPeriodDays, { workspace: first, periodNodes: COARSE_PERIOD_NODES });
  if (coarseIsDecisive(coarse, shape, muPlanet, first.grid.phiCount, first.grid.planetSamples)) return coarse;
  ws.refined++;
  return predictCoorbital(shape, x0, phi0Rad, muPlanet, planetPeriodDays, { workspace: ws.fine });
}
