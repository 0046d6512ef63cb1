// Residual means per station: the weighted mean and its standard error (Bevington & Robinson
// 2003, Data Reduction and Error Analysis, 3rd ed., eqs. 4.17 and 4.19; equation numbers from
// memory), the χ² with 2 degrees of freedom whose tail is exp(−χ²/2) (common practice), on
// invented residuals (synthetic: one station offset by a known amount).
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { stationMeans } from '../../../src/fit/models/stationMeans.js';

function gaussian(random: () => number): number {
  // Box–Muller (common practice).
  const u = 1 - random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
}

describe('stationMeans', () => {
  it('weighted mean, its error from the weights, and the 2-dof tail', () => {
    // Two observations of 0.2″ and 0.5″ with σ 0.1″ and 0.2″: weights 100 and 25.
    const r = stationMeans({
      station: ['F51', 'F51'], raCosDecArcsec: [0.2, 0.5], decArcsec: [0, 0],
      sigmaRaArcsec: [0.1, 0.2], sigmaDecArcsec: [0.1, 0.2],
    });
    const s = r.stations[0];
    expect(s.ra.meanArcsec).toBeCloseTo((100 * 0.2 + 25 * 0.5) / 125, 14);
    // Scatter: Σw(r − m)² = 100·0.06² + 25·0.24² = 1.8 → √(1.8/125) = 0.12 > 1/√125 = 0.0894.
    expect(s.ra.standardErrorArcsec).toBeCloseTo(0.12, 12);
    expect(s.chiSquare).toBeCloseTo((0.26 / 0.12) ** 2, 10);
    expect(s.pValue).toBeCloseTo(Math.exp(-s.chiSquare / 2), 14);
  });
  it('uses the weights alone when the scatter is smaller', () => {
    const r = stationMeans({
      station: ['703', '703', '703'], raCosDecArcsec: [0.1, 0.1, 0.1], decArcsec: [0, 0, 0],
      sigmaRaArcsec: [0.5, 0.5, 0.5], sigmaDecArcsec: [0.5, 0.5, 0.5],
    });
    expect(r.stations[0].ra.standardErrorArcsec).toBeCloseTo(0.5 / Math.sqrt(3), 14);
  });
  it('flags the one station offset by 0.3″ among unbiased ones, in code order', () => {
    const random = seededRandom(2026);
    const station: string[] = [], ra: number[] = [], dec: number[] = [], sig: number[] = [];
    for (const code of ['G96', '691', 'F51', 'T05']) {
      for (let i = 0; i < 50; i++) {
        station.push(code);
        ra.push(0.3 * gaussian(random) + (code === 'T05' ? 0.3 : 0));
        dec.push(0.3 * gaussian(random));
        sig.push(0.3);
      }
    }
    const r = stationMeans({ station, raCosDecArcsec: ra, decArcsec: dec, sigmaRaArcsec: sig, sigmaDecArcsec: sig });
    expect(r.stations.map((s) => s.station)).toEqual(['691', 'F51', 'G96', 'T05']);
    expect(r.stations.filter((s) => s.biased).map((s) => s.station)).toEqual(['T05']);
    const t05 = r.stations[3];
    // Offset 0.3″ over 0.3″/√50 = 7.1σ expected.
    expect(t05.ra.z).toBeGreaterThan(4.5);
    expect(t05.pValueAllStations).toBeCloseTo(Math.min(1, 4 * t05.pValue), 14);
  });
  it('follows the threshold given', () => {
    // One station, mean 0.1″ over an error of 0.05″: z = 2, χ² = 4, p = exp(−2) = 0.135.
    const res = {
      station: ['A', 'A', 'A', 'A'], raCosDecArcsec: [0.1, 0.1, 0.1, 0.1], decArcsec: [0, 0, 0, 0],
      sigmaRaArcsec: [0.1, 0.1, 0.1, 0.1], sigmaDecArcsec: [0.1, 0.1, 0.1, 0.1],
    };
    expect(stationMeans(res).stations[0].pValue).toBeCloseTo(Math.exp(-2), 14);
    expect(stationMeans(res).stations[0].biased).toBe(false);
    expect(stationMeans(res, 0.2).stations[0].biased).toBe(true);
    expect(() => stationMeans(res, 0)).toThrow(RangeError);
  });
  it('counts the observations it cannot use', () => {
    const r = stationMeans({
      station: ['A', 'A', 'A'], raCosDecArcsec: [0.1, NaN, 0.2], decArcsec: [0, 0, 0],
      sigmaRaArcsec: [0.5, 0.5, 0], sigmaDecArcsec: [0.5, 0.5, 0.5],
    });
    expect(r.skipped).toBe(2);
    expect(r.stations[0].n).toBe(1);
  });
  it('refuses columns of different lengths', () => {
    expect(() => stationMeans({ station: ['A'], raCosDecArcsec: [], decArcsec: [0], sigmaRaArcsec: [1], sigmaDecArcsec: [1] }))
      .toThrow(RangeError);
  });
});
