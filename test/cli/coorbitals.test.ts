import { readdirSync, readFileSync } from 'node:fs';
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

  it('draws φ(t) and the rotating-frame path of every planted Earth co-orbital as PNG and SVG, linked from report.md', () => {
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    const earth = truth.filter((t) => t.note.startsWith('Earth'));
    expect(earth.length).toBe(7);
    for (const t of earth) {
      // the body's heading, then one line with its two pictures, each linking its SVG
      const at = report.indexOf(`### ${t.designation} (earth, ${t.class})`);
      expect(at, t.designation).toBeGreaterThan(report.indexOf('## Plots'));
      const line = report.slice(at).split('\n')[2];
      const links = [...line.matchAll(/\]\((plots\/[^)]+)\.(png|svg)\)/g)].map((m) => `${m[1]}.${m[2]}`);
      expect(links.length, t.designation).toBe(4);
      expect(links.filter((l) => /-phi\.(png|svg)$/.test(l)).length).toBe(2);
      expect(links.filter((l) => /-rotating\.(png|svg)$/.test(l)).length).toBe(2);
      for (const l of links) {
        expect(l, 'safe file name').toMatch(/^plots\/[A-Za-z0-9_-]+\.(png|svg)$/);
        const bytes = readFileSync(join(out, l));
        if (l.endsWith('.png')) {
          // PNG signature and the IHDR width (PNG specification, ISO/IEC 15948 §5.2, §11.2.2)
          expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
          expect(bytes.subarray(12, 16).toString('latin1')).toBe('IHDR');
          expect(bytes.readUInt32BE(16)).toBe(1200);
        } else {
          expect(bytes.toString('utf8')).toMatch(/^<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"/);
        }
      }
    }
    // one pair of charts per body resonant now by N-body, no more, and no series in the JSON
    const resonant = bodies.filter((b) => b.confirmed_now !== '' && b.confirmed_now !== 'passing');
    expect(readdirSync(join(out, 'plots')).length).toBe(4 * resonant.length);
    const j = JSON.parse(readFileSync(join(out, 'coorbitals.json'), 'utf8'));
    for (const b of j.bodies) expect(b.history?.series).toBeUndefined();
    expect(readdirSync(out).filter((f) => f.startsWith('.'))).toEqual([]); // nothing left staged
  });

  it('an unknown planet is a usage error listing the valid names', () => {
    const r = runCli(['coorbitals', '--planet', 'pluto']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('mercury, venus, earth, mars, jupiter, saturn, uranus, neptune, or all');
  });
});
