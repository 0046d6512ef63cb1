/**
 * The artefact guards on the preferred model's comparison residuals: residual means per
 * station, the runs test on the signs in time order (α cos δ and δ separately), and, for a
 * non-gravitational model, the leave-one-station-out refits (src/fit/models/). A refit excludes
 * one station's observations (fitOrbit's `exclude`) and fits the same model again from the full
 * solution, with outlier rejection; the parameter watched is the model's one with the largest S/N. Only
 * stations holding at least `stationMinShare` of the fitted observations are refitted (each
 * refit costs a whole fit; a station with a few observations cannot carry the signal alone).
 */
import type { Ephemeris } from '../../core/types.js';
import type { AstrometryObservation, ObservatorySite } from '../../io/astrometry/types.js';
import type { ObservationSigma } from '../observationWeights.js';
import { FIT_PARAMETER_INDEX, type FitParameter } from '../trajectoryPartials.js';
import { leaveOneStationOut, runsTest, stationMeans, type ParameterEstimate } from '../models/index.js';
import { fitHere, type CheckFitter, type FitRequest } from './checkFitter.js';
import { fitOptionsOf, startAt } from './modelFits.js';
import type { CheckGuards, CheckModelFit } from './types.js';

export interface GuardsInput {
  preferred: CheckModelFit;
  observations: readonly AstrometryObservation[];
  sites: ReadonlyMap<string, ObservatorySite>;
  sigmas: readonly ObservationSigma[];
  ephemeris: Ephemeris | undefined;
  stationMinShare: number;
  onProgress?: (message: string) => void;
  /** Where the leave-one-station-out refits run (checkFitter.ts); default here, one after another. */
  fitter?: CheckFitter;
}

/** Indices of the kept observations in time order (ties: input order). */
function keptInTimeOrder(fit: CheckModelFit, observations: readonly AstrometryObservation[]): number[] {
  const idx: number[] = [];
  fit.status.forEach((s, i) => { if (s === 'kept') idx.push(i); });
  return idx.sort((a, b) => observations[a].timeJdUtc - observations[b].timeJdUtc || a - b);
}

/** The stations to refit without, in code order, and the ones too small to. */
export function stationsToDrop(observations: readonly AstrometryObservation[], minShare: number): { drop: string[]; small: string[] } {
  if (!(minShare >= 0 && minShare <= 1)) throw new RangeError(`stationsToDrop: share must be in [0, 1], got ${minShare}`);
  const count = new Map<string, number>();
  for (const o of observations) count.set(o.station, (count.get(o.station) ?? 0) + 1);
  const codes = [...count.keys()].sort();
  const drop = codes.filter((c) => count.get(c)! >= minShare * observations.length);
  return { drop, small: codes.filter((c) => !drop.includes(c)) };
}

/** Runs the guards (see the file comment). */
export async function runGuards(input: GuardsInput): Promise<CheckGuards> {
  const { preferred: p, observations, sites, sigmas, ephemeris } = input;
  const order = keptInTimeOrder(p, observations);
  const res = p.fit.observations;
  const means = stationMeans({
    station: order.map((i) => observations[i].station),
    raCosDecArcsec: order.map((i) => res[i].residualRaCosDecArcsec),
    decArcsec: order.map((i) => res[i].residualDecArcsec),
    sigmaRaArcsec: order.map((i) => sigmas[i].sigmaRaCosDecArcsec),
    sigmaDecArcsec: order.map((i) => sigmas[i].sigmaDecArcsec),
  });
  const runsRaCosDec = runsTest(order.map((i) => res[i].residualRaCosDecArcsec));
  const runsDec = runsTest(order.map((i) => res[i].residualDecArcsec));
  const { drop, small } = stationsToDrop(observations, input.stationMinShare);
  if (p.params.length === 0) {
    return { model: p.id, stationMeans: means, runsRaCosDec, runsDec, leaveOneStationOut: null, watchedParameter: '', stationsNotRefitted: [...drop, ...small].sort() };
  }
  const k = p.params.reduce((best, q, j) => (Math.abs(q.value) / q.sigma > Math.abs(p.params[best].value) / p.params[best].sigma ? j : best), 0);
  const watched = p.params[k];
  const refit = await refitsWithout(input, drop, watched.name as FitParameter, k);
  const loso = await leaveOneStationOut(drop, { value: watched.value, sigma: watched.sigma }, refit);
  return { model: p.id, stationMeans: means, runsRaCosDec, runsDec, leaveOneStationOut: loso, watchedParameter: watched.name, stationsNotRefitted: small };
}

/**
 * The leave-one-station-out refits of the preferred model, one per station of `drop`: asked for
 * at once (they are independent; on the fitter's threads when there is one), then served to
 * leaveOneStationOut in its order as the watched parameter (column 6 + k) with its σ.
 */
async function refitsWithout(input: GuardsInput, drop: readonly string[], watched: FitParameter, k: number): Promise<(station: string) => ParameterEstimate> {
  const { preferred: p, observations } = input;
  const options = fitOptionsOf(p.model);
  const requests: FitRequest[] = drop.map((station) => {
    const without: number[] = [];
    observations.forEach((o, i) => { if (o.station === station) without.push(i); });
    input.onProgress?.(`leave-one-station-out: refitting ${p.id} without ${station} (${observations.length - without.length} observations)`);
    return { start: startAt(p.fit), options: { ...options, params: p.fit.params, exclude: without } };
  });
  const outcomes = input.fitter === undefined ? requests.map((r) => fitHere(input, r)) : await input.fitter.fitAll(requests);
  return (station) => {
    const o = outcomes[drop.indexOf(station)];
    if (o.error !== undefined) throw o.error;
    const m = o.fit.columns.length;
    return { value: o.fit.params[FIT_PARAMETER_INDEX[watched]], sigma: Math.sqrt(o.fit.covariance[(6 + k) * m + 6 + k]) };
  };
}
