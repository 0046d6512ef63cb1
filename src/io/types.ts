/**
 * Types of the io layer: one parsed input row, parse outcomes, and the error a bad row
 * carries. Missing-value policy: a number that the input does not give is NaN, never
 * undefined; a string it does not give is ''.
 */

/** What catalogue a row came from: asteroid-style elements or comet-style elements. */
export type BodyKind = 'asteroid' | 'comet';

/** Input formats the readers understand. */
export type InputFormat = 'orbit-export' | 'comet-export' | 'csv';

/**
 * One input row after parsing, before validation. Caller-owned scratch: a parser fills it
 * in place (no allocation per row beyond the designation strings). Angles in degrees, as
 * written in the inputs; epochs as Julian dates in TT.
 */
export interface OrbitRow {
  designation: string; // readable form, e.g. '(1) Ceres', '2019 EU5', 'C/1995 O1'
  packedDesignation: string; // as written in a packed-format input, '' otherwise
  number: number; // minor-planet number, NaN when unnumbered
  name: string; // proper name where the input gives one, '' otherwise
  kind: BodyKind;
  epochJdTT: number; // osculation epoch
  aAu: number; // semimajor axis (NaN if absent; negative for hyperbolic when given so)
  qAu: number; // perihelion distance (NaN if absent)
  e: number; // eccentricity
  iDeg: number; // inclination, J2000 ecliptic
  nodeDeg: number; // longitude of ascending node, J2000 ecliptic
  periDeg: number; // argument of perihelion, J2000 ecliptic
  meanAnomalyDeg: number; // at epoch (NaN if the input gives tp instead)
  tpJdTT: number; // time of perihelion passage (NaN if absent)
  meanMotionDegPerDay: number; // NaN if absent
  H: number; // absolute magnitude (asteroid H or comet total magnitude M1); NaN if absent
  G: number; // slope parameter (or comet K1); NaN if absent
  uncertainty: number; // orbit uncertainty parameter U, 0 (best)..9 (worst); NaN if absent
  uncertaintyCode: string; // '' or a letter code written in place of U (e.g. 'E', 'D', 'F')
  nObs: number; // observations used; NaN if absent
  nOpp: number; // oppositions; NaN if absent
  arcDays: number; // observed arc in days (from the arc field or first–last years); NaN
  firstObsYear: number; // NaN if absent
  lastObsYear: number; // NaN if absent
  lastObsJdTT: number; // date of last observation; NaN if absent
  rmsArcsec: number; // rms residual; NaN if absent
  reference: string; // publication reference, '' if absent
}

/** A fresh OrbitRow with every field at its missing value. */
export function emptyOrbitRow(): OrbitRow {
  const row: OrbitRow = {
    designation: '', packedDesignation: '', number: NaN, name: '', kind: 'asteroid',
    epochJdTT: NaN, aAu: NaN, qAu: NaN, e: NaN, iDeg: NaN, nodeDeg: NaN, periDeg: NaN,
    meanAnomalyDeg: NaN, tpJdTT: NaN, meanMotionDegPerDay: NaN, H: NaN, G: NaN,
    uncertainty: NaN, uncertaintyCode: '', nObs: NaN, nOpp: NaN, arcDays: NaN,
    firstObsYear: NaN, lastObsYear: NaN, lastObsJdTT: NaN, rmsArcsec: NaN, reference: '',
  };
  return row;
}

/** Reset an OrbitRow to missing values in place (for reuse between lines). */
export function resetOrbitRow(row: OrbitRow): void {
  Object.assign(row, emptyOrbitRow());
}

/**
 * Bad data in an input: names the file, the 1-based line and column (0 when unknown),
 * and carries the offending text. `message` is one line:
 * `FILE:LINE:COL: REASON` (COL omitted when 0).
 */
export class InputError extends Error {
  readonly file: string;
  readonly line: number;
  readonly column: number;
  readonly reason: string;
  readonly text: string;
  constructor(file: string, line: number, column: number, reason: string, text: string) {
    super(`${file}:${line}${column > 0 ? `:${column}` : ''}: ${reason}`);
    this.name = 'InputError';
    this.file = file;
    this.line = line;
    this.column = column;
    this.reason = reason;
    this.text = text;
  }
}

/**
 * What a line parser says about one line: 'row' (the scratch row is filled), 'skip'
 * (a header, separator or blank line: not a data row, not counted as read), or it throws
 * an InputError for a data row it cannot read (counted as read and rejected).
 */
export type LineOutcome = 'row' | 'skip';
