/**
 * The computed astrometric place of a body: the direction, in the ICRF, from the observer at
 * the observation instant t to the body at the emission instant t − τ, with τ from the
 * light-time equation  c τ = |r(t − τ) − R(t)|  (r heliocentric body, R heliocentric
 * observer; Newtonian light time, common practice). An astrometric place carries no
 * aberration and no gravitational light deflection: the catalogue positions the observations
 * are reduced against are astrometric too (common practice), so none is applied. The
 * relativistic (Shapiro) delay, tens of µs at most, moves the body by metres: left out.
 *
 * Frames: the body function answers in the core's J2000 ecliptic; its position goes to the
 * ICRF through frameBias.ts (Bᵀ · R1(−ε0), the 23 mas frame bias applied).
 *
 * Iteration: τ₀ = 0, τₖ₊₁ = |r(t − τₖ) − R| / c; each step shrinks the error by about
 * |ṙ|/c (≲ 2e-4), so three or four steps reach |τₖ₊₁ − τₖ| ≤ 1e-12 day (86 ns, a few mm
 * of the body's motion). Ten steps without it: Error with the state.
 */
import { C_AU_PER_DAY } from '../core/constants.js';
import { wrapTwoPi } from '../core/math.js';
import { ECLIPTIC_TO_ICRF_MATRIX, rotate3 } from './frameBias.js';
import type { AstrometricPlace, BodyStateEclipticFn } from './types.js';

/** Light-time tolerance, days (1e-12 d = 86 ns). */
export const LIGHT_TIME_TOLERANCE_DAYS = 1e-12;
const MAX_ITERATIONS = 10;

/**
 * The astrometric place of the body `bodyState` seen from the heliocentric ICRF position
 * `observerIcrfAu` at `jdTDB`. RangeError for non-finite input; Error when the light-time
 * iteration does not settle (a body function that is not continuous).
 */
export function computeAstrometricPlace(bodyState: BodyStateEclipticFn, observerIcrfAu: ArrayLike<number>, jdTDB: number): AstrometricPlace {
  const rx = observerIcrfAu[0], ry = observerIcrfAu[1], rz = observerIcrfAu[2];
  if (!Number.isFinite(jdTDB) || !Number.isFinite(rx + ry + rz)) {
    throw new RangeError(`computeAstrometricPlace: non-finite input jdTDB=${jdTDB} observer=(${rx}, ${ry}, ${rz})`);
  }
  const state = new Float64Array(6);
  const p = new Float64Array(6); // body position and velocity, ICRF
  let tau = 0;
  let step = Infinity;
  let dist = NaN;
  let it = 0;
  while (it < MAX_ITERATIONS) {
    it++;
    bodyState(jdTDB - tau, state);
    rotate3(ECLIPTIC_TO_ICRF_MATRIX, state, 0, p, 0);
    dist = Math.hypot(p[0] - rx, p[1] - ry, p[2] - rz);
    const next = dist / C_AU_PER_DAY;
    step = Math.abs(next - tau);
    if (!Number.isFinite(next)) break;
    if (step <= LIGHT_TIME_TOLERANCE_DAYS) break;
    tau = next;
  }
  if (!(step <= LIGHT_TIME_TOLERANCE_DAYS)) {
    throw new Error(
      `light-time iteration did not converge: jdTDB=${jdTDB}, τ=${tau} d, last step=${step} d after ${it} iterations, body=(${state[0]}, ${state[1]}, ${state[2]}) au`,
    );
  }
  rotate3(ECLIPTIC_TO_ICRF_MATRIX, state, 3, p, 3);
  const x = p[0] - rx, y = p[1] - ry, z = p[2] - rz;
  const raRad = wrapTwoPi(Math.atan2(y, x));
  const decRad = Math.atan2(z, Math.hypot(x, y));
  return {
    raRad, decRad, distanceAu: dist, lightTimeDays: tau, emitJdTDB: jdTDB - tau, iterations: it,
    bodyStateEcliptic: state,
    partialsEcliptic: placePartials(raRad, decRad, dist, p),
  };
}

/**
 * ∂(α cos δ, δ)/∂r_ecliptic (rad/au), the light time's dependence on r included.
 * Topocentric ρ = r(t_e) − R with t_e = t − |ρ|/c: a change dr of the body's position at
 * fixed t_e gives dρ = (I − v ρ̂ᵀ / (c + ρ̂·v)) dr (v the body's velocity; Sherman–Morrison
 * on (I + v ρ̂ᵀ/c) dρ = dr). Of the direction (common practice):
 *   ∂(α cos δ)/∂ρ = (−sin α, cos α, 0) / |ρ|,   ∂δ/∂ρ = (−sin δ cos α, −sin δ sin α, cos δ) / |ρ|,
 * and dr_ICRF = M dr_ecliptic with M = ECLIPTIC_TO_ICRF_MATRIX.
 */
function placePartials(raRad: number, decRad: number, dist: number, bodyIcrf: Float64Array): Float64Array {
  const ca = Math.cos(raRad), sa = Math.sin(raRad), cd = Math.cos(decRad), sd = Math.sin(decRad);
  const u = [cd * ca, cd * sa, sd]; // ρ̂
  const vx = bodyIcrf[3], vy = bodyIcrf[4], vz = bodyIcrf[5];
  const denom = C_AU_PER_DAY + u[0] * vx + u[1] * vy + u[2] * vz;
  const rows = [
    [-sa / dist, ca / dist, 0],
    [(-sd * ca) / dist, (-sd * sa) / dist, cd / dist],
  ];
  const m = ECLIPTIC_TO_ICRF_MATRIX;
  const out = new Float64Array(6);
  for (let k = 0; k < 2; k++) {
    const g = rows[k];
    const gv = (g[0] * vx + g[1] * vy + g[2] * vz) / denom;
    const h0 = g[0] - gv * u[0], h1 = g[1] - gv * u[1], h2 = g[2] - gv * u[2];
    for (let j = 0; j < 3; j++) out[3 * k + j] = h0 * m[j] + h1 * m[3 + j] + h2 * m[6 + j];
  }
  return out;
}
