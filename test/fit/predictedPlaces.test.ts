// The design rows of the orbit fit (src/fit/predictedPlaces.ts): ∂(α cos δ, δ)/∂(state₀, A2)
// of light-time-corrected places of an N-body trajectory against central differences of the
// places themselves (each from its own integration and light-time solution; common practice
// for checking partials), and the places against computeAstrometricPlace on a fresh
// integration to each emission instant. The orbit and the observers are invented.
import { describe, expect, it } from 'vitest';
import { ARCSEC_PER_RAD, GM_SUN_AU3_PER_DAY2, PLANETS } from '../../src/core/constants.js';
import { wrapPi } from '../../src/core/math.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { propagateTestBodies } from '../../src/core/propagate/propagateTestBodies.js';
import { computeAstrometricPlace } from '../../src/fit/astrometricPlace.js';
import { predictPlaces } from '../../src/fit/predictedPlaces.js';
import type { TrajectoryModel } from '../../src/fit/trajectoryPartials.js';
import type { ObserverState } from '../../src/fit/types.js';

const EPOCH = 2_458_400.5;
const eph = planetaryEphemerisOver(EPOCH - 400, EPOCH + 400);
const s0 = new Float64Array(6);
semimajorElementsToState(1.6, 0.3, 0.2, 2.0, 1.0, 4.0, GM_SUN_AU3_PER_DAY2, s0); // a near-Earth-like orbit, invented
const params = Float64Array.of(0, 2e-11, 0, 0);
const model: TrajectoryModel = { epochJdTDB: EPOCH, state: s0, params, solveFor: ['A2'], law: 'inverse-square', ephemeris: eph, integrator: { epsilon: 1e-11 } };

/** Observers at the ephemeris' geocentre turned by a rounded obliquity: any positions near the Earth serve, both sides use the same. */
const observers: ObserverState[] = [-350.2, -40.7, 0.3, 12.9, 250.4, 390.1].map((d) => {
  const e = new Float64Array(6);
  eph.helioState('earth', EPOCH + d, e, 0);
  return { positionIcrfAu: Float64Array.of(e[0], e[1] * 0.9175 - e[2] * 0.3978, e[1] * 0.3978 + e[2] * 0.9175), velocityIcrfAuPerDay: new Float64Array(3).fill(NaN), jdTDB: EPOCH + d };
});

describe('predicted places and design rows', () => {
  const got = predictPlaces(model, observers);

  it('places match a fresh integration to each emission instant within 1e-5″', () => {
    let worst = 0;
    observers.forEach((o, k) => {
      const body = (jd: number, out: Float64Array) => {
        if (jd === EPOCH) { out.set(s0); return; }
        propagateTestBodies({ epochJdTDB: EPOCH, states: s0, params, forces: { planets: PLANETS, ephemeris: eph, relativity: true, nonGravLaw: 'inverse-square' }, integrator: { epsilon: 1e-11 } }, jd, out);
      };
      const p = computeAstrometricPlace(body, o.positionIcrfAu, o.jdTDB);
      const d = Math.hypot(wrapPi(p.raRad - got.raRad[k]) * Math.cos(p.decRad), p.decRad - got.decRad[k]) * ARCSEC_PER_RAD;
      worst = Math.max(worst, d);
    });
    console.log(`predicted places vs fresh integrations: worst ${worst.toExponential(2)}″`);
    expect(worst).toBeLessThan(1e-5);
  });

  it('design rows match central differences of the places within 1e-6 relative', () => {
    // Steps large enough that the integrations' rounding does not dominate the differences
    // (measured: ten times smaller steps give 1e-6–3e-4, falling as the steps grow).
    const steps = [1e-5, 1e-5, 1e-5, 1e-7, 1e-7, 1e-7, 1e-10];
    let worst = 0;
    const report: string[] = [];
    for (let j = 0; j < 7; j++) {
      const sp = Float64Array.from(s0), sm = Float64Array.from(s0);
      const pp = Float64Array.from(params), pm = Float64Array.from(params);
      if (j < 6) { sp[j] += steps[j]; sm[j] -= steps[j]; } else { pp[1] += steps[j]; pm[1] -= steps[j]; }
      const a = predictPlaces({ ...model, state: sp, params: pp, solveFor: [] }, observers);
      const b = predictPlaces({ ...model, state: sm, params: pm, solveFor: [] }, observers);
      let big = 0, err = 0;
      observers.forEach((_, k) => {
        const fd0 = (wrapPi(a.raRad[k] - b.raRad[k]) * Math.cos(got.decRad[k])) / (2 * steps[j]);
        const fd1 = (a.decRad[k] - b.decRad[k]) / (2 * steps[j]);
        const an0 = got.design[14 * k + j], an1 = got.design[14 * k + 7 + j];
        big = Math.max(big, Math.abs(fd0), Math.abs(fd1));
        err = Math.max(err, Math.abs(fd0 - an0), Math.abs(fd1 - an1));
      });
      worst = Math.max(worst, err / big);
      report.push((err / big).toExponential(1));
    }
    console.log(`design rows vs differences of places (relative, x..vz, A2): ${report.join(', ')}`);
    expect(worst).toBeLessThan(1e-6);
  });
});
