/**
 * Times of observations: astrometry gives UTC (80-column records as a calendar day with
 * a fraction, ADES as ISO 8601 text). The Julian date in UTC is kept as written; TT comes
 * through the core's leap-second table (../../core/time). That table starts in 1972 (the
 * rubber-second era before is not modelled): earlier observations get TT = NaN, and the
 * readers count them, so the caller sees how many lack TT.
 */
import { calendarToJd } from '../../core/time/julian.js';
import { FIRST_LEAP_MJD_UTC } from '../../core/time/leapSeconds.js';
import { Instant } from '../../core/time/time.js';
import { MJD_OFFSET } from '../../core/constants.js';

export interface ObservationTimes {
  jdUtc: number;
  jdTT: number; // NaN before 1972
}

/** UTC and TT Julian dates of a UTC calendar day with a fraction (a fraction of that day's length). */
export function timesFromUtcDay(year: number, month: number, dayWithFraction: number): ObservationTimes {
  const jdUtc = calendarToJd(year, month, dayWithFraction);
  if (jdUtc - MJD_OFFSET < FIRST_LEAP_MJD_UTC) return { jdUtc, jdTT: NaN };
  return { jdUtc, jdTT: Instant.fromCalendar(year, month, dayWithFraction, 'UTC').to('TT').jd };
}

/** UTC and TT Julian dates of a UTC calendar day and seconds since its midnight (60.x on a leap-second day). */
export function timesFromUtcSeconds(year: number, month: number, day: number, secondsOfDay: number): ObservationTimes {
  const midnight = calendarToJd(year, month, day);
  if (midnight - MJD_OFFSET < FIRST_LEAP_MJD_UTC) return { jdUtc: midnight + secondsOfDay / 86_400, jdTT: NaN };
  const utc = Instant.fromCalendarSeconds(year, month, day, secondsOfDay, 'UTC');
  return { jdUtc: utc.jd, jdTT: utc.to('TT').jd };
}
