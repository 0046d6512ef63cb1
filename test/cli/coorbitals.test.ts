import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cliHarness.js';

// The invented demo catalogue plants 13 co-orbitals of Earth, Mars and Neptune (truth.csv,
// scripts/make-demo.ts). `coorbitals` predicts and integrates every body in those planets'
// 1:1 zones; each planted body must come out in its planted state from both stages.
interface Truth { designation: string; class: string; detector: string; note: string }
const truth = (parse(readFileSync(join(ROOT, 'data/demo/truth.csv')), { columns: true }) as Truth[]).filter((t) => t.detector === 'coorbital');
let out = '';
let stdout = '';
let bodies: Record<string, string>[] = [];
let segments: Record<string, string>[] = [];

beforeAll(() => {
  out = tempDir();
  const r = runCli(['coorbitals', '--planet', 'earth,mars,neptune', '--out', out]);
  expect(r.status, r.stderr).toBe(0);
  stdout = r.stdout;
  bodies = parse(readFileSync(join(out, 'coorbitals.csv')), { columns: true });
  segments = parse(readFileSync(join(out, 'segments.csv')), { columns: true });
});

describe('wayward coorbitals on the demo catalogue', () => {
  it('predicts and confirms every planted co-orbital in its planted state', () => {
    expect(truth.length).toBe(13);
    for (const t of truth) {
      const b = bodies.find((x) => x.designation === t.designation);
      expect(b, t.designation).toBeDefined();
      expect(b!.planet).toBe(t.note.split(' ')[0].toLowerCase());
      expect(b!.predicted, t.designation).toBe(t.class);
      expect(b!.confirmed_now, t.designation).toBe(t.class);
      expect(b!.agree).toBe('true');
    }
  });

  it('confirms every screened body (within the budget) and writes each history as contiguous segments', () => {
    const confirmed = bodies.filter((b) => b.confirmed_now !== '');
    expect(confirmed.length + bodies.filter((b) => b.unconfirmed_reason !== '').length).toBe(bodies.length);
    for (const b of confirmed) {
      const segs = segments.filter((s) => s.designation === b.designation);
      expect(segs.length, b.designation).toBe(Number(b.segments));
      for (let k = 1; k < segs.length; k++) expect(Number(segs[k].start_jd_tdb)).toBeCloseTo(Number(segs[k - 1].end_jd_tdb), 3);
      // ±500 years, less at most a twentieth of the planet's period at each end (sampling grid)
      const span = Number(segs[segs.length - 1].end_yr) - Number(segs[0].start_yr);
      expect(span, b.designation).toBeGreaterThan(1000 - 2 * 165 / 20 - 1e-6);
    }
  });

  it('accounts for every accepted body and prints the resonant ones', () => {
    const j = JSON.parse(readFileSync(join(out, 'coorbitals.json'), 'utf8'));
    const not = Object.values(j.notScreened as Record<string, number>).reduce((a, b) => a + b, 0);
    expect(j.screened + not).toBe(j.accepted);
    expect(j.screened).toBe(bodies.length);
    for (const t of truth) expect(stdout).toContain(t.designation);
    expect(readFileSync(join(out, 'report.md'), 'utf8')).toContain('## Resonant now');
  });

  it('an unknown planet is a usage error listing the valid names', () => {
    const r = runCli(['coorbitals', '--planet', 'pluto']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('mercury, venus, earth, mars, jupiter, saturn, uranus, neptune, or all');
  });
});
