/**
 * `check`'s computation for one body: its placed observations (after checkStations and
 * selectBody) fitted with gravity only and each requested model, compared (compareModels),
 * the preferred model guarded and the thermal and srp fits judged, and the verdict. No file is
 * read or written here and nothing is printed; progress goes to the callback given. With
 * options.threads > 1 the fits after gravity only run on worker threads (checkFitter.ts), with
 * the same result.
 */
import { planetaryEphemerisOver } from '../../core/propagate/propagateOrbit.js';
import type { AstrometryObservation, ObservatorySite } from '../../io/astrometry/types.js';
import { observationSigmas, type ObservationSigma } from '../observationWeights.js';
import { compareModels, type ModelComparison, type NongravModelId } from '../models/index.js';
import { runGuards } from './checkGuards.js';
import { judgePlausibility } from './checkPlausibility.js';
import { checkVerdict } from './checkVerdict.js';
import { COMPARISON_SET_RULE } from './comparisonSet.js';
import { startCheckFitter } from './checkFitter.js';
import { runModelFitsOn, type ModelFits } from './modelFits.js';
import type { CheckGuards, CheckOptions, CheckResult } from './types.js';

/** Days of planet positions beyond the observations and the start epoch (fitOrbit takes 1). */
const EPHEMERIS_MARGIN_DAYS = 2;

/** Runs the check on `observations` (one body's, each station in `sites` or carrying its own position). */
export async function runCheck(designation: string, observations: readonly AstrometryObservation[],
  sites: ReadonlyMap<string, ObservatorySite>, options: CheckOptions): Promise<CheckResult> {
  if (new Set(options.models).size !== options.models.length) throw new RangeError('runCheck: a model is listed twice');
  const sigmas = observationSigmas(observations, sites);
  const times = observations.map((o) => o.timeJdTT).filter(Number.isFinite);
  if (options.start.kind === 'elements') times.push(options.start.elements.epochJdTDB);
  if (options.start.kind === 'state') times.push(options.start.epochJdTDB);
  const ephemeris = times.length === 0 ? undefined : planetaryEphemerisOver(Math.min(...times) - EPHEMERIS_MARGIN_DAYS, Math.max(...times) + EPHEMERIS_MARGIN_DAYS);
  const inputs = { observations, sites, sigmas, ephemeris };
  const fitter = startCheckFitter(inputs, options.threads ?? 1);
  try {
    const mf = await runModelFitsOn({ ...inputs, start: options.start, models: options.models, onProgress: options.onProgress }, fitter);
    const comparison = compareModels(mf.fits.map((f) => ({ id: f.id, chiSquare: f.chi2, nResiduals: f.nResiduals, nParams: 6 + f.params.length, params: f.params })),
      options.pValueThreshold === undefined ? {} : { pValueThreshold: options.pValueThreshold });
    const preferred = comparison.preferred as NongravModelId;
    const guards = await runGuards({
      ...inputs, preferred: mf.fits.find((f) => f.id === preferred)!, stationMinShare: options.stationMinShare, onProgress: options.onProgress, fitter,
    });
    return assemble(designation, observations, sigmas, mf, comparison, guards, options.absMagH);
  } finally {
    await fitter.close();
  }
}

/** The result from the fits, the comparison and the guards: plausibility and verdict added. */
function assemble(designation: string, observations: readonly AstrometryObservation[], sigmas: readonly ObservationSigma[],
  mf: ModelFits, comparison: ModelComparison, guards: CheckGuards, absMagH: number): CheckResult {
  const preferred = comparison.preferred as NongravModelId;
  const plausibility = judgePlausibility(mf.fits, absMagH);
  const verdict = checkVerdict({ comparison, fits: mf.fits, guards, plausibility });
  return {
    designation, observations: [...observations],
    sigmaRaCosDecArcsec: Float64Array.from(sigmas, (s) => s.sigmaRaCosDecArcsec), sigmaDecArcsec: Float64Array.from(sigmas, (s) => s.sigmaDecArcsec),
    fits: mf.fits, failures: mf.failures, comparisonSetFrom: mf.comparisonSetFrom, comparisonSetRule: COMPARISON_SET_RULE,
    gravityRestart: mf.gravityRestart,
    comparison, preferred, guards, plausibility, verdict,
  };
}
