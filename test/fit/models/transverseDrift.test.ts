// A2 → da/dt: against a published pair for (101955) Bennu, and against a numerical integration
// of the thermal law with the project's integrator (independent of the averaged formula).
import { describe, expect, it } from 'vitest';
import { GAUSS_K, GM_SUN_AU3_PER_DAY2 } from '../../../src/core/constants.js';
import { semimajorFromState } from '../../../src/core/orbit/stateToElements.js';
import { semimajorElementsToState } from '../../../src/core/orbit/twoBody.js';
import { propagateTestBodies } from '../../../src/core/propagate/propagateTestBodies.js';
import {
  a2FromDriftAuPerMyr, driftAuPerDayFromA2, driftAuPerMyrFromA2, driftMPerYrFromA2,
} from '../../../src/fit/models/transverseDrift.js';

// Bennu's osculating a and e at 2011 Jan 1.0 TDB of the published orbit.
const A_AU = 1.12639;
const E = 0.20375;

describe('A2 → da/dt, (101955) Bennu', () => {
  // Chesley et al. 2014, Icarus 235, 5: da/dt = (−19.0 ± 0.1) × 10⁻⁴ au/Myr = 284 ± 1.5 m/yr
  // (abstract), from A2 = (−4.618 ± 0.024) × 10⁻¹⁴ au/d² (their table; value from memory).
  // Measured: −19.28 × 10⁻⁴ au/Myr, 1.5% above; the paper's drift is averaged over the
  // perturbed orbit and the A2 value is recalled, so the bound is 2.5%, not the paper's 0.5%.
  it('matches the published drift to 2.5%', () => {
    const drift = driftAuPerMyrFromA2(-4.618e-14, A_AU, E);
    console.log(`Bennu: da/dt = ${(drift * 1e4).toFixed(2)}e-4 au/Myr (published −19.0e-4)`);
    expect(drift).toBeLessThan(0);
    expect(Math.abs(drift / -19.0e-4 - 1)).toBeLessThan(0.025);
    expect(Math.abs(driftMPerYrFromA2(-4.618e-14, A_AU, E) / -284 - 1)).toBeLessThan(0.025);
  });
  it('the paper\'s two units agree with ours: 19.0e-4 au/Myr ↔ 284 m/yr (to the paper\'s rounding, 0.2%)', () => {
    const a2 = a2FromDriftAuPerMyr(-19.0e-4, A_AU, E);
    expect(Math.abs(driftMPerYrFromA2(a2, A_AU, E) / -284 - 1)).toBeLessThan(0.002);
    expect(driftAuPerMyrFromA2(a2, A_AU, E)).toBeCloseTo(-19.0e-4, 15);
  });
});

describe('A2 → da/dt against numerical integration', () => {
  // The core's force model with the inverse-square transverse law, Sun only, over 10 periods;
  // osculating a compared at the same mean anomaly. Measured agreement 2.5e-6, 3.8e-7, 1.4e-6
  // (relative); bound 2e-5 (the short-period terms of order A2 do not cancel exactly).
  const cases: [number, number][] = [[A_AU, E], [2.5, 0.6], [0.8, 0.05]];
  for (const [a, e] of cases) {
    it(`a = ${a} au, e = ${e}`, () => {
      const s = new Float64Array(6);
      semimajorElementsToState(a, e, 0.1, 0.3, 1.1, 0.7, GM_SUN_AU3_PER_DAY2, s);
      const a2 = 1e-11;
      const periodDays = (2 * Math.PI) / (GAUSS_K / a ** 1.5);
      const out = new Float64Array(6);
      propagateTestBodies({ epochJdTDB: 2451545, states: s, params: Float64Array.from([0, a2, 0, 0]), forces: { nonGravLaw: 'inverse-square' } },
        2451545 + 10 * periodDays, out);
      const numerical = (semimajorFromState(out).aAu - a) / (10 * periodDays);
      const rel = numerical / driftAuPerDayFromA2(a2, a, e) - 1;
      expect(Math.abs(rel)).toBeLessThan(2e-5);
    });
  }
});

describe('transverse drift: misuse', () => {
  it('refuses e ≥ 1 and a ≤ 0', () => {
    expect(() => driftAuPerDayFromA2(1e-14, 1, 1)).toThrow(RangeError);
    expect(() => driftAuPerDayFromA2(1e-14, -1, 0.1)).toThrow(RangeError);
  });
});
