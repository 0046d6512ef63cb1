/**
 * `wayward scan`: read orbit dumps, clean them, run the detectors, write the outputs.
 * The command converts options and prints; the work is in runScan, which tests call.
 */
import { relative } from 'node:path';
import { Command, Option } from 'commander';
import { DEFAULT_QUALITY, DEFAULT_VALIDITY } from '../clean/thresholds.js';
import type { Catalogue } from '../clean/types.js';
import { PLANETS, type PlanetName } from '../core/constants.js';
import type { Progress } from '../core/progress.js';
import { DEFAULT_DETECTOR_IDS, DETECTORS, detectorById } from '../detect/registry.js';
import { TISSERAND_DEFAULTS } from '../detect/tisserand.js';
import { COORBITAL_DEFAULTS, type CoorbitalOptions } from '../detect/coorbitalOptions.js';
import { FAMILIES_DEFAULTS, type FamiliesOptions } from '../detect/familiesOptions.js';
import { NONGRAV_DEFAULTS, type NongravOptions } from '../detect/nongravOptions.js';
import { membershipRejectLines, readFamiliesInputs } from './familiesInputs.js';
import type { Candidate, DetectorOptions } from '../detect/types.js';
import type { CsvKindChoice } from '../io/bodyKind.js';
import type { InputFormat } from '../io/types.js';
import { writeCandidatesCsv, writeCandidatesJsonl } from '../report/candidateFiles.js';
import { rankInPlace } from '../report/rank.js';
import { reportMarkdown } from '../report/reportMarkdown.js';
import { sortRejectsInPlace, writeRejectsCsv } from '../report/rejectsFile.js';
import { buildSummary, type DetectorRun } from '../report/summary.js';
import { writeFileAtomic } from '../report/atomicWrite.js';
import { fileSystemCause, OutputDirectoryError, OutputStage } from '../report/outputStage.js';
import type { ScanSummary } from '../report/types.js';
import { parseNotAfter } from './check.js';
import { endOfUtcDayJd } from './checkInputs.js';
import { inputErrorLine } from './inputErrorLine.js';
import { matchObsToCatalogue, ObsInputError, readObsDir, type ObsDirRead, type ObsMatch } from './scanObsInputs.js';
import { loadCatalogue } from './loadCatalogue.js';
import { withDefault } from './optionDefault.js';
import {
  INPUT_FORMATS, parseColumnMapping, parseCsvKind, parseDetectorList, parseFiniteNumber, parseInputFormat,
  parseNonNegativeNumber, parseOutputFormat, parsePlanet, parsePlanetList, parsePositiveInteger, parsePositiveNumber, parseProbabilityLevel, parseMinMembers,
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
  csvKind?: CsvKindChoice; // CSV rows: by designation pattern ('auto', default) or all one kind
  coorbitalPlanet?: PlanetName[]; // --coorbital-planet; default: COORBITAL_DEFAULTS.planets
  coorbitalYears?: number; // N-body window ± years
  coorbitalBudget?: number; // N-body budget, CPU-seconds (bodies at the nominal cost)
  threads?: number; // worker threads for reading large plain orbit-export files, N-body work, co-orbital predictions and the families' QRL levels and neighbour searches
  families?: string; // --families FILE: a user's family membership list naming the clusters
  familyFap?: number; // --family-fap: false-alarm threshold of the family outliers
  familyFdr?: number; // --family-fdr: false-discovery level: family outliers with Benjamini–Hochberg q below it are candidates
  familyCutoff?: number; // --family-cutoff: one HCM cutoff (m/s) instead of the quasi-random levels
  familyMin?: number; // --family-min: N_min
  obs?: string; // --obs DIR: astrometry of the catalogue's bodies, for the nongrav detector
  obscodes?: string; // --obscodes FILE: observatory-code table for --obs (default: the built-in one)
  notAfter?: number; // --not-after: --obs records dated after this JD (UTC) are set aside; default the end of the run's UTC day
  reproducible: boolean; // leave timings and memory out of summary.json
}

export interface ScanResult {
  summary: ScanSummary;
  ranked: Candidate[];
  errors: string[]; // one line per unreadable input
  warnings: string[]; // one line per bad line of a side list (--families), per astrometry file or body set aside (--obs), per body a detector could not judge
  outDir: string;
}

/** Not one input could be read: nothing is written and the output directory is left as it was. */
export class NoInputReadError extends Error {
  constructor(readonly errors: string[], readonly outDir: string) {
    super(`no input could be read; nothing written, ${outDir} left as it was`);
    this.name = 'NoInputReadError';
  }
}

function seconds(t0: bigint): number {
  return Number((Number(process.hrtime.bigint() - t0) / 1e9).toFixed(3));
}

/**
 * Run the detectors named, in order, timing each into `timing` as `<id>Seconds`. A detector
 * whose account does not add up to the catalogue (screened + not screened) is a defect.
 */
async function runDetectors(
  ids: readonly string[], cat: Catalogue, detOpts: DetectorOptions, timing: Record<string, number>, threads: number, progress?: Progress,
): Promise<{ runs: DetectorRun[]; candidates: Candidate[]; warnings: string[] }> {
  const runs: DetectorRun[] = [];
  const candidates: Candidate[] = [];
  const warnings: string[] = [];
  for (const id of ids) {
    const detector = detectorById(id);
    if (!detector) throw new RangeError(`unknown detector ${id}`);
    const t0 = process.hrtime.bigint();
    const { candidates: found, warnings: said, ...account } = await detector.run(cat, detOpts, { progress, threads });
    warnings.push(...(said ?? []));
    const offered = account.screened + Object.values(account.notScreened).reduce((a, b) => a + b, 0);
    if (offered !== cat.size) {
      throw new Error(`detector ${id} accounted for ${offered} bodies of ${cat.size} (screened ${account.screened})`);
    }
    candidates.push(...found);
    runs.push({ detector, account });
    timing[`${id}Seconds`] = seconds(t0);
  }
  return { runs, candidates, warnings };
}

/** Astrometry lines and records set aside shown on stderr; the rest are counted there and all are in obs-rejects.csv. */
const STDERR_OBS_REJECT_LINES = 20;

/** The stderr lines of --obs: files that are not astrometry, the first rejects, bodies not in the catalogue or set aside. */
function obsWarnings(read: ObsDirRead, match: ObsMatch, outDir: string): string[] {
  const out = read.notAstrometry.map((n) => `${n.file}: not read as astrometry: ${n.reason}`);
  const parse = read.rejects.filter((r) => r.kind === 'parse');
  for (const r of parse.slice(0, STDERR_OBS_REJECT_LINES)) out.push(`${r.file}:${r.line}: ${r.reason}`);
  if (parse.length > STDERR_OBS_REJECT_LINES) out.push(`… and ${parse.length - STDERR_OBS_REJECT_LINES} more unreadable astrometry lines (all in ${outDir}/obs-rejects.csv)`);
  out.push(...match.warnings);
  return out;
}

/** summary.json's account of --obs. */
function obsAccount(read: ObsDirRead, match: ObsMatch, notAfterJdUtc: number): Record<string, unknown> {
  return {
    dir: read.dir, obscodes: read.obscodes === '' ? 'built-in (500 only)' : read.obscodes, notAfterJdUtc,
    files: read.files, notAstrometry: read.notAstrometry,
    unreadableLines: read.rejects.filter((r) => r.kind === 'parse').length,
    designations: read.groups.length, bodiesMatched: match.bodies.length,
    notInCatalogue: match.unmatched.length, notInCatalogueObservations: match.unmatched.reduce((n, u) => n + u.observations, 0),
    notInCatalogueList: match.unmatched,
    recordsSetAside: match.setAside, observationsUsable: match.bodies.reduce((n, b) => n + b.observations.length, 0),
    rejectsFile: 'obs-rejects.csv',
  };
}

/**
 * Run a whole scan and write its outputs. Every output is staged and put in place only when
 * all are written (src/report/outputStage.ts): a run that throws leaves the output directory
 * as it was. Throws OutputDirectoryError when the directory cannot be written (checked
 * before any input is read), NoInputReadError when no input could be read, RangeError for
 * unknown detector ids.
 */
export async function runScan(opts: ScanOptions, progress?: Progress): Promise<ScanResult> {
  const stage = await OutputStage.open(opts.out);
  try {
    const result = await scanInto(stage, opts, progress);
    await stage.commit();
    return result;
  } catch (err) {
    await stage.abort();
    // a file-system failure while writing the outputs names the output directory and the cause
    const { code, path } = err as { code?: unknown; path?: unknown };
    if (typeof code === 'string' && typeof path === 'string' && path.startsWith(stage.stagingDir)) {
      throw new OutputDirectoryError(opts.out, fileSystemCause(err), code);
    }
    throw err;
  }
}

/** The scan itself, writing every output into `stage`. */
async function scanInto(stage: OutputStage, opts: ScanOptions, progress?: Progress): Promise<ScanResult> {
  const tStart = process.hrtime.bigint();
  const demoCatalogue = opts.files.length === 0;
  const files = !demoCatalogue ? opts.files : demoFiles().map((f) => relative(process.cwd(), f) || f);
  const timing: Record<string, number> = {};
  let t0 = process.hrtime.bigint();
  progress?.start('reading');
  const notAfterJdUtc = opts.notAfter ?? endOfUtcDayJd(Date.now());
  const obsRead = opts.obs === undefined ? null : await readObsDir(opts.obs, opts.obscodes, notAfterJdUtc);
  const loaded = await loadCatalogue(files, { format: opts.inputFormat, columns: opts.columns, csvKind: opts.csvKind, threads: opts.threads ?? COORBITAL_DEFAULTS.threads });
  progress?.end();
  if (loaded.files.length > 0 && loaded.errors.length === loaded.files.length) {
    throw new NoInputReadError(loaded.errors.map(inputErrorLine), opts.out);
  }
  const familyInputs = opts.detectors.includes('families') ? await readFamiliesInputs(opts.families) : null;
  const warnings = familyInputs ? membershipRejectLines(familyInputs) : [];
  const obsMatch = obsRead === null ? null : matchObsToCatalogue(obsRead, loaded.catalogue);
  if (obsRead !== null && obsMatch !== null) warnings.push(...obsWarnings(obsRead, obsMatch, opts.out));
  timing.readSeconds = seconds(t0);
  const detOpts: DetectorOptions = {
    tisserand: {
      ...TISSERAND_DEFAULTS,
      planet: opts.planet,
      boundary: opts.tisserandBoundary,
      margin: opts.tisserandMargin,
      includeExterior: opts.includeExterior,
    },
    coorbital: {
      ...COORBITAL_DEFAULTS,
      planets: opts.coorbitalPlanet ?? COORBITAL_DEFAULTS.planets,
      windowYears: opts.coorbitalYears ?? COORBITAL_DEFAULTS.windowYears,
      budgetCpuSeconds: opts.coorbitalBudget ?? COORBITAL_DEFAULTS.budgetCpuSeconds,
      threads: opts.threads ?? COORBITAL_DEFAULTS.threads,
    },
    families: {
      ...FAMILIES_DEFAULTS,
      cutoffMPerS: opts.familyCutoff ?? FAMILIES_DEFAULTS.cutoffMPerS,
      minMembers: opts.familyMin ?? FAMILIES_DEFAULTS.minMembers,
      fapThreshold: opts.familyFap ?? FAMILIES_DEFAULTS.fapThreshold,
      fdrLevel: opts.familyFdr ?? FAMILIES_DEFAULTS.fdrLevel,
      published: familyInputs?.published.families ?? [],
      membership: familyInputs?.membership ?? null,
    },
    nongrav: { ...NONGRAV_DEFAULTS, bodies: obsMatch?.bodies ?? null, sites: obsRead?.table.sites ?? NONGRAV_DEFAULTS.sites },
  };
  const { runs, candidates, warnings: detectorWarnings } = await runDetectors(opts.detectors, loaded.catalogue, detOpts, timing, opts.threads ?? COORBITAL_DEFAULTS.threads, progress);
  warnings.push(...detectorWarnings);
  const ranked = rankInPlace(candidates, opts.detectors);
  sortRejectsInPlace(loaded.rejects, files);
  t0 = process.hrtime.bigint();
  await writeCandidatesJsonl(stage.path('candidates.jsonl'), ranked, loaded.catalogue);
  await writeCandidatesCsv(stage.path('candidates.csv'), ranked, loaded.catalogue);
  await writeRejectsCsv(stage.path('rejects.csv'), loaded.rejects);
  if (obsRead !== null) await writeRejectsCsv(stage.path('obs-rejects.csv'), sortRejectsInPlace(obsRead.rejects, obsRead.files.map((f) => f.file)));
  const options = {
    detectors: opts.detectors, planet: opts.planet,
    tisserand: detOpts.tisserand, coorbital: coorbitalOptionsRecord(detOpts.coorbital), families: familiesOptionsRecord(detOpts.families, opts.families),
    inputFormat: opts.inputFormat ?? 'auto', columns: opts.columns ?? {},
    csvKind: opts.csvKind ?? 'auto',
    ...(opts.detectors.includes('nongrav') ? { nongrav: nongravOptionsRecord(detOpts.nongrav) } : {}),
    validity: DEFAULT_VALIDITY, quality: DEFAULT_QUALITY,
  };
  const base = {
    version: packageVersion(), demoCatalogue, files: loaded.files, catalogue: loaded.catalogue, rejects: loaded.rejects,
    candidates: ranked, runs, options,
  };
  const astrometry = obsRead !== null && obsMatch !== null ? { astrometry: obsAccount(obsRead, obsMatch, notAfterJdUtc) } : {};
  const forReport = { ...buildSummary(base), ...astrometry };
  await writeFileAtomic(stage.path('report.md'), reportMarkdown(forReport, ranked, runs.map((r) => r.detector), loaded.catalogue));
  timing.writeSeconds = seconds(t0);
  timing.totalSeconds = seconds(tStart);
  const summary = opts.reproducible
    ? forReport
    : { ...buildSummary({ ...base, timing, peakRssMb: Math.round(process.resourceUsage().maxRSS / 1024), twoThreadReadFiles: loaded.twoThreadFiles }), ...astrometry };
  await writeFileAtomic(stage.path('summary.json'), JSON.stringify(summary, null, 2) + '\n');
  return { summary, ranked, errors: loaded.errors.map(inputErrorLine), warnings, outDir: opts.out };
}

/** The nongrav options as summary.json records them: not the astrometry itself. */
function nongravOptionsRecord(o: NongravOptions): Record<string, unknown> {
  const { bodies: _b, sites: _s, ...rest } = o;
  return rest;
}

/** The co-orbital options as summary.json records them: not the thread count, which changes no output. */
function coorbitalOptionsRecord(o: CoorbitalOptions): Omit<CoorbitalOptions, 'threads'> {
  const { threads: _threads, ...rest } = o;
  return rest;
}

/** The families options as summary.json records them: the membership file by name, not its lines. */
function familiesOptionsRecord(o: FamiliesOptions, membershipFile: string | undefined): Record<string, unknown> {
  const { published, membership: _m, ...rest } = o;
  return { ...rest, publishedFamilies: published.length, membershipFile: membershipFile ?? null };
}

/** What commander hands the action: the scan options plus the ones only the CLI uses. */
interface RawScanFlags extends Omit<ScanOptions, 'files' | 'includeExterior' | 'reproducible'> {
  includeExterior?: boolean; // boolean flags have no default (commander would print '(default: false)')
  reproducible?: boolean;
  format: 'text' | 'json';
  quiet?: boolean;
  top: number;
  progress: boolean;
}

export function registerScan(program: Command): void {
  program
    .command('scan')
    .description('screen orbit dumps for bodies whose orbits do not behave (default: the bundled demo catalogue)')
    .argument('[files...]', "orbit dumps: one-line orbit or comet export format, CSV/TSV; '-' reads standard input; gzip read transparently")
    .addOption(withDefault('-o, --out <dir>', 'output directory', 'wayward-out', 'wayward-out'))
    .addOption(withDefault('-d, --detectors <list>', `comma-separated detectors, of: ${DETECTORS.map((d) => d.id).join(', ')} (--obs adds nongrav to the default)`,
      [...DEFAULT_DETECTOR_IDS], DEFAULT_DETECTOR_IDS.join(','), parseDetectorList))
    .addOption(withDefault('--planet <name>', `planet the Tisserand parameter is taken with respect to: ${PLANETS.join(', ')}`,
      TISSERAND_DEFAULTS.planet, TISSERAND_DEFAULTS.planet, parsePlanet))
    .addOption(withDefault('--tisserand-boundary <T>', 'asteroid/comet dividing value of T (Levison 1996)',
      TISSERAND_DEFAULTS.boundary, String(TISSERAND_DEFAULTS.boundary), parseFiniteNumber))
    .addOption(withDefault('--tisserand-margin <dT>', 'half-width of the boundary band flagged rather than ranked (≥ 0)',
      TISSERAND_DEFAULTS.margin, String(TISSERAND_DEFAULTS.margin), parseNonNegativeNumber))
    .option('--include-exterior', 'also screen bodies whose perihelion lies beyond the planet')
    .addOption(withDefault('--coorbital-planet <names>', `planets whose 1:1 zones the co-orbital detector screens: ${PLANETS.join(', ')}, a comma list, or all`,
      [...COORBITAL_DEFAULTS.planets], COORBITAL_DEFAULTS.planets.join(','), parsePlanetList))
    .addOption(withDefault('--coorbital-years <n>', 'N-body window of the co-orbital confirmation: the epoch ± n years',
      COORBITAL_DEFAULTS.windowYears, String(COORBITAL_DEFAULTS.windowYears), parsePositiveInteger))
    .addOption(withDefault('--coorbital-budget <s>', 'CPU-seconds of N-body confirmation, as a body count at a fixed nominal cost (outputs do not depend on machine speed)',
      COORBITAL_DEFAULTS.budgetCpuSeconds, String(COORBITAL_DEFAULTS.budgetCpuSeconds), parseNonNegativeNumber))
    .addOption(withDefault('--threads <n>', 'worker threads for reading large orbit-export files, co-orbital predictions, N-body work and the families\' QRL levels and neighbour searches (outputs identical for any number)',
      COORBITAL_DEFAULTS.threads, String(COORBITAL_DEFAULTS.threads), parsePositiveInteger))
    .option('--families <file>', 'family membership list (CSV/TSV: designation and family columns) whose labels name the families found')
    .addOption(withDefault('--family-fap <p>', 'family outliers: considered below this false-alarm probability',
      FAMILIES_DEFAULTS.fapThreshold, String(FAMILIES_DEFAULTS.fapThreshold), parseProbabilityLevel))
    .addOption(withDefault('--family-fdr <q>', 'family outliers: candidates are those with Benjamini–Hochberg q-value (over every body tested) below this false-discovery level',
      FAMILIES_DEFAULTS.fdrLevel, String(FAMILIES_DEFAULTS.fdrLevel), parseProbabilityLevel))
    .option('--family-cutoff <m/s>', "families: one HCM cutoff for every belt region (default: each region's quasi-random level)", parsePositiveNumber)
    .addOption(withDefault('--family-min <n>', 'families: fewest members of a family (N_min)',
      FAMILIES_DEFAULTS.minMembers, String(FAMILIES_DEFAULTS.minMembers), parseMinMembers))
    .option('--obs <dir>', "astrometry of the catalogue's bodies: every 80-column or ADES PSV file in DIR, grouped by designation; each body fitted as check fits it (the nongrav detector)")
    .option('--obscodes <file>', 'observatory-code table for --obs (default: the built-in one, the geocentre 500 only)')
    .option('--not-after <date>', '--obs: set aside observations dated after this (ISO date, UTC; default: the end of today)', parseNotAfter)
    .addOption(new Option('--input-format <format>',
      `force the input format, one of: ${INPUT_FORMATS.join(', ')} (without it: detected from each file's content)`).argParser(parseInputFormat))
    .option('--columns <map>', 'CSV column mapping field=header,…, e.g. designation=objname,a=semimajor', parseColumnMapping)
    .addOption(withDefault('--csv-kind <kind>',
      'how CSV rows are classed: auto (comet designation forms such as 1P or C/1995 O1 are comets, the rest asteroids), asteroid or comet (every row)',
      'auto' as CsvKindChoice, 'auto', parseCsvKind))
    .addOption(withDefault('--format <format>', 'stdout: text (a table) or json (the summary)', 'text', 'text', parseOutputFormat))
    .option('-q, --quiet', 'print nothing on stdout but errors')
    .option('--top <n>', 'rows per class of each detector in the stdout table, boundary cases likewise (all are in candidates.csv)', parsePositiveInteger, 5)
    .option('--reproducible', 'leave timings and memory out of summary.json (byte-identical reruns)')
    .option('--no-progress', 'no progress line on stderr (shown only on a terminal anyway)')
    .action(async (files: string[], flags: RawScanFlags, command: Command) => {
      const detectors = obsDetectors(flags, command);
      const opts = { files, ...flags, detectors, includeExterior: flags.includeExterior === true, reproducible: flags.reproducible === true };
      let result: ScanResult;
      try {
        result = await runScan(opts, terminalProgress(flags.progress && !flags.quiet));
      } catch (err) {
        if (err instanceof NoInputReadError) for (const line of err.errors) process.stderr.write(`wayward: ${line}\n`);
        if (err instanceof ObsInputError) {
          for (const line of [err.message, ...err.lines]) process.stderr.write(`wayward: ${line}\n`);
          process.exitCode = 1;
          return;
        }
        throw err;
      }
      for (const line of [...result.warnings, ...result.errors]) process.stderr.write(`wayward: ${line}\n`);
      if (flags.format === 'json') process.stdout.write(JSON.stringify(result.summary, null, 2) + '\n');
      else if (!flags.quiet) {
        if (result.summary.demoCatalogue) process.stdout.write(`${demoNotice(result)}\n`);
        process.stdout.write(scanStdoutTable(result, flags.top, useColour()));
      }
      if (result.errors.length > 0) process.exitCode = 1;
    });
}

/**
 * The detectors with --obs: nongrav joins the default list; a list that names detectors without
 * nongrav, or --obscodes / --not-after without --obs, is a usage error (exit 2).
 */
function obsDetectors(flags: RawScanFlags, command: Command): string[] {
  if (flags.obs === undefined) {
    const stray = flags.obscodes !== undefined ? '--obscodes' : flags.notAfter !== undefined ? '--not-after' : '';
    if (stray !== '') command.error(`error: ${stray} is read with --obs DIR only`, { exitCode: 2, code: 'wayward.usage' });
    return flags.detectors;
  }
  if (command.getOptionValueSource('detectors') === 'default') return [...flags.detectors, 'nongrav'];
  if (!flags.detectors.includes('nongrav')) command.error('error: --obs is read by the nongrav detector only: add nongrav to --detectors', { exitCode: 2, code: 'wayward.usage' });
  return flags.detectors;
}

/** The stdout line that says no files were named and the bundled demo catalogue was scanned. */
function demoNotice(result: ScanResult): string {
  return `No files named: scanned the bundled demo catalogue (invented data): ${result.summary.files.map((f) => f.file).join(', ')}.`;
}

/** Colour only on a terminal and never when NO_COLOR is set (no-color.org convention). */
function useColour(): boolean {
  return Boolean(process.stdout.isTTY) && !('NO_COLOR' in process.env && process.env.NO_COLOR !== '');
}
