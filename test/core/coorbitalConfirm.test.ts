// N-body confirmation of co-orbital motion (src/core/coorbital/confirm.ts) on planted bodies
// (invented: the planet's state from the ephemeris turned about its orbit normal, 12° beyond
// L4 or L5, i.e. a small tadpole), integrated with the Sun, the eight planet systems and 1PN.
// Outside facts:
//  - small-amplitude tadpole period T = 2π / (n √(27μ/4)) (restricted three-body problem,
//    linear stability of L4/L5; Murray & Dermott 1999, ch. 3 — equation number from memory);
//  - L4 leads the planet (φ = +60°), L5 trails (−60°) (Morais 2001, A&A 369, 677, footnote, as
//    quoted in the design note on the co-orbital detector);
//  - a body well off the resonance circulates with the synodic period 1/|1/P − 1/P_planet|
//    (common practice).
// Runtime: one Chebyshev cache over J2000 ± 250 yr shared by all cases (~5 s to fill).
import { beforeAll, describe, expect, it } from 'vitest';
import { confirmCoorbital, confirmCoorbitalBatch } from '../../src/core/coorbital/confirm.js';
import { planetKeplerGmAu3PerDay2 } from '../../src/core/coorbital/resonantAngle.js';
import { createWindowEphemeris, planetEphemerisBody } from '../../src/core/coorbital/sampleCoorbital.js';
import { turnedAboutOrbitNormal } from '../../src/core/coorbital/triangularPoint.js';
import { GM_SUN_AU3_PER_DAY2, J2000_JD, planetGmAu3PerDay2, type PlanetName } from '../../src/core/constants.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import type { Ephemeris } from '../../src/core/types.js';

const YEAR = 365.25;
const DEG = Math.PI / 180;
const WINDOW_YEARS = 250;
let eph: Ephemeris;

beforeAll(() => {
  eph = createWindowEphemeris(J2000_JD - WINDOW_YEARS * YEAR, J2000_JD + WINDOW_YEARS * YEAR);
});

function planetState(planet: PlanetName): Float64Array {
  const p = new Float64Array(6);
  eph.helioState(planetEphemerisBody(planet), J2000_JD, p, 0);
  return p;
}

function planted(planet: PlanetName, angleDeg: number): Float64Array {
  const s = new Float64Array(6);
  turnedAboutOrbitNormal(planetState(planet), angleDeg * DEG, s);
  return s;
}

/** Small-amplitude tadpole period (years), with n from the planet's osculating a at J2000. */
function tadpolePeriodYears(planet: PlanetName): number {
  const p = planetState(planet);
  const gm = planetKeplerGmAu3PerDay2(planet);
  const a = 1 / (2 / Math.hypot(p[0], p[1], p[2]) - (p[3] ** 2 + p[4] ** 2 + p[5] ** 2) / gm);
  const n = Math.sqrt(gm / a ** 3);
  const mu = planetGmAu3PerDay2(planet) / GM_SUN_AU3_PER_DAY2;
  return (2 * Math.PI) / (n * Math.sqrt((27 * mu) / 4)) / YEAR;
}

describe('N-body confirmation of planted co-orbitals', () => {
  it('a Jupiter Trojan 12° beyond L4 librates about +60° with the small-amplitude tadpole period', () => {
    const h = confirmCoorbital(planted('jupiter', 72), J2000_JD, 'jupiter', { windowYears: WINDOW_YEARS, ephemeris: eph });
    expect(h.segments.map((s) => s.state)).toEqual(['tadpole-L4']);
    expect(h.stateAtEpoch).toBe('tadpole-L4');
    const s = h.segments[0];
    // Measured 147.3 yr against 147.8 yr (0.3%); 3% leaves room for the other planets and
    // the amplitude, and still fails on a wrong μ, n or factor of the formula.
    expect(Math.abs(s.periodYears / tadpolePeriodYears('jupiter') - 1)).toBeLessThan(0.03);
    expect(Math.abs(s.centreDeg - 60)).toBeLessThan(5);
    expect(s.amplitudeDeg).toBeGreaterThan(5);
    expect(s.amplitudeDeg).toBeLessThan(20);
    expect(h.captures).toEqual([]);
    expect(h.minDistanceAu).toBeGreaterThan(3); // never leaves the triangular region (~5.2 au away)
    expect(h.series).toBeUndefined(); // series only when asked for
    // The window, cut to whole φ steps (≤ P_J/20 = 217 d) at each end.
    const cutDays = h.segments[0].startJdTDB - (J2000_JD - WINDOW_YEARS * YEAR);
    expect(cutDays).toBeGreaterThanOrEqual(0);
    expect(cutDays).toBeLessThan(217);
  });

  it('Earth Trojans 12° beyond L5 and 10° short of L4, integrated together: L5 and L4 tadpoles', () => {
    const states = new Float64Array(12);
    states.set(planted('earth', -72), 0);
    states.set(planted('earth', 50), 6);
    const [l5, l4] = confirmCoorbitalBatch(states, J2000_JD, 'earth', { windowYears: WINDOW_YEARS, ephemeris: eph, series: true });
    expect(l5.segments.map((s) => s.state)).toEqual(['tadpole-L5']);
    expect(l4.segments.map((s) => s.state)).toEqual(['tadpole-L4']);
    // Measured 222.2 yr for both against 220.7 yr (0.7%).
    for (const h of [l5, l4]) expect(Math.abs(h.segments[0].periodYears / tadpolePeriodYears('earth') - 1)).toBeLessThan(0.03);
    expect(Math.abs(l5.segments[0].centreDeg + 60)).toBeLessThan(5);
    expect(l5.captures).toEqual([]);
    expect(l5.minDistanceAu).toBeGreaterThan(0.5);

    // The plot series. In the frame rotating with the Earth (planet on +x, prograde motion
    // counter-clockwise seen from the ecliptic north) L4, 60° ahead of the planet, is at
    // y > 0 and L5 at y < 0 (L4 leads: Morais 2001, as above). These tadpoles keep φ within
    // about 60° ± 15°, and the true longitude differs from the mean longitude by at most
    // ~2e ≈ 2° (equation of the centre, e ≈ 0.017: common practice), so every sample lies
    // on its side, at about 1 au from the Sun, at a polar angle within a few degrees of φ.
    for (const [h, side] of [[l4, 1], [l5, -1]] as const) {
      const s = h.series!;
      const n = s.tYears.length;
      expect(n).toBeLessThanOrEqual(2000);
      expect(n).toBeGreaterThan(1000);
      expect(s.totalSamples).toBeGreaterThan(n); // thinned: 500 yr at ≤ P/20 is ~10 000 samples
      expect(s.phiDeg.length).toBe(n);
      expect(s.tYears[0]).toBeCloseTo(-WINDOW_YEARS, 0);
      expect(s.tYears[n - 1]).toBeCloseTo(WINDOW_YEARS, 0);
      expect(Math.abs(s.planetDistanceAu - 1)).toBeLessThan(0.02);
      for (let k = 0; k < n; k++) {
        expect(s.phiDeg[k]).toBeGreaterThan(-180);
        expect(s.phiDeg[k]).toBeLessThanOrEqual(180);
      }
      // The path: 3000 consecutive φ samples (no thinning: a thinned yearly loop aliases),
      // equally spaced, centred on the epoch.
      const m = s.pathTYears.length;
      expect(m).toBe(3000);
      for (const a of [s.xAu, s.yAu]) expect(a.length).toBe(m);
      const step = s.pathTYears[1] - s.pathTYears[0];
      expect(step * 365.25).toBeLessThanOrEqual(365.26 / 20); // at most P/20
      for (let k = 1; k < m; k++) expect(Math.abs(s.pathTYears[k] - s.pathTYears[k - 1] - step)).toBeLessThan(1e-9);
      expect(Math.abs(s.pathTYears[0] + s.pathTYears[m - 1])).toBeLessThanOrEqual(step + 1e-9);
      const phiAt = new Map(s.tYears.map((t, k) => [t.toFixed(6), s.phiDeg[k]]));
      let compared = 0;
      for (let k = 0; k < m; k++) {
        expect(side * s.yAu[k]).toBeGreaterThan(0);
        expect(Math.abs(Math.hypot(s.xAu[k], s.yAu[k]) - 1)).toBeLessThan(0.05);
        const phi = phiAt.get(s.pathTYears[k].toFixed(6));
        if (phi === undefined) continue; // a φ sample thinned out of the φ series
        compared++;
        expect(Math.abs((Math.atan2(s.yAu[k], s.xAu[k]) * 180) / Math.PI - phi)).toBeLessThan(4);
      }
      expect(compared).toBeGreaterThan(100);
    }
    // Plain arrays (they cross worker threads by structured clone).
    expect(Array.isArray(l4.series!.xAu)).toBe(true);
  });

  it('a body at a = 1.05 au circulates: passing, with the synodic period', () => {
    const s = new Float64Array(6);
    semimajorElementsToState(1.05, 0.02, 1 * DEG, 0.5, 1.0, 2.0, GM_SUN_AU3_PER_DAY2, s);
    const h = confirmCoorbital(s, J2000_JD, 'earth', { windowYears: 50, ephemeris: eph });
    expect(h.segments.map((x) => x.state)).toEqual(['passing']);
    expect(h.stateAtEpoch).toBe('passing');
    const pBody = 1.05 ** 1.5, pEarth = 1; // years, Kepler's third law (a of the EMB ≈ 1 au)
    const synodic = 1 / Math.abs(1 / pEarth - 1 / pBody); // 14.2 yr
    expect(Math.abs(h.segments[0].periodYears / synodic - 1)).toBeLessThan(0.03);
  });

  it('a body on a retrograde orbit 0.0015 au about the Earth–Moon barycentre is one capture over the window', () => {
    // Invented satellite: the turns expected in the frame rotating with the Sun–Earth line are
    // the inertial turns (Kepler's third law about GM_Earth+Moon) plus the yearly turns of the
    // line, for a retrograde orbit (common practice; the capture criterion: capture.ts).
    const rG = 0.0015, gmE = planetGmAu3PerDay2('earth');
    const rel = new Float64Array(6);
    semimajorElementsToState(rG, 0, Math.PI - 0.1, 0.3, 0, 0, gmE, rel);
    const s = planetState('earth');
    for (let c = 0; c < 6; c++) s[c] += rel[c];
    const h = confirmCoorbital(s, J2000_JD, 'earth', { windowYears: 5, ephemeris: eph });
    expect(h.captures).toHaveLength(1);
    const c = h.captures[0];
    const spanDays = c.endJdTDB - c.startJdTDB;
    expect(spanDays).toBeGreaterThan(9.9 * YEAR);
    const expected = spanDays / (2 * Math.PI * Math.sqrt(rG ** 3 / gmE)) + spanDays / YEAR; // ≈ 299 + 10
    // Measured 307.7 against 308.7 (0.3%): the Sun's tide shifts the rate by a few 1e-3 at
    // 0.15 Hill radii. 1% still fails when counted in the inertial frame (10 turns = 3%).
    expect(Math.abs(c.revolutions / expected - 1)).toBeLessThan(0.01);
    expect(Math.abs(c.minDistanceAu / rG - 1)).toBeLessThan(0.05);
    expect(h.minDistanceAu).toBeCloseTo(c.minDistanceAu, 6);
  });

  it('a body unbound from the Sun is passing over the whole window', () => {
    const s = new Float64Array(6);
    semimajorElementsToState(-2, 3, 0.5, 1, 2, -0.5, GM_SUN_AU3_PER_DAY2, s); // e = 3, q = 4 au
    const h = confirmCoorbital(s, J2000_JD, 'jupiter', { windowYears: 20, ephemeris: eph });
    expect(h.segments.map((x) => x.state)).toEqual(['passing']);
    expect(h.segments[0].periodYears).toBeNaN();
  });

  it('refuses a sample step coarser than a twentieth of the planet period', () => {
    expect(() => confirmCoorbital(planted('earth', 60), J2000_JD, 'earth', { windowYears: 10, ephemeris: eph, sampleStepDays: 20 }))
      .toThrow(/a twentieth of the planet's period/);
  });
});
