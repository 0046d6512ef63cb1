/**
 * Parser of one line of the one-line minor-planet orbit export format (published column
 * layout of the one-line minor-planet orbit export format; columns in ./orbitExportLayout.ts).
 * Real lines are 165–202 characters: fields past the end of a line are absent (NaN / '').
 * Blank lines and lines of dashes → 'skip'; header text before the dashed line is the
 * file reader's business (./detectFormat.ts, ./readOrbitFile.ts). Every field of the
 * scratch row is assigned, so the row needs no reset between lines. A bad data line throws InputError (file, line, column).
 *
 * Missing semimajor axis: computed from the mean daily motion n by Kepler's third law
 * (./semimajorAxis.ts).
 * Arc as first–last years: arcDays = (last − first) × 365.25 (the Julian year), good to
 * about a year.
 */
import { DAYS_PER_JULIAN_YEAR } from '../core/constants.js';
import { calendarToJd } from '../core/time/julian.js';
import { isCalendarDay } from './calendarDay.js';
import { PackedFormError } from './errors.js';
import { fieldText, isBlankField, parseDigits } from './fixedField.js';
import { columnsOf, failAt, isSeparatorLine, optionalNumber, requiredNumber } from './fixedFieldRead.js';
import { ORBIT_COLUMNS as C } from './orbitExportLayout.js';
import { semimajorAxisFromMeanMotion } from './semimajorAxis.js';
import { unpackDesignation } from './packedDesignation.js';
import { unpackEpochJd } from './packedEpoch.js';
import { unpackNumber } from './packedNumber.js';
import type { LineOutcome, OrbitRow } from './types.js';

/**
 * End of the readable designation: column 194, or the end of the line when the text runs
 * across the 194|195 boundary without a space (real lines do this for long names after a
 * six-digit number, e.g. '(541132) Leleakuhonua'); there is then no last-observation date.
 */
function readableEnd(line: string): number {
  const b = C.readable[1];
  return line.length > b && line.charCodeAt(b - 1) !== 32 && line.charCodeAt(b) !== 32 ? line.length : b;
}

/**
 * Designation, number and name of `row` from the packed (1–7) and readable (167–194) texts,
 * both trimmed, packed not blank. False when the readable form's number disagrees with the
 * packed one; PackedFormError when the packed text is in no known form. Shared with the
 * byte-level reader (./orbitExportBytes.ts), so both make the same strings.
 */
export function fillDesignation(packed: string, readable: string, row: OrbitRow): boolean {
  row.packedDesignation = packed;
  row.number = unpackNumber(packed); // the common case first: no readable string to build
  const unpacked = Number.isNaN(row.number) ? unpackDesignation(packed) : '';
  row.designation = readable !== '' ? readable : unpacked !== '' ? unpacked : `(${row.number})`;
  row.name = '';
  if (Number.isFinite(row.number) && readable !== '') {
    // '(N)' or '(N) Name'
    const close = readable.indexOf(')');
    const n = readable.charCodeAt(0) === 40 && close > 1 ? parseDigits(readable, 1, close) : -1;
    if (n !== row.number) return false;
    row.name = readable.slice(close + 1).trim();
  }
  return true;
}

/** Designation fields: packed (1–7) and readable (167–194). */
function readDesignation(line: string, row: OrbitRow, file: string, lineNo: number): void {
  const packed = fieldText(line, C.packed[0], C.packed[1]);
  if (packed === '') failAt(file, lineNo, line, C.packed, `blank packed designation (${columnsOf(C.packed)})`);
  const readable = fieldText(line, C.readable[0], readableEnd(line));
  let agrees;
  try {
    agrees = fillDesignation(packed, readable, row);
  } catch (err) {
    if (err instanceof PackedFormError) failAt(file, lineNo, line, C.packed, err.message);
    throw err;
  }
  if (!agrees) {
    failAt(file, lineNo, line, C.readable, `readable designation '${readable}' disagrees with packed ${packed} = (${row.number})`);
  }
}

/** Arc field: 'YYYY-YYYY' or 'NNNN days'; blank → NaN. Char-code checks (hot path). */
function readArc(line: string, row: OrbitRow, file: string, lineNo: number): void {
  row.firstObsYear = NaN;
  row.lastObsYear = NaN;
  row.arcDays = NaN;
  const [a, b] = C.arc;
  if (isBlankField(line, a, b)) return;
  const first = parseDigits(line, a, a + 4);
  const last = line.charCodeAt(a + 4) === 45 ? parseDigits(line, a + 5, b) : -1; // '-'
  if (first >= 0 && last >= 0) {
    row.firstObsYear = first;
    row.lastObsYear = last;
    row.arcDays = (last - first) * DAYS_PER_JULIAN_YEAR;
    return;
  }
  const text = fieldText(line, a, b);
  const days = /^(\d+) days$/.exec(text);
  if (!days) failAt(file, lineNo, line, C.arc, `arc is neither 'YYYY-YYYY' nor 'N days': '${text}' (${columnsOf(C.arc)})`);
  row.arcDays = Number(days[1]);
}

/** Date of last observation, YYYYMMDD; blank → NaN. */
function readLastObs(line: string, row: OrbitRow, file: string, lineNo: number): void {
  row.lastObsJdTT = NaN;
  const [a, b] = C.lastObs;
  if (readableEnd(line) !== C.readable[1] || isBlankField(line, a, b)) return;
  const year = parseDigits(line, a, a + 4);
  const month = parseDigits(line, a + 4, a + 6);
  const day = parseDigits(line, a + 6, a + 8);
  if (year < 0 || !isCalendarDay(year, month, day) || !isBlankField(line, b, line.length)) {
    failAt(file, lineNo, line, C.lastObs, `date of last observation is not a YYYYMMDD date: '${fieldText(line, a, line.length)}' (${columnsOf(C.lastObs)})`);
  }
  row.lastObsJdTT = calendarToJd(year, month, day);
}

function readUncertainty(line: string, row: OrbitRow): void {
  const c = C.U[0] < line.length ? line.charCodeAt(C.U[0]) : 32;
  row.uncertainty = c >= 48 && c <= 57 ? c - 48 : NaN;
  row.uncertaintyCode = c === 32 || (c >= 48 && c <= 57) ? '' : line[C.U[0]];
}

/** Elements block (epoch .. a); a from n when blank. */
function readElements(line: string, row: OrbitRow, file: string, lineNo: number): void {
  if (line.length <= C.epoch[0]) {
    failAt(file, lineNo, line, C.epoch, `line ends at column ${line.length}, before the epoch (${columnsOf(C.epoch)})`);
  }
  const epoch = fieldText(line, C.epoch[0], C.epoch[1]);
  if (epoch === '') failAt(file, lineNo, line, C.epoch, `missing epoch (${columnsOf(C.epoch)})`);
  try {
    row.epochJdTT = unpackEpochJd(epoch);
  } catch (err) {
    if (err instanceof PackedFormError) failAt(file, lineNo, line, C.epoch, err.message);
    throw err;
  }
  row.meanAnomalyDeg = requiredNumber(line, C.M, 'mean anomaly', file, lineNo);
  row.periDeg = requiredNumber(line, C.peri, 'argument of perihelion', file, lineNo);
  row.nodeDeg = requiredNumber(line, C.node, 'longitude of the ascending node', file, lineNo);
  row.iDeg = requiredNumber(line, C.incl, 'inclination', file, lineNo);
  row.e = requiredNumber(line, C.e, 'eccentricity', file, lineNo);
  row.meanMotionDegPerDay = optionalNumber(line, C.n, 'mean daily motion', file, lineNo);
  row.aAu = optionalNumber(line, C.a, 'semimajor axis', file, lineNo);
  if (Number.isNaN(row.aAu)) {
    row.aAu = semimajorAxisFromMeanMotion(row.meanMotionDegPerDay);
    if (Number.isNaN(row.aAu)) {
      failAt(file, lineNo, line, C.a, `missing semimajor axis and no positive mean daily motion to derive it (${columnsOf(C.n)}, ${columnsOf(C.a)})`);
    }
  }
}

/**
 * Fill `row` from one line. Returns 'row' or 'skip' (blank / dashed separator line);
 * throws InputError for a data line it cannot read.
 */
export function parseOrbitExportLine(line: string, row: OrbitRow, file: string, lineNo: number): LineOutcome {
  if (isSeparatorLine(line)) return 'skip';
  row.kind = 'asteroid';
  readDesignation(line, row, file, lineNo);
  row.H = optionalNumber(line, C.H, 'absolute magnitude H', file, lineNo);
  row.G = optionalNumber(line, C.G, 'slope parameter G', file, lineNo);
  readElements(line, row, file, lineNo);
  row.qAu = NaN;
  row.tpJdTT = NaN;
  readUncertainty(line, row);
  row.reference = fieldText(line, C.reference[0], C.reference[1]);
  row.nObs = optionalNumber(line, C.nObs, 'number of observations', file, lineNo);
  row.nOpp = optionalNumber(line, C.nOpp, 'number of oppositions', file, lineNo);
  readArc(line, row, file, lineNo);
  row.rmsArcsec = optionalNumber(line, C.rms, 'rms residual', file, lineNo);
  readLastObs(line, row, file, lineNo);
  return 'row';
}
