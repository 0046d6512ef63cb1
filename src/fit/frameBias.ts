/**
 * The frame bias between the ICRF (GCRS axes) and the J2000 mean equator and dynamical
 * equinox, and the rotation from the core's J2000 ecliptic to the ICRF built on it.
 *
 * IERS Conventions 2010 (IERS Technical Note 36), §5.4.4: the offsets of the pole and of the
 * equinox, ξ0 = −16.617 mas, η0 = −6.819 mas, dα0 = −14.6 mas, and the bias matrix
 *   B = R1(−η0) · R2(ξ0) · R3(dα0),   r_J2000 = B · r_ICRF.
 * About 23 mas in all; applying it moves a direction by up to that (17 km at 1 au).
 * Tested against ERFA bp06's bias matrix (test/fit/frameBias.test.ts).
 *
 * The IAU 2006 ecliptic of J2000 is the J2000 mean equatorial frame rotated by the obliquity
 * ε0, so  r_ICRF = Bᵀ · R1(−ε0) · r_ecl2006  (ERFA ecm06 at J2000 is R1(ε0) · B, the same
 * matrix transposed): IAU2006_ECLIPTIC_TO_ICRF_MATRIX.
 *
 * The core's planets, and so the bodies integrated among them, are in VSOP87's frame, the
 * dynamical ecliptic and equinox of J2000 of Bretagnon & Francou 1988 (A&A 202, 309), which
 * is turned by about 0.07″ in longitude from the IAU 2006 ecliptic (measured against ERFA
 * epv00, test/fit/observerPosition.test.ts). The rotation from VSOP87's frame to the FK5
 * (J2000) equator is the one Meeus gives for VSOP87 rectangular coordinates (Astronomical
 * Algorithms, 2nd ed., 1998, ch. 26, "Rectangular Coordinates of the Sun"; chapter and
 * coefficients from memory), after Bretagnon & Francou:
 *   X = X′ + 0.000000440360 Y′ − 0.000000190919 Z′
 *   Y = −0.000000479966 X′ + 0.917482137087 Y′ − 0.397776982902 Z′
 *   Z = 0.397776982902 Y′ + 0.917482137087 Z′
 * i.e. R3(ψ) · R1(−ε) with ε = 84381.4091″ and ψ = 0.0990″ (the FK5 equinox from the
 * dynamical one, along the equator). The FK5 is taken as the ICRF: the two differ by some
 * 20 mas in pole and equinox (the Hipparcos tie of the FK5, Mignard & Froeschlé 2000,
 * A&A 354, 732; from memory), the size of what is left against epv00 (12–26 mas, measured).
 * The core's ecliptic → ICRF is therefore ECLIPTIC_TO_ICRF_MATRIX = VSOP87_TO_FK5_MATRIX.
 */
import { OBLIQUITY_J2000_RAD, RAD_PER_ARCSEC } from '../core/constants.js';

/** Frame-bias angles, rad. IERS Conventions 2010, §5.4.4. */
const XI0_RAD = -0.016617 * RAD_PER_ARCSEC;
const ETA0_RAD = -0.006819 * RAD_PER_ARCSEC;
const DALPHA0_RAD = -0.0146 * RAD_PER_ARCSEC;

/** Row-major 3×3 product a · b. */
function mul3(a: readonly number[], b: readonly number[]): number[] {
  const out = new Array<number>(9);
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) out[3 * i + j] = a[3 * i] * b[j] + a[3 * i + 1] * b[3 + j] + a[3 * i + 2] * b[6 + j];
  }
  return out;
}

/** Rotation matrices R1, R2, R3 (positive angle: frame rotated anticlockwise; common practice). */
function r1(a: number): number[] {
  const c = Math.cos(a), s = Math.sin(a);
  return [1, 0, 0, 0, c, s, 0, -s, c];
}
function r2(a: number): number[] {
  const c = Math.cos(a), s = Math.sin(a);
  return [c, 0, -s, 0, 1, 0, s, 0, c];
}
function r3(a: number): number[] {
  const c = Math.cos(a), s = Math.sin(a);
  return [c, s, 0, -s, c, 0, 0, 0, 1];
}

function transpose3(m: readonly number[]): number[] {
  return [m[0], m[3], m[6], m[1], m[4], m[7], m[2], m[5], m[8]];
}

/** B: ICRF → J2000 mean equator and equinox, row-major (r_J2000 = B · r_ICRF). */
export const FRAME_BIAS_MATRIX: readonly number[] = Object.freeze(mul3(mul3(r1(-ETA0_RAD), r2(XI0_RAD)), r3(DALPHA0_RAD)));

/** Bᵀ: J2000 mean equator → ICRF, row-major. */
export const J2000_TO_ICRF_MATRIX: readonly number[] = Object.freeze(transpose3(FRAME_BIAS_MATRIX));

/** Bᵀ · R1(−ε0): the IAU 2006 ecliptic of J2000 → ICRF, row-major. */
export const IAU2006_ECLIPTIC_TO_ICRF_MATRIX: readonly number[] = Object.freeze(mul3(J2000_TO_ICRF_MATRIX, r1(-OBLIQUITY_J2000_RAD)));

/**
 * VSOP87's ecliptic and equinox of J2000 → FK5 equator and equinox of J2000, row-major
 * (Bretagnon & Francou 1988 as given by Meeus 1998, ch. 26; from memory, see the file comment).
 */
export const VSOP87_TO_FK5_MATRIX: readonly number[] = Object.freeze([
  1, 0.000000440360, -0.000000190919,
  -0.000000479966, 0.917482137087, -0.397776982902,
  0, 0.397776982902, 0.917482137087,
]);

/** The core's ecliptic (VSOP87's) → ICRF, row-major: VSOP87 → FK5, the FK5 taken as the ICRF. */
export const ECLIPTIC_TO_ICRF_MATRIX: readonly number[] = VSOP87_TO_FK5_MATRIX;

/** Its transpose: ICRF → the core's ecliptic, row-major (the matrix is orthogonal to 1e-12). */
export const ICRF_TO_ECLIPTIC_MATRIX: readonly number[] = Object.freeze(transpose3(ECLIPTIC_TO_ICRF_MATRIX));

/** out[o..o+2] = m · v[i..i+2] (m row-major 3×3); out may be v when o = i. */
export function rotate3(m: readonly number[], v: ArrayLike<number>, i: number, out: Float64Array, o: number): void {
  const x = v[i], y = v[i + 1], z = v[i + 2];
  out[o] = m[0] * x + m[1] * y + m[2] * z;
  out[o + 1] = m[3] * x + m[4] * y + m[5] * z;
  out[o + 2] = m[6] * x + m[7] * y + m[8] * z;
}
