// The Jacobi constant of the circular restricted three-body problem, with the planet on a
// circular orbit from a synthetic test ephemeris, for a Jupiter-crossing test body.
// Outside check: the Jacobi integral (Murray & Dermott 1999, Solar System Dynamics, §3.3; in
// inertial barycentric coordinates C = 2(μ1/r1 + μ2/r2) + 2 n (x v_y − y v_x) − v², from the
// rotating-frame form eq. 3.21 with the frame's angular velocity n — equation number from memory).
import { describe, expect, it } from 'vitest';
import { createTestBodyIntegrator } from '../../src/core/propagate/propagateTestBodies.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { GM_SUN_AU3_PER_DAY2, planetGmAu3PerDay2 } from '../../src/core/constants.js';
import { CircularEphemeris } from './helpers/circularEphemeris.js';

const J2000 = 2_451_545;
const MU_SUN = GM_SUN_AU3_PER_DAY2;
const MU_JUP = planetGmAu3PerDay2('jupiter');

function jacobiDrift(epsilon: number): { worst: number; closest: number; steps: number } {
  const years = 1000;
  const eph = new CircularEphemeris([{ planet: 'jupiter', aAu: 5.2026, lambda0Rad: 0 }], J2000, 366 * years);
  const n = eph.meanMotion('jupiter');
  const s0 = new Float64Array(6);
  // An invented Jupiter-family-like orbit in the planet's plane neighbourhood (i = 2°).
  semimajorElementsToState(4.3, 0.35, 0.035, 0.4, 1.2, 0.5, MU_SUN, s0);
  const span = 365.25 * years;
  const { integrator } = createTestBodyIntegrator(
    { epochJdTDB: J2000, states: s0, forces: { planets: ['jupiter'], ephemeris: eph }, integrator: { epsilon } },
    J2000 + span);
  const nSamples = 4000;
  const times = Array.from({ length: nSamples }, (_, k) => J2000 + (span * k) / (nSamples - 1));
  const samples = new Float64Array(6 * nSamples);
  integrator.integrateTo(J2000 + span, times, samples);
  const pj = new Float64Array(6);
  const f = MU_JUP / (MU_SUN + MU_JUP); // barycentre from the Sun along r_J
  let c0 = NaN, worst = 0, closest = Infinity;
  for (let k = 0; k < nSamples; k++) {
    eph.helioState('jupiter', times[k], pj, 0);
    const o = 6 * k;
    const hx = samples[o], hy = samples[o + 1], hz = samples[o + 2];
    const r1 = Math.hypot(hx, hy, hz);
    const r2 = Math.hypot(hx - pj[0], hy - pj[1], hz - pj[2]);
    closest = Math.min(closest, r2);
    const x = hx - f * pj[0], y = hy - f * pj[1];
    const vx = samples[o + 3] - f * pj[3], vy = samples[o + 4] - f * pj[4], vz = samples[o + 5];
    const c = 2 * (MU_SUN / r1 + MU_JUP / r2) + 2 * n * (x * vy - y * vx) - (vx * vx + vy * vy + vz * vz);
    if (k === 0) c0 = c;
    worst = Math.max(worst, Math.abs(c / c0 - 1));
  }
  console.log(`Jacobi constant over ${years} yr, ε = ${epsilon}: worst relative change ${worst.toExponential(2)}; `
    + `closest approach to Jupiter ${closest.toFixed(4)} au; ${integrator.steps} steps`);
  return { worst, closest, steps: integrator.steps };
}

describe('CR3BP Jacobi constant (Sun + circular Jupiter)', () => {
  it('is conserved over 1 000 years of a Jupiter-crossing orbit with close approaches', () => {
    const coarse = jacobiDrift(1e-9);
    // The orbit must really meet Jupiter for the test to mean anything.
    expect(coarse.closest).toBeLessThan(0.3);
    // At the default ε = 1e-9 the truncation error of ~5 000 steps through encounters shows
    // (measured 2.6e-10); the bound is loosened to 1e-9 for that reason, and the tighter
    // run below shows the drift is the integrator's controlled error, not a model defect.
    expect(coarse.worst).toBeLessThan(1e-9);
    const fine = jacobiDrift(1e-11);
    expect(fine.worst).toBeLessThan(1e-11);
    expect(fine.worst).toBeLessThan(coarse.worst / 10);
  });
});
