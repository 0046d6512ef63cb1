/**
 * One step of the safeguarded root finder shared by the Kepler solvers (kepler.ts, elliptic
 * and hyperbolic; universal.ts, universal variables). Each solves g(x) = 0 for a g that
 * increases with x, and hands in g and its first three derivatives at the current iterate.
 *
 * Step: Danby's quartic correction (Danby & Burkardt 1983, Celest. Mech. 31, 95; Danby 1988
 * ch. 6 — references from memory),
 *   d1 = −g/g′,  d2 = −g/(g′ + ½ d1 g″),  d3 = −g/(g′ + ½ d2 g″ + d2² g‴/6),
 * with the Newton step d1 taken instead when d3 crawls (|d3| < ½|d1|) or points the other way.
 * Safeguard: as in the "rtsafe" scheme of Press et al., Numerical Recipes, 3rd ed. §9.4 —
 * the root stays bracketed, and a step that leaves the bracket or does not halve the step
 * before last is replaced by bisection (or, while one side of the bracket is still open,
 * by doubling towards it).
 * Convergence: an in-bracket fourth-order step below 1e-7 |x| (its error is of order
 * (1e-7)⁴ |x|: the rounding floor), or a step or bracket below 4ε|x| + 1e-322.
 */

const EPS = Number.EPSILON;
/** Absolute floor of the tolerance: a few subnormal ulps, so subnormal roots still converge. */
const TINY = 1e-322;

/** Indices into the caller's bracket state, a Float64Array(5) (see initBracket). */
export const LO = 0;
export const HI = 1;
export const STEP = 2;
const STEP_OLD = 3;
export const DONE = 4;

/** Start a bracket [lo, hi] (either side may be infinite) in `state`. */
export function initBracket(state: Float64Array, lo: number, hi: number): void {
  state[LO] = lo;
  state[HI] = hi;
  state[STEP] = hi - lo;
  state[STEP_OLD] = hi - lo;
  state[DONE] = 0;
}

/**
 * Shrink the bracket in `state` with g(x) and return the next iterate; state[DONE] becomes 1
 * when the returned value is the root. A NaN g (overflow far out) counts as "too far from 0".
 * `expandFrom` > 0 is where to step when the bracket is open on the side the step must go.
 */
export function safeguardedStep(
  x: number, g: number, g1: number, g2: number, g3: number, state: Float64Array, expandFrom: number,
): number {
  if (g === 0) {
    state[DONE] = 1;
    return x;
  }
  if (Number.isNaN(g)) state[x > 0 ? HI : LO] = x;
  else if (g < 0) state[LO] = x;
  else state[HI] = x;
  const lo = state[LO];
  const hi = state[HI];
  const d1 = -g / g1;
  const d2 = -g / (g1 + 0.5 * d1 * g2);
  const d3 = -g / (g1 + 0.5 * d2 * g2 + (d2 * d2 * g3) / 6);
  // Far from the root the quartic correction can crawl (large g″, g‴): take the Newton step,
  // which at worst overshoots and closes the bracket.
  const d = Math.abs(d3) < 0.5 * Math.abs(d1) || d3 * d1 < 0 ? d1 : d3;
  let next = x + d;
  const inside = next >= lo && next <= hi;
  if (inside && d === d3 && Math.abs(d3) <= 1e-7 * Math.abs(x)) {
    state[DONE] = 1;
    return next;
  }
  const finite = Number.isFinite(lo) && Number.isFinite(hi);
  if (!inside || (finite && Math.abs(d) > 0.5 * Math.abs(state[STEP_OLD]))) {
    if (finite) next = 0.5 * (lo + hi);
    else if (Number.isFinite(lo)) next = lo > 0 ? 2 * lo : expandFrom;
    else next = hi < 0 ? 2 * hi : -expandFrom;
  }
  state[STEP_OLD] = state[STEP];
  state[STEP] = next - x;
  const tol = 4 * EPS * Math.abs(next) + TINY;
  if (Math.abs(state[STEP]) <= tol || hi - lo <= tol) state[DONE] = 1;
  return next;
}
