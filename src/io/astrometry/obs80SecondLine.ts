/**
 * Second lines of the two-line 80-column records, read into the observation of their first
 * line (columns in ./obs80Layout.ts):
 * - 's' (space-based observer): column 33 '1' for km or '2' for au, the geocentric position
 *   X, Y, Z of the observer, equatorial J2000, each with its sign in its first column
 *   (published description of the satellite-based format, checked). Real lines write the
 *   sign apart from the digits ('- 6490.4555'). Kept in km (au × KM_PER_AU).
 * - 'v' (roving observer): east longitude (degrees), latitude (degrees, signed) and
 *   altitude (metres) of the site (format description, from memory).
 * The second line must repeat the designation (columns 1–12), the date (16–32) and the
 * station (78–80) of the first: otherwise both lines are rejected by the caller.
 */
import { KM_PER_AU } from '../../core/constants.js';
import { fieldText, parseFixedNumber } from '../fixedField.js';
import { columnsOf, failAt, optionalNumber, requiredNumber, type Field } from '../fixedFieldRead.js';
import { OBS80 as C } from './obs80Layout.js';
import type { AstrometryObservation } from './types.js';

/** '' when `second` repeats designation, date and station of `first`; otherwise what differs. */
export function pairMismatch(first: string, second: string): string {
  const differs: string[] = [];
  if (first.slice(C.designation[0], C.designation[1]) !== second.slice(C.designation[0], C.designation[1])) differs.push(`designation (${columnsOf(C.designation)})`);
  if (first.slice(C.date[0], C.date[1]) !== second.slice(C.date[0], C.date[1])) differs.push(`date (${columnsOf(C.date)})`);
  if (first.slice(C.station[0], C.station[1]) !== second.slice(C.station[0], C.station[1])) differs.push(`station (${columnsOf(C.station)})`);
  return differs.join(', ');
}

/** A signed component: sign in the field's first column, the number in the rest. */
function signedComponent(line: string, field: Field, what: string, file: string, lineNo: number): number {
  const sign = line[field[0]];
  if (sign !== '+' && sign !== '-') failAt(file, lineNo, line, field, `${what} has no sign in column ${field[0] + 1}: '${fieldText(line, field[0], field[1])}' (${columnsOf(field)})`);
  const v = parseFixedNumber(line, field[0] + 1, field[1]);
  if (Number.isNaN(v) || v < 0) failAt(file, lineNo, line, field, `${what} is not a number: '${fieldText(line, field[0], field[1])}' (${columnsOf(field)})`);
  return sign === '-' ? -v : v;
}

/** Fills the observer's geocentric position (km) of a space-based pair from its 's' line. */
export function applySpaceLine(obs: AstrometryObservation, line: string, file: string, lineNo: number): void {
  const units = line[C.units[0]];
  if (units !== '1' && units !== '2') failAt(file, lineNo, line, C.units, `position units flag is '${units}', not 1 (km) or 2 (au) (${columnsOf(C.units)})`);
  const scale = units === '1' ? 1 : KM_PER_AU;
  obs.observerGeocentricKm = [
    signedComponent(line, C.x, 'observer X', file, lineNo) * scale,
    signedComponent(line, C.y, 'observer Y', file, lineNo) * scale,
    signedComponent(line, C.z, 'observer Z', file, lineNo) * scale,
  ];
  obs.kind = 'space';
  obs.lines = 2;
}

/** Fills the roving observer's site of a roving pair from its 'v' line. */
export function applyRovingLine(obs: AstrometryObservation, line: string, file: string, lineNo: number): void {
  const lon = requiredNumber(line, C.longitude, 'longitude', file, lineNo);
  if (lon < 0 || lon >= 360) failAt(file, lineNo, line, C.longitude, `longitude ${lon} is not in [0, 360) degrees east (${columnsOf(C.longitude)})`);
  const lat = requiredNumber(line, C.latitude, 'latitude', file, lineNo);
  if (Math.abs(lat) > 90) failAt(file, lineNo, line, C.latitude, `latitude ${lat} is not in [−90, 90] degrees (${columnsOf(C.latitude)})`);
  const alt = optionalNumber(line, C.altitude, 'altitude', file, lineNo);
  obs.rovingSite = { longitudeDegE: lon, latitudeDeg: lat, altitudeM: alt };
  obs.kind = 'roving';
  obs.lines = 2;
}
