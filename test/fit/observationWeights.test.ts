// Observation σ for the orbit fit (src/fit/observationWeights.ts). The values checked are the
// scheme's published sources as the file gives them: Vereš et al. 2017 (Icarus 296, 139)
// per-station CCD σ and 1.0″ default (from memory), 1.5″ / 3.0″ photographic after / before
// 1950 (from memory), √(N/4) per night beyond four (Vereš et al. 2017, from memory), the
// rounding floor unit/√12 (common practice). The records are invented.
import { describe, expect, it } from 'vitest';
import { observationSigmas, defaultSigmaArcsec } from '../../src/fit/observationWeights.js';
import type { AstrometryObservation, ObservatorySite } from '../../src/io/astrometry/types.js';

const J2000 = 2451545.0;

function record(over: Partial<AstrometryObservation>): AstrometryObservation {
  return {
    designation: '(1)', packed: '00001', number: 1, provisional: '', temporary: false,
    timeJdUtc: J2000, timeJdTT: J2000 + 64.184 / 86400, raRad: 1, decRad: 0.2,
    raDecimals: 2, decDecimals: 1, raResolutionArcsec: 0.15, decResolutionArcsec: 0.1,
    sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, correlationRaDec: NaN,
    station: 'XXX', kind: 'optical', observerGeocentricKm: null, rovingSite: null,
    mag: NaN, band: '', note1: '', note2: 'C', mode: '', catalogue: '', discovery: false,
    file: 'invented.txt', line: 1, lines: 1, ...over,
  };
}

const sites = new Map<string, ObservatorySite>([
  ['F51', { code: 'F51', longitudeDegE: 203.744, rhoCosPhiPrime: 0.9362, rhoSinPhiPrime: 0.3514, name: 'Pan-STARRS 1', fixedSite: true }],
  ['XXX', { code: 'XXX', longitudeDegE: 0, rhoCosPhiPrime: 0.7, rhoSinPhiPrime: 0.7, name: 'invented', fixedSite: true }],
]);

describe('default σ by technique, era and station', () => {
  it('survey CCD σ from the table, 1.0″ for other CCD stations, Catalina’s change in 2014', () => {
    expect(defaultSigmaArcsec(record({ station: 'F51' }))).toBe(0.2);
    expect(defaultSigmaArcsec(record({ station: 'G96' }))).toBe(0.5);
    expect(defaultSigmaArcsec(record({ station: 'XXX' }))).toBe(1.0);
    expect(defaultSigmaArcsec(record({ station: '703', timeJdUtc: J2000 + 10 * 365.25 }))).toBe(1.0);
    expect(defaultSigmaArcsec(record({ station: '703', timeJdUtc: J2000 + 16 * 365.25 }))).toBe(0.8);
    expect(defaultSigmaArcsec(record({ station: 'C51', kind: 'space', note2: 'S' }))).toBe(1.0);
    expect(defaultSigmaArcsec(record({ station: 'XXX', note2: '', mode: 'CCD' }))).toBe(1.0);
  });
  it('photographic: 1.5″ from 1950, 3.0″ before', () => {
    expect(defaultSigmaArcsec(record({ note2: '', timeJdUtc: 2437665.5 }))).toBe(1.5); // 1962
    expect(defaultSigmaArcsec(record({ note2: 'P', timeJdUtc: 2426342.5 }))).toBe(3.0); // 1931
  });
});

describe('observationSigmas', () => {
  it('takes the record’s rmsRA, rmsDec and correlation when given', () => {
    const [s] = observationSigmas([record({ sigmaRaCosDecArcsec: 0.12, sigmaDecArcsec: 0.09, correlationRaDec: -0.3 })], sites);
    expect(s.source).toBe('record');
    expect(s.sigmaRaCosDecArcsec).toBe(0.12);
    expect(s.sigmaDecArcsec).toBe(0.09);
    expect(s.correlation).toBe(-0.3);
  });
  it('never goes below the written precision (unit/√12): a position to 0.1 min of arc', () => {
    const [s] = observationSigmas([record({ station: 'F51', decResolutionArcsec: 6, raResolutionArcsec: 0.15 })], sites);
    expect(s.sigmaDecArcsec).toBeCloseTo(6 / Math.sqrt(12), 12);
    expect(s.sigmaRaCosDecArcsec).toBe(0.2);
  });
  it('nine observations of one station in one local night: each σ × √(9/4); four count in full', () => {
    // F51 at 203.7°E: local night key floor(JD + 0.566); 0.3 + 0.566 and 0.4 + 0.566 are the same night.
    const night = Array.from({ length: 9 }, (_, k) => record({ station: 'F51', timeJdUtc: J2000 + 0.3 + 0.01 * k }));
    const four = Array.from({ length: 4 }, (_, k) => record({ station: 'XXX', timeJdUtc: J2000 + 5.1 + 0.01 * k }));
    const s = observationSigmas([...night, ...four], sites);
    expect(s[0].nightCount).toBe(9);
    expect(s[0].sigmaDecArcsec).toBeCloseTo(0.2 * 1.5, 12);
    expect(s[9].nightCount).toBe(4);
    expect(s[9].sigmaDecArcsec).toBe(1.0);
    // The same nine split across the observer's local midnight are two nights.
    const split = Array.from({ length: 9 }, (_, k) => record({ station: 'F51', timeJdUtc: J2000 + 0.39 + 0.01 * k }));
    expect(observationSigmas(split, sites)[0].nightCount).toBeLessThan(9);
  });
});
