/**
 * Gauss's method for a preliminary orbit from three observations (Gauss 1809, Theoria motus,
 * book II, section 1), in the textbook form of Curtis, Orbital Mechanics for Engineering
 * Students (§5.10, Algorithms 5.5 and 5.6; numbering from memory), in his symbols:
 *   τ₁ = t₁ − t₂, τ₃ = t₃ − t₂, τ = τ₃ − τ₁;  p₁ = ρ̂₂×ρ̂₃, p₂ = ρ̂₁×ρ̂₃, p₃ = ρ̂₁×ρ̂₂;
 *   D₀ = ρ̂₁·p₁,  D_ij = R_i·p_j;
 *   A = (−D₁₂ τ₃/τ + D₂₂ + D₃₂ τ₁/τ)/D₀,
 *   B = (D₁₂(τ₃² − τ²) τ₃/τ + D₃₂(τ² − τ₁²) τ₁/τ)/(6 D₀),  E = R₂·ρ̂₂;
 *   r₂⁸ − (A² + 2AE + R₂²) r₂⁶ − 2μB(A + E) r₂³ − μ²B² = 0          (gaussPolynomial.ts)
 *   ρ₂ = A + μB/r₂³, ρ₁ and ρ₃ from the truncated f and g series
 *   f_i ≈ 1 − μτ_i²/(2r₂³), g_i ≈ τ_i − μτ_i³/(6r₂³),  v₂ = (−f₃ r₁ + f₁ r₃)/(f₁g₃ − f₃g₁).
 * Improvement: f and g exact from (r₂, v₂) by the project's universal-variable propagation
 * (src/core/orbit/universal.ts: r(τ) = f r₂ + g v₂, f and g read back by least squares in
 * the orbit plane), then
 *   c₁ = g₃/(f₁g₃ − f₃g₁), c₃ = −g₁/(f₁g₃ − f₃g₁),
 *   ρ₁ = (−D₁₁ + D₂₁/c₁ − D₃₁ c₃/c₁)/D₀,  ρ₂ = (−c₁D₁₂ + D₂₂ − c₃D₃₂)/D₀,
 *   ρ₃ = (−D₁₃ c₁/c₃ + D₂₃/c₃ − D₃₃)/D₀.
 * Departure from the textbook: it substitutes the new f and g (Curtis averages them with the
 * old, from memory) and repeats; measured here, that substitution oscillated with a growing
 * swing on the book's own example without the averaging, and with it drifted off the right
 * root on near-Earth and comet geometries. So the same equations, "exact f and g of the state
 * that (f₁, g₁, f₃, g₃) lead to = (f₁, g₁, f₃, g₃)", are solved by Newton's method from the
 * series values (gaussRefinement.ts; each step halved until the residual shrinks), until
 * every ρ moves by less than 1e-12 of itself or the residual is at the rounding level (at
 * most `maxRefinements` Newton steps, default 50; 3–6 in the tests; the count is reported).
 * Its solution is the textbook's fixed point. With light time (optional, common practice)
 * the instants are the emission instants t_i − ρ_i/c, so the state is at t₂ − ρ₂/c.
 * Measured limit: a near-Earth body over 60 days (r from 1.23 to 0.86 au) is too curved for
 * the series start; the right root then settles nowhere (test/fit/gaussMethod.test.ts
 * keeps arcs of 3–30 days).
 *
 * Frame- and unit-agnostic: any inertial frame, any units consistent with μ (and c).
 */
import { gaussPolynomialRoots } from './gaussPolynomial.js';
import { newtonStep, residualAtRoundingLevel, rhoFromFG, stateAtMiddle, TOLERANCE, type Problem } from './gaussRefinement.js';

/** One observation for Gauss's method. */
export interface GaussObservation {
  t: number; // observation instant (days for heliocentric work)
  lineOfSight: ArrayLike<number>; // unit vector observer → body
  observer: ArrayLike<number>; // observer position from the central body
}

export interface GaussOptions {
  mu: number; // gravitational parameter of the central body
  cLight?: number; // speed of light in the same units; Infinity (default) leaves light time out
  maxRefinements?: number; // default 50
}

/** The orbit that one positive root of the eighth-degree equation leads to. */
export interface GaussSolution {
  r2Root: number; // the root of the eighth-degree equation
  rho: [number, number, number]; // observer → body distances after the refinements
  epoch: number; // instant of the state: t₂, or t₂ − ρ₂/c with light time
  state: Float64Array; // x, y, z, vx, vy, vz of the body at `epoch`
  refinements: number; // Newton steps of the refinement taken (gaussRefinement.ts)
  converged: boolean; // the last refinement moved every ρ by ≤ 1e-12 of itself
  valid: boolean; // converged, all three ρ > 0 and the state finite
  reason: string; // '' when valid, else why not
}

type V3 = [number, number, number];
const dot = (a: ArrayLike<number>, b: ArrayLike<number>) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: ArrayLike<number>, b: ArrayLike<number>): V3 => [
  a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0],
];

/** Geometry of the three lines of sight: D₀ and D_ij (D[i][j] = R_i·p_j). */
interface Geometry {
  d0: number;
  d: number[][];
}

function geometry(obs: readonly GaussObservation[]): Geometry {
  const p = [cross(obs[1].lineOfSight, obs[2].lineOfSight), cross(obs[0].lineOfSight, obs[2].lineOfSight), cross(obs[0].lineOfSight, obs[1].lineOfSight)];
  const d0 = dot(obs[0].lineOfSight, p[0]);
  const d = [0, 1, 2].map((i) => [0, 1, 2].map((j) => dot(obs[i].observer, p[j])));
  return { d0, d };
}

/**
 * Every orbit Gauss's method gives for three observations (one per positive root of the
 * eighth-degree equation), in ascending r₂. RangeError for fewer or more than three
 * observations, instants not strictly increasing, or coplanar lines of sight (D₀ = 0).
 */
export function gaussOrbits(obs: readonly GaussObservation[], opts: GaussOptions): GaussSolution[] {
  if (obs.length !== 3) throw new RangeError(`gaussOrbits: needs three observations, got ${obs.length}`);
  if (!(obs[0].t < obs[1].t && obs[1].t < obs[2].t)) {
    throw new RangeError(`gaussOrbits: instants must increase strictly, got ${obs[0].t}, ${obs[1].t}, ${obs[2].t}`);
  }
  const mu = opts.mu;
  if (!(mu > 0 && Number.isFinite(mu))) throw new RangeError(`gaussOrbits: mu=${mu} must be > 0`);
  const g = geometry(obs);
  if (!(Math.abs(g.d0) > 0) || !Number.isFinite(g.d0)) {
    throw new RangeError(`gaussOrbits: the three lines of sight are coplanar (D0=${g.d0}); no solution`);
  }
  const tau1 = obs[0].t - obs[1].t, tau3 = obs[2].t - obs[1].t, tau = tau3 - tau1;
  const { d0, d } = g;
  const A = (-d[0][1] * (tau3 / tau) + d[1][1] + d[2][1] * (tau1 / tau)) / d0;
  const B = (d[0][1] * (tau3 * tau3 - tau * tau) * (tau3 / tau) + d[2][1] * (tau * tau - tau1 * tau1) * (tau1 / tau)) / (6 * d0);
  const E = dot(obs[1].observer, obs[1].lineOfSight);
  const R2sq = dot(obs[1].observer, obs[1].observer);
  const roots = gaussPolynomialRoots(-(A * A + 2 * A * E + R2sq), -2 * mu * B * (A + E), -mu * mu * B * B);
  return roots.map((r2) => solutionForRoot(obs, opts, g, r2, A, B, tau1, tau3, tau));
}

function solutionForRoot(
  obs: readonly GaussObservation[], opts: GaussOptions, g: Geometry, r2: number,
  A: number, B: number, tau1: number, tau3: number, tau: number,
): GaussSolution {
  const mu = opts.mu;
  const { d0, d } = g;
  const r3 = r2 * r2 * r2;
  // Initial distances from the series (Curtis eq. 5.113, from memory).
  const rho: V3 = [
    ((6 * (d[2][0] * (tau1 / tau3) + d[1][0] * (tau / tau3)) * r3 + mu * d[2][0] * (tau * tau - tau1 * tau1) * (tau1 / tau3)) /
      (6 * r3 + mu * (tau * tau - tau3 * tau3)) - d[0][0]) / d0,
    A + (mu * B) / r3,
    ((6 * (d[0][2] * (tau3 / tau1) - d[1][2] * (tau / tau1)) * r3 + mu * d[0][2] * (tau * tau - tau3 * tau3) * (tau3 / tau1)) /
      (6 * r3 + mu * (tau * tau - tau1 * tau1)) - d[2][2]) / d0,
  ];
  // Series f and g (Curtis eq. 5.99, from memory): the starting point of the refinement.
  const u = [
    1 - (mu * tau1 * tau1) / (2 * r3), tau1 - (mu * tau1 ** 3) / (6 * r3),
    1 - (mu * tau3 * tau3) / (2 * r3), tau3 - (mu * tau3 ** 3) / (6 * r3),
  ];
  const maxRefinements = opts.maxRefinements ?? 50;
  const problem: Problem = { obs, d0, d, mu, c: opts.cLight ?? Infinity };
  let refinements = 0;
  let converged = false;
  const residual = new Float64Array(4);
  while (refinements < maxRefinements && !converged) {
    const before = rhoFromFG(problem, u);
    if (!newtonStep(problem, u, residual)) {
      // No step lowers the residual: settled if it is already at the rounding level.
      converged = refinements > 0 && residualAtRoundingLevel(residual, u);
      break;
    }
    refinements++;
    const after = rhoFromFG(problem, u);
    converged = after.every((x, k) => Math.abs(x - before[k]) <= TOLERANCE * Math.abs(x));
  }
  const state = new Float64Array(6);
  if (refinements > 0) {
    const r = rhoFromFG(problem, u);
    rho[0] = r[0]; rho[1] = r[1]; rho[2] = r[2];
  }
  stateAtMiddle(obs, rho, u[0], u[1], u[2], u[3], state);
  const epoch = obs[1].t - rho[1] / problem.c;
  let reason = '';
  if (!Number.isFinite(state[0] + state[1] + state[2] + state[3] + state[4] + state[5])) reason = 'the state is not finite';
  else if (!(rho[0] > 0 && rho[1] > 0 && rho[2] > 0)) reason = `a distance is not positive: ρ = ${rho.map((x) => x.toPrecision(6)).join(', ')}`;
  else if (maxRefinements === 0) reason = 'series solution only (no refinement asked for)';
  else if (!converged) reason = `the refinement of f and g did not settle in ${refinements} steps`;
  return { r2Root: r2, rho, epoch, state, refinements, converged, valid: reason === '', reason };
}

