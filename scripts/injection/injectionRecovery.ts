/**
 * Injection–recovery of non-gravitational signals: many invented bodies, each with synthetic
 * astrometry (src/fit/synthetic/) made from a truth with no extra force (null trials), a
 * transverse A2 under the inverse-square law (a2 trials) or radiation pressure with C_R = 1
 * (srp trials), fitted in process by check's model fits (src/fit/check/modelFits.ts: gravity
 * only and each model, the comparison set, compareModels). The leave-one-station-out refits
 * and the other guards of runCheck are not run (they do not change the p-values or the fitted
 * parameters, and each refit costs a whole fit). Null trials fit thermal, comet and srp;
 * a2 trials thermal only; srp trials srp only. The fit starts from the truth elements (as
 * `check --elements` with a good elements row).
 *
 * Every trial has its own seed drawn from the run's seed: the same options give the same
 * numbers. Invented data throughout; nothing here is an outside truth. Nothing is printed here.
 */
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { seededRandom, type Random } from '../../src/core/random.js';
import { calendarToJd } from '../../src/core/time/julian.js';
import { runModelFits } from '../../src/fit/check/modelFits.js';
import { compareModels, type NongravModelId } from '../../src/fit/models/index.js';
import { observationSigmas } from '../../src/fit/observationWeights.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { generateSyntheticAstrometry } from '../../src/fit/synthetic/index.js';
import type { SyntheticStation } from '../../src/fit/synthetic/types.js';
import type { ObservatorySite } from '../../src/io/astrometry/types.js';
import { elementsRow } from '../synthetic/elementsRow.js';

export type InjectionKind = 'null' | 'a2' | 'srp';

/** p-value threshold of a detection: compareModels' default (two-sided Gaussian 3σ). */
export const DETECTION_P = 0.0027;
/** A looser threshold also reported for the null trials. */
export const LOOSE_P = 0.05;
/** Nominal share of estimates within their 1σ of the truth: erf(1/√2) (common practice). */
export const NOMINAL_WITHIN_1SIGMA = 0.6827;

/** Injected magnitudes, a log grid over the ranges asked for (A2 au/d², A/m m²/kg). */
export const A2_GRID_AU_PER_DAY2: readonly number[] = [1e-15, 1e-14, 1e-13, 1e-12];
export const SRP_GRID_M2_PER_KG: readonly number[] = [1e-4, 1e-3, 1e-2, 1e-1];

export interface InjectionOptions {
  trials: number; // per injected value (and null trials)
  seed: number;
  kinds: readonly InjectionKind[];
  fast: boolean; // 60–100 observations a trial instead of 300–600
  /** Candidate stations (3–4 are drawn per trial); σ is drawn per trial, 0.2–0.5″. */
  sites: readonly ObservatorySite[];
  /** The observatory-code table the fits look stations up in. */
  siteTable: ReadonlyMap<string, ObservatorySite>;
  onTrial?: (t: TrialResult) => void;
  /** Injected values (defaults: the grids above). */
  a2Grid?: readonly number[];
  srpGrid?: readonly number[];
}

/** One model's outcome in one trial. */
export interface TrialModel {
  id: NongravModelId;
  pValue: number; // NaN when the fit failed
  value: number; // the fitted parameter (A2 or C_R·A/m; the first parameter for comet), NaN when failed
  sigma: number;
}

export interface TrialResult {
  kind: InjectionKind;
  injected: number; // signed truth (0 for null)
  trialSeed: number;
  observations: number;
  stations: string[];
  preferred: NongravModelId | 'failed';
  models: TrialModel[];
  failure: string; // '' when gravity only converged
}

export interface BinomialShare {
  k: number;
  n: number;
  share: number; // k/n, NaN for n = 0
  sigma: number; // √(share(1−share)/n), the binomial σ of the share
}

export interface NullSummary {
  trials: number;
  failed: number;
  perModel: { id: NongravModelId; atDetection: BinomialShare; atLoose: BinomialShare }[];
  anyModelAtDetection: BinomialShare; // some non-gravitational model preferred (compareModels' choice)
}

export interface InjectedRow {
  magnitude: number;
  trials: number;
  failed: number;
  detected: BinomialShare; // the injected model's p-value below DETECTION_P
  within1Sigma: BinomialShare; // |fitted − true| ≤ σ
  medianPull: number; // median of (fitted − true)/σ
}

export interface InjectionSummary {
  null: NullSummary | null;
  a2: InjectedRow[] | null;
  srp: InjectedRow[] | null;
  /** Smallest injected magnitude detected in at least half its trials; NaN when none. */
  a2Threshold: number;
  srpThreshold: number;
}

export interface InjectionRun {
  options: { trials: number; seed: number; kinds: InjectionKind[]; fast: boolean };
  trials: TrialResult[];
  summary: InjectionSummary;
}

function uniform(r: Random, lo: number, hi: number): number {
  return lo + (hi - lo) * r();
}

/** The seed of trial `index` of `kind`: the run's seed mixed with both (a hash multiplier, common practice). */
export function trialSeed(seed: number, kind: InjectionKind, index: number): number {
  const k = kind === 'null' ? 1 : kind === 'a2' ? 2 : 3;
  return (Math.imul((seed >>> 0) ^ Math.imul(k, 0x9e3779b1), 0x85ebca6b) + Math.imul(index + 1, 0xc2b2ae35)) >>> 0;
}

const START_JD_UTC = calendarToJd(2022, 5, 10);
const SPAN_DAYS = 365.25 * 10;
const EPOCH_JD_TT = calendarToJd(2032, 5, 10); // the elements' epoch at the end of the span

/** Runs one trial: draws the body, the stations and the observations, fits, compares. */
export function runTrial(kind: InjectionKind, injectedMagnitude: number, seed: number, opts: InjectionOptions): TrialResult {
  const r = seededRandom(seed);
  // The body: an inner-solar-system orbit (our choice; a near-Earth to inner main-belt range).
  const el = elementsRow({
    designation: '2031 QK12', aAu: uniform(r, 1.1, 2.6), e: uniform(r, 0.05, 0.3), iDeg: uniform(r, 0, 15),
    nodeDeg: uniform(r, 0, 360), periDeg: uniform(r, 0, 360), meanAnomalyDeg: uniform(r, 0, 360),
    epochJdTT: EPOCH_JD_TT, H: NaN, reference: 'INJECT',
  });
  const sign = r() < 0.5 ? -1 : 1; // thermal drift either way; radiation pressure always outward
  const injected = kind === 'a2' ? sign * injectedMagnitude : injectedMagnitude;
  // 3 or 4 distinct stations of the candidates, each with σ in 0.2–0.5″.
  const pool = [...opts.sites];
  const nStations = Math.min(pool.length, r() < 0.5 ? 3 : 4);
  const stations: SyntheticStation[] = [];
  for (let i = 0; i < nStations; i++) {
    const site = pool.splice(Math.floor(r() * pool.length), 1)[0];
    stations.push({ site, sigmaArcsec: uniform(r, 0.2, 0.5), note2: 'C', fromJdUtc: -Infinity, toJdUtc: Infinity });
  }
  const count = opts.fast ? 60 + Math.floor(r() * 41) : 300 + Math.floor(r() * 301);
  const gen = generateSyntheticAstrometry('2031 QK12', {
    truth: {
      elements: el.elements, nonGravAuPerDay2: kind === 'a2' ? [0, injected, 0] : null, nonGravLaw: 'inverse-square',
      areaToMassM2PerKg: kind === 'srp' ? injected : 0, radiationPressureCoefficient: 1, relativity: true,
    },
    stations, startJdUtc: START_JD_UTC, endJdUtc: START_JD_UTC + SPAN_DAYS, count, seed: (seed ^ 0x5bd1e995) >>> 0,
    outlierRate: 0, outlierArcsec: [3, 20],
  });
  const observations = gen.observations.map((o) => o.observation);
  const models: Exclude<NongravModelId, 'gravity'>[] = kind === 'null' ? ['thermal', 'comet', 'srp'] : kind === 'a2' ? ['thermal'] : ['srp'];
  const base = { kind, injected, trialSeed: seed, observations: observations.length, stations: stations.map((s) => s.site.code) };
  const failedModels = models.map((id) => ({ id, pValue: NaN, value: NaN, sigma: NaN }));
  if (observations.length < 10) return { ...base, preferred: 'failed', models: failedModels, failure: `only ${observations.length} observations placed` };
  const times = observations.map((o) => o.timeJdTT);
  const ephemeris = planetaryEphemerisOver(Math.min(...times, el.elements.epochJdTDB) - 2, Math.max(...times, el.elements.epochJdTDB) + 2);
  try {
    const mf = runModelFits({
      observations, sites: opts.siteTable, sigmas: observationSigmas(observations, opts.siteTable), ephemeris,
      start: { kind: 'elements', elements: el.elements }, models,
    });
    const cmp = compareModels(mf.fits.map((f) => ({ id: f.id, chiSquare: f.chi2, nResiduals: f.nResiduals, nParams: 6 + f.params.length, params: f.params })));
    return {
      ...base, preferred: cmp.preferred as NongravModelId, failure: '',
      models: models.map((id) => {
        const row = cmp.rows.find((x) => x.id === id);
        const fit = mf.fits.find((f) => f.id === id);
        const p = id === 'thermal' || id === 'srp' ? fit?.params[0] : fit?.params.find((q) => q.name === 'A2');
        return { id, pValue: row?.pValue ?? NaN, value: p?.value ?? NaN, sigma: p?.sigma ?? NaN };
      }),
    };
  } catch (e) {
    if (!(e instanceof OrbitFitError)) throw e;
    return { ...base, preferred: 'failed', models: failedModels, failure: e.message.split('\n')[0] };
  }
}

export function binomialShare(k: number, n: number): BinomialShare {
  const share = n === 0 ? NaN : k / n;
  return { k, n, share, sigma: n === 0 ? NaN : Math.sqrt((share * (1 - share)) / n) };
}

function median(xs: number[]): number {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** The tables of a set of trials. A failed trial counts in `failed` and in no share. */
export function summarise(trials: readonly TrialResult[], a2Grid: readonly number[], srpGrid: readonly number[]): InjectionSummary {
  const nulls = trials.filter((t) => t.kind === 'null');
  const okNull = nulls.filter((t) => t.preferred !== 'failed');
  const nullSummary: NullSummary | null = nulls.length === 0 ? null : {
    trials: nulls.length, failed: nulls.length - okNull.length,
    perModel: (['thermal', 'comet', 'srp'] as const).map((id) => {
      const ps = okNull.map((t) => t.models.find((m) => m.id === id)!.pValue).filter((p) => !Number.isNaN(p));
      return { id, atDetection: binomialShare(ps.filter((p) => p < DETECTION_P).length, ps.length), atLoose: binomialShare(ps.filter((p) => p < LOOSE_P).length, ps.length) };
    }),
    anyModelAtDetection: binomialShare(okNull.filter((t) => t.preferred !== 'gravity').length, okNull.length),
  };
  const rows = (kind: 'a2' | 'srp', grid: readonly number[]): InjectedRow[] | null => {
    const of = trials.filter((t) => t.kind === kind);
    if (of.length === 0) return null;
    return grid.map((g) => {
      const at = of.filter((t) => Math.abs(t.injected) === g);
      const ok = at.filter((t) => t.preferred !== 'failed' && Number.isFinite(t.models[0].pValue));
      const pulls = ok.map((t) => (t.models[0].value - t.injected) / t.models[0].sigma);
      return {
        magnitude: g, trials: at.length, failed: at.length - ok.length,
        detected: binomialShare(ok.filter((t) => t.models[0].pValue < DETECTION_P).length, ok.length),
        within1Sigma: binomialShare(pulls.filter((p) => Math.abs(p) <= 1).length, ok.length),
        medianPull: median(pulls),
      };
    });
  };
  const threshold = (rs: InjectedRow[] | null): number => rs?.find((x) => x.detected.share >= 0.5)?.magnitude ?? NaN;
  const a2 = rows('a2', a2Grid);
  const srp = rows('srp', srpGrid);
  return { null: nullSummary, a2, srp, a2Threshold: threshold(a2), srpThreshold: threshold(srp) };
}

/** Runs every trial in a fixed order (kind, injected value, index) and summarises. */
export function runInjectionRecovery(opts: InjectionOptions): InjectionRun {
  if (!Number.isInteger(opts.trials) || opts.trials < 1) throw new RangeError(`injection-recovery: trials must be a positive integer, got ${opts.trials}`);
  if (opts.sites.length < 3) throw new RangeError(`injection-recovery: at least 3 stations needed, got ${opts.sites.length}`);
  const a2Grid = opts.a2Grid ?? A2_GRID_AU_PER_DAY2;
  const srpGrid = opts.srpGrid ?? SRP_GRID_M2_PER_KG;
  const trials: TrialResult[] = [];
  const run = (t: TrialResult): void => { trials.push(t); opts.onTrial?.(t); };
  for (const kind of opts.kinds) {
    const grid = kind === 'null' ? [0] : kind === 'a2' ? a2Grid : srpGrid;
    let index = 0;
    // Interleaved over the grid so that a run cut short still covers every value.
    for (let i = 0; i < opts.trials; i++) {
      for (const g of grid) run(runTrial(kind, g, trialSeed(opts.seed, kind, index++), opts));
    }
  }
  return {
    options: { trials: opts.trials, seed: opts.seed, kinds: [...opts.kinds], fast: opts.fast },
    trials, summary: summarise(trials, a2Grid, srpGrid),
  };
}

function pct(s: BinomialShare): string {
  return s.n === 0 ? 'n/a' : `${(100 * s.share).toFixed(1)} ± ${(100 * s.sigma).toFixed(1)} % (${s.k}/${s.n})`;
}

/** The report as text (Markdown tables). */
export function formatInjectionReport(run: InjectionRun): string {
  const s = run.summary;
  const o = run.options;
  const out: string[] = [
    `injection-recovery: seed ${o.seed}, ${o.trials} trial(s) per value, kinds ${o.kinds.join(',')}${o.fast ? ', fast (60–100 observations a trial)' : ' (300–600 observations a trial)'}`,
    `detection: the injected model's p-value < ${DETECTION_P}; shares with their binomial σ`,
  ];
  if (s.null) {
    out.push('', `null trials (gravity-only truth): ${s.null.trials}, failed fits ${s.null.failed}`, '',
      `| model | p < ${DETECTION_P} (nominal ${(100 * DETECTION_P).toFixed(2)} %) | p < ${LOOSE_P} (nominal ${100 * LOOSE_P} %) |`, '|---|---|---|');
    for (const m of s.null.perModel) out.push(`| ${m.id} | ${pct(m.atDetection)} | ${pct(m.atLoose)} |`);
    out.push(`| any model preferred | ${pct(s.null.anyModelAtDetection)} | |`);
  }
  const table = (title: string, unit: string, rows: InjectedRow[], thr: number): void => {
    out.push('', title, '', `| injected (${unit}) | trials | failed | detected | within 1σ (nominal ${(100 * NOMINAL_WITHIN_1SIGMA).toFixed(1)} %) | median pull |`, '|---|---|---|---|---|---|');
    for (const r of rows) out.push(`| ${r.magnitude.toExponential(0)} | ${r.trials} | ${r.failed} | ${pct(r.detected)} | ${pct(r.within1Sigma)} | ${Number.isNaN(r.medianPull) ? 'n/a' : r.medianPull.toFixed(2)} |`);
    out.push(`smallest injected value detected in ≥ 50 % of trials: ${Number.isNaN(thr) ? 'none on the grid' : thr.toExponential(0) + ' ' + unit}`);
  };
  if (s.a2) table('injected transverse A2 (inverse-square law, random sign; thermal model fitted)', 'au/d²', s.a2, s.a2Threshold);
  if (s.srp) table('injected radiation pressure, C_R = 1 (srp model fitted)', 'm²/kg', s.srp, s.srpThreshold);
  return out.join('\n') + '\n';
}
