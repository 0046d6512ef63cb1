import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { runCli, tempDir } from './cliHarness.js';
import { expectEveryRowAccounted } from './rowAccounting.js';

// Two real lines of the one-line orbit export format (lines 1 and 17 of
// /work/shared/data/orbits-export-sample.txt; provenance in test/fixtures/orbit-export/).
const CERES = '00001    3.34  0.15 K2669 274.41935   73.29420   80.24863   10.58803  0.0796923  0.21430445   2.7655526  0 MPO980521  7297 126 1801-2026 0.83 M-v 30k Veres      4000      (1) Ceres              20260103';
const THETIS = '00017    7.91  0.15 K2669 243.07058  136.16115  125.49572    5.59611  0.1308313  0.25344485   2.4729409  0 MPO980521 10807  98 1852-2026 0.57 M-v 3Ek Veres      0000     (17) Thetis             20260407';

function summaryOf(out: string) {
  return JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
}

describe('scan: bad input never stops a run, and every row is accounted for', () => {
  it('missing file: one line naming it, exit 1, other files still scanned', async () => {
    const dir = tempDir();
    const good = join(dir, 'good.txt');
    writeFileSync(good, `${CERES}\n${THETIS}\n`);
    const out = join(dir, 'out');
    const r = runCli(['scan', join(dir, 'nope.txt'), good, '--out', out, '--quiet']);
    expect(r.status).toBe(1);
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^wayward: .*nope\.txt: /);
    const s = summaryOf(out);
    expect(s.rows).toEqual({ read: 2, accepted: 2, rejected: 0 });
    expect(s.files[0].format).toBe('unreadable');
    await expectEveryRowAccounted(out, [join(dir, 'nope.txt'), good]);
  });

  it('a directory and a binary file are unreadable inputs (exit 1)', () => {
    const dir = tempDir();
    mkdirSync(join(dir, 'sub'));
    writeFileSync(join(dir, 'bin.dat'), Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0, 0, 1, 2, 0, 255]));
    const r = runCli(['scan', join(dir, 'sub'), join(dir, 'bin.dat'), '--out', join(dir, 'o'), '--quiet']);
    expect(r.status).toBe(1);
    // one line per file, then one saying nothing was written
    expect(r.stderr.trim().split('\n')).toHaveLength(3);
  });

  it('empty file: zero rows, exit 0', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'empty.txt'), '');
    const r = runCli(['scan', join(dir, 'empty.txt'), '--out', join(dir, 'o'), '--quiet']);
    expect(r.status).toBe(0);
    expect(summaryOf(join(dir, 'o')).rows).toEqual({ read: 0, accepted: 0, rejected: 0 });
  });

  it('truncated lines, CRLF endings and gzip: bad rows rejected with file and line, good rows kept', async () => {
    const dir = tempDir();
    const text = `${CERES}\r\n${THETIS.slice(0, 60)}\r\n${THETIS}\r\n`;
    writeFileSync(join(dir, 'mixed.txt.gz'), gzipSync(Buffer.from(text)));
    const out = join(dir, 'o');
    const r = runCli(['scan', join(dir, 'mixed.txt.gz'), '--out', out, '--quiet']);
    expect(r.status).toBe(0);
    expect(summaryOf(out).rows).toEqual({ read: 3, accepted: 2, rejected: 1 });
    const rejects = readFileSync(join(out, 'rejects.csv'), 'utf8').trim().split('\n');
    expect(rejects[0]).toBe('file,line,kind,reason,text');
    expect(rejects[1]).toContain('mixed.txt.gz,2,parse,');
    await expectEveryRowAccounted(out, [join(dir, 'mixed.txt.gz')]);
  });

  it('a duplicate spanning files and a file listed twice: each input accounted for on its own', async () => {
    const dir = tempDir();
    const a = join(dir, 'a.txt');
    const b = join(dir, 'b.txt');
    writeFileSync(a, `${CERES}\n${THETIS}\n`);
    // Ceres again with a later epoch (K2669 → K266A, one day on; packed-epoch letters: the
    // day digit 10 is 'A'), so b's row supersedes a's.
    writeFileSync(b, `${CERES.replace(' K2669 ', ' K266A ')}\n`);
    const out = join(dir, 'o');
    const r = runCli(['scan', a, b, a, '--out', out, '--quiet']);
    expect(r.status).toBe(0);
    const s = summaryOf(out);
    expect(s.files.map((f: { rows: unknown }) => f.rows)).toEqual([
      { read: 2, accepted: 1, rejected: 1 },
      { read: 1, accepted: 1, rejected: 0 },
      { read: 2, accepted: 0, rejected: 2 },
    ]);
    expect(s.rows).toEqual({ read: 5, accepted: 2, rejected: 3 });
    await expectEveryRowAccounted(out, [a, b, a]);
  });

  it('reads standard input with -', () => {
    const dir = tempDir();
    const r = runCli(['scan', '-', '--out', join(dir, 'o'), '--format', 'json'], { input: `${CERES}\n` });
    expect(r.status).toBe(0);
    const s = JSON.parse(r.stdout);
    expect(s.rows).toEqual({ read: 1, accepted: 1, rejected: 0 });
    expect(s.files[0].file).toBe('-');
  });

  it('CSV with a wrong column count on one row: that row rejected, the rest kept', async () => {
    const dir = tempDir();
    const csv = [
      'designation,epoch,a,e,i,om,w,ma,H',
      '2031 AA1,2463000.5,2.5,0.1,5,10,20,30,15',
      '2031 AA2,2463000.5,2.6,0.1,5,10,20',
      '2031 AA3,2463000.5,3.3,0.7,5,10,20,30,15',
    ].join('\n');
    writeFileSync(join(dir, 'x.csv'), csv);
    const out = join(dir, 'o');
    const r = runCli(['scan', join(dir, 'x.csv'), '--out', out, '--quiet']);
    expect(r.status).toBe(0);
    expect(summaryOf(out).rows).toEqual({ read: 3, accepted: 2, rejected: 1 });
    const rejects = readFileSync(join(out, 'rejects.csv'), 'utf8');
    expect(rejects).toContain('x.csv,3,parse,');
    await expectEveryRowAccounted(out, [join(dir, 'x.csv')]);
    // 2031 AA3 has T_J ≈ 2.6: a comet-like orbit in an asteroid table.
    const cands = readFileSync(join(out, 'candidates.csv'), 'utf8');
    expect(cands).toContain('2031 AA3,tisserand,comet-like-T');
  });

  it('a CSV header the mapping does not know: one line naming the file, exit 1', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'odd.csv'), 'foo,bar,baz\n1,2,3\n');
    const r = runCli(['scan', join(dir, 'odd.csv'), '--out', join(dir, 'o'), '--quiet']);
    expect(r.status).toBe(1);
    const lines = r.stderr.trim().split('\n');
    expect(lines).toHaveLength(2); // the file, then: no input could be read
    expect(lines[0]).toContain('odd.csv');
    expect(lines[0]).toContain('--columns'); // the option that can fix it
  });

  it('usage errors exit 2 with a message', () => {
    expect(runCli(['scan', '--detectors', 'nonsense']).status).toBe(2);
    expect(runCli(['scan', '--planet', 'pluto']).status).toBe(2);
    expect(runCli(['scan', '--top', '0']).status).toBe(2);
    expect(runCli(['frobnicate']).status).toBe(2);
    const r = runCli(['scan', '--planet', 'pluto']);
    expect(r.stderr).toContain("unknown planet 'pluto'");
  });

  it('a negative boundary half-width is a usage error (it would turn boundary cases into anomalies)', () => {
    const r = runCli(['scan', '--tisserand-margin', '-0.5']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("'-0.5' is negative");
    expect(runCli(['scan', '--tisserand-margin', 'abc']).status).toBe(2);
  });

  it('leaves no temporary files in the output directory', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'a.txt'), `${CERES}\n`);
    const out = join(dir, 'o');
    runCli(['scan', join(dir, 'a.txt'), '--out', out, '--quiet']);
    expect(readdirSync(out).sort()).toEqual(['candidates.csv', 'candidates.jsonl', 'rejects.csv', 'report.md', 'summary.json']);
  });
});
