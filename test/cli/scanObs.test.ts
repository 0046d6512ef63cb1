/**
 * `scan --obs DIR` end to end, the built program run as a user would, on the demo: the demo
 * body 2030 QW12 (data/demo/check/, synthetic: C_R·A/m = 0.039 m²/kg planted, its README; its
 * row at the end of data/demo/orbits.txt and in truth.csv with class srp, detector nongrav).
 * The directory holds the same 480 observations twice (80-column and ADES PSV) and three files
 * that are not astrometry. To keep the runs short they use `--detectors tisserand,nongrav`
 * (the co-orbital and families detectors do not read astrometry).
 * Bad input: a designation not in the catalogue, an unreadable line, an empty directory, a
 * directory of no astrometry, and the usage errors of --obs, --obscodes and --not-after.
 */
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { fitJson } from './checkFitJson.js';
import { ROOT, runCli, tempDir, type CliRun } from './cliHarness.js';

const OBS = 'data/demo/check';
const CODES = 'data/demo/observatory-codes.txt';
const COMMON = ['--obscodes', CODES, '--not-after', '2033-01-01', '--detectors', 'tisserand,nongrav', '--reproducible'];
const PLANTED_CR_AM = 0.039; // C_R · A/m, m²/kg (data/demo/check/README.md)

interface Row { designation: string; detector: string; class: string; score: number; falseAlarmProb: number; tailFraction: number; why: string; details: Record<string, number | string> }

function candidates(dir: string): Row[] {
  return readFileSync(join(dir, 'candidates.jsonl'), 'utf8').trim().split('\n').filter(Boolean).map((l) => JSON.parse(l));
}

function files(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).sort().map((f) => [f, readFileSync(join(dir, f), 'utf8')]));
}

describe('scan --obs on the demo', () => {
  const outs = [tempDir('wayward-obs-t1-'), tempDir('wayward-obs-t2-'), tempDir('wayward-obs-t2b-')];
  let runs: CliRun[] = [];
  beforeAll(() => {
    runs = [
      runCli(['scan', '--obs', OBS, ...COMMON, '--threads', '1', '--out', outs[0]]),
      runCli(['scan', '--obs', OBS, ...COMMON, '--threads', '2', '--out', outs[1]]),
      runCli(['scan', '--obs', OBS, ...COMMON, '--threads', '2', '--out', outs[2]]),
    ];
  }, 600_000);

  it('lists the demo body as an srp candidate with its area-to-mass ratio, as truth.csv plants it', () => {
    for (const r of runs) expect(r.status, r.stderr).toBe(0);
    const truth = (parse(readFileSync(join(ROOT, 'data/demo/truth.csv')), { columns: true }) as Record<string, string>[]).filter((t) => t.detector === 'nongrav');
    expect(truth.map((t) => [t.designation, t.class])).toEqual([['2030 QW12', 'srp']]);
    const rows = candidates(outs[0]).filter((c) => c.detector === 'nongrav');
    expect(rows.map((c) => [c.designation, c.class])).toEqual([['2030 QW12', 'srp']]);
    const c = rows[0];
    const value = c.details.areaToMass as number, sigma = c.details.areaToMass_sigma as number;
    console.log(`demo body: C_R·A/m = ${value} ± ${sigma} m²/kg (planted ${PLANTED_CR_AM}), Δχ² ${c.score}, p ${c.falseAlarmProb}`);
    expect(Math.abs(value - PLANTED_CR_AM)).toBeLessThan(3 * sigma);
    expect(c.details.plausibility).toBe('artificial-like');
    expect(c.falseAlarmProb).toBeLessThan(0.0027);
    expect(runs[0].stdout).toMatch(/nongrav: 1 of \d+ accepted bodies screened \(not screened: no-astrometry \d+\)\nsrp: all 1\n/);
    expect(runs[0].stdout).toContain('2030 QW12');
  });

  it('accounts for every catalogue body and every record of the directory', () => {
    const s = JSON.parse(readFileSync(join(outs[0], 'summary.json'), 'utf8'));
    const d = s.detectors.nongrav;
    expect(d.screened + Object.values(d.notScreened as Record<string, number>).reduce((a, b) => a + b, 0)).toBe(s.rows.accepted);
    const a = s.astrometry;
    expect(a.files.map((f: { file: string; observations: number }) => [f.file, f.observations])).toEqual([
      [`${OBS}/check-body.obs80.txt`, 480], [`${OBS}/check-body.psv`, 480],
    ]);
    expect(a.notAstrometry.map((n: { file: string }) => n.file)).toEqual([`${OBS}/README.md`, `${OBS}/check-body-elements.txt`, `${OBS}/check-body-observations.csv`]);
    expect([a.designations, a.bodiesMatched, a.notInCatalogue, a.recordsSetAside, a.observationsUsable]).toEqual([1, 1, 0, 480, 480]);
    // every PSV record is the 80-column one given again: set aside with file, line and the record it repeats
    const rejects = parse(readFileSync(join(outs[0], 'obs-rejects.csv')), { columns: true }) as Record<string, string>[];
    expect(rejects).toHaveLength(480);
    expect(rejects.every((r) => r.file === `${OBS}/check-body.psv` && r.kind === 'duplicate')).toBe(true);
    expect(rejects[0].reason).toMatch(/^the observation of data\/demo\/check\/check-body\.obs80\.txt:1 given again \(station \w{3}/);
    expect(runs[0].stderr).toContain('wayward: 2030 QW12: 480 of its 960 records set aside (given again in another file: 480)');
    expect(runs[0].stderr).toContain(`wayward: ${OBS}/README.md: not read as astrometry:`);
  });

  it('gives the numbers check gives for the body from the same file and elements (the 80-column file comes first by name)', () => {
    const out = tempDir('wayward-obs-check-');
    const r = runCli(['check', '2030 QW12', '--obs', `${OBS}/check-body.obs80.txt`, '--obscodes', CODES,
      '--elements', `${OBS}/check-body-elements.txt`, '--not-after', '2033-01-01', '--out', out]);
    expect(r.status, r.stderr).toBe(0);
    const f = fitJson(out);
    const c = candidates(outs[0]).find((x) => x.detector === 'nongrav')!;
    expect(f.preferred).toBe(c.class);
    // the scan writes six significant figures of the same fit
    expect(c.details.areaToMass).toBe(Number(f.models.srp.params.areaToMass.value.toPrecision(6)));
    expect(Math.abs((c.details.delta_chi2 as number) - f.models.srp.deltaChi2)).toBeLessThan(1e-3);
    expect([c.details.kept, c.details.rejected]).toEqual([f.models.srp.kept, f.models.srp.rejected]);
  }, 300_000);

  it('writes the same bytes on one and two threads, and on a rerun', () => {
    const [a, b, c] = outs.map(files);
    expect(Object.keys(a)).toEqual(['candidates.csv', 'candidates.jsonl', 'obs-rejects.csv', 'rejects.csv', 'report.md', 'summary.json']);
    for (const name of Object.keys(a)) {
      // report.md and candidates name the output directory nowhere; summary.json has no timing with --reproducible
      expect(b[name], name).toBe(a[name]);
      expect(c[name], name).toBe(a[name]);
    }
    expect(runs[1].stdout.replaceAll(outs[1], 'OUT')).toBe(runs[0].stdout.replaceAll(outs[0], 'OUT'));
  });
});

describe('scan --obs: bad input', () => {
  it('a designation not in the catalogue and an unreadable line: named with file and line, the rest checked', () => {
    const dir = tempDir('wayward-obs-bad-');
    const lines = readFileSync(join(ROOT, OBS, 'check-body.obs80.txt'), 'latin1').split('\n');
    // 20 records of a designation the catalogue does not hold (the packed form of 2030 QZ99)
    writeFileSync(join(dir, 'other.txt'), lines.slice(0, 20).map((l) => l.replace('K30Q12W', 'K30Q99Z')).join('\n') + '\n');
    lines[4] = 'this line is not an 80-column astrometry record';
    writeFileSync(join(dir, 'body.txt'), lines.join('\n'));
    const out = tempDir('wayward-obs-bad-out-');
    const r = runCli(['scan', '--obs', dir, ...COMMON, '--out', out]);
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toContain(`wayward: ${join(dir, 'body.txt')}:5: `);
    expect(r.stderr).toMatch(/: 2030 QZ99 \(20 observations\) is not in the catalogue; not checked\n/);
    const rejects = parse(readFileSync(join(out, 'obs-rejects.csv')), { columns: true }) as Record<string, string>[];
    expect(rejects.filter((x) => x.kind === 'parse').map((x) => [x.file, x.line])).toEqual([[join(dir, 'body.txt'), '5']]);
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect([s.astrometry.unreadableLines, s.astrometry.notInCatalogue, s.astrometry.notInCatalogueObservations, s.astrometry.bodiesMatched]).toEqual([1, 1, 20, 1]);
    expect(candidates(out).filter((c) => c.detector === 'nongrav').map((c) => c.class)).toEqual(['srp']);
  }, 300_000);

  it('an empty directory: exit 1, one line saying so, nothing written', () => {
    const dir = tempDir('wayward-obs-empty-');
    const out = join(tempDir(), 'never');
    const r = runCli(['scan', '--obs', dir, ...COMMON, '--out', out]);
    expect(r.status).toBe(1);
    expect(r.stderr.trim()).toBe(`wayward: --obs ${dir}: the directory holds no files; nothing to check`);
    expect(existsSync(out)).toBe(false);
  });

  it('a directory without astrometry: exit 1, each file named with its reason', () => {
    const dir = tempDir('wayward-obs-none-');
    copyFileSync(join(ROOT, OBS, 'README.md'), join(dir, 'README.md'));
    mkdirSync(join(dir, 'sub'));
    const r = runCli(['scan', '--obs', dir, ...COMMON, '--out', tempDir()]);
    expect(r.status).toBe(1);
    expect(r.stderr.trim().split('\n')).toEqual([
      `wayward: --obs ${dir}: no file of the directory holds an astrometry record (80-column or ADES PSV)`,
      `wayward: ${join(dir, 'README.md')}: line 3: ADES column header lacks permID or provID or trkSub, obsTime, ra, dec, stn`,
    ]);
  });

  it('usage errors (exit 2): --obs without nongrav among the detectors named, --obscodes or --not-after without --obs', () => {
    const a = runCli(['scan', '--obs', OBS, '--detectors', 'tisserand', '--out', tempDir()]);
    expect(a.status).toBe(2);
    expect(a.stderr).toContain('--obs is read by the nongrav detector only: add nongrav to --detectors');
    const b = runCli(['scan', '--obscodes', CODES, '--out', tempDir()]);
    expect(b.status).toBe(2);
    expect(b.stderr).toContain('--obscodes is read with --obs DIR only');
    const c = runCli(['scan', '--not-after', '2033-01-01', '--out', tempDir()]);
    expect(c.status).toBe(2);
    expect(c.stderr).toContain('--not-after is read with --obs DIR only');
  });

  it('nongrav named without --obs: every body not screened, "no astrometry given"', () => {
    const out = tempDir();
    const r = runCli(['scan', '--detectors', 'nongrav', '--reproducible', '--out', out]);
    expect(r.status, r.stderr).toBe(0);
    const s = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(s.detectors.nongrav.screened).toBe(0);
    expect(s.detectors.nongrav.notScreened['no-astrometry-given']).toBe(s.rows.accepted);
    expect(r.stdout).toContain(`nongrav: 0 of ${s.rows.accepted} accepted bodies screened (not screened: no-astrometry-given ${s.rows.accepted})`);
  });
});
