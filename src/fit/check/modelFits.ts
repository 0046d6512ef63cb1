/**
 * The model fits of `check`: gravity only from the start given, each requested model from the
 * gravity-only solution (its parameters solved for as the model catalogue says, starting at 0),
 * every fit with outlier rejection; then the comparison set (comparisonSet.ts) and every model
 * not already on it refitted there, without rejection, from its own solution. A model whose
 * fit fails is listed as failed and left out of the comparison. When gravity only fails from the
 * start (a strong push can leave it rejecting most of the places it moved until the rest no longer
 * fix the state), the models are fitted from that start instead and gravity only is fitted again
 * from the converged one that rejected the fewest, on the observations that one kept and without
 * rejection of its own (so its χ² there is what gravity alone can do); only when that fails too,
 * or no model converges, does the run fail (OrbitFitError, with its numbers). The fits are asked
 * for in batches of independent ones (checkFitter.ts): here one after another, or on worker
 * threads, with the same result.
 */
import type { ObservationSigma } from '../observationWeights.js';
import { OrbitFitError, type OrbitFit, type OrbitFitStart } from '../orbitFitTypes.js';
import type { FitParameter } from '../trajectoryPartials.js';
import { NONGRAV_MODELS, type NongravModel, type NongravModelId } from '../models/index.js';
import { runStepsHere, runStepsOn, type CheckFitInputs, type CheckFitter, type FitOutcome, type FitSteps } from './checkFitter.js';
import { comparisonSetSource, indicesOutside, keepsExactly, keptMask, setStatistics } from './comparisonSet.js';
import type { CheckModelFailure, CheckModelFit } from './types.js';

export interface ModelFitsInput extends CheckFitInputs {
  start: OrbitFitStart;
  models: readonly Exclude<NongravModelId, 'gravity'>[];
  onProgress?: (message: string) => void;
}

export interface ModelFits {
  fits: CheckModelFit[];
  failures: CheckModelFailure[];
  comparisonSetFrom: NongravModelId;
  /** True per observation when it is in the comparison set. */
  inSet: boolean[];
  /** Set when gravity only failed from the start given and was fitted from a model's solution. */
  gravityRestart: GravityRestart | null;
}

export interface GravityRestart {
  from: NongravModelId;
  /** The failure from the start given. */
  firstFailure: string;
}

/** fitOrbit's options for `model`. */
export function fitOptionsOf(model: NongravModel): { solveFor: FitParameter[]; law: NonNullable<NongravModel['forceOptions']['nonGravLaw']> } {
  return { solveFor: model.params.map((p) => p.name), law: model.forceOptions.nonGravLaw ?? 'comet-water' };
}

/** A start at a fit's solution. */
export function startAt(fit: OrbitFit): OrbitFitStart {
  return { kind: 'state', epochJdTDB: fit.epochJdTDB, state: fit.state };
}

/** Runs the fits (see the file comment), every one on this thread. */
export function runModelFits(input: ModelFitsInput): ModelFits {
  return runStepsHere(modelFitSteps(input), input);
}

/** The same fits, each batch of independent ones on `fitter` (the same result for any number of threads). */
export function runModelFitsOn(input: ModelFitsInput, fitter: CheckFitter): Promise<ModelFits> {
  return runStepsOn(modelFitSteps(input), fitter);
}

type Own = { id: NongravModelId; fit: OrbitFit; nParams: number };

/** The fits as batches: gravity only; the models; the retries; the refits on the comparison set. */
function* modelFitSteps(input: ModelFitsInput): FitSteps<ModelFits> {
  const say = input.onProgress ?? (() => undefined);
  const own: Own[] = [];
  const failures: CheckModelFailure[] = [];
  say(`fitting gravity only (${input.observations.length} observations)`);
  const [g] = yield [{ start: input.start, options: {} }];
  let gravity: OrbitFit;
  let outcomes: FitOutcome[];
  let gravityRestart: GravityRestart | null = null;
  const sayFitting = (suffix: string): void => {
    for (const id of input.models) say(`fitting ${id} (${NONGRAV_MODELS[id].params.map((p) => p.name).join(', ')})${suffix}`);
  };
  if (g.error === undefined) {
    gravity = g.fit;
    say(`gravity only: χ² ${gravity.chi2.toFixed(1)}, ${gravity.kept} kept, ${gravity.rejected} rejected`);
    sayFitting('');
    outcomes = yield input.models.map((id) => ({ start: startAt(gravity), options: fitOptionsOf(NONGRAV_MODELS[id]) }));
  } else {
    say(`gravity only: ${g.error.message}`);
    sayFitting(' from the same start');
    outcomes = yield input.models.map((id) => ({ start: input.start, options: fitOptionsOf(NONGRAV_MODELS[id]) }));
    const converged = input.models.flatMap((id, k) => {
      const o = outcomes[k];
      return o.error === undefined ? [{ id, fit: o.fit, nParams: 6 + NONGRAV_MODELS[id].params.length }] : [];
    });
    if (converged.length === 0) throw g.error;
    // The same rule as the comparison set's: the fit that rejected the fewest.
    const base = converged[comparisonSetSource(converged)];
    say(`fitting gravity only again, from the ${base.id} solution on the observations it kept`);
    const [g2] = yield [{ start: startAt(base.fit), options: { reject: false as const, exclude: indicesOutside(keptMask(base.fit)) } }];
    if (g2.error !== undefined) {
      throw new OrbitFitError(g2.error.reason,
        `gravity only from the start given (${g.error.message}) and from the ${base.id} solution on the observations it kept`,
        g2.error.iterations, g2.error.lastChi2, g2.error.condition);
    }
    gravity = g2.fit;
    gravityRestart = { from: base.id, firstFailure: g.error.message };
    say(`gravity only: χ² ${gravity.chi2.toFixed(1)}, ${gravity.kept} kept, ${gravity.rejected} rejected`);
  }
  own.push({ id: 'gravity', fit: gravity, nParams: 6 });
  input.models.forEach((id, k) => {
    const o = outcomes[k];
    if (o.error !== undefined) {
      failures.push({ id, message: o.error.message });
      say(`${id}: ${o.error.message}`);
      return;
    }
    say(`${id}: χ² ${o.fit.chi2.toFixed(1)}, ${o.fit.kept} kept, ${o.fit.rejected} rejected`);
    own.push({ id, fit: o.fit, nParams: 6 + NONGRAV_MODELS[id].params.length });
  });
  // After a restart the gravity-only fit kept exactly the model's set (rejecting none of its own),
  // so the set is the model's.
  const restartFrom = gravityRestart?.from;
  const sourceOf = (): number => (restartFrom === undefined ? comparisonSetSource(own) : own.findIndex((o) => o.id === restartFrom));
  yield* retryFailures(input, own, failures, say, sourceOf);
  const source = sourceOf();
  const inSet = keptMask(own[source].fit);
  const exclude = indicesOutside(inSet);
  const refit = own.filter((o) => !keepsExactly(o.fit, inSet));
  for (const o of refit) say(`refitting ${o.id} on the comparison set`);
  const refits = yield refit.map((o) => ({
    start: startAt(o.fit), options: { ...fitOptionsOf(NONGRAV_MODELS[o.id]), params: o.fit.params, reject: false as const, exclude },
  }));
  const fits: CheckModelFit[] = [];
  for (const o of own) {
    const k = refit.indexOf(o);
    const r = k < 0 ? { fit: o.fit } : refits[k];
    if (r.error !== undefined) {
      if (o.id === 'gravity') throw r.error;
      failures.push({ id: o.id, message: `on the comparison set: ${r.error.message}` });
      continue;
    }
    fits.push(summarise(o.id, NONGRAV_MODELS[o.id], r.fit, o.fit.rejected, input.sigmas, inSet));
  }
  return { fits, failures, comparisonSetFrom: own[source].id, inSet, gravityRestart };
}

/**
 * A model whose fit from the gravity-only solution failed (that solution may have rejected many
 * observations a non-gravitational force moved) is tried once more from the state of the fit
 * that rejected the fewest (after a gravity restart, the model gravity was fitted from), its own
 * parameters from 0; the failure stays listed when that fails too.
 */
function* retryFailures(input: ModelFitsInput, own: Own[], failures: CheckModelFailure[], say: (message: string) => void,
  sourceOf: () => number): FitSteps<void> {
  const best = own[sourceOf()];
  if (best.id === 'gravity' || failures.length === 0) return;
  const failed = [...failures];
  for (const f of failed) say(`fitting ${f.id} again, from the ${best.id} solution`);
  const outcomes = yield failed.map((f) => ({ start: startAt(best.fit), options: fitOptionsOf(NONGRAV_MODELS[f.id]) }));
  failed.forEach((f, k) => {
    const o = outcomes[k];
    if (o.error !== undefined) {
      f.message = `from the gravity-only solution and from the ${best.id} solution: ${o.error.message}`;
      say(`${f.id}: ${o.error.message}`);
      return;
    }
    say(`${f.id}: χ² ${o.fit.chi2.toFixed(1)}, ${o.fit.kept} kept, ${o.fit.rejected} rejected`);
    own.push({ id: f.id, fit: o.fit, nParams: 6 + NONGRAV_MODELS[f.id].params.length });
    failures.splice(failures.indexOf(f), 1);
  });
  // Keep the order the models were asked for.
  const order = ['gravity', ...input.models];
  own.sort((a, b) => order.indexOf(a.id) - order.indexOf(b.id));
}

function summarise(id: NongravModelId, model: NongravModel, fit: OrbitFit, ownRejected: number,
  sigmas: readonly ObservationSigma[], inSet: readonly boolean[]): CheckModelFit {
  const stats = setStatistics(fit, sigmas, inSet);
  const m = fit.columns.length;
  const params = model.params.map((p, k) => ({
    name: p.name, unit: p.unit, value: fit.params[p.forceIndex], sigma: Math.sqrt(fit.covariance[(6 + k) * m + 6 + k]),
  }));
  const status = fit.observations.map((o, i) => (o.status === 'unusable' ? 'unusable' as const : inSet[i] ? 'kept' as const : 'rejected' as const));
  return {
    id, model, fit, ownRejected, params, chi2: stats.chi2, nResiduals: stats.nResiduals, kept: stats.kept,
    rejected: status.filter((s) => s === 'rejected').length, rmsArcsec: stats.rmsArcsec, weightedRmsArcsec: stats.weightedRmsArcsec, status,
  };
}
