/**
 * readOrbitFile end to end: format detection on the real samples, the header block of the
 * real export file (its notice text before the dashed line), gzip, truncated lines, and the
 * accounting under random garbage (fast-check): linesRead against the data lines counted
 * without the reader and against the rows and rejects handed to the callbacks.
 * The real samples are stored gzip-compressed, byte for byte unchanged; the SHA-256 of their
 * uncompressed text is recorded in test/fixtures/{orbit,comet}-export/README.md and checked here.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import {
  detectFormat, readOrbitFile, UnreadableInputError, type InputError, type ReadOrbitOptions,
} from '../../src/io/index.js';
import { dataLinesOfText } from '../helpers/dataLines.js';
import { readFixtureBytes, readFixtureText } from './fixtureCases.js';
import { CAN_LIST_OPEN_FILES, closedWithin } from './openFiles.js';

const FIX = new URL('../fixtures/', import.meta.url);
const ORBITS_GZ = new URL('orbit-export/orbits-export-sample.txt.gz', FIX);
const COMETS_GZ = new URL('comet-export/comets-export-sample.txt.gz', FIX);
const ORBITS = readFixtureText(ORBITS_GZ);
const NOTICE = readFileSync(new URL('orbit-export/orbits-export-sample.NOTICE.txt', FIX), 'latin1');
const COMETS = readFixtureText(COMETS_GZ);
const dir = mkdtempSync(join(tmpdir(), 'wayward-read-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let serial = 0;
function temp(content: string | Buffer, name = `in${serial++}.txt`): string {
  const p = join(dir, name);
  writeFileSync(p, content);
  return p;
}

async function read(path: string, options: ReadOrbitOptions = {}) {
  const designations: string[] = [];
  const rejects: InputError[] = [];
  const summary = await readOrbitFile(path, options, (r) => designations.push(r.designation), (e) => rejects.push(e));
  return { designations, rejects, summary };
}

describe('real samples', () => {
  it('stored gzip-compressed, unchanged: uncompressed SHA-256 as recorded in the fixture READMEs', () => {
    const sha = (u: URL): string => createHash('sha256').update(readFixtureBytes(u)).digest('hex');
    expect(sha(ORBITS_GZ)).toBe('7744c45243d4ad40aaec8a38ca91c7e29485dd03a33f024d58b00a5871412ffd');
    expect(sha(COMETS_GZ)).toBe('b57d0f438888b9749baf59487247821d6c1db649ccb98cbf397d27a3c2674ed1');
  });

  it('the stored .gz samples read directly, gunzipped transparently (magic bytes 1f 8b)', async () => {
    const orbits = await read(fileURLToPath(ORBITS_GZ));
    expect(orbits.summary).toMatchObject({ format: 'orbit-export', rows: 258, rejected: 1, linesRead: 259, skipped: 1, gzip: true });
    expect(orbits.rejects[0].message).toBe(`${fileURLToPath(ORBITS_GZ)}:178:1: blank packed designation (columns 1–7)`);
    const comets = await read(fileURLToPath(COMETS_GZ));
    expect(comets.summary).toMatchObject({ format: 'comet-export', rows: 100, rejected: 0, linesRead: 100, gzip: true });
    // linesRead against counts it is not computed from: the data lines of the text, counted
    // without the reader, and the rows and rejects actually handed to the callbacks.
    for (const [r, text] of [[orbits, ORBITS], [comets, COMETS]] as const) {
      expect(r.summary.linesRead).toBe(dataLinesOfText(text, 'fixed-width'));
      expect(r.designations.length + r.rejects.length).toBe(r.summary.linesRead);
    }
  });

  it('orbit export with its original header block (notice text ending in a dashed line)', async () => {
    const p = temp(NOTICE + ORBITS);
    const { designations, rejects, summary } = await read(p);
    const headerLines = NOTICE.split('\n').length - 1;
    expect(summary).toMatchObject({ format: 'orbit-export', rows: 258, rejected: 1, linesRead: 259 });
    expect(summary.skipped).toBe(headerLines + 1); // the header block and the blank separator
    expect(summary.lines).toBe(summary.linesRead + summary.skipped);
    expect(summary.linesRead).toBe(dataLinesOfText(NOTICE + ORBITS, 'fixed-width'));
    expect(designations.length + rejects.length).toBe(summary.linesRead);
    expect(designations[0]).toBe('(1) Ceres');
    expect(rejects[0].message).toBe(`${p}:${headerLines + 178}:1: blank packed designation (columns 1–7)`);
  });

  it('comet export, gzip-compressed under a misleading name', async () => {
    const { designations, summary } = await read(temp(gzipSync(COMETS), 'comets.csv'));
    expect(summary).toMatchObject({ format: 'comet-export', rows: 100, rejected: 0, gzip: true });
    expect(designations).toContain('C/1995 O1');
  });

  it('detects formats from content', () => {
    expect(detectFormat(ORBITS.split('\n').slice(0, 5), 'x.csv')).toBe('orbit-export');
    expect(detectFormat(COMETS.split('\n').slice(0, 5), 'x.txt')).toBe('comet-export');
    expect(detectFormat(['designation,epoch,e,a,i,om,w,ma'], 'x.txt')).toBe('csv');
    expect(() => detectFormat(['hello world', 'nothing here'], 'notes.txt')).toThrow(new UnreadableInputError(
      'notes.txt', 'cannot tell the format from the first lines (no CSV header, no fixed-width orbit or comet lines); name the format explicitly', 'format'));
  });

  it('an exception from the row callback reaches the caller unchanged (and the file is closed)', async () => {
    const boom = new TypeError('consumer failed');
    const p = temp(ORBITS);
    await expect(readOrbitFile(p, {}, () => { throw boom; }, () => {})).rejects.toBe(boom);
    if (CAN_LIST_OPEN_FILES) expect(await closedWithin(p)).toBe(0);
  });

  it('empty file: zero rows, no error', async () => {
    const { summary } = await read(temp(''));
    expect(summary).toMatchObject({ linesRead: 0, rows: 0, rejected: 0, skipped: 0, lines: 0 });
  });

  it('truncated lines and CRLF endings: exact one-line messages naming file and line', async () => {
    const lines = ORBITS.split('\n').slice(0, 4);
    lines[1] = lines[1].slice(0, 100); // cut inside the semimajor axis (columns 93–103)
    lines[2] = lines[2].slice(0, 50); // cut inside the node (columns 49–57)
    const p = temp(lines.join('\r\n') + '\r\n');
    const { designations, rejects, summary } = await read(p);
    expect(designations).toEqual(['(1) Ceres', '(4) Vesta']);
    expect(rejects.map((e) => e.message)).toEqual([
      `${p}:2:93: line ends at column 100, inside semimajor axis (columns 93–103)`,
      `${p}:3:49: line ends at column 50, inside longitude of the ascending node (columns 49–57)`,
    ]);
    expect(summary.linesRead).toBe(4);
  });
});

describe('accounting under garbage (property-based)', () => {
  const valid = ORBITS.split('\n').slice(0, 150);
  // printable ASCII and some Latin-1 letters; no line terminators
  const garbage = fc.string({ unit: fc.constantFrom(...' -~!#$%&*+,./0123456789:;<=>?@ABCDEFGHIJKLMNOPQRSTUVWXYZ_abcdefghijklmnopqrstuvwxyz|éü'), maxLength: 220 });

  it('orbit export: every line is a row, a reject or a skipped blank/separator line', async () => {
    await fc.assert(fc.asyncProperty(
      fc.array(fc.tuple(fc.nat({ max: valid.length }), garbage), { maxLength: 30 }),
      async (inserts) => {
        const lines = valid.slice();
        for (const [at, text] of inserts) lines.splice(Math.min(at, lines.length), 0, text);
        const { designations, rejects, summary } = await read(temp(lines.join('\n') + '\n'), { format: 'orbit-export' });
        // linesRead against independent counts: the data lines of the text (all but blank
        // and dashed separator lines) and what reached the callbacks.
        expect(summary.linesRead).toBe(dataLinesOfText(lines.join('\n'), 'fixed-width'));
        expect(designations.length + rejects.length).toBe(summary.linesRead);
        expect(summary.rows + summary.rejected + summary.skipped).toBe(lines.length);
        expect(summary.rows).toBeGreaterThanOrEqual(valid.length);
      }), { numRuns: 60 });
  });

  it('CSV without quotes: every line is a row, a reject or a skipped blank/header line', async () => {
    const header = 'designation,epoch,e,a,i,node,peri,M';
    const good = (k: number) => `B${k},2461200.5,0.1,2.5,3,40,50,60`;
    const noQuotes = garbage.map((s) => s.replace(/"/g, ''));
    await fc.assert(fc.asyncProperty(fc.array(fc.tuple(fc.nat({ max: 40 }), noQuotes), { maxLength: 20 }),
      async (inserts) => {
        const lines = Array.from({ length: 40 }, (_, k) => good(k));
        for (const [at, text] of inserts) lines.splice(at, 0, text);
        const { designations, rejects, summary } = await read(temp([header, ...lines].join('\n') + '\n'), { format: 'csv' });
        expect(summary.linesRead).toBe(dataLinesOfText([header, ...lines].join('\n'), 'csv'));
        expect(designations.length + rejects.length).toBe(summary.linesRead);
        expect(summary.rows + summary.rejected + summary.skipped).toBe(lines.length + 1);
        expect(summary.rows).toBeGreaterThanOrEqual(40);
      }), { numRuns: 40 });
  });

  it('CSV with stray quotes: no throw, no line reported twice, no line counted twice', async () => {
    const header = 'designation,epoch,e,a,i,node,peri,M';
    const good = (k: number) => `B${k},2461200.5,0.1,2.5,3,40,50,60`;
    const quoted = fc.string({ unit: fc.constantFrom(...' ",;\t-abcXYZ019.'), maxLength: 40 });
    await fc.assert(fc.asyncProperty(fc.array(fc.tuple(fc.nat({ max: 30 }), quoted), { maxLength: 12 }),
      async (inserts) => {
        const lines = Array.from({ length: 30 }, (_, k) => good(k));
        for (const [at, text] of inserts) lines.splice(at, 0, text);
        const seen = new Set<number>();
        const once = (n: number) => {
          expect(seen.has(n), `line ${n} reported twice`).toBe(false);
          seen.add(n);
        };
        const summary = await readOrbitFile(temp([header, ...lines].join('\n') + '\n'), { format: 'csv' },
          (_r, n) => once(n), (e) => once(e.line));
        // a quoted field may join lines into one record, so lines ≥ rows + rejected + skipped
        expect(summary.rows + summary.rejected + summary.skipped).toBeLessThanOrEqual(lines.length + 1);
        expect(summary.rows + summary.rejected).toBe(seen.size);
      }), { numRuns: 100 });
  });
});
