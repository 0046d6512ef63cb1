// J2000 ecliptic ↔ ICRF equatorial rotation.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  eclipticStatesToEquatorialInPlace, eclipticToEquatorialInPlace, equatorialStatesToEclipticInPlace,
  equatorialToEclipticInPlace,
} from '../../src/core/frames/frames.js';
import { ARCSEC_PER_RAD, KM_PER_AU } from '../../src/core/constants.js';

describe('ecliptic ↔ equatorial (J2000, ε0 = 84381.406″)', () => {
  it('the ecliptic north pole is at RA 18h, Dec 90° − ε0 (IAU 2006 obliquity; common practice)', () => {
    const v = new Float64Array([0, 0, 1]);
    eclipticToEquatorialInPlace(v);
    const raDeg = (Math.atan2(v[1], v[0]) * 180) / Math.PI;
    const decArcsec = Math.asin(v[2]) * ARCSEC_PER_RAD;
    expect(raDeg).toBeCloseTo(-90, 12);
    expect(Math.abs(decArcsec - (90 * 3600 - 84381.406))).toBeLessThan(1e-6);
  });

  it('agrees with astronomy-engine Rotation_EQJ_ECL within 0.001″ (general-purpose reference library)', async () => {
    const Astronomy = await import('astronomy-engine');
    const r = Astronomy.Rotation_EQJ_ECL().rot; // equatorial J2000 → ecliptic J2000
    const v = new Float64Array(3);
    let worst = 0;
    for (let k = 0; k < 3; k++) {
      v.fill(0);
      v[k] = 1;
      equatorialToEclipticInPlace(v);
      for (let j = 0; j < 3; j++) worst = Math.max(worst, Math.abs(v[j] - r[k][j]));
    }
    console.log(`ecliptic rotation vs astronomy-engine: worst ${(worst * ARCSEC_PER_RAD).toExponential(2)}″`);
    // Both use the J2000 obliquity 84381.406″; 0.001″ leaves room only for rounding.
    expect(worst * ARCSEC_PER_RAD).toBeLessThan(0.001);
  });

  it('state round trip returns to 1e-4 km (rounding of 50 au ≈ 7.5e9 km) and preserves lengths (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 12, maxLength: 12 }), (xs) => {
        const s = Float64Array.from(xs);
        const orig = s.slice();
        eclipticStatesToEquatorialInPlace(s, 2);
        expect(Math.hypot(s[0], s[1], s[2])).toBeCloseTo(Math.hypot(orig[0], orig[1], orig[2]), 12);
        equatorialStatesToEclipticInPlace(s, 2);
        for (let k = 0; k < 12; k++) expect(Math.abs(s[k] - orig[k]) * KM_PER_AU).toBeLessThan(1e-4);
      }),
      { numRuns: 300, seed: 5 },
    );
  });

  it('refuses a buffer that is too short', () => {
    expect(() => eclipticStatesToEquatorialInPlace(new Float64Array(11), 2)).toThrow(RangeError);
  });
});
