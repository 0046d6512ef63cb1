/**
 * Parsing of ISO 8601 calendar date-times (the extended format, ISO 8601-1:2019 §5.4; section
 * from memory) as the readers and the command line meet them:
 *   2026-06-09            date, 0h
 *   2026-06-09.25         date with a fractional day
 *   2026-06-09T12:00      hours and minutes (a space may replace the T)
 *   2026-06-09T12:00:00.5 seconds with a fraction
 * optionally followed by 'Z' (UTC) or a time-scale word (' UTC', ' TAI', ' TT', ' TDB'; the
 * word form is common practice in astronomy, not ISO). Seconds may be 60 (a leap second) at
 * 23:59 only; whether that day has one is checked where the scale is known (time.ts).
 */
import type { TimeScale } from '../types.js';
import { calendarToJd } from './julian.js';

/** A date-time text that does not parse. Carries the offending text. */
export class TimeFormatError extends Error {
  readonly text: string;
  constructor(text: string, reason: string) {
    super(`Bad date-time '${text}': ${reason}`);
    this.name = 'TimeFormatError';
    this.text = text;
  }
}

/** The parts of a parsed date-time. Exactly one of secondsOfDay / dayFraction is finite. */
export interface ParsedDateTime {
  year: number;
  month: number; // 1..12
  day: number; // 1..31, integer
  secondsOfDay: number; // 0 ≤ s < 86 401, NaN when the text gave a fractional day
  dayFraction: number; // 0 ≤ f < 1, NaN when the text gave a clock time
  scale: TimeScale | null; // null when the text names none
}

const ISO_PATTERN =
  /^([+-]?\d{4,6})-(\d{2})-(\d{2})(?:(\.\d*)|[T ](\d{2}):(\d{2})(?::(\d{2}(?:\.\d*)?))?)?(?:(Z)|\s+(UTC|TAI|TT|TDB))?$/;

/** Days in a month of the calendar julian.ts uses (Julian before 1582 Oct 15, Gregorian after). */
export function daysInMonth(year: number, month: number): number {
  const next = month === 12 ? calendarToJd(year + 1, 1, 1) : calendarToJd(year, month + 1, 1);
  return next - calendarToJd(year, month, 1);
}

/** Parse an ISO 8601 date-time (see file comment). TimeFormatError on anything else. */
export function parseIsoDateTime(text: string): ParsedDateTime {
  const m = ISO_PATTERN.exec(text.trim());
  if (m === null) throw new TimeFormatError(text, 'expected YYYY-MM-DD[Thh:mm[:ss[.fff]]][Z]');
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (month < 1 || month > 12) throw new TimeFormatError(text, `month ${month} is not 1..12`);
  const dim = daysInMonth(year, month);
  if (day < 1 || day > dim) throw new TimeFormatError(text, `day ${day} is not 1..${dim}`);
  let secondsOfDay = NaN;
  let dayFraction = NaN;
  if (m[4] !== undefined) {
    dayFraction = m[4] === '.' ? 0 : Number(m[4]);
  } else {
    const hour = m[5] === undefined ? 0 : Number(m[5]);
    const minute = m[6] === undefined ? 0 : Number(m[6]);
    const second = m[7] === undefined ? 0 : Number(m[7]);
    if (hour > 23) throw new TimeFormatError(text, `hour ${hour} is not 0..23`);
    if (minute > 59) throw new TimeFormatError(text, `minute ${minute} is not 0..59`);
    if (second >= 61) throw new TimeFormatError(text, `second ${second} is not below 61`);
    // A leap second is inserted as 23:59:60 at the end of a UTC day (ITU-R Recommendation
    // TF.460-6; from memory); second 60 at any other minute would silently become the next one.
    if (second >= 60 && (hour !== 23 || minute !== 59)) {
      throw new TimeFormatError(text, `second ${second} is allowed only at 23:59 (a leap second)`);
    }
    secondsOfDay = hour * 3600 + minute * 60 + second;
  }
  const scale: TimeScale | null = m[8] === 'Z' ? 'UTC' : ((m[9] as TimeScale | undefined) ?? null);
  return { year, month, day, secondsOfDay, dayFraction, scale };
}
