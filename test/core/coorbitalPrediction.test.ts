// The prediction stage of the co-orbital detector (src/core/coorbital/predictCoorbital.ts and
// the files it calls). Outside anchors, each named at its check:
// - small-amplitude tadpole period 2π/(n_P √(27μ/4)): the linear stability of L4/L5 in the
//   restricted three-body problem (Murray & Dermott 1999, Solar System Dynamics, ch. 3; section
//   and equation numbers from memory);
// - largest tadpole half-width √(8μ/3) in δa/a (Murray & Dermott 1999 ch. 3, from memory;
//   derived in the co-orbital design note §2.2);
// - far-field horseshoe period (4/3) P/|x∞| (derived, design note §2.3 eq. 7) and the synodic
//   period (2/3) P/|x| of a circulating body (Kepler's third law; common practice);
// - the quasi-satellite epicycle condition (x/e)² + (φ/2e)² < 1 (derived, design note §3.2 eq. 9);
// - the design note's horseshoe table (§2.3, its own independent quadrature, derived there).
// Mass ratios are the project's DE430 GMs (src/core/constants.ts).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sunMassRatio } from '../../src/core/constants.js';
import { createCoorbitalWorkspace, hillRadiusRel, predictCoorbital } from '../../src/core/coorbital/predictCoorbital.js';
import { createDisturbingGrid, fillAveragedDisturbing } from '../../src/core/coorbital/averagedDisturbing.js';
import { isLocalMaximum } from '../../src/core/coorbital/potentialWells.js';
import type { AveragedOrbitShape } from '../../src/core/coorbital/types.js';

const DEG = Math.PI / 180;
const DAYS_PER_YEAR = 365.25;
// Sidereal orbital periods in days (from memory); the checks below are ratios to these.
const PLANETS = [
  { name: 'earth', mu: 1 / sunMassRatio('earth'), periodDays: 365.25636 },
  { name: 'jupiter', mu: 1 / sunMassRatio('jupiter'), periodDays: 4332.59 },
] as const;
const CIRCULAR: AveragedOrbitShape = { e: 0, iRad: 0, periRad: 0 };
const EARTH = PLANETS[0];
const workspace = createCoorbitalWorkspace();

function predict(shape: AveragedOrbitShape, x0: number, phi0Deg: number, planet: { mu: number; periodDays: number } = EARTH) {
  return predictCoorbital(shape, x0, phi0Deg * DEG, planet.mu, planet.periodDays, { workspace });
}

describe('tadpoles', () => {
  for (const planet of PLANETS) {
    it(`small-amplitude period → 2π/(n √(27μ/4)) for ${planet.name} (Murray & Dermott 1999 ch. 3, from memory)`, () => {
      const linearYears = planet.periodDays / Math.sqrt((27 * planet.mu) / 4) / DAYS_PER_YEAR; // 2π/n = P
      const halfWidth = Math.sqrt((8 * planet.mu) / 3);
      for (const [phi0, state] of [[60, 'tadpole-L4'], [-60, 'tadpole-L5']] as const) {
        const p = predict(CIRCULAR, 0.01 * halfWidth, phi0, planet); // amplitude ≈ 0.5°
        expect(p.state).toBe(state);
        expect(Math.abs(p.centreDeg - phi0)).toBeLessThan(0.01);
        expect(Math.abs(p.periodYears / linearYears - 1)).toBeLessThan(1e-3); // measured 1.8e-5 (amplitude term)
        expect(p.phiMinDeg).toBeLessThan(phi0);
        expect(p.phiMaxDeg).toBeGreaterThan(phi0);
      }
    });

    it(`at the bottom of the well (x0 = 0, φ0 = ±60°) the period is the linear one for ${planet.name} (Murray & Dermott 1999 ch. 3, from memory)`, () => {
      const linearYears = planet.periodDays / Math.sqrt((27 * planet.mu) / 4) / DAYS_PER_YEAR;
      for (const phi0 of [60, -60]) {
        const p = predict(CIRCULAR, 0, phi0, planet);
        expect(Math.abs(p.periodYears / linearYears - 1)).toBeLessThan(1e-4); // O(h²) curvature
        expect(p.separatrixMargin).toBeCloseTo(1, 9);
      }
    });

    it(`largest tadpole half-width is √(8μ/3) for ${planet.name} (Murray & Dermott 1999 ch. 3, from memory)`, () => {
      const halfWidth = Math.sqrt((8 * planet.mu) / 3);
      for (const [phi0, state] of [[60, 'tadpole-L4'], [-60, 'tadpole-L5']] as const) {
        const inside = predict(CIRCULAR, 0.999 * halfWidth, phi0, planet);
        expect(inside.state).toBe(state);
        expect(Math.abs(inside.maxOffsetRel / halfWidth - 1)).toBeLessThan(2e-3);
        expect(inside.separatrixMargin).toBeLessThan(0.01); // just inside the L3 separatrix
        const outside = predict(CIRCULAR, 1.001 * halfWidth, phi0, planet);
        expect(outside.state).toBe('horseshoe');
        expect(outside.separatrixMargin).toBeLessThan(0.01); // just outside it
        expect(Math.abs(Math.sin(outside.centreDeg * DEG))).toBeLessThan(1e-9); // the horseshoe's middle, 180°
      }
    });
  }

  it('are classified by the half-plane of the centre, not by ±60°: at e = 0.5 the centres sit near ±87°', () => {
    for (const sign of [1, -1]) {
      const p = predict({ e: 0.5, iRad: 0, periRad: 0 }, 1e-5, sign * 87);
      expect(p.state).toBe(sign > 0 ? 'tadpole-L4' : 'tadpole-L5');
      expect(Math.abs(p.centreDeg - sign * 87)).toBeLessThan(1);
    }
  });
});

describe('horseshoes', () => {
  for (const planet of PLANETS) {
    it(`far-field period → (4/3) P/|x∞| for ${planet.name} (derived, design note eq. 7), within 1 %`, () => {
      const halfWidth = Math.sqrt((8 * planet.mu) / 3);
      for (const factor of [6, 8, 12]) {
        const x = factor * halfWidth;
        for (const sign of [1, -1]) {
          const p = predict(CIRCULAR, sign * x, 180, planet);
          expect(p.state).toBe('horseshoe');
          expect(Math.abs(p.periodYears / (((4 / 3) * planet.periodDays) / x / DAYS_PER_YEAR) - 1)).toBeLessThan(0.01);
        }
      }
    });
  }

  it('turning points and periods match the design note table (§2.3, derived there)', () => {
    const table: [number, number, number][] = [[0.001, 22.65, 620.8], [0.002, 19.62, 454.2], [0.005, 10.31, 245.9], [0.01, 3.86, 132.2]];
    for (const [x, phiMinDeg, periodYears] of table) {
      const p = predict(CIRCULAR, x, 180);
      expect(Math.abs(p.phiMinDeg - phiMinDeg)).toBeLessThan(0.01);
      expect(Math.abs(p.phiMaxDeg - (360 - phiMinDeg))).toBeLessThan(0.01);
      expect(Math.abs(p.periodYears - periodYears)).toBeLessThan(0.1);
      expect(Math.abs(Math.sin(p.centreDeg * DEG))).toBeLessThan(1e-9); // 180° (or −180° by rounding)
      expect(Math.cos(p.centreDeg * DEG)).toBeLessThan(0);
    }
  });

  it('flags a close approach when the turning point is within 3 Hill radii (distance 2 sin(φmin/2) a_P; common practice)', () => {
    const rHill = hillRadiusRel(EARTH.mu);
    for (const x of [0.01, 0.02]) {
      const p = predict(CIRCULAR, x, 180);
      const chord = 2 * Math.sin((p.phiMinDeg * DEG) / 2) / rHill;
      expect(Math.abs(p.minDistanceHill / chord - 1)).toBeLessThan(1e-3);
      expect(p.closeApproach).toBe(chord < 3);
    }
    expect(predict(CIRCULAR, 0.01, 180).closeApproach).toBe(false); // 6.7 r_H (design note §2.3)
    expect(predict(CIRCULAR, 0.02, 180).closeApproach).toBe(true);
  });
});

describe('quasi-satellites', () => {
  it('the well at φ = 0 exists for e = 0.1 and not for e = 0 (design note §1.4, §1.7)', () => {
    const qs = predict({ e: 0.1, iRad: 0, periRad: 1 }, 0, 0);
    expect(qs.state).toBe('quasi-satellite');
    expect(Math.abs(qs.centreDeg)).toBeLessThan(0.01);
    expect(predict(CIRCULAR, 0, 5).state).toBe('horseshoe');
    const onPlanet = predict(CIRCULAR, 0, 0); // e = i = 0, φ0 = 0: the body sits on the planet, V = ∞
    expect(onPlanet.state).not.toBe('quasi-satellite');
    expect(onPlanet.closeApproach).toBe(true);
  });

  it('a well off φ = 0 between the barrier peaks is a quasi-satellite (inclined, ω = 40°: centre near +2°)', () => {
    const p = predict({ e: 0.2, iRad: 15 * DEG, periRad: 40 * DEG }, 1e-5, 2);
    expect(p.state).toBe('quasi-satellite');
    expect(p.centreDeg).toBeGreaterThan(0.5);
    expect(p.centreDeg).toBeLessThan(5);
  });

  it('φ0 = 5°, x0 = 0 is a quasi-satellite where the epicycle holds the planet, (φ/2e)² < 1 (derived, note eq. 9)', () => {
    for (const e of [0, 0.02, 0.03, 0.06, 0.1, 0.2]) {
      const inside = (5 * DEG) / (2 * e) < 1; // e > 0.0436
      const p = predict({ e, iRad: 0, periRad: 1 }, 0, 5);
      expect(p.state === 'quasi-satellite').toBe(inside);
    }
  });
});

describe('compound and passing orbits', () => {
  // e = 0.1, i = 10°, ω = 57°: the barrier peaks around φ = 0 have unequal heights (design note §1.3)
  const shape: AveragedOrbitShape = { e: 0.1, iRad: 10 * DEG, periRad: 57 * DEG };
  function peaks(): [number, number, number] {
    const grid = createDisturbingGrid(720, 240);
    const v = new Float64Array(720);
    fillAveragedDisturbing(shape, grid, v);
    let up = 1, down = 719;
    while (!isLocalMaximum(v, 720, up)) up++;
    while (!isLocalMaximum(v, 720, down)) down--;
    return [v[0], v[up], v[down]];
  }

  it('a level between the two barrier peaks gives compound (quasi-satellite + horseshoe)', () => {
    const [v0, vUp, vDown] = peaks();
    expect(Math.abs(vUp - vDown)).toBeGreaterThan(0.1); // unequal: 4.63 and 5.08
    const level = 0.5 * (vUp + vDown);
    const x0 = Math.sqrt(((8 / 3) * EARTH.mu * (level - v0)));
    const p = predict(shape, x0, 0);
    expect(p.state).toBe('compound');
    expect(p.compoundWith).toBe('horseshoe');
    expect(p.phiMinDeg).toBeLessThan(0);
    expect(p.phiMaxDeg).toBeGreaterThan(300);
    // below both peaks: quasi-satellite; above both: passing
    expect(predict(shape, Math.sqrt((8 / 3) * EARTH.mu * (Math.min(vUp, vDown) - 0.1 - v0)), 0).state).toBe('quasi-satellite');
    expect(predict(shape, Math.sqrt((8 / 3) * EARTH.mu * (Math.max(vUp, vDown) + 0.1 - v0)), 0).state).toBe('passing');
  });

  it('a level above the lower barrier peak but below L3 gives compound (quasi-satellite + tadpole), on the side of that peak', () => {
    // e = 0.2, i = 40°: barrier peaks 1.215 and 1.555 around V(0) = 1.079, L3 maximum 1.383; ω → 180° − ω swaps the peaks
    for (const [periDeg, side] of [[60, 'tadpole-L4'], [120, 'tadpole-L5']] as const) {
      const p = predict({ e: 0.2, iRad: 40 * DEG, periRad: periDeg * DEG }, Math.sqrt((8 / 3) * EARTH.mu * (1.3 - 1.079)), 0);
      expect(p.state).toBe('compound');
      expect(p.compoundWith).toBe(side);
      expect(p.phiMinDeg).toBeLessThan(0);
      expect(p.phiMaxDeg).toBeGreaterThan(0);
    }
  });

  it('a passing orbit far from the planet circulates with the synodic period (2/3) P/|x| (common practice)', () => {
    const x = 0.1;
    const p = predict(shape, x, 0);
    expect(p.state).toBe('passing');
    expect(Math.abs(p.periodYears / (((2 / 3) * EARTH.periodDays) / x / DAYS_PER_YEAR) - 1)).toBeLessThan(0.01);
    expect(p.centreDeg).toBeNaN();
    expect(p.separatrixMargin).toBeGreaterThan(0.9); // far above the barrier peaks (~5) at L ≈ 1240
  });
});

describe('mirror symmetry', () => {
  // (x0, φ0, ω) and (x0, −φ0, 180° − ω) see the mirrored potential (derived; see
  // coorbitalDisturbing.test.ts), so their predictions are mirror images: L4 ↔ L5, same period.
  const MIRROR: Record<string, string> = { 'tadpole-L4': 'tadpole-L5', 'tadpole-L5': 'tadpole-L4' };
  it('mirrored bodies get mirrored states, arcs and equal periods (synthetic Earth candidates)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.6, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }), fc.double({ min: -0.015, max: 0.015, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        (e, iDeg, periDeg, x0, phi0Deg) => {
          const a = predict({ e, iRad: iDeg * DEG, periRad: periDeg * DEG }, x0, phi0Deg);
          const b = predict({ e, iRad: iDeg * DEG, periRad: (180 - periDeg) * DEG }, x0, -phi0Deg);
          if (a.separatrixMargin < 1e-9 || b.separatrixMargin < 1e-9) return; // on a separatrix rounding picks the side
          expect(b.state).toBe(MIRROR[a.state] ?? a.state);
          expect(b.compoundWith).toBe(MIRROR[a.compoundWith] ?? a.compoundWith);
          expect(b.closeApproach).toBe(a.closeApproach);
          if (a.closeApproach) return; // at the planet itself (e = i = φ0 = 0) the level is ~1e16 and rounding rules
          // near a separatrix the period diverges (logarithmically) and the last digits of L decide it
          if (!(a.separatrixMargin < 1e-6)) expect(Math.abs(b.periodYears / a.periodYears - 1)).toBeLessThan(1e-6);
          if (a.state !== 'passing') expect(Math.abs(Math.sin((b.phiMaxDeg + a.phiMinDeg) * DEG))).toBeLessThan(1e-6);
        },
      ),
      { numRuns: 200, seed: 44 },
    );
  });
});

describe('predictCoorbital inputs', () => {
  it('rejects a bad mass ratio, offset or period with RangeError', () => {
    expect(() => predictCoorbital(CIRCULAR, 0, 1, 0, 365)).toThrow(RangeError);
    expect(() => predictCoorbital(CIRCULAR, NaN, 1, 3e-6, 365)).toThrow(RangeError);
    expect(() => predictCoorbital(CIRCULAR, 0.001, 1, 3e-6, -1)).toThrow(RangeError);
  });

  it('gives the same answer for φ0 and φ0 + 360° and does not change its inputs', () => {
    const shape = Object.freeze({ e: 0.2, iRad: 5 * DEG, periRad: 2 });
    expect(predict(shape, 0.003, 70)).toEqual(predict(shape, 0.003, 430));
  });
});
