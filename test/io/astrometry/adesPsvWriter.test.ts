/**
 * The ADES PSV writer against the project's ADES reader: the real 80-column sample of (12893)
 * (test/fixtures/astrometry/README.md) written as PSV and read back, and random observations
 * (fast-check) written, read and written again byte for byte.
 */
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  AdesPsvReader, degreeDecimalsFor, formatAdesPsv, readAstrometryFile, type AstrometryObservation, type InputError,
} from '../../../src/io/index.js';

const SAMPLE = fileURLToPath(new URL('../../fixtures/astrometry/astrometry-80col-sample.txt', import.meta.url));
const ARCSEC = Math.PI / 180 / 3600;

function readPsv(text: string): { obs: AstrometryObservation[]; errors: InputError[]; version: string } {
  const obs: AstrometryObservation[] = [];
  const errors: InputError[] = [];
  const r = new AdesPsvReader('mem.psv', (o) => obs.push(o), (e) => errors.push(e));
  text.split('\n').forEach((l, k) => r.pushLine(l, k + 1));
  return { obs, errors, version: r.counts.version };
}

describe('ADES PSV writer on the real sample', async () => {
  const read = await readAstrometryFile(SAMPLE);
  const header = [{ keyword: 'observatory', entries: [['mpcCode', '704']] as const }, { keyword: 'submitter', entries: [['name', 'A. Tester']] as const }];
  const text = formatAdesPsv(read.observations, { header });
  const back = readPsv(text);

  it('writes the header keywords, one column-name line and one row an observation', () => {
    const lines = text.trimEnd().split('\n');
    expect(lines.slice(0, 5)).toEqual(['# version=2017', '# observatory', '! mpcCode 704', '# submitter', '! name A. Tester']);
    expect(lines.length).toBe(5 + 1 + 143);
    expect(back.version).toBe('2017');
    expect(back.errors).toEqual([]);
    expect(back.obs.length).toBe(143);
  });

  it('reads back each position within half a written unit, times within 0.5 ms, the space-based observers to 5e-5 km', () => {
    let worstArcsec = 0;
    read.observations.forEach((o, k) => {
      const b = back.obs[k];
      expect(b.designation).toBe('(12893)');
      expect(b.station).toBe(o.station);
      expect(Math.abs(b.timeJdUtc - o.timeJdUtc) * 86_400).toBeLessThanOrEqual(5e-4 + 1e-4); // ms, plus a JD's rounding (40 µs)
      const dRa = Math.abs(b.raRad - o.raRad) / ARCSEC;
      const dDec = Math.abs(b.decRad - o.decRad) / ARCSEC;
      expect(dRa).toBeLessThanOrEqual(0.5 * 3600 / 10 ** degreeDecimalsFor(o.raResolutionArcsec) + 1e-9);
      expect(dDec).toBeLessThanOrEqual(0.5 * 3600 / 10 ** degreeDecimalsFor(o.decResolutionArcsec) + 1e-9);
      worstArcsec = Math.max(worstArcsec, dRa, dDec);
      expect(b.kind).toBe(o.kind);
      if (o.kind === 'space') for (let j = 0; j < 3; j++) expect(Math.abs(b.observerGeocentricKm![j] - o.observerGeocentricKm![j])).toBeLessThanOrEqual(5e-5 + 1e-9);
      if (Number.isNaN(o.mag)) expect(b.mag).toBeNaN();
      else expect(Math.abs(b.mag - o.mag)).toBeLessThanOrEqual(0.05 + 1e-9);
    });
    // 0.01 s of RA (0.15″) → 5 decimals of a degree (0.036″): the worst rounding is 0.018″
    expect(worstArcsec).toBeLessThan(0.0181);
  });

  it('format → parse → format is the identity', () => {
    expect(formatAdesPsv(back.obs, { header })).toBe(text);
  });
});

const observationArb = fc.record({
  id: fc.oneof(
    fc.integer({ min: 1, max: 15_396_335 }).map((n) => ({ designation: `(${n})`, number: n, provisional: '', temporary: false })),
    fc.constantFrom('2031 QK12', '2030 AB', 'C/2031 A4').map((d) => ({ designation: d, number: NaN, provisional: d, temporary: false })),
    fc.stringMatching(/^[A-Z][A-Za-z0-9]{3,7}$/).map((t) => ({ designation: t, number: NaN, provisional: '', temporary: true })),
  ),
  jdUtc: fc.double({ min: 2441317.5, max: 2488069.4, noNaN: true }),
  raRad: fc.double({ min: 0, max: 2 * Math.PI - 1e-9, noNaN: true }),
  decRad: fc.double({ min: -Math.PI / 2, max: Math.PI / 2, noNaN: true }),
  sigma: fc.tuple(fc.double({ min: 0.01, max: 5, noNaN: true }), fc.double({ min: 0.01, max: 5, noNaN: true })),
  station: fc.stringMatching(/^[0-9A-Z]{3}$/),
});

describe('ADES PSV writer: random observations', () => {
  it('read back within the written precision and written again identically', () => {
    fc.assert(fc.property(fc.array(observationArb, { minLength: 1, maxLength: 5 }), (gs) => {
      const obs = gs.map((g) => ({
        ...g.id, timeJdUtc: g.jdUtc, raRad: g.raRad, decRad: g.decRad, raResolutionArcsec: 0.0036, decResolutionArcsec: 0.0036,
        sigmaRaCosDecArcsec: g.sigma[0], sigmaDecArcsec: g.sigma[1], correlationRaDec: NaN, station: g.station,
        mode: 'CCD', catalogue: 'Gaia2', mag: NaN, band: '', kind: 'optical' as const, observerGeocentricKm: null,
      }));
      const text = formatAdesPsv(obs);
      const back = readPsv(text);
      expect(back.errors).toEqual([]);
      expect(back.obs.length).toBe(obs.length);
      back.obs.forEach((b, k) => {
        const o = obs[k];
        expect(b.designation).toBe(o.designation);
        expect(b.temporary).toBe(o.temporary);
        expect(Math.abs(b.timeJdUtc - o.timeJdUtc) * 86_400).toBeLessThanOrEqual(6e-4);
        const dRa = Math.abs(((b.raRad - o.raRad + 3 * Math.PI) % (2 * Math.PI)) - Math.PI) / ARCSEC;
        expect(dRa).toBeLessThanOrEqual(0.0018 + 1e-9); // 6 decimals of a degree: half a unit is 0.0018″
        expect(Math.abs(b.decRad - o.decRad) / ARCSEC).toBeLessThanOrEqual(0.0018 + 1e-9);
        expect(Math.abs(b.sigmaRaCosDecArcsec - o.sigmaRaCosDecArcsec)).toBeLessThanOrEqual(5e-4 + 1e-12);
        expect(b.mode).toBe('CCD');
        expect(b.catalogue).toBe('Gaia2');
      });
      expect(formatAdesPsv(back.obs)).toBe(text);
    }), { numRuns: 500 });
  });

  it('refuses a roving observer and a cell holding a bar', () => {
    const o = { designation: '2030 AB', number: NaN, provisional: '2030 AB', temporary: false, timeJdUtc: 2462000.5, raRad: 1, decRad: 0.1,
      raResolutionArcsec: 0.0036, decResolutionArcsec: 0.0036, sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, correlationRaDec: NaN,
      station: '568', mode: 'CCD', catalogue: '', mag: NaN, band: '', kind: 'optical' as const, observerGeocentricKm: null };
    expect(() => formatAdesPsv([{ ...o, kind: 'roving' }])).toThrow(TypeError);
    expect(() => formatAdesPsv([{ ...o, catalogue: 'a|b' }])).toThrow(/'\|'/);
  });
});
