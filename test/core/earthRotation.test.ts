// Earth rotation angle, GMST, precession and observer positions against python3-erfa
// (IAU SOFA algorithms); fixtures and the command that makes them: test/fixtures/erfa/README.md.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { earthRotationAngleRad, gmst06Rad } from '../../src/core/frames/earthRotation.js';
import { precessionMatrixP03 } from '../../src/core/frames/precession.js';
import { observerGeocentricState, EARTH_ROTATION_RAD_PER_S } from '../../src/core/frames/observer.js';
import { eclipticToEquatorialInPlace } from '../../src/core/frames/frames.js';
import { wrapPi } from '../../src/core/math.js';
import { ARCSEC_PER_RAD, KM_PER_AU } from '../../src/core/constants.js';

const fixture = (name: string) => JSON.parse(readFileSync(new URL(`../fixtures/erfa/${name}`, import.meta.url), 'utf8'));

describe('Earth rotation angle and GMST (erfa.era00, erfa.gmst06)', () => {
  const cases: { ut1Jd: number[]; ttJd: number[]; eraRad: number; gmst06Rad: number }[] = fixture('earthRotation.json').cases;

  it('ERA (IAU 2000) agrees within 1e-6″ over 1950–2050', () => {
    let worst = 0;
    for (const c of cases) {
      const e = Math.abs(wrapPi(earthRotationAngleRad(c.ut1Jd[0], c.ut1Jd[1]) - c.eraRad)) * ARCSEC_PER_RAD;
      worst = Math.max(worst, e);
      expect(e).toBeLessThan(1e-6);
    }
    console.log(`ERA vs erfa.era00: worst ${worst.toExponential(2)}″ (${(worst / 15 * 1e6).toFixed(3)} µs of time)`);
  });

  it('GMST (IAU 2006) agrees within 1e-6″ over 1950–2050', () => {
    let worst = 0;
    for (const c of cases) {
      const e = Math.abs(wrapPi(gmst06Rad(c.ut1Jd[0], c.ut1Jd[1], c.ttJd[0], c.ttJd[1]) - c.gmst06Rad)) * ARCSEC_PER_RAD;
      worst = Math.max(worst, e);
      expect(e).toBeLessThan(1e-6);
    }
    console.log(`GMST vs erfa.gmst06: worst ${worst.toExponential(2)}″`);
  });

  it('one sidereal day of ERA is 86164.0989 s of UT1 (IERS Conventions 2010, common practice)', () => {
    expect((2 * Math.PI) / EARTH_ROTATION_RAD_PER_S).toBeCloseTo(86164.0989, 3);
  });
});

describe('IAU 2006 precession matrix (erfa.bp06 rp)', () => {
  it('P03 ζ, z, θ form agrees with the Fukushima–Williams form within 0.1 mas, 1900–2200', () => {
    const cases: { jdTT: number; rp: number[] }[] = fixture('precession.json').cases;
    const p = new Float64Array(9);
    let worst = 0;
    for (const c of cases) {
      precessionMatrixP03(c.jdTT, p);
      for (let k = 0; k < 9; k++) worst = Math.max(worst, Math.abs(p[k] - c.rp[k]));
    }
    worst *= ARCSEC_PER_RAD * 1000;
    console.log(`precession matrix vs erfa.bp06: worst element error ${worst.toExponential(2)} mas`);
    // The two parameterisations of the same P03 model differ by µas over ±2 centuries.
    expect(worst).toBeLessThan(0.1);
  });
});

describe('observer geocentric position vs full IAU 2006/2000A (erfa.c2t06a, UT1 = UTC)', () => {
  const cases: {
    code: string; longitudeDegE: number; rhoCosPhi: number; rhoSinPhi: number;
    utcJd: number[]; ttJd: number[]; gcrsKm: number[];
  }[] = fixture('observer.json').cases;

  it('equatorial position within 0.4 km (nutation left out, see observer.ts)', () => {
    const out = new Float64Array(6);
    let worst = 0;
    for (const c of cases) {
      observerGeocentricState(c.longitudeDegE, c.rhoCosPhi, c.rhoSinPhi, c.utcJd[0] + c.utcJd[1], c.ttJd[0] + c.ttJd[1], 'equatorial', out);
      const e = Math.hypot(out[0] * KM_PER_AU - c.gcrsKm[0], out[1] * KM_PER_AU - c.gcrsKm[1], out[2] * KM_PER_AU - c.gcrsKm[2]);
      worst = Math.max(worst, e);
      // Bound from observer.ts: the nutation tilt the GMST model leaves out, ≤ 11.5″ × 6378 km.
      expect(e, `${c.code} ${c.utcJd}`).toBeLessThan(0.4);
    }
    console.log(`observer position vs erfa c2t06a: worst ${worst.toFixed(3)} km over ${cases.length} site-times`);
  });

  it('ecliptic output is the equatorial output rotated by ε0; speed is ω ρcosφ′ R', () => {
    const eq = new Float64Array(6);
    const ec = new Float64Array(6);
    const c = cases[5];
    const jdU = c.utcJd[0] + c.utcJd[1];
    const jdT = c.ttJd[0] + c.ttJd[1];
    observerGeocentricState(c.longitudeDegE, c.rhoCosPhi, c.rhoSinPhi, jdU, jdT, 'equatorial', eq);
    observerGeocentricState(c.longitudeDegE, c.rhoCosPhi, c.rhoSinPhi, jdU, jdT, 'ecliptic', ec);
    eclipticToEquatorialInPlace(ec, 0);
    eclipticToEquatorialInPlace(ec, 3);
    for (let k = 0; k < 6; k++) expect(Math.abs(ec[k] - eq[k]) * KM_PER_AU).toBeLessThan(1e-9);
    const speedKmS = (Math.hypot(eq[3], eq[4], eq[5]) * KM_PER_AU) / 86400;
    // Equatorial rotation speed 0.4651 km/s × ρcosφ′ (common practice: ωR = 7.292115e-5 × 6378.1366).
    expect(speedKmS).toBeCloseTo(7.292115e-5 * 6378.1366 * c.rhoCosPhi, 6);
    // Velocity is the time derivative of position: central difference over ±10 s, 1 mm/s.
    const p1 = new Float64Array(6);
    const p2 = new Float64Array(6);
    const h = 10 / 86400;
    observerGeocentricState(c.longitudeDegE, c.rhoCosPhi, c.rhoSinPhi, jdU - h, jdT - h, 'equatorial', p1);
    observerGeocentricState(c.longitudeDegE, c.rhoCosPhi, c.rhoSinPhi, jdU + h, jdT + h, 'equatorial', p2);
    for (let k = 0; k < 3; k++) {
      const fd = (p2[k] - p1[k]) / (2 * h);
      expect(Math.abs(fd - eq[3 + k]) * KM_PER_AU / 86400).toBeLessThan(1e-6);
    }
  });

  it('refuses non-finite input and unknown frames', () => {
    const out = new Float64Array(6);
    expect(() => observerGeocentricState(NaN, 1, 0, 2451545, 2451545, 'equatorial', out)).toThrow(RangeError);
    expect(() => observerGeocentricState(0, 1, 0, 2451545, 2451545, 'galactic' as never, out)).toThrow(TypeError);
  });
});
