/**
 * `wayward scan`: read orbit dumps, clean them, run the detectors, write the outputs.
 * The command converts options and prints; the work is in runScan, which tests call.
 */
import { mkdir } from 'node:fs/promises';
import { join, relative } from 'node:path';
import { Command, Option } from 'commander';
import { DEFAULT_QUALITY, DEFAULT_VALIDITY } from '../clean/thresholds.js';
import type { Catalogue } from '../clean/types.js';
import type { PlanetName } from '../core/constants.js';
import type { Progress } from '../core/progress.js';
import { DETECTORS, detectorById } from '../detect/registry.js';
import { TISSERAND_DEFAULTS } from '../detect/tisserand.js';
import type { Candidate, DetectorOptions } from '../detect/types.js';
import type { InputFormat } from '../io/types.js';
import { writeCandidatesCsv, writeCandidatesJsonl } from '../report/candidateFiles.js';
import { rankInPlace } from '../report/rank.js';
import { reportMarkdown } from '../report/reportMarkdown.js';
import { sortRejectsInPlace, writeRejectsCsv } from '../report/rejectsFile.js';
import { buildSummary, type DetectorRun } from '../report/summary.js';
import { writeFileAtomic } from '../report/atomicWrite.js';
import type { ScanSummary } from '../report/types.js';
import { loadCatalogue } from './loadCatalogue.js';
import {
  parseColumnMapping, parseDetectorList, parseFiniteNumber, parseInputFormat, parseNonNegativeNumber,
  parseOutputFormat, parsePlanet, parsePositiveInteger,
} from './optionParsers.js';
import { demoFiles, packageVersion } from './packageInfo.js';
import { scanStdoutTable } from './scanTable.js';
import { terminalProgress } from './terminalProgress.js';

export interface ScanOptions {
  files: string[]; // empty: the bundled demo catalogue
  out: string;
  detectors: string[];
  planet: PlanetName;
  tisserandBoundary: number;
  tisserandMargin: number;
  includeExterior: boolean;
  inputFormat?: InputFormat;
  columns?: Record<string, string>;
  reproducible: boolean; // leave timings and memory out of summary.json
}

export interface ScanResult {
  summary: ScanSummary;
  ranked: Candidate[];
  errors: string[]; // one line per unreadable input
  outDir: string;
}

function seconds(t0: bigint): number {
  return Number((Number(process.hrtime.bigint() - t0) / 1e9).toFixed(3));
}

/**
 * Run the detectors named, in order, timing each into `timing` as `<id>Seconds`. A detector
 * whose account does not add up to the catalogue (screened + not screened) is a defect.
 */
async function runDetectors(
  ids: readonly string[], cat: Catalogue, detOpts: DetectorOptions, timing: Record<string, number>, progress?: Progress,
): Promise<{ runs: DetectorRun[]; candidates: Candidate[] }> {
  const runs: DetectorRun[] = [];
  const candidates: Candidate[] = [];
  for (const id of ids) {
    const detector = detectorById(id);
    if (!detector) throw new RangeError(`unknown detector ${id}`);
    const t0 = process.hrtime.bigint();
    const { candidates: found, ...account } = await detector.run(cat, detOpts, { progress });
    const offered = account.screened + Object.values(account.notScreened).reduce((a, b) => a + b, 0);
    if (offered !== cat.size) {
      throw new Error(`detector ${id} accounted for ${offered} bodies of ${cat.size} (screened ${account.screened})`);
    }
    candidates.push(...found);
    runs.push({ detector, account });
    timing[`${id}Seconds`] = seconds(t0);
  }
  return { runs, candidates };
}

/** Run a whole scan and write its outputs. Throws on output failures and unknown detector ids. */
export async function runScan(opts: ScanOptions, progress?: Progress): Promise<ScanResult> {
  const tStart = process.hrtime.bigint();
  const files = opts.files.length > 0 ? opts.files : demoFiles().map((f) => relative(process.cwd(), f) || f);
  const timing: Record<string, number> = {};
  let t0 = process.hrtime.bigint();
  progress?.start('reading');
  const loaded = await loadCatalogue(files, { format: opts.inputFormat, columns: opts.columns });
  progress?.end();
  timing.readSeconds = seconds(t0);
  const detOpts: DetectorOptions = {
    tisserand: {
      ...TISSERAND_DEFAULTS,
      planet: opts.planet,
      boundary: opts.tisserandBoundary,
      margin: opts.tisserandMargin,
      includeExterior: opts.includeExterior,
    },
  };
  const { runs, candidates } = await runDetectors(opts.detectors, loaded.catalogue, detOpts, timing, progress);
  const ranked = rankInPlace(candidates, opts.detectors);
  sortRejectsInPlace(loaded.rejects, files);
  t0 = process.hrtime.bigint();
  await mkdir(opts.out, { recursive: true });
  await writeCandidatesJsonl(join(opts.out, 'candidates.jsonl'), ranked, loaded.catalogue);
  await writeCandidatesCsv(join(opts.out, 'candidates.csv'), ranked, loaded.catalogue);
  await writeRejectsCsv(join(opts.out, 'rejects.csv'), loaded.rejects);
  const options = {
    detectors: opts.detectors, planet: opts.planet,
    tisserand: detOpts.tisserand, inputFormat: opts.inputFormat ?? 'auto', columns: opts.columns ?? {},
    validity: DEFAULT_VALIDITY, quality: DEFAULT_QUALITY,
  };
  const base = {
    version: packageVersion(), files: loaded.files, catalogue: loaded.catalogue, rejects: loaded.rejects,
    candidates: ranked, runs, options,
  };
  const forReport = buildSummary(base);
  await writeFileAtomic(join(opts.out, 'report.md'), reportMarkdown(forReport, ranked, runs.map((r) => r.detector), loaded.catalogue));
  timing.writeSeconds = seconds(t0);
  timing.totalSeconds = seconds(tStart);
  const summary = opts.reproducible
    ? forReport
    : buildSummary({ ...base, timing, peakRssMb: Math.round(process.resourceUsage().maxRSS / 1024) });
  await writeFileAtomic(join(opts.out, 'summary.json'), JSON.stringify(summary, null, 2) + '\n');
  return { summary, ranked, errors: loaded.errors.map((e) => e.message), outDir: opts.out };
}

/** What commander hands the action: the scan options plus the ones only the CLI uses. */
interface RawScanFlags extends Omit<ScanOptions, 'files'> {
  format: 'text' | 'json';
  quiet: boolean;
  top: number;
  progress: boolean;
}

export function registerScan(program: Command): void {
  program
    .command('scan')
    .description('screen orbit dumps for bodies whose orbits do not behave (default: the bundled demo catalogue)')
    .argument('[files...]', "orbit dumps: one-line orbit or comet export format, CSV/TSV; '-' reads standard input; gzip read transparently")
    .option('-o, --out <dir>', 'output directory', 'wayward-out')
    .option('-d, --detectors <list>', `comma-separated detectors (${DETECTORS.map((d) => d.id).join(', ')})`, parseDetectorList, DETECTORS.map((d) => d.id))
    .option('--planet <name>', 'planet the Tisserand parameter is taken with respect to', parsePlanet, TISSERAND_DEFAULTS.planet)
    .option('--tisserand-boundary <T>', 'asteroid/comet dividing value of T (Levison 1996)', parseFiniteNumber, TISSERAND_DEFAULTS.boundary)
    .option('--tisserand-margin <dT>', 'half-width of the boundary band flagged rather than ranked (≥ 0)', parseNonNegativeNumber, TISSERAND_DEFAULTS.margin)
    .option('--include-exterior', 'also screen bodies whose perihelion lies beyond the planet', false)
    .addOption(new Option('--input-format <format>', 'force the input format instead of detecting it').argParser(parseInputFormat))
    .option('--columns <map>', 'CSV column mapping, e.g. designation=objname,a=semimajor', parseColumnMapping)
    .option('--format <format>', "stdout: 'text' table or the summary as 'json'", parseOutputFormat, 'text')
    .option('-q, --quiet', 'print nothing on stdout but errors', false)
    .option('--top <n>', 'rows per class of each detector in the stdout table, boundary cases likewise (all are in candidates.csv)', parsePositiveInteger, 5)
    .option('--reproducible', 'leave timings and memory out of summary.json (byte-identical reruns)', false)
    .option('--no-progress', 'no progress line on stderr (shown only on a terminal anyway)')
    .action(async (files: string[], flags: RawScanFlags) => {
      const result = await runScan({ files, ...flags }, terminalProgress(flags.progress && !flags.quiet));
      for (const line of result.errors) process.stderr.write(`wayward: ${line}\n`);
      if (flags.format === 'json') process.stdout.write(JSON.stringify(result.summary, null, 2) + '\n');
      else if (!flags.quiet) process.stdout.write(scanStdoutTable(result, flags.top, useColour()));
      if (result.errors.length > 0) process.exitCode = 1;
    });
}

/** Colour only on a terminal and never when NO_COLOR is set (no-color.org convention). */
function useColour(): boolean {
  return Boolean(process.stdout.isTTY) && !('NO_COLOR' in process.env && process.env.NO_COLOR !== '');
}
