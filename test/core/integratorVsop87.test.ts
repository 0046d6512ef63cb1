// Planets integrated as test bodies in the field of the Sun, its 1PN term and the other
// planets from the core's VSOP87 ephemeris, against VSOP87 itself over a century.
// Outside check: VSOP87B (Bretagnon & Francou 1988, A&A 202, 309), an analytical theory fitted
// to the numerical integration DE200; the core's ephemeris evaluates it (src/core/ephemeris/vsop87.ts).
//
// What is compared, and the expected size. The theory is not the solution of our equations:
// it is truncated (its authors quote 1″ over four millennia for the inner planets, so errors
// of ~1e-7 rad in a given century are within its budget), it was fitted to DE200 (other
// masses, asteroids, full N-body relativity), and a planet's heliocentric equation has
// G(M_sun + m) as central term (Murray & Dermott 1999, eq. 6.8; set through sunGm).
//  1. Started from the series' osculating state at one instant, the run inherits the series'
//     local error there (~1e-7 of the velocity): a drift of 50–250 km/yr that depends on the
//     start date (measured while building this test for starts spread over ten years).
//  2. So the honest comparison fits the six initial conditions to the series' positions over
//     the whole century (least squares through the state transition matrix of the variational
//     equations) and reports what no initial state can absorb: the dynamical mismatch. That is
//     what is asserted, with the post-fit worst residual printed in km. Measured: Mars 23 km,
//     the Earth–Moon barycentre 80 km (its series adds a lunar theory's offset to the Earth's).
import { describe, expect, it } from 'vitest';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { createTestBodyIntegrator } from '../../src/core/propagate/propagateTestBodies.js';
import { GM_SUN_AU3_PER_DAY2, KM_PER_AU, PLANETS, planetGmAu3PerDay2, type PlanetName } from '../../src/core/constants.js';
import type { EphemerisBody } from '../../src/core/types.js';

const J2000 = 2_451_545;
const YEARS = 100;
const SPAN = 365.25 * YEARS;
const N_SAMPLES = 400;
const eph = createEphemeris({ startJdTDB: J2000 - 1, endJdTDB: J2000 + SPAN + 1 });
const times = Array.from({ length: N_SAMPLES }, (_, k) => J2000 + (SPAN * (k + 1)) / N_SAMPLES);

interface Run { worstKm: number; endKm: number; partials: Float64Array; residuals: Float64Array }

/** Integrate `body` from state s0 with variational equations; residuals vs the series at the samples. */
function run(body: EphemerisBody, planet: PlanetName, s0: Float64Array, relativity: boolean): Run {
  const perturbers = PLANETS.filter((p) => p !== planet);
  const { model, integrator } = createTestBodyIntegrator({
    epochJdTDB: J2000, states: s0,
    forces: { planets: perturbers, ephemeris: eph, relativity, variational: true, sunGm: GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2(planet) },
  }, J2000 + SPAN);
  const dim = model.dim;
  const samples = new Float64Array(2 * dim * N_SAMPLES);
  integrator.integrateTo(J2000 + SPAN, times, samples);
  const ref = new Float64Array(6);
  const stm = new Float64Array(36);
  const residuals = new Float64Array(3 * N_SAMPLES);
  const partials = new Float64Array(18 * N_SAMPLES); // ∂r(t)/∂(r0, v0), 3×6 per sample
  let worstKm = 0, endKm = 0;
  for (let k = 0; k < N_SAMPLES; k++) {
    const o = 2 * dim * k;
    eph.helioState(body, times[k], ref, 0);
    for (let i = 0; i < 3; i++) residuals[3 * k + i] = ref[i] - samples[o + i];
    const d = Math.hypot(residuals[3 * k], residuals[3 * k + 1], residuals[3 * k + 2]) * KM_PER_AU;
    worstKm = Math.max(worstKm, d);
    endKm = d;
    model.readVariations(0, samples.subarray(o, o + dim), samples.subarray(o + dim, o + 2 * dim), stm, null);
    partials.set(stm.subarray(0, 18), 18 * k);
  }
  return { worstKm, endKm, partials, residuals };
}

/** One Gauss–Newton correction of the initial state (normal equations, columns scaled). */
function correct(s0: Float64Array, r: Run): Float64Array {
  const scale = [1, 1, 1, SPAN, SPAN, SPAN]; // velocity columns carry a factor of time
  const n = new Float64Array(36), b = new Float64Array(6);
  for (let k = 0; k < N_SAMPLES; k++) {
    for (let i = 0; i < 3; i++) {
      const row = 18 * k + 6 * i;
      for (let p = 0; p < 6; p++) {
        const jp = r.partials[row + p] * scale[p];
        b[p] += jp * r.residuals[3 * k + i];
        for (let q = 0; q < 6; q++) n[6 * p + q] += jp * r.partials[row + q] * scale[q];
      }
    }
  }
  // Gaussian elimination with partial pivoting (common practice) on the 6×6 system.
  const a = Array.from({ length: 6 }, (_, p) => [...n.subarray(6 * p, 6 * p + 6), b[p]]);
  for (let c = 0; c < 6; c++) {
    let piv = c;
    for (let rr = c + 1; rr < 6; rr++) if (Math.abs(a[rr][c]) > Math.abs(a[piv][c])) piv = rr;
    [a[c], a[piv]] = [a[piv], a[c]];
    for (let rr = c + 1; rr < 6; rr++) {
      const f = a[rr][c] / a[c][c];
      for (let q = c; q < 7; q++) a[rr][q] -= f * a[c][q];
    }
  }
  const x = new Array(6).fill(0);
  for (let c = 5; c >= 0; c--) {
    let s = a[c][6];
    for (let q = c + 1; q < 6; q++) s -= a[c][q] * x[q];
    x[c] = s / a[c][c];
  }
  return Float64Array.from(s0, (v, p) => v + x[p] * scale[p]);
}

describe('planets as test bodies vs VSOP87 over a century', () => {
  for (const [body, planet, boundKm] of [['emb', 'earth', 150], ['mars', 'mars', 60]] as const) {
    it(`${body}: drift from the series' own state, then the post-fit residual in km`, () => {
      let s0 = new Float64Array(6);
      new Vsop87Ephemeris().helioState(body, J2000, s0, 0);
      const first = run(body, planet, s0, true);
      s0 = correct(s0, first);
      const second = run(body, planet, s0, true);
      s0 = correct(s0, second);
      const fitted = run(body, planet, s0, true);
      const noPn = run(body, planet, s0, false);
      console.log(`${body} vs VSOP87, ${YEARS} yr: from the series' state worst ${first.worstKm.toFixed(0)} km; `
        + `fitted initial state worst ${fitted.worstKm.toFixed(1)} km (end ${fitted.endKm.toFixed(1)} km); `
        + `same without 1PN ${noPn.worstKm.toFixed(0)} km`);
      // Post-fit: the dynamical mismatch only. Bound set from the measured value with margin
      // (see the file comment for why it is not zero).
      expect(fitted.worstKm).toBeLessThan(boundKm);
      // The fit converged (a further correction changes nothing visible).
      expect(fitted.worstKm).toBeLessThanOrEqual(second.worstKm * 1.01 + 0.1);
      // The 1PN term is resolved: without it the fitted state cannot follow the series.
      expect(noPn.worstKm).toBeGreaterThan(5 * fitted.worstKm);
    });
  }
});
