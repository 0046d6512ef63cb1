/**
 * ADES PSV reader on the hand-made fixture (test/fixtures/astrometry/ades-handmade.psv,
 * invented values written from the field definitions of the ADES Description, version 2017,
 * from memory; README there) and on small files written here.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { readAstrometryFile, UnreadableInputError } from '../../../src/io/index.js';
import { isoToJd } from '../fixtureCases.js';

const FIXTURE = fileURLToPath(new URL('../../fixtures/astrometry/ades-handmade.psv', import.meta.url));
const DEG = Math.PI / 180;
const KM_PER_AU = 149_597_870.7; // IAU 2012 Resolution B2

describe('ADES PSV hand-made fixture', async () => {
  const read = await readAstrometryFile(FIXTURE);
  const at = (line: number) => read.observations.find((o) => o.line === line);
  const reason = (line: number) => read.rejected.find((e) => e.line === line)?.message;

  it('is detected from its content and every line is accounted for', () => {
    expect(read.format).toBe('ades-psv');
    expect(read.adesVersion).toBe('2017');
    expect(read.lines).toBe(24);
    expect(read.skipped).toBe(14); // counted by hand: lines 1–9 ('#'/'!'), 10 (column names), 17 (blank), 18–19 ('#'/'!'), 20 (column names)
    expect(read.observations.map((o) => o.line)).toEqual([11, 12, 13, 21, 22, 23]);
    expect(read.rejected.map((e) => e.line)).toEqual([14, 15, 16, 24]);
    expect(read.linesRead).toBe(10);
    expect(read.kinds).toEqual({ optical: 3, space: 2, roving: 1 });
  });

  it('reads the fields of a full row (line 11)', () => {
    const o = at(11)!;
    expect(o.designation).toBe('(12893)');
    expect(o.provisional).toBe('1998 QS55');
    expect(o.timeJdUtc).toBeCloseTo(isoToJd('2010-06-07T03:12:34.56'), 9); // JD through astronomy-engine
    expect((o.timeJdTT - o.timeJdUtc) * 86_400).toBeCloseTo(66.184, 4); // 32.184 s + 34 s (IERS Bulletin C, 2009 Jan 1 on)
    expect(o.raRad / DEG).toBeCloseTo(172.554417, 12);
    expect(o.decRad / DEG).toBeCloseTo(3.488361, 12);
    expect([o.raDecimals, o.decDecimals]).toEqual([6, 6]);
    expect(o.raResolutionArcsec).toBeCloseTo(0.0036, 12); // 1e-6 degree
    expect([o.sigmaRaCosDecArcsec, o.sigmaDecArcsec, o.correlationRaDec]).toEqual([0.12, 0.11, -0.25]);
    expect([o.station, o.mode, o.catalogue, o.mag, o.band, o.kind]).toEqual(['G96', 'CCD', 'Gaia2', 17.9, 'G', 'optical']);
  });

  it('missing optional values are NaN or empty', () => {
    const o = at(12)!;
    expect(Number.isNaN(o.correlationRaDec) && Number.isNaN(o.mag)).toBe(true);
    expect(o.band).toBe('');
  });

  it('designations: a provID-only row joins its numbered body; a trkSub row is another body', () => {
    expect(at(12)!.designation).toBe('1998 QS55');
    expect(at(13)!.designation).toBe('Tmp1');
    expect(at(13)!.temporary).toBe(true);
    expect(read.designations.designations.map((d) => [d.designation, d.observations])).toEqual([['(12893)', 5], ['Tmp1', 1]]);
    expect(read.designations.mixed).toBe(true);
  });

  it('rejects bad rows with file, line, column and field', () => {
    expect(reason(14)).toBe(`${FIXTURE}:14:65: not a number: 'abc' (field ra)`);
    expect(reason(15)).toBe(`${FIXTURE}:15: 7 fields; the column header has 15`);
    expect(reason(16)).toBe(`${FIXTURE}:16:40: not an ISO 8601 UTC time: '2010-02-30T03:20:00Z' (field obsTime)`);
    expect(reason(24)).toBe(`${FIXTURE}:24:23: observer position centred on '10'; only the geocentre (399) is handled (field ctr)`);
  });

  it('observer positions of the second block: ICRF_KM, ICRF_AU (kept in km), WGS84', () => {
    expect(at(21)!.observerGeocentricKm).toEqual([-6490.4555, 2183.2275, 914.7962]);
    const au = at(22)!.observerGeocentricKm!;
    [-0.01234567, 0.00123456, -0.00012345].forEach((v, k) => expect(au[k]).toBeCloseTo(v * KM_PER_AU, 6));
    expect(at(23)!.rovingSite).toEqual({ longitudeDegE: 10.123456, latitudeDeg: 50.123456, altitudeM: 123 });
    expect(at(23)!.kind).toBe('roving');
  });
});

describe('ADES PSV files written here (invented rows)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-ades-'));
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  const write = (name: string, text: string) => {
    const path = join(dir, name);
    writeFileSync(path, text);
    return path;
  };

  it('a column header without a required field is a whole-file error naming what is missing', async () => {
    const path = write('nostn.psv', '# version=2017\npermID|obsTime|ra|dec\n1|2020-01-01T00:00:00Z|1|2\n');
    const err = await readAstrometryFile(path).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(UnreadableInputError);
    expect((err as Error).message).toBe(`${path}: line 2: ADES column header lacks stn`);
  });

  it('a header without any designation column says so', async () => {
    const path = write('noid.psv', 'obsTime|ra|dec|stn\n2020-01-01T00:00:00Z|1|2|500\n');
    const err = await readAstrometryFile(path).catch((e: unknown) => e);
    expect((err as Error).message).toBe(`${path}: line 1: ADES column header lacks permID or provID or trkSub`);
  });

  it('names match in any letter case; unknown columns are ignored; a TT time is refused', async () => {
    const path = write('case.psv', 'PERMID|obstime|RA|Dec|STN|extra\n433|2020-01-01T12:00:00Z|10.25|-5.5|500|x\n433|2020-01-01T12:00:00 TT|10.25|-5.5|500|x\n');
    const read = await readAstrometryFile(path);
    expect(read.observations.map((o) => [o.designation, o.station, o.raRad / DEG])).toEqual([['(433)', '500', 10.25]]);
    expect(read.rejected[0].message).toBe(`${path}:3:5: time scale TT; the standard gives UTC: '2020-01-01T12:00:00 TT' (field obsTime)`);
  });

  it('rejects an Earth-fixed observer system and a roving site out of range; gives no TT before 1972', async () => {
    const path = write('observers.psv', [
      'permID|obsTime|ra|dec|stn|sys|ctr|pos1|pos2|pos3',
      '433|2020-01-01T12:00:00Z|10.25|-5.5|C51|ITRF_KM|399|1|2|3',
      '433|2020-01-01T13:00:00Z|10.25|-5.5|247|WGS84||370|50.25|100',
      '433|1965-03-04T06:00:00Z|10.25|-5.5|500|||||',
    ].join('\n'));
    const read = await readAstrometryFile(path);
    expect(read.rejected.map((e) => e.reason)).toEqual([
      "observer coordinate system 'ITRF_KM' is not handled (ICRF_KM, ICRF_AU, WGS84 are) (field sys)",
      'roving site longitude 370, latitude 50.25 out of range (field pos1)',
    ]);
    const old = read.observations[0];
    expect(old.timeJdUtc).toBeCloseTo(isoToJd('1965-03-04T06:00:00'), 9);
    expect(Number.isNaN(old.timeJdTT)).toBe(true);
    expect(read.withoutTT).toBe(1);
  });
});
