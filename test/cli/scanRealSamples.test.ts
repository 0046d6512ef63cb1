import { readFileSync } from 'node:fs';
import { basename, join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cliHarness.js';
import { dataLineCount } from '../helpers/dataLines.js';
import { expectEveryRowAccounted } from './rowAccounting.js';

// Real data: copies of the shared open samples of the one-line orbit and comet export
// formats (provenance and notice in test/fixtures/orbit-export/ and comet-export/), stored
// gzip-compressed; the scan command reads the .gz files as they are (gzip by magic bytes).
const ORBITS = join(ROOT, 'test/fixtures/orbit-export/orbits-export-sample.txt.gz');
const COMETS = join(ROOT, 'test/fixtures/comet-export/comets-export-sample.txt.gz');

interface Cand { designation: string; class: string; details: { T: number } }
let out = '';
let summary: { rows: { read: number; accepted: number; rejected: number }; files: { file: string; rows: { read: number; accepted: number; rejected: number } }[] };
let candidates: Cand[] = [];

beforeAll(() => {
  out = tempDir();
  const r = runCli(['scan', ORBITS, COMETS, '--out', out, '--quiet', '--reproducible']);
  expect(r.status, r.stderr).toBe(0);
  summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
  candidates = readFileSync(join(out, 'candidates.jsonl'), 'utf8').trim().split('\n').filter(Boolean).map((l) => JSON.parse(l));
});

describe('scan on real export samples', () => {
  it('reads every data line of both samples (259 orbit lines, 100 comet lines), each one accepted or rejected', async () => {
    // 260 lines in the orbit sample, one of them the blank separator; 100 comet lines.
    expect([ORBITS, COMETS].map(dataLineCount)).toEqual([259, 100]);
    expect(summary.rows.read).toBe(259 + 100);
    // Line 178 of the orbit sample has no designation and zero elements: the one reject.
    expect(summary.rows.rejected).toBe(1);
    await expectEveryRowAccounted(out, [ORBITS, COMETS]);
    // the files are named as given: the stored .gz samples, read without unpacking first
    expect(summary.files.map((f) => basename(f.file))).toEqual(['orbits-export-sample.txt.gz', 'comets-export-sample.txt.gz']);
  });

  it('every rejected row carries its line, reason and raw text', () => {
    const rejects = parse(readFileSync(join(out, 'rejects.csv')), { columns: true }) as { file: string; line: string; reason: string; text: string }[];
    expect(rejects.length).toBe(summary.rows.rejected);
    expect([basename(rejects[0].file), rejects[0].line]).toEqual(['orbits-export-sample.txt.gz', '178']);
    for (const r of rejects) {
      expect(Number(r.line)).toBeGreaterThan(0);
      expect(r.reason.length).toBeGreaterThan(5);
      expect(r.text.length).toBeGreaterThan(0);
    }
  });

  it('raises the active asteroid P/2013 R3 as asteroid-like (T_J 3.184 as published)', () => {
    // T_J 3.184: the article "P/2013 R3 (Catalina–PanSTARRS)" (en.wikipedia.org), for elements
    // of 2013; the sample's elements are of 2026, which moves T_J by under 0.001 (measured in
    // test/core/tisserand.test.ts).
    const r3 = candidates.find((c) => c.designation.startsWith('P/2013 R3 ') || c.designation === 'P/2013 R3');
    expect(r3?.class).toBe('asteroid-like-T');
    expect(Math.abs(r3!.details.T - 3.184)).toBeLessThan(0.0025);
  });

  it('does not raise (1) Ceres, (2) Pallas or (4) Vesta, which are asteroidal (T_J > 3)', () => {
    const names = candidates.map((c) => c.designation);
    for (const n of ['(1) Ceres', '(2) Pallas', '(4) Vesta']) expect(names).not.toContain(n);
  });
});
