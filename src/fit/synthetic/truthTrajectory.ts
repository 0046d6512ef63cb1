/**
 * The truth body's heliocentric states at any list of instants, from the core's integrator:
 * Gauss–Radau over the Sun, the eight planet systems (positions from the project's ephemeris
 * cache), optionally the Sun's 1PN term, and the body's A1/A2/A3 and radiation pressure
 * (src/core/forces/forceModel.ts). Instants before the elements' epoch are reached by
 * integrating backwards from it, the others forwards; every state comes from the polynomial
 * of the step that holds it (dense output), so the states do not depend on how the list is cut.
 * Frame: heliocentric J2000 ecliptic, au, au/day, JD TDB.
 */
import { PLANETS } from '../../core/constants.js';
import { orbitStateAtEpoch } from '../../core/propagate/propagateOrbit.js';
import { createTestBodyIntegrator } from '../../core/propagate/propagateTestBodies.js';
import type { Ephemeris } from '../../core/types.js';
import type { SyntheticTruth } from './types.js';

/** States (6 numbers each, out[6k..6k+5]) of the truth body at `timesJdTDB` (any order). */
export function truthStates(truth: SyntheticTruth, eph: Ephemeris, timesJdTDB: ArrayLike<number>): Float64Array {
  const n = timesJdTDB.length;
  const out = new Float64Array(6 * n);
  const epoch = truth.elements.epochJdTDB;
  const order = Array.from({ length: n }, (_, k) => k);
  for (const forward of [true, false]) {
    const idx = order.filter((k) => (forward ? timesJdTDB[k] >= epoch : timesJdTDB[k] < epoch));
    if (idx.length === 0) continue;
    idx.sort((a, b) => (forward ? timesJdTDB[a] - timesJdTDB[b] : timesJdTDB[b] - timesJdTDB[a]));
    integrateTo(truth, eph, idx.map((k) => timesJdTDB[k]), idx, out);
  }
  return out;
}

function integrateTo(truth: SyntheticTruth, eph: Ephemeris, sortedTimes: number[], idx: number[], out: Float64Array): void {
  const s0 = new Float64Array(6);
  orbitStateAtEpoch(truth.elements, s0);
  const ng = truth.nonGravAuPerDay2;
  const params = Float64Array.of(ng?.[0] ?? 0, ng?.[1] ?? 0, ng?.[2] ?? 0, truth.areaToMassM2PerKg);
  const end = sortedTimes[sortedTimes.length - 1];
  const { integrator } = createTestBodyIntegrator({
    epochJdTDB: truth.elements.epochJdTDB, states: s0, params,
    forces: {
      planets: PLANETS, ephemeris: eph, relativity: truth.relativity, nonGravLaw: truth.nonGravLaw,
      radiationPressureCoefficient: truth.radiationPressureCoefficient,
    },
  }, end);
  const samples = new Float64Array(6 * sortedTimes.length); // x then v, dim 3 for one body
  integrator.integrateTo(end, sortedTimes, samples);
  for (let j = 0; j < idx.length; j++) out.set(samples.subarray(6 * j, 6 * j + 6), 6 * idx[j]);
}
