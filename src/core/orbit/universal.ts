/**
 * Two-body propagation in universal variables, valid for every conic (elliptic, parabolic,
 * hyperbolic) and smooth through e = 1. Danby, Fundamentals of Celestial Mechanics, 2nd ed.
 * (1988), §6.9 (section number from memory), in his symbols:
 *   β = 2μ/r0 − v0²,  η0 = r0·v0,  ζ0 = μ − β r0,  c_k = c_k(β s²)  (stumpff.ts)
 *   Kepler's equation:  f(s) = r0 s c1 + η0 s² c2 + μ s³ c3 − (t − t0) = 0
 *   f′ = r = r0 c0 + η0 s c1 + μ s² c2,   f″ = η0 c0 + ζ0 s c1,   f‴ = ζ0 c0 − β η0 s c1
 *   f = 1 − (μ/r0) s² c2,  g = r0 s c1 + η0 s² c2,  ḟ = −(μ/(r r0)) s c1,  ġ = 1 − (μ/r) s² c2
 * Solver: Danby's quartic Newton correction inside a bracket (f(s) increases with s since
 * f′ = r > 0), bisection when a step leaves it or stalls (safeguardedStep.ts). Elliptic orbits first reduce t − t0 modulo
 * the period, which bounds s by ±2π/√β. Tolerance: a time residual at the rounding level
 * of the terms of f (8ε of them: for t − t0 = 1000 d about 2e-12 d, micrometres of
 * position), or |Δs| ≤ 4ε|s|, or a fourth-order step below 1e-7 |s| (which leaves an error
 * of order (1e-7)⁴ |s|: the rounding floor, where cosh and sinh of large arguments would
 * otherwise keep the last digit oscillating).
 */
import { GM_SUN_AU3_PER_DAY2 } from '../constants.js';
import { KeplerConvergenceError } from './kepler.js';
import { stumpffInto } from './stumpff.js';
import { DONE, initBracket, safeguardedStep, STEP } from './safeguardedStep.js';

const EPS = Number.EPSILON;
const MAX_ITERATIONS = 200;
const C = new Float64Array(4); // Stumpff scratch, rewritten on every use
const BRACKET = new Float64Array(5); // safeguardedStep state, reset by every solve

/**
 * Propagate the state (x, y, z, vx, vy, vz) at stateIn[inOffset..] by dtDays under the
 * central mass `mu` and write the result to out[outOffset..]. In place is allowed
 * (stateIn === out, same offset). Units: au, au/day, days, au³/day² (or any consistent set).
 */
export function propagateTwoBody(
  stateIn: Float64Array,
  dtDays: number,
  mu: number = GM_SUN_AU3_PER_DAY2,
  out: Float64Array = stateIn,
  inOffset = 0,
  outOffset = 0,
): void {
  const x0 = stateIn[inOffset], y0 = stateIn[inOffset + 1], z0 = stateIn[inOffset + 2];
  const vx0 = stateIn[inOffset + 3], vy0 = stateIn[inOffset + 4], vz0 = stateIn[inOffset + 5];
  const r0 = Math.hypot(x0, y0, z0);
  if (!(Number.isFinite(r0) && r0 > 0 && Number.isFinite(vx0 + vy0 + vz0) && Number.isFinite(dtDays) && mu > 0 && Number.isFinite(mu))) {
    throw new RangeError(
      `propagateTwoBody: bad input r=(${x0}, ${y0}, ${z0}) v=(${vx0}, ${vy0}, ${vz0}) dt=${dtDays} mu=${mu}`,
    );
  }
  const v2 = vx0 * vx0 + vy0 * vy0 + vz0 * vz0;
  const eta0 = x0 * vx0 + y0 * vy0 + z0 * vz0;
  const beta = (2 * mu) / r0 - v2;
  const zeta0 = mu - beta * r0;
  let dt = dtDays;
  let lo = -Infinity;
  let hi = Infinity;
  if (beta > 0) {
    const period = (2 * Math.PI * mu) / (beta * Math.sqrt(beta));
    if (Math.abs(dt) > 0.5 * period) dt -= period * Math.round(dt / period);
    lo = (-2 * Math.PI) / Math.sqrt(beta);
    hi = -lo;
  }
  if (dt > 0) lo = Math.max(lo, 0);
  else hi = Math.min(hi, 0);
  const s = solveUniversal(dt, r0, eta0, zeta0, beta, mu, lo, hi, r0 * r0 * v2 - eta0 * eta0);
  // Final evaluation at the root.
  stumpffInto(beta * s * s, C);
  const sc1 = s * C[1];
  const s2c2 = s * s * C[2];
  const r = r0 * C[0] + eta0 * sc1 + mu * s2c2;
  const f = 1 - (mu / r0) * s2c2;
  const g = r0 * sc1 + eta0 * s2c2;
  const fd = -(mu / (r * r0)) * sc1;
  const gd = 1 - (mu / r) * s2c2;
  out[outOffset] = f * x0 + g * vx0;
  out[outOffset + 1] = f * y0 + g * vy0;
  out[outOffset + 2] = f * z0 + g * vz0;
  out[outOffset + 3] = fd * x0 + gd * vx0;
  out[outOffset + 4] = fd * y0 + gd * vy0;
  out[outOffset + 5] = fd * z0 + gd * vz0;
}

/** f, f′, f″, f‴ of the universal Kepler equation at s, and the size of f's terms, into F. */
const F = new Float64Array(5);
function kepler(s: number, dt: number, r0: number, eta0: number, zeta0: number, beta: number, mu: number): void {
  stumpffInto(beta * s * s, C);
  const t1 = r0 * s * C[1];
  const t2 = eta0 * s * s * C[2];
  const t3 = mu * s * s * s * C[3];
  F[0] = t1 + t2 + t3 - dt;
  F[1] = r0 * C[0] + eta0 * s * C[1] + mu * s * s * C[2];
  F[2] = eta0 * C[0] + zeta0 * s * C[1];
  F[3] = zeta0 * C[0] - beta * eta0 * s * C[1];
  F[4] = Math.abs(t1) + Math.abs(t2) + Math.abs(t3) + Math.abs(dt);
}

/**
 * Root s of the universal Kepler equation inside [lo, hi] (either may be infinite), by the
 * safeguarded quartic step of safeguardedStep.ts.
 */
function solveUniversal(
  dt: number, r0: number, eta0: number, zeta0: number, beta: number, mu: number, lo: number, hi: number, h2: number,
): number {
  if (dt === 0) return 0;
  // Starter: s ≈ dt / r0 (first order in dt). On a hyperbola f can grow like e^{√−β |s|}:
  // then s from f ≈ ±½ e^{√−β |s|} (r0 α ± η0 √α + μ)/α^{3/2}, α = −β, the logarithmic
  // guess Vallado 2013 (Algorithm 8; from memory) uses; the one leaving the smaller |f| is kept.
  let s = dt / r0;
  if (!(s >= lo && s <= hi)) s = 0.5 * (lo + hi);
  if (beta < 0) {
    const alpha = -beta;
    const sa = Math.sqrt(alpha);
    const k = (r0 * alpha + Math.sign(dt) * eta0 * sa + mu) / (alpha * sa);
    const y = Math.log((2 * Math.abs(dt)) / k);
    if (k > 0 && y > 1) {
      const sLog = (Math.sign(dt) * y) / sa;
      kepler(s, dt, r0, eta0, zeta0, beta, mu);
      const fLin = Math.abs(F[0]);
      kepler(sLog, dt, r0, eta0, zeta0, beta, mu);
      if (Math.abs(F[0]) < fLin || Number.isNaN(fLin)) s = sLog;
    }
  }
  initBracket(BRACKET, lo, hi);
  const expandFrom = Math.abs(dt / r0);
  for (let it = 1; it <= MAX_ITERATIONS; it++) {
    kepler(s, dt, r0, eta0, zeta0, beta, mu);
    const f = F[0];
    if (f === 0 || Math.abs(f) <= 8 * EPS * F[4]) return s;
    // A NaN f means cosh/sinh overflowed: |s| is far too large on that side.
    s = safeguardedStep(s, f, F[1], F[2], F[3], BRACKET, expandFrom);
    if (BRACKET[DONE]) return s;
  }
  // e² = 1 − β h²/μ² (energy and angular momentum; Danby 1988 §6.9).
  const e = Math.sqrt(Math.max(0, 1 - (beta * h2) / (mu * mu)));
  throw new KeplerConvergenceError('universal', e, dt, s, BRACKET[STEP], MAX_ITERATIONS);
}
