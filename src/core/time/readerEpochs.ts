/**
 * Epoch helpers for the readers and the command line: calendar dates with a fractional day
 * and ISO text to Julian dates in TT, and JD ↔ MJD.
 */
import type { TimeScale } from '../types.js';
import { MJD_OFFSET } from '../constants.js';
import { calendarToJd } from './julian.js';
import { Instant } from './time.js';

/**
 * Readers' helper: Julian date in TT of a calendar date with a fractional day given in
 * `scale` (the orbit export formats give TT; 80-column astrometry gives UTC).
 */
export function calendarDayToJdTT(year: number, month: number, dayWithFraction: number, scale: TimeScale): number {
  if (scale === 'TT') return calendarToJd(year, month, dayWithFraction);
  return Instant.fromCalendar(year, month, dayWithFraction, scale).to('TT').jd;
}

/** Julian date in TT of ISO text (readers' and command line's helper). */
export function isoToJdTT(text: string, defaultScale: TimeScale = 'UTC'): number {
  return Instant.parse(text, defaultScale).to('TT').jd;
}

/** MJD ↔ JD. IAU 1997 Resolution B1 (MJD = JD − 2 400 000.5). */
export function jdToMjd(jd: number): number {
  return jd - MJD_OFFSET;
}
export function mjdToJd(mjd: number): number {
  return mjd + MJD_OFFSET;
}
