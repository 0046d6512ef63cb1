/**
 * `npm run bench:check` (`npx tsx scripts/bench-check.ts [--count N] [--years Y] [--seed S] [--keep]`):
 * `wayward check` end to end on one invented body. Makes, in a temporary directory, seeded
 * synthetic astrometry (src/fit/synthetic/: the project's own dynamics, invented data) of a
 * main-belt body with a transverse non-gravitational term large enough to be found (so the refits run), 2 000 observations over 20
 * years from five real stations of test/fixtures/astrometry/observatory-codes.txt (their
 * published sites; the observations are not theirs), then runs the built CLI's `check` with
 * every model (gravity, thermal, comet, srp), outlier rejection and the leave-one-station-out
 * refits, as a child process under /usr/bin/time, with --threads 1 and then --threads 2. Prints
 * for each the wall and CPU time, peak RSS, the times the CLI's progress lines carry (stderr),
 * the number of fits, `uptime` before and after; then the ratio of the two (wall, and up to
 * "fits and guards done"), whether the two runs wrote byte-identical fit.json and
 * residuals.csv, and whether the target (< 10 s on this 2-core machine) is met. Figures only:
 * nothing here asserts a time.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { calendarToJd } from '../src/core/time/julian.js';
import { generateSyntheticAstrometry } from '../src/fit/synthetic/index.js';
import type { SyntheticStation } from '../src/fit/synthetic/types.js';
import { readObservatoryCodes } from '../src/io/astrometry/observatoryCodes.js';
import { elementsRow } from './synthetic/elementsRow.js';
import { writeSyntheticFiles } from './synthetic/syntheticFiles.js';

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const CLI = join(ROOT, 'dist/src/cli/main.js');
const TARGET_SECONDS = 10; // the project's target for this benchmark
const DESIGNATION = '2033 KB17'; // invented

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  if (i < 0) return fallback;
  const v = Number(process.argv[i + 1]);
  if (!Number.isFinite(v) || v <= 0) {
    console.error(`bench-check: --${name} needs a positive number`);
    process.exit(2);
  }
  return v;
}

const count = Math.round(arg('count', 2000));
const years = arg('years', 20);
const seed = Math.round(arg('seed', 7));
const keep = process.argv.includes('--keep');

/** Stations and their σ (″): typical modern CCD survey astrometry (from memory). */
const STATIONS: readonly [string, number][] = [['F51', 0.2], ['G96', 0.3], ['703', 0.6], ['W84', 0.25], ['I41', 0.4]];

function uptime(): string {
  const r = spawnSync('uptime', { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim() : '(no uptime)';
}

const seconds = (t0: bigint): number => Number(process.hrtime.bigint() - t0) / 1e9;

if (!existsSync(CLI)) {
  console.log('building dist/ (npm run build) ...');
  spawnSync('npm', ['run', 'build'], { cwd: ROOT, stdio: ['ignore', 'inherit', 'inherit'] });
  if (!existsSync(CLI)) throw new Error(`build did not produce ${CLI}`);
}

interface CheckRunFigures {
  threads: number;
  ok: boolean;
  out: string; // the output directory
  wall: number; // s
  fitsDone: number; // s since the command started, at 'fits and guards done' (NaN when absent)
  text: string[]; // the lines to print
}

/** The built CLI's `check` on the bench files with `threads` threads, under /usr/bin/time when there is one. */
function runCheckOnce(dir: string, threads: number): CheckRunFigures {
  const out = join(dir, `out-${threads}`);
  const before = uptime();
  const args = [CLI, 'check', DESIGNATION, '--obs', join(dir, 'bench.obs80.txt'), '--obscodes', join(ROOT, 'test/fixtures/astrometry/observatory-codes.txt'),
    '--elements', join(dir, 'bench-elements.txt'), '--not-after', '2100-01-01', '--threads', String(threads), '--out', out];
  const useTime = existsSync('/usr/bin/time');
  const [cmd, argv] = useTime ? ['/usr/bin/time', ['-f', 'maxrss-kb=%M cpu-user=%U cpu-sys=%S', process.execPath, ...args]] : [process.execPath, args];
  const t0 = process.hrtime.bigint();
  const r = spawnSync(cmd, argv, { cwd: ROOT, encoding: 'utf8', maxBuffer: 1 << 26 });
  const wall = seconds(t0);
  const after = uptime();
  const stderr = r.stderr ?? '';
  const m = /maxrss-kb=(\d+) cpu-user=([\d.]+) cpu-sys=([\d.]+)/.exec(stderr);
  const progress = stderr.split('\n').filter((l) => l.startsWith('wayward check ['));
  const done = progress.map((l) => /^wayward check \[([\d.]+) s\]: fits and guards done/.exec(l)).find((x) => x !== null);
  const text = [`--threads ${threads}:`, `  uptime before: ${before}`, `  uptime after:  ${after}`];
  if (r.status !== 0) {
    text.push(`  check FAILED (exit ${r.status}) after ${wall.toFixed(2)} s:`, stderr);
    return { threads, ok: false, out, wall, fitsDone: NaN, text };
  }
  const fits = progress.filter((l) => /: (fitting|refitting|leave-one-station-out: refitting)/.test(l)).length;
  text.push(`  wall ${wall.toFixed(2)} s, CPU ${m ? (Number(m[2]) + Number(m[3])).toFixed(2) : '?'} s (user+sys, all threads), peak RSS ${m ? (Number(m[1]) / 1024).toFixed(0) : '?'} MB`);
  text.push(`  fits started: ${fits} (each with its own integrations and iterations)`);
  text.push('  progress (stderr, seconds since the command started):', ...progress.map((l) => `    ${l}`));
  if (threads === 1) text.push(r.stdout.split('\n').slice(0, 12).map((l) => `  | ${l}`).join('\n'));
  return { threads, ok: true, out, wall, fitsDone: done ? Number(done[1]) : NaN, text };
}

function printRun(r: CheckRunFigures): void {
  for (const l of r.text) console.log(l);
}

const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-check-'));
try {
  const table = await readObservatoryCodes(join(ROOT, 'test/fixtures/astrometry/observatory-codes.txt'));
  const stations: SyntheticStation[] = STATIONS.map(([code, sigmaArcsec]) => {
    const site = table.sites.get(code);
    if (site === undefined || !site.fixedSite) throw new Error(`station ${code} is not a fixed site of the fixture table`);
    return { site, sigmaArcsec, note2: 'C', fromJdUtc: -Infinity, toJdUtc: Infinity };
  });
  // Invented main-belt body; epoch at the end of the span (as an orbit export would give it).
  const startJdUtc = calendarToJd(2014, 1, 1);
  const endJdUtc = startJdUtc + 365.25 * years;
  const el = elementsRow({
    designation: DESIGNATION, aAu: 2.45, e: 0.16, iDeg: 6.5, nodeDeg: 140, periDeg: 60, meanAnomalyDeg: 110,
    epochJdTT: Math.round(endJdUtc) + 0.5, H: 17.2, reference: 'BENCH',
  });
  const tGen = process.hrtime.bigint();
  const made = generateSyntheticAstrometry(DESIGNATION, {
    truth: {
      elements: el.elements, nonGravAuPerDay2: [0, -6e-13, 0], nonGravLaw: 'inverse-square',
      areaToMassM2PerKg: 0, radiationPressureCoefficient: 1, relativity: true,
    },
    stations, startJdUtc, endJdUtc, count, seed, outlierRate: 0.01, outlierArcsec: [3, 20],
  });
  writeSyntheticFiles({ dir, name: 'bench', format: 'obs80', elementsLine: el.line, observations: made.observations });
  console.log(`check benchmark: ${made.observations.length} observations (${made.shortBy} short) over ${years} years from ${STATIONS.map((s) => s[0]).join(', ')}, ${made.apparitions} apparitions; made in ${seconds(tGen).toFixed(1)} s in ${dir}`);

  const runs = [1, 2].map((threads) => {
    const r = runCheckOnce(dir, threads);
    printRun(r);
    return r;
  });
  const [one, two] = runs;
  if (one.ok && two.ok) {
    const same = ['fit.json', 'residuals.csv'].every((f) => readFileSync(join(one.out, f)).equals(readFileSync(join(two.out, f))));
    console.log(`1 thread / 2 threads: wall ${(one.wall / two.wall).toFixed(2)}× (${one.wall.toFixed(2)} s / ${two.wall.toFixed(2)} s), `
      + `fits and guards ${(one.fitsDone / two.fitsDone).toFixed(2)}× (${one.fitsDone.toFixed(1)} s / ${two.fitsDone.toFixed(1)} s by the progress lines); `
      + `fit.json and residuals.csv ${same ? 'byte-identical' : 'DIFFER'}`);
    console.log(`target < ${TARGET_SECONDS} s: 1 thread ${one.wall < TARGET_SECONDS ? 'met' : 'NOT met'} (${one.wall.toFixed(2)} s), `
      + `2 threads ${two.wall < TARGET_SECONDS ? 'met' : 'NOT met'} (${two.wall.toFixed(2)} s)`);
    if (!same) process.exitCode = 1;
  } else {
    process.exitCode = 1;
  }
} finally {
  if (keep) console.log(`kept ${dir}`);
  else rmSync(dir, { recursive: true, force: true });
}
