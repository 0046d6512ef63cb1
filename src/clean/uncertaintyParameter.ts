/**
 * The orbit uncertainty parameter U (0 … 9) of the one-line orbit export format.
 *
 * Published meaning (from memory of the published definition that accompanies the format):
 * U is an integer measure of the expected along-track "runoff" of the orbit, in arcseconds
 * per decade, built so that U = 9 corresponds to a runoff of 180° (648 000″) per decade and
 * the scale is logarithmic with nine equal steps: U is the smallest integer with
 *   runoff ≤ 648 000^(U/9) ″/decade,
 * so U = 0 means under 1″, U = 1 under ≈ 4.4″, U = 5 under ≈ 0.47°, U = 9 up to 180°.
 * Letter codes may stand in place of a digit: 'E' the eccentricity was assumed, 'D' the
 * orbit is one of several for a body with multiple designations, 'F' the orbit failed a
 * linkage check (from memory). All letter codes are treated as poorly determined orbits.
 */

/** Upper bound of the along-track runoff (arcsec per decade) that a given U allows. */
export function uncertaintyRunoffArcsecPerDecade(u: number): number {
  if (!Number.isInteger(u) || u < 0 || u > 9) {
    throw new RangeError(`uncertainty parameter must be an integer 0..9, got ${u}`);
  }
  return Math.pow(648_000, u / 9);
}

/** U for a given runoff in arcsec per decade (inverse of the bound above, clamped to 0..9). */
export function uncertaintyFromRunoff(runoffArcsecPerDecade: number): number {
  if (!(runoffArcsecPerDecade > 0)) return 0;
  const u = Math.ceil((9 * Math.log(runoffArcsecPerDecade)) / Math.log(648_000) - 1e-12);
  return Math.min(9, Math.max(0, u));
}
