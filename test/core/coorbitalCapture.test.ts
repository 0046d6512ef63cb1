// Temporary-capture flags (src/core/coorbital/capture.ts) on synthetic planetocentric
// motion (invented orbits, allowed for synthetic tests): the Earth–Moon barycentre on a
// circular heliocentric orbit and a body on a Kepler conic about it. Outside facts:
//  - the capture definitions of Fedorets, Granvik et al. 2014 (DPS 46, 403.05: "elliptic
//    geocentric orbit within 0.03 au"; an orbiter makes "at least one full revolution around
//    the Earth in a coordinate system co-rotating with the Sun") and Granvik et al. 2012
//    (Icarus, abstract); the 3-Hill-radii form of the distance is from memory;
//  - the revolutions expected in the rotating frame follow from Kepler's third law: k whole
//    planetocentric periods are k inertial turns, less (prograde) or plus (retrograde) the
//    turns of the Sun–planet line, n_P T / 2π (common practice);
//  - the Earth's Hill sphere is about 1.5 million km (from memory).
import { describe, expect, it } from 'vitest';
import {
  CAPTURE_HILL_RADII, createPlanetocentricSeries, findCaptureEpisodes, hillRadiusAu, planetocentricSampleInto,
} from '../../src/core/coorbital/capture.js';
import { GM_SUN_AU3_PER_DAY2, KM_PER_AU, planetGmAu3PerDay2 } from '../../src/core/constants.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';

const GM_EMB = planetGmAu3PerDay2('earth');
const N_P = Math.sqrt(GM_SUN_AU3_PER_DAY2 + GM_EMB); // rad/day on a circular orbit of 1 au
const STEP_DAYS = 2;
const T0 = 2_460_000.5;

/** Samples of a planetocentric conic (a, e, i) over `spanDays` about the circular planet. */
function planetocentricRun(aAu: number, e: number, iRad: number, m0Rad: number, spanDays: number, angleWithinAu?: number) {
  const n = Math.floor(spanDays / STEP_DAYS) + 1;
  const times = new Float64Array(n);
  const series = createPlanetocentricSeries(n);
  const planet = new Float64Array(6), body = new Float64Array(6);
  const nG = Math.sqrt(GM_EMB / Math.abs(aAu) ** 3); // Kepler's third law (|a| for a hyperbola)
  for (let k = 0; k < n; k++) {
    const t = k * STEP_DAYS;
    times[k] = T0 + t;
    const l = N_P * t;
    planet.set([Math.cos(l), Math.sin(l), 0, -N_P * Math.sin(l), N_P * Math.cos(l), 0]);
    semimajorElementsToState(aAu, e, iRad, 0.4, 1.1, m0Rad + nG * t, GM_EMB, body);
    for (let c = 0; c < 6; c++) body[c] += planet[c];
    planetocentricSampleInto(body, 0, planet, 0, GM_EMB, series, k, angleWithinAu);
  }
  return { times, series, periodDays: (2 * Math.PI) / nG };
}

const zone = CAPTURE_HILL_RADII * hillRadiusAu('earth');

describe('temporary capture flags', () => {
  it('the capture zone: 3 Hill radii of the Earth–Moon system ≈ 0.03 au; r_H ≈ 1.5 million km', () => {
    expect(Math.abs(hillRadiusAu('earth') * KM_PER_AU / 1.5e6 - 1)).toBeLessThan(0.02);
    expect(Math.abs(zone - 0.03)).toBeLessThan(0.001);
  });

  it('a prograde ellipse inside 0.03 au is one capture with the rotating-frame revolutions of Kepler', () => {
    const a = 0.008, e = 0.2;
    const period = 2 * Math.PI * Math.sqrt(a ** 3 / GM_EMB);
    const run = planetocentricRun(a, e, 0.2, 0, 5 * period);
    const span = run.times[run.times.length - 1] - run.times[0];
    const expected = span / period - (N_P * span) / (2 * Math.PI); // ≈ 5 − 2.05
    const ep = findCaptureEpisodes(run.times, run.series, zone);
    expect(ep).toHaveLength(1);
    expect(ep[0].startJdTDB).toBe(T0);
    expect(Math.abs(ep[0].revolutions - expected)).toBeLessThan(0.02); // the span ends within a 2-d sample of 5 periods
    expect(ep[0].revolutions).toBeGreaterThan(1); // an orbiter in the sense of the definitions
    expect(Math.abs(ep[0].minDistanceAu / (a * (1 - e)) - 1)).toBeLessThan(0.01); // perigee, sampled every 2 d
  });

  it('a retrograde ellipse adds the turns of the Sun–planet line', () => {
    const a = 0.008, e = 0.2;
    const period = 2 * Math.PI * Math.sqrt(a ** 3 / GM_EMB);
    const run = planetocentricRun(a, e, Math.PI - 0.2, 0, 5 * period);
    const span = run.times[run.times.length - 1] - run.times[0];
    const ep = findCaptureEpisodes(run.times, run.series, zone);
    expect(ep).toHaveLength(1);
    expect(Math.abs(ep[0].revolutions - (span / period + (N_P * span) / (2 * Math.PI)))).toBeLessThan(0.02);
  });

  it('a hyperbolic pass at 0.005 au is not a capture (energy > 0)', () => {
    // v∞ = 1 km/s: a = −GM/v∞²; perigee q = a(1 − e) = 0.005 au.
    const vInf = 1 / KM_PER_AU * 86_400;
    const a = -GM_EMB / (vInf * vInf);
    const e = 1 - 0.005 / a;
    const run = planetocentricRun(a, e, 0.3, -32, 300); // M from −32 to +32: from 0.08 au to 0.08 au
    let closest = Infinity;
    for (const r of run.series.distanceAu) closest = Math.min(closest, r);
    expect(closest).toBeLessThan(zone); // it does enter the zone
    expect(findCaptureEpisodes(run.times, run.series, zone)).toEqual([]);
  });

  it('a bound orbit outside 3 Hill radii is not a capture (distance)', () => {
    const run = planetocentricRun(0.05, 0.1, 0.1, 0, 1500);
    expect(findCaptureEpisodes(run.times, run.series, zone)).toEqual([]);
  });

  it('with the angle kept to the capture zone, the episodes are the same and the angle is NaN outside it', () => {
    // Reference: the same runs with the angle at every sample (the episodes checked above
    // against Kepler's third law); an ellipse that reaches beyond the zone (a = 0.025 au,
    // e = 0.5: apogee 0.0375 au) and a hyperbolic pass.
    const vInf = 1 / KM_PER_AU * 86_400;
    const aHyp = -GM_EMB / (vInf * vInf);
    let outside = 0, inside = 0;
    for (const [a, e, m0, span] of [[0.008, 0.2, 0, 400], [0.025, 0.5, 0, 900], [aHyp, 1 - 0.005 / aHyp, -32, 300]] as const) {
      const full = planetocentricRun(a, e, 0.2, m0, span);
      const kept = planetocentricRun(a, e, 0.2, m0, span, zone);
      expect(findCaptureEpisodes(kept.times, kept.series, zone)).toEqual(findCaptureEpisodes(full.times, full.series, zone));
      expect(Array.from(kept.series.distanceAu)).toEqual(Array.from(full.series.distanceAu));
      for (let k = 0; k < kept.times.length; k++) {
        const inZone = full.series.energyAu2PerDay2[k] < 0 && full.series.distanceAu[k] < zone;
        expect(kept.series.rotatingAngleRad[k]).toBe(inZone ? full.series.rotatingAngleRad[k] : NaN);
        if (inZone) inside++; else outside++;
      }
    }
    expect(outside).toBeGreaterThan(100);
    expect(inside).toBeGreaterThan(100);
  });
});
