/**
 * The model fits of `check`: gravity only from the start given, each requested model from the
 * gravity-only solution (its parameters solved for as the model catalogue says, starting at 0),
 * every fit with outlier rejection; then the comparison set (comparisonSet.ts) and every model
 * not already on it refitted there, without rejection, from its own solution. A model whose
 * fit fails is listed as failed and left out of the comparison; a failed gravity-only fit
 * fails the run (OrbitFitError, with its numbers).
 */
import type { Ephemeris } from '../../core/types.js';
import type { AstrometryObservation, ObservatorySite } from '../../io/astrometry/types.js';
import { fitOrbit } from '../fitOrbit.js';
import type { ObservationSigma } from '../observationWeights.js';
import { OrbitFitError, type OrbitFit, type OrbitFitStart } from '../orbitFitTypes.js';
import type { FitParameter } from '../trajectoryPartials.js';
import { NONGRAV_MODELS, type NongravModel, type NongravModelId } from '../models/index.js';
import { comparisonSetSource, indicesOutside, keepsExactly, keptMask, setStatistics } from './comparisonSet.js';
import type { CheckModelFailure, CheckModelFit } from './types.js';

export interface ModelFitsInput {
  observations: readonly AstrometryObservation[];
  sites: ReadonlyMap<string, ObservatorySite>;
  sigmas: readonly ObservationSigma[];
  ephemeris: Ephemeris | undefined;
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
}

/** fitOrbit's options for `model`. */
export function fitOptionsOf(model: NongravModel): { solveFor: FitParameter[]; law: NonNullable<NongravModel['forceOptions']['nonGravLaw']> } {
  return { solveFor: model.params.map((p) => p.name), law: model.forceOptions.nonGravLaw ?? 'comet-water' };
}

/** A start at a fit's solution. */
export function startAt(fit: OrbitFit): OrbitFitStart {
  return { kind: 'state', epochJdTDB: fit.epochJdTDB, state: fit.state };
}

/** Runs the fits (see the file comment). */
export function runModelFits(input: ModelFitsInput): ModelFits {
  const { observations, sites, sigmas, ephemeris } = input;
  const say = input.onProgress ?? (() => undefined);
  const own: { id: NongravModelId; fit: OrbitFit; nParams: number }[] = [];
  const failures: CheckModelFailure[] = [];
  say(`fitting gravity only (${observations.length} observations)`);
  const gravity = fitOrbit(observations, sites, input.start, { sigmas, ephemeris });
  say(`gravity only: χ² ${gravity.chi2.toFixed(1)}, ${gravity.kept} kept, ${gravity.rejected} rejected`);
  own.push({ id: 'gravity', fit: gravity, nParams: 6 });
  for (const id of input.models) {
    const model = NONGRAV_MODELS[id];
    say(`fitting ${id} (${model.params.map((p) => p.name).join(', ')})`);
    try {
      const fit = fitOrbit(observations, sites, startAt(gravity), { ...fitOptionsOf(model), sigmas, ephemeris });
      say(`${id}: χ² ${fit.chi2.toFixed(1)}, ${fit.kept} kept, ${fit.rejected} rejected`);
      own.push({ id, fit, nParams: 6 + model.params.length });
    } catch (e) {
      if (!(e instanceof OrbitFitError)) throw e;
      failures.push({ id, message: e.message });
      say(`${id}: ${e.message}`);
    }
  }
  retryFailures(input, own, failures, say);
  const source = comparisonSetSource(own);
  const inSet = keptMask(own[source].fit);
  const outside = indicesOutside(inSet);
  const fits: CheckModelFit[] = [];
  for (const o of own) {
    const model = NONGRAV_MODELS[o.id];
    let fit = o.fit;
    if (!keepsExactly(fit, inSet)) {
      say(`refitting ${o.id} on the comparison set`);
      try {
        fit = fitOrbit(observations, sites, startAt(o.fit), { ...fitOptionsOf(model), params: o.fit.params, sigmas, ephemeris, reject: false, exclude: outside });
      } catch (e) {
        if (!(e instanceof OrbitFitError)) throw e;
        if (o.id === 'gravity') throw e;
        failures.push({ id: o.id, message: `on the comparison set: ${e.message}` });
        continue;
      }
    }
    fits.push(summarise(o.id, model, fit, o.fit.rejected, sigmas, inSet));
  }
  return { fits, failures, comparisonSetFrom: own[source].id, inSet };
}

/**
 * A model whose fit from the gravity-only solution failed (that solution may have rejected many
 * observations a non-gravitational force moved) is tried once more from the state of the fit
 * that rejected the fewest, its own parameters from 0; the failure stays listed when that fails too.
 */
function retryFailures(input: ModelFitsInput, own: { id: NongravModelId; fit: OrbitFit; nParams: number }[],
  failures: CheckModelFailure[], say: (message: string) => void): void {
  const best = own[comparisonSetSource(own)];
  if (best.id === 'gravity') return;
  for (const failed of [...failures]) {
    const model = NONGRAV_MODELS[failed.id];
    say(`fitting ${failed.id} again, from the ${best.id} solution`);
    try {
      const fit = fitOrbit(input.observations, input.sites, startAt(best.fit), { ...fitOptionsOf(model), sigmas: input.sigmas, ephemeris: input.ephemeris });
      say(`${failed.id}: χ² ${fit.chi2.toFixed(1)}, ${fit.kept} kept, ${fit.rejected} rejected`);
      own.push({ id: failed.id, fit, nParams: 6 + model.params.length });
      failures.splice(failures.indexOf(failed), 1);
    } catch (e) {
      if (!(e instanceof OrbitFitError)) throw e;
      failed.message = `from the gravity-only solution and from the ${best.id} solution: ${e.message}`;
      say(`${failed.id}: ${e.message}`);
    }
  }
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
