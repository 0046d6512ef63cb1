// `wayward coorbitals` on rows it cannot use: nothing is dropped without a word. Invented
// bodies (synthetic test data): a hyperbolic orbit (e ≥ 1 has no mean motion, hence no 1:1
// resonance: common practice), a row missing its mean anomaly, and an Earth-zone body whose
// N-body window reaches outside the planetary theory's span (VSOP87B is used over years
// 1000–3000, as documented in README).
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli, tempDir } from './cliHarness.js';

const ROWS = [
  'designation,epoch,a,q,e,i,om,w,ma,tp',
  '2090 AB1,2461200.5,,0.9,1.3,10,20,30,,2461250.5',
  '2090 AB2,2461200.5,1.001,,0.1,5,20,30,,',
  '2090 AB3,2461200.5,1.001,,0.1,5,20,30,40,',
];
let out = '';
let input = '';
let stdout = '';

beforeAll(() => {
  const dir = tempDir();
  input = join(dir, 'mixed.csv');
  writeFileSync(input, ROWS.join('\n') + '\n');
  out = join(dir, 'out');
  const r = runCli(['coorbitals', input, '--years', '1200', '--out', out]);
  expect(r.status, r.stderr).toBe(0);
  stdout = r.stdout;
});

const table = (name: string): Record<string, string>[] => parse(readFileSync(join(out, name)), { columns: true });

describe('wayward coorbitals: every row accounted for', () => {
  it('the row that cannot be read is in rejects.csv with its file and line, and counted on stdout', () => {
    const rejects = table('rejects.csv');
    expect(rejects.map((r) => [r.file, r.line])).toEqual([[input, '3']]);
    expect(rejects[0].reason).toMatch(/ma/);
    expect(stdout).toContain('3 rows read: 2 bodies accepted, 1 rejected');
    expect(readFileSync(join(out, 'report.md'), 'utf8')).toContain(`${input}:3:`);
  });

  it('the unbound body is named in not-screened.csv with its reason and source line', () => {
    const rows = table('not-screened.csv');
    expect(rows.map((r) => [r.designation, r.reason, r.source_line])).toEqual([['2090 AB1', 'unbound', '2']]);
    expect(Number(rows[0].e)).toBe(1.3);
    const j = JSON.parse(readFileSync(join(out, 'coorbitals.json'), 'utf8'));
    expect(j.notScreened.unbound).toBe(1);
    expect(j.notScreenedBodies).toBe(1);
    expect(j.rowsRead).toBe(3);
    expect(j.rejected).toBe(1);
    expect(j.screened + Object.values(j.notScreened as Record<string, number>).reduce((a, b) => a + b, 0)).toBe(j.accepted);
  });

  it('the body whose window leaves the ephemeris span is screened, predicted, and says why it is not integrated', () => {
    const [b] = table('coorbitals.csv');
    expect(b.designation).toBe('2090 AB3');
    expect(b.predicted).not.toBe('');
    expect(b.confirmed_now).toBe('');
    expect(b.unconfirmed_reason).toContain('outside the ephemeris span');
    expect(stdout).toMatch(/2090 AB3 .*coorbital-unconfirmed/);
  });
});
