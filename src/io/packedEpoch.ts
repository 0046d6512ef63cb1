/**
 * Packed dates of the 5-character form `CYYMD` (published description of the packed date
 * form used for osculation epochs): century letter (I = 18, J = 19, K = 20, L = 21), two
 * digits of the year, month as one base-62 digit 1..9, A..C (10..12), day as one base-62
 * digit 1..9, A..V (10..31). `K2669` = 2026 June 9, `J949P` = 1994 Sept 25.
 * The date is at 0h of the time scale the file uses for epochs (TT); returned as a Julian
 * date through core/time/julian.ts (Meeus ch. 7).
 */
import { calendarToJd, jdToCalendar, type CalendarDate } from '../core/time/julian.js';
import { base62Encode, base62Value } from './base62.js';
import { daysInMonth } from './calendarDay.js';
import { PackedFormError } from './errors.js';
import { packCenturyYear, unpackCenturyYear } from './packedProvisional.js';

/**
 * Julian date (at 0h) of a packed 5-character date; PackedFormError naming the bad part
 * when `packed` is not a valid date in that form.
 */
export function unpackEpochJd(packed: string): number {
  if (packed.length !== 5) throw new PackedFormError('packed date is not 5 characters', packed);
  const year = unpackCenturyYear(packed, 0);
  if (Number.isNaN(year)) throw new PackedFormError('packed date has no century letter I..L and year', packed);
  const month = base62Value(packed.charCodeAt(3));
  if (month < 1 || month > 12) throw new PackedFormError('packed date has a month outside 1..9, A..C', packed);
  const day = base62Value(packed.charCodeAt(4));
  if (day < 1 || day > daysInMonth(year, month)) {
    throw new PackedFormError('packed date has a day outside its month', packed);
  }
  return calendarToJd(year, month, day);
}

/** Packed form of a calendar date (integer day), years 1800..2199. */
export function packDate(year: number, month: number, day: number): string {
  const yy = packCenturyYear(year);
  if (yy === '' || !Number.isInteger(month) || month < 1 || month > 12 ||
      !Number.isInteger(day) || day < 1 || day > daysInMonth(year, month)) {
    throw new RangeError(`packDate: ${year}-${month}-${day} has no packed form (years 1800..2199, whole days)`);
  }
  return yy + base62Encode(month, 1) + base62Encode(day, 1);
}

/**
 * Calendar date, whole day, of a Julian date that falls at 0h (within 1e-6 day, ~0.09 s);
 * RangeError `WHO: JD … is not at 0h; FORM carries whole days` otherwise. For the writers
 * of whole-day date fields, which must not drop a fraction of a day silently.
 */
export function calendarDayAt0h(jd: number, who: string, form: string): CalendarDate {
  const z = Math.round(jd + 0.5) - 0.5;
  if (!Number.isFinite(jd) || Math.abs(jd - z) > 1e-6) {
    throw new RangeError(`${who}: JD ${jd} is not at 0h; ${form} carries whole days`);
  }
  const d = jdToCalendar(z);
  return { year: d.year, month: d.month, day: Math.round(d.day) };
}

/**
 * Packed form of a Julian date that falls at 0h (within 1e-6 day, ~0.09 s); RangeError
 * otherwise, since the form carries whole days only.
 */
export function packEpochJd(jd: number): string {
  const d = calendarDayAt0h(jd, 'packEpochJd', 'the packed date form');
  return packDate(d.year, d.month, d.day);
}
