import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { orbitalSpeedMPerS, toVelocitySpace, velocityDistanceMPerS } from '../../../src/detect/families/metricVelocity.js';

describe('velocity metric (Zappalà et al. 1990)', () => {
  it('n·a at 1 au is the Earth\'s mean orbital speed, 29.78 km/s', () => {
    // Common practice: Earth's mean orbital speed 29.78 km/s (circular speed at 1 au).
    expect(orbitalSpeedMPerS(1)).toBeCloseTo(29_784.7, 0);
  });

  it('the metric on a hand-worked pair', () => {
    // The published formula evaluated outside the project (Python's math module): a = 2.75 au,
    // δa = 0.01 au, δe = 0.001, δ sin i = 0.002; n·a = √(GM/a) = 17 960.845 m/s,
    // √(1.25·(0.01/2.75)² + 2e-6 + 8e-6) = 0.00515062, d = 92.5096 m/s.
    const d = velocityDistanceMPerS(2.755, 0.1, 0.1, 2.745, 0.101, 0.102, 2.75);
    expect(orbitalSpeedMPerS(2.75)).toBeCloseTo(17_960.845, 2);
    expect(d).toBeCloseTo(92.5096, 3);
  });

  it('Euclidean distance in the transformed space equals the metric', () => {
    fc.assert(
      fc.property(
        fc.tuple(fc.double({ min: 2, max: 3.5, noNaN: true }), fc.double({ min: 0, max: 0.4, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true })),
        fc.tuple(fc.double({ min: 2, max: 3.5, noNaN: true }), fc.double({ min: 0, max: 0.4, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true })),
        fc.double({ min: 2, max: 3.5, noNaN: true }),
        ([a1, e1, s1], [a2, e2, s2], aRef) => {
          const s = toVelocitySpace([a1, a2], [e1, e2], [s1, s2], aRef);
          const euclid = Math.hypot(s.xMPerS[0] - s.xMPerS[1], s.yMPerS[0] - s.yMPerS[1], s.zMPerS[0] - s.zMPerS[1]);
          const d = velocityDistanceMPerS(a1, e1, s1, a2, e2, s2, aRef);
          expect(Math.abs(euclid - d)).toBeLessThanOrEqual(1e-9 * Math.max(1, d) + 1e-9);
        },
      ),
    );
  });

  it('NaN elements give NaN coordinates; misuse is refused', () => {
    const s = toVelocitySpace([NaN], [0.1], [0.1], 2.75);
    expect(Number.isNaN(s.xMPerS[0])).toBe(true);
    expect(() => orbitalSpeedMPerS(0)).toThrow(RangeError);
    expect(() => toVelocitySpace([1, 2], [0.1], [0.1, 0.2], 2.75)).toThrow(RangeError);
  });
});
