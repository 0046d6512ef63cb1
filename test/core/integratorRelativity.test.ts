// Mercury's perihelion advance from the Sun's post-Newtonian term.
// Outside checks: 42.98″ per Julian century, the general-relativistic advance of Mercury's
// perihelion (Will 2014, Living Rev. Relativity 17, 4, sec. 5.1; Clemence 1947, Rev. Mod.
// Phys. 19, 361); and the analytic 6πμ/(c² a (1 − e²)) per orbit (Will 2014, eq. 59 with
// β = γ = 1). Mercury's mean a and e: Standish & Williams (JPL table, constants.ts).
// Mercury is integrated as a test body of the Sun alone, with and without the 1PN term.
import { describe, expect, it } from 'vitest';
import { createTestBodyIntegrator } from '../../src/core/propagate/propagateTestBodies.js';
import { semimajorElementsToState, stateToSemimajorElements } from '../../src/core/orbit/twoBody.js';
import {
  ARCSEC_PER_RAD, C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2, PLANET_MEAN_A_AU, PLANET_MEAN_E, RAD_PER_DEG,
} from '../../src/core/constants.js';

const MU = GM_SUN_AU3_PER_DAY2;
const J2000 = 2_451_545;
const CENTURY = 36_525;

/**
 * Mean argument of perihelion over one orbit starting at t0 (rad): the osculating ω carries
 * periodic 1PN terms of ~0.03″; averaging over an orbit removes them. Sampled by dense output.
 */
function meanPerihelionOverOrbit(relativity: boolean, s0: Float64Array, t0: number, period: number): number {
  const { integrator } = createTestBodyIntegrator({ epochJdTDB: J2000, states: s0, forces: { relativity } }, t0 + period);
  const n = 400;
  const times = Array.from({ length: n }, (_, k) => t0 + (k * period) / n);
  const samples = new Float64Array(6 * n);
  if (t0 > J2000) integrator.integrateTo(t0);
  integrator.integrateTo(t0 + period, times, samples);
  const el = new Float64Array(6);
  let sx = 0, sy = 0;
  for (let k = 0; k < n; k++) {
    stateToSemimajorElements(samples.subarray(6 * k, 6 * k + 6), MU, el);
    const varpi = el[3] + el[4]; // longitude of perihelion (i is small; Ω barely moves)
    sx += Math.cos(varpi);
    sy += Math.sin(varpi);
  }
  return Math.atan2(sy, sx);
}

describe('Mercury perihelion advance (Sun + 1PN)', () => {
  it('≈ 42.98″ per century, and 6πμ/(c²a(1−e²)) per orbit', () => {
    const a = PLANET_MEAN_A_AU.mercury, e = PLANET_MEAN_E.mercury;
    const s0 = new Float64Array(6);
    semimajorElementsToState(a, e, 7 * RAD_PER_DEG, 48.33 * RAD_PER_DEG, 29.12 * RAD_PER_DEG, 3.05, MU, s0);
    const period = 2 * Math.PI * Math.sqrt(a ** 3 / MU);
    const perOrbit = (6 * Math.PI * MU) / (C_AU_PER_DAY ** 2 * a * (1 - e * e));
    const analyticPerCentury = perOrbit * (CENTURY / period) * ARCSEC_PER_RAD;

    const start = meanPerihelionOverOrbit(true, s0, J2000, period);
    const end = meanPerihelionOverOrbit(true, s0, J2000 + CENTURY, period);
    const measured = (end - start) * ARCSEC_PER_RAD;
    const newtonStart = meanPerihelionOverOrbit(false, s0, J2000, period);
    const newtonEnd = meanPerihelionOverOrbit(false, s0, J2000 + CENTURY, period);
    const newtonian = (newtonEnd - newtonStart) * ARCSEC_PER_RAD;
    console.log(`Mercury perihelion advance: integrated ${measured.toFixed(4)}″/cy, analytic `
      + `${analyticPerCentury.toFixed(4)}″/cy (difference ${(measured - analyticPerCentury).toExponential(2)}″), `
      + `published 42.98″/cy; Newtonian-only drift ${newtonian.toExponential(2)}″`);
    // The published value is rounded to 0.01″, so it is only known to ±0.005″; measured 5e-4″
    // from it (our a, e are mean elements). Bound: that rounding (was 0.03″).
    expect(Math.abs(measured - 42.98)).toBeLessThan(0.005);
    // Against the analytic formula for the same a, e: the secular rate agrees to the size of
    // the O(μ/c²)² and averaging residue. Measured 6.6e-6″; bound near 10× (was 0.01″).
    expect(Math.abs(measured - analyticPerCentury)).toBeLessThan(7e-5);
    // Measured 1.3e-9″ without the 1PN term; bound near 10× (was 1e-3″).
    expect(Math.abs(newtonian)).toBeLessThan(1.5e-8);
  });
});
