/**
 * TAI − UTC (leap seconds) from 1972 on. Table: IERS Earth Orientation Centre, Bulletin C
 * (the published leap-second list), in force since 2017 Jan 1 (37 s). Before 1972 UTC ran
 * with "rubber seconds" (frequency offsets and fractional steps); that era is refused with a
 * RangeError rather than modelled.
 *
 * After the last entry the last value holds until the IERS announces another step; update
 * the table when a new Bulletin C adds one.
 */
import { calendarToJd } from './julian.js';
import { MJD_OFFSET } from '../constants.js';

/** [year, month, TAI−UTC in s from the 1st of that month, 0h UTC]. IERS Bulletin C. */
const STEPS: ReadonlyArray<readonly [number, number, number]> = [
  [1972, 1, 10], [1972, 7, 11], [1973, 1, 12], [1974, 1, 13], [1975, 1, 14],
  [1976, 1, 15], [1977, 1, 16], [1978, 1, 17], [1979, 1, 18], [1980, 1, 19],
  [1981, 7, 20], [1982, 7, 21], [1983, 7, 22], [1985, 7, 23], [1988, 1, 24],
  [1990, 1, 25], [1991, 1, 26], [1992, 7, 27], [1993, 7, 28], [1994, 7, 29],
  [1996, 1, 30], [1997, 7, 31], [1999, 1, 32], [2006, 1, 33], [2009, 1, 34],
  [2012, 7, 35], [2015, 7, 36], [2017, 1, 37],
];

/** MJD (UTC) at which each step takes effect, ascending. */
export const LEAP_STEP_MJD_UTC: Float64Array = Float64Array.from(
  STEPS,
  ([y, m]) => calendarToJd(y, m, 1) - MJD_OFFSET,
);
/** TAI − UTC in seconds from LEAP_STEP_MJD_UTC[k] on. */
export const LEAP_STEP_TAI_MINUS_UTC_S: Float64Array = Float64Array.from(STEPS, (s) => s[2]);

/** First UTC instant handled: 1972 Jan 1, 0h UTC (MJD 41317). */
export const FIRST_LEAP_MJD_UTC = LEAP_STEP_MJD_UTC[0];

/**
 * TAI − UTC in seconds at a UTC instant given as MJD (UTC). RangeError before 1972 or for a
 * non-finite argument.
 */
export function taiMinusUtcSeconds(mjdUtc: number): number {
  if (!Number.isFinite(mjdUtc)) throw new RangeError(`taiMinusUtcSeconds: non-finite MJD ${mjdUtc}`);
  if (mjdUtc < FIRST_LEAP_MJD_UTC) {
    throw new RangeError(
      `taiMinusUtcSeconds: UTC before 1972-01-01 (MJD ${mjdUtc}) is not supported: ` +
        'the pre-1972 rubber-second era is not modelled',
    );
  }
  // Binary search for the last step at or before mjdUtc.
  let lo = 0;
  let hi = LEAP_STEP_MJD_UTC.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (LEAP_STEP_MJD_UTC[mid] <= mjdUtc) lo = mid;
    else hi = mid - 1;
  }
  return LEAP_STEP_TAI_MINUS_UTC_S[lo];
}
