/**
 * The byte-level reader of orbit export lines (src/io/orbitExportBytes.ts) against the text
 * parser (parseOrbitExportLine), the general path: on every line it takes, the same row,
 * field for field; every line it declines, the text parser reads, skips or rejects. Lines:
 * the real sample (test/fixtures/orbit-export/README.md: real lines of the one-line orbit
 * export format) and the fixture cases written from the published column layout, one real
 * line changed column by column into every kind of bad row the text parser names (synthetic),
 * and random edits of real lines (fast-check). Then whole files through readOrbitFile,
 * against the text parser line by line over the same file: the same rows in the same order,
 * the same raw texts, the same rejects with the same messages, LF and CRLF, ASCII, UTF-8
 * and latin1.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { afterAll, afterEach, describe, expect, it, vi } from 'vitest';
import {
  emptyOrbitRow, forEachLine, InputError, parseOrbitExportLine, PROBE_LINES, readOrbitFile,
  type LineEncoding, type OrbitRow,
} from '../../src/io/index.js';
import { OrbitExportBytesReader } from '../../src/io/orbitExportBytes.js';
import { loadCases, readFixtureText } from './fixtureCases.js';

const FIX = new URL('../fixtures/', import.meta.url);
const SAMPLE = readFixtureText(new URL('orbit-export/orbits-export-sample.txt.gz', FIX)).split('\n').filter((l, k, all) => k < all.length - 1 || l !== '');
const CASES = loadCases(new URL('orbit-export/cases/', FIX)).map((c) => c.line);
const CERES = SAMPLE[0];
const dir = mkdtempSync(join(tmpdir(), 'wayward-bytes-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
afterEach(() => vi.restoreAllMocks());

/** `line` with 1-based columns first..first+text.length−1 replaced by `text`. */
function put(line: string, first: number, text: string): string {
  return line.slice(0, first - 1) + text + line.slice(first - 1 + text.length);
}

/**
 * One real line made into each kind of row the text parser rejects (published column
 * layout; synthetic), and into unusual rows it reads on its slow paths.
 */
const BAD = [
  put(CERES, 1, '       '), // blank packed designation
  put(CERES, 1, 'Q!2345 '), // packed designation in no known form
  put(CERES, 167, '(2) Pallas'), // readable disagrees with the packed number
  put(CERES, 9, 'ab.cd'), // H not a number
  CERES.slice(0, 17), // line ends inside G
  CERES.slice(0, 20), // line ends before the epoch
  put(CERES, 21, '     '), // missing epoch
  put(CERES, 21, 'K26Z9'), // packed epoch month outside 1..C
  put(CERES, 21, 'K262U'), // packed epoch day outside its month (February 30)
  put(CERES, 21, 'K2 69'), // packed epoch with a blank inside
  CERES.slice(0, 64), // line ends inside the inclination
  put(CERES, 27, '         '), // missing mean anomaly
  put(CERES, 71, '0.07.4192'), // eccentricity not a number
  put(CERES, 71, '    -    '), // eccentricity with no digit
  put(put(CERES, 81, '           '), 93, '           '), // neither a nor n
  put(CERES, 118, ' 7x97'), // number of observations not a number
  put(CERES, 128, '1801+2026'), // arc in neither form
  put(CERES, 128, '  45 dayz'), // arc in neither form
  put(CERES, 195, '20260230'), // last observation February 30
  `${CERES} x`, // text after the last observation date
  `${CERES.slice(0, 199)}3`, // last observation cut short
  '---', // three dashes: a data line in no form
];
const UNUSUAL = [
  put(CERES, 71, '7.9692e-2'), // eccentricity in exponent form (Number() reads it)
  put(CERES, 93, '           '), // blank a: from the mean daily motion
  put(CERES, 128, '  45 days'), // one-opposition arc in days
  put(CERES, 128, ' 045 days'),
  put(CERES, 106, 'E'), // a letter in place of U
  put(CERES, 9, '+3.34'), // a signed H
  put(CERES, 1, '\t0001'), // a tab before the packed designation (trimmed as a blank)
  put(CERES, 108, '         '), // no reference
  CERES.slice(0, 194), // no last observation
  CERES.slice(0, 165), // nothing after the flags
  '', // blank line: skipped
  '   \t  ', // blanks and a tab: skipped
  '-'.repeat(202), // separator line: skipped
  '  ---  ', // too few dashes to be a separator: a data line
];
const CERES_NAMED = put(CERES, 167, '(1) Cérès                   '); // non-ASCII in the name

/** Both readers on one line as latin1 bytes: the byte reader's verdict and the rows. */
function both(line: string): { taken: boolean; fast: OrbitRow; text: OrbitRow | InputError | 'skip' } {
  const fast = emptyOrbitRow();
  const taken = new OrbitExportBytesReader().read(Buffer.from(line, 'latin1'), 0, Buffer.byteLength(line, 'latin1'), fast);
  const row = emptyOrbitRow();
  let text: OrbitRow | InputError | 'skip';
  try {
    text = parseOrbitExportLine(line, row, 'f', 1) === 'skip' ? 'skip' : row;
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    text = err;
  }
  return { taken, fast, text };
}

describe('one line: the byte reader against the text parser', () => {
  it('takes every good line of the real sample and the fixture cases, with the same row', () => {
    let taken = 0;
    let good = 0;
    for (const line of [...SAMPLE, ...CASES]) {
      const r = both(line);
      if (r.text instanceof InputError || r.text === 'skip') {
        expect(r.taken, line).toBe(false);
        continue;
      }
      good++;
      if (!r.taken) continue;
      taken++;
      expect(r.fast, line).toEqual(r.text);
    }
    expect(good).toBeGreaterThan(258); // the sample's 258 good lines and the good fixture cases
    expect(taken).toBe(good);
  });

  it('declines every bad row (the text parser rejects it with its reason)', () => {
    for (const line of BAD) {
      const r = both(line);
      expect(r.text, line).toBeInstanceOf(InputError);
      expect(r.taken, line).toBe(false);
    }
  });

  it('unusual rows: the same row when it takes one, the text parser reads the rest', () => {
    const declined: string[] = [];
    for (const line of [...UNUSUAL, CERES_NAMED]) {
      const r = both(line);
      if (r.taken) expect(r.fast, line).toEqual(r.text);
      else declined.push(line);
    }
    // exponent form, a line starting with a tab, blank/separator lines and the too-few-dashes
    // line go to the text parser
    expect(declined).toEqual([UNUSUAL[0], UNUSUAL[6], UNUSUAL[10], UNUSUAL[11], UNUSUAL[12], UNUSUAL[13]]);
  });

  it('random edits of real lines: whenever it takes a line, the text parser reads the same row', () => {
    const pool = [' ', ' ', '-', '+', '.', 'e', '0', '5', '9', 'A', 'z', '~', '_', '(', ')', '\t', 'é', 'K', 'J', 'd'];
    const edit = fc.record({
      at: fc.nat(),
      ch: fc.constantFrom(...pool),
      kind: fc.constantFrom('replace', 'insert', 'delete', 'cut'),
    });
    let takenEdited = 0;
    fc.assert(
      fc.property(fc.constantFrom(...SAMPLE.filter((l) => l.trim() !== '')), fc.array(edit, { minLength: 1, maxLength: 3 }), (base, edits) => {
        let line = base;
        for (const e of edits) {
          const k = e.at % (line.length + 1);
          if (e.kind === 'replace') line = line.slice(0, k) + e.ch + line.slice(k + 1);
          else if (e.kind === 'insert') line = line.slice(0, k) + e.ch + line.slice(k);
          else if (e.kind === 'delete') line = line.slice(0, k) + line.slice(k + 1);
          else line = line.slice(0, k);
        }
        const r = both(line);
        if (!r.taken) return;
        if (line !== base) takenEdited++;
        expect(r.text).not.toBeInstanceOf(InputError);
        expect(r.fast).toEqual(r.text);
      }),
      { numRuns: 4000 },
    );
    expect(takenEdited).toBeGreaterThan(500); // edits the byte reader took (blanks in blanks, digits in digits, …)
  });
});

interface Read {
  rows: { lineNo: number; row: OrbitRow; text: string }[];
  rejects: { message: string; line: number; column: number; text: string }[];
  skipped: number;
}

/** readOrbitFile over `path`: copies of the rows with their raw texts, the rejects. */
async function viaReader(path: string, encoding: LineEncoding): Promise<Read & { linesRead: number }> {
  const out: Read = { rows: [], rejects: [], skipped: 0 };
  const s = await readOrbitFile(path, { encoding, format: 'orbit-export' },
    (row, lineNo, text) => out.rows.push({ lineNo, row: { ...row }, text: text() }),
    (e) => out.rejects.push({ message: e.message, line: e.line, column: e.column, text: e.text }));
  return { ...out, skipped: s.skipped, linesRead: s.linesRead };
}

/** The general path by hand: every line decoded and given to the text parser. */
async function viaTextParser(path: string, encoding: LineEncoding): Promise<Read> {
  const out: Read = { rows: [], rejects: [], skipped: 0 };
  const row = emptyOrbitRow();
  await forEachLine(path, (text, lineNo) => {
    try {
      if (parseOrbitExportLine(text, row, path, lineNo) === 'skip') out.skipped++;
      else out.rows.push({ lineNo, row: { ...row }, text });
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      out.rejects.push({ message: err.message, line: err.line, column: err.column, text: err.text });
    }
  }, { encoding });
  return out;
}

describe('whole files: readOrbitFile against the text parser line by line', () => {
  // past the lines held back to find a header, so the byte reader is in play; each bad and
  // unusual row several times, between good ones
  const mixed = [...SAMPLE, ...SAMPLE, ...Array.from({ length: 4 }, () => [...BAD, ...SAMPLE.slice(0, 40), ...UNUSUAL]).flat()];
  // more than two 1 MiB chunks: the chunk with the UTF-8 name is decoded as UTF-8 and read by
  // the text parser, the others are all ASCII and read from their bytes
  const big = Array.from({ length: 8 }, () => mixed).flat();
  const cases: [string, string[], string, LineEncoding][] = [
    ['ASCII, LF', mixed, '\n', 'utf8'],
    ['ASCII, CRLF', mixed, '\r\n', 'utf8'],
    ['a UTF-8 name in one chunk', [...big, CERES_NAMED, ...big], '\n', 'utf8'],
    ['latin1', [...mixed, CERES_NAMED, ...mixed], '\n', 'latin1'],
  ];
  it.each(cases)('%s', async (name, lines, eol, encoding) => {
    expect(mixed.length).toBeGreaterThan(PROBE_LINES);
    const path = join(dir, `${name.replace(/\W+/g, '-')}.txt`);
    writeFileSync(path, Buffer.from(lines.join(eol) + eol, encoding === 'latin1' ? 'latin1' : 'utf8'));
    const spy = vi.spyOn(OrbitExportBytesReader.prototype, 'read');
    const got = await viaReader(path, encoding);
    const taken = spy.mock.results.filter((r) => r.value === true).length;
    spy.mockRestore();
    const want = await viaTextParser(path, encoding);
    // every line accounted for, counted without either reader
    expect(want.rows.length + want.rejects.length + want.skipped).toBe(lines.length);
    expect(want.rejects.length).toBeGreaterThan(4 * BAD.length);
    expect(got.rows.length).toBe(want.rows.length);
    for (let k = 0; k < want.rows.length; k++) expect(got.rows[k], `row ${k}`).toEqual(want.rows[k]);
    expect(got.rejects).toEqual(want.rejects);
    expect(got.skipped).toBe(want.skipped);
    expect(got.linesRead).toBe(want.rows.length + want.rejects.length);
    // the byte reader took the good lines it takes alone, past the lines held back
    const takeable = want.rows.filter((r) => r.lineNo > PROBE_LINES && both(r.text).taken).length;
    if (name.includes('UTF-8')) {
      expect(taken).toBeGreaterThan(takeable / 2);
      expect(taken).toBeLessThan(takeable);
    } else {
      expect(taken).toBe(takeable);
    }
  });
});
