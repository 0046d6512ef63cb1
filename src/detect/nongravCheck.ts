/**
 * One body of the `nongrav` detector checked as `wayward check` checks it (runCheck), reduced
 * to the numbers its candidate row needs. The same function runs on the calling thread and in
 * the worker (nongravWorker.ts), so the rows are the same for any number of threads.
 * A failed gravity-only fit (OrbitFitError) is an outcome, not an error: the body is reported
 * as not screened with the fit's message.
 */
import type { OrbitElements } from '../core/propagate/propagateOrbit.js';
import { runCheck } from '../fit/check/index.js';
import type { NongravModelId } from '../fit/models/index.js';
import { OrbitFitError } from '../fit/orbitFitTypes.js';
import type { AstrometryObservation, ObservatorySite } from '../io/astrometry/types.js';

/** What is sent to a worker for one body (structured-cloneable). */
export interface NongravTask {
  designation: string;
  observations: AstrometryObservation[];
  sites: ReadonlyMap<string, ObservatorySite>;
  elements: OrbitElements; // the catalogue row's elements: the gravity-only fit's start
  absMagH: number; // NaN when unknown
  models: readonly Exclude<NongravModelId, 'gravity'>[];
  stationMinShare: number;
}

export interface NongravParam { name: string; unit: string; value: number; sigma: number }

/** The checked body, as its candidate row (nongravCandidate.ts) reads it. */
export interface NongravChecked {
  ok: true;
  observations: number; // fitted
  preferred: NongravModelId;
  deltaChi2: number; // χ²_gravity − χ²_preferred over the comparison set; 0 when gravity is preferred
  tailDeltaChi2: number; // the preferred model's Δχ², or the best alternative's when gravity is preferred (0 with none)
  pValue: number; // likelihood-ratio p-value of the preferred model against gravity only; NaN for gravity
  deltaBic: number; // BIC_preferred − BIC_gravity
  params: NongravParam[]; // the preferred model's
  rmsArcsec: number; // the preferred model's, over the comparison set
  weightedRmsArcsec: number;
  kept: number;
  rejected: number;
  gravityWeightedRmsArcsec: number;
  plausibility: string; // the judgement of the preferred model's parameter: AreaToMassVerdict or DriftPlausibility verdict; '' when none
  driftAuPerMyr: number; // thermal: ⟨da/dt⟩ of the fitted A2; NaN otherwise
  vanishesWithout: string[]; // stations whose removal makes the signal vanish (leave-one-station-out)
  stationsRefitted: string[]; // the stations the leave-one-station-out refits left out, in code order
  verdict: string; // check's verdict sentence
}

export interface NongravFailed {
  ok: false;
  message: string;
}

export type NongravOutcome = NongravChecked | NongravFailed;

/** Runs the check of one body (see the file comment). */
export async function checkNongravBody(task: NongravTask): Promise<NongravOutcome> {
  let r;
  try {
    r = await runCheck(task.designation, task.observations, task.sites, {
      models: task.models, start: { kind: 'elements', elements: task.elements }, absMagH: task.absMagH, stationMinShare: task.stationMinShare,
    });
  } catch (err) {
    if (err instanceof OrbitFitError) return { ok: false, message: `the gravity-only orbit fit failed: ${err.message}` };
    throw err;
  }
  const rows = r.comparison.rows;
  const row = rows.find((x) => x.id === r.preferred)!;
  const alternatives = rows.filter((x) => x.id !== 'gravity');
  const best = alternatives.reduce((m, x) => Math.max(m, x.deltaChiSquare), 0);
  const fit = r.fits.find((f) => f.id === r.preferred)!;
  const gravity = r.fits.find((f) => f.id === 'gravity')!;
  const loso = r.guards.leaveOneStationOut;
  let plausibility = '';
  let drift = NaN;
  if (r.preferred === 'srp' && r.plausibility.srp) plausibility = r.plausibility.srp.judgement.verdict;
  if (r.preferred === 'thermal' && r.plausibility.thermal) {
    plausibility = r.plausibility.thermal.judgement.verdict;
    drift = r.plausibility.thermal.driftAuPerMyr;
  }
  return {
    ok: true, observations: r.observations.length, preferred: r.preferred,
    deltaChi2: r.preferred === 'gravity' ? 0 : row.deltaChiSquare,
    tailDeltaChi2: r.preferred === 'gravity' ? best : row.deltaChiSquare,
    pValue: r.preferred === 'gravity' ? NaN : row.pValue, deltaBic: row.deltaBic,
    params: fit.params.map((p) => ({ name: p.name, unit: p.unit, value: p.value, sigma: p.sigma })),
    rmsArcsec: fit.rmsArcsec, weightedRmsArcsec: fit.weightedRmsArcsec, kept: fit.kept, rejected: fit.rejected,
    gravityWeightedRmsArcsec: gravity.weightedRmsArcsec, plausibility, driftAuPerMyr: drift,
    vanishesWithout: loso ? [...loso.vanishesWithout] : [], stationsRefitted: loso ? loso.drops.map((d) => d.station) : [],
    verdict: r.verdict,
  };
}
