// The resonant angle φ = λ − λ_P (src/core/coorbital/resonantAngle.ts). Outside facts:
//  - the mean longitude λ = ϖ + M, with M = n (t − τ) in two-body motion, so λ advances
//    uniformly at the mean motion n = √(μ/a³) (Murray & Dermott 1999, §2.4–2.9 — sections
//    from memory; common practice);
//  - Lagrange's equilateral solution: a body at L4 leads the planet by 60° in mean longitude,
//    at L5 trails by 60° (Morais 2001, A&A 369, 677, footnote "at L4 (or L5) … λ − λ1 = +60°
//    (or −60°)", as quoted in the design note on the co-orbital detector).
import { describe, expect, it } from 'vitest';
import {
  meanLongitudeRad, planetKeplerGmAu3PerDay2, resonantAngleRad, unwrapAnglesInPlace,
} from '../../src/core/coorbital/resonantAngle.js';
import { turnedAboutOrbitNormal } from '../../src/core/coorbital/triangularPoint.js';
import { GM_SUN_AU3_PER_DAY2 } from '../../src/core/constants.js';
import { wrapPi } from '../../src/core/math.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';

const MU = GM_SUN_AU3_PER_DAY2;
const DEG = Math.PI / 180;

describe('mean longitude and resonant angle', () => {
  it('λ advances at the mean motion along an eccentric, inclined Kepler orbit', () => {
    const a = 1.3, e = 0.3, n = Math.sqrt(MU / a ** 3);
    const s = new Float64Array(6);
    semimajorElementsToState(a, e, 20 * DEG, 1.0, 2.0, 0.5, MU, s);
    const l0 = meanLongitudeRad(s, MU);
    let worst = 0;
    for (let t = 0; t <= 600; t += 37) {
      semimajorElementsToState(a, e, 20 * DEG, 1.0, 2.0, 0.5 + n * t, MU, s);
      worst = Math.max(worst, Math.abs(wrapPi(meanLongitudeRad(s, MU) - l0 - n * t)));
    }
    expect(worst).toBeLessThan(1e-11); // rad; a true longitude would be off by ~2e = 0.6 rad
  });

  it('an unbound state has no mean longitude (NaN)', () => {
    expect(meanLongitudeRad(Float64Array.of(1, 0, 0, 0, 0.03, 0), MU)).toBeNaN(); // v > escape 0.0243 au/d
  });

  it('a planet state turned by ±60° about its orbit normal gives φ = ±60° (L4 leads, L5 trails)', () => {
    const p = new Float64Array(6), b = new Float64Array(6);
    semimajorElementsToState(5.2, 0.048, 1.3 * DEG, 1.75, 4.8, 0.3, planetKeplerGmAu3PerDay2('jupiter'), p);
    for (const deg of [60, -60, 150]) {
      turnedAboutOrbitNormal(p, deg * DEG, b);
      // The body's λ uses GM_sun, the planet's GM_sun + GM_J: they differ by O(μ) ~ 1e-3 rad.
      expect(Math.abs(resonantAngleRad(b, p, 'jupiter') / DEG - deg)).toBeLessThan(0.2);
    }
  });

  it('unwrapping removes the 2π jumps and keeps NaN', () => {
    const a = Float64Array.of(3.0, -3.1, 3.1, NaN, -3.0, 2.9);
    unwrapAnglesInPlace(a);
    // After the NaN the unwrapping resumes from 3.1; 2.9 after −3.0 + 2π (≈ 3.28) is no jump.
    const want = [3.0, -3.1 + 2 * Math.PI, 3.1, NaN, -3.0 + 2 * Math.PI, 2.9];
    for (let k = 0; k < a.length; k++) {
      if (Number.isNaN(want[k])) expect(a[k]).toBeNaN();
      else expect(a[k]).toBeCloseTo(want[k], 12);
    }
  });
});
