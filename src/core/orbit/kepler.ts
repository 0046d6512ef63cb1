/**
 * Kepler's equation for elliptic (M = E − e sin E) and hyperbolic (M = e sinh H − H)
 * orbits, and Barker's equation for parabolic ones.
 *
 * Method: Danby's fourth-order Newton correction (Danby & Burkardt 1983, Celest. Mech. 31,
 * 95; also Danby 1988 ch. 6 — references from memory) inside a bracket that shrinks at every
 * step, with bisection whenever a step leaves the bracket or fails to halve the step before
 * last ("rtsafe", Press et al., Numerical Recipes), so convergence is guaranteed for every e;
 * the step itself is safeguardedStep.ts, shared with universal.ts. Near e = 1 and small
 * anomalies the equation is evaluated as
 *   E − e sin E = (1 − e) E + e (E − sin E)   (and the hyperbolic analogue)
 * with E − sin E from its series, so the anomaly keeps full relative precision.
 * Tolerance: |ΔE| ≤ 4ε |E| + 1e-322 rad (ε = 2.2e-16), i.e. a position error below 1e-15 × a,
 * or a fourth-order step below 1e-7 |E| (its error is of order (1e-7)⁴ |E|: the rounding floor).
 */
import { INV_FACTORIAL, TWO_PI } from '../math.js';
import { DONE, HI, initBracket, LO, safeguardedStep, STEP } from './safeguardedStep.js';

const DEFAULT_MAX_ITERATIONS = 100;
const BRACKET = new Float64Array(5); // safeguardedStep state, reset by every solve

/**
 * An iterative anomaly solver that stopped without converging. Carries its last state:
 * `argument` is the mean anomaly M (rad) for the elliptic and hyperbolic equations and the
 * time step t − t0 (days) for the universal one; `lastValue` the last anomaly iterate.
 */
export class KeplerConvergenceError extends Error {
  constructor(
    readonly equation: 'elliptic' | 'hyperbolic' | 'universal',
    readonly e: number,
    readonly argument: number,
    readonly lastValue: number,
    readonly lastStep: number,
    readonly iterations: number,
  ) {
    super(
      `Kepler's equation (${equation}) did not converge: e=${e}, ` +
        `${equation === 'universal' ? 'dt=' + argument + ' d' : 'M=' + argument + ' rad'}, ` +
        `last value=${lastValue}, last step=${lastStep} after ${iterations} iterations`,
    );
    this.name = 'KeplerConvergenceError';
  }
}

/** x − sin x without cancellation for small |x| (series below 0.5; Taylor, common practice). */
export function xMinusSinX(x: number): number {
  if (Math.abs(x) >= 0.5) return x - Math.sin(x);
  // x³/3! − x⁵/5! + … ; 10 terms: the first left out, x²³/23!, is below 0.5²⁰·6/23! ≈ 2e-28 of x³/6.
  const x2 = x * x;
  return x * x2 * seriesSinRemainder(x2);
}

/** sinh x − x without cancellation for small |x|. */
export function sinhXMinusX(x: number): number {
  if (Math.abs(x) >= 0.5) return Math.sinh(x) - x;
  return x * x * x * seriesSinhRemainder(x * x);
}

// Σ_{j≥0} (∓x2)^j / (2j+3)!  for the two series above; INV_ODD_FACT[j] = 1/(2j+3)!.
const INV_ODD_FACT = Float64Array.from({ length: 10 }, (_, j) => INV_FACTORIAL[2 * j + 3]);
function seriesSinRemainder(x2: number): number {
  let s = INV_ODD_FACT[9];
  for (let j = 8; j >= 0; j--) s = INV_ODD_FACT[j] - x2 * s;
  return s;
}
function seriesSinhRemainder(x2: number): number {
  let s = INV_ODD_FACT[9];
  for (let j = 8; j >= 0; j--) s = INV_ODD_FACT[j] + x2 * s;
  return s;
}

/**
 * Positive root of A x³ + B x = m (A > 0, B ≥ 0, m ≥ 0): the cubic that Kepler's equation
 * becomes for small anomalies; a starter near e = 1. Trigonometric/hyperbolic form of
 * Cardano's solution (common practice), stable for all B ≥ 0.
 */
function cubicStarter(a: number, b: number, m: number): number {
  if (b > 0) {
    const x = 2 * Math.sqrt(b / (3 * a)) * Math.sinh(Math.asinh(((3 * m) / (2 * b)) * Math.sqrt((3 * a) / b)) / 3);
    if (Number.isFinite(x)) return x;
  }
  return Math.cbrt(m / a);
}

function checkArgs(name: string, m: number, e: number, elliptic: boolean, maxIterations: number): void {
  if (!Number.isFinite(m) || !Number.isFinite(e)) throw new RangeError(`${name}: non-finite input e=${e}, M=${m}`);
  if (elliptic ? !(e >= 0 && e < 1) : !(e > 1)) {
    throw new RangeError(`${name}: eccentricity ${e} outside ${elliptic ? '[0, 1)' : '(1, ∞)'}`);
  }
  if (!Number.isInteger(maxIterations) || maxIterations < 1) throw new RangeError(`${name}: maxIterations ${maxIterations}`);
}

/**
 * Eccentric anomaly E (rad) from mean anomaly M (rad) for 0 ≤ e < 1; E is on the same
 * revolution as M (E − M ∈ [−e, e]).
 */
export function solveKeplerElliptic(meanAnomalyRad: number, e: number, maxIterations = DEFAULT_MAX_ITERATIONS): number {
  checkArgs('solveKeplerElliptic', meanAnomalyRad, e, true, maxIterations);
  // Whole turns removed only when there are any (wrapping costs an ulp of π otherwise).
  const turns = Math.abs(meanAnomalyRad) <= Math.PI ? 0 : TWO_PI * Math.round(meanAnomalyRad / TWO_PI);
  const mr = meanAnomalyRad - turns;
  if (e === 0 || mr === 0) return meanAnomalyRad;
  const sign = mr < 0 ? -1 : 1;
  const m = Math.abs(mr); // (0, π]
  // E − M = e sin E ∈ [0, e] on [0, π].
  initBracket(BRACKET, m, Math.min(m + e, Math.PI));
  let x = m < 0.5 && e > 0.5 ? cubicStarter(e / 6, 1 - e, m) : m + 0.85 * e * Math.sin(m);
  if (!(x >= BRACKET[LO] && x <= BRACKET[HI])) x = 0.5 * (BRACKET[LO] + BRACKET[HI]);
  for (let it = 1; it <= maxIterations; it++) {
    const half = Math.sin(0.5 * x);
    const f = (1 - e) * x + e * xMinusSinX(x) - m;
    const fp = 1 - e + 2 * e * half * half; // 1 − e cos E
    x = safeguardedStep(x, f, fp, e * Math.sin(x), e * Math.cos(x), BRACKET, 0);
    if (BRACKET[DONE]) return sign * x + turns;
  }
  throw new KeplerConvergenceError('elliptic', e, meanAnomalyRad, sign * x + turns, BRACKET[STEP], maxIterations);
}

/** Hyperbolic anomaly H from mean anomaly M = e sinh H − H (e > 1), any M. */
export function solveKeplerHyperbolic(meanAnomalyRad: number, e: number, maxIterations = DEFAULT_MAX_ITERATIONS): number {
  checkArgs('solveKeplerHyperbolic', meanAnomalyRad, e, false, maxIterations);
  if (meanAnomalyRad === 0) return 0;
  const sign = meanAnomalyRad < 0 ? -1 : 1;
  const m = Math.abs(meanAnomalyRad);
  // Bracket: e sinh H − H ≥ max((e − 1) sinh H, e H³/6) for H ≥ 0.
  initBracket(BRACKET, 0, Math.min(Math.asinh(m / (e - 1)), Math.cbrt((6 * m) / e)));
  let x = m < 1 ? cubicStarter(e / 6, e - 1, m) : Math.log((2 * m) / e + 1.8); // large-M starter ln(2M/e + 1.8) (Danby 1988 ch. 6, from memory)
  if (!(x >= BRACKET[LO] && x <= BRACKET[HI])) x = 0.5 * (BRACKET[LO] + BRACKET[HI]);
  for (let it = 1; it <= maxIterations; it++) {
    const halfSh = Math.sinh(0.5 * x);
    const f = (e - 1) * x + e * sinhXMinusX(x) - m;
    const fp = e - 1 + 2 * e * halfSh * halfSh; // e cosh H − 1
    x = safeguardedStep(x, f, fp, e * Math.sinh(x), e * Math.cosh(x), BRACKET, 0);
    if (BRACKET[DONE]) return sign * x;
  }
  throw new KeplerConvergenceError('hyperbolic', e, meanAnomalyRad, sign * x, BRACKET[STEP], maxIterations);
}

/**
 * Barker's equation D + D³/3 = W for D = tan(ν/2) (parabolic orbits), with
 * W = √(μ / (2 q³)) (t − T). Meeus 1998 ch. 34 (there as s³ + 3s − 3W = 0); solved in closed
 * form as D = 2 sinh(asinh(1.5 W) / 3), the hyperbolic-sine form of Cardano's root
 * (common practice), which has no cancellation for small or negative W.
 */
export function solveBarker(w: number): number {
  if (!Number.isFinite(w)) throw new RangeError(`solveBarker: non-finite W=${w}`);
  return 2 * Math.sinh(Math.asinh(1.5 * w) / 3);
}
