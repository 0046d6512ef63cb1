/**
 * ln Γ(a) and the regularized incomplete gamma functions P(a, x) and Q(a, x) = 1 − P(a, x),
 * the ground of the χ² and normal tails used by the model comparison and the residual guards.
 *
 * ln Γ: the Lanczos approximation with γ = 671/128 and 14 coefficients of Press et al. 2007,
 * Numerical Recipes, 3rd ed., §6.1 (routine gammln; coefficients transcribed from memory and
 * checked against scipy.special.gammaln, test/fixtures/scipy-chi2/).
 * P and Q: Press et al. 2007, §6.2: the series (6.2.5) for x < a + 1, where P converges fast;
 * otherwise the continued fraction (6.2.7) for Q, evaluated by the modified Lentz method
 * (§5.2). Q is computed directly in the tail, so Q = 1e-15 keeps its relative precision.
 */

/** Numerical Recipes 3rd ed. §6.1, gammln: Lanczos coefficients (γ = 671/128 = 5.2421875). */
const LANCZOS_COF = [
  57.1562356658629235, -59.5979603554754912, 14.1360979747417471, -0.491913816097620199,
  0.339946499848118887e-4, 0.465236289270485756e-4, -0.983744753048795646e-4, 0.158088703224912494e-3,
  -0.210264441724104883e-3, 0.217439618115212643e-3, -0.164318106536763890e-3, 0.844182239838527433e-4,
  -0.261908384015814087e-4, 0.368991826595316234e-5,
];

/** Relative tolerance of the series and the continued fraction: double precision (NR uses ε). */
const EPS = Number.EPSILON;
/** Smallest magnitude the Lentz method lets a denominator take (NR's FPMIN, ~ 1e-300). */
const FPMIN = Number.MIN_VALUE / EPS;
/** Iteration limit: NR's bound grows as √a; 10 000 covers a up to ~10⁷. */
const MAX_ITER = 10_000;

/** ln Γ(a) for a > 0. */
export function lnGamma(a: number): number {
  if (!(a > 0) || !Number.isFinite(a)) throw new RangeError(`lnGamma: a must be finite and > 0, got ${a}`);
  let y = a;
  const tmp0 = a + 5.24218750000000000;
  const tmp = (a + 0.5) * Math.log(tmp0) - tmp0;
  let ser = 0.999999999999997092;
  for (let j = 0; j < LANCZOS_COF.length; j++) ser += LANCZOS_COF[j] / ++y;
  return tmp + Math.log((2.5066282746310005 * ser) / a);
}

/** exp(−x + a ln x − ln Γ(a)), the common prefactor of (6.2.5) and (6.2.7). */
function prefactor(a: number, x: number): number {
  return Math.exp(-x + a * Math.log(x) - lnGamma(a));
}

/** P(a, x) by the series (6.2.5); for x < a + 1. */
function seriesP(a: number, x: number): number {
  let ap = a;
  let del = 1 / a;
  let sum = del;
  for (let i = 0; i < MAX_ITER; i++) {
    ap += 1;
    del *= x / ap;
    sum += del;
    if (Math.abs(del) < Math.abs(sum) * EPS) return sum * prefactor(a, x);
  }
  throw new Error(`incomplete gamma series did not converge: a=${a}, x=${x}, last term=${del}, sum=${sum}`);
}

/** Q(a, x) by the continued fraction (6.2.7), modified Lentz; for x ≥ a + 1. */
function continuedFractionQ(a: number, x: number): number {
  let b = x + 1 - a;
  let c = 1 / FPMIN;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i <= MAX_ITER; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < FPMIN) d = FPMIN;
    c = b + an / c;
    if (Math.abs(c) < FPMIN) c = FPMIN;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) <= EPS) return prefactor(a, x) * h;
  }
  throw new Error(`incomplete gamma continued fraction did not converge: a=${a}, x=${x}, h=${h}`);
}

function checkArgs(a: number, x: number): void {
  if (!(a > 0) || !Number.isFinite(a)) throw new RangeError(`incomplete gamma: a must be finite and > 0, got ${a}`);
  if (!(x >= 0)) throw new RangeError(`incomplete gamma: x must be ≥ 0, got ${x}`);
}

/** Regularized lower incomplete gamma P(a, x) = γ(a, x)/Γ(a), a > 0, x ≥ 0. */
export function gammaP(a: number, x: number): number {
  checkArgs(a, x);
  if (x === 0) return 0;
  if (x === Infinity) return 1;
  return x < a + 1 ? seriesP(a, x) : 1 - continuedFractionQ(a, x);
}

/** Regularized upper incomplete gamma Q(a, x) = Γ(a, x)/Γ(a) = 1 − P(a, x), a > 0, x ≥ 0. */
export function gammaQ(a: number, x: number): number {
  checkArgs(a, x);
  if (x === 0) return 1;
  if (x === Infinity) return 0;
  return x < a + 1 ? 1 - seriesP(a, x) : continuedFractionQ(a, x);
}
