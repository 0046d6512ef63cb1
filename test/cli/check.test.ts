/**
 * `wayward check` end to end, the built program run as a user would.
 * - The demo body (data/demo/check/, a synthetic test: the truth is our own, stated in its
 *   README): 2030 QW12 pushed by radiation pressure, C_R·A/m = 0.039 m²/kg planted. The check
 *   must prefer srp, recover the planted value within 3σ and call the body artificial-like, from
 *   the 80-column and the ADES PSV file alike. The demo's dates run to 2032, so --not-after
 *   moves the latest accepted date past them.
 * The PSV run is repeated on one thread (the others run on the default two): the leave-one-station-out
 * refits then run here instead of on worker threads, and every output must be byte-identical.
 * The real astrometry and the bad-input cases: checkReal.test.ts, checkBadInput.test.ts.
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CODES, DEMO, fitJson } from './checkFitJson.js';
import { runCli, tempDir, type CliRun } from './cliHarness.js';

const PLANTED_CR_AM = 0.039; // C_R · A/m, m²/kg (data/demo/check/README.md)

describe('check on the demo body (synthetic: radiation pressure planted)', () => {
  const out80 = tempDir('wayward-check-80-');
  const outPsv = tempDir('wayward-check-psv-');
  const outPsv1 = tempDir('wayward-check-psv-1-');
  let run80: CliRun, runPsv: CliRun, runPsv1: CliRun;
  beforeAll(() => {
    const common = ['--obscodes', CODES, '--elements', `${DEMO}/check-body-elements.txt`, '--not-after', '2033-01-01'];
    run80 = runCli(['check', '2030 QW12', '--obs', `${DEMO}/check-body.obs80.txt`, ...common, '--out', out80]);
    // The PSV file with srp alone: the same verdict, at half the run time.
    runPsv = runCli(['check', '2030 QW12', '--obs', `${DEMO}/check-body.psv`, ...common, '--models', 'srp', '--out', outPsv]);
    runPsv1 = runCli(['check', '2030 QW12', '--obs', `${DEMO}/check-body.psv`, ...common, '--models', 'srp', '--threads', '1', '--out', outPsv1]);
  }, 600_000);

  it('prefers srp and recovers the planted C_R·A/m within 3σ, from either format', () => {
    expect(run80.status, run80.stderr).toBe(0);
    expect(runPsv.status, runPsv.stderr).toBe(0);
    for (const [name, dir] of [['80-column', out80], ['ADES PSV', outPsv]] as const) {
      const j = fitJson(dir);
      const am = j.models.srp.params.areaToMass;
      console.log(`${name}: C_R·A/m = ${am.value} ± ${am.sigma} m²/kg, ${((am.value - PLANTED_CR_AM) / am.sigma).toFixed(2)} σ from the planted ${PLANTED_CR_AM}; `
        + `gravity χ² ${j.models.gravity.chi2.toFixed(1)}, srp χ² ${j.models.srp.chi2.toFixed(1)}, wRMS ${j.models.srp.weightedRmsArcsec.toFixed(3)}″`);
      expect(j.preferred).toBe('srp');
      expect(Math.abs(am.value - PLANTED_CR_AM)).toBeLessThan(3 * am.sigma);
      expect(am.assumedCR).toBe(1);
      expect(j.plausibility.srp?.judgement.verdict).toBe('artificial-like');
      expect(j.verdict).toMatch(/^Radiation pressure detected: C_R·A\/m = 0\.03\d+ ± .* m²\/kg .*S\/N \d+\.\d.*light, hollow, artificial object/);
      expect(j.verdict).not.toMatch(/discover/i);
      expect(j.input.observationsFitted).toBe(480);
    }
    expect(run80.stdout.split('\n')[0]).toBe(fitJson(out80).verdict);
    // A p-value below the double range (Δχ² ≈ 5·10⁴) is shown as a bound, never as 0.
    expect(run80.stdout).toMatch(/\nsrp \* .* < 1e-300 /);
  });

  it('fits every model, compares them on the same observations and guards the preferred one', () => {
    const j = fitJson(out80);
    expect(Object.keys(j.models)).toEqual(['gravity', 'thermal', 'comet', 'srp']);
    const kept = Object.values(j.models).map((m) => m.kept);
    expect(new Set(kept).size).toBe(1);
    expect(j.models.srp.pValue).toBeLessThan(0.0027);
    expect(j.models.srp.deltaBic).toBeLessThan(0);
    expect(j.pValueNullHypothesis).toContain('gravity only');
    // Gravity only converged from the elements row: no restart from a model's solution.
    expect(j.gravityRestart).toBeNull();
    // Four stations, each with ≥ 5 % of the 480 (data/demo/check/README.md): four refits, the signal stays.
    expect(j.guards.leaveOneStationOut?.drops.map((d) => d.station)).toEqual(['703', 'F51', 'G96', 'W84']);
    expect(j.guards.leaveOneStationOut?.drops.every((d) => d.verdict === 'persists')).toBe(true);
    const csv = readFileSync(join(out80, 'residuals.csv'), 'utf8').trim().split('\n');
    expect(csv[0]).toBe('file,line,time_utc,station,model,status,reason,oc_ra_cosdec_arcsec,oc_dec_arcsec,sigma_ra_cosdec_arcsec,sigma_dec_arcsec,chi2');
    expect(csv.length - 1).toBe(480 * 4); // one row per observation and model
    // The planted outliers (outlier = 1 in the demo's per-observation truth) are among those set aside.
    const truth = readFileSync(`${DEMO}/check-body-observations.csv`, 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
    const planted = truth.filter((r) => r[10] === '1').map((r) => Number(r[0]));
    const rejected = csv.slice(1).map((l) => l.split(',')).filter((r) => r[4] === 'srp' && r[5] === 'rejected').map((r) => Number(r[1]));
    expect(planted.length).toBe(3);
    for (const line of planted) expect(rejected).toContain(line);
    for (const m of ['gravity', 'thermal', 'comet', 'srp']) {
      for (const ext of ['svg', 'png']) expect(existsSync(join(out80, 'plots', `residuals-${m}.${ext}`))).toBe(true);
    }
  });

  it('writes byte-identical outputs on one thread and on two', () => {
    expect(runPsv1.status, runPsv1.stderr).toBe(0);
    expect(fitJson(outPsv).guards.leaveOneStationOut?.drops.length).toBe(4);
    expect(runPsv1.stdout.replaceAll(outPsv1, outPsv)).toBe(runPsv.stdout);
    for (const f of ['fit.json', 'residuals.csv', 'plots/residuals-gravity.svg', 'plots/residuals-srp.svg', 'plots/residuals-srp.png']) {
      expect(readFileSync(join(outPsv1, f)).equals(readFileSync(join(outPsv, f))), f).toBe(true);
    }
  });
});
