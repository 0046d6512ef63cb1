/**
 * One body's orbit fitted to its astrometry: weighted least-squares differential correction
 * of the state at the epoch (and any solve-for parameters) through the state transition
 * matrix, with outlier rejection and recovery.
 *
 * Solved for: the heliocentric Cartesian state at the epoch, not elements. The variational
 * equations give ∂state(t)/∂state₀ directly, and Cartesian coordinates have no singular
 * point (e → 0, i → 0, e ≥ 1 are all ordinary); elements and their σ are derived at the end
 * (elementsCovariance.ts).
 *
 * Iteration (Gauss–Newton with step control, common practice): from p, the places and design
 * rows (predictedPlaces.ts), the normal equations (normalEquations.ts) give Δp; p + λΔp is
 * taken with the largest λ of 1, ½, ¼, … (8 halvings) whose χ² is not above p's. Converged
 * when the accepted correction is below 1e-3 of its σ in every component, or when χ² moved
 * by less than 1e-6 of itself with the correction below 0.1 σ. Failures (OrbitFitError):
 * fewer than 3 usable observations or 2 × kept ≤ m ('too-few-observations'); no λ lowers χ²
 * and the correction is not small, χ² not finite, or no convergence within maxIterations
 * ('diverged'); scaled normal matrix with condition above 1e13 ('singular'); the integrator
 * stopped ('integration').
 *
 * Outliers (Carpino, Milani & Chesley 2003, Icarus 166, 248, sec. 5; thresholds from memory:
 * χ²_rej = 8, χ²_rec = 7): after each converged fit every observation's χ² of its 2-D residual
 * against the residual's covariance is computed (normalEquations.ts); kept ones above χ²_rej
 * are rejected, rejected ones below χ²_rec recovered, and the fit is redone, until nothing
 * changes (at most 20 rounds). Rejection stops short of leaving fewer than max(3, m/2 + 1)
 * observations kept.
 *
 * Excluded observations (options.exclude, e.g. those outside a comparison set or one station's):
 * left out of everything above — χ², the normal equations, the start, the windows, rejection and
 * recovery — and reported as 'excluded' with their residuals at the solution, computed by one
 * more integration after the fit.
 *
 * Start: a state, elements, or Gauss's method (preliminaryOrbit.ts on chooseThree.ts's three
 * observations, arcs of at most 60, 30 and 15 days in turn, each root in the order the
 * preliminary orbit ranks them) — the next is tried when a fit from one fails. From three
 * observations the orbit is too far from the whole arc's for one linearisation, so a Gauss
 * start fits growing windows about the epoch: first the observations within the three's
 * arc of it, then 4× wider each time, until all are in.
 */
import { ARCSEC_PER_RAD, RAD_PER_ARCSEC } from '../core/constants.js';
import { IntegrationError } from '../core/integrate/gaussRadau.js';
import { wrapPi } from '../core/math.js';
import { orbitStateAtEpoch, planetaryEphemerisOver } from '../core/propagate/propagateOrbit.js';
import type { Ephemeris } from '../core/types.js';
import type { AstrometryObservation, ObservatorySite } from '../io/astrometry/types.js';
import { chooseThreeObservations } from './chooseThree.js';
import { elementsWithSigma } from './elementsCovariance.js';
import { inverse2, observationChi2, solveNormalEquations } from './normalEquations.js';
import { observationSigmas, type ObservationSigma } from './observationWeights.js';
import { observerPlaceOf } from './observerPlace.js';
import { observerHeliocentricState } from './observerPosition.js';
import { OrbitFitError, type ObservationFit, type OrbitFit, type OrbitFitOptions, type OrbitFitStart } from './orbitFitTypes.js';
import { predictPlaces, type PredictedPlaces } from './predictedPlaces.js';
import { preliminaryOrbit, type PreliminaryObservation } from './preliminaryOrbit.js';
import { partialColumns, type FitParameter, FIT_PARAMETER_INDEX, type TrajectoryModel } from './trajectoryPartials.js';
import type { ObserverState } from './types.js';

/** Carpino, Milani & Chesley 2003 (from memory): reject above, recover below. */
export const CHI2_REJECT = 8;
export const CHI2_RECOVER = 7;
const MAX_REJECTION_ROUNDS = 20;
const MAX_HALVINGS = 8;
const GAUSS_ARCS_DAYS = [60, 30, 15];
const GROWTH = 4;
/** Half-width of the first window when a state or elements start grows the arc, days. */
const FIRST_WINDOW_DAYS = 30;

/** The observations as the iterations use them (usable ones only). */
interface Prepared {
  index: number[]; // into the caller's array
  excluded: boolean[]; // the caller left it out (options.exclude)
  observers: ObserverState[];
  raRad: Float64Array;
  decRad: Float64Array;
  sigma2: Float64Array; // [Γ00, Γ01, Γ11] rad² per observation
  weights: Float64Array; // the inverse, rad⁻²
  sigmas: ObservationSigma[];
}

/** Where the fit is, over the observations of the current window. */
interface Evaluation {
  pred: PredictedPlaces;
  residuals: Float64Array;
  chi2: number;
}

/**
 * Fit an orbit to `observations` (readers' records whose stations `sites` knows: run
 * checkStations first). See the file comment; OrbitFitError when no orbit results.
 */
export function fitOrbit(observations: readonly AstrometryObservation[], sites: ReadonlyMap<string, ObservatorySite>,
  start: OrbitFitStart, opts: OrbitFitOptions = {}): OrbitFit {
  const solveFor = opts.solveFor ?? [];
  const m = partialColumns(solveFor);
  const sigmas = opts.sigmas ?? observationSigmas(observations, sites);
  if (sigmas.length !== observations.length) throw new RangeError(`fitOrbit: ${sigmas.length} σ for ${observations.length} observations`);
  const excluded = excludedMask(opts.exclude, observations.length);
  const usable: number[] = [];
  observations.forEach((o, i) => { if (Number.isFinite(o.timeJdTT) && Number.isFinite(o.timeJdUtc)) usable.push(i); });
  const included = usable.filter((i) => !excluded[i]);
  if (included.length < 3 || 2 * included.length <= m) {
    const left = included.length === usable.length ? '' : ` (${usable.length - included.length} more excluded)`;
    throw new OrbitFitError('too-few-observations', `${included.length} usable observations${left} for ${m} unknowns`, 0, NaN, NaN);
  }
  const times = usable.map((i) => observations[i].timeJdTT);
  const starts = startCandidates(observations, included, sites, start, opts);
  const lo = Math.min(...times, ...starts.map((s) => s.epochJdTDB)), hi = Math.max(...times, ...starts.map((s) => s.epochJdTDB));
  const eph = opts.ephemeris ?? planetaryEphemerisOver(lo - 1, hi + 1);
  const prep = prepare(observations, usable, excluded, sites, sigmas, eph);
  const failures: string[] = [];
  let lastError: OrbitFitError | null = null;
  for (const s of starts) {
    try {
      return runFit(observations, prep, s, solveFor, m, eph, opts);
    } catch (e) {
      if (!(e instanceof OrbitFitError)) throw e;
      failures.push(`${s.label}: ${e.message}`);
      lastError = e;
    }
  }
  if (starts.length === 0) throw new OrbitFitError('no-start', 'Gauss’s method gave no valid solution on any arc tried', 0, NaN, NaN);
  if (starts.length === 1) throw lastError!;
  throw new OrbitFitError(lastError!.reason, `every start failed — ${failures.join(' | ')}`, lastError!.iterations, lastError!.lastChi2, lastError!.condition);
}

/** True per observation the caller excluded; RangeError for an index that is not one of them. */
function excludedMask(exclude: readonly number[] | undefined, n: number): boolean[] {
  const mask = new Array<boolean>(n).fill(false);
  for (const i of exclude ?? []) {
    if (!Number.isInteger(i) || i < 0 || i >= n) throw new RangeError(`fitOrbit: excluded index ${i} is not one of the ${n} observations`);
    mask[i] = true;
  }
  return mask;
}

interface StartCandidate { epochJdTDB: number; state: Float64Array; label: string; grow: boolean; arcDays: number }

/** The start states to try, in order. */
function startCandidates(observations: readonly AstrometryObservation[], usable: readonly number[], sites: ReadonlyMap<string, ObservatorySite>,
  start: OrbitFitStart, opts: OrbitFitOptions): StartCandidate[] {
  if (start.kind === 'state') {
    if (start.state.length !== 6) throw new RangeError(`fitOrbit: a start state needs 6 numbers, got ${start.state.length}`);
    return [{ epochJdTDB: start.epochJdTDB, state: Float64Array.from(Array.from(start.state)), label: 'state', grow: opts.growArc ?? false, arcDays: FIRST_WINDOW_DAYS }];
  }
  if (start.kind === 'elements') {
    const s = new Float64Array(6);
    orbitStateAtEpoch(start.elements, s);
    return [{ epochJdTDB: start.elements.epochJdTDB, state: s, label: 'elements', grow: opts.growArc ?? false, arcDays: FIRST_WINDOW_DAYS }];
  }
  if (start.kind !== 'gauss') throw new TypeError(`fitOrbit: unknown start kind '${String((start as { kind: unknown }).kind)}'`);
  const out: StartCandidate[] = [];
  const eph = planetaryEphemerisOver(Math.min(...usable.map((i) => observations[i].timeJdTT)), Math.max(...usable.map((i) => observations[i].timeJdTT)));
  const seen = new Set<string>();
  for (const arc of GAUSS_ARCS_DAYS) {
    const chosen = chooseThreeObservations(usable.map((i) => observations[i].timeJdUtc), { maxArcDays: arc });
    if (chosen.indices === null) continue;
    const key = chosen.indices.join(',');
    if (seen.has(key)) continue;
    seen.add(key);
    const three = chosen.indices.map((k) => observations[usable[k]]);
    const first = three[0].timeJdUtc, last = three[2].timeJdUtc;
    const picked = new Set(chosen.indices);
    const asPrelim = (o: AstrometryObservation): PreliminaryObservation => ({
      timeJdUtc: o.timeJdUtc, timeJdTT: o.timeJdTT, raRad: o.raRad, decRad: o.decRad, observer: observerPlaceOf(o, sites),
    });
    const check = usable.filter((i, k) => !picked.has(k) && observations[i].timeJdUtc > first && observations[i].timeJdUtc < last).map((i) => asPrelim(observations[i]));
    const prelim = preliminaryOrbit(three.map(asPrelim), eph, { check });
    const roots = prelim.best === null ? [] : [prelim.best, ...prelim.alternatives];
    roots.forEach((r, k) => {
      out.push({
        epochJdTDB: r.epoch, state: Float64Array.from(r.state), grow: opts.growArc ?? true, arcDays: last - first,
        label: `gauss (arc ${(last - first).toFixed(1)} d within ${arc} d, root ${k + 1} of ${roots.length}, a ${r.elements[0].toFixed(3)} au, check RMS ${r.checkRmsArcsec.toFixed(2)}″)`,
      });
    });
  }
  return out;
}

/** Observer states and σ of the usable observations. */
function prepare(observations: readonly AstrometryObservation[], usable: readonly number[], excluded: readonly boolean[],
  sites: ReadonlyMap<string, ObservatorySite>, sigmas: readonly ObservationSigma[], eph: Ephemeris): Prepared {
  const n = usable.length;
  const sigma2 = new Float64Array(3 * n), weights = new Float64Array(3 * n);
  const raRad = new Float64Array(n), decRad = new Float64Array(n);
  const observers = usable.map((i, k) => {
    const o = observations[i];
    raRad[k] = o.raRad; decRad[k] = o.decRad;
    const s = sigmas[i];
    const a = (s.sigmaRaCosDecArcsec * RAD_PER_ARCSEC) ** 2, d = (s.sigmaDecArcsec * RAD_PER_ARCSEC) ** 2;
    const b = s.correlation * s.sigmaRaCosDecArcsec * s.sigmaDecArcsec * RAD_PER_ARCSEC * RAD_PER_ARCSEC;
    if (!(a > 0 && d > 0)) throw new RangeError(`fitOrbit: σ of ${o.file}:${o.line} not positive (${s.sigmaRaCosDecArcsec}″, ${s.sigmaDecArcsec}″)`);
    sigma2.set([a, b, d], 3 * k);
    weights.set(inverse2(a, b, d), 3 * k);
    return observerHeliocentricState(observerPlaceOf(o, sites), o.timeJdUtc, o.timeJdTT, eph);
  });
  return { index: [...usable], excluded: usable.map((i) => excluded[i]), observers, raRad, decRad, sigma2, weights, sigmas: usable.map((i) => sigmas[i]) };
}

/** Fit from one start; OrbitFitError on failure. */
function runFit(observations: readonly AstrometryObservation[], prep: Prepared, s: StartCandidate, solveFor: readonly FitParameter[],
  m: number, eph: Ephemeris, opts: OrbitFitOptions): OrbitFit {
  const n = prep.index.length;
  const p = new Float64Array(m);
  p.set(s.state, 0);
  const params = new Float64Array(4);
  if (opts.params !== undefined) {
    if (opts.params.length !== 4) throw new RangeError(`fitOrbit: params need 4 numbers (A1, A2, A3, A/m), got ${opts.params.length}`);
    params.set(Array.from(opts.params));
  }
  solveFor.forEach((q, k) => { p[6 + k] = params[FIT_PARAMETER_INDEX[q]]; });
  const reject = opts.reject === false ? null : { rej: opts.reject?.chi2Reject ?? CHI2_REJECT, rec: opts.reject?.chi2Recover ?? CHI2_RECOVER };
  const maxIterations = opts.maxIterations ?? 25;
  // Excluded observations are never kept and never in a window, so never recovered.
  const kept = prep.excluded.map((x) => !x);
  const ctx: FitContext = { prep, solveFor, m, eph, opts, params, epoch: s.epochJdTDB, iterations: 0, condition: NaN, lastChi2: NaN, rejections: 0, recoveries: 0 };
  // Windows about the epoch, over the observations not excluded.
  const dist = prep.observers.map((o) => Math.abs(o.jdTDB - s.epochJdTDB));
  const inFit = dist.filter((_, k) => !prep.excluded[k]);
  const far = Math.max(...inFit);
  let width = s.grow ? Math.max(s.arcDays, 1) : far;
  // A window needs enough observations to fix the unknowns: widen it until it has 2m.
  const sorted = [...inFit].sort((a, b) => a - b);
  width = Math.max(width, sorted[Math.min(sorted.length, 2 * m) - 1]);
  let cov: Float64Array = new Float64Array(m * m);
  let evalAt: Evaluation | null = null;
  let active: number[] = [];
  for (;;) {
    active = [];
    for (let k = 0; k < n; k++) if (!prep.excluded[k] && dist[k] <= width) active.push(k);
    const res = fitWindow(ctx, p, active, kept, maxIterations, reject);
    cov = res.covariance;
    evalAt = res.evaluation;
    if (width >= far) break;
    width = Math.min(far, width * GROWTH);
  }
  return assemble(observations, ctx, p, kept, cov, [{ active, evaluation: evalAt! }, ...recordOfExcluded(ctx, p, kept)], s.label);
}

/**
 * Places of the excluded observations at the solution, for the record (one more integration;
 * none when nothing is excluded). When they cannot be computed (the integration fails out
 * there) their residuals stay NaN.
 */
function recordOfExcluded(ctx: FitContext, p: Float64Array, kept: readonly boolean[]): { active: number[]; evaluation: Evaluation }[] {
  const active: number[] = [];
  ctx.prep.excluded.forEach((x, k) => { if (x) active.push(k); });
  if (active.length === 0) return [];
  try {
    return [{ active, evaluation: evaluate(ctx, p, active, kept) }];
  } catch (e) {
    if (e instanceof OrbitFitError) return [];
    throw e;
  }
}

interface FitContext {
  prep: Prepared; solveFor: readonly FitParameter[]; m: number; eph: Ephemeris; opts: OrbitFitOptions; params: Float64Array;
  epoch: number; iterations: number; condition: number; lastChi2: number; rejections: number; recoveries: number;
}

/** The trajectory model of parameter vector p. */
function modelOf(ctx: FitContext, p: Float64Array): TrajectoryModel {
  const params = Float64Array.from(ctx.params);
  ctx.solveFor.forEach((q, k) => { params[FIT_PARAMETER_INDEX[q]] = p[6 + k]; });
  return {
    epochJdTDB: ctx.epoch, state: p.subarray(0, 6), params, solveFor: ctx.solveFor, law: ctx.opts.law,
    ephemeris: ctx.eph, planets: ctx.opts.planets, relativity: ctx.opts.relativity,
  };
}

/** Places, residuals and χ² (over kept) of p at the active observations. */
function evaluate(ctx: FitContext, p: Float64Array, active: readonly number[], kept: readonly boolean[], guess?: Float64Array): Evaluation {
  const obs = active.map((k) => ctx.prep.observers[k]);
  let pred: PredictedPlaces;
  try {
    pred = predictPlaces(modelOf(ctx, p), obs, guess);
  } catch (e) {
    if (e instanceof IntegrationError) throw new OrbitFitError('integration', e.message, ctx.iterations, ctx.lastChi2, ctx.condition);
    if (e instanceof Error && /light-time/.test(e.message)) throw new OrbitFitError('diverged', e.message, ctx.iterations, ctx.lastChi2, ctx.condition);
    throw e;
  }
  const residuals = new Float64Array(2 * active.length);
  active.forEach((k, a) => {
    const dec = ctx.prep.decRad[k];
    residuals[2 * a] = wrapPi(ctx.prep.raRad[k] - pred.raRad[a]) * Math.cos(dec);
    residuals[2 * a + 1] = dec - pred.decRad[a];
  });
  return { pred, residuals, chi2: keptChi2(ctx, active, kept, residuals) };
}

/** χ² over the kept of the active observations, from their residuals (same order of sums as always). */
function keptChi2(ctx: FitContext, active: readonly number[], kept: readonly boolean[], residuals: Float64Array): number {
  const w = ctx.prep.weights;
  let chi2 = 0;
  active.forEach((k, a) => {
    if (!kept[k]) return;
    const r0 = residuals[2 * a], r1 = residuals[2 * a + 1];
    chi2 += r0 * r0 * w[3 * k] + 2 * r0 * r1 * w[3 * k + 1] + r1 * r1 * w[3 * k + 2];
  });
  return chi2;
}

/** Per-window arrays of weights/σ² for the active observations. */
function sub(arr: Float64Array, active: readonly number[], width: number): Float64Array {
  const out = new Float64Array(width * active.length);
  active.forEach((k, a) => { for (let j = 0; j < width; j++) out[width * a + j] = arr[width * k + j]; });
  return out;
}

/** Gauss–Newton to convergence over the active observations, with rejection rounds; p updated in place. */
function fitWindow(ctx: FitContext, p: Float64Array, active: readonly number[], kept: boolean[], maxIterations: number,
  reject: { rej: number; rec: number } | null): { covariance: Float64Array; evaluation: Evaluation } {
  const m = ctx.m;
  const w = sub(ctx.prep.weights, active, 3);
  const s2 = sub(ctx.prep.sigma2, active, 3);
  const minKept = Math.max(3, Math.ceil(m / 2) + 1);
  // Places and residuals of p over `active` from the previous round: a rejection round changes
  // only which observations count, so the next round starts from them without integrating again.
  let previous: Evaluation | null = null;
  for (let round = 0; ; round++) {
    const keptActive = active.map((k) => kept[k]);
    const nKept = keptActive.filter(Boolean).length;
    if (nKept < 3 || 2 * nKept <= m) {
      throw new OrbitFitError('too-few-observations', `${nKept} observations kept in a window of ${active.length} for ${m} unknowns`, ctx.iterations, ctx.lastChi2, ctx.condition);
    }
    const { covariance, evaluation } = converge(ctx, p, active, kept, keptActive, w, maxIterations, previous);
    previous = evaluation;
    if (reject === null || round >= MAX_REJECTION_ROUNDS) return { covariance, evaluation };
    const chi = observationChi2(evaluation.pred.design, evaluation.residuals, s2, keptActive, covariance, m);
    let changed = false;
    let count = nKept;
    // Recover first, then reject the worst first while enough stay.
    active.forEach((k, a) => {
      if (!kept[k] && chi[a] < reject.rec) { kept[k] = true; changed = true; count++; ctx.recoveries++; }
    });
    const worst = active.map((k, a) => ({ k, c: chi[a] })).filter((x) => kept[x.k] && x.c > reject.rej).sort((x, y) => y.c - x.c);
    for (const x of worst) {
      if (count <= minKept) break;
      kept[x.k] = false; changed = true; count--; ctx.rejections++;
    }
    if (!changed) return { covariance, evaluation };
  }
}

/** Gauss–Newton iterations with step halving until convergence (see the file comment). */
function converge(ctx: FitContext, p: Float64Array, active: readonly number[], kept: readonly boolean[], keptActive: readonly boolean[],
  w: Float64Array, maxIterations: number, atP: Evaluation | null = null): { covariance: Float64Array; evaluation: Evaluation } {
  const m = ctx.m;
  let cur = atP === null ? evaluate(ctx, p, active, kept) : { pred: atP.pred, residuals: atP.residuals, chi2: keptChi2(ctx, active, kept, atP.residuals) };
  for (let it = 0; it < maxIterations; it++) {
    ctx.iterations++;
    ctx.lastChi2 = cur.chi2;
    if (!Number.isFinite(cur.chi2)) throw new OrbitFitError('diverged', 'χ² is not finite', ctx.iterations, cur.chi2, ctx.condition);
    const sol = solveNormalEquations(cur.pred.design, cur.residuals, w, keptActive, m);
    ctx.condition = sol.condition;
    if (sol.singular) throw new OrbitFitError('singular', `normal matrix singular over ${active.length} observations`, ctx.iterations, cur.chi2, sol.condition);
    let sigmaSteps = 0;
    for (let j = 0; j < m; j++) sigmaSteps = Math.max(sigmaSteps, Math.abs(sol.correction[j]) / Math.sqrt(sol.covariance[m * j + j]));
    if (sigmaSteps < 1e-3) return { covariance: sol.covariance, evaluation: cur };
    let lambda = 1;
    let accepted: { p: Float64Array; ev: Evaluation } | null = null;
    for (let h = 0; h <= MAX_HALVINGS; h++, lambda /= 2) {
      const trial = Float64Array.from(p);
      for (let j = 0; j < m; j++) trial[j] += lambda * sol.correction[j];
      let ev: Evaluation;
      try {
        ev = evaluate(ctx, trial, active, kept, cur.pred.emitJdTDB);
      } catch (e) {
        if (e instanceof OrbitFitError && (e.reason === 'integration' || e.reason === 'diverged')) continue;
        throw e;
      }
      if (Number.isFinite(ev.chi2) && ev.chi2 <= cur.chi2 * (1 + 1e-12)) {
        accepted = { p: trial, ev };
        break;
      }
    }
    if (accepted === null) {
      if (sigmaSteps < 0.1) return { covariance: sol.covariance, evaluation: cur };
      throw new OrbitFitError('diverged', `no step along the correction lowers χ² (correction ${sigmaSteps.toPrecision(3)} σ)`, ctx.iterations, cur.chi2, sol.condition);
    }
    const change = cur.chi2 - accepted.ev.chi2;
    p.set(accepted.p);
    const prev = cur;
    cur = accepted.ev;
    if (lambda === 1 && change <= 1e-6 * prev.chi2 && sigmaSteps < 0.1) {
      // Re-solve at the new point for its covariance.
      const fin = solveNormalEquations(cur.pred.design, cur.residuals, w, keptActive, m);
      ctx.condition = fin.condition;
      if (fin.singular) throw new OrbitFitError('singular', `normal matrix singular over ${active.length} observations`, ctx.iterations, cur.chi2, fin.condition);
      return { covariance: fin.covariance, evaluation: cur };
    }
  }
  throw new OrbitFitError('diverged', `no convergence within ${maxIterations} iterations`, ctx.iterations, cur.chi2, ctx.condition);
}

/**
 * The result object over all usable observations, from the evaluations that hold them: the last
 * window's (every observation not excluded) and the record of the excluded ones.
 */
function assemble(observations: readonly AstrometryObservation[], ctx: FitContext, p: Float64Array, kept: readonly boolean[],
  covariance: Float64Array, evaluations: readonly { active: readonly number[]; evaluation: Evaluation }[], label: string): OrbitFit {
  const { prep, m } = ctx;
  const n = prep.index.length;
  const residuals = new Float64Array(2 * n).fill(NaN), chi = new Float64Array(n).fill(NaN);
  for (const { active, evaluation: ev } of evaluations) {
    const s2 = sub(prep.sigma2, active, 3);
    const c = observationChi2(ev.pred.design, ev.residuals, s2, active.map((k) => kept[k]), covariance, m);
    active.forEach((k, a) => { residuals[2 * k] = ev.residuals[2 * a]; residuals[2 * k + 1] = ev.residuals[2 * a + 1]; chi[k] = c[a]; });
  }
  const out: ObservationFit[] = observations.map(() => ({
    status: 'unusable', residualRaCosDecArcsec: NaN, residualDecArcsec: NaN, sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, chi2: NaN,
  }));
  let chi2 = 0, wSum = 0, wr2 = 0, r2 = 0, nKept = 0, nExcluded = 0;
  for (let k = 0; k < n; k++) {
    const sg = prep.sigmas[k];
    const r0 = residuals[2 * k] * ARCSEC_PER_RAD, r1 = residuals[2 * k + 1] * ARCSEC_PER_RAD;
    out[prep.index[k]] = {
      status: prep.excluded[k] ? 'excluded' : kept[k] ? 'kept' : 'rejected', residualRaCosDecArcsec: r0, residualDecArcsec: r1,
      sigmaRaCosDecArcsec: sg.sigmaRaCosDecArcsec, sigmaDecArcsec: sg.sigmaDecArcsec, chi2: chi[k],
    };
    if (prep.excluded[k]) nExcluded++;
    if (!kept[k]) continue;
    nKept++;
    const w = prep.weights;
    const a = residuals[2 * k], b = residuals[2 * k + 1];
    chi2 += a * a * w[3 * k] + 2 * a * b * w[3 * k + 1] + b * b * w[3 * k + 2];
    const w0 = 1 / sg.sigmaRaCosDecArcsec ** 2, w1 = 1 / sg.sigmaDecArcsec ** 2;
    wSum += w0 + w1; wr2 += w0 * r0 * r0 + w1 * r1 * r1; r2 += r0 * r0 + r1 * r1;
  }
  const params = Float64Array.from(ctx.params);
  ctx.solveFor.forEach((q, k) => { params[FIT_PARAMETER_INDEX[q]] = p[6 + k]; });
  return {
    epochJdTDB: ctx.epoch,
    state: Float64Array.from(p.subarray(0, 6)),
    params,
    solveFor: [...ctx.solveFor],
    columns: ['x', 'y', 'z', 'vx', 'vy', 'vz', ...ctx.solveFor],
    covariance,
    elements: elementsWithSigma(p.subarray(0, 6), covariance, m),
    chi2,
    degreesOfFreedom: 2 * nKept - m,
    normalizedRms: Math.sqrt(chi2 / (2 * nKept)),
    weightedRmsArcsec: Math.sqrt(wr2 / wSum),
    rmsArcsec: Math.sqrt(r2 / (2 * nKept)),
    kept: nKept,
    rejected: n - nKept - nExcluded,
    excluded: nExcluded,
    unusable: observations.length - n,
    observations: out,
    iterations: ctx.iterations,
    rejections: ctx.rejections,
    recoveries: ctx.recoveries,
    condition: ctx.condition,
    startedFrom: label,
  };
}
