/**
 * Synthetic cases of the 80-column reader on invented records
 * (test/fixtures/astrometry/obs80-invented.txt, README there): what each kind of line
 * becomes. Columns and codes: published format description (satellite-based second line
 * checked; roving second line and note 2 codes from memory).
 */
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { Obs80Reader, readAstrometryFile } from '../../../src/io/index.js';

const INVENTED = fileURLToPath(new URL('../../fixtures/astrometry/obs80-invented.txt', import.meta.url));
const KM_PER_AU = 149_597_870.7; // IAU 2012 Resolution B2

describe('80-column reader on invented records', async () => {
  const read = await readAstrometryFile(INVENTED);
  const at = (line: number) => read.observations.find((o) => o.line === line);
  const reason = (line: number) => read.rejected.find((e) => e.line === line)?.message;

  it('accounts for all 22 lines: 2 skipped, 8 observations on 10 lines, 10 rejected', () => {
    expect(read.lines).toBe(22);
    expect(read.skipped).toBe(2); // 'COD G96' header line and a blank line
    expect(read.observations.map((o) => o.line)).toEqual([2, 3, 6, 12, 13, 14, 15, 18]);
    expect(read.linesInObservations).toBe(10);
    expect(read.rejected.map((e) => e.line)).toEqual([5, 7, 8, 9, 10, 11, 16, 17, 21, 22]);
    expect(read.linesRead).toBe(20);
    expect(read.kinds).toEqual({ optical: 6, space: 1, roving: 1 });
  });

  it('a roving pair (V + v) keeps the site of its v line', () => {
    const o = at(3)!;
    expect(o.kind).toBe('roving');
    expect(o.lines).toBe(2);
    expect(o.rovingSite).toEqual({ longitudeDegE: 10.123456, latitudeDeg: 50.123456, altitudeM: 123 });
    expect(o.observerGeocentricKm).toBeNull();
  });

  it('a space-based pair in au is kept in km', () => {
    const o = at(18)!;
    expect(o.kind).toBe('space');
    const km = o.observerGeocentricKm!;
    [-0.01234567, 0.00123456, -0.00012345].forEach((au, k) => expect(km[k]).toBeCloseTo(au * KM_PER_AU, 6));
  });

  it('rejects a lone S line, a lone s line, and a pair whose dates differ, each with its reason', () => {
    expect(reason(5)).toBe(`${INVENTED}:5:15: S line without its s line: the next line (6) is not one`);
    expect(reason(7)).toBe(`${INVENTED}:7:15: s line without its S line: no S line before it`);
    expect(reason(16)).toBe(`${INVENTED}:16:15: S line whose s line (17) differs in date (columns 16–32)`);
    expect(reason(17)).toBe(`${INVENTED}:17:1: s line differs from its S line (16) in date (columns 16–32)`);
    expect(reason(22)).toBe(`${INVENTED}:22:15: V line without its v line: the file ends`);
  });

  it('rejects radar, replaced and unknown kinds, naming note 2', () => {
    expect(reason(8)).toContain(':8:15: radar observation (note 2 R)');
    expect(reason(9)).toContain(':9:15: radar observation (note 2 r)');
    expect(reason(10)).toBe(`${INVENTED}:10:15: unknown observation type 'q' (note 2, column 15)`);
    expect(reason(21)).toContain(':21:15: replaced observation (note 2 X)');
  });

  it('rejects a day that does not exist (2020 Feb 30)', () => {
    expect(reason(11)).toBe(`${INVENTED}:11:16: date is not 'YYYY MM DD.dddddd': '2020 02 30.50000' (columns 16–32)`);
  });

  it('reads comet and temporary designations and the discovery asterisk', () => {
    expect(at(12)!.designation).toBe('73P'); // '0073P' in columns 1–5
    expect(at(12)!.number).toBe(73);
    expect(at(13)!.designation).toBe('C/1995 O1'); // 'C' in column 5, 'J95O010' in 6–12
    expect(at(14)!.designation).toBe('TMP0001');
    expect(at(14)!.temporary).toBe(true);
    expect(at(14)!.discovery).toBe(true);
    expect(at(2)!.designation).toBe('2020 AB');
    expect(at(2)!.discovery).toBe(false);
    expect(read.designations.mixed).toBe(true);
    expect(read.designations.designations.map((d) => [d.designation, d.observations])).toEqual([
      ['2020 AB', 5], ['73P', 1], ['C/1995 O1', 1], ['TMP0001', 1],
    ]);
  });

  it('reads a low-precision photographic position (minutes with decimals) and gives no TT before 1972', () => {
    // '     K20A00B  P1965 03 04.25    05 06.7     -07 08                           G96'
    const o = at(15)!;
    expect(o.raRad * (180 / Math.PI)).toBeCloseTo((5 + 6.7 / 60) * 15, 10);
    expect(o.decRad * (180 / Math.PI)).toBeCloseTo(-(7 + 8 / 60), 10);
    expect([o.raDecimals, o.decDecimals]).toEqual([1, 0]);
    expect(o.raResolutionArcsec).toBeCloseTo(90, 10); // 0.1 min of time = 6 s = 90″
    expect(o.decResolutionArcsec).toBeCloseTo(60, 10); // 1′
    expect(Number.isNaN(o.timeJdTT)).toBe(true);
    expect(read.withoutTT).toBe(1);
  });

  it('mag, band and catalogue of a CCD line', () => {
    const o = at(2)!;
    expect([o.mag, o.band, o.catalogue, o.note2]).toEqual([20.1, 'V', 'V', 'C']);
  });
});

describe('Obs80Reader line by line', () => {
  const LINE = '     K20A00B  C2020 01 01.50000 01 02 03.45 +04 05 06.7          20.1 VV     G96'; // invented
  const run = (lines: string[]) => {
    const obs: unknown[] = [];
    const rej: string[] = [];
    const r = new Obs80Reader('f.txt', (o) => obs.push(o), (e) => rej.push(e.message));
    lines.forEach((t, k) => r.pushLine(t, k + 1));
    return { counts: r.finish(), obs, rej };
  };

  it('rejects a line cut short and one with text past column 80', () => {
    const { rej } = run([LINE.slice(0, 77), LINE + 'x']);
    expect(rej).toEqual([
      'f.txt:1:78: line ends at column 77; an 80-column record has exactly 80',
      'f.txt:2:81: line has text past column 80; an 80-column record has exactly 80',
    ]);
  });

  it('rejects bad positions and stations with the columns', () => {
    const badRa = LINE.slice(0, 32) + '25 02 03.45 ' + LINE.slice(44);
    const badDec = LINE.slice(0, 44) + ' 04 05 06.7 ' + LINE.slice(56);
    const badStn = LINE.slice(0, 77) + 'g9 ';
    const { rej, counts } = run([badRa, badDec, badStn]);
    expect(rej).toEqual([
      "f.txt:1:33: right ascension out of range: '25 02 03.45' (columns 33–44)",
      "f.txt:2:45: declination is not 'sdd mm ss.ss': ' 04 05 06.7' (columns 45–56)",
      "f.txt:3:78: observatory code is not three letters or digits: 'g9 ' (columns 78–80)",
    ]);
    expect(counts).toEqual({ observations: 0, linesInObservations: 0, rejected: 3, skipped: 0 });
  });

  it('rejects a natural-satellite designation and an unpackable number', () => {
    const sat = 'J013S' + LINE.slice(5);
    const bad = '1289!' + LINE.slice(5);
    const { rej } = run([sat, bad]);
    expect(rej).toEqual([
      "f.txt:1:1: natural satellite designation 'J013S' is not handled (columns 1–5)",
      "f.txt:2:1: '1289!' is not a packed minor-planet number (columns 1–5)",
    ]);
  });

  it('an s line whose S line was rejected says so', () => {
    const s = LINE.slice(0, 14) + 'S' + LINE.slice(15, 32) + '99' + LINE.slice(34); // bad RA hours
    const second = LINE.slice(0, 14) + 's' + LINE.slice(15, 32) + '1 + 6490.4555 - 2183.2275 +  914.7962' + ' '.repeat(8) + 'G96';
    const { rej } = run([s, second]);
    expect(rej[1]).toBe('f.txt:2:15: s line without its S line: its S line (1) was rejected');
  });

  it('rejects an s line without a sign or with a bad units flag, and its S line with it', () => {
    const s = LINE.slice(0, 14) + 'S' + LINE.slice(15);
    const noSign = LINE.slice(0, 14) + 's' + LINE.slice(15, 32) + '1   6490.4555 - 2183.2275 +  914.7962' + ' '.repeat(8) + 'G96';
    const badUnits = LINE.slice(0, 14) + 's' + LINE.slice(15, 32) + '3 + 6490.4555 - 2183.2275 +  914.7962' + ' '.repeat(8) + 'G96';
    const { rej, counts } = run([s, noSign, s, badUnits]);
    expect(rej).toEqual([
      'f.txt:1:15: S line whose s line (2) was rejected',
      "f.txt:2:35: observer X has no sign in column 35: '6490.4555' (columns 35–45)",
      'f.txt:3:15: S line whose s line (4) was rejected',
      "f.txt:4:33: position units flag is '3', not 1 (km) or 2 (au) (column 33)",
    ]);
    expect(counts.rejected).toBe(4);
  });
});

describe('note 2 codes (format description, from memory) on an invented line', () => {
  const LINE = '     K20A00B  C2020 01 01.50000 01 02 03.45 +04 05 06.7          20.1 VV     G96';
  const withNote2 = (c: string) => LINE.slice(0, 14) + c + LINE.slice(15);
  const outcome = (c: string) => {
    const rej: string[] = [];
    let n = 0;
    const r = new Obs80Reader('f.txt', () => n++, (e) => rej.push(e.reason));
    r.pushLine(withNote2(c), 1);
    r.finish();
    return n === 1 ? 'read' : rej[0];
  };

  it('reads the optical kinds', () => {
    for (const c of [' ', 'P', 'e', 'C', 'c', 'T', 'M', 'E', 'H', 'N', 'n', 'A']) expect(outcome(c), `note 2 '${c}'`).toBe('read');
  });

  it('rejects offset, deleted and unknown kinds with their reasons', () => {
    expect(outcome('O')).toBe('offset observation (note 2 O): relative to a planet, used for natural satellites only (column 15)');
    expect(outcome('x')).toBe('deleted observation (note 2 x): not used in a fit (column 15)');
    expect(outcome('Z')).toBe("unknown observation type 'Z' (note 2, column 15)");
  });

  it('rejects a comet provisional designation in no packed form', () => {
    const rej: string[] = [];
    const r = new Obs80Reader('f.txt', () => undefined, (e) => rej.push(e.message));
    r.pushLine('    CJ95!010' + LINE.slice(12), 1);
    expect(rej).toEqual(["f.txt:1:1: comet provisional designation 'CJ95!010' in no packed form (columns 5–12)"]);
  });
});
