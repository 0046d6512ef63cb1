/**
 * Calendar date ↔ Julian day number, proleptic Gregorian after 1582 Oct 15 and Julian
 * before. Meeus, Astronomical Algorithms, 2nd ed. (1998), ch. 7, pp. 60–63.
 * The time scale is whatever the caller's calendar date is in; this file only counts days.
 */

/** Julian date of a calendar date; `day` may carry a fraction. Meeus eq. 7.1. */
export function calendarToJd(year: number, month: number, day: number): number {
  if (!Number.isFinite(year) || !Number.isFinite(month) || !Number.isFinite(day)) {
    throw new RangeError(`calendarToJd: non-finite date ${year}-${month}-${day}`);
  }
  // Eq. 7.1 folds month 13 into January of the next year without a word: refuse it.
  if (!Number.isInteger(year) || !Number.isInteger(month) || month < 1 || month > 12) {
    throw new RangeError(`calendarToJd: year must be an integer and month an integer 1..12: ${year}-${month}-${day}`);
  }
  let y = year;
  let m = month;
  if (m <= 2) {
    y -= 1;
    m += 12;
  }
  // Gregorian reform: dates on or after 1582 Oct 15 use the Gregorian correction B.
  const gregorian = year > 1582 || (year === 1582 && (month > 10 || (month === 10 && day >= 15)));
  let b = 0;
  if (gregorian) {
    const a = Math.floor(y / 100);
    b = 2 - a + Math.floor(a / 4);
  }
  return Math.floor(365.25 * (y + 4716)) + Math.floor(30.6001 * (m + 1)) + day + b - 1524.5;
}

export interface CalendarDate {
  year: number;
  month: number; // 1..12
  day: number; // with fraction, 1 ≤ day < 32
}

/** Calendar date of a Julian date. Meeus ch. 7, p. 63 (valid for JD ≥ 0). */
export function jdToCalendar(jd: number): CalendarDate {
  if (!Number.isFinite(jd) || jd < 0) throw new RangeError(`jdToCalendar: JD out of range: ${jd}`);
  const z = Math.floor(jd + 0.5);
  const f = jd + 0.5 - z;
  let a = z;
  if (z >= 2_299_161) {
    const alpha = Math.floor((z - 1_867_216.25) / 36_524.25);
    a = z + 1 + alpha - Math.floor(alpha / 4);
  }
  const b = a + 1524;
  const c = Math.floor((b - 122.1) / 365.25);
  const d = Math.floor(365.25 * c);
  const e = Math.floor((b - d) / 30.6001);
  const day = b - d - Math.floor(30.6001 * e) + f;
  const month = e < 14 ? e - 1 : e - 13;
  const year = month > 2 ? c - 4716 : c - 4715;
  return { year, month, day };
}
