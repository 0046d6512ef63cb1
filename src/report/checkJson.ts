/**
 * fit.json of `check`: the verdict, the preferred model, every model's parameters with σ,
 * χ², RMS, kept/rejected, and against gravity only Δχ², the likelihood-ratio p-value with its
 * null hypothesis, AIC and BIC; the guards, the plausibility, the elements with σ, and the
 * input's account. No timestamps or run-dependent values: the same input gives the same bytes.
 */
import { DEG_PER_RAD } from '../core/constants.js';
import type { CheckModelFit } from '../fit/check/index.js';
import type { CheckRun } from './checkTypes.js';
import { jsonReplacer } from './checkNumbers.js';

function elementsRecord(f: CheckModelFit): Record<string, unknown> {
  const el = f.fit.elements.elements, s = f.fit.elements.sigmas;
  const names = ['aAu', 'e', 'iDeg', 'nodeDeg', 'periDeg', 'meanAnomalyDeg'];
  const out: Record<string, unknown> = { epochJdTDB: f.fit.epochJdTDB, frame: 'heliocentric J2000 ecliptic (VSOP87)' };
  names.forEach((n, k) => { out[n] = { value: k >= 2 ? el[k] * DEG_PER_RAD : el[k], sigma: k >= 2 ? s[k] * DEG_PER_RAD : s[k] }; });
  return out;
}

function modelRecord(run: CheckRun, f: CheckModelFit): Record<string, unknown> {
  const row = run.result.comparison.rows.find((c) => c.id === f.id)!;
  const params: Record<string, unknown> = {};
  for (const p of f.params) {
    params[p.name] = {
      value: p.value, sigma: p.sigma, unit: p.unit, signalToNoise: Math.abs(p.value) / p.sigma,
      ...(p.name === 'areaToMass' ? { meaning: 'C_R·A/m', assumedCR: run.result.plausibility.srp?.assumedCR ?? 1 } : {}),
    };
  }
  return {
    description: f.model.description, params, chi2: f.chi2, residuals: f.nResiduals, rmsArcsec: f.rmsArcsec, weightedRmsArcsec: f.weightedRmsArcsec,
    kept: f.kept, rejected: f.rejected, ownRejected: f.ownRejected, iterations: f.fit.iterations, condition: f.fit.condition,
    deltaChi2: row.deltaChiSquare, deltaParams: row.deltaParams, pValue: row.pValue, aic: row.aic, bic: row.bic, deltaAic: row.deltaAic, deltaBic: row.deltaBic,
    elements: elementsRecord(f),
  };
}

/** The text of fit.json. */
export function checkJsonText(run: CheckRun): string {
  const r = run.result, a = run.account;
  const models: Record<string, unknown> = {};
  for (const f of r.fits) models[f.id] = modelRecord(run, f);
  for (const x of r.failures) models[x.id] = { failed: x.message };
  const g = r.guards;
  return JSON.stringify({
    tool: 'wayward', command: 'check', designation: r.designation,
    verdict: r.verdict, preferred: r.preferred, preferredRule: r.comparison.rule, preferredReason: r.comparison.reason,
    pValueNullHypothesis: r.comparison.nullHypothesis,
    comparisonSet: { from: r.comparisonSetFrom, rule: r.comparisonSetRule },
    gravityRestart: r.gravityRestart,
    modelsRequested: run.models,
    models,
    guards: {
      model: g.model,
      stationMeans: g.stationMeans,
      runsTest: { raCosDec: g.runsRaCosDec, dec: g.runsDec },
      leaveOneStationOut: g.leaveOneStationOut === null ? null : { watched: g.watchedParameter, ...g.leaveOneStationOut, stationsNotRefitted: g.stationsNotRefitted },
    },
    plausibility: r.plausibility,
    input: {
      file: a.file, format: a.format, linesRead: a.linesRead, observationsRead: a.observationsRead,
      otherDesignations: a.others, observationsFitted: r.observations.length,
      setAside: a.setAside.map((s) => ({ file: s.observation.file, line: s.observation.line, reason: s.reason })),
      unreadable: a.unreadable.map((e) => ({ file: e.file, line: e.line, reason: e.reason })),
      obscodes: a.obscodes === '' ? 'built-in (500 only)' : a.obscodes, start: a.start, absMagH: a.absMagH,
    },
  }, jsonReplacer, 2) + '\n';
}
