/**
 * Parser of one line of the one-line comet orbit export format (published column layout of
 * the one-line comet orbit export format; columns in ./cometExportLayout.ts). The row gets
 * kind 'comet', the perihelion time and distance; mean anomaly and mean motion are NaN;
 * a = q / (1 − e) when e < 1 and q > 0 (NaN otherwise; ./semimajorAxis.ts). The designation is the canonical readable
 * form of the packed columns 1–12 ('1P', 'C/1995 O1'); the name is taken from columns
 * 103–158 ('Halley' from '1P/Halley', 'Hale-Bopp' from 'C/1995 O1 (Hale-Bopp)').
 */
import { calendarToJd } from '../core/time/julian.js';
import { isCalendarDay } from './calendarDay.js';
import { COMET_COLUMNS as C, COMET_ORBIT_TYPES } from './cometExportLayout.js';
import { fieldText } from './fixedField.js';
import { columnsOf, failAt, isSeparatorLine, optionalNumber, requiredNumber, type Field } from './fixedFieldRead.js';
import { unpackComet } from './packedComet.js';
import { semimajorAxisFromPerihelion } from './semimajorAxis.js';
import type { LineOutcome, OrbitRow } from './types.js';

/** Columns 1–12 and 103–158: packed and readable designation, name. */
function readDesignation(line: string, row: OrbitRow, file: string, lineNo: number): void {
  const type = line[C.type[0]] ?? ' ';
  if (!COMET_ORBIT_TYPES.includes(type) || type === ' ') {
    failAt(file, lineNo, line, C.type, `orbit type '${type}' is not one of ${COMET_ORBIT_TYPES.split('').join(', ')} (${columnsOf(C.type)})`);
  }
  const num = fieldText(line, C.number[0], C.number[1]);
  const prov = fieldText(line, C.provisional[0], C.provisional[1]);
  // a numbered comet: its number, or number + fragment letters (provisional columns ignored
  // otherwise); an unnumbered one: type + provisional
  const fragment = num !== '' && /^[a-z]{1,2}$/.test(prov);
  const packed = num === '' ? type + prov : num.padStart(4, '0') + type + (fragment ? prov.padStart(7) : '');
  const unpacked = unpackComet(packed);
  if (unpacked === '') {
    const f: Field = num !== '' ? C.number : C.provisional;
    failAt(file, lineNo, line, f, `unknown packed comet designation form: '${line.slice(0, C.provisional[1]).trim()}' (columns 1–12)`);
  }
  row.packedDesignation = packed;
  row.designation = unpacked;
  const readable = fieldText(line, C.readable[0], C.readable[1]);
  const named = num !== '' ? /^\d+[PDI](?:-[A-Z]{1,2})?\/(.+)$/.exec(readable) : /^\S+ \S+ \((.+)\)$/.exec(readable);
  row.name = named ? named[1] : '';
}

/** Columns 15–29: perihelion date in TT, day with fraction. */
function readPerihelion(line: string, row: OrbitRow, file: string, lineNo: number): void {
  const year = requiredNumber(line, C.tpYear, 'perihelion year', file, lineNo);
  const month = requiredNumber(line, C.tpMonth, 'perihelion month', file, lineNo);
  const day = requiredNumber(line, C.tpDay, 'perihelion day', file, lineNo);
  if (!isCalendarDay(year, month, day)) {
    failAt(file, lineNo, line, C.tpYear, `perihelion date is not a calendar date: '${fieldText(line, C.tpYear[0], C.tpDay[1])}' (columns 15–29)`);
  }
  row.tpJdTT = calendarToJd(year, month, day);
}

/** Columns 82–89: epoch YYYYMMDD (0h TT); blank → NaN. */
function readEpoch(line: string, row: OrbitRow, file: string, lineNo: number): void {
  const f: Field = [C.epochYear[0], C.epochDay[1]];
  const text = fieldText(line, f[0], f[1]);
  row.epochJdTT = NaN;
  if (text === '') return;
  const m = /^(\d{4})(\d{2})(\d{2})$/.exec(text);
  const month = m ? Number(m[2]) : 0;
  const day = m ? Number(m[3]) : 0;
  if (!m || !isCalendarDay(Number(m[1]), month, day)) {
    failAt(file, lineNo, line, f, `epoch is not a YYYYMMDD date: '${text}' (columns 82–89)`);
  }
  row.epochJdTT = calendarToJd(Number(m[1]), month, day);
}

function clearAsteroidFields(row: OrbitRow): void {
  row.number = NaN;
  row.meanAnomalyDeg = NaN;
  row.meanMotionDegPerDay = NaN;
  row.uncertainty = NaN;
  row.uncertaintyCode = '';
  row.nObs = NaN;
  row.nOpp = NaN;
  row.arcDays = NaN;
  row.firstObsYear = NaN;
  row.lastObsYear = NaN;
  row.lastObsJdTT = NaN;
  row.rmsArcsec = NaN;
}

/**
 * Fill `row` from one comet line. 'skip' for blank and dashed separator lines; InputError
 * for a data line it cannot read.
 */
export function parseCometExportLine(line: string, row: OrbitRow, file: string, lineNo: number): LineOutcome {
  if (isSeparatorLine(line)) return 'skip';
  row.kind = 'comet';
  readDesignation(line, row, file, lineNo);
  readPerihelion(line, row, file, lineNo);
  row.qAu = requiredNumber(line, C.q, 'perihelion distance', file, lineNo);
  row.e = requiredNumber(line, C.e, 'eccentricity', file, lineNo);
  row.periDeg = requiredNumber(line, C.peri, 'argument of perihelion', file, lineNo);
  row.nodeDeg = requiredNumber(line, C.node, 'longitude of the ascending node', file, lineNo);
  row.iDeg = requiredNumber(line, C.incl, 'inclination', file, lineNo);
  row.aAu = semimajorAxisFromPerihelion(row.qAu, row.e);
  readEpoch(line, row, file, lineNo);
  row.H = optionalNumber(line, C.H, 'absolute magnitude', file, lineNo);
  row.G = optionalNumber(line, C.G, 'slope parameter', file, lineNo);
  row.reference = fieldText(line, C.reference[0], line.length); // real references run past 168
  clearAsteroidFields(row);
  return 'row';
}
