/**
 * Ingestion benchmark: `npx tsx scripts/bench-ingest.ts [--rows N] [--seed N] [--build] [--runs N]`
 * (npm run bench:ingest). Generates a population-only demo dump (default 1 500 000 rows)
 * into a temporary directory, then measures in one run the wall time of `cat FILE >
 * /dev/null` (the floor: reading the bytes) and of `wayward scan FILE --detectors tisserand
 * --quiet` end to end in a child process, with the child's peak RSS. Prints the figures
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

async function main(): Promise<void> {
  const o = new Command('bench-ingest')
    .option('--rows <n>', 'rows in the generated dump', integerAtLeast(100), 1_500_000)
    .option('--seed <n>', 'generator seed', integerAtLeast(0), DEFAULT_SEED)
    .option('--build', 'rebuild dist/ first even if it exists', false)
    .option('--runs <n>', 'scans of the one generated dump (the machine is shared: compare runs)', integerAtLeast(1), 1)
    .parse()
    .opts<{ rows: number; seed: number; build: boolean; runs: number }>();
  ensureBuilt(o.build);
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-ingest-'));
  try {
    const t0 = process.hrtime.bigint();
    const gen = await generateDemo({ seed: o.seed, outDir: join(dir, 'dump'), bodies: o.rows, populationOnly: true });
    const genSeconds = secondsSince(t0);
    const file = gen.files[0];
    const mb = statSync(file).size / 1e6;
    console.log(`ingest benchmark: ${fmtInt(o.rows)} rows (seed ${o.seed}), ${mb.toFixed(1)} MB, ${gen.orbitLines} lines`);
    console.log(`  generation (not measured below): ${genSeconds.toFixed(2)} s, ${fmtInt(o.rows / genSeconds)} rows/s`);
    const catSeconds = timeCat(file);
    console.log(`  cat FILE > /dev/null:            ${catSeconds.toFixed(3)} s, ${(mb / catSeconds).toFixed(0)} MB/s`);
    for (let run = 1; run <= o.runs; run++) {
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
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
