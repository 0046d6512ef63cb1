/**
 * The averaged disturbing function of the 1:1 resonance, R̄(φ; a, e, i, ω), on a whole grid of
 * the resonant angle φ = λ − λ_P:
 *
 *   R̄(φ) = (1/2π) ∮ [ 1/|r − r_P|  −  r·r_P ] dλ_P                                   (4)
 *   r_P = (cos λ_P, sin λ_P, 0),   r = Kepler position at mean anomaly M = λ_P + φ − Ω − ω
 *
 * Units: a_P = 1, G M_sun = 1 (R̄ is dimensionless). The planet is on a circular orbit of unit
 * radius in the reference plane (the restricted circular problem); the body's orbit is fixed
 * (a, e, i, ω, Ω) while φ changes. The first term is the direct part, the second the indirect
 * part of the disturbing function for an outer perturber at unit distance (Murray & Dermott
 * 1999, Solar System Dynamics, §6.2, eqs. 6.44–6.45: equation numbers from memory, not
 * verified). Without the indirect part R̄ has no minima at ±60° (no L4/L5). Averaging over
 * λ_P at fixed φ follows the double-averaging of the spatial circular problem (Sidorenko et
 * al. 2014, CMDA 120, 131; from memory for the journal); the formula as written is derived in
 * the project's co-orbital design note, eq. (4).
 *
 * Quadrature: the midpoint rule in λ_P with N samples (common practice; spectrally accurate
 * for a smooth periodic integrand). Where the orbits nearly intersect the integrand has a peak
 * of width ~ d/(e + sin i) in λ_P (d the least distance), so the error falls like
 * exp(−N d/(e + i)); measured at N = 240 against N = 2880 (test/core/coorbitalDisturbing.test.ts):
 * ≤ 2e-11 relative where d > 0.03 a_P (Earth's 3 Hill radii) for e ≤ 0.4; at e = 0.7, 9e-6 where
 * d > 0.03 and 5e-15 where d > 0.1. At an intersection R̄ has
 * an integrable log singularity; the samples give a tall finite peak ("the planet barrier").
 *
 * Cost: M = λ_P + φ − ϖ, so with the φ step and the λ_P step multiples of one fine step the
 * body is needed only on one grid of mean anomalies: max(N, N_φ) Kepler solves per orbit,
 * each started from the previous root (keplerNear.ts), then N_φ × N distance evaluations with no
 * allocation.
 */
import { TWO_PI } from '../math.js';
import { solveKeplerElliptic } from '../orbit/kepler.js';
import { nextKeplerGuess, solveKeplerEllipticNearInto } from '../orbit/keplerNear.js';
import type { AveragedOrbitShape } from './types.js';

/** Buffers and tables for one (N_φ, N) pair; reuse it for every body. */
export interface DisturbingGrid {
  readonly phiCount: number; // N_φ: φ_j = j · 2π / N_φ, j = 0 … N_φ − 1
  readonly planetSamples: number; // N: λ_P,k = (k + ½) · 2π / N
  readonly fineCount: number; // G = max(N_φ, N): mean anomalies M_m = (m + P/2) · 2π/G − ϖ
  readonly planetStride: number; // P = G / N fine steps per λ_P step
  readonly phiStride: number; // Q = G / N_φ fine steps per φ step
  readonly cosPlanet: Float64Array; // cos λ_P,k
  readonly sinPlanet: Float64Array;
  readonly bodyX: Float64Array; // body position at M_m, a_P = 1, planet's frame
  readonly bodyY: Float64Array;
  readonly bodyZ: Float64Array;
}

/** A grid of N_φ values of φ and N planet longitudes; one must divide the other. */
export function createDisturbingGrid(phiCount = 720, planetSamples = 720): DisturbingGrid {
  for (const [name, v] of [['phiCount', phiCount], ['planetSamples', planetSamples]] as const) {
    if (!Number.isInteger(v) || v < 8) throw new RangeError(`createDisturbingGrid: ${name} ${v} is not an integer ≥ 8`);
  }
  const fineCount = Math.max(phiCount, planetSamples);
  if (fineCount % phiCount !== 0 || fineCount % planetSamples !== 0) {
    throw new RangeError(`createDisturbingGrid: phiCount ${phiCount} and planetSamples ${planetSamples}: one must divide the other`);
  }
  const cosPlanet = new Float64Array(planetSamples);
  const sinPlanet = new Float64Array(planetSamples);
  for (let k = 0; k < planetSamples; k++) {
    const lambdaRad = ((k + 0.5) * TWO_PI) / planetSamples;
    cosPlanet[k] = Math.cos(lambdaRad);
    sinPlanet[k] = Math.sin(lambdaRad);
  }
  return {
    phiCount, planetSamples, fineCount,
    planetStride: fineCount / planetSamples, phiStride: fineCount / phiCount,
    cosPlanet, sinPlanet,
    bodyX: new Float64Array(fineCount), bodyY: new Float64Array(fineCount), bodyZ: new Float64Array(fineCount),
  };
}

/** φ_j in radians, [0, 2π). */
export function gridPhiRad(grid: DisturbingGrid, j: number): number {
  return (j * TWO_PI) / grid.phiCount;
}

export interface AveragedDisturbingOptions {
  aRatio?: number; // a / a_P of the body (default 1: the averaged problem is built at exact resonance)
  indirect?: boolean; // include the indirect term (default true; false only to show its role)
  outMinDistance?: Float64Array; // if given (length N_φ): least body–planet distance over λ_P at each φ_j, units of a_P
}

function checkShape(shape: AveragedOrbitShape, aRatio: number): void {
  const { e, iRad, periRad } = shape;
  const nodeRad = shape.nodeRad ?? 0;
  if (!(e >= 0 && e < 1)) throw new RangeError(`averaged disturbing function: eccentricity ${e} outside [0, 1)`);
  if (!Number.isFinite(iRad) || !Number.isFinite(periRad) || !Number.isFinite(nodeRad)) {
    throw new RangeError(`averaged disturbing function: non-finite angle i=${iRad}, ω=${periRad}, Ω=${nodeRad}`);
  }
  if (!(aRatio > 0 && Number.isFinite(aRatio))) throw new RangeError(`averaged disturbing function: a/aP ${aRatio} is not positive`);
}

const ECC = new Float64Array(3);

/**
 * Body positions at the grid's mean anomalies, planet frame, a_P = 1. Perifocal unit vectors
 * P̂, Q̂ from (Ω, ω, i) and r = a(cos E − e) P̂ + a√(1 − e²) sin E Q̂ (Murray & Dermott 1999
 * §2.8; common practice).
 */
function fillBodyPositions(grid: DisturbingGrid, shape: AveragedOrbitShape, aRatio: number): void {
  const { e, iRad, periRad } = shape;
  const nodeRad = shape.nodeRad ?? 0;
  const cO = Math.cos(nodeRad), sO = Math.sin(nodeRad), cw = Math.cos(periRad), sw = Math.sin(periRad);
  const ci = Math.cos(iRad), si = Math.sin(iRad);
  const px = cO * cw - sO * sw * ci, py = sO * cw + cO * sw * ci, pz = sw * si;
  const qx = -cO * sw - sO * cw * ci, qy = -sO * sw + cO * cw * ci, qz = cw * si;
  const b = aRatio * Math.sqrt(1 - e * e);
  const h = TWO_PI / grid.fineCount;
  const m0 = 0.5 * grid.planetStride * h - nodeRad - periRad; // M_m = λ_P + φ − Ω − ω on the fine grid
  const ecc = ECC; // E, sin E, cos E
  for (let m = 0; m < grid.fineCount; m++) {
    // each solve starts from the previous root (keplerNear.ts; within 2e-16 rad of the bracketed solver)
    if (m === 0) {
      ecc[0] = solveKeplerElliptic(m0, e);
      ecc[1] = Math.sin(ecc[0]);
      ecc[2] = Math.cos(ecc[0]);
    } else {
      solveKeplerEllipticNearInto(m0 + m * h, e, nextKeplerGuess(ecc[0], ecc[2], e, h), ecc);
    }
    const u = aRatio * (ecc[2] - e), v = b * ecc[1];
    grid.bodyX[m] = u * px + v * qx;
    grid.bodyY[m] = u * py + v * qy;
    grid.bodyZ[m] = u * pz + v * qz;
  }
}

/**
 * Fills outV[j] = R̄(φ_j), j = 0 … N_φ − 1 (equation 4 above), for one orbit shape. outV (and
 * outMinDistance) are caller-owned; nothing is allocated. An exact hit of the planet gives
 * +Infinity (e = i = 0 at φ = 0).
 */
export function fillAveragedDisturbing(
  shape: AveragedOrbitShape, grid: DisturbingGrid, outV: Float64Array, opts: AveragedDisturbingOptions = {},
): void {
  const aRatio = opts.aRatio ?? 1;
  checkShape(shape, aRatio);
  const minD = opts.outMinDistance;
  if (outV.length < grid.phiCount || (minD !== undefined && minD.length < grid.phiCount)) {
    throw new RangeError(`fillAveragedDisturbing: output shorter than the ${grid.phiCount} grid points`);
  }
  fillBodyPositions(grid, shape, aRatio);
  const indirectWeight = opts.indirect === false ? 0 : 1;
  for (let j = 0; j < grid.phiCount; j++) {
    const d2Min = sumOverPlanet(grid, j * grid.phiStride, indirectWeight, outV, j);
    if (minD !== undefined) minD[j] = Math.sqrt(d2Min);
  }
}

/** Midpoint sum over λ_P for one φ; writes R̄ to out[j], returns the least squared distance. */
function sumOverPlanet(grid: DisturbingGrid, start: number, indirectWeight: number, out: Float64Array, j: number): number {
  const { bodyX, bodyY, bodyZ, cosPlanet, sinPlanet, planetSamples, planetStride, fineCount } = grid;
  let sum = 0;
  let d2Min = Infinity;
  let m = start;
  for (let k = 0; k < planetSamples; k++) {
    const bx = bodyX[m], by = bodyY[m], bz = bodyZ[m], c = cosPlanet[k], s = sinPlanet[k];
    const dx = bx - c, dy = by - s;
    const d2 = dx * dx + dy * dy + bz * bz; // |r − r_P|², as a sum of squares: never negative
    sum += 1 / Math.sqrt(d2) - indirectWeight * (bx * c + by * s);
    if (d2 < d2Min) d2Min = d2;
    m += planetStride;
    if (m >= fineCount) m -= fineCount;
  }
  out[j] = sum / planetSamples;
  return d2Min;
}
