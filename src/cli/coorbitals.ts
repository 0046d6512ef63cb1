/**
 * `wayward coorbitals`: every body in a planet's 1:1 zone, predicted by the averaged problem
 * and confirmed by N-body integration (all of them, within the budget), with the segment
 * table of each history. Outputs (staged, put in place together): coorbitals.csv (one row
 * per screened body), segments.csv (one row per segment), not-screened.csv (one row per body
 * left out for a reason of its own: unbound, elements missing, epoch outside the ephemeris),
 * rejects.csv (every row the readers and cleaning set aside, as in scan), coorbitals.json (both, with the
 * run's accounting), report.md, and per body resonant now by N-body two charts in plots/
 * (coorbitalPlots.ts), linked from report.md.
 */
import { Command } from 'commander';
import { PLANETS } from '../core/constants.js';
import { analyseCoorbitals, coorbitalCandidates } from '../detect/coorbital.js';
import { stateNow, type CoorbitalBodyResult } from '../detect/coorbitalCandidate.js';
import { COORBITAL_DEFAULTS, type CoorbitalOptions } from '../detect/coorbitalOptions.js';
import { COORBITAL_NOT_SCREENED, type ZoneSkip } from '../detect/coorbitalZone.js';
import type { Catalogue, Reject } from '../clean/types.js';
import { rejectExample, rejectGroups } from '../report/rejectCategories.js';
import { sortRejectsInPlace, writeRejectsCsv } from '../report/rejectsFile.js';
import { BODY_COLUMNS, bodyRow, SEGMENT_COLUMNS, segmentRows } from '../report/coorbitalTables.js';
import { writeCoorbitalPlots, type BodyPlots } from '../report/coorbitalPlots.js';
import { csvRecord } from '../report/csvField.js';
import { writeFileAtomic } from '../report/atomicWrite.js';
import { OutputStage } from '../report/outputStage.js';
import { SCREENING_CAVEAT } from '../report/reportMarkdown.js';
import { markdownTable, textTable } from '../report/textTable.js';
import { commandFiles, loadCommandCatalogue } from './commandCatalogue.js';
import { withDefault } from './optionDefault.js';
import { parseNonNegativeNumber, parsePlanetList, parsePositiveInteger } from './optionParsers.js';

export interface CoorbitalsOptions {
  files: string[]; // empty: the bundled demo catalogue
  out: string;
  planet: CoorbitalOptions['planets'];
  years: number;
  budget: number;
  threads: number;
}

export interface CoorbitalsResult {
  cat: Catalogue;
  bodies: CoorbitalBodyResult[];
  notScreened: Record<string, number>;
  skipped: ZoneSkip[];
  rejects: Reject[]; // rows set aside by the readers and cleaning (rejects.csv)
  rowsRead: number;
  errors: string[];
}

const NOT_SCREENED_COLUMNS = ['designation', 'reason', 'why', 'e', 'a_au', 'epoch_jd_tt', 'source_file', 'source_line'] as const;

/** not-screened.csv rows: each body left out for a reason of its own, in catalogue order. */
function notScreenedRows(cat: Catalogue, skipped: readonly ZoneSkip[]): (string | number)[][] {
  const num = (x: number, digits: number): string => (Number.isFinite(x) ? x.toFixed(digits) : '');
  return skipped.map(({ index: k, reason }) => [
    cat.designation[k], reason, COORBITAL_NOT_SCREENED[reason], num(cat.e[k], 7), num(cat.a[k], 7), num(cat.epochJdTT[k], 5),
    cat.files[cat.fileIndex[k]], cat.source[k],
  ]);
}

function csvText(header: readonly string[], rows: readonly (string | number)[][]): string {
  return [csvRecord([...header]), ...rows.map(csvRecord)].join('\n') + '\n';
}

/** coorbitals.json: the accounting, then every body with its prediction and history. */
function jsonText(r: CoorbitalsResult, opts: CoorbitalsOptions): string {
  return JSON.stringify({
    tool: 'wayward', command: 'coorbitals',
    options: { planets: opts.planet, windowYears: opts.years, budgetCpuSeconds: opts.budget },
    rowsRead: r.rowsRead, rejected: r.rejects.length, accepted: r.cat.size, screened: r.bodies.length, notScreened: r.notScreened,
    notScreenedBodies: r.skipped.length,
    bodies: r.bodies.map((b) => ({
      designation: r.cat.designation[b.entry.index], planet: b.entry.planet,
      deltaAOverA: b.entry.x, phiDeg: (b.entry.phiRad * 180) / Math.PI,
      // the plot series stay out of the JSON (they are in the charts)
      prediction: b.prediction, history: b.history && { ...b.history, series: undefined }, unconfirmedReason: b.unconfirmedReason,
    })),
  }, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2) + '\n';
}

/** Markdown text of a designation inside link or image text. */
function linkText(s: string): string {
  return s.replace(/[[\]\\]/g, (c) => `\\${c}`);
}

/** The charts of each plotted body as Markdown images, each linking its SVG. */
function plotsSection(r: CoorbitalsResult, plots: ReadonlyMap<CoorbitalBodyResult, BodyPlots>): string[] {
  if (plots.size === 0) return [];
  const lines = ['## Plots', '', 'φ(t) over the N-body state segments, and the path in the frame rotating with the planet (Sun at the origin, planet on +x, L4 at y > 0); each picture links its SVG.', ''];
  for (const [b, p] of plots) {
    const d = linkText(r.cat.designation[b.entry.index]);
    lines.push(`### ${d} (${b.entry.planet}, ${stateNow(b)})`, '',
      `[![${d}: φ(t)](${p.phi}.png)](${p.phi}.svg) [![${d}: rotating frame](${p.rotating}.png)](${p.rotating}.svg)`, '');
  }
  return lines;
}

/** "N rows read: A bodies accepted, R rejected (rejects.csv)". */
function rowsLine(r: CoorbitalsResult): string {
  return `${r.rowsRead} rows read: ${r.cat.size} bodies accepted, ${r.rejects.length} rejected (rejects.csv)`;
}

/** The rejected rows grouped by reason, with the first row of each group; nothing when none. */
function rejectLines(r: CoorbitalsResult): string[] {
  if (r.rejects.length === 0) return [];
  const rows = rejectGroups(r.rejects).map((g) => [g.key, String(g.count), rejectExample(g.example)]);
  return ['Rejected rows, by reason (every one in rejects.csv with its file, line and raw text):', '',
    markdownTable(['reason', 'rows', 'first row (file:line: reason)'], rows, [false, true, false]), ''];
}

function reportText(r: CoorbitalsResult, opts: CoorbitalsOptions, plots: ReadonlyMap<CoorbitalBodyResult, BodyPlots>): string {
  const resonant = r.bodies.filter((b) => stateNow(b) !== 'passing');
  const rows = resonant.map((b) => bodyRow(r.cat, b)).map((row) => [row[0], row[1], row[6], row[11] || 'not confirmed', row[8], row[14], row[17]].map(String));
  const not = Object.entries(r.notScreened).map(([id, n]) => [`not screened: ${COORBITAL_NOT_SCREENED[id as keyof typeof COORBITAL_NOT_SCREENED]}`, String(n)]);
  return [
    '# wayward co-orbital report', '', `> ${SCREENING_CAVEAT}`, '',
    `Planets: ${opts.planet.join(', ')}; N-body window ±${opts.years} years; ${rowsLine(r)}.`, '',
    ...rejectLines(r),
    markdownTable(['bodies', 'count'], [['screened (in a 1:1 zone)', String(r.bodies.length)], ...not], [false, true]), '',
    'Bodies not screened for a reason of their own (unbound, elements missing, epoch outside the ephemeris) are named in not-screened.csv.', '',
    `## Resonant now (${resonant.length})`, '',
    resonant.length ? markdownTable(['designation', 'planet', 'predicted', 'N-body now', 'predicted period (yr)', 'closest approach (au)', 'unconfirmed because'], rows) : 'None.',
    '', 'Every screened body is in coorbitals.csv; every segment of every N-body history in segments.csv.', '',
    ...plotsSection(r, plots),
  ].join('\n');
}

export async function runCoorbitals(opts: CoorbitalsOptions): Promise<CoorbitalsResult> {
  const files = commandFiles(opts.files);
  const stage = await OutputStage.open(opts.out);
  try {
    const { loaded, errors } = await loadCommandCatalogue(files, opts.out, opts.threads);
    const co: CoorbitalOptions = { ...COORBITAL_DEFAULTS, planets: opts.planet, windowYears: opts.years, confirm: 'all', budgetCpuSeconds: opts.budget, threads: opts.threads, series: true };
    const { results, notScreened, skipped } = await analyseCoorbitals(loaded.catalogue, co);
    sortRejectsInPlace(loaded.rejects, files);
    const rowsRead = loaded.files.reduce((n, f) => n + f.rows.read, 0);
    const result: CoorbitalsResult = { cat: loaded.catalogue, bodies: results, notScreened, skipped, rejects: loaded.rejects, rowsRead, errors };
    await writeRejectsCsv(stage.path('rejects.csv'), loaded.rejects);
    await writeFileAtomic(stage.path('coorbitals.csv'), csvText(BODY_COLUMNS, results.map((b) => bodyRow(loaded.catalogue, b))));
    await writeFileAtomic(stage.path('segments.csv'), csvText(SEGMENT_COLUMNS, segmentRows(loaded.catalogue, results)));
    await writeFileAtomic(stage.path('not-screened.csv'), csvText(NOT_SCREENED_COLUMNS, notScreenedRows(loaded.catalogue, skipped)));
    await writeFileAtomic(stage.path('coorbitals.json'), jsonText(result, opts));
    // charts for the bodies resonant now by N-body (an unconfirmed body has no series)
    const plots = await writeCoorbitalPlots(stage, loaded.catalogue, results.filter((b) => b.history && stateNow(b) !== 'passing'));
    await writeFileAtomic(stage.path('report.md'), reportText(result, opts, plots));
    await stage.commit();
    return result;
  } catch (err) {
    await stage.abort();
    throw err;
  }
}

/** The stdout table: the resonant bodies and the accounting line. */
export function coorbitalsStdout(r: CoorbitalsResult, out: string): string {
  const cands = coorbitalCandidates(r.cat, r.bodies);
  const rows = cands.map((c) => [c.designation, String(c.details.planet), c.class, String(c.details.predicted), c.score.toFixed(2), c.flags.join(', ') || 'none']);
  const skipped = r.skipped.length > 0 ? `; ${r.skipped.length} not screened for a reason of their own (not-screened.csv)` : '';
  return [
    `${rowsLine(r).replace('(rejects.csv)', `(${out}/rejects.csv)`)}.`,
    `${r.bodies.length} bodies in the 1:1 zones screened${skipped}; ${cands.length} resonant now.`,
    rows.length ? textTable(['designation', 'planet', 'state now', 'predicted', 'score', 'flags'], rows, [false, false, false, false, true, false]) : '',
    `Outputs in ${out}/ (coorbitals.csv, segments.csv, not-screened.csv, rejects.csv, coorbitals.json, report.md, plots/). Screening candidates only.`,
  ].filter(Boolean).join('\n') + '\n';
}

export function registerCoorbitals(program: Command): void {
  program
    .command('coorbitals')
    .description("bodies in 1:1 resonance with a planet: every body in the planet's zone predicted and confirmed by N-body (default: the bundled demo catalogue)")
    .argument('[files...]', 'orbit dumps, as for scan')
    .addOption(withDefault('--planet <names>', `${PLANETS.join(', ')}, a comma list, or all`, [...COORBITAL_DEFAULTS.planets], COORBITAL_DEFAULTS.planets.join(','), parsePlanetList))
    .addOption(withDefault('--years <n>', 'N-body window: the epoch ± n years', COORBITAL_DEFAULTS.windowYears, String(COORBITAL_DEFAULTS.windowYears), parsePositiveInteger))
    .addOption(withDefault('--budget <s>', 'CPU-seconds of N-body work, as a body count at a fixed nominal cost', 3600, '3600', parseNonNegativeNumber))
    .addOption(withDefault('--threads <n>', 'worker threads (also for reading a large orbit-export file; outputs identical for any number)', COORBITAL_DEFAULTS.threads, String(COORBITAL_DEFAULTS.threads), parsePositiveInteger))
    .addOption(withDefault('-o, --out <dir>', 'output directory', 'wayward-coorbitals', 'wayward-coorbitals'))
    .action(async (files: string[], flags: Omit<CoorbitalsOptions, 'files'>) => {
      const r = await runCoorbitals({ files, ...flags });
      for (const line of r.errors) process.stderr.write(`wayward: ${line}\n`);
      process.stdout.write(coorbitalsStdout(r, flags.out));
      if (r.errors.length > 0) process.exitCode = 1;
    });
}
