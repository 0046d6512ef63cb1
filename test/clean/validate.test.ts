import { describe, expect, it } from 'vitest';
import { invalidReason } from '../../src/clean/validate.js';
import { DEFAULT_VALIDITY } from '../../src/clean/thresholds.js';
import { asteroidRow, cometRow } from './rowFactory.js';

const reasonOf = (o: Parameters<typeof asteroidRow>[0]) => invalidReason(asteroidRow(o), DEFAULT_VALIDITY);

// Validity rules of the conic elements are common practice: e ≥ 0, a > 0 for ellipses,
// a < 0 for hyperbolae, q > 0, angles in their ranges.
describe('validity rules', () => {
  it('accepts a well-formed asteroid row and comet row', () => {
    expect(reasonOf({})).toBeNull();
    expect(invalidReason(cometRow(), DEFAULT_VALIDITY)).toBeNull();
  });

  it.each([
    [{ e: -0.1 }, 'eccentricity -0.1 is negative'],
    [{ e: Number.NaN }, 'eccentricity is missing'],
    [{ e: Number.POSITIVE_INFINITY }, 'eccentricity is Infinity'],
    [{ aAu: -2 }, 'semimajor axis -2 not positive with e = 0.12 < 1'],
    [{ aAu: Number.NaN }, 'neither semimajor axis nor perihelion distance given'],
    [{ iDeg: 200 }, 'inclination 200 deg outside 0..180'],
    [{ nodeDeg: -1 }, 'node -1 deg outside 0..360'],
    [{ periDeg: 361 }, 'argument of perihelion 361 deg outside 0..360'],
    [{ meanAnomalyDeg: 400 }, 'mean anomaly 400 deg outside 0..360'],
    [{ epochJdTT: 2_000_000.5 }, 'epoch JD 2000000.5 outside 2378496.5..2524593.5'],
    [{ H: 40 }, 'absolute magnitude 40 outside -3..35'],
    [{ designation: '  ' }, 'no designation'],
    [{ e: 1.5 }, 'semimajor axis 2.6 positive with hyperbolic e = 1.5 (expected a < 0)'],
  ])('%o → %s', (override, reason) => {
    expect(reasonOf(override)).toBe(reason);
  });

  it('needs a mean anomaly or a perihelion time', () => {
    expect(reasonOf({ meanAnomalyDeg: Number.NaN })).toBe('neither mean anomaly nor perihelion time given');
    expect(invalidReason(cometRow({ tpJdTT: Number.NaN }), DEFAULT_VALIDITY)).toBe('neither mean anomaly nor perihelion time given');
  });

  it('accepts hyperbolic and parabolic comets given by q and tp', () => {
    expect(invalidReason(cometRow({ e: 1.0 }), DEFAULT_VALIDITY)).toBeNull();
    expect(invalidReason(cometRow({ e: 1.2 }), DEFAULT_VALIDITY)).toBeNull();
    expect(invalidReason(cometRow({ qAu: 0 }), DEFAULT_VALIDITY)).toBe('perihelion distance 0 is not positive');
  });
});

describe('fast path', () => {
  it('agrees with the rule-by-rule check on random rows (property-based)', async () => {
    const fc = (await import('fast-check')).default;
    const { ruleByRule } = await import('../../src/clean/validate.js');
    const num = fc.oneof(fc.double(), fc.double({ min: -5, max: 400, noNaN: true }), fc.constant(Number.NaN));
    fc.assert(
      fc.property(
        fc.record({ e: num, aAu: num, qAu: num, iDeg: num, nodeDeg: num, periDeg: num, meanAnomalyDeg: num, H: num,
          epochJdTT: fc.oneof(num, fc.constant(2_463_000.5)), designation: fc.oneof(fc.string(), fc.constant(' x')) }),
        (o) => {
          const row = asteroidRow(o);
          return invalidReason(row, DEFAULT_VALIDITY) === ruleByRule(row, DEFAULT_VALIDITY);
        },
      ),
      { numRuns: 5000 },
    );
  });
});
