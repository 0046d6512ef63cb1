// Interpolation, level crossing and minimum search on a periodic grid
// (src/core/coorbital/periodicGrid.ts). Anchors: cos φ and its exact roots and minimum
// (common practice); the four-point Lagrange error bound on the middle cell, max|t(t²−1)(t−2)|/4! · h⁴ max|f''''|
// = (3/128) h⁴ max|f''''| (the interpolation remainder; common practice).
import { describe, expect, it } from 'vitest';
import { crossLevel, interpolatePeriodic, minimiseBetween } from '../../src/core/coorbital/periodicGrid.js';
import { predictCoorbital } from '../../src/core/coorbital/predictCoorbital.js';
import { sunMassRatio } from '../../src/core/constants.js';

const N = 720;
const H = (2 * Math.PI) / N;
const COS = Float64Array.from({ length: N }, (_, j) => Math.cos(j * H));

describe('periodic grid', () => {
  it('interpolates cos φ within the four-point Lagrange bound (3/128) h⁴, across the wrap too', () => {
    let worst = 0;
    for (let k = -400; k <= 1200; k++) {
      const phi = k * 0.0123;
      worst = Math.max(worst, Math.abs(interpolatePeriodic(COS, N, phi) - Math.cos(phi)));
    }
    expect(worst).toBeLessThan(1.01 * (3 / 128) * H ** 4); // 1.36e-10; measured at the bound (cos'''' = 1 at the samples' peaks)
    expect(interpolatePeriodic(COS, N, 7 * H)).toBe(COS[7]); // grid points exactly
  });

  it('never gives a finite value inside a cell with an infinite end', () => {
    const v = Float64Array.from({ length: N }, (_, j) => (j === 0 ? Infinity : 1 + j * 1e-3));
    expect(interpolatePeriodic(v, N, 0.3 * H)).toBe(Infinity);
    expect(interpolatePeriodic(v, N, -0.3 * H)).toBe(Infinity);
    const nextCell = interpolatePeriodic(v, N, 1.5 * H); // stencil touches the infinite point: linear
    expect(nextCell).toBeCloseTo(1 + 1.5e-3, 12);
  });

  it('finds where cos φ crosses a level, and its minimum at π', () => {
    const level = 0.3;
    const root = crossLevel(COS, N, -level, Math.PI, Math.PI / 2); // cos ≤ −0.3 at π, > −0.3 at π/2
    expect(Math.abs(root - Math.acos(-level))).toBeLessThan(1e-10);
    expect(Math.abs(minimiseBetween(COS, N, 2, 4) - Math.PI)).toBeLessThan(1e-7);
  });
});

describe('arcs narrower than the grid step', () => {
  it('a libration between two grid points keeps its own centre (e = 0.5 L4 well near 87.03°)', () => {
    const mu = 1 / sunMassRatio('earth');
    const DEG = Math.PI / 180;
    const shape = { e: 0.5, iRad: 0, periRad: 0 };
    const centre = predictCoorbital(shape, 0, 87 * DEG, mu, 365.25636).centreDeg;
    const p = predictCoorbital(shape, 0, (centre + 0.02) * DEG, mu, 365.25636); // arc [c − 0.02°, c + 0.02°]: no grid point inside
    expect(p.state).toBe('tadpole-L4');
    expect(Math.abs(p.centreDeg - centre)).toBeLessThan(1e-4);
    expect(Math.abs(p.phiMaxDeg - p.phiMinDeg - 0.04)).toBeLessThan(1e-4);
  });
});
