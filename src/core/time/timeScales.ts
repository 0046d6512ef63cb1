/**
 * Offsets between the time scales UTC, TAI, TT and TDB, on two-part Julian dates split as
 * (midnight JD ending in .5, fraction of that day). Instant (time.ts) builds on these.
 *
 * - TAI − UTC: leap seconds, leapSeconds.ts (IERS Bulletin C). On a day that ends with a
 *   leap second the UTC day has 86 401 SI seconds and its day fraction is scaled so that
 *   fraction 1 is the next midnight; this is the convention of the IAU SOFA library
 *   (routine utctai, "UTC as a 2-part quasi Julian Date"), so 23:59:60.5 is representable.
 * - TT − TAI = 32.184 s exactly (IAU 1991 Resolution A4; IERS Conventions 2010, ch. 10).
 * - TDB − TT: periodic series of Kaplan 2005, USNO Circular 179, eq. 2.6 (leading terms of
 *   Fairhead & Bretagnon 1990), good to about 10 µs over 1600–2200.
 */
import { DAYS_PER_JULIAN_CENTURY, J2000_JD, MJD_OFFSET, SECONDS_PER_DAY } from '../constants.js';
import { taiMinusUtcSeconds } from './leapSeconds.js';

/** TT − TAI in seconds (exact by definition). IAU 1991 Resolution A4. */
export const TT_MINUS_TAI_S = 32.184;

/**
 * TDB − TT in seconds at a TT (or TDB: the difference is below 1e-12 s) Julian date.
 * Kaplan 2005, USNO Circular 179, eq. 2.6; T in Julian centuries of TT from J2000.0.
 * Geocentric: the topocentric terms (below 2 µs) are left out.
 */
export function tdbMinusTtSeconds(jdTT: number): number {
  const t = (jdTT - J2000_JD) / DAYS_PER_JULIAN_CENTURY;
  return (
    0.001657 * Math.sin(628.3076 * t + 6.2401) +
    0.000022 * Math.sin(575.3385 * t + 4.297) +
    0.000014 * Math.sin(1256.6152 * t + 6.1969) +
    0.000005 * Math.sin(606.9777 * t + 4.0212) +
    0.000005 * Math.sin(52.9691 * t + 0.4444) +
    0.000002 * Math.sin(21.3299 * t + 5.5431) +
    0.00001 * t * Math.sin(628.3076 * t + 4.249)
  );
}

/** Length in SI seconds of the UTC day starting at midnight `midnightJdUtc` (86 400 or 86 401). */
export function utcDayLengthSeconds(midnightJdUtc: number): number {
  const mjd0 = midnightJdUtc - MJD_OFFSET;
  return SECONDS_PER_DAY + taiMinusUtcSeconds(mjd0 + 1) - taiMinusUtcSeconds(mjd0);
}

/**
 * TAI day fraction (relative to the same midnight, may exceed 1) of the UTC instant
 * (midnightJdUtc, fracUtc). midnightJdUtc must end in .5; fracUtc in [0, 1).
 * SOFA convention for leap-second days (see the file comment).
 */
export function utcFractionToTai(midnightJdUtc: number, fracUtc: number): number {
  const mjd0 = midnightJdUtc - MJD_OFFSET;
  const dat0 = taiMinusUtcSeconds(mjd0);
  const dat24 = taiMinusUtcSeconds(mjd0 + 1);
  return (fracUtc * (SECONDS_PER_DAY + dat24 - dat0) + dat0) / SECONDS_PER_DAY;
}
