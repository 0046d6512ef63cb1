// The model fits of check (src/fit/check/modelFits.ts) on the demo body's first 164 observations
// (data/demo/check/, synthetic: radiation pressure C_R·A/m = 0.039 m²/kg planted, its README).
// Over these three years gravity only rejects half the places the push moved, and the thermal
// model started from that solution fails; it is tried again from the srp solution (measured:
// that fails too, so it is listed with both failures and left out). Every model compared ends
// on the same observations, the srp fit's kept set. The same fits with their batches on two
// worker threads (checkFitter.ts) must give the same numbers, bit for bit, and the same failures
// with the same messages (an OrbitFitError crosses the thread boundary as its fields).
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { planetaryEphemerisOver } from '../../../src/core/propagate/propagateOrbit.js';
import { startCheckFitter } from '../../../src/fit/check/checkFitter.js';
import { runModelFits, runModelFitsOn, type ModelFits, type ModelFitsInput } from '../../../src/fit/check/modelFits.js';
import { jdTTToTDB } from '../../../src/fit/observerPosition.js';
import { observationSigmas } from '../../../src/fit/observationWeights.js';
import { checkStations, readAstrometryFile, readObservatoryCodes } from '../../../src/io/astrometry/index.js';
import { readOrbitFile } from '../../../src/io/readOrbitFile.js';
import type { OrbitRow } from '../../../src/io/types.js';

const DIR = fileURLToPath(new URL('../../../data/demo/check/', import.meta.url));
const CODES = fileURLToPath(new URL('../../fixtures/astrometry/observatory-codes.txt', import.meta.url));
const RAD = Math.PI / 180;
const LAST_JD_UTC = 2461378.5; // 2026 December 4.0 UTC: the first 164 of the 480

let mf: ModelFits;
let input: ModelFitsInput;
const said: string[] = [];

beforeAll(async () => {
  const table = await readObservatoryCodes(CODES);
  const read = await readAstrometryFile(`${DIR}check-body.obs80.txt`);
  const observations = checkStations(read.observations.filter((o) => o.timeJdUtc < LAST_JD_UTC), table).placed;
  let row: OrbitRow | null = null;
  await readOrbitFile(`${DIR}check-body-elements.txt`, {}, (r) => { row = { ...r }; }, () => undefined);
  const r = row as unknown as OrbitRow;
  const elements = {
    form: 'semimajor' as const, aAu: r.aAu, e: r.e, iRad: r.iDeg * RAD, nodeRad: r.nodeDeg * RAD, periRad: r.periDeg * RAD,
    meanAnomalyRad: r.meanAnomalyDeg * RAD, epochJdTDB: jdTTToTDB(r.epochJdTT),
  };
  const times = observations.map((o) => o.timeJdTT);
  input = {
    observations, sites: table.sites, sigmas: observationSigmas(observations, table.sites),
    ephemeris: planetaryEphemerisOver(Math.min(...times) - 2, elements.epochJdTDB + 2),
    start: { kind: 'elements', elements }, models: ['thermal', 'srp'], onProgress: (m) => said.push(m),
  };
  mf = runModelFits(input);
}, 300_000);

describe('runModelFits', () => {
  it('tries a model again from the best solution when its fit from gravity only fails, and lists it when that fails too', () => {
    console.log(said.join('\n'));
    expect(said).toContain('fitting thermal again, from the srp solution');
    expect(mf.failures.map((f) => f.id)).toEqual(['thermal']);
    expect(mf.failures[0].message).toMatch(/^from the gravity-only solution and from the srp solution: orbit fit failed \(/);
    expect(mf.fits.map((f) => f.id)).toEqual(['gravity', 'srp']);
  });

  it('compares every model on the kept set of the fit that rejected the fewest', () => {
    expect(mf.comparisonSetFrom).toBe('srp');
    const kept = mf.inSet.filter(Boolean).length;
    for (const f of mf.fits) {
      expect(f.kept, f.id).toBe(kept);
      expect(f.nResiduals).toBe(2 * kept);
      f.status.forEach((s, i) => expect(s === 'kept').toBe(mf.inSet[i]));
    }
    const srp = mf.fits.find((f) => f.id === 'srp')!;
    // The srp fit kept this set itself: its χ² over the set is fitOrbit's own (the same sum).
    expect(srp.chi2).toBeCloseTo(srp.fit.chi2, 6);
    expect(srp.ownRejected).toBe(srp.rejected);
  });

  it('gives the same fits, bit for bit, with its batches on two worker threads', async () => {
    // Typed arrays as plain arrays and NaN spelled out, so that the text compares every number exactly.
    const text = (x: ModelFits) => JSON.stringify(x, (_, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array, String) : typeof v === 'number' ? String(v) : v));
    const fitter = startCheckFitter(input, 2);
    expect(fitter.threads).toBe(2);
    try {
      const two = await runModelFitsOn({ ...input, onProgress: undefined }, fitter);
      expect(two.failures).toEqual(mf.failures);
      expect(text(two)).toBe(text(mf));
    } finally {
      await fitter.close();
    }
  }, 300_000);
});
