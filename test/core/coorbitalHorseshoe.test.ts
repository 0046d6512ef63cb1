// Horseshoe width and turning point against the energy integral of the co-orbital problem in
// the circular restricted three-body problem (Murray & Dermott 1999, Solar System Dynamics,
// §3.9; equation numbers from memory): for a planar circular orbit with offset x = δa/a and
// resonant angle φ,
//   x(φ)² − x(φ′)² = (8μ/3) [R(φ′) − R(φ)],   R(φ) = 1/(2|sin(φ/2)|) − cos φ,
// so a horseshoe with offset x∞ at φ = 180° (R = 3/2) turns back where x = 0:
//   R(φ_min) = 3/2 + 3x∞²/(8μ).
// Its half-width in δa/a is greatest where R is least, at φ = ±60° (R = 1/2):
//   x_max = √(x∞² + 8μ/3);
// the tadpole/horseshoe separatrix passes through L3 with x = 0
// there (R(180°) = 3/2 = R at the separatrix: its turning point is φ = 23.9°, where R = 3/2;
// common practice). Checked: the prediction stage's turning point and its horseshoe/tadpole
// boundary, for the Earth and Jupiter mass ratios (DE430 GMs in src/core/constants.ts).
import { describe, expect, it } from 'vitest';
import { sunMassRatio } from '../../src/core/constants.js';
import { createCoorbitalWorkspace, predictCoorbital } from '../../src/core/coorbital/predictCoorbital.js';

const DEG = Math.PI / 180;
const CIRCULAR = { e: 0, iRad: 0, periRad: 0 };
const workspace = createCoorbitalWorkspace();
const PLANETS = [
  { name: 'earth', mu: 1 / sunMassRatio('earth'), periodDays: 365.25636 }, // periods from memory
  { name: 'jupiter', mu: 1 / sunMassRatio('jupiter'), periodDays: 4332.59 },
] as const;

/** R(φ) of the planar circular problem (energy integral above). */
function potential(phiRad: number): number {
  return 1 / (2 * Math.abs(Math.sin(phiRad / 2))) - Math.cos(phiRad);
}

/** φ in (0, 180°) where R(φ) = level, R decreasing there: bisection (R falls monotonically to its minimum at 60°, then rises to 3/2 at 180°). */
function turningPointDeg(level: number): number {
  let lo = 1e-9, hi = 60 * DEG; // R(lo) > level > R(60°) = 1/2 for level ≥ 3/2
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (potential(mid) > level) lo = mid; else hi = mid;
  }
  return (0.5 * (lo + hi)) / DEG;
}

describe('horseshoe turning point and width (energy integral, Murray & Dermott 1999 §3.9)', () => {
  for (const planet of PLANETS) {
    it(`φ_min of a horseshoe with offset x∞ at 180° solves R(φ_min) = 3/2 + 3x∞²/(8μ) for ${planet.name}`, () => {
      const width = Math.sqrt((8 * planet.mu) / 3); // tadpole half-width scale √(8μ/3)
      for (const factor of [0.3, 0.6, 1, 2, 4]) {
        const x = factor * width;
        const expected = turningPointDeg(1.5 + (3 * x * x) / (8 * planet.mu));
        for (const sign of [1, -1]) {
          const p = predictCoorbital(CIRCULAR, sign * x, Math.PI, planet.mu, planet.periodDays, { workspace });
          expect(p.state, `x = ${factor} √(8μ/3)`).toBe('horseshoe');
          // measured 6e-4° (0.5° φ grid, interpolated crossing); bound 10× that
          expect(Math.abs(p.phiMinDeg - expected), `x = ${factor} √(8μ/3)`).toBeLessThan(0.006);
          expect(Math.abs(p.phiMaxDeg - (360 - expected))).toBeLessThan(0.006);
          // the largest offset along the curve, at ±60°: √(x∞² + 8μ/3) (measured 1e-13 relative)
          expect(Math.abs(p.maxOffsetRel / Math.sqrt(x * x + width * width) - 1)).toBeLessThan(1e-9);
        }
      }
    });

    it(`the separatrix turns at φ = 23.9° (R = 3/2) for ${planet.name}: inside it tadpoles, outside horseshoes`, () => {
      expect(turningPointDeg(1.5)).toBeCloseTo(23.9, 1); // the classical value, common practice
      // a body at x = 0 on either side of 23.9° is a horseshoe (below) or a tadpole (above)
      expect(predictCoorbital(CIRCULAR, 0, 23 * DEG, planet.mu, planet.periodDays, { workspace }).state).toBe('horseshoe');
      expect(predictCoorbital(CIRCULAR, 0, 25 * DEG, planet.mu, planet.periodDays, { workspace }).state).toBe('tadpole-L4');
      expect(predictCoorbital(CIRCULAR, 0, -25 * DEG, planet.mu, planet.periodDays, { workspace }).state).toBe('tadpole-L5');
    });
  }
});
