/**
 * `wayward check` on real astrometry of the numbered asteroid (12893) (test/fixtures/astrometry/README.md
 * says where it comes from): a main-belt asteroid of some kilometres, whose orbit gravity explains
 * to the astrometry's precision (common practice: non-gravitational signals are measurable only for
 * sub-kilometre near-Earth bodies and comets), so the verdict must be gravity, with sub-arcsecond
 * weighted RMS (survey σ 0.2–1.0″, Vereš et al. 2017; from memory). Run twice, on the default two
 * threads and on one: byte-identical outputs (the model fits run as one batch on the threads).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CODES, SAMPLE, fitJson } from './checkFitJson.js';
import { runCli, tempDir, type CliRun } from './cliHarness.js';

describe('check on real astrometry of (12893)', () => {
  const outA = tempDir('wayward-check-real-a-');
  const outB = tempDir('wayward-check-real-b-');
  let a: CliRun, b: CliRun;
  beforeAll(() => {
    a = runCli(['check', '(12893)', '--obs', SAMPLE, '--obscodes', CODES, '--out', outA]);
    b = runCli(['check', '(12893)', '--obs', SAMPLE, '--obscodes', CODES, '--threads', '1', '--out', outB]);
  }, 600_000);

  it('needs no non-gravitational acceleration, at sub-arcsecond weighted RMS', () => {
    expect(a.status, a.stderr).toBe(0);
    const j = fitJson(outA);
    console.log(`(12893): ${j.verdict}`);
    expect(j.preferred).toBe('gravity');
    expect(j.verdict).toMatch(/^No non-gravitational acceleration is needed/);
    expect(j.models.gravity.weightedRmsArcsec).toBeLessThan(1);
    for (const m of ['thermal', 'comet', 'srp']) expect(j.models[m].pValue).toBeGreaterThan(0.0027);
    expect(j.guards.leaveOneStationOut).toBeNull();
    // The time axis of the residual plots in plain years, not grouped thousands ('1,990').
    const svg = readFileSync(join(outA, 'plots', 'residuals-gravity.svg'), 'utf8');
    expect(svg).toMatch(/>(19|20)\d\d</);
    expect(svg).not.toMatch(/>\d,\d{3}</);
  });

  it('writes byte-identical outputs when run again, on one thread', () => {
    expect(b.status).toBe(0);
    expect(b.stdout.replaceAll(outB, outA)).toBe(a.stdout);
    for (const f of ['fit.json', 'residuals.csv', 'plots/residuals-gravity.svg', 'plots/residuals-srp.png']) {
      expect(readFileSync(join(outB, f)).equals(readFileSync(join(outA, f))), f).toBe(true);
    }
  });
});
