/**
 * Numerical propagation of massless test bodies: the Gauss–Radau integrator over the force
 * model, with the checks a caller needs at the boundary (finite states, the time span inside
 * the ephemeris).
 */
import { GaussRadauIntegrator, type GaussRadauOptions } from '../integrate/gaussRadau.js';
import { TestBodyForceModel, type ForceModelOptions } from '../forces/forceModel.js';

export interface TestBodyPropagation {
  /** Epoch of the initial states, JD (TDB). */
  epochJdTDB: number;
  /** Heliocentric J2000-ecliptic states, 6 numbers per body: x, y, z (au), vx, vy, vz (au/day). */
  states: Float64Array;
  /** Per-body A1, A2, A3 (au/day²), A/m (m²/kg); null for none. */
  params?: Float64Array | null;
  forces?: ForceModelOptions;
  integrator?: GaussRadauOptions;
}

export interface PropagationStats {
  steps: number;
  rejectedSteps: number;
  forceEvaluations: number;
}

/** Check the states and the span; build the model and the integrator at the epoch. */
export function createTestBodyIntegrator(req: TestBodyPropagation, spanEndJdTDB: number):
  { model: TestBodyForceModel; integrator: GaussRadauIntegrator } {
  const { epochJdTDB, states } = req;
  if (!Number.isFinite(epochJdTDB)) throw new RangeError(`propagation: non-finite epoch ${epochJdTDB}`);
  if (!Number.isFinite(spanEndJdTDB)) throw new RangeError(`propagation: non-finite target time ${spanEndJdTDB}`);
  if (states.length === 0 || states.length % 6 !== 0) {
    throw new RangeError(`propagation: states must hold 6 numbers per body, got ${states.length}`);
  }
  for (let i = 0; i < states.length; i++) {
    if (!Number.isFinite(states[i])) {
      throw new RangeError(`propagation: non-finite state component ${i % 6} of body ${Math.floor(i / 6)}: ${states[i]}`);
    }
  }
  const forces = req.forces ?? {};
  const eph = forces.ephemeris ?? null;
  if (eph !== null && (forces.planets?.length ?? 0) > 0) {
    const lo = Math.min(epochJdTDB, spanEndJdTDB);
    const hi = Math.max(epochJdTDB, spanEndJdTDB);
    if (lo < eph.startJdTDB || hi > eph.endJdTDB) {
      throw new RangeError(`propagation span JD ${lo}–${hi} outside the ephemeris '${eph.name}' span `
        + `JD ${eph.startJdTDB}–${eph.endJdTDB}`);
    }
  }
  const n = states.length / 6;
  const model = new TestBodyForceModel(n, req.params ?? null, forces);
  const x = new Float64Array(model.dim);
  const v = new Float64Array(model.dim);
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < 3; i++) {
      x[3 * k + i] = states[6 * k + i];
      v[3 * k + i] = states[6 * k + 3 + i];
    }
  }
  model.initialVariations(x, v);
  const integrator = new GaussRadauIntegrator(model, epochJdTDB, x, v, req.integrator);
  return { model, integrator };
}

/** Copy the body states (6 per body) out of an integrated position/velocity vector pair. */
export function extractStates(nBodies: number, x: ArrayLike<number>, v: ArrayLike<number>, out: Float64Array, o = 0): void {
  for (let k = 0; k < nBodies; k++) {
    for (let i = 0; i < 3; i++) {
      out[o + 6 * k + i] = x[3 * k + i];
      out[o + 6 * k + 3 + i] = v[3 * k + i];
    }
  }
}

/**
 * Propagate the bodies from the epoch to `targetJdTDB`, writing their states (6 per body)
 * to `out`. Returns step counts.
 */
export function propagateTestBodies(req: TestBodyPropagation, targetJdTDB: number, out: Float64Array): PropagationStats {
  if (out.length < req.states.length) throw new RangeError(`propagation: output needs ${req.states.length} numbers`);
  const { model, integrator } = createTestBodyIntegrator(req, targetJdTDB);
  integrator.integrateTo(targetJdTDB);
  extractStates(model.nBodies, integrator.x, integrator.v, out);
  return { steps: integrator.steps, rejectedSteps: integrator.rejectedSteps, forceEvaluations: integrator.forceEvaluations };
}
