import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cliHarness.js';
import { expectEveryRowAccounted } from './rowAccounting.js';

// The demo catalogue is invented (scripts/make-demo.ts, fixed seed); its truth table lists
// every planted body. These checks are the "Done when" of the pipeline: the demo scan finds
// every planted Tisserand anomaly, accounts for every row, and reruns byte-identically.
// A pipeline test only: the generator plants bodies by T_J from the same textbook formula the
// detector uses, so finding them checks reading, cleaning, classing and reporting, not the
// formula. The formula is checked against T_J published for real bodies in
// test/core/tisserand.test.ts, and the scan against real samples in scanRealSamples.test.ts.
interface TruthRow { designation: string; file: string; line: string; class: string; detector: string }
interface CandidateRecord { designation: string; detector: string; class: string; flags: string[]; source: { file: string; line: number } }

const truth = parse(readFileSync(join(ROOT, 'data/demo/truth.csv')), { columns: true }) as TruthRow[];
let out = '';
let stdout = '';
let candidates: CandidateRecord[] = [];

beforeAll(() => {
  out = tempDir();
  const r = runCli(['scan', '--out', out, '--reproducible']);
  expect(r.status, r.stderr).toBe(0);
  stdout = r.stdout;
  candidates = readFileSync(join(out, 'candidates.jsonl'), 'utf8').trim().split('\n').map((l) => JSON.parse(l));
});

describe('scan on the bundled demo catalogue', () => {
  it('finds every planted Tisserand anomaly with its planted class', () => {
    const planted = truth.filter((t) => t.detector === 'tisserand' && t.class !== 'boundary');
    expect(planted.length).toBeGreaterThan(20);
    const raised = new Map(candidates.filter((c) => c.detector === 'tisserand').map((c) => [c.designation, c.class]));
    const missed = planted.filter((t) => raised.get(t.designation) !== t.class).map((t) => `${t.designation} (${t.class})`);
    expect(missed).toEqual([]);
  });

  it('raises no unplanted Tisserand anomaly outside the boundary band', () => {
    const plantedNames = new Set(truth.filter((t) => t.detector === 'tisserand').map((t) => t.designation));
    const extra = candidates.filter((c) => c.detector === 'tisserand' && c.class !== 'boundary' && !plantedNames.has(c.designation));
    expect(extra.map((c) => c.designation)).toEqual([]);
  });

  it('labels the planted boundary cases as boundary, not anomalies', () => {
    const boundary = truth.filter((t) => t.class === 'boundary');
    for (const t of boundary) {
      const c = candidates.find((x) => x.designation === t.designation && x.detector === 'tisserand');
      // A boundary case just above 3.0 on the asteroid side is not raised at all.
      if (c) {
        expect(c.class).toBe('boundary');
        expect(c.flags).toContain('tisserand-boundary');
      }
    }
  });

  it('accounts for every row (data lines, rejects.csv, catalogue size); planted bad rows and duplicates are rejected', async () => {
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    await expectEveryRowAccounted(out, s.files.map((f: { file: string }) => f.file));
    const rejects = parse(readFileSync(join(out, 'rejects.csv')), { columns: true }) as { file: string; line: string; kind: string }[];
    const rejectedAt = new Set(rejects.map((r) => `${r.file.split('/').pop()}:${r.line}`));
    const expected = truth.filter((t) => t.class === 'bad-row' || t.class === 'duplicate');
    expect(expected.length).toBeGreaterThan(5);
    for (const t of expected) expect(rejectedAt, `${t.designation} ${t.class}`).toContain(`${t.file}:${t.line}`);
    for (const r of rejects as { text: string }[]) expect(r.text.length).toBeGreaterThan(0);
    expect(rejects.length).toBe(expected.length);
  });

  it('prints a short table of the top candidates and the screening caveat', () => {
    expect(stdout).toMatch(/rows read: \d+ accepted, \d+ rejected/);
    expect(stdout).toContain('comet-like-T');
    expect(stdout).toContain('Screening candidates only');
  });

  it('reruns byte-identically (every output file)', () => {
    const again = tempDir();
    expect(runCli(['scan', '--out', again, '--reproducible']).status).toBe(0);
    for (const f of ['candidates.jsonl', 'candidates.csv', 'rejects.csv', 'report.md', 'summary.json']) {
      expect(readFileSync(join(again, f)).equals(readFileSync(join(out, f))), f).toBe(true);
    }
  });
});
