import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cliHarness.js';
import { coorbitalTruth, demoSubsetFile } from './demoCoorbitals.js';

// The invented demo catalogue plants co-orbitals and passing controls of the Earth, Mars,
// Jupiter and Neptune; their truth is what the generator's N-body run with the detector's own
// stages gave (data/demo/coorbital-truth.csv, scripts/make-demo.ts). `coorbitals` predicts and
// integrates every body in the planets' 1:1 zones; each planted body must come out with its
// recorded state now, its recorded prediction, and its capture.
interface Truth { designation: string; class: string; detector: string; note: string }
const truth = (parse(readFileSync(join(ROOT, 'data/demo/truth.csv')), { columns: true }) as Truth[]).filter((t) => t.detector === 'coorbital');
const inner = coorbitalTruth.filter((t) => t.planet !== 'jupiter');
const jupiter = coorbitalTruth.filter((t) => t.planet === 'jupiter');
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
  it('predicts and confirms every planted Earth, Mars and Neptune body with its recorded state, prediction and capture', () => {
    expect(truth.length).toBe(coorbitalTruth.length);
    expect(inner.length).toBeGreaterThan(20);
    for (const t of inner) {
      const b = bodies.find((x) => x.designation === t.designation);
      expect(b, t.designation).toBeDefined();
      expect(b!.planet).toBe(t.planet);
      expect(b!.predicted, t.designation).toBe(t.predicted);
      expect(b!.confirmed_now, t.designation).toBe(t.state_now);
      expect(b!.agree, t.designation).toBe(t.agree); // disagreements: listed with their reason in coorbital-truth.csv
      expect(Number(b!.captures) > 0, t.designation).toBe(t.temporary_capture === 'yes');
    }
    // the temporary capture is resonant now and printed with its flag
    const captured = inner.filter((t) => t.temporary_capture === 'yes' && t.state_now !== 'passing');
    expect(captured.length).toBeGreaterThan(0);
    for (const t of captured) expect(stdout.split('\n').find((l) => l.includes(t.designation))).toContain('temporary-capture');
  });

  it('the Jupiter Trojan group comes out as tadpoles on its side, from an orbit file of the Jupiter plants and --planet jupiter', () => {
    const dir = tempDir();
    const r = runCli(['coorbitals', '--planet', 'jupiter', '--out', dir, demoSubsetFile(jupiter)]);
    expect(r.status, r.stderr).toBe(0);
    const rows = parse(readFileSync(join(dir, 'coorbitals.csv')), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(jupiter.length);
    const trojans = jupiter.filter((t) => t.state_now.startsWith('tadpole'));
    expect(trojans.length).toBeGreaterThanOrEqual(10);
    for (const t of jupiter) {
      const b = rows.find((x) => x.designation === t.designation)!;
      expect(b.confirmed_now, t.designation).toBe(t.state_now);
      expect(b.predicted, t.designation).toBe(t.predicted);
      if (t.state_now.startsWith('tadpole')) {
        // on its side: L4 leads Jupiter (φ > 0), L5 trails (Murray & Dermott 1999, §3.6)
        expect(t.state_now === 'tadpole-L4' ? Number(b.phi_deg) > 0 : Number(b.phi_deg) < 0, t.designation).toBe(true);
        expect(r.stdout).toContain(t.designation);
      }
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
    for (const t of inner.filter((x) => x.state_now !== 'passing')) expect(stdout).toContain(t.designation);
    expect(readFileSync(join(out, 'report.md'), 'utf8')).toContain('## Resonant now');
  });

  it('draws φ(t) and the rotating-frame path of every planted Earth co-orbital as PNG and SVG, linked from report.md', () => {
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    const earth = coorbitalTruth.filter((t) => t.planet === 'earth' && t.state_now !== 'passing');
    expect(earth.length).toBeGreaterThanOrEqual(13);
    for (const t of earth) {
      // the body's heading, then one line with its two pictures, each linking its SVG
      const at = report.indexOf(`### ${t.designation} (earth, ${t.state_now})`);
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
