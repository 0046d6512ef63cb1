// Force models: published constants and magnitudes, directions, and the analytic Jacobians
// the variational equations use.
// Outside checks: g(1 au) = 1 for the constants of Marsden, Sekanina & Yeomans 1973 (AJ 78,
// 211, which normalise g to 1 at 1 au); radiation pressure at 1 au = 1361 W m⁻² / c for
// A/m = 1 m²/kg, C_R = 1 (IAU 2015 Resolution B3 nominal irradiance, SI c); the thermal-drift
// law A2 (1 au / r)² (Farnocchia et al. 2013, Icarus 224, 1, eq. 3 with d = 2); the
// Schwarzschild term on a circular orbit is 3μ/(c² r) times the Newtonian pull, outward
// (IERS Conventions 2010 eq. 10.12 with r·v = 0, v² = μ/r: derived); Jacobians against
// central differences of the accelerations (common practice); the positions-only planet path
// against the helioState path of the same cache.
import { describe, expect, it } from 'vitest';
import { marsdenG, nonGravG, MSY_ALPHA } from '../../src/core/forces/nonGravLaw.js';
import { addNonGravAcceleration, NONGRAV_SCRATCH } from '../../src/core/forces/nonGrav.js';
import { addRadiationPressure, radiationPressureMPerS2, AU_PER_DAY2_PER_M_PER_S2 } from '../../src/core/forces/radiationPressure.js';
import { addSchwarzschildAcceleration } from '../../src/core/forces/relativity.js';
import { addPointMassAcceleration } from '../../src/core/forces/gravity.js';
import { TestBodyForceModel } from '../../src/core/forces/forceModel.js';
import { C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2, PLANETS } from '../../src/core/constants.js';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import type { Ephemeris } from '../../src/core/types.js';

const MU = GM_SUN_AU3_PER_DAY2;

describe('non-gravitational radial laws', () => {
  it('g(1 au) = 1 with the published Marsden–Sekanina–Yeomans constants', () => {
    const g1 = marsdenG(1);
    console.log(`g(1 au) = ${g1.toFixed(9)} (α = ${MSY_ALPHA})`);
    // α is published to 6 digits (0.111262), so g(1) = 1 to about 5e-6.
    expect(Math.abs(g1 - 1)).toBeLessThan(5e-6);
  });

  it('the water-ice law falls steeply past r0 = 2.808 au and dg/dr matches a central difference', () => {
    expect(marsdenG(2.808)).toBeLessThan(0.01); // MSY 1973: sublimation switches off near r0
    expect(marsdenG(5)).toBeLessThan(1e-3);
    const out = new Float64Array(2);
    for (const law of ['comet-water', 'inverse-square'] as const) {
      for (const r of [0.3, 1, 2.808, 4.5]) {
        nonGravG(law, r, out);
        const h = 1e-6 * r;
        const lo = new Float64Array(2), hi = new Float64Array(2);
        nonGravG(law, r - h, lo);
        nonGravG(law, r + h, hi);
        const fd = (hi[0] - lo[0]) / (2 * h);
        expect(Math.abs(out[1] - fd)).toBeLessThan(1e-7 * Math.abs(fd) + 1e-14);
      }
    }
  });

  it('thermal drift: transverse, A2 (1 au / r)², perpendicular to the radius', () => {
    const acc = new Float64Array(3);
    const s = new Float64Array(NONGRAV_SCRATCH);
    const a2 = -2.9e-14; // au/day², an invented small drift
    const r = 2.0;
    const pos = Float64Array.of(r / Math.SQRT2, r / Math.SQRT2, 0);
    const vc = Math.sqrt(MU / r);
    const vel = Float64Array.of(-vc / Math.SQRT2, vc / Math.SQRT2, 0.001);
    addNonGravAcceleration('inverse-square', 0, a2, 0, pos, vel, 0, acc, 0, null, null, null, 0, s);
    const mag = Math.hypot(acc[0], acc[1], acc[2]);
    expect(mag / (Math.abs(a2) / (r * r)) - 1).toBeCloseTo(0, 12);
    // ⟂ radius; in the orbit plane (⟂ r × v); along −v for a negative A2 on this near-circular orbit.
    expect(Math.abs(acc[0] * pos[0] + acc[1] * pos[1] + acc[2] * pos[2]) / (mag * r)).toBeLessThan(1e-14);
    const hx = pos[1] * vel[2] - pos[2] * vel[1], hy = pos[2] * vel[0] - pos[0] * vel[2], hz = pos[0] * vel[1] - pos[1] * vel[0];
    expect(Math.abs(acc[0] * hx + acc[1] * hy + acc[2] * hz) / (mag * Math.hypot(hx, hy, hz))).toBeLessThan(1e-14);
    expect(acc[0] * vel[0] + acc[1] * vel[1] + acc[2] * vel[2]).toBeLessThan(0);
  });

  it('comet A1, A2, A3 act along ê_R, ê_T, ê_N, mutually perpendicular, scaled by g(r)', () => {
    const s = new Float64Array(NONGRAV_SCRATCH);
    const pos = Float64Array.of(0.8, -0.5, 0.3);
    const vel = Float64Array.of(0.01, 0.012, -0.004);
    const dirs: Float64Array[] = [];
    for (const [a1, a2, a3] of [[1e-8, 0, 0], [0, 1e-8, 0], [0, 0, 1e-8]]) {
      const acc = new Float64Array(3);
      addNonGravAcceleration('comet-water', a1, a2, a3, pos, vel, 0, acc, 0, null, null, null, 0, s);
      const r = Math.hypot(pos[0], pos[1], pos[2]);
      expect(Math.hypot(acc[0], acc[1], acc[2]) / (1e-8 * marsdenG(r))).toBeCloseTo(1, 12);
      dirs.push(acc);
    }
    const dot = (u: Float64Array, v: Float64Array) => (u[0] * v[0] + u[1] * v[1] + u[2] * v[2]) / (Math.hypot(...u) * Math.hypot(...v));
    expect(Math.abs(dot(dirs[0], dirs[1]))).toBeLessThan(1e-14);
    expect(Math.abs(dot(dirs[0], dirs[2]))).toBeLessThan(1e-14);
    expect(Math.abs(dot(dirs[1], dirs[2]))).toBeLessThan(1e-14);
    expect(dot(dirs[0], pos)).toBeCloseTo(1, 14); // A1 > 0 pushes away from the Sun
  });
});

describe('radiation pressure', () => {
  it('A/m = 1 m²/kg, C_R = 1 at 1 au: 1361/299792458 = 4.54e-6 m/s², radial, outward', () => {
    const expected = 1361 / 299_792_458; // IAU 2015 B3 irradiance over the SI speed of light
    expect(radiationPressureMPerS2(1, 1, 1)).toBeCloseTo(expected, 18);
    expect(expected).toBeCloseTo(4.54e-6, 8);
    const acc = new Float64Array(3);
    const pos = Float64Array.of(0.6, 0.8, 0);
    addRadiationPressure(1, 1, pos, 0, acc, 0, null, null, 0);
    const mps2 = Math.hypot(acc[0], acc[1], acc[2]) / AU_PER_DAY2_PER_M_PER_S2;
    console.log(`radiation pressure at 1 au, A/m = 1 m²/kg: ${mps2.toExponential(6)} m/s²`);
    expect(Math.abs(mps2 / expected - 1)).toBeLessThan(1e-14);
    expect(acc[0] / acc[1]).toBeCloseTo(0.75, 14);
    expect(acc[0]).toBeGreaterThan(0);
    // 1/r²: at 2 au a quarter.
    expect(radiationPressureMPerS2(1, 1, 2) / expected).toBeCloseTo(0.25, 15);
  });
});

describe('post-Newtonian term', () => {
  it('on a circular orbit it is 3μ/(c² r) of the Newtonian pull, pointing outward', () => {
    const r = 1;
    const v = Math.sqrt(MU / r);
    const acc = new Float64Array(3);
    addSchwarzschildAcceleration(MU, C_AU_PER_DAY, r, 0, 0, 0, v, 0, acc, 0, null, null);
    const ratio = acc[0] / (MU / (r * r));
    const expected = (3 * MU) / (C_AU_PER_DAY ** 2 * r);
    console.log(`1PN / Newton at 1 au, circular: ${ratio.toExponential(6)} (3μ/c²r = ${expected.toExponential(6)})`);
    expect(ratio / expected - 1).toBeCloseTo(0, 13);
    expect(Math.abs(acc[1]) + Math.abs(acc[2])).toBe(0);
  });
});

describe('analytic Jacobians against central differences', () => {
  // One model with everything switched on; the body's acceleration as a function of (r, v).
  const pos0 = Float64Array.of(0.9, -0.4, 0.15);
  const vel0 = Float64Array.of(0.008, 0.015, -0.002);
  const eph = {
    name: 'fixed planet', startJdTDB: 0, endJdTDB: 1e7,
    helioState(_b: string, _t: number, out: Float64Array, o = 0) {
      out.set([1.1, -0.3, 0.02, 0, 0, 0], o); // a planet 0.2 au from the body: a strong gradient
    },
  };

  function accel(model: TestBodyForceModel, p: Float64Array, v: Float64Array): Float64Array {
    const x = new Float64Array(model.dim), vv = new Float64Array(model.dim), out = new Float64Array(model.dim);
    x.set(p); vv.set(v);
    model.accel(2_451_545, x, vv, out);
    return out.slice(0, 3);
  }

  it('gravity + 1PN + non-gravitational + radiation pressure: ∂a/∂r, ∂a/∂v, ∂a/∂p', () => {
    const params = Float64Array.of(3e-8, -2e-9, 5e-10, 0.2);
    const opts = { planets: ['jupiter'] as const, ephemeris: eph, relativity: true, variational: true };
    const model = new TestBodyForceModel(1, params, opts);
    const x = new Float64Array(model.dim), v = new Float64Array(model.dim), out = new Float64Array(model.dim);
    x.set(pos0); v.set(vel0);
    model.initialVariations(x, v);
    model.accel(2_451_545, x, v, out);
    // With unit deviations, variational accelerations are the Jacobian columns (+ ∂a/∂p).
    const plain = new TestBodyForceModel(1, params, { ...opts, variational: false });
    let worst = 0;
    for (let j = 0; j < 10; j++) {
      let fd: number[];
      if (j < 6) {
        // Velocity columns are small (1PN and non-gravitational terms only, ~1e-7 of the pull),
        // so the step is larger there to keep the difference above the rounding of a ~3e-4.
        const h = j < 3 ? 1e-6 : 1e-5;
        const pp = Float64Array.from(pos0), vp = Float64Array.from(vel0);
        const pm = Float64Array.from(pos0), vm = Float64Array.from(vel0);
        if (j < 3) { pp[j] += h; pm[j] -= h; } else { vp[j - 3] += h; vm[j - 3] -= h; }
        const ap = accel(plain, pp, vp), am = accel(plain, pm, vm);
        fd = [0, 1, 2].map((i) => (ap[i] - am[i]) / (2 * h));
      } else {
        const h = j < 9 ? 1e-9 : 1e-3;
        const pplus = Float64Array.from(params), pminus = Float64Array.from(params);
        pplus[j - 6] += h; pminus[j - 6] -= h;
        const ap = accel(new TestBodyForceModel(1, pplus, { ...opts, variational: false }), pos0, vel0);
        const am = accel(new TestBodyForceModel(1, pminus, { ...opts, variational: false }), pos0, vel0);
        fd = [0, 1, 2].map((i) => (ap[i] - am[i]) / (2 * h));
      }
      const an = [0, 1, 2].map((i) => out[3 + 3 * j + i]);
      const scale = Math.max(...fd.map(Math.abs));
      const err = Math.max(...[0, 1, 2].map((i) => Math.abs(an[i] - fd[i]))) / scale;
      worst = Math.max(worst, err);
      expect(err, `column ${j}`).toBeLessThan(1e-6);
    }
    console.log(`Jacobian columns vs central differences: worst relative difference ${worst.toExponential(2)}`);
  });

  it('the point-mass gradient is symmetric and trace-free (Laplace equation)', () => {
    const g = new Float64Array(9);
    addPointMassAcceleration(MU, 0.3, -1.2, 0.4, new Float64Array(3), 0, g);
    expect(Math.abs(g[0] + g[4] + g[8]) / Math.abs(g[0])).toBeLessThan(1e-15);
    expect(Math.abs(g[1] - g[3])).toBeLessThan(1e-15 * Math.abs(g[1]));
    expect(Math.abs(g[2] - g[6])).toBeLessThan(1e-15 * Math.abs(g[2]));
  });
});

describe('planet positions in the force model', () => {
  it('reads positions only from a cache (helioPositions), with accelerations bit for bit those from helioState', () => {
    // Reference: the same force model over an ephemeris that offers helioState alone (the
    // path every other source takes); the fast path must not move a single bit.
    const cache = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    let fast = 0;
    const counted: Ephemeris = {
      name: cache.name, startJdTDB: cache.startJdTDB, endJdTDB: cache.endJdTDB,
      helioState: (b, jd, out, o) => cache.helioState(b, jd, out, o),
      helioPositions: (b, jd, out, o, s) => { fast++; cache.helioPositions(b, jd, out, o, s); },
    };
    const plain: Ephemeris = { name: 'plain', startJdTDB: cache.startJdTDB, endJdTDB: cache.endJdTDB, helioState: (b, jd, out, o) => cache.helioState(b, jd, out, o) };
    const opts = { planets: PLANETS, relativity: true };
    const a = new TestBodyForceModel(2, null, { ...opts, ephemeris: counted });
    const b = new TestBodyForceModel(2, null, { ...opts, ephemeris: plain });
    const x = Float64Array.from([0.9, 0.4, 0.01, -1.2, 2.5, -0.1]);
    const v = Float64Array.from([-0.007, 0.015, 0.0001, -0.01, -0.005, 0.0002]);
    const outA = new Float64Array(6), outB = new Float64Array(6);
    // Ten distinct times, then the first again: more than the eight remembered, so both paths refill.
    for (const jd of [2_451_100, 2_451_100.5, 2_451_101, 2_451_102, 2_451_103, 2_451_104, 2_451_105, 2_451_106, 2_451_107, 2_451_108, 2_451_100, 2_451_108]) {
      a.accel(jd, x, v, outA);
      b.accel(jd, x, v, outB);
      expect(Array.from(outA)).toEqual(Array.from(outB));
    }
    expect(fast).toBe(11); // the last time was remembered
  });

  it('gravity-only bodies (summed in locals) get bit for bit the accelerations of the general path', () => {
    // Reference: the general path (addPointMassAcceleration, addSchwarzschildAcceleration on
    // the output array), taken with the variational equations on, whose extra terms are zero
    // for the body's own components; it must agree to the last bit with the gravity-only sum.
    const eph = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    for (const relativity of [true, false]) {
      const plain = new TestBodyForceModel(1, null, { planets: PLANETS, ephemeris: eph, relativity });
      const general = new TestBodyForceModel(1, null, { planets: PLANETS, ephemeris: eph, relativity, variational: true });
      const x = new Float64Array(general.dim), v = new Float64Array(general.dim);
      const outPlain = new Float64Array(3), outGeneral = new Float64Array(general.dim);
      for (const [jd, r] of [[2_451_100, [0.9, 0.4, 0.01]], [2_451_345.7, [-0.3, 0.2, -0.05]], [2_451_900, [5.1, -0.2, 0.1]]] as const) {
        x.set(r); v.set([-0.007, 0.015, 0.0001]);
        plain.accel(jd, x.subarray(0, 3), v.subarray(0, 3), outPlain);
        general.accel(jd, x, v, outGeneral);
        expect(Array.from(outPlain)).toEqual(Array.from(outGeneral.subarray(0, 3)));
      }
    }
  });
});
