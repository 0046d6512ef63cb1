/**
 * Whether year, month and day name a day of the calendar: the check every date field of the
 * readers and the packed date form share, so that 2026-02-30 or 2026-04-31 is bad data
 * rather than silently the next month's 2nd or 1st (calendarToJd counts days on past a
 * month's end). The calendar is the one core/time/julian.ts counts in (Meeus, Astronomical
 * Algorithms, 2nd ed., ch. 7): Gregorian leap years (divisible by 4, centuries only when
 * divisible by 400) from 1583, Julian (every fourth year) before; common practice.
 */

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** Days in `month` (1..12) of `year`; February by the leap-year rule above. */
export function daysInMonth(year: number, month: number): number {
  if (month !== 2) return DAYS_IN_MONTH[month - 1];
  const leap = year <= 1582 ? year % 4 === 0 : (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return leap ? 29 : 28;
}

/**
 * True when `year` and `month` are whole numbers, month 1..12, and `day` (which may carry a
 * fraction, as a perihelion day does) lies in [1, days in that month + 1).
 */
export function isCalendarDay(year: number, month: number, day: number): boolean {
  if (!Number.isInteger(year) || !Number.isInteger(month) || month < 1 || month > 12) return false;
  return day >= 1 && day < daysInMonth(year, month) + 1;
}
