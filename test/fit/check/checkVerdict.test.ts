// The verdict sentence (src/fit/check/checkVerdict.ts) from invented fit summaries (synthetic):
// which sentence each outcome gives, with its numbers, and the caveats.
import { describe, expect, it } from 'vitest';
import { checkVerdict } from '../../../src/fit/check/checkVerdict.js';
import type { CheckGuards, CheckModelFit, CheckPlausibility } from '../../../src/fit/check/types.js';
import { areaToMassPlausibility, compareModels, leaveOneStationOut, NONGRAV_MODELS, runsTest, stationMeans } from '../../../src/fit/models/index.js';

function fit(id: 'gravity' | 'srp', chi2: number, params: CheckModelFit['params']): CheckModelFit {
  return { id, model: NONGRAV_MODELS[id], params, chi2, nResiduals: 200, kept: 100, rejected: 0, ownRejected: 0, rmsArcsec: 0.3, weightedRmsArcsec: 0.25, status: [] } as unknown as CheckModelFit;
}

const AM = { name: 'areaToMass', unit: 'm²/kg', value: 0.02, sigma: 0.001 };
const alternating = Array.from({ length: 40 }, (_, i) => (i % 2 === 0 ? 1 : -1));
const fine = stationMeans({ station: ['F51', 'G96'], raCosDecArcsec: [0.1, -0.1], decArcsec: [0.1, -0.1], sigmaRaArcsec: [1, 1], sigmaDecArcsec: [1, 1] });

async function guards(vanishes: boolean, means = fine): Promise<CheckGuards> {
  const loso = await leaveOneStationOut(['F51', 'G96'], { value: AM.value, sigma: AM.sigma },
    (s) => (vanishes && s === 'G96' ? { value: 0.001, sigma: 0.002 } : { value: 0.0201, sigma: 0.0011 }));
  return { model: 'srp', stationMeans: means, runsRaCosDec: runsTest(alternating), runsDec: runsTest(alternating), leaveOneStationOut: loso, watchedParameter: 'areaToMass', stationsNotRefitted: [] };
}

function plausibility(H: number): CheckPlausibility {
  return { thermal: null, srp: { areaToMassM2PerKg: AM.value, sigmaM2PerKg: AM.sigma, assumedCR: 1, judgement: areaToMassPlausibility({ areaToMassM2PerKg: AM.value, absMagH: H }) } };
}

describe('checkVerdict', () => {
  const fits = [fit('gravity', 900, []), fit('srp', 200, [AM])];
  const comparison = compareModels(fits.map((f) => ({ id: f.id, chiSquare: f.chi2, nResiduals: 200, nParams: 6 + f.params.length, params: f.params })));

  it('names radiation pressure with its numbers and, for a small body, the artificial-like signature', async () => {
    const v = checkVerdict({ comparison, fits, guards: await guards(false), plausibility: plausibility(28) });
    expect(v).toBe('Radiation pressure detected: C_R·A/m = 0.0200 ± 0.00100 m²/kg (C_R = 1 assumed), S/N 20.0, far above natural bodies of this size — the signature of a light, hollow, artificial object.');
    const unknown = checkVerdict({ comparison, fits, guards: await guards(false), plausibility: plausibility(NaN) });
    expect(unknown).toMatch(/no absolute magnitude to judge it against natural bodies\.$/);
  });

  it('calls a signal that leaves with one station a probable data artefact, not thrust', async () => {
    const v = checkVerdict({ comparison, fits, guards: await guards(true), plausibility: plausibility(28) });
    expect(v).toBe('The radiation-pressure signal (C_R·A/m = 0.0200 ± 0.00100 m²/kg (C_R = 1 assumed), S/N 20.0) vanishes when station G96 is dropped: a probable data artefact, not thrust.');
  });

  it('adds a caveat for a station whose residuals sit off zero', async () => {
    const biased = stationMeans({ station: Array(30).fill('703'), raCosDecArcsec: Array(30).fill(1), decArcsec: Array(30).fill(1), sigmaRaArcsec: Array(30).fill(1), sigmaDecArcsec: Array(30).fill(1) });
    const v = checkVerdict({ comparison, fits, guards: await guards(false, biased), plausibility: plausibility(28) });
    expect(v).toMatch(/ The residuals of station 703 \(p = .* over all stations\) sit off zero: check that astrometry\.$/);
  });

  it('says no acceleration is needed when gravity is preferred, with the best alternative', async () => {
    const weak = [fit('gravity', 205, []), fit('srp', 200, [{ ...AM, value: 0.002 }])];
    const c = compareModels(weak.map((f) => ({ id: f.id, chiSquare: f.chi2, nResiduals: 200, nParams: 6 + f.params.length, params: f.params })));
    const g = { ...(await guards(false)), model: 'gravity' as const, leaveOneStationOut: null };
    const v = checkVerdict({ comparison: c, fits: weak, guards: g, plausibility: plausibility(28) });
    expect(v).toBe('No non-gravitational acceleration is needed: gravity alone fits 100 observations at a weighted RMS of 0.250″ (χ² 205.0 for 200 residuals); the best alternative, srp, lowers χ² by 5.00 (p = 0.0253, not below the threshold).');
  });
});
