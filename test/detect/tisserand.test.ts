import { describe, expect, it } from 'vitest';
import { CatalogueBuilder } from '../../src/clean/catalogueBuilder.js';
import { coorbitalHalfWidth, tisserandDetector, tisserandZone, TISSERAND_DEFAULTS } from '../../src/detect/tisserand.js';
import { RAD_PER_DEG } from '../../src/core/constants.js';
import { asteroidRow, cometRow } from '../clean/rowFactory.js';
import type { OrbitRow } from '../../src/io/types.js';

async function screen(rows: OrbitRow[], overrides: Partial<typeof TISSERAND_DEFAULTS> = {}) {
  const b = new CatalogueBuilder();
  rows.forEach((r, k) => b.add(r, 'synthetic', k + 1, ''));
  const cat = b.finish();
  return tisserandDetector.run(cat, { tisserand: { ...TISSERAND_DEFAULTS, ...overrides } });
}

async function run(rows: OrbitRow[], overrides: Partial<typeof TISSERAND_DEFAULTS> = {}) {
  return (await screen(rows, overrides)).candidates;
}

describe('Tisserand screen (synthetic catalogue of invented bodies)', () => {
  // A background of main-belt asteroids (T_J ≈ 3.2–3.6) and Jupiter-family comets (T_J < 3).
  const background: OrbitRow[] = [];
  for (let k = 0; k < 200; k++) {
    background.push(asteroidRow({ designation: `bg${k}`, aAu: 2.2 + (k % 50) * 0.02, e: 0.05 + (k % 7) * 0.02 }));
  }
  for (let k = 0; k < 40; k++) {
    background.push(cometRow({ designation: `jfc${k}`, qAu: 1.2 + (k % 10) * 0.1, e: 0.65 + (k % 5) * 0.03 }));
  }

  it('raises a comet-like asteroid and an asteroid-like comet, nothing from the background', async () => {
    const aco = asteroidRow({ designation: 'ACO', aAu: 3.4, e: 0.65, iDeg: 12 });
    const mbc = cometRow({ designation: 'MBC', qAu: 2.7, e: 0.12, iDeg: 3 });
    const out = await run([...background, aco, mbc]);
    expect(out.map((c) => [c.designation, c.class])).toEqual([
      ['ACO', 'comet-like-T'],
      ['MBC', 'asteroid-like-T'],
    ]);
    const [a, m] = out;
    expect(a.details.T).toBeLessThan(2.95);
    expect(m.details.T).toBeGreaterThan(3.05);
    expect(a.score).toBeGreaterThan(0);
    // The only asteroid this low in 201 screened asteroids: the plus-one rule over the 200
    // others (Davison & Hinkley 1997, eq. 4.11) gives (1 + 0)/(200 + 1) = 1/201, a rank
    // within this catalogue, and the sentence says so as a count of bodies.
    expect(a.tailFraction).toBeCloseTo(1 / 201, 12);
    expect(a.tailPopulation).toBe(201);
    expect(a.why).toContain('1 of the 201 screened asteroid-catalogue bodies is as far, itself included');
    // The screen states no null model, so it gives no false-alarm probability.
    expect(a.falseAlarmProb).toBeNaN();
    expect(m.tailPopulation).toBe(41);
    expect(a.why).toMatch(/^T_J = 2\.\d{3} on an asteroid-catalogue orbit \(a = 3\.400 au/);
  });

  it('flags bodies inside the ±margin band as boundary cases, ranked below anomalies', async () => {
    // a = 3.9, e = 0.33, i = 5° gives T_J just below 3 (outside the Hilda window: e ≥ 0.3).
    const near = asteroidRow({ designation: 'NEAR', aAu: 3.9, e: 0.33, iDeg: 5 });
    const out = await run([...background, near]);
    expect(out).toHaveLength(1);
    expect(out[0].class).toBe('boundary');
    expect(out[0].boundary).toBe(true);
    expect(out[0].why).toContain('inside the ±0.05 boundary band');
    expect(out[0].flags).toContain('tisserand-boundary');
    expect(out[0].score).toBeLessThan(0);
  });

  it('does not screen Jupiter Trojans, Hildas or bodies beyond Jupiter (unless asked)', async () => {
    const trojan = asteroidRow({ designation: 'TROJAN', aAu: 5.2, e: 0.08, iDeg: 25 });
    const hilda = asteroidRow({ designation: 'HILDA', aAu: 3.97, e: 0.2, iDeg: 8 });
    const centaur = asteroidRow({ designation: 'CENTAUR', aAu: 12, e: 0.55, iDeg: 25, meanAnomalyDeg: 10 });
    expect(await run([...background, trojan, hilda, centaur])).toEqual([]);
    const withExterior = await run([...background, centaur], { includeExterior: true });
    expect(withExterior.map((c) => c.designation)).toEqual(['CENTAUR']);
  });

  it('carries quality flags of poor orbits on every candidate', async () => {
    const poor = asteroidRow({ designation: 'POOR', aAu: 3.0, e: 0.7, iDeg: 30, nOpp: 1, arcDays: 4, nObs: 6, uncertainty: 9 });
    const [c] = await run([...background, poor]);
    expect(c.flags).toEqual(['single-opposition', 'short-arc', 'few-observations', 'poor-uncertainty']);
  });

  it('takes T with respect to another planet on request', async () => {
    // An Earth-crossing body with T_E well below 3 (a = 1.8, e = 0.6, i = 40°).
    const neo = asteroidRow({ designation: 'NEO', aAu: 1.8, e: 0.6, iDeg: 40 });
    const out = await run([neo], { planet: 'earth' });
    expect(out[0].details.planet).toBe('earth');
    expect(out[0].why.startsWith('T_E = ')).toBe(true);
  });

  it('zones: the co-orbital half-width is sqrt(8μ/3) (Murray & Dermott §3.9)', () => {
    // μ_J ≈ 9.54e-4 → ≈ 0.0504 (from memory of Jupiter's mass ratio 1/1047.35).
    expect(coorbitalHalfWidth('jupiter')).toBeCloseTo(Math.sqrt((8 * 9.538e-4) / 3), 4);
    expect(tisserandZone('jupiter', 5.1, 5.1 * 0.5, 0.5, 0)).toBe('crossing');
    expect(tisserandZone('jupiter', 5.1, 5.0, 0.02, 0)).toBe('coorbital');
    expect(tisserandZone('jupiter', 3.97, 3.2, 0.2, 10 * RAD_PER_DEG)).toBe('hilda');
    expect(tisserandZone('jupiter', -3, 1.2, 1.4, 0)).toBe('unbound');
  });

  it('zones: edges of the co-orbital band and the interior/crossing/exterior split by q and Q = a(1 + e)', () => {
    // Half-width from Jupiter's mass ratio μ = 1/(1047.35 + 1) (from memory), not from the code.
    const w = Math.sqrt(8 / (3 * 1048.35));
    const aJ = 5.202887; // Standish & Williams mean a of Jupiter (the project's constant, to 7 digits)
    expect(tisserandZone('jupiter', aJ * (1 + 0.99 * w), aJ * 0.9, 0.1, 0)).toBe('coorbital');
    expect(tisserandZone('jupiter', aJ * (1 - 0.99 * w), aJ * 0.9, 0.1, 0)).toBe('coorbital');
    expect(tisserandZone('jupiter', aJ * (1 + 1.01 * w), aJ * 0.9, 0.1, 0)).toBe('crossing');
    expect(tisserandZone('jupiter', 2.5, 2.25, 0.1, 0)).toBe('interior'); // Q = 2.75 au < aJ
    expect(tisserandZone('jupiter', 4.5, 3.6, 0.2, 0)).toBe('crossing'); // Q = 5.4 au > aJ, outside the Hilda window in a
    expect(tisserandZone('jupiter', 8, 6, 0.25, 0)).toBe('exterior'); // q = 6 au > aJ
  });
});

describe('Tisserand screen: the score, the sentence and the account agree', () => {
  const background: OrbitRow[] = [];
  for (let k = 0; k < 50; k++) background.push(asteroidRow({ designation: `bg${k}`, aAu: 2.3 + k * 0.01, e: 0.1 }));

  it('the why sentence states the score and the distance beyond the boundary it was made from', async () => {
    // T_J of a = 3.4 au, e = 0.65, i = 12° by hand from Murray & Dermott eq. 3.49 with
    // aJ = 5.2028870 au: 5.202887/3.4 + 2 cos 12° sqrt(3.4/5.202887 · (1 − 0.65²)) = 2.6185…
    const tHand = 5.202887 / 3.4 + 2 * Math.cos(12 * RAD_PER_DEG) * Math.sqrt((3.4 / 5.202887) * (1 - 0.65 ** 2));
    const [c] = await run([...background, asteroidRow({ designation: 'ACO', aAu: 3.4, e: 0.65, iDeg: 12 })]);
    expect(c.details.T as number).toBeCloseTo(tHand, 5);
    const m = /is (\d+\.\d{3}) below the 3 boundary, (\d+\.\d{3}) beyond the ±0\.05 boundary band \(the score\)/.exec(c.why);
    expect(m, c.why).not.toBeNull();
    expect(Number(m![1])).toBeCloseTo(3 - tHand, 3);
    expect(Number(m![2])).toBeCloseTo(c.score, 3);
    expect(c.score).toBeCloseTo(3 - tHand - 0.05, 6);
  });

  it('counts every body: screened plus not screened by reason is the catalogue size', async () => {
    const rows = [
      ...background,
      asteroidRow({ designation: 'TROJAN', aAu: 5.2, e: 0.08, iDeg: 25 }),
      asteroidRow({ designation: 'HILDA1', aAu: 3.97, e: 0.2, iDeg: 8 }),
      asteroidRow({ designation: 'HILDA2', aAu: 3.9, e: 0.15, iDeg: 3 }),
      asteroidRow({ designation: 'CENTAUR', aAu: 12, e: 0.55, iDeg: 25, meanAnomalyDeg: 10 }),
      asteroidRow({ designation: 'HYPER', aAu: Number.NaN, qAu: 1.2, e: 1.4, iDeg: 30, meanAnomalyDeg: Number.NaN, tpJdTT: 2_463_100.5 }),
      cometRow({ designation: 'JFC', qAu: 1.3, e: 0.6 }),
    ];
    const r = await screen(rows);
    // Counted from the construction above, not from the detector's zones.
    expect(r.notScreened).toEqual({
      'unbound': 1, 'coorbital-zone': 1, 'hilda-zone': 2, 'perihelion-beyond-planet': 1, 'missing-elements': 0,
    });
    expect(r.screened).toBe(background.length + 1);
    const withExterior = await screen(rows, { includeExterior: true });
    expect(withExterior.notScreened['perihelion-beyond-planet']).toBe(0);
    expect(withExterior.screened).toBe(background.length + 2);
  });
});

describe('Tisserand screen of a parabolic orbit', () => {
  it('counts it as unbound, not screened', async () => {
    const b = new CatalogueBuilder();
    b.add(asteroidRow({ designation: 'PARAB', aAu: Number.NaN, qAu: 2.5, e: 1, iDeg: 20, meanAnomalyDeg: Number.NaN, tpJdTT: 2_463_100.5 }), 'synthetic', 1, '');
    const cat = b.finish();
    const r = await tisserandDetector.run(cat, { tisserand: TISSERAND_DEFAULTS });
    expect(r.candidates).toEqual([]);
    expect(r.screened).toBe(0);
    expect(r.notScreened.unbound).toBe(1);
  });
});
