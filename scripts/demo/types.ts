/**
 * Types of the demo generator: the scratch orbital elements a sampler fills, the quality
 * record of a row, the population classes, and one row of the truth table.
 * Angles in degrees (as written in the export formats), lengths in au.
 */
import type { Section } from './scenario.js';

/** Scratch elements, filled in place by the samplers (one object reused for every row). */
export interface DemoElements {
  aAu: number; // semimajor axis
  e: number; // eccentricity
  iDeg: number; // inclination to the J2000 ecliptic
  nodeDeg: number; // longitude of ascending node
  periDeg: number; // argument of perihelion
  meanAnomalyDeg: number; // at the demo epoch
  H: number; // absolute magnitude
}

export function emptyElements(): DemoElements {
  return { aAu: NaN, e: NaN, iDeg: NaN, nodeDeg: NaN, periDeg: NaN, meanAnomalyDeg: NaN, H: NaN };
}

/** Quality fields of one row (NaN where the row's section does not give them). */
export interface DemoQuality {
  nObs: number;
  nOpp: number;
  firstObsYear: number; // multi-opposition only
  lastObsYear: number; // multi-opposition only
  arcDays: number; // one-opposition only
  lastObsJdTT: number;
  uncertainty: number; // U 0..9
  rmsArcsec: number;
  designationYear: number; // provisional designation year (NaN for numbered)
  designationHalfMonth: number; // 0..23 (NaN for numbered)
}

export function emptyQuality(): DemoQuality {
  return {
    nObs: NaN, nOpp: NaN, firstObsYear: NaN, lastObsYear: NaN, arcDays: NaN, lastObsJdTT: NaN,
    uncertainty: NaN, rmsArcsec: NaN, designationYear: NaN, designationHalfMonth: NaN,
  };
}

/** Natural asteroid population classes. */
export type AsteroidClass =
  | 'main-belt' | 'family' | 'hungaria' | 'hilda' | 'jupiter-trojan'
  | 'apollo' | 'aten' | 'amor' | 'mars-crosser' | 'centaur' | 'tno';

/** Natural comet population classes. */
export type CometClass = 'jupiter-family' | 'halley-type' | 'long-period';

/** Which demo file a row is in. */
export type DemoFile = 'orbits.txt' | 'comets.txt';

/** One row of truth.csv: a planted body, a bad row or a duplicate. */
/** A row appended to the asteroid file as a block of its own (the demo body for check), with its truth.csv row. */
export interface TrailingRow {
  line: string; // the export line
  truth: Omit<TruthRow, 'line'>;
}

export interface TruthRow {
  designation: string; // readable, '' for a garbage line
  file: DemoFile;
  line: number; // 1-based line in `file`
  plantedClass: string; // e.g. 'comet-like-T', 'quasi-satellite', 'bad-row', 'duplicate'
  detector: string; // detector (or layer) expected to raise it
  aAu: number;
  e: number;
  iDeg: number;
  tisserandJ: number;
  note: string;
}

/** Where a planted asteroid-file body goes and how good its orbit is. */
export type PlantedQuality = 'good' | 'poor';
export interface SectionSlot {
  section: Section;
  position: number; // insert before the position-th natural row of the section
}
