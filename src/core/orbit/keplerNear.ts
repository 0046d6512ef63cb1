/**
 * Kepler's equation M = E − e sin E solved from a nearby starting value, for sweeps over
 * closely spaced mean anomalies (the co-orbital grid: hundreds of solves per orbit, each
 * starting from the previous root). Newton's method on Kepler's equation (Murray & Dermott
 * 1999 §2.4; common practice), which converges quadratically from a start this close.
 *
 * Tolerance: the iteration stops once a Newton step is below 1e-8 rad; the error left after it
 * is about e·ΔE²/(2(1 − e cos E)) ≤ 0.8·1e-16/(2·0.2) = 2e-16 rad for e ≤ NEAR_MAX_ECCENTRICITY
 * (Newton's quadratic error term; common practice). Above that eccentricity, or when the steps
 * do not settle within NEAR_MAX_ITERATIONS, it falls back to the bracketed solver
 * (kepler.ts), which always converges.
 */
import { solveKeplerElliptic } from './kepler.js';

export const NEAR_MAX_ECCENTRICITY = 0.8;
const NEAR_MAX_ITERATIONS = 6;
const NEAR_STEP_TOLERANCE_RAD = 1e-8;

const SCRATCH = new Float64Array(3);

/** E for mean anomaly M (rad, any turn; E in the same turn) and 0 ≤ e < 1, starting from guessRad. */
export function solveKeplerEllipticNear(meanAnomalyRad: number, e: number, guessRad: number): number {
  solveKeplerEllipticNearInto(meanAnomalyRad, e, guessRad, SCRATCH);
  return SCRATCH[0];
}

/**
 * As solveKeplerEllipticNear, writing out[0] = E, out[1] = sin E, out[2] = cos E. The sine and
 * cosine come from the last Newton iterate x and the last step ΔE (sin(x − ΔE) ≈ sin x − ΔE cos x,
 * cos(x − ΔE) ≈ cos x + ΔE sin x), which leaves out ΔE²/2 ≤ 5e-17 (Taylor; common practice).
 */
export function solveKeplerEllipticNearInto(meanAnomalyRad: number, e: number, guessRad: number, out: Float64Array): void {
  if (e <= NEAR_MAX_ECCENTRICITY && Number.isFinite(guessRad)) {
    let x = guessRad;
    for (let it = 0; it < NEAR_MAX_ITERATIONS; it++) {
      const s = Math.sin(x), c = Math.cos(x);
      const dx = (x - e * s - meanAnomalyRad) / (1 - e * c);
      x -= dx;
      if (Math.abs(dx) <= NEAR_STEP_TOLERANCE_RAD) {
        out[0] = x;
        out[1] = s - dx * c;
        out[2] = c + dx * s;
        return;
      }
    }
  }
  const eccRad = solveKeplerElliptic(meanAnomalyRad, e);
  out[0] = eccRad;
  out[1] = Math.sin(eccRad);
  out[2] = Math.cos(eccRad);
}

/**
 * Starting value for the next mean anomaly of a sweep: the previous root advanced by the
 * first-order change dE = dM/(1 − e cos E) (derivative of Kepler's equation; common practice).
 */
export function nextKeplerGuess(eccRad: number, cosEcc: number, e: number, stepRad: number): number {
  return eccRad + stepRad / (1 - e * cosEcc);
}
