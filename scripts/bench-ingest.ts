/**
 * Ingestion benchmark: `npx tsx scripts/bench-ingest.ts [--rows N] [--seed N] [--build] [--runs N] [--file F]`
 * (npm run bench:ingest). Generates a population-only demo dump (default 1 500 000 rows)
 * into a temporary directory (or reads F), then measures in one run the wall time of `cat FILE >
 * /dev/null` (the floor: reading the bytes) and of `wayward scan FILE --detectors tisserand
 * --quiet` end to end in a child process, with the child's peak RSS; then the read step alone
 * (loadCatalogue: stream, parse, clean, hash; scripts/bench/readStep.ts in a child process)
 * on 1 and on 2 threads, alternated, with the ratio and whether the two built the same
 * catalogue, rejects and accounts. Prints the figures
 * next to the targets and the load average before and after the scan (`uptime`'s figures,
 * os.loadavg); asserts nothing (the machine is shared: figures vary run to run).
 * The temporary directory is removed afterwards.
 */
import { spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdtempSync, openSync, readFileSync, rmSync, statSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { generateDemo } from './demo/generate.js';
import { DEFAULT_SEED } from './demo/scenario.js';

const TARGET_ROWS_PER_S = 500_000;
const TARGET_SECONDS_1_5M = 3;
const TARGET_PEAK_RSS_MB = 1536; // 1.5 GB
const ROOT = resolve(import.meta.dirname, '..');
const CLI = join(ROOT, 'dist', 'src', 'cli', 'main.js');

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

function secondsSince(t0: bigint): number {
  return Number(process.hrtime.bigint() - t0) / 1e9;
}

const fmtInt = (n: number): string => Math.round(n).toLocaleString('en-US').replace(/,/g, ' ');

/** The 1, 5 and 15-minute load averages, as `uptime` prints them, and the core count. */
const load = (): string => `load average ${loadavg().map((x) => x.toFixed(2)).join(', ')} on ${cpus().length} cores`;

/** Builds dist/ with `npm run build` when asked or when the CLI is missing. */
function ensureBuilt(force: boolean): void {
  if (!force && existsSync(CLI)) return;
  console.log('building dist/ (npm run build) ...');
  const r = spawnSync('npm', ['run', 'build'], { cwd: ROOT, stdio: ['ignore', 'inherit', 'inherit'] });
  if (!existsSync(CLI)) throw new Error(`build did not produce ${CLI} (npm run build exit ${r.status})`);
  if (r.status !== 0) console.log(`warning: npm run build exited ${r.status}; using what it emitted`);
}

/** Wall time of `cat file > /dev/null`. */
function timeCat(file: string): number {
  const devNull = openSync('/dev/null', 'w');
  try {
    const t0 = process.hrtime.bigint();
    const r = spawnSync('cat', [file], { stdio: ['ignore', devNull, 'inherit'] });
    const s = secondsSince(t0);
    if (r.status !== 0) throw new Error(`cat exited ${r.status}`);
    return s;
  } finally {
    closeSync(devNull);
  }
}

interface ScanRun { seconds: number; status: number | null; stderr: string; timeMaxRssKb: number; cpuSeconds: number }

/** Wall time of the scan child; under /usr/bin/time -f %M when available (peak RSS fallback). */
function timeScan(file: string, outDir: string): ScanRun {
  const args = [CLI, 'scan', file, '--detectors', 'tisserand', '--out', outDir, '--quiet'];
  const useTime = existsSync('/usr/bin/time');
  const [cmd, argv] = useTime
    ? ['/usr/bin/time', ['-f', 'maxrss-kb=%M cpu-user=%U cpu-sys=%S', process.execPath, ...args]]
    : [process.execPath, args];
  const t0 = process.hrtime.bigint();
  const r = spawnSync(cmd, argv, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8', maxBuffer: 1 << 26 });
  const seconds = secondsSince(t0);
  const m = /maxrss-kb=(\d+) cpu-user=([\d.]+) cpu-sys=([\d.]+)/.exec(r.stderr ?? '');
  const stderr = (r.stderr ?? '').replace(/maxrss-kb=.*\n?/, '').trim();
  return {
    seconds, status: r.status, stderr,
    timeMaxRssKb: m ? Number(m[1]) : NaN,
    cpuSeconds: m ? Number(m[2]) + Number(m[3]) : NaN,
  };
}

interface ScanSummaryView {
  rows?: { read: number; accepted: number; rejected: number };
  resources?: { peakRssMb?: number };
  timing?: Record<string, number>;
}

function readSummary(outDir: string): ScanSummaryView | null {
  const path = join(outDir, 'summary.json');
  return existsSync(path) ? (JSON.parse(readFileSync(path, 'utf8')) as ScanSummaryView) : null;
}

const verdict = (ok: boolean): string => (ok ? 'met' : 'NOT met');

/** Prints the scan figures next to the targets. */
function reportScan(scan: ScanRun, summary: ScanSummaryView | null, generatedRows: number): void {
  const rowsRead = summary?.rows?.read ?? generatedRows;
  const rate = rowsRead / scan.seconds;
  const secondsFor1_5M = (1_500_000 / rowsRead) * scan.seconds;
  const cpu = Number.isFinite(scan.cpuSeconds) ? ` (child CPU ${scan.cpuSeconds.toFixed(2)} s user+sys)` : '';
  console.log(`  wayward scan --detectors tisserand (end to end, child process): ${scan.seconds.toFixed(2)} s${cpu}`);
  if (summary?.timing) {
    const parts = Object.entries(summary.timing).map(([k, v]) => `${k.replace(/Seconds$/, '')} ${v.toFixed(2)} s`);
    console.log(`    scan's own timing (summary.json): ${parts.join(', ')}`);
  }
  if (summary?.rows) {
    const r = summary.rows;
    console.log(`    rows read ${fmtInt(r.read)} = accepted ${fmtInt(r.accepted)} + rejected ${fmtInt(r.rejected)}` +
      `${r.read === generatedRows ? '' : `  (generated ${fmtInt(generatedRows)}: MISMATCH)`}`);
  }
  console.log(`    throughput ${fmtInt(rate)} rows/s   target >= ${fmtInt(TARGET_ROWS_PER_S)} rows/s: ${verdict(rate >= TARGET_ROWS_PER_S)}`);
  console.log(`    ${rowsRead === 1_500_000 ? 'for' : 'scaled linearly to'} 1.5 M rows ${secondsFor1_5M.toFixed(2)} s   target < ${TARGET_SECONDS_1_5M} s: ${verdict(secondsFor1_5M < TARGET_SECONDS_1_5M)}`);
  const fromSummary = summary?.resources?.peakRssMb;
  const peakMb = fromSummary ?? (Number.isFinite(scan.timeMaxRssKb) ? scan.timeMaxRssKb / 1024 : NaN);
  const source = fromSummary !== undefined ? 'summary.json resources.peakRssMb' : Number.isFinite(peakMb) ? '/usr/bin/time %M' : '';
  if (Number.isFinite(peakMb)) {
    const cross = fromSummary !== undefined && Number.isFinite(scan.timeMaxRssKb) ? ` (/usr/bin/time says ${(scan.timeMaxRssKb / 1024).toFixed(0)} MB)` : '';
    console.log(`    peak RSS ${peakMb.toFixed(0)} MB from ${source}${cross}   target < ${TARGET_PEAK_RSS_MB} MB: ${verdict(peakMb < TARGET_PEAK_RSS_MB)}`);
  } else {
    console.log('    peak RSS unknown (no summary.json resources and no /usr/bin/time)');
  }
}

interface ReadStep { seconds: number; cpuSeconds: number; rows: number; rejects: number; twoThreadFiles: number; sha256: string; maxRssKb: number }

/** The read step alone on `threads` threads, in a child process under /usr/bin/time when there is one. */
function readStep(file: string, threads: number): ReadStep | null {
  const script = join(ROOT, 'scripts', 'bench', 'readStep.ts');
  const tsx = join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const args = [tsx, script, file, String(threads)];
  const useTime = existsSync('/usr/bin/time');
  const [cmd, argv] = useTime ? ['/usr/bin/time', ['-f', 'maxrss-kb=%M', process.execPath, ...args]] : [process.execPath, args];
  const r = spawnSync(cmd, argv, { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], encoding: 'utf8', maxBuffer: 1 << 26 });
  const line = (r.stdout ?? '').trim().split('\n').pop() ?? '';
  if (r.status !== 0 || !line.startsWith('{')) {
    console.log(`  read step on ${threads} thread(s) FAILED (exit ${r.status}):\n${r.stderr}`);
    return null;
  }
  const m = /maxrss-kb=(\d+)/.exec(r.stderr ?? '');
  return { ...(JSON.parse(line) as Omit<ReadStep, 'maxRssKb'>), maxRssKb: m ? Number(m[1]) : NaN };
}

/** The read step on 1 and 2 threads, alternated `runs` times: best, spread, ratio, same result. */
function readSteps(file: string, runs: number): void {
  const seconds: Record<number, number[]> = { 1: [], 2: [] };
  const hashes = new Set<string>();
  for (let run = 1; run <= runs; run++) {
    for (const threads of [1, 2]) {
      const before = load();
      const s = readStep(file, threads);
      if (s === null) {
        process.exitCode = 1;
        return;
      }
      seconds[threads].push(s.seconds);
      hashes.add(s.sha256);
      console.log(`  read step (loadCatalogue in process), ${threads} thread${threads > 1 ? 's' : ' '}, run ${run}: ${s.seconds.toFixed(2)} s wall, ` +
        `${s.cpuSeconds.toFixed(2)} s CPU (all threads), ${fmtInt(s.rows / s.seconds)} rows/s, peak RSS ${(s.maxRssKb / 1024).toFixed(0)} MB, ` +
        `parsed on two threads: ${s.twoThreadFiles > 0 ? 'yes' : 'no'}; ${before} before, ${load()} after`);
    }
  }
  const best = (t: number): number => Math.min(...seconds[t]);
  const worst = (t: number): number => Math.max(...seconds[t]);
  console.log(`  read step best ${best(1).toFixed(2)} s (1 thread) / ${best(2).toFixed(2)} s (2 threads), ratio ${(best(1) / best(2)).toFixed(2)}; ` +
    `spread ${best(1).toFixed(2)}–${worst(1).toFixed(2)} / ${best(2).toFixed(2)}–${worst(2).toFixed(2)} s; ` +
    `the same catalogue, rejects and accounts on 1 and 2 threads: ${hashes.size === 1 ? 'yes' : 'NO'}`);
  if (hashes.size !== 1) process.exitCode = 1;
}

async function main(): Promise<void> {
  const o = new Command('bench-ingest')
    .option('--rows <n>', 'rows in the generated dump', integerAtLeast(100), 1_500_000)
    .option('--seed <n>', 'generator seed', integerAtLeast(0), DEFAULT_SEED)
    .option('--build', 'rebuild dist/ first even if it exists', false)
    .option('--runs <n>', 'scans of the one generated dump (the machine is shared: compare runs)', integerAtLeast(1), 1)
    .option('--file <path>', 'an orbit export file to read instead of a generated dump')
    .option('--no-scan', 'the read step alone (no scan end to end)')
    .parse()
    .opts<{ rows: number; seed: number; build: boolean; runs: number; file?: string; scan: boolean }>();
  ensureBuilt(o.build);
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-ingest-'));
  try {
    let file: string;
    if (o.file !== undefined) {
      file = resolve(o.file);
      console.log(`ingest benchmark: ${file}, ${(statSync(file).size / 1e6).toFixed(1)} MB`);
    } else {
      const t0 = process.hrtime.bigint();
      const gen = await generateDemo({ seed: o.seed, outDir: join(dir, 'dump'), bodies: o.rows, populationOnly: true });
      const genSeconds = secondsSince(t0);
      file = gen.files[0];
      console.log(`ingest benchmark: ${fmtInt(o.rows)} rows (seed ${o.seed}), ${(statSync(file).size / 1e6).toFixed(1)} MB, ${gen.orbitLines} lines`);
      console.log(`  generation (not measured below): ${genSeconds.toFixed(2)} s, ${fmtInt(o.rows / genSeconds)} rows/s`);
    }
    const mb = statSync(file).size / 1e6;
    const catSeconds = timeCat(file);
    console.log(`  cat FILE > /dev/null:            ${catSeconds.toFixed(3)} s, ${(mb / catSeconds).toFixed(0)} MB/s`);
    for (let run = 1; run <= (o.scan ? o.runs : 0); run++) {
      console.log(`  run ${run} of ${o.runs}, before the scan: ${load()}`);
      const scan = timeScan(file, join(dir, `out${run}`));
      console.log(`  after the scan: ${load()}`);
      if (scan.status !== 0) {
        console.log(`  scan FAILED (exit ${scan.status}) after ${scan.seconds.toFixed(2)} s:\n${scan.stderr}`);
        process.exitCode = 1;
        return;
      }
      reportScan(scan, readSummary(join(dir, `out${run}`)), o.rows);
      console.log(`  ratio scan / cat: ${(scan.seconds / catSeconds).toFixed(1)}`);
    }
    readSteps(file, o.runs);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
