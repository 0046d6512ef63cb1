// The nongrav detector on a small synthetic catalogue (invented bodies; their astrometry made by
// src/fit/synthetic from our own truths, so the truth is ours, not an outside one): a body pushed
// by radiation pressure (C_R·A/m = 0.03 m²/kg planted), a gravity-only body, a body with too
// few observations and one with none. The check itself is tested against its own truths in
// test/fit/check and test/cli/check.test.ts; here: which bodies become candidates, with what
// class and numbers, and the screening account.
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { elementsRow, type ElementsInput } from '../../scripts/synthetic/elementsRow.js';
import { CatalogueBuilder } from '../../src/clean/catalogueBuilder.js';
import type { Catalogue } from '../../src/clean/types.js';
import { calendarToJd } from '../../src/core/time/julian.js';
import { nongravDetector } from '../../src/detect/nongrav.js';
import { NONGRAV_DEFAULTS, type NongravBody } from '../../src/detect/nongravOptions.js';
import type { DetectorOptions, DetectorResult } from '../../src/detect/types.js';
import { generateSyntheticAstrometry } from '../../src/fit/synthetic/index.js';
import type { SyntheticStation } from '../../src/fit/synthetic/types.js';
import { readObservatoryCodes } from '../../src/io/astrometry/index.js';
import type { ObservatorySite } from '../../src/io/astrometry/types.js';

const CODES = fileURLToPath(new URL('../fixtures/astrometry/observatory-codes.txt', import.meta.url));
const EPOCH_JD_TT = calendarToJd(2032, 5, 10);
const PLANTED_CR_AM = 0.03; // C_R · A/m, m²/kg (C_R = 1)

const ORBITS: ElementsInput[] = [
  { designation: '2031 QA1', aAu: 1.3, e: 0.2, iDeg: 3, nodeDeg: 40, periDeg: 200, meanAnomalyDeg: 220, epochJdTT: EPOCH_JD_TT, H: 28, reference: 'TEST' },
  { designation: '2031 QB1', aAu: 2.4, e: 0.1, iDeg: 6, nodeDeg: 120, periDeg: 30, meanAnomalyDeg: 100, epochJdTT: EPOCH_JD_TT, H: 17, reference: 'TEST' },
  { designation: '2031 QC1', aAu: 2.6, e: 0.15, iDeg: 9, nodeDeg: 10, periDeg: 80, meanAnomalyDeg: 300, epochJdTT: EPOCH_JD_TT, H: 16, reference: 'TEST' },
  { designation: '2031 QD1', aAu: 2.2, e: 0.05, iDeg: 2, nodeDeg: 250, periDeg: 150, meanAnomalyDeg: 10, epochJdTT: EPOCH_JD_TT, H: 18, reference: 'TEST' },
];

let cat: Catalogue;
let sites: ReadonlyMap<string, ObservatorySite>;
let bodies: NongravBody[];

function options(b: readonly NongravBody[] | null): DetectorOptions {
  return { nongrav: { ...NONGRAV_DEFAULTS, bodies: b, sites } } as unknown as DetectorOptions;
}

function account(r: DetectorResult): number {
  return r.screened + Object.values(r.notScreened).reduce((a, b) => a + b, 0);
}

beforeAll(async () => {
  const table = await readObservatoryCodes(CODES);
  sites = table.sites;
  const stations: SyntheticStation[] = ['F51', 'G96', 'W84'].map((code, k) => ({
    site: table.sites.get(code)!, sigmaArcsec: [0.2, 0.3, 0.25][k], note2: 'C', fromJdUtc: -Infinity, toJdUtc: Infinity,
  }));
  const rows = ORBITS.map((o) => elementsRow(o));
  const builder = new CatalogueBuilder();
  rows.forEach((r, k) => builder.add(r.row, 'synthetic.txt', k + 1, ''));
  cat = builder.finish();
  const observe = (k: number, areaToMass: number, count: number, seed: number) => generateSyntheticAstrometry(ORBITS[k].designation, {
    truth: { elements: rows[k].elements, nonGravAuPerDay2: null, nonGravLaw: 'inverse-square', areaToMassM2PerKg: areaToMass, radiationPressureCoefficient: 1, relativity: true },
    stations, startJdUtc: calendarToJd(2026, 5, 10), endJdUtc: calendarToJd(2032, 5, 10), count, seed, outlierRate: 0, outlierArcsec: [3, 20],
  }).observations.map((s, j) => ({ ...s.observation, file: 'synthetic.obs', line: 1000 * k + j + 1 }));
  bodies = [
    { index: 0, observations: observe(0, PLANTED_CR_AM, 80, 11) }, // pushed
    { index: 1, observations: observe(1, 0, 80, 12) }, // gravity only
    { index: 2, observations: observe(2, 0, 40, 13).slice(0, NONGRAV_DEFAULTS.minObservations - 1) }, // too few
    // row 3: no astrometry
  ];
}, 120_000);

describe('nongrav detector (synthetic astrometry)', () => {
  let result: DetectorResult;
  beforeAll(async () => {
    result = await nongravDetector.run(cat, options(bodies), { threads: 1 });
  }, 300_000);

  it('raises the pushed body alone, as srp, with the planted C_R·A/m within 3σ', () => {
    expect(result.candidates.map((c) => [c.designation, c.class])).toEqual([['2031 QA1', 'srp']]);
    const c = result.candidates[0];
    const value = c.details.areaToMass as number, sigma = c.details.areaToMass_sigma as number;
    console.log(`srp body: C_R·A/m = ${value} ± ${sigma} m²/kg, planted ${PLANTED_CR_AM}; Δχ² ${c.score}, p ${c.falseAlarmProb}`);
    expect(Math.abs(value - PLANTED_CR_AM)).toBeLessThan(3 * sigma);
    expect(c.boundary).toBe(false);
    expect(c.score).toBe(c.details.delta_chi2);
    expect(c.score).toBeGreaterThan(0);
    // the p-value of the likelihood-ratio test below check's threshold (compareModels, 0.0027)
    expect(c.falseAlarmProb).toBeLessThan(0.0027);
    expect(c.details.plausibility).toBe('artificial-like');
    expect(c.flags).toContain('nongrav-beyond-natural');
    // two bodies checked; the pushed one has the largest Δχ²: 1 of 2
    expect(c.tailPopulation).toBe(2);
    expect(c.tailFraction).toBe(0.5);
    expect(c.why).toContain(`Δχ² ${c.score.toFixed(1)} against gravity only`);
    expect(c.why).toContain('1 of the 2 bodies checked');
  });

  it('counts every catalogue body once: checked, too few observations, no astrometry', () => {
    expect(result.screened).toBe(2);
    expect(result.notScreened['too-few-observations']).toBe(1);
    expect(result.notScreened['no-astrometry']).toBe(1);
    expect(account(result)).toBe(cat.size);
    expect(result.warnings).toEqual([`2031 QC1: not checked: ${NONGRAV_DEFAULTS.minObservations - 1} usable observations, fewer than ${NONGRAV_DEFAULTS.minObservations}`]);
  });

  it('without astrometry screens nothing and says so for every body', async () => {
    const r = await nongravDetector.run(cat, options(null));
    expect(r.candidates).toEqual([]);
    expect(r.screened).toBe(0);
    expect(r.notScreened['no-astrometry-given']).toBe(cat.size);
    expect(account(r)).toBe(cat.size);
  });

  it('gives the same rows on two worker threads', async () => {
    const r2 = await nongravDetector.run(cat, options(bodies), { threads: 2 });
    expect(r2).toEqual(result);
  }, 300_000);
});
