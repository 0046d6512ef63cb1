/**
 * The body's trajectory with partials: its heliocentric state at any set of times and the
 * derivatives of that state with respect to what an orbit fit solves for — the state at the
 * epoch and, optionally, any of the non-gravitational parameters A1, A2, A3 (under one radial
 * law) and the area-to-mass ratio A/m of radiation pressure.
 *
 * The state and its derivatives come from one integration in each direction from the epoch
 * (Gauss–Radau over the core's force model with its variational equations: the 6 columns of
 * the state transition matrix and the 4 parameter columns, src/core/forces/forceModel.ts),
 * sampled at each requested time from the polynomial of the step that holds it (the
 * integrator's dense output: no step is cut short for a sample). Default forces: the Sun, all
 * eight planet systems and the Sun's first post-Newtonian term.
 *
 * Frame and units as in the core: heliocentric J2000 ecliptic (VSOP87's), au, au/day, JD TDB;
 * A1, A2, A3 in au/day², A/m in m²/kg.
 */
import { PLANETS, type PlanetName } from '../core/constants.js';
import { PARAMS_PER_BODY } from '../core/forces/forceModel.js';
import type { NonGravLaw } from '../core/forces/nonGravLaw.js';
import type { GaussRadauOptions } from '../core/integrate/gaussRadau.js';
import { createTestBodyIntegrator } from '../core/propagate/propagateTestBodies.js';
import type { Ephemeris } from '../core/types.js';

/** Parameters an orbit fit may solve for besides the state: A1, A2, A3 (au/day²), A/m (m²/kg). */
export type FitParameter = 'A1' | 'A2' | 'A3' | 'areaToMass';

/** Index of each parameter in the force model's per-body parameters (forceModel.ts). */
export const FIT_PARAMETER_INDEX: Readonly<Record<FitParameter, number>> = Object.freeze({ A1: 0, A2: 1, A3: 2, areaToMass: 3 });

/** A trajectory to sample: the state at the epoch, the parameters, the force model. */
export interface TrajectoryModel {
  epochJdTDB: number;
  /** x, y, z (au), vx, vy, vz (au/day) at the epoch, heliocentric J2000 ecliptic. */
  state: ArrayLike<number>;
  /** A1, A2, A3 (au/day²), A/m (m²/kg); absent: all 0. */
  params?: ArrayLike<number>;
  /** Parameters whose partials are wanted, in the order of the partials' columns after the six of the state. */
  solveFor?: readonly FitParameter[];
  /** Radial law of A1, A2, A3. Default 'comet-water'. */
  law?: NonGravLaw;
  /** Planet positions over the times asked for (and the epoch). */
  ephemeris: Ephemeris;
  /** Perturbing planets; default all eight. */
  planets?: readonly PlanetName[];
  /** The Sun's 1PN term; default true. */
  relativity?: boolean;
  /** Radiation-pressure coefficient C_R; default 1. */
  radiationPressureCoefficient?: number;
  integrator?: GaussRadauOptions;
}

/** The trajectory at the requested times, in the caller's order. */
export interface TrajectorySamples {
  /** 6 numbers per time: state at the time. */
  states: Float64Array;
  /** Columns: 6 (state at the epoch) + solveFor.length. */
  columns: number;
  /** 6 × columns numbers per time, row-major: ∂state(t)/∂(state₀, params). */
  partials: Float64Array;
  /** Accepted integrator steps, both directions. */
  steps: number;
}

/** Number of partial columns for a solve-for list. */
export function partialColumns(solveFor: readonly FitParameter[] = []): number {
  return 6 + solveFor.length;
}

/**
 * The trajectory's states and partials at `timesJdTDB` (any order; times at the epoch take
 * the epoch state and the identity). RangeError for a bad request or a time outside the
 * ephemeris; IntegrationError (src/core/integrate) when the integrator cannot go on.
 */
export function sampleTrajectory(model: TrajectoryModel, timesJdTDB: ArrayLike<number>): TrajectorySamples {
  const solveFor = model.solveFor ?? [];
  const seen = new Set<FitParameter>();
  for (const p of solveFor) {
    if (!(p in FIT_PARAMETER_INDEX)) throw new RangeError(`sampleTrajectory: unknown parameter '${String(p)}'`);
    if (seen.has(p)) throw new RangeError(`sampleTrajectory: parameter '${p}' listed twice`);
    seen.add(p);
  }
  if (model.state.length !== 6) throw new RangeError(`sampleTrajectory: the state needs 6 numbers, got ${model.state.length}`);
  const params = new Float64Array(PARAMS_PER_BODY);
  if (model.params !== undefined) {
    if (model.params.length !== PARAMS_PER_BODY) throw new RangeError(`sampleTrajectory: params need ${PARAMS_PER_BODY} numbers, got ${model.params.length}`);
    params.set(Array.from(model.params));
  }
  const n = timesJdTDB.length;
  for (let k = 0; k < n; k++) {
    if (!Number.isFinite(timesJdTDB[k])) throw new RangeError(`sampleTrajectory: non-finite time ${timesJdTDB[k]} at ${k}`);
  }
  const columns = partialColumns(solveFor);
  const states = new Float64Array(6 * n);
  const partials = new Float64Array(6 * columns * n);
  const epoch = model.epochJdTDB;
  const forward: number[] = [], backward: number[] = [];
  for (let k = 0; k < n; k++) (timesJdTDB[k] >= epoch ? forward : backward).push(k);
  forward.sort((a, b) => timesJdTDB[a] - timesJdTDB[b] || a - b);
  backward.sort((a, b) => timesJdTDB[b] - timesJdTDB[a] || a - b);
  let steps = 0;
  for (const group of [forward, backward]) {
    if (group.length === 0) continue;
    steps += sampleOneWay(model, params, solveFor, columns, group, timesJdTDB, states, partials);
  }
  return { states, columns, partials, steps };
}

/** Integrate from the epoch through the group's times (sorted away from the epoch). */
function sampleOneWay(model: TrajectoryModel, params: Float64Array, solveFor: readonly FitParameter[], columns: number,
  group: readonly number[], times: ArrayLike<number>, states: Float64Array, partials: Float64Array): number {
  const sampleTimes = group.map((k) => times[k]);
  const end = sampleTimes[sampleTimes.length - 1];
  const { model: forces, integrator } = createTestBodyIntegrator({
    epochJdTDB: model.epochJdTDB,
    states: Float64Array.from(Array.from(model.state)),
    params,
    forces: {
      planets: model.planets ?? PLANETS,
      ephemeris: model.ephemeris,
      relativity: model.relativity ?? true,
      nonGravLaw: model.law,
      radiationPressureCoefficient: model.radiationPressureCoefficient,
      variational: true,
    },
    integrator: model.integrator,
  }, end);
  const dim = forces.dim;
  const buf = new Float64Array(2 * dim * sampleTimes.length);
  integrator.integrateTo(end, sampleTimes, buf);
  const stm = new Float64Array(36);
  const dp = new Float64Array(6 * PARAMS_PER_BODY);
  for (let s = 0; s < group.length; s++) {
    const k = group[s];
    const x = buf.subarray(2 * dim * s, 2 * dim * s + dim);
    const v = buf.subarray(2 * dim * s + dim, 2 * dim * (s + 1));
    for (let i = 0; i < 3; i++) {
      states[6 * k + i] = x[i];
      states[6 * k + 3 + i] = v[i];
    }
    forces.readVariations(0, x, v, stm, dp);
    const o = 6 * columns * k;
    for (let i = 0; i < 6; i++) {
      for (let j = 0; j < 6; j++) partials[o + columns * i + j] = stm[6 * i + j];
      for (let q = 0; q < solveFor.length; q++) partials[o + columns * i + 6 + q] = dp[PARAMS_PER_BODY * i + FIT_PARAMETER_INDEX[solveFor[q]]];
    }
  }
  return integrator.steps;
}
