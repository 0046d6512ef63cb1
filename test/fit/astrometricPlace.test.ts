// The computed astrometric place (light time, ICRF RA/Dec) against python3-erfa: bodies in
// uniform motion, whose light-time equation the fixture script solves in closed form;
// fixtures and the command that makes them: test/fixtures/erfa-observation/README.md.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ARCSEC_PER_RAD, C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2, SECONDS_PER_DAY } from '../../src/core/constants.js';
import { wrapPi } from '../../src/core/math.js';
import { propagateTwoBody } from '../../src/core/orbit/universal.js';
import { computeAstrometricPlace, LIGHT_TIME_TOLERANCE_DAYS } from '../../src/fit/astrometricPlace.js';
import { IAU2006_ECLIPTIC_TO_ICRF_MATRIX, ICRF_TO_ECLIPTIC_MATRIX, rotate3 } from '../../src/fit/frameBias.js';
import type { BodyStateEclipticFn } from '../../src/fit/types.js';

const fixture = JSON.parse(readFileSync(new URL('../fixtures/erfa-observation/places.json', import.meta.url), 'utf8'));
interface PlaceCase {
  station: string; body: string; tdbJd: number[]; observerHelioIcrsAu: number[];
  bodyEclipticAu: number[]; bodyEclipticAuPerDay: number[];
  lightTimeDays: number; distanceAu: number; raRad: number; decRad: number;
}
const cases: PlaceCase[] = fixture.cases;

/** The fixture's ecliptic (ecm06's, IAU 2006) → the core's (VSOP87's), through the ICRF. */
function toCoreEcliptic(v: readonly number[]): Float64Array {
  const icrf = new Float64Array(3), out = new Float64Array(3);
  rotate3(IAU2006_ECLIPTIC_TO_ICRF_MATRIX, v, 0, icrf, 0);
  rotate3(ICRF_TO_ECLIPTIC_MATRIX, icrf, 0, out, 0);
  return out;
}

function uniformMotion(c: PlaceCase, t0: number): BodyStateEclipticFn {
  const r = toCoreEcliptic(c.bodyEclipticAu), v = toCoreEcliptic(c.bodyEclipticAuPerDay);
  return (jd, out) => {
    const dt = jd - t0;
    for (let k = 0; k < 3; k++) {
      out[k] = r[k] + v[k] * dt;
      out[k + 3] = v[k];
    }
  };
}

describe('astrometric place vs erfa (uniform motion, exact light time)', () => {
  it('the speed of light is the fixture’s (IAU 2009 c, au = 149 597 870 700 m)', () => {
    expect(Math.abs(C_AU_PER_DAY - fixture.cLightAuPerDay)).toBeLessThan(1e-12);
  });

  // Bounds: 1e-4″ in direction (the frame matrices agree with ERFA's to 1e-12 rad = 2e-7″;
  // the emission time as one double near JD 2.46e6 resolves 4.7e-10 d, a few metres of the
  // body's motion: measured 1.5e-5″), light time 1e-11 d (measured 5.7e-13 d).
  // Without the frame bias the directions move by up to 23 mas; without light time by up to 60″.
  it('RA/Dec within 0.1 mas, light time within 1e-11 d', () => {
    let worst = 0, worstTau = 0, maxIt = 0;
    for (const c of cases) {
      const t = c.tdbJd[0] + c.tdbJd[1];
      const p = computeAstrometricPlace(uniformMotion(c, t), c.observerHelioIcrsAu, t);
      const dRa = wrapPi(p.raRad - c.raRad) * Math.cos(c.decRad) * ARCSEC_PER_RAD;
      const dDec = (p.decRad - c.decRad) * ARCSEC_PER_RAD;
      const e = Math.hypot(dRa, dDec);
      worst = Math.max(worst, e);
      worstTau = Math.max(worstTau, Math.abs(p.lightTimeDays - c.lightTimeDays));
      maxIt = Math.max(maxIt, p.iterations);
      expect(e, `${c.station} ${c.body}`).toBeLessThan(1e-4);
      expect(Math.abs(p.lightTimeDays - c.lightTimeDays)).toBeLessThan(1e-11);
      expect(Math.abs(p.distanceAu - c.distanceAu)).toBeLessThan(1e-9);
      expect(p.raRad).toBeGreaterThanOrEqual(0);
      expect(p.raRad).toBeLessThan(2 * Math.PI);
    }
    console.log(`astrometric place vs erfa: worst ${(worst * 1000).toExponential(2)} mas, light time worst ${(worstTau * SECONDS_PER_DAY * 1e9).toFixed(2)} ns, at most ${maxIt} iterations, ${cases.length} cases`);
  });
});

describe('partial derivatives of (α cos δ, δ) with respect to the body position', () => {
  // Check by the definition of the derivative (common practice): shift the whole two-body
  // trajectory by ±h along each axis and difference the places (light time re-solved).
  it('match central differences within 1e-7 relative', () => {
    const state0 = new Float64Array([1.1, -0.4, 0.05, 0.004, 0.015, 0.001]); // ecliptic, au, au/day
    // Times near 0 rather than a real Julian date, so that the emission time is not rounded to
    // the 4.7e-10 d a double keeps near 2.46e6 (that alone moves the differences by 3e-6).
    const epoch = 0.5;
    const observer = [-0.8, 0.55, 0.24];
    const shift = new Float64Array(3);
    const body: BodyStateEclipticFn = (jd, out) => {
      propagateTwoBody(state0, jd - epoch, GM_SUN_AU3_PER_DAY2, out);
      for (let k = 0; k < 3; k++) out[k] += shift[k];
    };
    const t = epoch + 20;
    const p = computeAstrometricPlace(body, observer, t);
    const h = 1e-6;
    let worst = 0;
    for (let j = 0; j < 3; j++) {
      shift[j] = h;
      const a = computeAstrometricPlace(body, observer, t);
      shift[j] = -h;
      const b = computeAstrometricPlace(body, observer, t);
      shift[j] = 0;
      const dRa = (wrapPi(a.raRad - b.raRad) * Math.cos(p.decRad)) / (2 * h);
      const dDec = (a.decRad - b.decRad) / (2 * h);
      const scale = Math.hypot(p.partialsEcliptic[j], p.partialsEcliptic[3 + j], 1 / p.distanceAu);
      worst = Math.max(worst, Math.abs(dRa - p.partialsEcliptic[j]) / scale, Math.abs(dDec - p.partialsEcliptic[3 + j]) / scale);
    }
    console.log(`partials vs central differences: worst relative ${worst.toExponential(2)}`);
    expect(worst).toBeLessThan(1e-7);
  });

  it('include the light time’s dependence on the position (differs from the fixed-time partials by about v/c)', () => {
    const state = new Float64Array([0.99, 0.02, 0.0, 0.0, 0.5, 0.0]); // a fast body 0.01 au away, |v| = 0.5 au/day
    const body: BodyStateEclipticFn = (jd, out) => {
      for (let k = 0; k < 6; k++) out[k] = state[k];
      out[1] += state[4] * (jd - 2460000.5);
    };
    const p = computeAstrometricPlace(body, [1, 0, 0], 2460000.5);
    // Without the light-time term ∂(α cos δ)/∂y would be cos α / Δ exactly; the light-time
    // term changes it by a fraction (v·ρ̂)/(c + v·ρ̂) ≈ 0.5/173 along the line of sight.
    expect(p.iterations).toBeGreaterThan(1);
    const fixedTime = Math.cos(p.raRad) / p.distanceAu;
    expect(Math.abs(p.partialsEcliptic[1] - fixedTime) / Math.abs(fixedTime)).toBeGreaterThan(1e-3);
  });
});

describe('light-time iteration failure', () => {
  it('throws with its state when the body function jumps', () => {
    let n = 0;
    const body: BodyStateEclipticFn = (_jd, out) => {
      n++;
      out.set([n % 2 === 0 ? 3 : 1, 0, 0, 0, 0, 0]);
    };
    expect(() => computeAstrometricPlace(body, [0, 0, 0], 2460000.5)).toThrow(/light-time iteration did not converge: .*after 10 iterations/);
    expect(LIGHT_TIME_TOLERANCE_DAYS).toBe(1e-12);
  });
});
