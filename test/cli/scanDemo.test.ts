import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli, tempDir } from './cliHarness.js';
import { coorbitalTruth, demoSubsetFile } from './demoCoorbitals.js';
import { expectEveryRowAccounted } from './rowAccounting.js';

// The demo catalogue is invented (scripts/make-demo.ts, fixed seed); its truth table lists
// every planted body. These checks are the "Done when" of the pipeline: the demo scan finds
// every planted Tisserand anomaly, accounts for every row, and reruns byte-identically.
// A pipeline test only: the generator plants bodies by T_J from the same textbook formula the
// detector uses, so finding them checks reading, cleaning, classing and reporting, not the
// formula. The formula is checked against T_J published for real bodies in
// test/core/tisserand.test.ts, and the scan against real samples in scanRealSamples.test.ts.
interface TruthRow { designation: string; file: string; line: string; class: string; detector: string; note: string }
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

  it('accounts per detector for every accepted body: screened plus not screened by reason', () => {
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    const t = s.detectors.tisserand;
    const notScreened = Object.values(t.notScreened as Record<string, number>).reduce((a, b) => a + b, 0);
    expect(t.screened + notScreened).toBe(s.rows.accepted);
    expect(t.accepted).toBe(s.rows.accepted);
    // The generator writes 276 natural Hildas (data/demo/README.md, natural population
    // table) and plants none; the zone's bounds also hold one natural Jupiter-family comet
    // (comets.txt line 138, P/2032 F4: a 3.86 au, e 0.28, i 17.9°). Nothing else is in it.
    expect(t.notScreened['hilda-zone']).toBe(277);
    // Tail fractions are over the screened bodies of one catalogue: the two populations
    // of the candidates' tailPopulation add up to the screened count.
    const populations = new Set(candidates.filter((c) => c.detector === 'tisserand').map((c) => (c as unknown as { tailPopulation: number }).tailPopulation));
    expect([...populations].reduce((a, b) => a + b, 0)).toBe(t.screened);
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    expect(report).toContain(`| screened | ${t.screened} |`);
    expect(report).toContain(`| not screened: in the Hilda zone of the 3:2 resonance with Jupiter (3.7–4.2 au, e < 0.3, i < 20°) (\`hilda-zone\`) | 277 |`);
    expect(report).toContain(`| **accepted bodies** | ${s.rows.accepted} |`);
  });

  it('keeps the tail fraction and the false-alarm probability apart, and defines both', () => {
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(s.detectors.tisserand.definitions.tailFraction).toContain('not a probability');
    expect(s.detectors.tisserand.definitions.falseAlarmProb).toContain('no null model');
    const raw = readFileSync(join(out, 'candidates.jsonl'), 'utf8').trim().split('\n').map((l) => JSON.parse(l));
    // families runs by default (src/detect/registry.ts) and is the one detector with a null model:
    // its candidates carry a false-alarm probability and a q-value below the false-discovery level
    expect(s.detectors.families.definitions.falseAlarmProb).toContain('Benjamini–Hochberg');
    for (const c of raw) {
      if (c.detector === 'families') {
        expect(c.falseAlarmProb).toBeGreaterThan(0);
        expect(c.details.q_value).toBeLessThan(0.05);
        continue;
      }
      expect(c.falseAlarmProb).toBeNull();
      expect(c.tailFraction).toBeGreaterThan(0);
      expect(c.tailFraction).toBeLessThanOrEqual(1);
      expect(c).not.toHaveProperty('falseAlarm');
    }
    const csvHead = readFileSync(join(out, 'candidates.csv'), 'utf8').split('\n')[0].split(',');
    expect(csvHead).toContain('tail_fraction');
    expect(csvHead).toContain('false_alarm_prob');
    expect(stdout).toContain('tail fraction');
    expect(stdout).toContain('false-alarm prob.');
  });

  it('shows the boundary cases in their own section and says where all candidates are', () => {
    const boundary = truth.filter((t) => t.class === 'boundary').map((t) => t.designation);
    const raised = candidates.filter((c) => c.class === 'boundary').map((c) => c.designation);
    expect(raised.length).toBeGreaterThan(0);
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    const section = report.slice(report.indexOf('### Boundary cases'));
    for (const d of raised) {
      expect(boundary).toContain(d);
      expect(section).toContain(`| ${d} |`);
    }
    expect(stdout).toContain(`boundary cases: all ${raised.length}`);
    const stdoutBoundary = stdout.slice(stdout.indexOf('boundary cases:'));
    for (const d of raised) expect(stdoutBoundary).toContain(d);
    // 25 comet-like-T bodies are planted (truth.csv): the report shows 20 and points to the files.
    expect(report).toContain('### comet-like-T (top 20 of 25; all 25 in candidates.csv and candidates.jsonl)');
    expect(stdout).toContain('comet-like-T: top 5 of 25');
    expect(stdout).toContain('candidates.csv');
  });

  it('--top N is the number of rows per class in the stdout table', () => {
    const r = runCli(['scan', '--out', tempDir(), '--reproducible', '--top', '2', '--detectors', 'tisserand']);
    expect(r.status).toBe(0);
    const blocks = r.stdout.split(/\n(?=comet-like-T:|asteroid-like-T:|boundary cases:|tail fraction:)/);
    const rowsOf = (head: string) => {
      const block = blocks.find((b) => b.startsWith(head))!;
      return block.split('\n').slice(3).filter((l) => l.trim() !== '').length; // heading, column names, rule
    };
    expect(r.stdout).toContain('comet-like-T: top 2 of 25');
    expect(rowsOf('comet-like-T:')).toBe(2);
    expect(rowsOf('asteroid-like-T:')).toBe(2);
    expect(rowsOf('boundary cases:')).toBe(2);
  });

  it('every candidate row carries the orbit quality it was judged with, as the input line gives it', () => {
    const lines = readFileSync(join(ROOT, 'data/demo/orbits.txt'), 'utf8').split('\n');
    const raw = readFileSync(join(out, 'candidates.jsonl'), 'utf8').trim().split('\n').map((l) => JSON.parse(l));
    const fromAsteroidFile = raw.filter((c) => c.source.file.endsWith('orbits.txt'));
    expect(fromAsteroidFile.length).toBeGreaterThan(20);
    for (const c of fromAsteroidFile) {
      // Whitespace tokens of the export line (independent of the fixed-column reader): after
      // the reference come observations, oppositions and the arc ('2020-2031' or '30 days').
      const tokens = lines[c.source.line - 1].trim().split(/\s+/);
      const ref = tokens.findIndex((t) => t.startsWith('WWDEMO'));
      expect(c.orbitQuality.observations, c.designation).toBe(Number(tokens[ref + 1]));
      expect(c.orbitQuality.oppositions, c.designation).toBe(Number(tokens[ref + 2]));
      expect(c.orbitQuality.epoch).toBe('2032-05-10.0'); // the demo's epoch (data/demo/README.md)
      expect(c.orbitQuality.U === null || typeof c.orbitQuality.U === 'number' || /^[A-Z]$/.test(c.orbitQuality.U)).toBe(true);
    }
    const csv = parse(readFileSync(join(out, 'candidates.csv')), { columns: true }) as Record<string, string>[];
    expect(csv.length).toBe(raw.length);
    for (const row of csv) expect(Object.keys(row)).toEqual(expect.arrayContaining(['epoch_jd_tt', 'arc_days', 'oppositions', 'observations', 'U']));
  });

  it('finds every planted Earth co-orbital with its N-body state from the truth, and no passing control', () => {
    // Earth is the co-orbital detector's default planet; the truth is the generator's N-body
    // run with the detector's own stages (data/demo/coorbital-truth.csv).
    const planted = coorbitalTruth.filter((t) => t.planet === 'earth');
    const resonant = planted.filter((t) => t.state_now !== 'passing');
    expect(resonant.length).toBeGreaterThanOrEqual(14);
    const raised = candidates.filter((c) => c.detector === 'coorbital') as unknown as
      { designation: string; class: string; flags: string[]; details: Record<string, string> }[];
    for (const t of resonant) {
      const c = raised.find((x) => x.designation === t.designation);
      expect(c, t.designation).toBeDefined();
      expect(c!.class, t.designation).toBe(t.state_now);
      expect(c!.flags).not.toContain('coorbital-unconfirmed');
      expect(c!.details.predicted, t.designation).toBe(t.predicted);
      expect(c!.details.agree, t.designation).toBe(t.agree); // a disagreement is listed with its reason in the truth file
      expect(c!.flags.includes('temporary-capture'), t.designation).toBe(t.temporary_capture === 'yes');
    }
    expect(resonant.filter((t) => t.temporary_capture === 'yes').length).toBeGreaterThan(0);
    for (const t of planted.filter((x) => x.state_now === 'passing')) expect(raised.find((x) => x.designation === t.designation), t.designation).toBeUndefined();
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    const co = s.detectors.coorbital;
    const notScreened = Object.values(co.notScreened as Record<string, number>).reduce((a, b) => a + b, 0);
    expect(co.screened + notScreened).toBe(s.rows.accepted);
  });

  it('finds the planted Mars, Jupiter and Neptune co-orbitals with their N-body state, Jupiter Trojans on their side', () => {
    // An orbit file of the outer plants only, so the Jupiter zone's natural Trojans are not integrated.
    const outer = coorbitalTruth.filter((t) => t.planet !== 'earth');
    const dir = tempDir();
    const r = runCli(['scan', '--out', dir, '--reproducible', '--detectors', 'coorbital', '--coorbital-planet', 'mars,jupiter,neptune', demoSubsetFile(outer)]);
    expect(r.status, r.stderr).toBe(0);
    const raised = readFileSync(join(dir, 'candidates.jsonl'), 'utf8').trim().split('\n').filter(Boolean).map((l) => JSON.parse(l)) as
      { designation: string; class: string; details: Record<string, string | number> }[];
    for (const t of outer) {
      const c = raised.find((x) => x.designation === t.designation);
      if (t.state_now === 'passing') {
        expect(c, t.designation).toBeUndefined();
        continue;
      }
      expect(c, t.designation).toBeDefined();
      expect(c!.class, t.designation).toBe(t.state_now);
      expect(c!.details.planet).toBe(t.planet);
      expect(c!.details.agree, t.designation).toBe(t.agree);
      // L4 leads the planet (φ > 0), L5 trails it (Murray & Dermott 1999, §3.6)
      expect(t.state_now === 'tadpole-L4' ? Number(c!.details.phi_deg) > 0 : Number(c!.details.phi_deg) < 0, t.designation).toBe(true);
    }
    expect(raised.filter((c) => c.details.planet === 'jupiter').length).toBeGreaterThanOrEqual(10);
  });

  it('reruns byte-identically (every output file), with one worker thread instead of two', () => {
    const again = tempDir();
    expect(runCli(['scan', '--out', again, '--reproducible', '--threads', '1']).status).toBe(0);
    for (const f of ['candidates.jsonl', 'candidates.csv', 'rejects.csv', 'report.md', 'summary.json']) {
      expect(readFileSync(join(again, f)).equals(readFileSync(join(out, f))), f).toBe(true);
    }
  });
});
