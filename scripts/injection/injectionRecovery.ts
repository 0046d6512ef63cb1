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
import { fitOptionsOf, runModelFits } from '../../src/fit/check/modelFits.js';
import { fitOrbit } from '../../src/fit/fitOrbit.js';
import { compareModels, NONGRAV_MODELS, type NongravModelId } from '../../src/fit/models/index.js';
import { chiSquareSf } from '../../src/fit/models/tailFunctions.js';
import { observationSigmas, type ObservationSigma } from '../../src/fit/observationWeights.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { generateSyntheticAstrometry } from '../../src/fit/synthetic/index.js';
import type { SyntheticStation } from '../../src/fit/synthetic/types.js';
import type { AstrometryObservation, ObservatorySite } from '../../src/io/astrometry/types.js';
import { elementsRow } from '../synthetic/elementsRow.js';

export type InjectionKind = 'null' | 'a2' | 'srp';

/** p-value threshold of a detection: compareModels' default (two-sided Gaussian 3σ). */
export const DETECTION_P = 0.0027;
/** A looser threshold also reported for the null trials. */
export const LOOSE_P = 0.05;
/** Nominal share of estimates within their 1σ of the truth: erf(1/√2) (common practice). */
export const NOMINAL_WITHIN_1SIGMA = 0.6827;

/** 10^(k/2) · `from` for k = 0 … 2·decades: a half-decade log grid. */
function halfDecades(from: number, decades: number): number[] {
  return Array.from({ length: 2 * decades + 1 }, (_, k) => from * 10 ** (k / 2));
}
/** Injected magnitudes, half-decade log grids over the ranges asked for (A2 au/d², A/m m²/kg). */
export const A2_GRID_AU_PER_DAY2: readonly number[] = halfDecades(1e-15, 3);
export const SRP_GRID_M2_PER_KG: readonly number[] = halfDecades(1e-4, 3);

/**
 * The σ the fits give the observations:
 * - 'check': as `wayward check` does (src/fit/observationWeights.ts): the record's σ, each
 *   multiplied by √(N/4) when its station has N > 4 observations that night;
 * - 'record': the record's σ alone, the σ the synthetic noise was drawn with. The generator
 *   draws every observation's noise independently, so the per-night factor (meant for real
 *   nights whose errors are correlated) over-states σ on such data; 'record' is the weighting
 *   under which the fit's Δχ² test and covariance hold as stated.
 */
export type InjectionWeights = 'check' | 'record';

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
  /** How the observations are weighted (default 'check'). */
  weights?: InjectionWeights;
  /** Run only trial numbers from ≤ i < to of every value (default 0 … trials): a part of the run. */
  range?: readonly [number, number];
}

/** One model's outcome in one trial. */
export interface TrialModel {
  id: NongravModelId;
  pValue: number; // NaN when the fit failed
  deltaChi2: number; // χ²(gravity) − χ²(model) on the comparison set, NaN when failed
  value: number; // the fitted parameter (A2 or C_R·A/m; the first parameter for comet), NaN when failed
  sigma: number;
}

export interface TrialResult {
  kind: InjectionKind;
  index: number; // the trial's place among its kind's trials (the order of a whole run)
  injected: number; // signed truth (0 for null)
  trialSeed: number;
  observations: number;
  stations: string[];
  preferred: NongravModelId | 'failed';
  models: TrialModel[];
  failure: string; // '' when gravity only converged
  /** χ² per degree of freedom of the gravity-only fit on the comparison set (residuals − 6); NaN when failed. */
  gravityChi2PerDof: number;
  /** Observations outside the comparison set (rejected as outliers). */
  rejected: number;
  /**
   * When gravity only failed: the injected model fitted alone from the truth elements, its
   * parameter and σ (NaN when it failed too or for null trials).
   */
  alone: { value: number; sigma: number } | null;
  /** Gravity only failed from the truth elements and was fitted from the model's solution (modelFits.ts). */
  gravityRestarted?: boolean;
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
  meanChi2PerDof: number; // of the gravity-only fits
  meanRejected: number;
  perModel: {
    id: NongravModelId;
    atDetection: BinomialShare;
    atLoose: BinomialShare;
    /** Mean Δχ² against gravity only (k, its extra parameters, for correct weights and a linear model: common practice). */
    meanDeltaChi2: number;
    k: number;
    /**
     * The same shares with Δχ² divided by the gravity-only fit's χ²/dof first (the σ rescaled so
     * that χ²/dof = 1, the reduced-χ² rescaling of common practice): p = Pr(χ²_k ≥ Δχ²/(χ²/dof)).
     */
    atDetectionRescaled: BinomialShare;
    atLooseRescaled: BinomialShare;
  }[];
  anyModelAtDetection: BinomialShare; // some non-gravitational model preferred (compareModels' choice)
}

export interface InjectedRow {
  kind: 'a2' | 'srp';
  magnitude: number;
  trials: number;
  failed: number;
  detected: BinomialShare; // the injected model's p-value below DETECTION_P
  within1Sigma: BinomialShare; // |fitted − true| ≤ σ
  medianPull: number; // median of (fitted − true)/σ
  /** Failed trials whose injected model, fitted alone, converged; their pulls are not in the shares. */
  failedModelAlone: number;
}

export interface InjectionSummary {
  null: NullSummary | null;
  a2: InjectedRow[] | null;
  srp: InjectedRow[] | null;
  /** Smallest injected magnitude detected in at least half its trials; NaN when none. */
  a2Threshold: number;
  srpThreshold: number;
  /**
   * Where the detection share crosses 50 %: linear in log10 of the magnitude between the grid
   * value below the threshold and the threshold (NaN when the first value is already at 50 %
   * or none is).
   */
  a2Half: number;
  srpHalf: number;
}

export interface RunOptions {
  trials: number;
  seed: number;
  kinds: InjectionKind[];
  fast: boolean;
  weights: InjectionWeights;
  range: [number, number];
  a2Grid: number[];
  srpGrid: number[];
}

export interface InjectionRun {
  options: RunOptions;
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

/** One trial's invented body and its synthetic observations, before any fit. */
export interface TrialData {
  injected: number; // signed truth (0 for null)
  elements: ReturnType<typeof elementsRow>['elements'];
  stations: SyntheticStation[];
  observations: AstrometryObservation[];
}

/** Draws one trial's body, stations and observations from its seed (no fit). */
export function makeTrialData(kind: InjectionKind, injectedMagnitude: number, seed: number, opts: Pick<InjectionOptions, 'fast' | 'sites'>): TrialData {
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
  return { injected, elements: el.elements, stations, observations: gen.observations.map((o) => o.observation) };
}

/** σ of the observations with the per-night factor taken out: the record's σ alone. */
export function recordSigmas(sigmas: readonly ObservationSigma[]): ObservationSigma[] {
  return sigmas.map((x) => ({ ...x, sigmaRaCosDecArcsec: x.sigmaRaCosDecArcsec / x.nightFactor, sigmaDecArcsec: x.sigmaDecArcsec / x.nightFactor, nightFactor: 1 }));
}

/** Runs one trial: draws the body, the stations and the observations, fits, compares. */
export function runTrial(kind: InjectionKind, injectedMagnitude: number, seed: number, opts: InjectionOptions, index = 0): TrialResult {
  const { injected, elements, stations, observations } = makeTrialData(kind, injectedMagnitude, seed, opts);
  const models: Exclude<NongravModelId, 'gravity'>[] = kind === 'null' ? ['thermal', 'comet', 'srp'] : kind === 'a2' ? ['thermal'] : ['srp'];
  const base = { kind, index, injected, trialSeed: seed, observations: observations.length, stations: stations.map((s) => s.site.code) };
  const failedModels = models.map((id) => ({ id, pValue: NaN, deltaChi2: NaN, value: NaN, sigma: NaN }));
  const failed = { preferred: 'failed' as const, models: failedModels, gravityChi2PerDof: NaN, rejected: NaN, alone: null };
  if (observations.length < 10) return { ...base, ...failed, failure: `only ${observations.length} observations placed` };
  const times = observations.map((o) => o.timeJdTT);
  const ephemeris = planetaryEphemerisOver(Math.min(...times, elements.epochJdTDB) - 2, Math.max(...times, elements.epochJdTDB) + 2);
  const checkSigmas = observationSigmas(observations, opts.siteTable);
  const sigmas = (opts.weights ?? 'check') === 'record' ? recordSigmas(checkSigmas) : checkSigmas;
  const start = { kind: 'elements' as const, elements };
  try {
    const mf = runModelFits({ observations, sites: opts.siteTable, sigmas, ephemeris, start, models });
    const cmp = compareModels(mf.fits.map((f) => ({ id: f.id, chiSquare: f.chi2, nResiduals: f.nResiduals, nParams: 6 + f.params.length, params: f.params })));
    const g = mf.fits.find((f) => f.id === 'gravity')!;
    return {
      ...base, preferred: cmp.preferred as NongravModelId, failure: '',
      gravityChi2PerDof: g.chi2 / (g.nResiduals - 6), rejected: mf.inSet.filter((x) => !x).length, alone: null,
      gravityRestarted: mf.gravityRestart !== null,
      models: models.map((id) => {
        const row = cmp.rows.find((x) => x.id === id);
        const fit = mf.fits.find((f) => f.id === id);
        const p = id === 'thermal' || id === 'srp' ? fit?.params[0] : fit?.params.find((q) => q.name === 'A2');
        return { id, pValue: row?.pValue ?? NaN, deltaChi2: row?.deltaChiSquare ?? NaN, value: p?.value ?? NaN, sigma: p?.sigma ?? NaN };
      }),
    };
  } catch (e) {
    if (!(e instanceof OrbitFitError)) throw e;
    const failure = e.message.split('\n')[0];
    if (kind === 'null') return { ...base, ...failed, failure };
    // Gravity only cannot fit these places: does the injected model, alone from the truth, fit them?
    let alone = { value: NaN, sigma: NaN };
    try {
      const fit = fitOrbit(observations, opts.siteTable, start, { ...fitOptionsOf(NONGRAV_MODELS[models[0]]), sigmas, ephemeris });
      const m = fit.columns.length;
      alone = { value: fit.params[NONGRAV_MODELS[models[0]].params[0].forceIndex], sigma: Math.sqrt(fit.covariance[6 * m + 6]) };
    } catch (e2) {
      if (!(e2 instanceof OrbitFitError)) throw e2;
    }
    return { ...base, ...failed, failure, alone };
  }
}

export function binomialShare(k: number, n: number): BinomialShare {
  const share = n === 0 ? NaN : k / n;
  return { k, n, share, sigma: n === 0 ? NaN : Math.sqrt((share * (1 - share)) / n) };
}

function mean(xs: number[]): number {
  return xs.length === 0 ? NaN : xs.reduce((a, b) => a + b, 0) / xs.length;
}

function median(xs: number[]): number {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? s[m] : (s[m - 1] + s[m]) / 2;
}

/** The 50 % crossing of the detection share (see InjectionSummary). */
function halfPoint(rows: InjectedRow[] | null): number {
  const k = rows?.findIndex((x) => x.detected.share >= 0.5) ?? -1;
  if (rows === null || k < 1) return NaN;
  const lo = rows[k - 1];
  const hi = rows[k];
  if (!(lo.detected.share < 0.5)) return NaN;
  const f = (0.5 - lo.detected.share) / (hi.detected.share - lo.detected.share);
  return 10 ** (Math.log10(lo.magnitude) + f * (Math.log10(hi.magnitude) - Math.log10(lo.magnitude)));
}

/** The tables of a set of trials. A failed trial counts in `failed` and in no share. */
export function summarise(trials: readonly TrialResult[], a2Grid: readonly number[], srpGrid: readonly number[]): InjectionSummary {
  const nulls = trials.filter((t) => t.kind === 'null');
  const okNull = nulls.filter((t) => t.preferred !== 'failed');
  const nullSummary: NullSummary | null = nulls.length === 0 ? null : {
    trials: nulls.length, failed: nulls.length - okNull.length,
    meanChi2PerDof: mean(okNull.map((t) => t.gravityChi2PerDof)), meanRejected: mean(okNull.map((t) => t.rejected)),
    perModel: (['thermal', 'comet', 'srp'] as const).map((id) => {
      const k = NONGRAV_MODELS[id].params.length;
      const ms = okNull.map((t) => ({ m: t.models.find((x) => x.id === id)!, c: t.gravityChi2PerDof })).filter((x) => !Number.isNaN(x.m.pValue));
      const ps = ms.map((x) => x.m.pValue);
      const rescaled = ms.map((x) => chiSquareSf(x.m.deltaChi2 / x.c, k));
      const share = (xs: number[], p: number): BinomialShare => binomialShare(xs.filter((x) => x < p).length, xs.length);
      return {
        id, atDetection: share(ps, DETECTION_P), atLoose: share(ps, LOOSE_P), meanDeltaChi2: mean(ms.map((x) => x.m.deltaChi2)), k,
        atDetectionRescaled: share(rescaled, DETECTION_P), atLooseRescaled: share(rescaled, LOOSE_P),
      };
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
        kind, magnitude: g, trials: at.length, failed: at.length - ok.length,
        detected: binomialShare(ok.filter((t) => t.models[0].pValue < DETECTION_P).length, ok.length),
        within1Sigma: binomialShare(pulls.filter((p) => Math.abs(p) <= 1).length, ok.length),
        medianPull: median(pulls),
        failedModelAlone: at.filter((t) => t.preferred === 'failed' && t.alone !== null && Number.isFinite(t.alone.value)).length,
      };
    });
  };
  const threshold = (rs: InjectedRow[] | null): number => rs?.find((x) => x.detected.share >= 0.5)?.magnitude ?? NaN;
  const a2 = rows('a2', a2Grid);
  const srp = rows('srp', srpGrid);
  return { null: nullSummary, a2, srp, a2Threshold: threshold(a2), srpThreshold: threshold(srp), a2Half: halfPoint(a2), srpHalf: halfPoint(srp) };
}

/** Runs every trial in a fixed order (kind, trial number, injected value) and summarises. */
export function runInjectionRecovery(opts: InjectionOptions): InjectionRun {
  if (!Number.isInteger(opts.trials) || opts.trials < 1) throw new RangeError(`injection-recovery: trials must be a positive integer, got ${opts.trials}`);
  if (opts.sites.length < 3) throw new RangeError(`injection-recovery: at least 3 stations needed, got ${opts.sites.length}`);
  const range: [number, number] = opts.range ? [opts.range[0], opts.range[1]] : [0, opts.trials];
  if (!(Number.isInteger(range[0]) && Number.isInteger(range[1]) && range[0] >= 0 && range[0] < range[1] && range[1] <= opts.trials)) {
    throw new RangeError(`injection-recovery: trial range ${range[0]}:${range[1]} is not inside 0:${opts.trials}`);
  }
  const a2Grid = [...(opts.a2Grid ?? A2_GRID_AU_PER_DAY2)];
  const srpGrid = [...(opts.srpGrid ?? SRP_GRID_M2_PER_KG)];
  const trials: TrialResult[] = [];
  const run = (t: TrialResult): void => { trials.push(t); opts.onTrial?.(t); };
  for (const kind of opts.kinds) {
    const grid = kind === 'null' ? [0] : kind === 'a2' ? a2Grid : srpGrid;
    // Interleaved over the grid so that a run cut short still covers every value; trial number
    // i of value j has index i·(grid size) + j whatever part of the run it is made in.
    for (let i = range[0]; i < range[1]; i++) {
      grid.forEach((g, j) => {
        const index = i * grid.length + j;
        run(runTrial(kind, g, trialSeed(opts.seed, kind, index), opts, index));
      });
    }
  }
  const options: RunOptions = { trials: opts.trials, seed: opts.seed, kinds: [...opts.kinds], fast: opts.fast, weights: opts.weights ?? 'check', range, a2Grid, srpGrid };
  return { options, trials, summary: summarise(trials, a2Grid, srpGrid) };
}

/**
 * Parts of one run (the same options but the trial range, e.g. made in two processes) as the
 * whole run: the trials in the whole run's order (kind as asked, then index), the range the
 * union. RangeError when the options differ, a trial is in two parts, or a trial number is missing.
 */
export function mergeRuns(parts: readonly InjectionRun[]): InjectionRun {
  if (parts.length === 0) throw new RangeError('injection-recovery: nothing to merge');
  const o = parts[0].options;
  const same = (p: RunOptions): boolean => JSON.stringify({ ...p, range: null }) === JSON.stringify({ ...o, range: null });
  const bad = parts.find((p) => !same(p.options));
  if (bad) throw new RangeError(`injection-recovery: parts of different runs (seed ${o.seed} and ${bad.options.seed}, or other options differ)`);
  const ranges = parts.map((p) => p.options.range).sort((a, b) => a[0] - b[0]);
  for (let k = 1; k < ranges.length; k++) {
    if (ranges[k][0] !== ranges[k - 1][1]) throw new RangeError(`injection-recovery: trial ranges ${ranges[k - 1].join(':')} and ${ranges[k].join(':')} overlap or leave a gap`);
  }
  const kindOrder = (k: InjectionKind): number => o.kinds.indexOf(k);
  const trials = parts.flatMap((p) => p.trials).sort((a, b) => kindOrder(a.kind) - kindOrder(b.kind) || a.index - b.index);
  const range: [number, number] = [ranges[0][0], ranges[ranges.length - 1][1]];
  return { options: { ...o, range }, trials, summary: summarise(trials, o.a2Grid, o.srpGrid) };
}

/** A run (or part) as JSON text; NaN and ±Infinity, which JSON cannot hold, as strings. */
export function runToJson(run: InjectionRun): string {
  return JSON.stringify(run, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? String(v) : v)) + '\n';
}

/** The run of runToJson's text. */
export function runFromJson(text: string): InjectionRun {
  return JSON.parse(text, (_k, v) => (v === 'NaN' ? NaN : v === 'Infinity' ? Infinity : v === '-Infinity' ? -Infinity : v)) as InjectionRun;
}

function pct(s: BinomialShare): string {
  return s.n === 0 ? 'n/a' : `${(100 * s.share).toFixed(1)} ± ${(100 * s.sigma).toFixed(1)} % (${s.k}/${s.n})`;
}

/** The report as text (Markdown tables). */
export function formatInjectionReport(run: InjectionRun): string {
  const s = run.summary;
  const o = run.options;
  const out: string[] = [
    `injection-recovery: seed ${o.seed}, trials ${o.range[0]}–${o.range[1] - 1} of ${o.trials} per value, kinds ${o.kinds.join(',')}${o.fast ? ', fast (60–100 observations a trial)' : ' (300–600 observations a trial)'}, weights ${o.weights}`,
    `detection: the injected model's p-value < ${DETECTION_P}; shares with their binomial σ`,
  ];
  if (s.null) {
    out.push('', `null trials (gravity-only truth): ${s.null.trials}, failed fits ${s.null.failed}; gravity-only χ²/dof ${s.null.meanChi2PerDof.toFixed(3)} on average, ${s.null.meanRejected.toFixed(2)} observations rejected a trial`, '',
      `| model | p < ${DETECTION_P} (nominal ${(100 * DETECTION_P).toFixed(2)} %) | p < ${LOOSE_P} (nominal ${100 * LOOSE_P} %) | mean Δχ² (nominal k) | rescaled by χ²/dof: p < ${DETECTION_P} | p < ${LOOSE_P} |`, '|---|---|---|---|---|---|');
    for (const m of s.null.perModel) out.push(`| ${m.id} | ${pct(m.atDetection)} | ${pct(m.atLoose)} | ${m.meanDeltaChi2.toFixed(3)} (${m.k}) | ${pct(m.atDetectionRescaled)} | ${pct(m.atLooseRescaled)} |`);
    out.push(`| any model preferred | ${pct(s.null.anyModelAtDetection)} | | | | |`);
  }
  const table = (title: string, unit: string, rows: InjectedRow[], thr: number, half: number): void => {
    out.push('', title, '', `| injected (${unit}) | trials | failed (model alone fits) | detected | within 1σ (nominal ${(100 * NOMINAL_WITHIN_1SIGMA).toFixed(1)} %) | median pull |`, '|---|---|---|---|---|---|');
    for (const r of rows) out.push(`| ${r.magnitude.toExponential(1)} | ${r.trials} | ${r.failed} (${r.failedModelAlone}) | ${pct(r.detected)} | ${pct(r.within1Sigma)} | ${Number.isNaN(r.medianPull) ? 'n/a' : r.medianPull.toFixed(2)} |`);
    const k = rows.reduce((a, r) => a + r.within1Sigma.k, 0);
    const n = rows.reduce((a, r) => a + r.within1Sigma.n, 0);
    const pulls = run.trials.filter((t) => t.kind === rows[0].kind && t.preferred !== 'failed' && Number.isFinite(t.models[0].pValue)).map((t) => (t.models[0].value - t.injected) / t.models[0].sigma);
    const m = mean(pulls);
    const sd = Math.sqrt(pulls.reduce((a, p) => a + (p - m) ** 2, 0) / (pulls.length - 1));
    // 1.4826 × median absolute deviation: σ of a normal sample, robust to a few wild pulls (common practice).
    const mad = 1.4826 * median(pulls.map((p) => Math.abs(p - median(pulls))));
    out.push(`within 1σ over every converged trial: ${pct(binomialShare(k, n))}; pulls: mean ${m.toFixed(2)}, standard deviation ${sd.toFixed(2)}, 1.4826·MAD ${mad.toFixed(2)} (nominal 0, 1, 1)`);
    const restarted = run.trials.filter((t) => t.kind === rows[0].kind && t.gravityRestarted === true).length;
    out.push(`gravity only fitted from the model's solution (it failed from the truth elements): ${restarted} trial${restarted === 1 ? '' : 's'}`);
    out.push(`smallest injected value detected in ≥ 50 % of trials: ${Number.isNaN(thr) ? 'none on the grid' : thr.toExponential(1) + ' ' + unit}`
      + (Number.isNaN(half) ? '' : `; 50 % crossed at ${half.toExponential(1)} ${unit} (log-linear between grid values)`));
  };
  if (s.a2) table('injected transverse A2 (inverse-square law, random sign; thermal model fitted)', 'au/d²', s.a2, s.a2Threshold, s.a2Half);
  if (s.srp) table('injected radiation pressure, C_R = 1 (srp model fitted)', 'm²/kg', s.srp, s.srpThreshold, s.srpHalf);
  return out.join('\n') + '\n';
}
