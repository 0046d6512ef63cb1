// Gauss–Radau integrator: its spacings, exact two-body motion over 1 000 revolutions, dense
// output, time reversibility, and loud failures.
// Outside checks: the Gauss–Radau nodes are the zeros of [P7(x) + P8(x)]/(1 + x)
// (Abramowitz & Stegun 1964, 25.4.31); exact two-body motion by Kepler's equation (mean anomaly
// advanced by n·Δt, the core's elements → state conversion; Danby 1988 §6.3: no integration);
// time reversibility of Newtonian motion (common practice).
import { describe, expect, it } from 'vitest';
import { B_TO_G, G_TO_B, RADAU_SPACINGS } from '../../src/core/integrate/gaussRadauSpacings.js';
import { GaussRadauIntegrator, IntegrationError, type SecondOrderSystem } from '../../src/core/integrate/gaussRadau.js';
import { createTestBodyIntegrator, propagateTestBodies } from '../../src/core/propagate/propagateTestBodies.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { GM_SUN_AU3_PER_DAY2, KM_PER_AU } from '../../src/core/constants.js';
import { CircularEphemeris } from './helpers/circularEphemeris.js';
import { rk4Propagate } from './helpers/rk4Reference.js';

const MU = GM_SUN_AU3_PER_DAY2;
const DEG = Math.PI / 180;
const J2000 = 2_451_545;

function legendre(n: number, x: number): number {
  // Bonnet's recursion (common practice): (k+1) P_{k+1} = (2k+1) x P_k − k P_{k−1}.
  let p0 = 1, p1 = x;
  if (n === 0) return p0;
  for (let k = 1; k < n; k++) [p0, p1] = [p1, ((2 * k + 1) * x * p1 - k * p0) / (k + 1)];
  return p1;
}

/** Exact two-body state at t: the mean anomaly advanced by n (t − t0) (Kepler's equation). */
function keplerState(a: number, e: number, i: number, node: number, peri: number, m0: number,
  dtDays: number, out: Float64Array): void {
  const n = Math.sqrt(MU / a ** 3);
  semimajorElementsToState(a, e, i, node, peri, (m0 + n * dtDays) % (2 * Math.PI), MU, out);
}

function kmBetween(a: ArrayLike<number>, b: ArrayLike<number>, ao = 0, bo = 0): number {
  return Math.hypot(a[ao] - b[bo], a[ao + 1] - b[bo + 1], a[ao + 2] - b[bo + 2]) * KM_PER_AU;
}

describe('Gauss–Radau spacings and coefficient tables', () => {
  it('h1…h7 are the zeros of P7 + P8 at x = 2h − 1 (Abramowitz & Stegun 25.4.31)', () => {
    let worst = 0;
    for (let k = 1; k < 8; k++) {
      const x = 2 * RADAU_SPACINGS[k] - 1;
      // The derivative of P7 + P8 is O(10–100) near these zeros: 1e-13 means |Δh| ≲ 1e-15.
      worst = Math.max(worst, Math.abs(legendre(7, x) + legendre(8, x)));
    }
    console.log(`Radau spacings: worst |P7 + P8| = ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-13);
  });

  it('the g→b and b→g tables are inverse to each other', () => {
    let worst = 0;
    for (let k = 0; k < 7; k++) {
      for (let j = 0; j < 7; j++) {
        let s = 0; // (B_TO_G · G_TO_B)[k][j] = Σ_m X[k][m] U[m][j]
        for (let m = 0; m < 7; m++) s += B_TO_G[7 * m + k] * G_TO_B[7 * j + m];
        worst = Math.max(worst, Math.abs(s - (k === j ? 1 : 0)));
      }
    }
    expect(worst).toBeLessThan(1e-12);
  });
});

describe('two-body motion (planets off) against exact Kepler propagation', () => {
  const BOUND_1000_REV_KM = { derivatives: 0.07, 'b6-ratio': 0.004 } as const;
  for (const stepControl of ['derivatives', 'b6-ratio'] as const) {
    it(`1 000 revolutions of an e = 0.3 orbit (${stepControl} step control): position error in km`, () => {
      const s0 = new Float64Array(6);
      const a = 1.5, e = 0.3;
      semimajorElementsToState(a, e, 12 * DEG, 40 * DEG, 70 * DEG, 1.0, MU, s0);
      const period = 2 * Math.PI * Math.sqrt(a ** 3 / MU);
      const tEnd = J2000 + 1000 * period;
      const out = new Float64Array(6);
      const stats = propagateTestBodies({ epochJdTDB: J2000, states: s0, integrator: { stepControl } }, tEnd, out);
      const exact = new Float64Array(6);
      keplerState(a, e, 12 * DEG, 40 * DEG, 70 * DEG, 1.0, tEnd - J2000, exact);
      const errKm = kmBetween(out, exact);
      console.log(`two-body, 1000 revolutions (${(1000 * period / 365.25).toFixed(0)} yr), ${stepControl}: `
        + `error ${(errKm * 1000).toFixed(3)} m; ${stats.steps} steps, ${stats.forceEvaluations} force evaluations`);
      // Measured 7.10 m (derivatives, 41 300 steps) and 0.36 m (b6 ratio, 88 911 steps):
      // truncation and round-off in the along-track phase. Bounds near 10× each (were 1 km
      // for both): a central force wrong by 1e-12 relative shifts the phase by ~1e-8 rad
      // over the 1 000 revolutions, about 2 km (δn/n ~ δμ/μ, phase 2π·1000·δn/n).
      expect(errKm).toBeLessThan(BOUND_1000_REV_KM[stepControl]);
    });
  }

  it('backward in time matches exact Kepler too', () => {
    const s0 = new Float64Array(6);
    semimajorElementsToState(2.7, 0.15, 5 * DEG, 100 * DEG, 200 * DEG, 3.0, MU, s0);
    const out = new Float64Array(6);
    propagateTestBodies({ epochJdTDB: J2000, states: s0 }, J2000 - 36_525, out);
    const exact = new Float64Array(6);
    keplerState(2.7, 0.15, 5 * DEG, 100 * DEG, 200 * DEG, 3.0, -36_525, exact);
    const errKm = kmBetween(out, exact);
    console.log(`two-body, 100 yr backward: error ${(errKm * 1000).toFixed(3)} m`);
    // Measured 0.30 m; bound near 10× (was 100 m).
    expect(errKm).toBeLessThan(0.003);
  });

  it('dense output inside steps agrees with exact Kepler positions', () => {
    const s0 = new Float64Array(6);
    semimajorElementsToState(1.2, 0.6, 20 * DEG, 10 * DEG, 30 * DEG, 0.2, MU, s0);
    const { integrator } = createTestBodyIntegrator({ epochJdTDB: J2000, states: s0 }, J2000 + 4000);
    const times = Array.from({ length: 400 }, (_, k) => J2000 + 10 * k + 3.7 * Math.sin(k) ** 2);
    const samples = new Float64Array(6 * times.length);
    integrator.integrateTo(J2000 + 4000, times, samples);
    const exact = new Float64Array(6);
    let worstKm = 0;
    let worstVel = 0;
    for (let k = 0; k < times.length; k++) {
      keplerState(1.2, 0.6, 20 * DEG, 10 * DEG, 30 * DEG, 0.2, times[k] - J2000, exact);
      worstKm = Math.max(worstKm, kmBetween(samples, exact, 6 * k, 0));
      worstVel = Math.max(worstVel, Math.hypot(samples[6 * k + 3] - exact[3], samples[6 * k + 4] - exact[4],
        samples[6 * k + 5] - exact[5]) * KM_PER_AU / 86400 * 1e6);
    }
    console.log(`dense output, 400 samples over 11 yr (e = 0.6): worst ${(worstKm * 1000).toFixed(3)} m, `
      + `${worstVel.toExponential(2)} mm/s`);
    // The step polynomial is of the integrator's own order. Measured 1.08 m and 5.0e-4 mm/s;
    // bounds near 10× (were 50 m and 0.05 mm/s).
    expect(worstKm).toBeLessThan(0.011);
    expect(worstVel).toBeLessThan(5e-3);
  });
});

// Reversibility cannot see a wrong force (wrong forces reverse just as well): its pair is the
// next test, the same forward run against an independent integration of the equations of
// motion (test/core/helpers/rk4Reference.ts); further pairs are the Jacobi integral
// (integratorJacobi.test.ts) and the planets against VSOP87 (integratorVsop87.test.ts).
describe('time reversibility with planets (synthetic circular Jupiter and Saturn)', () => {
  const eph = new CircularEphemeris([
    { planet: 'jupiter', aAu: 5.2026, lambda0Rad: 0.3 },
    { planet: 'saturn', aAu: 9.5549, lambda0Rad: 2.1 },
  ], J2000, 40_000);
  const s0 = new Float64Array(6);
  semimajorElementsToState(3.9, 0.25, 8 * DEG, 50 * DEG, 80 * DEG, 1.0, MU, s0); // a Hilda-like orbit
  const forces = { planets: ['jupiter', 'saturn'] as const, ephemeris: eph };

  it('forward 100 yr then back returns to the start: error in km', () => {
    const mid = new Float64Array(6);
    const back = new Float64Array(6);
    const st1 = propagateTestBodies({ epochJdTDB: J2000, states: s0, forces }, J2000 + 36_525, mid);
    propagateTestBodies({ epochJdTDB: J2000 + 36_525, states: mid, forces }, J2000, back);
    const errKm = kmBetween(back, s0);
    console.log(`reversibility, 100 yr out and back with Jupiter + Saturn: ${(errKm * 1000).toFixed(3)} m `
      + `(${st1.steps} steps each way)`);
    // Measured 0.35 m; bound near 10× (was 1 km).
    expect(errKm).toBeLessThan(0.0035);
  });

  it('the forward run agrees with an independent RK4 integration of the same equations', () => {
    const span = 36_525;
    const ours = new Float64Array(6);
    propagateTestBodies({ epochJdTDB: J2000, states: s0, forces }, J2000 + span, ours);
    const problem = { muSun: MU, planets: forces.planets, ephemeris: eph, epochJd: J2000, state: s0 };
    const ref = rk4Propagate(problem, J2000 + span, 0.5);
    const refHalf = rk4Propagate(problem, J2000 + span, 0.25);
    // Richardson extrapolation of the fourth-order pair (common practice): error O(h⁶).
    const best = refHalf.map((v, i) => v + (v - ref[i]) / 15);
    const errKm = kmBetween(ours, best);
    const refKm = kmBetween(refHalf, best);
    console.log(`100 yr with Jupiter + Saturn vs RK4 (0.5/0.25 d, extrapolated): ${(errKm * 1000).toFixed(3)} m; `
      + `RK4 at 0.25 d from the extrapolation: ${(refKm * 1000).toFixed(3)} m`);
    // Measured 1.17 m (the reference itself 0.18 m at 0.25 d before extrapolation); bound
    // near 10×. Sensitivity of this run, measured with the RK4 alone: the Sun's GM wrong by
    // 1e-9 relative moves the end by 13 km; leaving Saturn out, by 3.4e5 km.
    expect(errKm).toBeLessThan(0.012);
  });
});

describe('several bodies at once', () => {
  it('three bodies integrated together agree with each integrated alone', () => {
    const eph = new CircularEphemeris([{ planet: 'jupiter', aAu: 5.2026, lambda0Rad: 0.3 }], J2000, 40_000);
    const forces = { planets: ['jupiter'] as const, ephemeris: eph, relativity: true };
    const states = new Float64Array(18);
    semimajorElementsToState(2.2, 0.1, 0.1, 1, 2, 3, MU, states.subarray(0, 6));
    semimajorElementsToState(3.1, 0.3, 0.3, 2, 1, 0.5, MU, states.subarray(6, 12));
    semimajorElementsToState(0.9, 0.5, 0.05, 4, 5, 6, MU, states.subarray(12, 18));
    const params = Float64Array.of(0, 0, 0, 0, 1e-9, 2e-10, 0, 0.1, 0, 0, 0, 0);
    const together = new Float64Array(18);
    propagateTestBodies({ epochJdTDB: J2000, states, params, forces }, J2000 + 7300, together);
    let worstKm = 0;
    for (let k = 0; k < 3; k++) {
      const alone = new Float64Array(6);
      propagateTestBodies({
        epochJdTDB: J2000, states: states.slice(6 * k, 6 * k + 6), params: params.slice(4 * k, 4 * k + 4), forces,
      }, J2000 + 7300, alone);
      worstKm = Math.max(worstKm, kmBetween(together, alone, 6 * k, 0));
    }
    console.log(`three bodies together vs alone over 20 yr: worst ${(worstKm * 1000).toFixed(3)} m`);
    // Shared steps follow the fastest body; each alone takes its own. Measured 0.079 m;
    // bound near 10× (was 10 m).
    expect(worstKm).toBeLessThan(0.0008);
  });
});

describe('loud failures', () => {
  it('non-finite elements and states are refused before integrating', () => {
    expect(() => propagateTestBodies({ epochJdTDB: J2000, states: Float64Array.of(1, 0, 0, 0, NaN, 0) },
      J2000 + 10, new Float64Array(6))).toThrow(/non-finite state component 4 of body 0: NaN/);
    expect(() => propagateTestBodies({ epochJdTDB: J2000, states: Float64Array.of(1, 0, 0, 0, 0.017, 0) },
      Infinity, new Float64Array(6))).toThrow(RangeError);
    expect(() => propagateTestBodies({ epochJdTDB: NaN, states: Float64Array.of(1, 0, 0, 0, 0.017, 0) },
      J2000, new Float64Array(6))).toThrow(/non-finite epoch/);
  });

  it('a span outside the ephemeris is a RangeError naming both spans', () => {
    const eph = new CircularEphemeris([{ planet: 'jupiter', aAu: 5.2, lambda0Rad: 0 }], J2000, 1000);
    expect(() => propagateTestBodies({
      epochJdTDB: J2000, states: Float64Array.of(1, 0, 0, 0, 0.017, 0),
      forces: { planets: ['jupiter'], ephemeris: eph },
    }, J2000 + 5000, new Float64Array(6))).toThrow(/outside the ephemeris 'circular test planets' span/);
  });

  it('a plunge into the Sun fails with the time and step reached, never NaN', () => {
    // Radial free fall from 1 au reaches r = 0 after π/(2√2) · 1/√μ · 1 au^1.5 ≈ 64.6 days.
    const s0 = Float64Array.of(1, 0, 0, 0, 0, 0);
    const out = new Float64Array(6);
    let err: unknown;
    try {
      propagateTestBodies({ epochJdTDB: J2000, states: s0 }, J2000 + 100, out);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(IntegrationError);
    const ie = err as IntegrationError;
    console.log(`plunge: ${ie.message}`);
    expect(ie.message).toMatch(/^integration could not meet tolerance.* at JD 24516\d\d\.\d{6} step -?\d\.\d{3}e[-+]\d+ days$/);
    expect(ie.jdTDB - J2000).toBeGreaterThan(60);
    expect(ie.jdTDB - J2000).toBeLessThan(65);
    expect(Number.isFinite(out[0])).toBe(true);
  });

  it('the step limit is enforced with the time reached', () => {
    const s0 = Float64Array.of(1, 0, 0, 0, 0.0172, 0);
    expect(() => propagateTestBodies({ epochJdTDB: J2000, states: s0, integrator: { maxSteps: 5 } },
      J2000 + 3650, new Float64Array(6))).toThrow(/integration exceeded 5 steps at JD 2451\d+\.\d{6}/);
  });

  it('a force that returns NaN stops the integration with an IntegrationError', () => {
    const system: SecondOrderSystem = {
      dim: 1, errorDim: 1,
      accel: (t, x, _v, out) => { out[0] = t > J2000 + 5 ? NaN : -x[0]; },
    };
    const gr = new GaussRadauIntegrator(system, J2000, [1], [0]);
    expect(() => gr.integrateTo(J2000 + 20)).toThrow(IntegrationError);
  });

  it('misuse of the integrator is a RangeError', () => {
    const system: SecondOrderSystem = { dim: 1, errorDim: 1, accel: (_t, x, _v, out) => { out[0] = -x[0]; } };
    expect(() => new GaussRadauIntegrator(system, J2000, [1, 2], [0])).toThrow(RangeError);
    expect(() => new GaussRadauIntegrator(system, J2000, [1], [0], { epsilon: 0 })).toThrow(RangeError);
    const gr = new GaussRadauIntegrator(system, J2000, [1], [0]);
    expect(() => gr.integrateTo(J2000 + 1, [J2000 + 2], new Float64Array(2))).toThrow(/outside/);
  });
});
