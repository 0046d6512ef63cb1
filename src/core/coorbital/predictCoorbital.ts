/**
 * Prediction stage of the co-orbital (1:1 resonance) detector: what the averaged restricted
 * circular problem says the resonant angle φ = λ − λ_P of one body does, from its orbit shape
 * (e, i, ω relative to the planet's orbit), its offset x0 = δa/a_P and φ0 at epoch.
 *
 * Steps: V(φ) = R̄ on the grid (averagedDisturbing.ts) → the level curve through (x0, φ0) and
 * its state (phasePortrait.ts) → its period (librationPeriod.ts). Pure physics: the planet is
 * known only by its mass ratio μ and its orbital period.
 *
 * Known limits, flagged rather than hidden (design note §1.4): the averaging is not valid near
 * close approaches — Leleu et al. 2017 (CMDA, doi 10.1007/s10569-017-9802-8, footnote 2): "the
 * averaging process is not convergent in a neighbourhood of the collision … including the Hill
 * sphere" — so closeApproach is set when the level curve comes within 3 Hill radii (project
 * choice); quasi-satellites at low e are outside what averaging can reach (Pousse, Robutel &
 * Vienne 2017, CMDA 128, 383) and need the N-body check.
 */
import { DEG_PER_RAD } from '../constants.js';
import { wrapPi } from '../math.js';
import { createDisturbingGrid, fillAveragedDisturbing, type DisturbingGrid } from './averagedDisturbing.js';
import {
  circulationPeriodYears, DEFAULT_PERIOD_NODES, isLinearLimit, librationPeriodYears, smallAmplitudePeriodYears,
} from './librationPeriod.js';
import { readPhasePortrait } from './phasePortrait.js';
import type { AveragedOrbitShape, CoorbitalPrediction } from './types.js';

/**
 * Grid defaults, chosen with scripts/bench/coorbitalPrediction.ts (400 synthetic Earth
 * candidates, e ≤ 0.6, i ≤ 30°): 0.5° in φ and 240 planet longitudes. Measured 2026-12-03
 * (load average ≈ 3 from other work): against 2880 longitudes no state changed and periods
 * agreed to 1.6e-10 (bodies without close approach); 1.9 ms per body (Node 20), of which
 * ~0.1 ms are the 720 Kepler solves (each from the previous root; ~0.4 ms with the bracketed
 * solver alone). A 1° grid in φ changed 2 states in 400 and periods by up to 8e-3 on these
 * Earth candidates: a grid that coarse is used only where it is decisive, in the two-stage
 * prediction for whole catalogues (predictTwoStage.ts, where its measured accuracy is given).
 */
export const DEFAULT_PHI_COUNT = 720;
export const DEFAULT_PLANET_SAMPLES = 240;

/** Close-approach radius in Hill radii (project choice, design note §1.4). */
export const CLOSE_APPROACH_HILL_RADII = 3;

/** Reusable buffers for predictCoorbital (one per worker; not shared between calls in flight). */
export interface CoorbitalWorkspace {
  grid: DisturbingGrid;
  values: Float64Array; // V(φ_j)
  minDistance: Float64Array; // least body–planet distance at φ_j, units of a_P
}

export function createCoorbitalWorkspace(phiCount = DEFAULT_PHI_COUNT, planetSamples = DEFAULT_PLANET_SAMPLES): CoorbitalWorkspace {
  const grid = createDisturbingGrid(phiCount, planetSamples);
  return { grid, values: new Float64Array(phiCount), minDistance: new Float64Array(phiCount) };
}

export interface PredictCoorbitalOptions {
  workspace?: CoorbitalWorkspace; // default: a new one with the default grid
  aRatio?: number; // a/a_P the potential is built at (default 1, exact resonance)
  periodNodes?: number; // nodes of the period integral (default 256)
}

/** Hill radius in units of a_P, (μ/3)^(1/3) (common practice). */
export function hillRadiusRel(mu: number): number {
  return Math.cbrt(mu / 3);
}

/**
 * The averaged prediction for one body. x0 = (a − a_P)/a_P, phi0Rad = λ − λ_P (mean
 * longitudes), muPlanet = m_P/M_sun, planetPeriodDays the planet's orbital period.
 */
export function predictCoorbital(
  shape: AveragedOrbitShape, x0: number, phi0Rad: number, muPlanet: number, planetPeriodDays: number,
  opts: PredictCoorbitalOptions = {},
): CoorbitalPrediction {
  if (!Number.isFinite(x0) || !Number.isFinite(phi0Rad)) throw new RangeError(`predictCoorbital: non-finite x0=${x0} or φ0=${phi0Rad}`);
  if (!(muPlanet > 0 && muPlanet < 1)) throw new RangeError(`predictCoorbital: mass ratio μ ${muPlanet} outside (0, 1)`);
  const ws = opts.workspace ?? createCoorbitalWorkspace();
  const n = ws.grid.phiCount;
  fillAveragedDisturbing(shape, ws.grid, ws.values, { aRatio: opts.aRatio, outMinDistance: ws.minDistance });
  const p = readPhasePortrait(ws.values, ws.minDistance, n, x0, phi0Rad, muPlanet);
  const periodYears = p.state === 'passing'
    ? circulationPeriodYears(ws.values, n, p.level, muPlanet, planetPeriodDays)
    : isLinearLimit(p.level, p.bottomValue)
      ? smallAmplitudePeriodYears(ws.values, n, p.bottomRad, muPlanet, planetPeriodDays)
      : librationPeriodYears(ws.values, n, p.level, p.loRad, p.hiRad, muPlanet, planetPeriodDays, opts.periodNodes ?? DEFAULT_PERIOD_NODES);
  const minDistanceHill = p.minDistance / hillRadiusRel(muPlanet);
  const phiMinDeg = wrappedDeg(p.loRad);
  return {
    state: p.state,
    centreDeg: wrappedDeg(p.centreRad),
    phiMinDeg,
    phiMaxDeg: phiMinDeg + (p.hiRad - p.loRad) * DEG_PER_RAD,
    separatrixMargin: p.separatrixMargin,
    periodYears,
    closeApproach: minDistanceHill < CLOSE_APPROACH_HILL_RADII,
    compoundWith: p.compoundWith,
    maxOffsetRel: p.maxOffsetRel,
    minDistanceHill,
  };
}

/** Angle in degrees wrapped to (−180°, 180°]; NaN stays NaN. */
function wrappedDeg(rad: number): number {
  return (0 - wrapPi(-rad)) * DEG_PER_RAD; // wrapPi gives [−π, π); negated: (−π, π]
}
