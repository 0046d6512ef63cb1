/**
 * A plain orbit export file read on two threads (src/io/orbitExportParts.ts) against the same
 * file read on one: every row (all fields, line number, raw text), every reject (message, line,
 * column, text), the summary (counts, physical lines, bytes, SHA-256) the same, wherever the
 * split falls: on the real sample (the project's open-data orbit export sample, stored as
 * test/fixtures/orbit-export/orbits-export-sample.txt.gz, its header notice before it), with
 * edited and bad lines, a header block and blank lines past the split, CRLF line ends, a line
 * longer than the window the split is looked for in, a last line with no terminator, and a
 * line too long for the line reader. The one-thread read is the reference: it is tested
 * against the text parser and outside values in readOrbitFile.test.ts and orbitExportBytes.test.ts.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, describe, expect, it } from 'vitest';
import {
  emptyOrbitRow, readOrbitFile, UnreadableInputError, type LineEncoding, type OrbitRow, type ReadOrbitOptions,
} from '../../src/io/index.js';
import { planSplit } from '../../src/io/orbitExportParts.js';
import { OrbitRowBatchWriter, unpackBatch, type PackedReject } from '../../src/io/orbitRowBatch.js';
import { PROBE_LINES } from '../../src/io/readOrbitFile.js';
import { readFixtureText } from './fixtureCases.js';

const FIX = new URL('../fixtures/', import.meta.url);
const ORBITS = readFixtureText(new URL('orbit-export/orbits-export-sample.txt.gz', FIX));
const NOTICE = readFileSync(new URL('orbit-export/orbits-export-sample.NOTICE.txt', FIX), 'latin1');
const LINES = ORBITS.split('\n').filter((l) => l !== '');
const dir = mkdtempSync(join(tmpdir(), 'wayward-threads-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let serial = 0;
function temp(content: string | Buffer): string {
  const p = join(dir, `in${serial++}.txt`);
  writeFileSync(p, content);
  return p;
}

interface Read {
  rows: { line: number; row: OrbitRow; text: string }[];
  rejects: { message: string; line: number; column: number; reason: string; text: string }[];
  summary: Awaited<ReturnType<typeof readOrbitFile>>;
}

/** Everything readOrbitFile hands on, each row's raw text asked for (read back from the file on the worker's part). */
async function readAll(path: string, options: ReadOrbitOptions): Promise<Read> {
  const rows: Read['rows'] = [];
  const rejects: Read['rejects'] = [];
  const summary = await readOrbitFile(path, options,
    (row, line, text) => rows.push({ line, row: { ...row }, text: text() }),
    (e) => rejects.push({ message: e.message, line: e.line, column: e.column, reason: e.reason, text: e.text }));
  return { rows, rejects, summary };
}

/** The mainShare that puts the nominal split at byte `at` of a file of `size` bytes. */
const shareAt = (at: number, size: number): number => (at + 0.5) / size;

/**
 * Reads `path` on one thread and on two with the split looked for from each byte of `at`, and
 * expects the same calls and summary (but parseThreads) and two threads used.
 */
async function expectSameOnTwoThreads(path: string, at: readonly number[], encoding: LineEncoding = 'utf8'): Promise<Read> {
  const size = readFileSync(path).length;
  const one = await readAll(path, { encoding });
  expect(one.summary.parseThreads).toBe(1);
  for (const byte of at) {
    const two = await readAll(path, { encoding, threads: 2, parallelMinBytes: 0, mainShare: shareAt(byte, size) });
    expect(two.summary.parseThreads, `split from byte ${byte}`).toBe(2);
    expect({ ...two.summary, parseThreads: 1 }).toEqual(one.summary);
    expect(two.rejects).toEqual(one.rejects);
    expect(two.rows.length).toBe(one.rows.length);
    expect(two.rows).toEqual(one.rows); // NaN equals NaN here (vitest's equality)
  }
  return one;
}

/** Byte offsets of the starts of the lines of `text` (split on LF). */
function lineStarts(text: string | Buffer): number[] {
  const buf = typeof text === 'string' ? Buffer.from(text, 'latin1') : text;
  const starts = [0];
  for (let k = buf.indexOf(10); k >= 0 && k + 1 < buf.length; k = buf.indexOf(10, k + 1)) starts.push(k + 1);
  return starts;
}

/**
 * Offsets to split from: every `step`-th line start past the held-back lines and one byte into
 * each (a worker starts for each read: about 1 s from the TypeScript source, so few of them).
 */
function splitPoints(text: string | Buffer, step: number): number[] {
  const starts = lineStarts(text).slice(PROBE_LINES + 1);
  const at: number[] = [];
  for (let k = 0; k < starts.length; k += step) at.push(starts[k], starts[k] + 1);
  return at;
}

describe('two threads read what one reads', () => {
  it('the real sample behind its header notice: same rows, its one reject, counts and SHA-256', async () => {
    const text = NOTICE + ORBITS + ORBITS; // 577 lines: the part past line 200 holds the sample's blank and bad lines
    const one = await expectSameOnTwoThreads(temp(text), splitPoints(text, 150));
    // counts from the sample itself (259 lines: 258 rows, the blank separator, one line with
    // a blank packed designation), not from the reader under test
    expect(one.summary).toMatchObject({ rows: 2 * 258, rejected: 2, linesRead: 2 * 259 });
  });

  it('edited and bad lines, a second header block, blank and separator lines past the split (UTF-8 and latin1)', async () => {
    const edited = LINES.map((l, k) => {
      if (k % 17 === 5) return l.slice(0, 60); // cut inside the elements: rejected
      if (k % 19 === 7) return `${l.slice(0, 26)}1.2345e+2${l.slice(35)}`; // exponent form: the text parser's path
      if (k % 23 === 3) return `${l.slice(0, 30)}x${l.slice(31)}`; // a letter in a number: rejected
      if (k % 29 === 11) return `${l.slice(0, 175)}Čeština ${l.slice(183)}`; // non-ASCII name: UTF-8 decoded
      return l;
    });
    const text = [...LINES, '', ...edited, '', '-'.repeat(40), NOTICE.trimEnd(), ...edited, '   ', ...LINES].join('\n') + '\n';
    const bytes = Buffer.from(text, 'utf8');
    const one = await expectSameOnTwoThreads(temp(bytes), splitPoints(bytes, 300), 'utf8');
    expect(one.rejects.length).toBeGreaterThan(20);
    await expectSameOnTwoThreads(temp(bytes), splitPoints(bytes, 100_000), 'latin1');
  });

  it('CRLF line ends, the split looked for from a CR', async () => {
    const text = [...LINES, ...LINES, ...LINES].join('\r\n') + '\r\n';
    const crs = lineStarts(text).slice(PROBE_LINES + 1, PROBE_LINES + 400).filter((_, k) => k % 97 === 0).map((s) => s - 2);
    const path = temp(text);
    for (const cr of crs) {
      expect(text[cr]).toBe('\r');
      expect(planSplit(path, shareAt(cr, text.length), PROBE_LINES, 0)?.split).toBe(cr + 2); // the next line's start, past the LF
    }
    await expectSameOnTwoThreads(path, crs);
  });

  it('a line longer than the window the split is looked for in (64 KiB), the split looked for inside it', async () => {
    const long = `12345${'9'.repeat(100_000)}`; // a reject (its fields are digits run together)
    const lines = [...LINES, ...LINES.slice(0, 100), long, ...LINES];
    const text = lines.join('\n') + '\n';
    const start = lineStarts(text)[LINES.length + 100];
    expect(text.slice(start, start + 5)).toBe('12345');
    const path = temp(text);
    expect(planSplit(path, shareAt(start + 10, text.length), PROBE_LINES, 0)?.split).toBe(start + long.length + 1);
    const one = await expectSameOnTwoThreads(path, [start + 1, start + 70_000, start - 1]);
    expect(one.rejects.some((r) => r.line === LINES.length + 101)).toBe(true);
  });

  it('a last line with no terminator, in the worker\'s part', async () => {
    const text = [...LINES, ...LINES].join('\n'); // no LF after the last line
    const one = await expectSameOnTwoThreads(temp(text), splitPoints(text, 110));
    expect(one.summary.lines).toBe(2 * LINES.length);
  });

  it('a line too long for the line reader in the worker\'s part: the same error, after the same rows', async () => {
    const text = `${[...LINES, ...LINES].join('\n')}\n${'7'.repeat((16 << 20) + 3 * (1 << 20))}\n${LINES[0]}\n`;
    const path = temp(text);
    const errorOf = async (options: ReadOrbitOptions) => {
      const rows: number[] = [];
      const err = await readOrbitFile(path, options, (_r, line) => rows.push(line), () => {}).then(() => null, (e: unknown) => e);
      return { rows, err };
    };
    const one = await errorOf({});
    const two = await errorOf({ threads: 2, parallelMinBytes: 0, mainShare: shareAt(lineStarts(text)[300], text.length) });
    expect(one.err).toBeInstanceOf(UnreadableInputError);
    expect(two.err).toBeInstanceOf(UnreadableInputError);
    expect((two.err as Error).message).toBe((one.err as Error).message);
    expect((one.err as Error).message).toBe(`${path}: line ${2 * LINES.length + 1} is longer than ${16 << 20} bytes; not a line-oriented text file`);
    expect(two.rows).toEqual(one.rows);
  });
});

describe('when the file is read on one thread', () => {
  const text = [...LINES, ...LINES].join('\n') + '\n';
  const at = (s: string) => shareAt(lineStarts(s)[300], s.length);

  it('gzip, CR-only line ends, too few lines before the split, under the size limit, stdin, one thread asked', async () => {
    expect(planSplit(temp(text), at(text), PROBE_LINES, 0)).not.toBeNull(); // the reference case splits
    expect(planSplit(temp(gzipSync(Buffer.from(text))), 0.5, PROBE_LINES, 0)).toBeNull();
    const cr = text.replace(/\n/g, '\r');
    expect(planSplit(temp(cr), at(text), PROBE_LINES, 0)).toBeNull();
    expect(planSplit(temp(LINES.slice(0, 150).join('\n')), 0.5, PROBE_LINES, 0)).toBeNull();
    expect(planSplit(temp(text), at(text), PROBE_LINES, text.length + 1)).toBeNull();
    expect(planSplit('-', 0.5, PROBE_LINES, 0)).toBeNull();
    const path = temp(text);
    expect((await readOrbitFile(path, { parallelMinBytes: 0, mainShare: at(text) }, () => {}, () => {})).parseThreads).toBe(1);
    expect((await readOrbitFile(path, { threads: 2, parallelMinBytes: 0, mainShare: at(text) }, () => {}, () => {})).parseThreads).toBe(2);
    expect((await readOrbitFile(path, { threads: 2, mainShare: at(text) }, () => {}, () => {})).parseThreads).toBe(1); // under 16 MiB
  });
});

describe('rows packed for the trip between threads', () => {
  it('every OrbitRow field comes back as it went (a new field fails this until it is packed)', () => {
    const row = emptyOrbitRow();
    const keys = Object.keys(row) as (keyof OrbitRow)[];
    let n = 1;
    for (const k of keys) {
      if (typeof row[k] === 'number') (row as unknown as Record<string, number>)[k] = n++ * 1.25;
      else if (k !== 'kind') (row as unknown as Record<string, string>)[k] = `${k} ${n++}`;
    }
    row.kind = 'comet';
    const w = new OrbitRowBatchWriter();
    w.addRow(row, 3, 1000, 203);
    w.addReject({ line: 2, column: 4, reason: 'r', text: 't' } as never, 2);
    w.addRow({ ...row, kind: 'asteroid', H: NaN, name: '' }, 5, 1500, 180);
    const got: { row: OrbitRow; line: number; byte: number; length: number }[] = [];
    const rejects: PackedReject[] = [];
    const order: string[] = [];
    unpackBatch(w.take(), emptyOrbitRow(), {
      row: (r, line, byte, length) => { got.push({ row: { ...r }, line, byte, length }); order.push(`row ${line}`); },
      reject: (r) => { rejects.push(r); order.push(`reject ${r.line}`); },
    });
    expect(order).toEqual(['reject 2', 'row 3', 'row 5']);
    expect(got[0]).toEqual({ row, line: 3, byte: 1000, length: 203 });
    expect(got[1].row).toEqual({ ...row, kind: 'asteroid', H: NaN, name: '' });
    expect(rejects).toEqual([{ line: 2, column: 4, reason: 'r', text: 't' }]);
  });
});
