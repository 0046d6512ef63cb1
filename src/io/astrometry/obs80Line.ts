/**
 * One line of the 80-column optical astrometry record (columns in ./obs80Layout.ts): the
 * date, the position with its precision as written, magnitude and band, catalogue code
 * and station. The designation is read by ./obs80Designation.ts, note 2 decides what kind
 * of line it is (./obs80NoteTwo.ts). Every failure is an InputError naming file, line and
 * the published columns.
 */
import { RAD_PER_DEG } from '../../core/constants.js';
import { isCalendarDay } from '../calendarDay.js';
import { fieldText, isBlankField, parseDigits } from '../fixedField.js';
import { columnsOf, failAt, optionalNumber } from '../fixedFieldRead.js';
import type { Obs80Designation } from './obs80Designation.js';
import { OBS80 as C, OBS80_LINE_LENGTH } from './obs80Layout.js';
import { timesFromUtcDay, type ObservationTimes } from './observationTime.js';
import { parseDeclination, parseRightAscension } from './sexagesimal.js';
import type { AstrometryObservation } from './types.js';

/** InputError unless the line is 80 characters (anything past column 80 must be blank). */
export function checkObs80Length(line: string, file: string, lineNo: number): void {
  if (line.length < OBS80_LINE_LENGTH || !isBlankField(line, OBS80_LINE_LENGTH, line.length)) {
    const what = line.length < OBS80_LINE_LENGTH ? `ends at column ${line.length}` : `has text past column ${OBS80_LINE_LENGTH}`;
    failAt(file, lineNo, line, [Math.min(line.length, OBS80_LINE_LENGTH), OBS80_LINE_LENGTH + 1], `line ${what}; an 80-column record has exactly 80`);
  }
}

/** Date of columns 16–32 ('YYYY MM DD.dddddd', UTC) as UTC and TT Julian dates. */
export function readObs80Date(line: string, file: string, lineNo: number): ObservationTimes {
  const year = parseDigits(line, C.year[0], C.year[1]);
  const month = parseDigits(line, C.month[0], C.month[1]);
  const dayText = fieldText(line, C.day[0], C.day[1]);
  const day = /^\d\d(\.\d*)?$/.test(dayText) ? Number(dayText) : NaN;
  const separated = line[C.year[1]] === ' ' && line[C.month[1]] === ' ';
  if (year < 0 || !separated || !isCalendarDay(year, month, day)) {
    failAt(file, lineNo, line, C.date, `date is not 'YYYY MM DD.dddddd': '${fieldText(line, C.date[0], C.date[1])}' (${columnsOf(C.date)})`);
  }
  return timesFromUtcDay(year, month, day);
}

/** Station code of columns 78–80: three letters or digits. */
export function readObs80Station(line: string, file: string, lineNo: number): string {
  const code = line.slice(C.station[0], C.station[1]);
  if (!/^[0-9A-Z]{3}$/.test(code)) failAt(file, lineNo, line, C.station, `observatory code is not three letters or digits: '${code}' (${columnsOf(C.station)})`);
  return code;
}

/** The observation of a one-line record (kind 'optical'; a pair's second line fills in the rest). */
export function parseObs80Line(line: string, file: string, lineNo: number, d: Obs80Designation): AstrometryObservation {
  const times = readObs80Date(line, file, lineNo);
  const ra = parseRightAscension(line.slice(C.ra[0], C.ra[1]).trimEnd());
  if (typeof ra === 'string') failAt(file, lineNo, line, C.ra, `${ra} (${columnsOf(C.ra)})`);
  const dec = parseDeclination(line.slice(C.dec[0], C.dec[1]).trimEnd());
  if (typeof dec === 'string') failAt(file, lineNo, line, C.dec, `${dec} (${columnsOf(C.dec)})`);
  const mag = optionalNumber(line, C.mag, 'magnitude', file, lineNo);
  const note2 = line[C.note2[0]];
  return {
    // fields one by one, not `...d`: a spread into this literal made each observation a
    // dictionary-mode object (measured 40 µs a line instead of a few)
    designation: d.designation, packed: d.packed, number: d.number, provisional: d.provisional, temporary: d.temporary,
    timeJdUtc: times.jdUtc, timeJdTT: times.jdTT,
    raRad: ra.value * 15 * RAD_PER_DEG, decRad: dec.value * RAD_PER_DEG,
    raDecimals: ra.decimals, decDecimals: dec.decimals,
    raResolutionArcsec: ra.resolutionArcsec, decResolutionArcsec: dec.resolutionArcsec,
    sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, correlationRaDec: NaN,
    station: readObs80Station(line, file, lineNo),
    kind: 'optical', observerGeocentricKm: null, rovingSite: null,
    mag, band: fieldText(line, C.band[0], C.band[1]),
    note1: fieldText(line, C.note1[0], C.note1[1]), note2: note2 === ' ' ? '' : note2, mode: '',
    catalogue: fieldText(line, C.catalogue[0], C.catalogue[1]),
    discovery: line[C.discovery[0]] === '*',
    file, line: lineNo, lines: 1,
  };
}
