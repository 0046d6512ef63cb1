/**
 * Earth rotation angle and Greenwich mean sidereal time. Times are two-part Julian dates
 * (any split: jd1 + jd2) so the fraction of the day keeps full precision.
 */
import { DAYS_PER_JULIAN_CENTURY, J2000_JD, RAD_PER_ARCSEC } from '../constants.js';
import { TWO_PI, wrapTwoPi } from '../math.js';

/**
 * Earth rotation angle θ (rad, in [0, 2π)) at UT1.
 * IAU 2000 Resolution B1.8; IERS Conventions 2010 ch. 5 (eq. 5.15, from memory):
 *   θ = 2π (0.7790572732640 + 1.00273781191135448 Du),  Du = JD(UT1) − 2451545.0.
 * Written as frac(jd1) + frac(jd2) + 0.00273781191135448 Du, as SOFA era00 does, so the
 * whole turns drop out before they cost precision.
 */
export function earthRotationAngleRad(jd1Ut1: number, jd2Ut1 = 0): number {
  const du = jd1Ut1 - J2000_JD + jd2Ut1;
  const f = (jd1Ut1 % 1) + (jd2Ut1 % 1);
  return wrapTwoPi(TWO_PI * (f + 0.779057273264 + 0.00273781191135448 * du));
}

/**
 * Greenwich mean sidereal time (rad, in [0, 2π)), IAU 2006: ERA plus the polynomial of
 * Capitaine, Wallace & Chapront 2003 (A&A 412, 567); IERS Conventions 2010, ch. 5.
 *   GMST = θ(UT1) + 0.014506″ + 4612.156534″ t + 1.3915817″ t² − 0.00000044″ t³
 *          − 0.000029956″ t⁴ − 0.0000000368″ t⁵,   t = Julian centuries of TT from J2000.
 */
export function gmst06Rad(jd1Ut1: number, jd2Ut1: number, jd1TT: number, jd2TT: number): number {
  const t = (jd1TT - J2000_JD + jd2TT) / DAYS_PER_JULIAN_CENTURY;
  const poly =
    0.014506 + t * (4612.156534 + t * (1.3915817 + t * (-0.00000044 + t * (-0.000029956 + t * -0.0000000368))));
  return wrapTwoPi(earthRotationAngleRad(jd1Ut1, jd2Ut1) + poly * RAD_PER_ARCSEC);
}
