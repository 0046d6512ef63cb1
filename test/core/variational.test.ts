// Variational equations: the state transition matrix and the partials with respect to A1, A2,
// A3 and A/m, integrated alongside the orbit, against central finite differences of whole
// integrations (common practice for checking variational equations).
// The orbit is invented (a comet-like e = 0.6 orbit through perihelion, with Jupiter and Earth
// on circular test orbits, 1PN, non-gravitational and radiation-pressure terms all on).
import { describe, expect, it } from 'vitest';
import { createTestBodyIntegrator, propagateTestBodies } from '../../src/core/propagate/propagateTestBodies.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import { GM_SUN_AU3_PER_DAY2 } from '../../src/core/constants.js';
import { CircularEphemeris } from './helpers/circularEphemeris.js';

const J2000 = 2_451_545;

describe('variational equations against finite differences', () => {
  it('6×6 state transition matrix and 6×4 parameter partials over 3 years through perihelion', () => {
    const eph = new CircularEphemeris([
      { planet: 'jupiter', aAu: 5.2026, lambda0Rad: 1.0 },
      { planet: 'earth', aAu: 1.0, lambda0Rad: 2.0 },
    ], J2000, 5000);
    const s0 = new Float64Array(6);
    semimajorElementsToState(3.0, 0.6, 0.2, 1.1, 0.7, 5.5, GM_SUN_AU3_PER_DAY2, s0);
    const params = Float64Array.of(2e-8, 3e-9, -1e-9, 0.05); // A1, A2, A3 au/day², A/m m²/kg
    const forces = { planets: ['jupiter', 'earth'] as const, ephemeris: eph, relativity: true };
    const integrator = { epsilon: 1e-11 }; // a tight tolerance: FD needs clean differences
    const tEnd = J2000 + 3 * 365.25;

    const { model, integrator: gr } = createTestBodyIntegrator(
      { epochJdTDB: J2000, states: s0, params, forces: { ...forces, variational: true }, integrator }, tEnd);
    gr.integrateTo(tEnd);
    const stm = new Float64Array(36);
    const dp = new Float64Array(24);
    model.readVariations(0, gr.x, gr.v, stm, dp);

    const run = (s: Float64Array, p: Float64Array): Float64Array => {
      const out = new Float64Array(6);
      propagateTestBodies({ epochJdTDB: J2000, states: s, params: p, forces, integrator }, tEnd, out);
      return out;
    };
    const steps = [1e-6, 1e-6, 1e-6, 1e-8, 1e-8, 1e-8]; // au, au/day
    const pSteps = [1e-9, 1e-9, 1e-9, 1e-3]; // au/day², m²/kg
    let worst = 0;
    const report: string[] = [];
    for (let j = 0; j < 10; j++) {
      let plus: Float64Array, minus: Float64Array, h: number;
      if (j < 6) {
        h = steps[j];
        const sp = Float64Array.from(s0), sm = Float64Array.from(s0);
        sp[j] += h; sm[j] -= h;
        plus = run(sp, params); minus = run(sm, params);
      } else {
        h = pSteps[j - 6];
        const pp = Float64Array.from(params), pm = Float64Array.from(params);
        pp[j - 6] += h; pm[j - 6] -= h;
        plus = run(s0, pp); minus = run(s0, pm);
      }
      let colMax = 0, colErr = 0;
      for (let i = 0; i < 6; i++) {
        const fd = (plus[i] - minus[i]) / (2 * h);
        const an = j < 6 ? stm[6 * i + j] : dp[4 * i + (j - 6)];
        colMax = Math.max(colMax, Math.abs(fd));
        colErr = Math.max(colErr, Math.abs(fd - an));
      }
      const rel = colErr / colMax;
      worst = Math.max(worst, rel);
      report.push(`${['x', 'y', 'z', 'vx', 'vy', 'vz', 'A1', 'A2', 'A3', 'A/m'][j]}: ${rel.toExponential(1)}`);
      // ~1e-6 relative: the finite differences themselves carry O(h²) and integration noise.
      expect(rel, `column ${j}`).toBeLessThan(2e-6);
    }
    console.log(`variational vs finite differences (relative, per column): ${report.join(', ')}`);
    // The partials must be meaningful, not zero: over 3 years ∂r/∂A1 is of order t²/2 ~ 1e5 au per au/day².
    expect(Math.abs(dp[0]) + Math.abs(dp[4]) + Math.abs(dp[8])).toBeGreaterThan(1);
  });
});
