/**
 * Values of CSV/TSV cells: numbers, Julian dates written as JD, MJD or calendar dates, and
 * designations. Empty cell → NaN / ''. A cell that is not what its column needs → a
 * PackedFormError-style reason (the table reader turns it into an InputError naming the
 * line and the column header).
 *
 * Dates accepted: a Julian date (a number from 1e6 to 1e7); an MJD where the column says so
 * (MJD = JD − 2 400 000.5, IAU 1997 Resolution B1); ISO 8601 calendar dates `2026-06-09`,
 * `2026-06-09T00:00:00[.sss][Z]`, `2026-06-09.25` (fractional day); compact `20260609`;
 * the 5-character packed date `K2669`. Calendar dates are taken in the file's time scale.
 */
import { MJD_OFFSET } from '../core/constants.js';
import { calendarToJd } from '../core/time/julian.js';
import { isCalendarDay } from './calendarDay.js';
import { PackedFormError } from './errors.js';
import { unpackEpochJd } from './packedEpoch.js';
import { unpackNumber } from './packedNumber.js';
import { packProvisional } from './packedProvisional.js';
import { emptyOrbitRow, type OrbitRow } from './types.js';
import { COMET_DESIGNATION } from './bodyKind.js';

const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/**
 * A decimal number, NaN for an empty cell; throws PackedFormError when not a number, or
 * when it overflows a double ('1e999' would otherwise be Infinity in a column).
 */
export function cellNumber(text: string): number {
  if (text === '') return NaN;
  if (!NUMBER.test(text)) throw new PackedFormError('not a number', text);
  const v = Number(text);
  if (!Number.isFinite(v)) throw new PackedFormError('not a finite number', text);
  return v;
}

/**
 * Julian date of a calendar date and time of day. Hour 24 only as 24:00:00, the end of the
 * day (ISO 8601, from memory); 24:30 is bad data, not the next day's 00:30.
 */
function calendar(y: string, mo: string, d: string, h = '0', mi = '0', s = '0', text = ''): number {
  const month = Number(mo);
  const day = Number(d);
  const [hour, minute, second] = [Number(h), Number(mi), Number(s)];
  const endOfDay = hour === 24 && minute === 0 && second === 0;
  if (!isCalendarDay(Number(y), month, day) || (hour > 23 && !endOfDay) || minute > 59 || second >= 61) {
    throw new PackedFormError('not a calendar date', text);
  }
  return calendarToJd(Number(y), month, day + (hour + minute / 60 + second / 3600) / 24);
}

/** Julian date of a date cell (see the file comment); NaN when empty. */
export function cellJd(text: string, isMjd = false): number {
  if (text === '') return NaN;
  let m = /^(\d{4})-(\d{2})-(\d{2}(?:\.\d*)?)$/.exec(text);
  if (m) return calendar(m[1], m[2], m[3], '0', '0', '0', text);
  m = /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2}(?:\.\d*)?))?Z?$/.exec(text);
  if (m) return calendar(m[1], m[2], m[3], m[4], m[5], m[6] ?? '0', text);
  m = /^(\d{4})(\d{2})(\d{2})$/.exec(text);
  if (m && !isMjd) return calendar(m[1], m[2], m[3], '0', '0', '0', text);
  if (/^[I-L]\d\d[1-9A-C][1-9A-V]$/.test(text)) return unpackEpochJd(text);
  const v = cellNumber(text);
  if (isMjd) return v + MJD_OFFSET;
  if (v < 1e6 || v > 1e7) throw new PackedFormError('not a Julian date (a number 1e6..1e7; MJD needs an *_mjd column)', text);
  return v;
}

/** Calendar year of a date cell (first_obs, last_obs), NaN when empty. */
export function cellYear(text: string): number {
  if (text === '') return NaN;
  const m = /^(\d{4})/.exec(text);
  if (!m) throw new PackedFormError('not a date', text);
  return Number(m[1]);
}

/**
 * Designation, number and name from a designation cell: '(1) Ceres', '1 Ceres (A801 AA)'
 * (number, name, provisional), '1', '(2019 EU5)', '2019 EU5', 'C/1995 O1', a packed
 * 5-character number '00001' / 'A0000' / '~0000'. Fills row.designation, row.number and,
 * when the cell has one, row.name.
 */
export function cellDesignation(text: string, row: OrbitRow): void {
  let t = text.trim();
  const paren = /^\(([^()]*)\)$/.exec(t);
  if (paren && !/^\d+$/.test(paren[1])) t = paren[1].trim();
  // '2019 EU5' and '2040 P-L' are provisional designations, not number + name
  const provisional = packProvisional(t) !== '';
  const numbered = provisional ? null
    : /^\((\d+)\)\s*(.*)$/.exec(t) ?? /^(\d+)(?:\s+([^(]*?))?\s*(?:\(.*\))?$/.exec(t);
  let n = numbered ? Number(numbered[1]) : NaN;
  const name = numbered ? (numbered[2] ?? '').trim() : '';
  if (!numbered && t.length === 5) n = unpackNumber(t);
  if (Number.isFinite(n) && n > 0) {
    row.number = n;
    row.name = name || row.name;
    row.designation = `(${n})${row.name ? ` ${row.name}` : ''}`;
    return;
  }
  row.number = NaN;
  row.designation = t;
}

/** Scratch row for fullNameParts (its designation parse fills more than it needs). */
const FULL_NAME_ROW = emptyOrbitRow();

/**
 * Number and proper name written in a full-name cell, for a row whose designation comes
 * from another column: '1 Ceres (A801 AA)' → 1, 'Ceres'; '(2019 EU5)' → NaN, '';
 * comets: '1P/Halley' → NaN, 'Halley'; 'C/1995 O1 (Hale-Bopp)' → NaN, 'Hale-Bopp'
 * (the name forms of the comet export lines, common practice).
 */
export function fullNameParts(text: string): { number: number; name: string } {
  const t = text.trim();
  if (COMET_DESIGNATION.test(t)) {
    const m = /\(([^()]+)\)$/.exec(t) ?? /^\d+[PDI](?:-[A-Z]+)?\/(.+)$/.exec(t);
    return { number: NaN, name: m ? m[1].trim() : '' };
  }
  FULL_NAME_ROW.name = '';
  cellDesignation(t, FULL_NAME_ROW);
  return { number: FULL_NAME_ROW.number, name: FULL_NAME_ROW.name };
}
