// The averaged disturbing function of the 1:1 resonance (src/core/coorbital/averagedDisturbing.ts).
// Outside anchors: the direct + indirect disturbing function (Murray & Dermott 1999, Solar System
// Dynamics, §6.2, eqs. 6.44–6.45 — equation numbers from memory), whose average over the
// planet's longitude at e = i = 0 is 1/(2|sin(φ/2)|) − cos φ (derived; co-orbital design note
// §1.3); the values the design note tabulates from its own independent quadrature (§1.7,
// derived there, given to 3 decimals); the symmetries of the restricted circular problem
// (common practice).
import { describe, expect, it } from 'vitest';
import { createDisturbingGrid, fillAveragedDisturbing, gridPhiRad } from '../../src/core/coorbital/averagedDisturbing.js';
import { isLocalMinimum } from '../../src/core/coorbital/potentialWells.js';
import type { AveragedOrbitShape } from '../../src/core/coorbital/types.js';

const DEG = Math.PI / 180;
const N_PHI = 720;

function potential(shape: AveragedOrbitShape, planetSamples = 240, indirect = true): { v: Float64Array; d: Float64Array } {
  const grid = createDisturbingGrid(N_PHI, planetSamples);
  const v = new Float64Array(N_PHI), d = new Float64Array(N_PHI);
  fillAveragedDisturbing(shape, grid, v, { indirect, outMinDistance: d });
  return { v, d };
}

describe('averaged disturbing function R̄(φ)', () => {
  it('equals 1/(2|sin(φ/2)|) − cos φ for e = i = 0 (Murray & Dermott 1999 §6.2, eqs. 6.44–6.45 from memory; average derived)', () => {
    const grid = createDisturbingGrid(N_PHI, 240);
    const { v } = potential({ e: 0, iRad: 0, periRad: 0.7 });
    let worst = 0;
    for (let j = 1; j < N_PHI; j++) {
      const phi = gridPhiRad(grid, j);
      const closed = 1 / (2 * Math.abs(Math.sin(phi / 2))) - Math.cos(phi);
      worst = Math.max(worst, Math.abs(v[j] / closed - 1));
    }
    expect(worst).toBeLessThan(1e-12); // measured 5e-14
    expect(v[0]).toBe(Infinity); // the body sits on the planet
    expect(v[120]).toBeCloseTo(0.5, 12); // L4: R̄(60°) = 1/2
    expect(v[360]).toBeCloseTo(1.5, 12); // L3: R̄(180°) = 3/2
  });

  it('has minima at ±60° only with the indirect term (design note §1.3: the direct part alone decreases to 180°)', () => {
    const withTerm = potential({ e: 0, iRad: 0, periRad: 0 }).v;
    expect(isLocalMinimum(withTerm, N_PHI, 120)).toBe(true); // 60°
    expect(isLocalMinimum(withTerm, N_PHI, 600)).toBe(true); // −60°
    const direct = potential({ e: 0, iRad: 0, periRad: 0 }, 240, false).v;
    for (let j = 1; j < 360; j++) expect(direct[j + 1]).toBeLessThan(direct[j]); // 1/(2 sin(φ/2)): no minimum before 180°
  });

  it('matches the design note §1.7 quadrature (derived there, N = 4000, 3 decimals)', () => {
    const planar = potential({ e: 0.1, iRad: 0, periRad: 1.0, nodeRad: 0.3 }).v;
    const inclined = potential({ e: 0.1, iRad: 10 * DEG, periRad: 1.0, nodeRad: 0.3 }).v;
    const at = (v: Float64Array, deg: number): number => v[Math.round(deg * 2)];
    const table: [number, number, number][] = [[0, 5.868, 4.177], [20, 2.474, 2.13], [30, 1.204, 1.14], [60, 0.517, 0.516], [180, 1.496, 1.489], [330, 1.204, 1.154]];
    for (const [deg, p, i] of table) {
      expect(Math.abs(at(planar, deg) - p)).toBeLessThan(6e-4);
      expect(Math.abs(at(inclined, deg) - i)).toBeLessThan(6e-4);
    }
  });

  it('does not depend on the node Ω (circular planet in the reference plane; common practice)', () => {
    const a = potential({ e: 0.3, iRad: 20 * DEG, periRad: 1.0, nodeRad: 0 });
    const b = potential({ e: 0.3, iRad: 20 * DEG, periRad: 1.0, nodeRad: 2.1 });
    let worst = 0;
    for (let j = 0; j < N_PHI; j++) if (a.d[j] > 0.05) worst = Math.max(worst, Math.abs(b.v[j] / a.v[j] - 1));
    expect(worst).toBeLessThan(1e-11); // measured ~1e-15
    // a wrong mean anomaly (M = λ_P + φ − ω, Ω left out) would shift the curve by Ω: check it is sensitive
    const shifted = potential({ e: 0.3, iRad: 20 * DEG, periRad: 1.0 + 2.1, nodeRad: 0 });
    expect(Math.abs(shifted.v[60] / a.v[60] - 1)).toBeGreaterThan(1e-3);
  });

  it('is even in φ for planar orbits and not for inclined ones with general ω (design note §1.3)', () => {
    const planar = potential({ e: 0.1, iRad: 0, periRad: 1.0 });
    let worst = 0;
    for (let j = 1; j < N_PHI; j++) if (planar.d[j] > 0.05) worst = Math.max(worst, Math.abs(planar.v[N_PHI - j] / planar.v[j] - 1));
    expect(worst).toBeLessThan(1e-11);
    const inclined = potential({ e: 0.1, iRad: 10 * DEG, periRad: 57 * DEG }).v;
    expect(inclined[660] - inclined[60]).toBeGreaterThan(0.01); // R̄(330°) = 1.154 vs R̄(30°) = 1.140 (note §1.3)
  });

  it('is mirrored by ω → 180° − ω: R̄(φ; e, i, ω) = R̄(−φ; e, i, 180° − ω) (derived: reflection x → −x with M → −M)', () => {
    for (const [e, iDeg, periDeg] of [[0.1, 10, 57], [0.3, 35, 20], [0.6, 5, 140]]) {
      const a = potential({ e, iRad: iDeg * DEG, periRad: periDeg * DEG });
      const b = potential({ e, iRad: iDeg * DEG, periRad: (180 - periDeg) * DEG });
      let worst = 0;
      for (let j = 1; j < N_PHI; j++) if (a.d[j] > 0.05) worst = Math.max(worst, Math.abs(b.v[N_PHI - j] / a.v[j] - 1));
      expect(worst).toBeLessThan(1e-11); // measured ~1e-15
    }
  });

  it('has converged in the planet longitude at the default 240 samples away from close approaches', () => {
    // [shape, least distance d (a_P) beyond which the check applies, bound]; measured against 2880
    // samples: 4e-15 for e ≤ 0.4 at d > 0.03; at e = 0.7 9e-6 at d > 0.03 and 5e-15 at d > 0.1.
    const cases: [AveragedOrbitShape, number, number][] = [
      [{ e: 0.05, iRad: 2 * DEG, periRad: 0.4 }, 0.03, 1e-12],
      [{ e: 0.3, iRad: 0, periRad: 1 }, 0.03, 1e-10],
      [{ e: 0.4, iRad: 25 * DEG, periRad: 2.5 }, 0.03, 1e-12],
      [{ e: 0.7, iRad: 5 * DEG, periRad: 4 }, 0.03, 1e-4],
      [{ e: 0.7, iRad: 5 * DEG, periRad: 4 }, 0.1, 1e-12],
    ];
    for (const [shape, dMin, bound] of cases) {
      const coarse = potential(shape, 240), fine = potential(shape, 2880);
      let worst = 0;
      for (let j = 0; j < N_PHI; j++) if (fine.d[j] > dMin) worst = Math.max(worst, Math.abs(coarse.v[j] / fine.v[j] - 1));
      expect(worst).toBeLessThan(bound);
    }
  });

  it('rejects bad shapes and grids', () => {
    const grid = createDisturbingGrid(N_PHI, 240);
    const v = new Float64Array(N_PHI);
    expect(() => fillAveragedDisturbing({ e: 1, iRad: 0, periRad: 0 }, grid, v)).toThrow(RangeError);
    expect(() => fillAveragedDisturbing({ e: 0.1, iRad: NaN, periRad: 0 }, grid, v)).toThrow(RangeError);
    expect(() => fillAveragedDisturbing({ e: 0.1, iRad: 0, periRad: 0 }, grid, new Float64Array(10))).toThrow(RangeError);
    expect(() => createDisturbingGrid(720, 500)).toThrow(/one must divide the other/);
  });
});
