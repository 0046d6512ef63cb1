/**
 * The generator's cadence: every observation satisfies the visibility rules when the Sun's and
 * the body's altitudes and the solar elongation are recomputed with astronomy-engine (an
 * independent reference library: its own Earth rotation, precession and solar ephemeris), and
 * tracklets follow the stated layout. Invented body, real station sites (fixtures.ts).
 */
import * as Astronomy from 'astronomy-engine';
import { describe, expect, it } from 'vitest';
import { generateSyntheticAstrometry } from '../../../src/fit/synthetic/index.js';
import type { ObservatorySite } from '../../../src/io/astrometry/types.js';
import { mainBeltRequest } from './fixtures.js';

const DEG = 180 / Math.PI;
const WGS84_F = 1 / 298.257223563; // WGS84 flattening (NIMA TR8350.2)

/** astronomy-engine observer of a site: geodetic latitude from the geocentric one (tan φ = tan φ′ / (1 − f)², sea level; common practice). */
function observerOf(s: ObservatorySite): Astronomy.Observer {
  const geocentric = Math.atan2(s.rhoSinPhiPrime, s.rhoCosPhiPrime);
  const geodetic = Math.atan(Math.tan(geocentric) / (1 - WGS84_F) ** 2);
  const lon = s.longitudeDegE > 180 ? s.longitudeDegE - 360 : s.longitudeDegE;
  return new Astronomy.Observer(geodetic * DEG, lon, 0);
}

describe('synthetic cadence', () => {
  const request = mainBeltRequest();
  const result = generateSyntheticAstrometry('2031 QK12', request);
  const obs = result.observations;

  it('places exactly the requested count, in time order, on the 1e-6 day grid', () => {
    expect(result.shortBy).toBe(0);
    expect(obs.length).toBe(200);
    for (let k = 1; k < obs.length; k++) expect(obs[k].observation.timeJdUtc).toBeGreaterThanOrEqual(obs[k - 1].observation.timeJdUtc);
    for (const o of obs) {
      const frac = (o.observation.timeJdUtc - 0.5) * 1e6;
      expect(Math.abs(frac - Math.round(frac))).toBeLessThan(2e-3); // a JD keeps 4.7e-10 d: 4.7e-4 of a grid unit
    }
  });

  it('observes only when astronomy-engine agrees the Sun is down, the body up and far from the Sun', () => {
    const sites = new Map(request.stations.map((s) => [s.site.code, s.site]));
    let worstSun = -90, worstBody = 90, worstElong = 180, worstDiff = 0;
    for (const o of obs) {
      const s = sites.get(o.observation.station)!;
      const observer = observerOf(s);
      const time = Astronomy.MakeTime(o.observation.timeJdUtc - 2451545.0); // UT ≈ UTC (< 0.9 s)
      const sun = Astronomy.Equator(Astronomy.Body.Sun, time, observer, true, true);
      const sunAlt = Astronomy.Horizon(time, observer, sun.ra, sun.dec).altitude;
      // the body's astrometric J2000 place turned to the equator of date
      const vJ2000 = Astronomy.VectorFromSphere(new Astronomy.Spherical(o.trueDecRad * DEG, o.trueRaRad * DEG, 1), time);
      const ofDate = Astronomy.EquatorFromVector(Astronomy.RotateVector(Astronomy.Rotation_EQJ_EQD(time), vJ2000));
      const bodyAlt = Astronomy.Horizon(time, observer, ofDate.ra, ofDate.dec).altitude;
      const sunJ2000 = Astronomy.Equator(Astronomy.Body.Sun, time, observer, false, false);
      const elong = Astronomy.AngleBetween(sunJ2000.vec, vJ2000);
      worstSun = Math.max(worstSun, sunAlt);
      worstBody = Math.min(worstBody, bodyAlt);
      worstElong = Math.min(worstElong, elong);
      worstDiff = Math.max(worstDiff, Math.abs(sunAlt - o.sunAltitudeDeg), Math.abs(bodyAlt - o.bodyAltitudeDeg), Math.abs(elong - o.solarElongationDeg));
    }
    // the generator's geometry: geocentric zenith (≤ 0.19°), no refraction (astronomy-engine
    // Horizon without refraction here), geometric directions; measured worst 0.18° (2026-12-03)
    expect(worstDiff).toBeLessThan(0.4);
    expect(worstSun).toBeLessThan(-12 + 0.4);
    expect(worstBody).toBeGreaterThan(20 - 0.4);
    expect(worstElong).toBeGreaterThan(70 - 0.4);
    console.log(`cadence: worst Sun altitude ${worstSun.toFixed(2)}°, body altitude ${worstBody.toFixed(2)}°, elongation ${worstElong.toFixed(2)}°, worst geometry difference ${worstDiff.toFixed(3)}°`);
  });

  it('lays out tracklets: one station a night, 2–5 observations 20–30 min apart', () => {
    const byTracklet = new Map<number, typeof obs>();
    for (const o of obs) byTracklet.set(o.tracklet, [...(byTracklet.get(o.tracklet) ?? []), o]);
    expect(byTracklet.size).toBe(result.tracklets);
    for (const t of byTracklet.values()) {
      expect(new Set(t.map((o) => o.observation.station)).size).toBe(1);
      expect(t.length).toBeGreaterThanOrEqual(2);
      expect(t.length).toBeLessThanOrEqual(5);
      for (let k = 1; k < t.length; k++) {
        const minutes = (t[k].observation.timeJdUtc - t[k - 1].observation.timeJdUtc) * 1440;
        expect(minutes).toBeGreaterThanOrEqual(20 - 0.0015); // two times rounded to 1e-6 d (0.0864 s each)
        expect(minutes).toBeLessThanOrEqual(30 + 0.0015);
      }
    }
  });

  it('spreads the nights: more than one apparition, many distinct nights in each', () => {
    expect(result.apparitions).toBeGreaterThanOrEqual(2); // 2 years of a main-belt body: two oppositions
    const nights = new Set(obs.map((o) => Math.floor(o.observation.timeJdUtc)));
    expect(nights.size).toBeGreaterThan(30);
    const apparitionsSeen = new Set(obs.map((o) => o.apparition));
    expect(apparitionsSeen.size).toBe(result.apparitions);
  });

  it('keeps a station to its years', () => {
    const s0 = request.stations[0];
    const cut = request.startJdUtc + 365.25;
    const r = generateSyntheticAstrometry('2031 QK12', mainBeltRequest({ stations: [{ ...s0, toJdUtc: cut }, request.stations[1]], count: 80 }));
    const f51 = r.observations.filter((o) => o.observation.station === 'F51');
    expect(f51.length).toBeGreaterThan(0);
    for (const o of f51) expect(o.observation.timeJdUtc).toBeLessThan(cut + 1);
  });
});
