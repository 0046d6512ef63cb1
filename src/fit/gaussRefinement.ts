/**
 * The refinement of Gauss's method (gaussMethod.ts, whose comment gives the equations and
 * why Newton's method replaces the textbook's substitution): the equations in the unknowns
 * (f₁, g₁, f₃, g₃), one damped Newton step on them, and the pieces both files use.
 */
import { propagateTwoBody } from '../core/orbit/universal.js';
import type { GaussObservation } from './gaussMethod.js';

type V3 = [number, number, number];

export const TOLERANCE = 1e-12; // relative change of ρ in one refinement

/** r_i = R_i + ρ_i ρ̂_i; state at the middle instant: r₂ and v₂ = (−f₃ r₁ + f₁ r₃)/(f₁g₃ − f₃g₁). */
export function stateAtMiddle(obs: readonly GaussObservation[], rho: V3, f1: number, g1: number, f3: number, g3: number, out: Float64Array): void {
  const den = f1 * g3 - f3 * g1;
  for (let k = 0; k < 3; k++) {
    const r1 = obs[0].observer[k] + rho[0] * obs[0].lineOfSight[k];
    const r3 = obs[2].observer[k] + rho[2] * obs[2].lineOfSight[k];
    out[k] = obs[1].observer[k] + rho[1] * obs[1].lineOfSight[k];
    out[k + 3] = (-f3 * r1 + f1 * r3) / den;
  }
}

const MOVED = new Float64Array(6); // scratch

/** Exact Lagrange f and g over dt from the state: r(dt) = f r + g v, solved in the orbit plane by least squares. */
function exactFG(state: Float64Array, dt: number, mu: number): [number, number] {
  propagateTwoBody(state, dt, mu, MOVED);
  const rr = state[0] * state[0] + state[1] * state[1] + state[2] * state[2];
  const rv = state[0] * state[3] + state[1] * state[4] + state[2] * state[5];
  const vv = state[3] * state[3] + state[4] * state[4] + state[5] * state[5];
  const br = state[0] * MOVED[0] + state[1] * MOVED[1] + state[2] * MOVED[2];
  const bv = state[3] * MOVED[0] + state[4] * MOVED[1] + state[5] * MOVED[2];
  const det = rr * vv - rv * rv;
  return [(br * vv - bv * rv) / det, (bv * rr - br * rv) / det];
}

/** |exact f, g − f, g| within 1e-13 of the size of f (≈ 1) and of g (≈ the interval): rounding. */
export function residualAtRoundingLevel(residual: Float64Array, u: ArrayLike<number>): boolean {
  return [0, 1, 2, 3].every((k) => Math.abs(residual[k]) <= 1e-13 * Math.max(1, Math.abs(u[k])));
}

export interface Problem {
  obs: readonly GaussObservation[];
  d0: number;
  d: number[][];
  mu: number;
  c: number;
}

/** ρ₁, ρ₂, ρ₃ from f and g through c₁, c₃ (see the file comment). */
export function rhoFromFG(p: Problem, u: ArrayLike<number>): V3 {
  const { d0, d } = p;
  const den = u[0] * u[3] - u[2] * u[1];
  const c1 = u[3] / den, c3 = -u[1] / den;
  return [
    (-d[0][0] + d[1][0] / c1 - (d[2][0] * c3) / c1) / d0,
    (-c1 * d[0][1] + d[1][1] - c3 * d[2][1]) / d0,
    ((-d[0][2] * c1) / c3 + d[1][2] / c3 - d[2][2]) / d0,
  ];
}

const FG_STATE = new Float64Array(6); // scratch

/** The refinement's equations: exact f and g from the state that (f, g) lead to, minus (f, g). */
function fgResidual(p: Problem, u: ArrayLike<number>, out: Float64Array): void {
  const rho = rhoFromFG(p, u);
  stateAtMiddle(p.obs, rho, u[0], u[1], u[2], u[3], FG_STATE);
  const epoch = p.obs[1].t - rho[1] / p.c;
  const [f1, g1] = exactFG(FG_STATE, p.obs[0].t - rho[0] / p.c - epoch, p.mu);
  const [f3, g3] = exactFG(FG_STATE, p.obs[2].t - rho[2] / p.c - epoch, p.mu);
  out[0] = f1 - u[0]; out[1] = g1 - u[1]; out[2] = f3 - u[2]; out[3] = g3 - u[3];
}

/**
 * One Newton step on fgResidual = 0 (Jacobian by forward differences, step 1e-7 of each
 * unknown's size), halved up to 30 times until the residual shrinks. The plain substitution
 * of the textbook (new f and g, even averaged with the old) ran away from the right root on
 * near-Earth and comet geometries (measured on test/fit/gaussMethod.test.ts cases); Newton's
 * method on the same equations has the same solution. False when no step helps or the
 * equations cannot be evaluated (then the refinement stops).
 */
export function newtonStep(p: Problem, u: number[], f0: Float64Array): boolean {
  try {
    fgResidual(p, u, f0);
  } catch {
    return false;
  }
  const norm0 = Math.max(...Array.from(f0, Math.abs));
  if (!Number.isFinite(norm0)) return false;
  if (norm0 === 0) return true;
  const jac = [0, 1, 2, 3].map(() => new Float64Array(4));
  const fh = new Float64Array(4);
  for (let k = 0; k < 4; k++) {
    const h = 1e-7 * Math.max(Math.abs(u[k]), 1e-3);
    const save = u[k];
    u[k] = save + h;
    try {
      fgResidual(p, u, fh);
    } catch {
      u[k] = save;
      return false;
    }
    u[k] = save;
    for (let i = 0; i < 4; i++) jac[i][k] = (fh[i] - f0[i]) / h;
  }
  const step = solve4(jac, Array.from(f0, (x) => -x));
  if (step === null) return false;
  const trial = u.slice();
  for (let halving = 0; halving < 30; halving++) {
    const scale = 0.5 ** halving;
    for (let k = 0; k < 4; k++) trial[k] = u[k] + scale * step[k];
    try {
      fgResidual(p, trial, fh);
    } catch {
      continue;
    }
    const norm = Math.max(...Array.from(fh, Math.abs));
    if (norm < norm0) {
      for (let k = 0; k < 4; k++) u[k] = trial[k];
      return true;
    }
  }
  return false;
}

/** Solve the 4×4 system a·x = b by Gaussian elimination with partial pivoting; null when singular. */
function solve4(a: Float64Array[], b: number[]): number[] | null {
  const m = a.map((row, i) => [...row, b[i]]);
  for (let col = 0; col < 4; col++) {
    let piv = col;
    for (let r = col + 1; r < 4; r++) if (Math.abs(m[r][col]) > Math.abs(m[piv][col])) piv = r;
    if (!(Math.abs(m[piv][col]) > 0)) return null;
    [m[col], m[piv]] = [m[piv], m[col]];
    for (let r = col + 1; r < 4; r++) {
      const f = m[r][col] / m[col][col];
      for (let c = col; c < 5; c++) m[r][c] -= f * m[col][c];
    }
  }
  const x = [0, 0, 0, 0];
  for (let r = 3; r >= 0; r--) {
    let s = m[r][4];
    for (let c = r + 1; c < 4; c++) s -= m[r][c] * x[c];
    x[r] = s / m[r][r];
  }
  return x.every(Number.isFinite) ? x : null;
}
