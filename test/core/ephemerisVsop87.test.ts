import { describe, expect, it } from 'vitest';
import planetposition from 'astronomia/planetposition';
import elp from 'astronomia/elp';
import elpData from 'astronomia/data/elpMppDe';
import elpFullData from 'astronomia/data/elpMppDeFull';
import mercury from 'astronomia/data/vsop87Bmercury';
import venus from 'astronomia/data/vsop87Bvenus';
import earth from 'astronomia/data/vsop87Bearth';
import mars from 'astronomia/data/vsop87Bmars';
import jupiter from 'astronomia/data/vsop87Bjupiter';
import saturn from 'astronomia/data/vsop87Bsaturn';
import uranus from 'astronomia/data/vsop87Buranus';
import neptune from 'astronomia/data/vsop87Bneptune';
import { J2000_JD, KM_PER_AU, PLANETS } from '../../src/core/constants.js';
import type { PlanetName } from '../../src/core/constants.js';
import { DAYS_PER_JULIAN_MILLENNIUM, vsop87HelioState, vsop87Spherical } from '../../src/core/ephemeris/vsop87.js';
import { vsop87Series } from '../../src/core/ephemeris/vsop87Series.js';
import { elpGeocentricMoonState } from '../../src/core/ephemeris/elpMoon.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { EPHEMERIS_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import { wrapTwoPi } from '../../src/core/math.js';
import { randomDates } from './ephemerisTestDates.js';

const DATA = { mercury, venus, earth, mars, jupiter, saturn, uranus, neptune };

describe('direct VSOP87B series', () => {
  it('agrees with astronomia planetposition.position2000 (independent evaluator of the same series) to 1e-10 au', () => {
    // Source: astronomia 4.2.0 `Planet.position2000`, its own summation of the full VSOP87B
    // series (nested arrays, Horner in τ); converted here to rectangular coordinates.
    const dates = randomDates(11, 25, J2000_JD - 365_250, J2000_JD + 365_250);
    const out = new Float64Array(6);
    const lines: string[] = [];
    let worstAu = 0;
    for (const p of PLANETS) {
      const reference = new planetposition.Planet(DATA[p]);
      let worst = 0;
      for (const jd of dates) {
        vsop87HelioState(p, jd, out);
        const c = reference.position2000(jd);
        const x = c.range * Math.cos(c.lat) * Math.cos(c.lon);
        const y = c.range * Math.cos(c.lat) * Math.sin(c.lon);
        const z = c.range * Math.sin(c.lat);
        worst = Math.max(worst, Math.hypot(out[0] - x, out[1] - y, out[2] - z));
      }
      lines.push(`${p} ${(worst * KM_PER_AU * 1000).toExponential(2)} m`);
      worstAu = Math.max(worstAu, worst);
    }
    console.log(`VSOP87B vs astronomia position2000, worst over 1000–3000 AD: ${lines.join(', ')}`);
    expect(worstAu).toBeLessThan(1e-10);
  });

  it('reproduces the published VSOP87B check values to their printed 1e-10', () => {
    // Source: Bretagnon & Francou, VSOP87 distribution check file, "VSOP87B <planet> JD…"
    // blocks (l, b in rad, r in au, printed to 10 decimals), transcribed from a secondary
    // listing of that file: all eight planets at JD 2451545.0, five at JD 2415020.0 and
    // JD 2122820.0.
    const check: Array<[PlanetName, number, number, number, number]> = [
      ['mercury', 2451545.0, 4.4293481043, -0.0527573411, 0.4664714751],
      ['venus', 2451545.0, 3.1870221910, 0.0569782849, 0.7202129248],
      ['earth', 2451545.0, 1.7519238637, -0.0000039656, 0.9833276823],
      ['mars', 2451545.0, 6.2735389872, -0.0247779824, 1.3912076937],
      ['jupiter', 2451545.0, 0.6334614217, -0.0205001039, 4.9653812803],
      ['saturn', 2451545.0, 0.7980038867, -0.0401984149, 9.1838482881],
      ['uranus', 2451545.0, 5.5225485297, -0.0119527878, 19.9240478952],
      ['neptune', 2451545.0, 5.3045629284, 0.0042236790, 30.1205329332],
      ['mercury', 2415020.0, 3.5095041512, 0.0564907883, 0.4183426276],
      ['venus', 2415020.0, 5.9993518124, -0.0591709804, 0.7274719352],
      ['earth', 2415020.0, 1.7634989198, 0.0002186910, 0.9832689762],
      ['mars', 2415020.0, 5.0185792656, -0.0274073500, 1.4218777718],
      ['jupiter', 2415020.0, 4.1171308454, 0.0159456650, 5.3850276351],
      ['mercury', 2122820.0, 5.2319689071, -0.1160635432, 0.4352063235],
      ['venus', 2122820.0, 3.5336333775, 0.0496161272, 0.7215819773],
      ['earth', 2122820.0, 1.8557201152, 0.0019445314, 0.9830331809],
      ['mars', 2122820.0, 2.9557712523, 0.0298285524, 1.6571002362],
      ['jupiter', 2122820.0, 1.4885071580, -0.0054711800, 5.1193587263],
    ];
    const lbr = new Float64Array(6);
    let worstRad = 0;
    let worstAu = 0;
    for (const [p, jd, l, b, r] of check) {
      vsop87Spherical(vsop87Series(p), (jd - J2000_JD) / DAYS_PER_JULIAN_MILLENNIUM, lbr);
      worstRad = Math.max(worstRad, Math.abs(wrapTwoPi(lbr[0]) - l), Math.abs(lbr[1] - b));
      worstAu = Math.max(worstAu, Math.abs(lbr[2] - r));
    }
    console.log(
      `VSOP87B check values (${check.length} rows): worst angle ${(worstRad * 206264.806e3).toFixed(4)} mas, ` +
        `worst radius ${(worstAu * KM_PER_AU * 1000).toFixed(1)} m`,
    );
    // Printed to 1e-10: half a unit of the last digit (5e-11) plus summation rounding.
    expect(worstRad).toBeLessThan(1e-10);
    expect(worstAu).toBeLessThan(1e-10);
  });

  it('analytic velocities match 5-point central differences of positions (h = 0.1 day)', () => {
    // Numerical differentiation, 4th-order stencil (common practice):
    // f'(t) ≈ [8(f(t+h) − f(t−h)) − (f(t+2h) − f(t−2h))] / (12 h), error ~ h⁴ f⁽⁵⁾/30.
    const eph = new Vsop87Ephemeris();
    const h = 0.1;
    const s = new Float64Array(6 * 5);
    const dates = randomDates(12, 8);
    const lines: string[] = [];
    let worst = 0;
    for (const body of EPHEMERIS_BODIES) {
      let w = 0;
      for (const jd of dates) {
        for (let j = -2; j <= 2; j++) eph.helioState(body, jd + j * h, s, 6 * (j + 2));
        for (let a = 0; a < 3; a++) {
          const d = (8 * (s[18 + a] - s[6 + a]) - (s[24 + a] - s[a])) / (12 * h);
          w = Math.max(w, Math.abs(d - s[12 + 3 + a]));
        }
      }
      lines.push(`${body} ${(w * KM_PER_AU * 1e6 / 86400).toExponential(2)} mm/s`);
      worst = Math.max(worst, w);
    }
    console.log(`analytic vs numerical velocity, worst per body: ${lines.join(', ')}`);
    // Loosened from the stencil's own ~1e-14 au/day: a Julian date near 2.4e6 is stored to
    // ~5e-10 day, so each position is taken at a time off by up to that (1.5e-11 au for
    // Mercury), and the stencil divides that noise by 12h/18 ≈ 0.07 day. 1e-10 au/day = 0.17 mm/s.
    expect(worst).toBeLessThan(1e-10);
  });
});

describe('ELP/MPP02 geocentric Moon', () => {
  it('agrees with astronomia elp.Moon.positionXYZ (independent evaluator, same series) to 1e-5 km', () => {
    const moon = new elp.Moon(elpData);
    const out = new Float64Array(6);
    let worst = 0;
    for (const jd of randomDates(13, 40)) {
      elpGeocentricMoonState(jd, out);
      const r = moon.positionXYZ(jd);
      worst = Math.max(worst, Math.hypot(out[0] - r.x, out[1] - r.y, out[2] - r.z));
    }
    console.log(`ELP Moon vs astronomia positionXYZ, worst 1900–2100: ${(worst * 1e6).toFixed(3)} mm`);
    expect(worst).toBeLessThan(1e-5);
  });

  it('truncated series stays within 0.2 km of the complete ELP/MPP02 series', () => {
    // Source: the complete ELP/MPP02 (DE405) series shipped by astronomia, summed by its own
    // evaluator. Measures what the truncation of the series used by the core costs.
    const moon = new elp.Moon(elpFullData);
    const out = new Float64Array(6);
    let worst = 0;
    for (const jd of randomDates(15, 25)) {
      elpGeocentricMoonState(jd, out);
      const r = moon.positionXYZ(jd);
      worst = Math.max(worst, Math.hypot(out[0] - r.x, out[1] - r.y, out[2] - r.z));
    }
    console.log(`truncated vs complete ELP/MPP02, worst 1900–2100: ${(worst * 1000).toFixed(1)} m (÷82.3 on the EMB)`);
    expect(worst).toBeLessThan(0.2);
  });

  it('analytic lunar velocity matches 5-point central differences (h = 0.1 day)', () => {
    // Same stencil as above. Truncation: h⁴ f⁽⁵⁾/30 with f⁽⁵⁾ ≈ 384 400 km × (0.23 /day)⁵ ≈
    // 250 km/day⁵ gives 8e-4 km/day; JD quantization (5e-10 day × 88 000 km/day = 5e-5 km
    // position noise) gives ~4e-4 km/day. Both are far below the 1 km/day scale that matters
    // for the EMB (the Moon enters it divided by 82.3).
    const h = 0.1;
    const s = new Float64Array(30);
    let worst = 0;
    for (const jd of randomDates(14, 20)) {
      for (let j = -2; j <= 2; j++) elpGeocentricMoonState(jd + j * h, s, 6 * (j + 2));
      for (let a = 0; a < 3; a++) {
        const d = (8 * (s[18 + a] - s[6 + a]) - (s[24 + a] - s[a])) / (12 * h);
        worst = Math.max(worst, Math.abs(d - s[15 + a]));
      }
    }
    console.log(`lunar velocity analytic vs numerical: worst ${(worst * 1e6 / 86400).toExponential(2)} mm/s`);
    expect(worst).toBeLessThan(3e-3); // km/day ≈ 0.035 mm/s
  });
});

describe('direct ephemeris misuse', () => {
  it('throws RangeError outside its span and TypeError for unknown bodies', () => {
    const eph = new Vsop87Ephemeris({ startJdTDB: 2_400_000, endJdTDB: 2_500_000 });
    const out = new Float64Array(6);
    expect(() => eph.helioState('mars', 2_399_999, out)).toThrow(RangeError);
    expect(() => eph.helioState('mars', Number.NaN, out)).toThrow(RangeError);
    expect(() => eph.helioState('pluto' as PlanetName, 2_451_545, out)).toThrow(TypeError);
    expect(DAYS_PER_JULIAN_MILLENNIUM).toBe(365_250);
  });
});
