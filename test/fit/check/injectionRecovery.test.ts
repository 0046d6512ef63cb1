// The injection–recovery core (scripts/injection/injectionRecovery.ts) on tiny runs: structure
// and determinism only, not statistics (synthetic data, invented). The binomial σ of a share
// is √(p(1−p)/n) (common practice); erf(1/√2) = 0.6827 (common practice).
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  binomialShare, formatInjectionReport, NOMINAL_WITHIN_1SIGMA, runInjectionRecovery, summarise, trialSeed,
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
    kind: 'a2', injected, trialSeed: 0, observations: 100, stations: ['F51', 'G96', '703'], preferred: pValue < 0.0027 ? 'thermal' : 'gravity',
    models: [{ id: 'thermal', pValue, value, sigma }], failure: '',
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
    expect(s.srp).toBeNull();
  });
  it('gives the binomial σ and the nominal 1σ share', () => {
    const b = binomialShare(3, 12);
    expect(b.share).toBe(0.25);
    expect(b.sigma).toBeCloseTo(Math.sqrt(0.25 * 0.75 / 12), 15);
    expect(Number.isNaN(binomialShare(0, 0).share)).toBe(true);
    expect(NOMINAL_WITHIN_1SIGMA).toBeCloseTo(0.6827, 4);
  });
});
