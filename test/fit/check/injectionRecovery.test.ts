// The injection–recovery core (scripts/injection/injectionRecovery.ts) on tiny runs: structure
// and determinism only, not statistics (synthetic data, invented). The binomial σ of a share
// is √(p(1−p)/n) (common practice); erf(1/√2) = 0.6827 (common practice).
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  A2_GRID_AU_PER_DAY2, binomialShare, formatInjectionReport, mergeRuns, NOMINAL_WITHIN_1SIGMA, recordSigmas, runFromJson,
  runInjectionRecovery, runToJson, runTrial, SRP_GRID_M2_PER_KG, summarise, trialSeed,
  type InjectionOptions, type InjectionRun, type TrialResult,
} from '../../../scripts/injection/injectionRecovery.js';
import { readObservatoryCodes } from '../../../src/io/astrometry/index.js';

const CODES = fileURLToPath(new URL('../../fixtures/astrometry/observatory-codes.txt', import.meta.url));

let opts: InjectionOptions;
let first: InjectionRun;

beforeAll(async () => {
  const table = await readObservatoryCodes(CODES);
  const sites = ['F51', 'G96', '703', 'W84'].map((c) => table.sites.get(c)!);
  // Two trials: one radiation-pressure body with a strong push (1e-1 m²/kg) and one gravity-only.
  opts = { trials: 1, seed: 7, kinds: ['srp'], fast: true, sites, siteTable: table.sites, srpGrid: [1e-1] };
  first = runInjectionRecovery(opts);
}, 120_000);

describe('runInjectionRecovery', () => {
  it('gives one trial per value with its observations, stations and the injected model', () => {
    expect(first.trials).toHaveLength(1);
    const t = first.trials[0];
    expect(t.kind).toBe('srp');
    expect(t.injected).toBe(1e-1);
    expect(t.observations).toBeGreaterThanOrEqual(50);
    expect(t.observations).toBeLessThanOrEqual(100);
    expect(new Set(t.stations).size).toBe(t.stations.length);
    expect(t.stations.length).toBeGreaterThanOrEqual(3);
    expect(t.models.map((m) => m.id)).toEqual(['srp']);
    // A push of 0.1 m²/kg over ten years is far above the noise: detected and preferred.
    expect(t.preferred).toBe('srp');
    expect(t.models[0].pValue).toBeLessThan(0.0027);
    expect(t.models[0].value).toBeGreaterThan(0.05);
    const row = first.summary.srp![0];
    expect(row.trials).toBe(1);
    expect(row.detected.k).toBe(1);
    expect(first.summary.srpThreshold).toBe(1e-1);
    expect(first.summary.null).toBeNull();
    expect(first.summary.a2).toBeNull();
  });

  it('is deterministic for the seed, and another seed draws another body', () => {
    const again = runInjectionRecovery(opts);
    expect(again.trials).toEqual(first.trials);
    expect(formatInjectionReport(again)).toBe(formatInjectionReport(first));
    expect(trialSeed(8, 'srp', 0)).not.toBe(trialSeed(7, 'srp', 0));
    expect(trialSeed(7, 'srp', 0)).not.toBe(trialSeed(7, 'srp', 1));
    expect(trialSeed(7, 'null', 0)).not.toBe(trialSeed(7, 'srp', 0));
  }, 120_000);

  it('runs a null trial with the three models and reports it', () => {
    const run = runInjectionRecovery({ ...opts, kinds: ['null'] });
    expect(run.trials).toHaveLength(1);
    expect(run.trials[0].models.map((m) => m.id)).toEqual(['thermal', 'comet', 'srp']);
    expect(run.summary.null!.trials).toBe(1);
    const text = formatInjectionReport(run);
    expect(text).toContain('null trials (gravity-only truth): 1');
    expect(text).toContain('| comet |');
  }, 120_000);

  it('refuses no trials and too few stations', () => {
    expect(() => runInjectionRecovery({ ...opts, trials: 0 })).toThrow(RangeError);
    expect(() => runInjectionRecovery({ ...opts, sites: opts.sites.slice(0, 2) })).toThrow(RangeError);
  });
});

describe('summarise', () => {
  const trial = (injected: number, value: number, sigma: number, pValue: number): TrialResult => ({
    kind: 'a2', index: 0, injected, trialSeed: 0, observations: 100, stations: ['F51', 'G96', '703'], preferred: pValue < 0.0027 ? 'thermal' : 'gravity',
    models: [{ id: 'thermal', pValue, deltaChi2: NaN, value, sigma }], failure: '', gravityChi2PerDof: 1, rejected: 0, alone: null,
  });
  it('counts detections, 1σ recoveries, median pulls and the threshold per value', () => {
    const trials = [
      trial(1e-14, 0.5e-14, 1e-14, 0.5), trial(-1e-14, -3e-14, 1e-14, 0.3), // pulls −0.5, −2
      trial(1e-13, 1.2e-13, 1e-14, 1e-9), trial(-1e-13, -0.95e-13, 1e-14, 1e-9), trial(1e-13, 1.1e-13, 1e-14, 0.01), // pulls 2, 0.5, 1
    ];
    const s = summarise(trials, [1e-14, 1e-13], []);
    expect(s.a2![0].detected.k).toBe(0);
    expect(s.a2![0].within1Sigma.k).toBe(1);
    expect(s.a2![0].medianPull).toBeCloseTo(-1.25, 12);
    expect(s.a2![1].detected).toEqual(binomialShare(2, 3));
    expect(s.a2![1].within1Sigma.k).toBe(2);
    expect(s.a2![1].medianPull).toBeCloseTo(1, 12);
    expect(s.a2Threshold).toBe(1e-13);
    // 0 of 2 at 1e-14, 2 of 3 at 1e-13: 50 % at three quarters of the decade, 10^−13.25.
    expect(s.a2Half).toBeCloseTo(10 ** -13.25, 25);
    expect(Number.isNaN(s.srpHalf)).toBe(true);
    expect(s.srp).toBeNull();
  });
  it('counts null false detections as compareModels gives them and rescaled by χ²/dof', () => {
    // Pr(χ²₁ ≥ 9) = 0.0027 and Pr(χ²₁ ≥ 3.841) = 0.05 (common practice, normal-table values).
    const nullTrial = (d: number, chi2PerDof: number, p: number): TrialResult => ({
      kind: 'null', index: 0, injected: 0, trialSeed: 0, observations: 100, stations: ['F51', 'G96', '703'], preferred: 'gravity', failure: '',
      gravityChi2PerDof: chi2PerDof, rejected: 1, alone: null,
      models: (['thermal', 'comet', 'srp'] as const).map((id) => ({ id, pValue: p, deltaChi2: d, value: 0, sigma: 1 })),
    });
    // Δχ² 3.6 with χ²/dof 0.9 is 4.0 rescaled: p 0.058 as given, 0.046 rescaled (one parameter).
    const s = summarise([nullTrial(3.6, 0.9, 0.0578), nullTrial(0.5, 1, 0.48)], [], []).null!;
    const thermal = s.perModel.find((m) => m.id === 'thermal')!;
    expect(thermal.atLoose.k).toBe(0);
    expect(thermal.atLooseRescaled.k).toBe(1);
    expect(thermal.meanDeltaChi2).toBeCloseTo(2.05, 12);
    expect(thermal.k).toBe(1);
    // The comet model has two parameters: Pr(χ²₂ ≥ 4) = e⁻² = 0.135, not below 0.05.
    expect(s.perModel.find((m) => m.id === 'comet')!.atLooseRescaled.k).toBe(0);
    expect(s.meanChi2PerDof).toBeCloseTo(0.95, 12);
  });
  it('gives the binomial σ and the nominal 1σ share', () => {
    const b = binomialShare(3, 12);
    expect(b.share).toBe(0.25);
    expect(b.sigma).toBeCloseTo(Math.sqrt(0.25 * 0.75 / 12), 15);
    expect(Number.isNaN(binomialShare(0, 0).share)).toBe(true);
    expect(NOMINAL_WITHIN_1SIGMA).toBeCloseTo(0.6827, 4);
  });
});

describe('parts of a run', () => {
  it('merges parts made over trial ranges into the same trials and report as one run, through JSON', () => {
    // Gravity-only bodies with the thermal model only fitted: the cheapest trials.
    const a2: InjectionOptions = { ...opts, kinds: ['a2'], trials: 2, a2Grid: [1e-12] };
    const whole = runInjectionRecovery(a2);
    const parts = [runInjectionRecovery({ ...a2, range: [1, 2] }), runInjectionRecovery({ ...a2, range: [0, 1] })];
    expect(whole.trials.map((t) => t.index)).toEqual([0, 1]);
    expect(parts[0].trials.map((t) => t.index)).toEqual([1]);
    const merged = mergeRuns(parts.map((p) => runFromJson(runToJson(p))));
    expect(merged.trials).toEqual(whole.trials);
    expect(merged.options).toEqual(whole.options);
    expect(formatInjectionReport(merged)).toBe(formatInjectionReport(whole));
    // Parts that overlap, leave a gap or come from another seed are refused.
    expect(() => mergeRuns([parts[0], parts[0]])).toThrow(RangeError);
    expect(() => mergeRuns([parts[0]].concat({ ...parts[1], options: { ...parts[1].options, seed: 8 } }))).toThrow(RangeError);
    expect(() => runInjectionRecovery({ ...a2, range: [1, 3] })).toThrow(RangeError);
  }, 240_000);

  it('keeps NaN through JSON (JSON itself would write null)', () => {
    const t = runFromJson(runToJson({ ...first, trials: [{ ...first.trials[0], gravityChi2PerDof: NaN, alone: { value: NaN, sigma: Infinity } }] }));
    expect(Number.isNaN(t.trials[0].gravityChi2PerDof)).toBe(true);
    expect(t.trials[0].alone!.sigma).toBe(Infinity);
  });
});

describe('weights', () => {
  it('takes the per-night factor out of the σ with record weights', () => {
    const f = Math.sqrt(5 / 4);
    const s = recordSigmas([{ sigmaRaCosDecArcsec: 0.5 * f, sigmaDecArcsec: 0.3 * f, correlation: 0, source: 'record', nightCount: 5, nightFactor: f }]);
    expect(s[0].sigmaRaCosDecArcsec).toBeCloseTo(0.5, 14);
    expect(s[0].sigmaDecArcsec).toBeCloseTo(0.3, 14);
    expect(s[0].nightFactor).toBe(1);
  });

  it('fits with the records\' σ: χ² per degree of freedom rises where nights had the factor', () => {
    const t = first.trials[0];
    const rec = runTrial('srp', 1e-1, t.trialSeed, { ...opts, weights: 'record' });
    expect(rec.observations).toBe(t.observations);
    // σ only shrinks (nights of 5 lose √(5/4)), so χ²/dof grows; synthetic nights hold 2–5 places.
    expect(rec.gravityChi2PerDof).toBeGreaterThan(t.gravityChi2PerDof);
  }, 120_000);
});

describe('grids and failed gravity-only fits', () => {
  it('steps the injected values by half decades over 1e-15 … 1e-12 au/d² and 1e-4 … 1e-1 m²/kg', () => {
    expect(A2_GRID_AU_PER_DAY2).toHaveLength(7);
    expect(SRP_GRID_M2_PER_KG).toHaveLength(7);
    expect(A2_GRID_AU_PER_DAY2[0]).toBe(1e-15);
    expect(A2_GRID_AU_PER_DAY2[6]).toBeCloseTo(1e-12, 25);
    expect(SRP_GRID_M2_PER_KG[3]).toBeCloseTo(Math.sqrt(10) * 1e-3, 15);
    for (let k = 1; k < 7; k++) expect(SRP_GRID_M2_PER_KG[k] / SRP_GRID_M2_PER_KG[k - 1]).toBeCloseTo(Math.sqrt(10), 12);
  });

  it('refits gravity only from the model when it fails from the truth; a trial that fails anyway is left out of the shares', async () => {
    // A body pushed by 0.1 m²/kg on which the gravity-only fit from the truth elements diverges
    // (found by a run with seed 5, all six candidate stations, fast, record weights: trial 13 of
    // srp): gravity only is fitted again from the srp solution (modelFits.ts) and compared.
    const table = await readObservatoryCodes(CODES);
    const six = ['F51', 'G96', '703', 'W84', 'I41', 'Q55'].map((c) => table.sites.get(c)!);
    const t = runTrial('srp', 1e-1, trialSeed(5, 'srp', 13), { ...opts, sites: six, weights: 'record' }, 13);
    expect(t.gravityRestarted).toBe(true);
    expect(t.preferred).toBe('srp');
    expect(t.models[0].pValue).toBeLessThan(0.0027);
    expect(Math.abs(t.models[0].value - 0.1)).toBeLessThan(5 * t.models[0].sigma);
    expect(formatInjectionReport(runFromJson(runToJson({ ...first, trials: [t], summary: summarise([t], [], [1e-1]) }))))
      .toContain("gravity only fitted from the model's solution (it failed from the truth elements): 1 trial");
    // Had it failed from the model's solution too: counted as failed, in no share.
    const failed: TrialResult = {
      ...t, preferred: 'failed', failure: 'orbit fit failed (diverged)', gravityRestarted: false,
      models: [{ id: 'srp', pValue: NaN, deltaChi2: NaN, value: NaN, sigma: NaN }], alone: { value: t.models[0].value, sigma: t.models[0].sigma },
    };
    const row = summarise([failed], [], [1e-1]).srp![0];
    expect(row.failed).toBe(1);
    expect(row.failedModelAlone).toBe(1);
    expect(row.detected.n).toBe(0);
  }, 300_000);
});
