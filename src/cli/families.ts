/**
 * `wayward families`: asteroid families in proper elements and the bodies isolated from them.
 * Outputs (staged, put in place together): families.csv (the family table), members.csv (one
 * row per member), outliers.csv (the candidates), unreliable.csv (bodies whose proper elements
 * the linear theory does not trust, with the reasons), not-screened.csv (bodies left out for a
 * reason of their own), rejects.csv (rows the readers and cleaning set aside, and bad lines of
 * a --families list), families.json (all of it with the run's accounting), report.md, and the
 * proper-element maps a–e and a–sin i in plots/ (report/familiesPlots.ts).
 */
import { Command } from 'commander';
import { analyseFamilies, type FamiliesAnalysis } from '../detect/families.js';
import { FAMILIES_DEFAULTS, type FamiliesOptions } from '../detect/familiesOptions.js';
import { startFamiliesThreads } from '../detect/families/familiesThreads.js';
import { FAMILIES_NOT_SCREENED } from '../detect/familiesScreen.js';
import { FAP_EXTRAPOLATED_FLAG } from '../detect/familiesOutliers.js';
import type { Catalogue, Reject } from '../clean/types.js';
import { BELT_REGIONS } from '../detect/families/qrlRegion.js';
import { writeFileAtomic } from '../report/atomicWrite.js';
import { writeFamiliesPlots, type FamiliesPlot } from '../report/familiesPlots.js';
import { csvRecord } from '../report/csvField.js';
import {
  FAMILY_COLUMNS, familyRows, MEMBER_COLUMNS, memberRows, NOT_SCREENED_COLUMNS, notScreenedRows, OUTLIER_COLUMNS, outlierRows,
  UNRELIABLE_COLUMNS, unreliableRows,
} from '../report/familiesTables.js';
import { OutputStage } from '../report/outputStage.js';
import { SCREENING_CAVEAT } from '../report/reportMarkdown.js';
import { sortRejectsInPlace, writeRejectsCsv } from '../report/rejectsFile.js';
import { markdownTable, textTable } from '../report/textTable.js';
import { membershipRejectLines, readFamiliesInputs } from './familiesInputs.js';
import { commandFiles, loadCommandCatalogue } from './commandCatalogue.js';
import { withDefault } from './optionDefault.js';
import { parseMinMembers, parsePositiveInteger, parsePositiveNumber, parseProbabilityLevel } from './optionParsers.js';

/** Threads of `wayward families` by default: the two cores of the reference machine (as scan's --threads). */
const FAMILIES_THREADS_DEFAULT = 2;

export interface FamiliesCliOptions {
  files: string[]; // empty: the bundled demo catalogue
  out: string;
  families?: string; // a user's membership list
  fap: number;
  fdr: number;
  cutoff?: number;
  min: number;
  threads?: number; // threads of the QRL levels and the outliers' neighbour searches (outputs identical for any number); default 1
}

export interface FamiliesCliResult {
  cat: Catalogue;
  analysis: FamiliesAnalysis;
  options: FamiliesOptions;
  rejects: Reject[];
  rowsRead: number;
  errors: string[]; // unreadable inputs
  warnings: string[]; // bad lines of the membership list
}

function csvText(header: readonly string[], rows: readonly (string | number)[][]): string {
  return [csvRecord([...header]), ...rows.map(csvRecord)].join('\n') + '\n';
}

function jsonText(r: FamiliesCliResult, opts: FamiliesCliOptions): string {
  const a = r.analysis;
  const { published, membership: _m, ...options } = r.options;
  return JSON.stringify({
    tool: 'wayward', command: 'families',
    options: { ...options, publishedFamilies: published.length, membershipFile: opts.families ?? null },
    rowsRead: r.rowsRead, rejected: r.rejects.length, accepted: r.cat.size,
    screened: a.screen.screened.length, notScreened: a.screen.notScreened, secularModels: a.screen.models,
    regions: BELT_REGIONS.map((name, k) => ({ region: name, cutoffMPerS: a.clustering.regionCutoffMPerS[k] })),
    cutoffFrom: a.clustering.cutoffFromQrl ? 'quasi-random level' : 'option',
    families: a.clustering.table.map((f) => ({
      ...a.names[f.id], region: BELT_REGIONS[a.clustering.familyRegion[f.id]], members: f.memberCount, cutoffMPerS: f.cutoffMPerS,
      aAu: f.aAu, e: f.e, sinI: f.sinI,
    })),
    familyMembers: a.clustering.table.reduce((s, f) => s + f.memberCount, 0),
    outliers: a.candidates.length, bodiesTested: a.tested, outliersBelowFdr: a.fdrCandidates.length,
    setApartOccupyingSpace: a.occupying.length,
    nullModel: a.outliers ? a.outliers.nullModel : null, nullScores: a.outliers ? a.outliers.nullScores : null,
    nullTailFit: a.outliers ? tailFitRecord(a.outliers) : null,
    unmatchedMembership: a.unmatched.map((m) => ({ designation: m.designation, family: m.family, line: m.line })),
  }, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v), 2) + '\n';
}

/** The null sample's tail fit as families.json records it. */
function tailFitRecord(o: NonNullable<FamiliesAnalysis['outliers']>): Record<string, unknown> {
  const f = o.tail.fit;
  if (f === null) return { accepted: false, attempts: o.tail.attempts, bestRejectedFitPValue: o.tail.bestRejectedPValue };
  return {
    accepted: true, exceedances: f.exceedances, thresholdScore: f.thresholdT, shapeXi: f.gpd.shapeXi, scale: f.gpd.scaleSigma,
    extrapolatedWithShapeXi: f.extrapolateWith.shapeXi, extrapolatedWithScale: f.extrapolateWith.scaleSigma, fitPValue: f.fitPValue,
  };
}

function rowsLine(r: FamiliesCliResult): string {
  return `${r.rowsRead} rows read: ${r.cat.size} bodies accepted, ${r.rejects.length} rejected (rejects.csv)`;
}

/** The maps as Markdown images, each linking its SVG. */
function mapsSection(plots: readonly FamiliesPlot[]): string[] {
  if (plots.length === 0) return [];
  return ['## Maps', '',
    'Proper elements of the screened bodies, coloured by family (the largest named in the legend, the others in one grey, bodies outside every family light grey), outliers marked; each subtitle says what is drawn. Each picture links its SVG.', '',
    plots.map((p) => `[![${p.caption}](${p.stem}.png)](${p.stem}.svg)`).join(' '), ''];
}

function reportText(r: FamiliesCliResult, opts: FamiliesCliOptions, plots: readonly FamiliesPlot[]): string {
  const a = r.analysis;
  const not = Object.entries(a.screen.notScreened).map(([id, n]) => [`not screened: ${FAMILIES_NOT_SCREENED[id as keyof typeof FAMILIES_NOT_SCREENED]}`, String(n)]);
  const fams = familyRows(a).map((row) => [row[0], row[1], row[2], row[3], row[4], row[5], row[6], row[7], row[8]].map(String));
  const outl = outlierRows(a).slice(0, 50).map((row) => [row[0], row[1], row[2], row[3], row[4], row[5], row[8], row[9], row[10], row[12] || row[11] || 'none', row[13]].map(String));
  const cut = BELT_REGIONS.map((name, k) => `${name} ${Number.isFinite(a.clustering.regionCutoffMPerS[k]) ? `${a.clustering.regionCutoffMPerS[k].toFixed(1)} m/s` : 'none (too few bodies)'}`).join(', ');
  return [
    '# wayward families report', '', `> ${SCREENING_CAVEAT}`, '',
    `${rowsLine(r)}.`, '',
    'Proper elements come from the linear (Laplace–Lagrange) secular theory: proper a is the osculating a, proper e and sin i the free ' +
      'vectors\' lengths at the body\'s epoch. The short-period and resonant terms this theory leaves in are larger than in published ' +
      'synthetic proper elements (in the outer belt up to about 0.02 in e), so families are looser and smaller ones may be missed.', '',
    markdownTable(['bodies', 'count'], [['screened (trusted proper elements)', String(a.screen.screened.length)], ...not], [false, true]), '',
    `Cutoffs (${a.clustering.cutoffFromQrl ? 'quasi-random level per belt region' : 'given'}): ${cut}; N_min ${r.options.minMembers}.`, '',
    `## Families (${a.clustering.table.length})`, '',
    fams.length ? markdownTable(['id', 'name', 'named by', 'region', 'members', 'cutoff (m/s)', 'a (au)', 'e', 'sin i'], fams) : 'None.', '',
    `## Outliers (${a.candidates.length}, false-alarm probability below ${r.options.fapThreshold})`, '',
    a.outliers ? `${a.outliers.nullModel} ${fapNote(a.outliers)}` : 'Too few bodies screened to score isolation.', '',
    ...(a.outliers ? [`${multipleTestingNote(a, r.options.fapThreshold, r.options.fdrLevel)}`, ''] : []),
    outl.length ? markdownTable(['designation', 'score', 'false-alarm prob.', 'from', 'q', `q < ${r.options.fdrLevel}`, 'a (au)', 'e', 'sin i', 'nearest family', 'distance (m/s)'], outl) : 'None.',
    a.candidates.length > 50 ? `\nThe 50 most isolated shown; all ${a.candidates.length} in outliers.csv.` : '', '',
    `## Proper elements not trusted (${a.screen.notScreened['proper-unreliable']})`, '',
    `Kept out of the clustering and never scored as outliers; each with its reasons in unreliable.csv. The ${a.occupying.length} of them whose proper elements could be computed still occupy proper-element space in the outliers' stage (neighbours, background density, the null model's kernels), so that setting them apart leaves no hole the null model does not have.`, '',
    ...(opts.families ? [`## Membership list`, '', `${opts.families}: ${r.options.membership?.length ?? 0} lines read, ${r.warnings.length} set aside (rejects.csv), ${a.unmatched.length} naming no catalogue body (families.json).`, ''] : []),
    ...mapsSection(plots),
  ].join('\n');
}

/** What the false-alarm probability is, and where it is an extrapolation. */
function fapNote(o: NonNullable<FamiliesAnalysis['outliers']>): string {
  const f = o.tail.fit;
  const fit = f === null
    ? `No generalized Pareto fit to the null sample's upper tail passed its goodness-of-fit check (${o.tail.attempts} tried), so no false-alarm probability is below ${(1 / (o.nullScores + 1)).toPrecision(2)}, the null sample's resolution.`
    : `Where fewer than 10 of the ${o.nullScores} null scores are as high, it is extrapolated by a generalized Pareto fit to the ${f.exceedances} highest (shape ξ ${f.gpd.shapeXi.toFixed(3)}${f.extrapolateWith.shapeXi !== f.gpd.shapeXi ? ', extrapolated as an exponential tail so as not to be lighter' : ''}; goodness-of-fit p ${f.fitPValue.toFixed(2)}): from "tail fit" and flag ${FAP_EXTRAPOLATED_FLAG}. Below ${(1 / (o.nullScores + 1)).toPrecision(2)}, the null sample's resolution, such a number is a model extrapolation, not a count.`;
  return `The false-alarm probability is the fraction of that null sample scoring at least as high; it holds under this null model only. ${fit}`;
}

/**
 * Every body outside the families is tested at once: under the null model about α of them pass
 * the threshold by chance (the expectation of a sum of indicators; common practice), so the
 * count found is read against that number; the Benjamini–Hochberg q-values control the expected
 * share of false discoveries among those listed at q < Q (Benjamini & Hochberg 1995).
 */
function multipleTestingNote(a: FamiliesAnalysis, fap: number, fdr: number): string {
  const tested = a.tested;
  const expected = fap * tested;
  return `${tested} bodies outside every family were tested at once: a catalogue drawn from the null model would put about ${expected.toFixed(1)} of them below ${fap} by chance; ${a.candidates.length} found. A count near that number is what the background alone gives. ` +
    `${a.fdrCandidates.length} of them have a Benjamini–Hochberg q-value below ${fdr} over all ${tested} (these are scan's candidates): if the null model holds, at most about ${fdr} of such a list is expected to be false alarms. A q-value is that adjusted level, not the probability that a body is truly isolated.`;
}

export async function runFamilies(opts: FamiliesCliOptions): Promise<FamiliesCliResult> {
  const files = commandFiles(opts.files);
  const stage = await OutputStage.open(opts.out);
  try {
    const { loaded, errors } = await loadCommandCatalogue(files, opts.out, opts.threads ?? 1);
    const inputs = await readFamiliesInputs(opts.families);
    const options: FamiliesOptions = {
      ...FAMILIES_DEFAULTS, cutoffMPerS: opts.cutoff ?? null, minMembers: opts.min, fapThreshold: opts.fap, fdrLevel: opts.fdr,
      published: inputs.published.families, membership: inputs.membership,
    };
    const threads = await startFamiliesThreads(opts.threads ?? 1);
    let analysis: FamiliesAnalysis;
    try {
      analysis = analyseFamilies(loaded.catalogue, options, threads);
    } finally {
      await threads.close();
    }
    const rejects: Reject[] = [...loaded.rejects, ...inputs.membershipRejects.map((e) => ({ kind: 'parse' as const, file: e.file, line: e.line, reason: e.reason, text: e.text }))];
    sortRejectsInPlace(rejects, opts.families ? [...files, opts.families] : files);
    const rowsRead = loaded.files.reduce((n, f) => n + f.rows.read, 0);
    const r: FamiliesCliResult = { cat: loaded.catalogue, analysis, options, rejects, rowsRead, errors, warnings: membershipRejectLines(inputs) };
    await writeRejectsCsv(stage.path('rejects.csv'), rejects);
    await writeFileAtomic(stage.path('families.csv'), csvText(FAMILY_COLUMNS, familyRows(analysis)));
    await writeFileAtomic(stage.path('members.csv'), csvText(MEMBER_COLUMNS, memberRows(loaded.catalogue, analysis)));
    await writeFileAtomic(stage.path('outliers.csv'), csvText(OUTLIER_COLUMNS, outlierRows(analysis)));
    await writeFileAtomic(stage.path('unreliable.csv'), csvText(UNRELIABLE_COLUMNS, unreliableRows(loaded.catalogue, analysis)));
    await writeFileAtomic(stage.path('not-screened.csv'), csvText(NOT_SCREENED_COLUMNS, notScreenedRows(loaded.catalogue, analysis)));
    await writeFileAtomic(stage.path('families.json'), jsonText(r, opts));
    const plots = await writeFamiliesPlots(stage, loaded.catalogue, analysis, opts.fap);
    await writeFileAtomic(stage.path('report.md'), reportText(r, opts, plots));
    await stage.commit();
    return r;
  } catch (err) {
    await stage.abort();
    throw err;
  }
}

export function familiesStdout(r: FamiliesCliResult, out: string): string {
  const a = r.analysis;
  const fams = familyRows(a).slice(0, 20).map((row) => [row[0], row[1], row[3], row[4], row[5]].map(String));
  const unrel = a.screen.notScreened['proper-unreliable'];
  const other = a.screen.reason.length - a.screen.screened.length - unrel;
  return [
    `${rowsLine(r).replace('(rejects.csv)', `(${out}/rejects.csv)`)}.`,
    `${a.screen.screened.length} bodies screened with trusted proper elements; ${unrel} with untrusted ones (unreliable.csv); ${other} not screened (not-screened.csv).`,
    `${a.clustering.table.length} families (${a.names.filter((n) => n.namedBy !== 'none').length} named); ${a.candidates.length} outliers below false-alarm probability ${r.options.fapThreshold}.`,
    ...(a.outliers ? [multipleTestingNote(a, r.options.fapThreshold, r.options.fdrLevel)] : []),
    fams.length ? textTable(['id', 'name', 'region', 'members', 'cutoff (m/s)'], fams, [false, false, false, true, true]) : '',
    `Outputs in ${out}/ (families.csv, members.csv, outliers.csv, unreliable.csv, not-screened.csv, rejects.csv, families.json, report.md, plots/). Screening candidates only.`,
  ].filter(Boolean).join('\n') + '\n';
}

export function registerFamilies(program: Command): void {
  program
    .command('families')
    .description('asteroid families in proper elements (linear secular theory) and the bodies isolated from them (default: the bundled demo catalogue)')
    .argument('[files...]', 'orbit dumps, as for scan')
    .option('--families <file>', 'family membership list (CSV/TSV: designation and family columns) whose labels name the families found')
    .addOption(withDefault('--fap <p>', 'outliers: listed below this false-alarm probability', FAMILIES_DEFAULTS.fapThreshold, String(FAMILIES_DEFAULTS.fapThreshold), parseProbabilityLevel))
    .addOption(withDefault('--fdr <q>', 'outliers: marked as surviving the false-discovery control when their Benjamini–Hochberg q-value is below this', FAMILIES_DEFAULTS.fdrLevel, String(FAMILIES_DEFAULTS.fdrLevel), parseProbabilityLevel))
    .option('--cutoff <m/s>', "one HCM cutoff for every belt region (default: each region's quasi-random level)", parsePositiveNumber)
    .addOption(withDefault('--min <n>', 'fewest members of a family (N_min, ≥ 2)', FAMILIES_DEFAULTS.minMembers, String(FAMILIES_DEFAULTS.minMembers), parseMinMembers))
    .addOption(withDefault('--threads <n>', "worker threads for reading a large orbit-export file, the QRL levels and the outliers' neighbour searches (outputs identical for any number)", FAMILIES_THREADS_DEFAULT, String(FAMILIES_THREADS_DEFAULT), parsePositiveInteger))
    .addOption(withDefault('-o, --out <dir>', 'output directory', 'wayward-families', 'wayward-families'))
    .action(async (files: string[], flags: Omit<FamiliesCliOptions, 'files'>) => {
      const r = await runFamilies({ files, ...flags });
      for (const line of [...r.warnings, ...r.errors]) process.stderr.write(`wayward: ${line}\n`);
      process.stdout.write(familiesStdout(r, flags.out));
      if (r.errors.length > 0) process.exitCode = 1;
    });
}
