/**
 * Fills the io layer's OrbitRow scratch from demo elements and quality, rounded to the
 * decimals the export formats write, so that what the generator reasons about (T_J, zones)
 * is what a reader of the files gets back. One scratch row is reused for every line.
 */
import { DEG_PER_RAD, GAUSS_K } from '../../src/core/constants.js';
import type { OrbitRow } from '../../src/io/types.js';
import { resetOrbitRow } from '../../src/io/types.js';
import { DEFAULT_SLOPE_G, DEMO_REFERENCE_ASTEROID, DEMO_REFERENCE_COMET } from './scenario.js';
import type { DemoElements, DemoQuality } from './types.js';

/** x rounded to `decimals` places (as the fixed-width writers print it). */
export function roundTo(x: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
}

/** An angle in degrees rounded to `decimals` places and kept in [0, 360). */
export function roundAngleDeg(deg: number, decimals: number): number {
  const r = roundTo(((deg % 360) + 360) % 360, decimals);
  return r >= 360 ? 0 : r;
}

/**
 * Rounds elements in place to the one-line orbit export decimals (published layout: angles
 * and inclination 5, e and a 7 decimals, H 2).
 */
export function roundAsteroidElements(el: DemoElements): void {
  el.aAu = roundTo(el.aAu, 7);
  el.e = roundTo(el.e, 7);
  el.iDeg = roundTo(el.iDeg, 5);
  el.nodeDeg = roundAngleDeg(el.nodeDeg, 5);
  el.periDeg = roundAngleDeg(el.periDeg, 5);
  el.meanAnomalyDeg = roundAngleDeg(el.meanAnomalyDeg, 5);
  el.H = roundTo(el.H, 2);
}

/** Two-body mean motion, deg/day, n = k a^(−3/2) (Gaussian constant, massless body). */
export function meanMotionDegPerDay(aAu: number): number {
  return GAUSS_K * aAu ** -1.5 * DEG_PER_RAD;
}

/** Fills `row` for one asteroid-file line; `el` must already be rounded. */
export function fillAsteroidRow(
  row: OrbitRow, el: DemoElements, q: DemoQuality, designation: string, number: number, epochJdTT: number,
): void {
  resetOrbitRow(row);
  row.kind = 'asteroid';
  row.designation = designation;
  row.number = number;
  row.epochJdTT = epochJdTT;
  row.aAu = el.aAu;
  row.e = el.e;
  row.iDeg = el.iDeg;
  row.nodeDeg = el.nodeDeg;
  row.periDeg = el.periDeg;
  row.meanAnomalyDeg = el.meanAnomalyDeg;
  row.meanMotionDegPerDay = roundTo(meanMotionDegPerDay(el.aAu), 8);
  row.H = el.H;
  row.G = DEFAULT_SLOPE_G;
  row.uncertainty = q.uncertainty;
  row.nObs = q.nObs;
  row.nOpp = q.nOpp;
  row.arcDays = q.arcDays;
  row.firstObsYear = q.firstObsYear;
  row.lastObsYear = q.lastObsYear;
  row.lastObsJdTT = q.lastObsJdTT;
  row.rmsArcsec = roundTo(q.rmsArcsec, 2);
  row.reference = DEMO_REFERENCE_ASTEROID;
}

/** Comet elements as the comet export format writes them (q, e 6 decimals; angles 4). */
export interface CometElements {
  qAu: number;
  e: number;
  iDeg: number;
  nodeDeg: number;
  periDeg: number;
  tpJdTT: number;
  magnitudeM1: number; // total absolute magnitude
  slopeK1: number; // magnitude slope
}

export function emptyCometElements(): CometElements {
  return { qAu: NaN, e: NaN, iDeg: NaN, nodeDeg: NaN, periDeg: NaN, tpJdTT: NaN, magnitudeM1: NaN, slopeK1: NaN };
}

export function roundCometElements(c: CometElements): void {
  c.qAu = roundTo(c.qAu, 6);
  c.e = roundTo(c.e, 6);
  c.iDeg = roundTo(c.iDeg, 4);
  c.nodeDeg = roundAngleDeg(c.nodeDeg, 4);
  c.periDeg = roundAngleDeg(c.periDeg, 4);
  c.tpJdTT = roundTo(c.tpJdTT - 0.5, 4) + 0.5;
  c.magnitudeM1 = roundTo(c.magnitudeM1, 1);
  c.slopeK1 = roundTo(c.slopeK1, 1);
}

/** Semimajor axis of a comet orbit, a = q/(1 − e) (negative when hyperbolic, ∞ parabolic). */
export function cometSemimajorAxisAu(c: CometElements): number {
  return c.qAu / (1 - c.e);
}

/** Fills `row` for one comet-file line; `c` must already be rounded. */
export function fillCometRow(row: OrbitRow, c: CometElements, designation: string, name: string, epochJdTT: number): void {
  resetOrbitRow(row);
  row.kind = 'comet';
  row.designation = designation;
  row.name = name;
  row.epochJdTT = epochJdTT;
  row.qAu = c.qAu;
  row.e = c.e;
  row.aAu = c.e < 1 ? cometSemimajorAxisAu(c) : NaN;
  row.iDeg = c.iDeg;
  row.nodeDeg = c.nodeDeg;
  row.periDeg = c.periDeg;
  row.tpJdTT = c.tpJdTT;
  row.H = c.magnitudeM1;
  row.G = c.slopeK1;
  row.reference = DEMO_REFERENCE_COMET;
}
