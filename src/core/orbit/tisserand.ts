/**
 * Tisserand parameter of a small body with respect to a planet on a circular orbit of
 * radius aP (Murray & Dermott 1999, Solar System Dynamics, eq. 3.49):
 *   T = aP/a + 2 cos i · sqrt((a/aP)(1 − e²)).
 * Written here with the perihelion distance, a(1 − e²) = q(1 + e) and 1/a = (1 − e)/q, so
 * one expression holds for elliptic, parabolic and hyperbolic orbits:
 *   T = aP(1 − e)/q + 2 cos i · sqrt(q(1 + e)/aP).
 * `i` is the inclination to the planet's orbital plane; with the ecliptic inclination the
 * error is of the order of the planet's own inclination (1.3° for Jupiter; common practice).
 */
export function tisserandParameter(aPlanetAu: number, qAu: number, e: number, iRad: number): number {
  if (!(aPlanetAu > 0) || !(qAu > 0) || !(e >= 0)) {
    throw new RangeError(`tisserandParameter: need aP > 0, q > 0, e ≥ 0 (aP=${aPlanetAu}, q=${qAu}, e=${e})`);
  }
  return (aPlanetAu * (1 - e)) / qAu + 2 * Math.cos(iRad) * Math.sqrt((qAu * (1 + e)) / aPlanetAu);
}
