// The body's trajectory with partials (src/fit/trajectoryPartials.ts): states and
// ∂state/∂(state₀, params) sampled by dense output at times on both sides of the epoch,
// against (1) Kepler's problem in closed form (universal variables, src/core/orbit/universal.ts,
// itself checked against published two-body cases in test/core) with the planets off, its
// state transition matrix by central differences of the closed form, and (2) central
// differences of whole integrations with all eight planets (VSOP87B), the 1PN term and the
// non-gravitational and radiation-pressure parameters (common practice for checking
// variational equations). The orbits are invented.
import { describe, expect, it } from 'vitest';
import { GM_SUN_AU3_PER_DAY2 } from '../../src/core/constants.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { propagateTwoBody } from '../../src/core/orbit/universal.js';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { CircularEphemeris } from '../core/helpers/circularEphemeris.js';
import { sampleTrajectory, type FitParameter, type TrajectoryModel } from '../../src/fit/trajectoryPartials.js';

const EPOCH = 2_458_000.5;
const TIMES = [EPOCH - 700.3, EPOCH - 31.25, EPOCH, EPOCH + 0.4, EPOCH + 200, EPOCH + 1100.7];

/** Worst relative error per column (error / largest |value| of the column) over all times. */
function worstColumn(analytic: Float64Array, reference: Float64Array, columns: number, nTimes: number): number[] {
  const out: number[] = [];
  for (let j = 0; j < columns; j++) {
    let big = 0, err = 0;
    for (let k = 0; k < nTimes; k++) {
      for (let i = 0; i < 6; i++) {
        const o = 6 * columns * k + columns * i + j;
        big = Math.max(big, Math.abs(reference[o]));
        err = Math.max(err, Math.abs(analytic[o] - reference[o]));
      }
    }
    out.push(err / big);
  }
  return out;
}

describe('trajectory with partials, planets off: Kepler’s problem in closed form', () => {
  const s0 = new Float64Array(6);
  semimajorElementsToState(2.4, 0.35, 0.3, 1.2, 2.1, 0.8, GM_SUN_AU3_PER_DAY2, s0);
  const eph = new CircularEphemeris([], EPOCH, 5000);
  const model: TrajectoryModel = { epochJdTDB: EPOCH, state: s0, ephemeris: eph, planets: [], relativity: false, integrator: { epsilon: 1e-11 } };
  const got = sampleTrajectory(model, TIMES);

  it('states match the closed form within 1e-10 au over ±3 years, in the caller’s order', () => {
    let worst = 0;
    const ref = new Float64Array(6);
    TIMES.forEach((t, k) => {
      propagateTwoBody(s0, t - EPOCH, GM_SUN_AU3_PER_DAY2, ref);
      for (let i = 0; i < 3; i++) worst = Math.max(worst, Math.abs(got.states[6 * k + i] - ref[i]));
    });
    console.log(`trajectory vs two-body closed form: worst ${worst.toExponential(2)} au`);
    expect(worst).toBeLessThan(1e-10);
  });

  it('the state transition matrix matches central differences of the closed form within 1e-6 relative', () => {
    const ref = new Float64Array(36 * TIMES.length);
    const plus = new Float64Array(6), minus = new Float64Array(6);
    for (let j = 0; j < 6; j++) {
      const h = j < 3 ? 1e-6 : 1e-8;
      const sp = Float64Array.from(s0), sm = Float64Array.from(s0);
      sp[j] += h; sm[j] -= h;
      TIMES.forEach((t, k) => {
        propagateTwoBody(sp, t - EPOCH, GM_SUN_AU3_PER_DAY2, plus);
        propagateTwoBody(sm, t - EPOCH, GM_SUN_AU3_PER_DAY2, minus);
        for (let i = 0; i < 6; i++) ref[36 * k + 6 * i + j] = (plus[i] - minus[i]) / (2 * h);
      });
    }
    const rel = worstColumn(got.partials, ref, 6, TIMES.length);
    console.log(`STM vs closed-form differences (relative, per column): ${rel.map((r) => r.toExponential(1)).join(', ')}`);
    for (const r of rel) expect(r).toBeLessThan(1e-6);
    // At the epoch itself: the identity.
    for (let i = 0; i < 6; i++) for (let j = 0; j < 6; j++) expect(got.partials[36 * 2 + 6 * i + j]).toBe(i === j ? 1 : 0);
  });
});

describe('trajectory with partials, eight planets, 1PN, A2 and A/m', () => {
  it('matches central differences of whole integrations within 1e-6 relative', () => {
    const s0 = new Float64Array(6);
    semimajorElementsToState(1.9, 0.45, 0.12, 0.4, 4.0, 3.3, GM_SUN_AU3_PER_DAY2, s0); // crosses the Earth's orbit
    const params = Float64Array.of(0, 3e-12, 0, 0.02);
    const solveFor: FitParameter[] = ['A2', 'areaToMass'];
    const eph = planetaryEphemerisOver(TIMES[0], TIMES[TIMES.length - 1]);
    const base: TrajectoryModel = { epochJdTDB: EPOCH, state: s0, params, solveFor, law: 'inverse-square', ephemeris: eph, integrator: { epsilon: 1e-11 } };
    const got = sampleTrajectory(base, TIMES);
    expect(got.columns).toBe(8);
    const ref = new Float64Array(48 * TIMES.length);
    // Steps large enough that the integrations' rounding does not dominate (ten times smaller
    // steps measured up to 9e-7; these 1e-7).
    const steps = [1e-5, 1e-5, 1e-5, 1e-7, 1e-7, 1e-7, 1e-10, 1e-2];
    for (let j = 0; j < 8; j++) {
      const h = steps[j];
      const sp = Float64Array.from(s0), sm = Float64Array.from(s0);
      const pp = Float64Array.from(params), pm = Float64Array.from(params);
      if (j < 6) { sp[j] += h; sm[j] -= h; } else { const q = j === 6 ? 1 : 3; pp[q] += h; pm[q] -= h; }
      const a = sampleTrajectory({ ...base, state: sp, params: pp, solveFor: [] }, TIMES).states;
      const b = sampleTrajectory({ ...base, state: sm, params: pm, solveFor: [] }, TIMES).states;
      for (let k = 0; k < TIMES.length; k++) for (let i = 0; i < 6; i++) ref[48 * k + 8 * i + j] = (a[6 * k + i] - b[6 * k + i]) / (2 * h);
    }
    const rel = worstColumn(got.partials, ref, 8, TIMES.length);
    console.log(`trajectory partials vs differences of integrations (relative, per column x..vz, A2, A/m): ${rel.map((r) => r.toExponential(1)).join(', ')}`);
    for (const r of rel) expect(r).toBeLessThan(1e-6);
    // The parameter columns are not empty: over 3 years ∂r/∂A2 is of order t² ~ 1e6 au per au/day².
    expect(Math.abs(got.partials[48 * 5 + 6])).toBeGreaterThan(1e3);
  });

  it('refuses an unknown or repeated parameter and a state of the wrong length', () => {
    const eph = new CircularEphemeris([], EPOCH, 10);
    const m: TrajectoryModel = { epochJdTDB: EPOCH, state: new Float64Array([1, 0, 0, 0, 0.017, 0]), ephemeris: eph, planets: [] };
    expect(() => sampleTrajectory({ ...m, solveFor: ['A1', 'A1'] }, [EPOCH + 1])).toThrow(RangeError);
    expect(() => sampleTrajectory({ ...m, solveFor: ['B' as FitParameter] }, [EPOCH + 1])).toThrow(RangeError);
    expect(() => sampleTrajectory({ ...m, state: [1, 0, 0] }, [EPOCH + 1])).toThrow(RangeError);
  });
});
