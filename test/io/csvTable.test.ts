/**
 * CSV/TSV tables: delimiter sniffing, header names (case-insensitive, Omega vs omega),
 * explicit mappings, date forms (checked against astronomy-engine), and the accounting of
 * bad rows: wrong field counts, quoting errors, a header that names no orbit.
 * The elements of test/fixtures/csv/ceres-eu5.csv are the real sample lines' values, so
 * the CSV reader must agree with the one-line export reader on them.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import {
  cellJd, emptyOrbitRow, kindOfDesignation, mapColumns, parseColumnMapping, parseOrbitExportLine, readOrbitFile, sniffDelimiter,
  UnreadableInputError, type InputError, type OrbitRow, type ReadOrbitOptions,
} from '../../src/io/index.js';
import { isoToJd, readFixtureText } from './fixtureCases.js';

const FIX = new URL('../fixtures/', import.meta.url);
const dir = mkdtempSync(join(tmpdir(), 'wayward-csv-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function read(path: string, options: ReadOrbitOptions = {}) {
  const rows: OrbitRow[] = [];
  const lines: number[] = [];
  const rejects: InputError[] = [];
  const summary = await readOrbitFile(path, options, (r, n) => {
    rows.push({ ...r });
    lines.push(n);
  }, (e) => rejects.push(e));
  return { rows, lines, rejects, summary };
}

function temp(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('header and delimiter', () => {
  it.each([['a,b;c,d', ','], ['a\tb\tc;d', '\t'], ['a;b;c,d', ';'], ['"x,y";b;c', ';']])('sniffs %j', (line, d) => {
    expect(sniffDelimiter(line)).toBe(d);
  });

  it('tells Omega (node) from omega (peri) by the case of the first letter', () => {
    const { index } = mapColumns(['desig', 'omega', 'Omega', 'E', 'INC']);
    expect([index.peri, index.node, index.e, index.i]).toEqual([1, 2, 3, 4]);
  });

  it('takes q (perihelion distance), never Q (aphelion distance; the trade\'s symbols, common practice)', () => {
    expect(mapColumns(['designation', 'a', 'e', 'Q']).index.q).toBe(-1);
    expect(mapColumns(['designation', 'Q', 'q']).index.q).toBe(2);
    expect(mapColumns(['designation', 'Q_AU']).index.q).toBe(1); // an unambiguous name stays case-insensitive
  });

  it('a designation column (designation > desig > pdes) wins over a name column (full_name > name)', () => {
    const pick = (headers: string[]) => {
      const { index } = mapColumns(headers);
      return [index.designation, index.fullName, index.name];
    };
    expect(pick(['name', 'pdes', 'full_name'])).toEqual([1, 2, 0]);
    expect(pick(['full_name', 'designation'])).toEqual([1, 0, -1]);
    expect(pick(['pdes', 'desig'])).toEqual([1, -1, -1]);
    expect(pick(['full_name', 'name'])).toEqual([0, -1, 1]);
    expect(pick(['name'])).toEqual([0, -1, -1]);
  });

  it('parses the --columns text', () => {
    expect(parseColumnMapping('designation=objname, e = ecc ,tp=T peri')).toEqual({ designation: 'objname', e: 'ecc', tp: 'T peri' });
    expect(() => parseColumnMapping('designation')).toThrow(new RangeError("column mapping 'designation' is not field=header"));
    expect(() => parseColumnMapping('e=a,e=b')).toThrow(new RangeError("column mapping gives 'e' twice"));
    expect(() => parseColumnMapping('colour=x')).toThrow(RangeError);
  });

  it('an explicit mapping wins', () => {
    const { index, missingMapped } = mapColumns(['objname', 'designation', 'ecc_x'], { designation: 'objname', e: 'ecc_x' });
    expect([index.designation, index.e, missingMapped]).toEqual([0, 2, []]);
    expect(mapColumns(['a'], { designation: 'zzz' }).missingMapped).toEqual(['designation=zzz']);
  });
});

describe('values', () => {
  it('reads the real Ceres and 2019 EU5 elements as the export reader does', async () => {
    const { rows, rejects, summary } = await read(new URL('csv/ceres-eu5.csv', FIX).pathname);
    expect(rejects).toEqual([]);
    expect(summary).toMatchObject({ format: 'csv', rows: 2, rejected: 0, linesRead: 2, skipped: 1 });
    const sample = readFixtureText(new URL('orbit-export/orbits-export-sample.txt.gz', FIX)).split('\n');
    const ref = emptyOrbitRow();
    for (const [k, line] of [sample[0], sample.find((l) => l.startsWith('K19E05U'))!].entries()) {
      parseOrbitExportLine(line, ref, 'sample', 1);
      const got = rows[k];
      for (const f of ['designation', 'number', 'name', 'epochJdTT', 'e', 'iDeg', 'nodeDeg', 'periDeg', 'meanAnomalyDeg', 'H', 'G', 'uncertainty', 'nObs', 'rmsArcsec', 'aAu', 'meanMotionDegPerDay'] as const) {
        expect(got[f], `${ref.designation} ${f}`).toEqual(ref[f]);
      }
    }
    expect(rows[0].aAu).toBe(2.7655526);
    expect(rows[0].lastObsJdTT).toBe(isoToJd('2026-01-03'));
    expect(rows[0].arcDays).toBe(isoToJd('2026-01-03') - isoToJd('1801-12-31'));
    expect(rows[1].arcDays).toBe(1800);
  });

  it('TSV with Omega/omega, an MJD epoch and q instead of a', async () => {
    const { rows, rejects } = await read(new URL('csv/tabs-omega.tsv', FIX).pathname);
    expect(rejects).toEqual([]);
    expect(rows[0]).toMatchObject({ designation: '2019 EU5', nodeDeg: 109.1411, periDeg: 108.84735, qAu: 47.14 });
    // MJD = JD − 2 400 000.5 (IAU 1997 Resolution B1); 61200 = 2026-06-09 0h, by astronomy-engine
    expect(rows[0].epochJdTT).toBe(isoToJd('2026-06-09'));
    expect(rows[0].aAu).toBeCloseTo(47.14 / (1 - 0.9607143), 9); // a = q/(1−e)
  });

  it.each([
    ['2461200.5', '2026-06-09'], ['2026-06-09', '2026-06-09'], ['2026-06-09T00:00:00', '2026-06-09'],
    ['2026-06-09T06:00:00Z', '2026-06-09T06:00:00'], ['20260609', '2026-06-09'], ['K2669', '2026-06-09'],
    ['2026-06-09.25', '2026-06-09T06:00:00'],
  ])('date cell %j', (text, iso) => {
    expect(Math.abs(cellJd(text) - isoToJd(iso)) * 86400).toBeLessThan(1e-3); // seconds
  });

  it.each(['2026-13-01', '61200', 'yesterday'])('rejects date cell %j', (text) => {
    expect(() => cellJd(text)).toThrow();
  });
});

describe('bad rows and bad headers', () => {
  const header = 'designation,epoch,e,a,i,node,peri,M';
  const good = (d: string) => `${d},2461200.5,0.1,2.5,3,40,50,60`;

  it('a row with the wrong number of fields is one reject naming file and line', async () => {
    const p = temp('count.csv', [header, good('A'), 'B,2461200.5,0.1', good('C')].join('\n') + '\n');
    const { rows, rejects, summary } = await read(p);
    expect(rows.map((r) => r.designation)).toEqual(['A', 'C']);
    expect(rejects.map((e) => e.message)).toEqual([`${p}:3: 3 fields where the header has 8`]);
    expect(summary).toMatchObject({ linesRead: 3, rows: 2, rejected: 1 });
  });

  it('lines of blanks are skipped, not rows', async () => {
    const p = temp('blanks.csv', [header, good('A'), '   ', '\t', '', good('B')].join('\n') + '\n');
    const { summary } = await read(p);
    expect(summary).toMatchObject({ rows: 2, rejected: 0, skipped: 4 });
  });

  it('a quoting error rejects every line it swallowed, and reading goes on', async () => {
    const lines = [header, good('A'), good('"B"x'), good('C'), good('D')];
    const p = temp('quote.csv', lines.join('\n') + '\n');
    const { rows, rejects, summary } = await read(p);
    expect(summary.rows + summary.rejected).toBe(4); // every data line accounted for
    expect(rows[0].designation).toBe('A');
    expect(rejects[0].line).toBe(3);
    expect(rejects.every((e) => e.message.startsWith(`${p}:`) && e.reason.startsWith('malformed CSV'))).toBe(true);
  });

  it('an unterminated quote at the end: the rest is rejected line by line', async () => {
    const p = temp('open.csv', [header, good('A'), good('"B'), good('C')].join('\n') + '\n');
    const { summary, rejects } = await read(p);
    expect(summary.rows + summary.rejected).toBe(3);
    expect(rejects.map((e) => e.line)).toEqual([3, 4]);
  });

  it('a header naming no orbit: one fatal error naming the file and the headers found', async () => {
    const p = temp('shop.csv', 'item,price,qty\napple,1,2\n');
    await expect(read(p)).rejects.toThrow(new UnreadableInputError(p,
      'header lacks required orbit columns (designation; e; i; node; peri; epoch or tp; a, q or n; M or tp); headers found: item, price, qty', 'columns'));
  });

  it('a mapping naming a header the file lacks is fatal', async () => {
    const p = temp('map.csv', [header, good('A')].join('\n') + '\n');
    await expect(read(p, { columns: { designation: 'objname' } })).rejects.toThrow(
      `${p}: column mapping names headers the file lacks (designation=objname); headers found: ${header.split(',').join(', ')}`);
  });

  it('a mapping naming an unknown orbit field is caller misuse (RangeError)', async () => {
    const p = temp('field.csv', [header, good('A')].join('\n') + '\n');
    await expect(read(p, { columns: { colour: 'x' } as never })).rejects.toThrow(RangeError);
  });

  it('an exception from the row callback reaches the caller unchanged', async () => {
    const p = temp('throwing.csv', [header, good('A'), good('B')].join('\n') + '\n');
    const boom = new TypeError('consumer failed');
    await expect(readOrbitFile(p, {}, () => { throw boom; }, () => {})).rejects.toBe(boom);
  });

  it('a bad cell names the line, the column header and the text', async () => {
    const p = temp('cell.csv', [header, 'X,2461200.5,0.1,2.5,three,40,50,60'].join('\n') + '\n');
    const { rejects } = await read(p);
    expect(rejects.map((e) => e.message)).toEqual([`${p}:2: column 'i' (field 5): not a number: 'three'`]);
  });

  it('a number that overflows a double (IEEE 754: 1e999 → Infinity) is a bad cell, not Infinity', async () => {
    const p = temp('overflow.csv', [header, 'X,2461200.5,0.1,1e999,3,40,50,60'].join('\n') + '\n');
    const { rows, rejects } = await read(p);
    expect(rows).toEqual([]);
    expect(rejects.map((e) => e.message)).toEqual([`${p}:2: column 'a' (field 4): not a finite number: '1e999'`]);
  });
});

describe('designation and kind of a CSV row', () => {
  // Synthetic rows: real designations and full names in the forms general small-body
  // database exports write them (pdes '1', full_name '     1 Ceres (A801 AA)'; comets
  // '1P' / '1P/Halley', 'C/1995 O1' / 'C/1995 O1 (Hale-Bopp)': common practice), with
  // invented elements.
  const header = 'pdes,full_name,epoch,e,a,i,om,w,ma';
  const elements = '2461200.5,0.1,2.5,3,40,50,60';

  it('pdes is the designation; full_name adds the proper name and the number', async () => {
    const p = temp('pdes.csv', [
      header,
      `1,"     1 Ceres (A801 AA)",${elements}`,
      `2019 EU5,"       (2019 EU5)",${elements}`,
      `1P,1P/Halley,${elements}`,
      `C/1995 O1,C/1995 O1 (Hale-Bopp),${elements}`,
      `433,,${elements}`,
    ].join('\n') + '\n');
    const { rows, rejects } = await read(p);
    expect(rejects).toEqual([]);
    expect(rows.map((r) => [r.designation, r.number, r.name, r.kind])).toEqual([
      ['(1) Ceres', 1, 'Ceres', 'asteroid'],
      ['2019 EU5', NaN, '', 'asteroid'],
      ['1P', NaN, 'Halley', 'comet'],
      ['C/1995 O1', NaN, 'Hale-Bopp', 'comet'],
      ['(433)', 433, '', 'asteroid'], // a bare number reads as the numbered designation
    ]);
  });

  it('pdes and full_name naming different numbers: the row is rejected, naming both columns', async () => {
    const p = temp('conflict.csv', [header, `1,"     2 Pallas (A802 FA)",${elements}`].join('\n') + '\n');
    const { rows, rejects } = await read(p);
    expect(rows).toEqual([]);
    expect(rejects.map((e) => e.message)).toEqual([
      `${p}:2: column 'pdes' gives number 1 but column 'full_name' gives 2: '2 Pallas (A802 FA)'`]);
  });

  // The comet forms of the IAU designation system (common practice): a periodic number with
  // P, D or I, or a P/, C/, D/, X/, I/, A/ prefix; everything else is an asteroid.
  it.each([
    ['1P', 'comet'], ['73P-B', 'comet'], ['2I/Borisov', 'comet'], ['C/1995 O1', 'comet'], ['P/2004 V5-A', 'comet'],
    ['D/1993 F2', 'comet'], ['X/1106 C1', 'comet'], ['A/2017 U7', 'comet'],
    ['(1) Ceres', 'asteroid'], ['2019 EU5', 'asteroid'], ['433', 'asteroid'], ['1PX', 'asteroid'], ['Halley', 'asteroid'],
  ])('%s is classed %s by the designation pattern', (designation, kind) => {
    expect(kindOfDesignation(designation)).toBe(kind);
  });

  it('the kind is by designation unless forced, and the summary says which rule and how many each way', async () => {
    const p = temp('kinds.csv', [header, `1P,1P/Halley,${elements}`, `2019 EU5,,${elements}`, `433,,${elements}`].join('\n') + '\n');
    const auto = await read(p);
    expect(auto.rows.map((r) => r.kind)).toEqual(['comet', 'asteroid', 'asteroid']);
    expect(auto.summary).toMatchObject({ kindRule: 'designation-pattern', kinds: { asteroid: 2, comet: 1 } });
    const comet = await read(p, { csvKind: 'comet' });
    expect(comet.rows.map((r) => r.kind)).toEqual(['comet', 'comet', 'comet']);
    expect(comet.summary).toMatchObject({ kindRule: 'forced', kinds: { asteroid: 0, comet: 3 } });
    const asteroid = await read(p, { csvKind: 'asteroid' });
    expect(asteroid.rows.map((r) => r.kind)).toEqual(['asteroid', 'asteroid', 'asteroid']);
    expect(asteroid.summary).toMatchObject({ kindRule: 'forced', kinds: { asteroid: 3, comet: 0 } });
  });

  it('the export formats class rows by their format', async () => {
    const { summary } = await read(new URL('orbit-export/cases/ceres.txt', FIX).pathname);
    expect(summary).toMatchObject({ format: 'orbit-export', kindRule: 'format', kinds: { asteroid: 1, comet: 0 } });
  });
});
