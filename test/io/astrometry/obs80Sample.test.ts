/**
 * The real 80-column sample (test/fixtures/astrometry/README.md: 147 records of (12893),
 * astroquery test data) read in full: every line in an observation or rejected, and spot
 * values hand-read from the lines against the published column layout.
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { readAstrometryFile } from '../../../src/io/index.js';
import { isoToJd } from '../fixtureCases.js';

const SAMPLE = fileURLToPath(new URL('../../fixtures/astrometry/astrometry-80col-sample.txt', import.meta.url));
const DEG = Math.PI / 180;
const SECONDS_PER_DAY = 86_400;

/** Degrees of 'hh mm ss.s' and '±dd mm ss.s' as hand-read (sexagesimal arithmetic). */
const hms = (h: number, m: number, s: number) => (h + m / 60 + s / 3600) * 15;
const dms = (sign: number, d: number, m: number, s: number) => sign * (d + m / 60 + s / 3600);

describe('80-column sample of (12893)', async () => {
  const read = await readAstrometryFile(SAMPLE);
  const at = (line: number) => read.observations.find((o) => o.line === line)!;

  it('accounts for every line: 147 lines, 143 observations (139 one-line, 4 space-based pairs), none rejected', () => {
    // counts from the file itself: column 15 holds 2 blanks, 135 C, 2 c, 4 S and 4 s (cut -c15 | sort | uniq -c)
    expect(read.format).toBe('obs80');
    expect(read.lines).toBe(147);
    expect(read.linesRead).toBe(147);
    expect(read.skipped).toBe(0);
    expect(read.rejected).toEqual([]);
    expect(read.observations.length).toBe(143);
    expect(read.linesInObservations).toBe(147);
    expect(read.kinds).toEqual({ optical: 139, space: 4, roving: 0 });
    expect(read.withoutTT).toBe(0); // 1983–2010, all inside the leap-second table
  });

  it('reports one body: lines with a number and a provisional designation tie them together', () => {
    expect(read.designations.mixed).toBe(false);
    expect(read.designations.designations).toEqual([{ designation: '(12893)', observations: 143, firstLine: 1 }]);
  });

  it('line 1 (photographic, blank note 2): date, position with its precision, station', () => {
    // '12893J98Q55S   1983 10 08.40478 20 52 03.89 -15 47 20.0                 a3020413'
    const o = at(1);
    expect(o.designation).toBe('(12893)');
    expect(o.provisional).toBe('1998 QS55'); // J98Q55S: 1998, half-month Q, cycle 55, letter S
    expect(o.note2).toBe('');
    expect(o.timeJdUtc).toBeCloseTo(isoToJd('1983-10-08') + 0.40478, 8); // JD through astronomy-engine
    // TT − UTC = 32.184 s + TAI − UTC, 22 s from 1983 Jul 1 (IERS Bulletin C)
    expect((o.timeJdTT - o.timeJdUtc) * SECONDS_PER_DAY).toBeCloseTo(54.184, 4);
    expect(o.raRad / DEG).toBeCloseTo(hms(20, 52, 3.89), 10);
    expect(o.decRad / DEG).toBeCloseTo(dms(-1, 15, 47, 20.0), 10);
    expect([o.raDecimals, o.decDecimals]).toEqual([2, 1]);
    expect(o.raResolutionArcsec).toBeCloseTo(0.15, 12); // 0.01 s of time = 0.15″
    expect(o.decResolutionArcsec).toBeCloseTo(0.1, 12);
    expect(o.station).toBe('413');
    expect(Number.isNaN(o.mag)).toBe(true);
    expect(Number.isNaN(o.sigmaRaCosDecArcsec)).toBe(true); // the format states no uncertainty
    expect(o.kind).toBe('optical');
  });

  it('line 2: a program code in note 1 (column 14)', () => {
    // '12893J93S07X 4 1993 09 22.32396 00 48 37.27 +05 04 22.2                 23940809'
    const o = at(2);
    expect(o.note1).toBe('4');
    expect(o.provisional).toBe('1993 SX7');
    expect(o.station).toBe('809');
    expect(o.decRad / DEG).toBeCloseTo(dms(1, 5, 4, 22.2), 10);
  });

  it('lines 3 and 8: magnitude, band, catalogue code; note 2 C and c', () => {
    // '12893J98Q55S  C1996 04 22.50120 13 01 48.37 -05 34 34.3          18.7 Vca3812566'
    const a = at(3);
    expect([a.note2, a.mag, a.band, a.catalogue, a.station]).toEqual(['C', 18.7, 'V', 'c', '566']);
    // '12893         c2000 01 30.27691 09 19 12.24 +12 48 55.9          18.0 Rdb0649703'
    const b = at(8);
    expect([b.note2, b.mag, b.band, b.catalogue, b.station, b.packed, b.provisional]).toEqual(['c', 18, 'R', 'd', '703', '12893', '']);
  });

  it('lines 79–80: a space-based pair, observer position in km from the s line', () => {
    // '12893         S2010 06 07.03243911 30 13.06 +03 29 18.1                L~0IsfC51'
    // '12893         s2010 06 07.0324391 - 6490.4555 + 2183.2275 +  914.7962   ~0IsfC51'
    const o = at(79);
    expect(o.kind).toBe('space');
    expect(o.lines).toBe(2);
    expect(o.station).toBe('C51');
    expect(o.catalogue).toBe('L');
    expect(o.observerGeocentricKm).toEqual([-6490.4555, 2183.2275, 914.7962]);
    expect(o.timeJdUtc).toBeCloseTo(isoToJd('2010-06-07') + 0.032439, 8);
    // TAI − UTC = 34 s from 2009 Jan 1 (IERS Bulletin C)
    expect((o.timeJdTT - o.timeJdUtc) * SECONDS_PER_DAY).toBeCloseTo(66.184, 4);
    expect(o.raRad / DEG).toBeCloseTo(hms(11, 30, 13.06), 10);
    expect(o.decRad / DEG).toBeCloseTo(dms(1, 3, 29, 18.1), 10);
    expect(read.observations.some((x) => x.line === 80)).toBe(false); // the s line is part of line 79's observation
    expect(at(85).observerGeocentricKm).toEqual([-6506.6911, 2138.518, 906.5163]);
  });
});
