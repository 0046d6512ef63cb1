/**
 * The generator's places and noise: the true places against an independent propagation of the
 * same orbit (the core's propagateOrbit, integrated to each emission instant on its own), the
 * written-and-read residuals against the stated σ (χ² bands), the outlier count against its
 * binomial band, and determinism for a seed. Invented body, real station sites (fixtures.ts).
 */
import { describe, expect, it } from 'vitest';
import { C_AU_PER_DAY, GM_SUN_AU3_PER_DAY2 } from '../../../src/core/constants.js';
import { propagateTwoBody } from '../../../src/core/orbit/universal.js';
import { planetaryEphemerisOver, propagateOrbit } from '../../../src/core/propagate/propagateOrbit.js';
import { computeAstrometricPlace } from '../../../src/fit/astrometricPlace.js';
import { jdTTToTDB, observerHeliocentricState } from '../../../src/fit/observerPosition.js';
import { generateSyntheticAstrometry } from '../../../src/fit/synthetic/index.js';
import { formatObs80Record, Obs80Reader, type AstrometryObservation } from '../../../src/io/astrometry/index.js';
import { mainBeltRequest } from './fixtures.js';

const ARCSEC = Math.PI / 180 / 3600;
/** Two-sided 99.9% band of a χ² with k degrees of freedom by the normal approximation k ± 3.29 √(2k) (common practice). */
const chi2Band = (k: number): [number, number] => [k - 3.29 * Math.sqrt(2 * k), k + 3.29 * Math.sqrt(2 * k)];

function readBack(o: AstrometryObservation): AstrometryObservation {
  const out: AstrometryObservation[] = [];
  const r = new Obs80Reader('mem', (x) => out.push(x), (e) => { throw e; });
  formatObs80Record(o).forEach((l, k) => r.pushLine(l, k + 1));
  r.finish();
  return out[0];
}

describe('synthetic places and noise', () => {
  const request = mainBeltRequest({ count: 600 });
  const result = generateSyntheticAstrometry('2031 QK12', request);
  const obs = result.observations;

  it('puts the true place where an independent propagation of the orbit puts it (worst < 0.1 mas)', () => {
    const eph = planetaryEphemerisOver(request.startJdUtc - 2, request.endJdUtc + 2);
    const sites = new Map(request.stations.map((s) => [s.site.code, s.site]));
    let worst = 0;
    for (let k = 0; k < obs.length; k += 100) {
      const o = obs[k].observation;
      const s = sites.get(o.station)!;
      const jdTDB = jdTTToTDB(o.timeJdTT);
      const observer = observerHeliocentricState({ kind: 'site', longitudeDegE: s.longitudeDegE, rhoCosPhiPrime: s.rhoCosPhiPrime, rhoSinPhiPrime: s.rhoSinPhiPrime }, o.timeJdUtc, o.timeJdTT, eph);
      const emit = jdTDB - obs[k].distanceAu / C_AU_PER_DAY;
      const state = propagateOrbit(request.truth.elements, { toJdTDB: emit, nbody: true, relativity: true, distances: false }).state;
      const tmp = new Float64Array(6);
      const place = computeAstrometricPlace((t, out) => {
        propagateTwoBody(state, t - emit, GM_SUN_AU3_PER_DAY2, tmp);
        out.set(tmp);
      }, observer.positionIcrfAu, jdTDB);
      const d = Math.hypot((place.raRad - obs[k].trueRaRad) * Math.cos(place.decRad), place.decRad - obs[k].trueDecRad) / ARCSEC;
      worst = Math.max(worst, d);
    }
    console.log(`true places against propagateOrbit: worst ${(worst * 1000).toFixed(4)} mas`);
    expect(worst).toBeLessThan(1e-4); // measured 0.009 mas (2026-12-03): dense output against landing on the instant
  });

  it('gives written-and-read residuals whose spread matches each station\'s σ (χ², 99.9% band)', () => {
    const clean = obs.filter((o) => !o.outlier);
    for (const st of request.stations) {
      const mine = clean.filter((o) => o.observation.station === st.site.code);
      let chi2 = 0;
      for (const o of mine) {
        const b = readBack(o.observation);
        const dx = ((b.raRad - o.trueRaRad) * Math.cos(o.trueDecRad)) / ARCSEC;
        const dy = (b.decRad - o.trueDecRad) / ARCSEC;
        chi2 += (dx * dx + dy * dy) / (st.sigmaArcsec * st.sigmaArcsec);
      }
      const k = 2 * mine.length;
      const [lo, hi] = chi2Band(k);
      console.log(`${st.site.code}: ${mine.length} observations, sample σ / stated σ = ${Math.sqrt(chi2 / k).toFixed(3)} (band ${Math.sqrt(lo / k).toFixed(3)}–${Math.sqrt(hi / k).toFixed(3)})`);
      expect(mine.length).toBeGreaterThan(50);
      expect(chi2).toBeGreaterThan(lo);
      expect(chi2).toBeLessThan(hi);
    }
  });

  it('makes outliers at the stated rate (binomial, 99.9% band) and displaces them by 3–20″', () => {
    const outliers = obs.filter((o) => o.outlier);
    const n = obs.length, p = request.outlierRate;
    const sd = Math.sqrt(n * p * (1 - p));
    expect(outliers.length).toBeGreaterThan(n * p - 3.29 * sd);
    expect(outliers.length).toBeLessThan(n * p + 3.29 * sd);
    for (const o of outliers) {
      const b = readBack(o.observation);
      const d = Math.hypot((b.raRad - o.trueRaRad) * Math.cos(o.trueDecRad), b.decRad - o.trueDecRad) / ARCSEC;
      expect(d).toBeGreaterThan(3 - 0.02); // less the 80-column rounding (0.0075″, 0.005″)
      expect(d).toBeLessThan(20 + 0.02);
    }
  });

  it('gives the same numbers for the same seed and others for another seed', () => {
    const small = mainBeltRequest({ count: 40 }, 1);
    const a = generateSyntheticAstrometry('2031 QK12', small);
    const b = generateSyntheticAstrometry('2031 QK12', small);
    const c = generateSyntheticAstrometry('2031 QK12', { ...small, seed: small.seed + 1 });
    const lines = (r: typeof a) => r.observations.flatMap((o) => formatObs80Record(o.observation)).join('\n');
    expect(b).toEqual(a);
    expect(lines(b)).toBe(lines(a));
    expect(lines(c)).not.toBe(lines(a));
  });

  it('refuses a request it cannot honour', () => {
    expect(() => generateSyntheticAstrometry('x', mainBeltRequest({ count: 0 }))).toThrow(RangeError);
    expect(() => generateSyntheticAstrometry('x', mainBeltRequest({ startJdUtc: 2440000.5 }))).toThrow(/1972/);
    expect(() => generateSyntheticAstrometry('x', mainBeltRequest({ outlierRate: 2 }))).toThrow(RangeError);
    expect(() => generateSyntheticAstrometry('x', mainBeltRequest({ stations: [] }))).toThrow(RangeError);
  });
});
