/**
 * The 80-column writer against the reader: every real line of the (12893) sample
 * (test/fixtures/astrometry/README.md: astroquery test data) written back byte for byte from
 * what the reader gives, and random observations (fast-check) written, read and written again.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  formatDeclination, formatObs80Date, formatObs80Record, formatRightAscension, Obs80Reader, readAstrometryFile,
  type AstrometryObservation, type InputError,
} from '../../../src/io/index.js';

const SAMPLE = fileURLToPath(new URL('../../fixtures/astrometry/astrometry-80col-sample.txt', import.meta.url));
const DEG = Math.PI / 180;
const ARCSEC = DEG / 3600;

/** Observations of a list of lines through the reader (throws on any rejection). */
function readLines(lines: readonly string[]): AstrometryObservation[] {
  const out: AstrometryObservation[] = [];
  const errors: InputError[] = [];
  const r = new Obs80Reader('mem', (o) => out.push(o), (e) => errors.push(e));
  lines.forEach((l, k) => r.pushLine(l, k + 1));
  r.finish();
  if (errors.length > 0) throw new Error(errors.map((e) => e.message).join('; '));
  return out;
}

describe('80-column writer on the real sample', async () => {
  const text = readFileSync(SAMPLE, 'utf8').split('\n').filter((l) => l !== '');
  const read = await readAstrometryFile(SAMPLE);

  it('writes every record back to its own line(s), byte for byte (147 lines, 143 records)', () => {
    let written = 0;
    for (const o of read.observations) {
      const src = text.slice(o.line - 1, o.line - 1 + o.lines);
      const dayText = src[0].slice(23, 32).trim(); // the line's own date precision (columns 24–32)
      const magText = src[0].slice(65, 70).trim(); // and magnitude decimals (66–70)
      const lines = formatObs80Record(o, {
        dateDecimals: (dayText.length - 3) as 5 | 6,
        magDecimals: magText.includes('.') ? (magText.length - magText.indexOf('.') - 1) as 1 | 2 : 1,
        reference: src[0].slice(72, 77), // columns 73–77: the reader does not keep them
      });
      expect(lines).toEqual(src);
      written += lines.length;
    }
    expect(written).toBe(147);
  });

  it('format → parse → format is the identity on every sample record at the default options', () => {
    for (const o of read.observations) {
      const once = formatObs80Record(o);
      const twice = formatObs80Record(readLines(once)[0]);
      expect(twice).toEqual(once);
    }
  });
});

describe('sexagesimal and date fields', () => {
  it('carry rounding upwards instead of writing 60', () => {
    // 23h 59m 59.9996s rounds to 24h: wraps to 00 00 00.000 (common practice: RA in [0, 24) h)
    expect(formatRightAscension(23 + 59 / 60 + 59.9996 / 3600, 3)).toBe('00 00 00.000');
    expect(formatRightAscension(1 + 59 / 60 + 59.996 / 3600, 2)).toBe('02 00 00.00');
    expect(formatDeclination(-(10 + 59 / 60 + 59.996 / 3600), 2)).toBe('-11 00 00.00');
    expect(formatDeclination(-0.000001, 1)).toBe('+00 00 00.0'); // −0.0036″ rounds to zero: no '−00'
    expect(formatRightAscension(12.5, 3, 'minutes')).toBe('12 30.000');
    // 2000 Jan 1.9999996 UTC at 6 decimals is Jan 2.000000 (JD 2451545.5 is 2000 Jan 2.0, Meeus ch. 7)
    expect(formatObs80Date(2451545.5 - 0.0000004, 6)).toBe('2000 01 02.000000');
    expect(formatObs80Date(2451545.0, 5)).toBe('2000 01 01.50000 ');
  });

  it('refuses what the columns cannot hold', () => {
    const base = readLines(['12893         C2001 04 16.29723 14 38 24.44 -13 35 51.9          18.0 Rcc9757699'])[0];
    expect(() => formatObs80Record({ ...base, station: '69' })).toThrow(RangeError);
    expect(() => formatObs80Record({ ...base, raResolutionArcsec: 0.0015 })).toThrow(/RA resolution/); // 0.0001 s: four decimals
    expect(() => formatObs80Record({ ...base, kind: 'roving' })).toThrow(TypeError);
    expect(() => formatObs80Record({ ...base, mag: 1000.5 })).toThrow(/magnitude/);
    expect(() => formatObs80Record({ ...base, note2: 'S' })).toThrow(/two-line/);
  });
});

// Random observations: designations of each written kind, times 1972–2099, any sky position,
// the precisions the columns hold. Invented values (synthetic test).
const designationArb = fc.oneof(
  fc.integer({ min: 1, max: 15_396_335 }).map((n) => ({ designation: `(${n})`, number: n, provisional: '', temporary: false })),
  fc.tuple(fc.integer({ min: 1, max: 15_396_335 }), fc.integer({ min: 1900, max: 2099 }), fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 24 }), fc.integer({ min: 0, max: 619 }))
    .map(([n, y, h, l, c]) => ({ designation: `(${n})`, number: n, provisional: `${y} ${'ABCDEFGHJKLMNOPQRSTUVWXY'[h]}${'ABCDEFGHJKLMNOPQRSTUVWXYZ'[l]}${c > 0 ? c : ''}`, temporary: false })),
  // cycle counts past 619 only in the extended form's years 2000–2061 (src/io/README.md)
  fc.tuple(fc.integer({ min: 2000, max: 2061 }), fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 24 }), fc.integer({ min: 0, max: 2000 }))
    .map(([y, h, l, c]) => {
      const d = `${y} ${'ABCDEFGHJKLMNOPQRSTUVWXY'[h]}${'ABCDEFGHJKLMNOPQRSTUVWXYZ'[l]}${c > 0 ? c : ''}`;
      return { designation: d, number: NaN, provisional: d, temporary: false };
    }),
  fc.stringMatching(/^[A-Z][A-Za-z0-9]{5,6}$/).map((t) => ({ designation: t, number: NaN, provisional: '', temporary: true })),
  fc.tuple(fc.integer({ min: 1, max: 9999 }), fc.constantFrom('P', 'D')).map(([n, t]) => ({ designation: `${n}${t}`, number: n, provisional: '', temporary: false })),
  fc.tuple(fc.constantFrom('C', 'P'), fc.integer({ min: 1900, max: 2099 }), fc.integer({ min: 0, max: 23 }), fc.integer({ min: 1, max: 99 }))
    .map(([t, y, h, c]) => ({ designation: `${t}/${y} ${'ABCDEFGHJKLMNOPQRSTUVWXY'[h]}${c}`, number: NaN, provisional: '', temporary: false })),
);

const observationArb = fc.record({
  id: designationArb,
  jdUtc: fc.double({ min: 2441317.5, max: 2488069.4, noNaN: true }), // 1972 Jan 1 – 2099 Dec 31
  raRad: fc.double({ min: 0, max: 2 * Math.PI - 1e-9, noNaN: true }),
  decRad: fc.double({ min: -Math.PI / 2, max: Math.PI / 2, noNaN: true }),
  raDecimals: fc.integer({ min: 0, max: 3 }),
  decDecimals: fc.integer({ min: 0, max: 2 }),
  dateDecimals: fc.constantFrom(5 as const, 6 as const),
  mag: fc.oneof(fc.constant(NaN), fc.double({ min: 5, max: 30, noNaN: true })),
  band: fc.constantFrom('', 'V', 'R', 'G', 'o', 'c', 'w'),
  note2: fc.constantFrom('', 'C', 'P', 'c', 'e', 'T'),
  station: fc.stringMatching(/^[0-9A-Z]{3}$/),
  space: fc.option(fc.tuple(fc.double({ min: -2e6, max: 2e6, noNaN: true }), fc.double({ min: -2e6, max: 2e6, noNaN: true }), fc.double({ min: -2e6, max: 2e6, noNaN: true })), { nil: null }),
});

describe('80-column writer: random observations', () => {
  it('read back within half a written unit, and written again identically', () => {
    fc.assert(fc.property(observationArb, (g) => {
      const obs = {
        ...g.id, discovery: false, note1: '', note2: g.note2, timeJdUtc: g.jdUtc, raRad: g.raRad, decRad: g.decRad,
        raResolutionArcsec: 15 / 10 ** g.raDecimals, decResolutionArcsec: 1 / 10 ** g.decDecimals,
        mag: g.mag, band: g.band, catalogue: '', station: g.station,
        kind: g.space === null ? 'optical' as const : 'space' as const, observerGeocentricKm: g.space,
      };
      const lines = formatObs80Record(obs, { dateDecimals: g.dateDecimals });
      expect(lines.length).toBe(g.space === null ? 1 : 2);
      const back = readLines(lines)[0];
      expect(back.designation).toBe(obs.designation);
      // half a unit of the last decimal, plus a JD's own rounding (4.7e-10 d)
      expect(Math.abs(back.timeJdUtc - obs.timeJdUtc)).toBeLessThanOrEqual(0.5 * 10 ** -g.dateDecimals + 1e-9);
      const dRa = Math.abs(((back.raRad - obs.raRad + 3 * Math.PI) % (2 * Math.PI)) - Math.PI);
      expect(dRa / ARCSEC).toBeLessThanOrEqual(0.5 * obs.raResolutionArcsec + 1e-6);
      expect(Math.abs(back.decRad - obs.decRad) / ARCSEC).toBeLessThanOrEqual(0.5 * obs.decResolutionArcsec + 1e-6);
      expect(back.raResolutionArcsec).toBeCloseTo(obs.raResolutionArcsec, 12);
      expect(back.decResolutionArcsec).toBeCloseTo(obs.decResolutionArcsec, 12);
      if (Number.isNaN(g.mag)) expect(back.mag).toBeNaN();
      else expect(Math.abs(back.mag - g.mag)).toBeLessThanOrEqual(0.05 + 1e-9);
      expect(back.station).toBe(g.station);
      expect(back.note2).toBe(g.space === null ? g.note2 : 'S');
      if (g.space !== null) {
        // km with 4 decimals below 1e5 km, else au with 8 decimals (1.5 km)
        const inKm = g.space.every((v) => Math.abs(v) < 99_999.99995); // all three, or all in au
        for (let k = 0; k < 3; k++) expect(Math.abs(back.observerGeocentricKm![k] - g.space[k])).toBeLessThanOrEqual(inKm ? 5e-5 + 1e-8 : 0.75);
      }
      expect(formatObs80Record(back, { dateDecimals: g.dateDecimals })).toEqual(lines);
    }), { numRuns: 2000 });
  });
});
