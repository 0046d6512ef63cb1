// The Earth–Moon barycentre integrated as a test body in the field of the Sun, the 1PN term
// and the seven other planets from the core's VSOP87 ephemeris, against VSOP87 itself.
// Outside check: VSOP87B (Bretagnon & Francou 1988, A&A 202, 309), an analytical theory fitted
// to the numerical integration DE200; the core's ephemeris evaluates it (src/core/vsop87.ts).
//
// Expected size of the difference (why the bound is what it is): the theory is not the
// solution of our equations. It was fitted to DE200 (other masses, asteroids included, full
// relativistic N-body), it is truncated, and our initial state is its osculating state at one
// instant, so its local error at J2000 becomes a slow drift. Measured: ~100–200 km over 30 yr,
// no secular runaway. Without the 1PN term the same run drifts ~60 km/yr (the Sun's
// Schwarzschild field changes the mean motion by ~3μ/(c²a) ≈ 3e-8; checked below), and
// without the Earth–Moon mass in the central term (a test body feels G·M_sun, a planet's
// heliocentric motion G(M_sun + m): Murray & Dermott 1999 eq. 6.8) ~6 000 km/yr (measured
// while building this test, not re-run here).
// Span: 30 years, not a century, because filling the Chebyshev cache from the full series
// costs ~0.5 ms of series evaluation per day of span for these planets (test-time budget).
import { describe, expect, it } from 'vitest';
import { createEphemeris } from '../../src/core/ephemeris.js';
import { Vsop87Ephemeris } from '../../src/core/vsop87Ephemeris.js';
import { createTestBodyIntegrator } from '../../src/core/propagateTestBodies.js';
import { GM_SUN_AU3_PER_DAY2, KM_PER_AU, planetGmAu3PerDay2, type PlanetName } from '../../src/core/constants.js';

const J2000 = 2_451_545;
const YEARS = 30;
const SPAN = 365.25 * YEARS;
const PERTURBERS: PlanetName[] = ['mercury', 'venus', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune'];

describe('Earth–Moon barycentre as a test body vs VSOP87', () => {
  const eph = createEphemeris({ startJdTDB: J2000 - 1, endJdTDB: J2000 + SPAN + 1 });
  const s0 = new Float64Array(6);
  new Vsop87Ephemeris().helioState('emb', J2000, s0, 0); // initial state from the series itself
  const times = Array.from({ length: 120 }, (_, k) => J2000 + (SPAN * (k + 1)) / 120);

  function run(relativity: boolean, sunGm: number): { worstKm: number; endKm: number } {
    const { integrator } = createTestBodyIntegrator({
      epochJdTDB: J2000, states: s0, forces: { planets: PERTURBERS, ephemeris: eph, relativity, sunGm },
    }, J2000 + SPAN);
    const samples = new Float64Array(6 * times.length);
    integrator.integrateTo(J2000 + SPAN, times, samples);
    const ref = new Float64Array(6);
    let worstKm = 0, endKm = 0;
    for (let k = 0; k < times.length; k++) {
      eph.helioState('emb', times[k], ref, 0);
      const d = Math.hypot(samples[6 * k] - ref[0], samples[6 * k + 1] - ref[1], samples[6 * k + 2] - ref[2]) * KM_PER_AU;
      worstKm = Math.max(worstKm, d);
      endKm = d;
    }
    return { worstKm, endKm };
  }

  it(`${YEARS} years: drift in km, with the 1PN term and the planet's own mass`, () => {
    const full = run(true, GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2('earth'));
    console.log(`EMB vs VSOP87 over ${YEARS} yr: worst ${full.worstKm.toFixed(1)} km, at the end ${full.endKm.toFixed(1)} km`);
    expect(full.worstKm).toBeLessThan(400);
    const noPn = run(false, GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2('earth'));
    console.log(`  without 1PN: worst ${noPn.worstKm.toFixed(0)} km`);
    expect(noPn.worstKm).toBeGreaterThan(5 * full.worstKm);
  });
});
