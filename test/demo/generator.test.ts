/**
 * The demo catalogue generator: deterministic for a seed, every line it writes re-read by
 * the project's own parsers and validity rules, planted Tisserand cases on their side of the
 * thresholds after rounding, the natural population kept honest, the planets' osculating
 * orbits it places co-orbitals against checked against an outside library, the φ it records
 * being the detector's, and the committed demo's co-orbital truth (every kind present, a
 * subset integrated again).
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as planetposition from 'astronomia/planetposition';
import vsop87Bearth from 'astronomia/data/vsop87Bearth';
import vsop87Bmars from 'astronomia/data/vsop87Bmars';
import vsop87Bjupiter from 'astronomia/data/vsop87Bjupiter';
import vsop87Bneptune from 'astronomia/data/vsop87Bneptune';
import { parse } from 'csv-parse/sync';
import { DEFAULT_VALIDITY, invalidReason } from '../../src/clean/index.js';
import { PLANET_MEAN_A_AU, RAD_PER_DEG } from '../../src/core/constants.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { defaultZoneHalfWidth, screenCoorbitalZone } from '../../src/detect/coorbitalZone.js';
import { InputError, parseCometExportLine, parseOrbitExportLine } from '../../src/io/index.js';
import { emptyOrbitRow, type OrbitRow } from '../../src/io/types.js';
import { generateDemo, type DemoResult } from '../../scripts/demo/generate.js';
import { CoorbitalJudge } from '../../scripts/demo/coorbitalTruth.js';
import { demoEpochJdTDB, demoPlanetOrbits, SCENARIO_PLANETS, type ScenarioPlanet } from '../../scripts/demo/planets.js';
import { emptyElements } from '../../scripts/demo/types.js';
import { tisserandJupiter } from '../../scripts/demo/tisserand.js';

const SEED = 4242;
const SMALL = { bodies: 2000, comets: 60 };
const FILES = ['orbits.txt', 'comets.txt', 'truth.csv', 'families-truth.csv', 'coorbital-truth.csv', 'README.md'];
const ROOT = join(import.meta.dirname, '../..');

/**
 * Tisserand parameter w.r.t. Jupiter written out again here, independent of the generator
 * and of src/detect: T_J = a_J/a + 2 cos i sqrt((a/a_J)(1 − e²)), Murray & Dermott 1999 §3.4.
 */
function tj(aAu: number, e: number, iDeg: number): number {
  const aJ = PLANET_MEAN_A_AU.jupiter;
  return aJ / aAu + 2 * Math.cos(iDeg * RAD_PER_DEG) * Math.sqrt((aAu / aJ) * (1 - e * e));
}

interface ReadBack {
  row: OrbitRow | null; // null when rejected
  reason: string; // why rejected
  line: number;
}

/** Re-reads a demo file with the project's line parser and validity rules. */
function readBack(path: string, kind: 'orbit' | 'comet'): ReadBack[] {
  const lines = readFileSync(path, 'latin1').split('\n');
  if (lines[lines.length - 1] === '') lines.pop();
  let start = 0;
  if (kind === 'orbit') {
    start = lines.findIndex((l) => /^-{5,}\s*$/.test(l)) + 1; // header block ends at the dashed line
    expect(start).toBeGreaterThan(0);
  }
  const out: ReadBack[] = [];
  for (let k = start; k < lines.length; k++) {
    const row = emptyOrbitRow();
    try {
      const outcome = kind === 'orbit' ? parseOrbitExportLine(lines[k], row, path, k + 1) : parseCometExportLine(lines[k], row, path, k + 1);
      if (outcome === 'skip') continue;
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      out.push({ row: null, reason: err.reason, line: k + 1 });
      continue;
    }
    const invalid = invalidReason(row, DEFAULT_VALIDITY);
    out.push({ row: invalid === null ? row : null, reason: invalid ?? '', line: k + 1 });
  }
  return out;
}

let dirA = '';
let dirB = '';
let dirC = '';
let result: DemoResult;

// The co-orbital plants are judged by N-body only in the committed demo (minutes of work);
// here the generator runs without that judge, and a subset of the committed demo is
// integrated again below.
beforeAll(async () => {
  dirA = mkdtempSync(join(tmpdir(), 'wayward-demo-a-'));
  dirB = mkdtempSync(join(tmpdir(), 'wayward-demo-b-'));
  dirC = mkdtempSync(join(tmpdir(), 'wayward-demo-c-'));
  result = await generateDemo({ seed: SEED, outDir: dirA, ...SMALL, integrate: false });
  await generateDemo({ seed: SEED, outDir: dirB, ...SMALL, integrate: false });
  await generateDemo({ seed: SEED + 1, outDir: dirC, ...SMALL, integrate: false });
});

afterAll(() => {
  for (const d of [dirA, dirB, dirC]) if (d) rmSync(d, { recursive: true, force: true });
});

// Determinism is a property of the generator itself (no outside source needed).
describe('determinism', () => {
  it('gives byte-identical files for the same seed', () => {
    for (const f of FILES.filter((x) => x !== 'README.md')) {
      expect(readFileSync(join(dirB, f)).equals(readFileSync(join(dirA, f))), f).toBe(true);
    }
    // README.md names its output directory in the regenerate command; otherwise identical
    const readme = (d: string): string => readFileSync(join(d, 'README.md'), 'utf8').replaceAll(d, 'OUT');
    expect(readme(dirB)).toBe(readme(dirA));
    expect(readme(dirA)).toContain(`--seed ${SEED} --out OUT --bodies ${SMALL.bodies} --comets ${SMALL.comets}`);
  });
  it('gives different files for a different seed', () => {
    for (const f of ['orbits.txt', 'comets.txt', 'truth.csv', 'families-truth.csv', 'coorbital-truth.csv']) {
      expect(readFileSync(join(dirC, f)).equals(readFileSync(join(dirA, f))), f).toBe(false);
    }
  });
});

// The project's own readers (src/io) and validity rules (src/clean) are the judges here; the
// planted bad rows are the only lines they may reject (reasons printed).
describe('every written line is re-read by the project parsers', () => {
  it('orbit file: rows + rejects = data lines, and the rejects are exactly the planted bad rows', () => {
    const back = readBack(join(dirA, 'orbits.txt'), 'orbit');
    const bad = new Set(result.truth.filter((t) => t.file === 'orbits.txt' && t.plantedClass === 'bad-row').map((t) => t.line));
    expect(bad.size).toBe(8);
    const rejected = back.filter((b) => b.row === null);
    for (const r of rejected) expect(bad.has(r.line), `line ${r.line} rejected: ${r.reason}`).toBe(true);
    expect(rejected.length).toBe(bad.size);
    // natural rows + planted + bad + duplicates: every line written as data comes back
    const planted = result.truth.filter((t) => t.file === 'orbits.txt').length;
    expect(back.length).toBe(SMALL.bodies + planted);
    console.log(`orbit file: ${back.length} data lines, ${back.length - rejected.length} read, ${rejected.length} rejected: ` +
      rejected.map((r) => r.reason).join(' | '));
  });

  it('comet file: every line is read and valid', () => {
    const back = readBack(join(dirA, 'comets.txt'), 'comet');
    const planted = result.truth.filter((t) => t.file === 'comets.txt').length;
    expect(back.length).toBe(SMALL.comets + planted);
    for (const b of back) expect(b.row, `comet line ${b.line}: ${b.reason}`).not.toBeNull();
  });

  it('truth.csv designations are the designations read back at the listed lines', () => {
    const orbits = new Map(readBack(join(dirA, 'orbits.txt'), 'orbit').map((b) => [b.line, b]));
    const comets = new Map(readBack(join(dirA, 'comets.txt'), 'comet').map((b) => [b.line, b]));
    for (const t of result.truth) {
      if (t.plantedClass === 'bad-row') continue;
      const b = (t.file === 'orbits.txt' ? orbits : comets).get(t.line);
      expect(b?.row?.designation, `${t.file}:${t.line}`).toBe(t.designation);
    }
  });

  it('families-truth.csv designations are the designations read back at the listed lines, each body once', () => {
    const orbits = new Map(readBack(join(dirA, 'orbits.txt'), 'orbit').map((b) => [b.line, b]));
    const rows = parse(readFileSync(join(dirA, 'families-truth.csv')), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(result.familiesTruthRows);
    expect(new Set(rows.map((r) => r.designation)).size).toBe(rows.length);
    for (const r of rows) expect(orbits.get(Number(r.line))?.row?.designation, `orbits.txt:${r.line}`).toBe(r.designation);
    // the isolated bodies are the truth.csv rows of class family-outlier, at the same lines
    const outliers = result.truth.filter((t) => t.plantedClass === 'family-outlier').map((t) => `${t.designation}:${t.line}`).sort();
    expect(rows.filter((r) => r.role === 'outlier').map((r) => `${r.designation}:${r.line}`).sort()).toEqual(outliers);
    expect(outliers.length).toBe(result.outliers.length);
  });
});

describe('Tisserand parameter', () => {
  it('the generator\'s own T_J matches published values for 2P/Encke (3.026) and 67P (2.744)', () => {
    // Same sources as test/core/tisserand.test.ts: Encke's elements and T_J 3.026 from the
    // article "Comet Encke" (copy at piglix.com, epoch 2006-09-22); 67P's a, e, i from the JPL
    // Horizons output of epoch 2015-10-10 (rounded here), T_J 2.744 as quoted in
    // /work/shared/data/README.md (original source not named there). Tolerance 0.005: the
    // rounding of the elements and Jupiter's a, which the sources do not state.
    expect(Math.abs(tisserandJupiter(2.2178, 0.8471, 11.76) - 3.026)).toBeLessThan(0.005);
    expect(Math.abs(tisserandJupiter(3.46225, 0.64091, 7.0403) - 2.744)).toBeLessThan(0.005);
    expect(Math.abs(tj(2.2178, 0.8471, 11.76) - tisserandJupiter(2.2178, 0.8471, 11.76))).toBeLessThan(1e-12);
  });

  it('planted cases stay on their side of the thresholds when recomputed from the written elements', () => {
    const orbits = new Map(readBack(join(dirA, 'orbits.txt'), 'orbit').map((b) => [b.line, b.row]));
    const comets = new Map(readBack(join(dirA, 'comets.txt'), 'comet').map((b) => [b.line, b.row]));
    let worstCometLike = -Infinity;
    let worstAsteroidLike = Infinity;
    let worstBoundary = 0;
    const counts: Record<string, number> = {};
    for (const t of result.truth) {
      if (t.detector !== 'tisserand') continue;
      const row = (t.file === 'orbits.txt' ? orbits : comets).get(t.line);
      expect(row, `${t.file}:${t.line}`).toBeTruthy();
      if (!row) continue;
      const a = t.file === 'comets.txt' ? row.qAu / (1 - row.e) : row.aAu;
      const T = tj(a, row.e, row.iDeg);
      expect(Math.abs(T - t.tisserandJ)).toBeLessThan(5e-5); // truth.csv prints 4 decimals
      const key = `${t.file} ${t.plantedClass}`;
      counts[key] = (counts[key] ?? 0) + 1;
      if (t.plantedClass === 'comet-like-T') {
        expect(T).toBeLessThanOrEqual(2.9);
        expect(a).toBeLessThan(4.8);
        expect(a >= 5.05 && a <= 5.35).toBe(false);
        expect(a >= 3.7 && a <= 4.2 && row.e < 0.3).toBe(false);
        worstCometLike = Math.max(worstCometLike, T);
      } else if (t.plantedClass === 'asteroid-like-T') {
        expect(T).toBeGreaterThanOrEqual(3.15);
        expect(a).toBeLessThan(4.5);
        worstAsteroidLike = Math.min(worstAsteroidLike, T);
      } else {
        // boundary band: within 0.05 of 3 on the catalogue's wrong side (a screen flags that side)
        expect(t.plantedClass).toBe('boundary');
        expect(Math.abs(T - 3)).toBeLessThanOrEqual(0.05);
        expect(t.file === 'orbits.txt' ? T < 3 : T > 3).toBe(true);
        worstBoundary = Math.max(worstBoundary, Math.abs(T - 3));
      }
    }
    expect(counts['orbits.txt comet-like-T']).toBe(25);
    expect(counts['comets.txt asteroid-like-T']).toBe(10);
    expect(counts['orbits.txt boundary'] + counts['comets.txt boundary']).toBeGreaterThanOrEqual(3);
    expect(result.truth.filter((t) => t.plantedClass === 'comet-like-T' && /poor orbit/.test(t.note)).length).toBe(5);
    console.log(`planted T_J: comet-like max ${worstCometLike.toFixed(4)} (<= 2.90), asteroid-like min ` +
      `${worstAsteroidLike.toFixed(4)} (>= 3.15), boundary max |T-3| ${worstBoundary.toFixed(4)} (<= 0.05)`);
  });

  it('natural bodies keep the truth table honest', () => {
    const plantedLines = new Set(result.truth.map((t) => `${t.file}:${t.line}`));
    let minAsteroid = Infinity;
    let maxComet = -Infinity;
    for (const b of readBack(join(dirA, 'orbits.txt'), 'orbit')) {
      if (!b.row || plantedLines.has(`orbits.txt:${b.line}`)) continue;
      const { aAu: a, e, iDeg } = b.row;
      if (!(a < 4.8) || (a >= 5.05 && a <= 5.35) || (a >= 3.7 && a <= 4.2 && e < 0.3)) continue;
      minAsteroid = Math.min(minAsteroid, tj(a, e, iDeg));
    }
    for (const b of readBack(join(dirA, 'comets.txt'), 'comet')) {
      if (!b.row || plantedLines.has(`comets.txt:${b.line}`)) continue;
      maxComet = Math.max(maxComet, tj(b.row.qAu / (1 - b.row.e), b.row.e, b.row.iDeg));
    }
    console.log(`natural: asteroid-file min T_J ${minAsteroid.toFixed(4)} (>= 3.10), comet max T_J ${maxComet.toFixed(4)} (<= 2.95)`);
    expect(minAsteroid).toBeGreaterThanOrEqual(3.1);
    expect(maxComet).toBeLessThanOrEqual(2.95);
  });
});

describe('co-orbitals and planet longitudes', () => {
  it('the planets the co-orbitals are placed against are the VSOP87B planets of astronomia, as osculating orbits', () => {
    // Outside check: astronomia's VSOP87B series (Bretagnon & Francou 1988, heliocentric J2000
    // ecliptic) give position; velocity by a central difference (h = 0.01 d: truncation
    // ~ (n h)²/6 ≈ 5e-9 relative for the Earth). Elements written out again here from the
    // state (Murray & Dermott 1999 §2.8): a from vis-viva, e vector, Ω and ω, M from the
    // eccentric anomaly, λ = Ω + ω + M, with the planet system's Kepler constant
    // k²(1 + m_P/M_sun): k = 0.01720209895 and the reciprocal mass ratios 328900.56 (Earth +
    // Moon), 3098703.59, 1047.348644, 19412.26 (IAU 2009 system of constants, from memory).
    const series = { earth: vsop87Bearth, mars: vsop87Bmars, jupiter: vsop87Bjupiter, neptune: vsop87Bneptune };
    const inverseMass: Record<ScenarioPlanet, number> = { earth: 328900.56, mars: 3098703.59, jupiter: 1047.348644, neptune: 19412.26 };
    const jd = demoEpochJdTDB();
    const orbits = demoPlanetOrbits();
    // Tolerances near 10× the measured differences (printed below; measured at the demo epoch:
    // Earth λ −9.1″, a −8.9e-4 au; Mars, Jupiter, Neptune λ < 0.001″, a 7e-8, 2.3e-7, 1.4e-6 au,
    // the a's from the finite-difference velocity). The project's planet for 'earth' is the
    // Earth–Moon barycentre, astronomia's VSOP87B Earth is the Earth's centre: 4 700 km and
    // 12 m/s apart (the Moon's pull), which moves the osculating elements that much.
    const tolDeg: Record<ScenarioPlanet, number> = { earth: 0.025, mars: 1e-5, jupiter: 1e-5, neptune: 1e-5 };
    const tolAu: Record<ScenarioPlanet, number> = { earth: 2e-3, mars: 1e-6, jupiter: 3e-6, neptune: 1.5e-5 };
    const report: string[] = [];
    for (const planet of SCENARIO_PLANETS) {
      const body = new planetposition.Planet(series[planet]);
      const xyz = (t: number): number[] => {
        const p = body.position2000(t);
        return [p.range * Math.cos(p.lat) * Math.cos(p.lon), p.range * Math.cos(p.lat) * Math.sin(p.lon), p.range * Math.sin(p.lat)];
      };
      const h = 0.01;
      const r = xyz(jd), rp = xyz(jd + h), rm = xyz(jd - h);
      const v = [0, 1, 2].map((k) => (rp[k] - rm[k]) / (2 * h));
      const mu = 0.01720209895 ** 2 * (1 + 1 / inverseMass[planet]);
      const rn = Math.hypot(r[0], r[1], r[2]);
      const v2 = v[0] ** 2 + v[1] ** 2 + v[2] ** 2;
      const a = 1 / (2 / rn - v2 / mu);
      const hv = [r[1] * v[2] - r[2] * v[1], r[2] * v[0] - r[0] * v[2], r[0] * v[1] - r[1] * v[0]];
      const hn = Math.hypot(hv[0], hv[1], hv[2]);
      const ev = [0, 1, 2].map((k) => (v[(k + 1) % 3] * hv[(k + 2) % 3] - v[(k + 2) % 3] * hv[(k + 1) % 3]) / mu - r[k] / rn);
      const e = Math.hypot(ev[0], ev[1], ev[2]);
      const node = Math.atan2(hv[0], -hv[1]);
      const inc = Math.acos(hv[2] / hn);
      const peri = Math.atan2(ev[2] / Math.sin(inc), ev[0] * Math.cos(node) + ev[1] * Math.sin(node));
      const rv = r[0] * v[0] + r[1] * v[1] + r[2] * v[2];
      const ecc = Math.atan2(rv / Math.sqrt(mu * a), 1 - rn / a);
      const lambdaDeg = ((node + peri + ecc - e * Math.sin(ecc)) * 180) / Math.PI;
      const dDeg = ((((orbits[planet].meanLongitudeRad * 180) / Math.PI - lambdaDeg) % 360) + 540) % 360 - 180;
      const dA = orbits[planet].aAu - a;
      report.push(`${planet} λ ${(dDeg * 3600).toFixed(4)}″ a ${dA.toExponential(2)} au`);
      expect(Math.abs(dDeg), planet).toBeLessThan(tolDeg[planet]);
      expect(Math.abs(dA), planet).toBeLessThan(tolAu[planet]);
      expect(result.planetLongitudesDeg[planet]).toBeCloseTo((orbits[planet].meanLongitudeRad * 180) / Math.PI, 12);
    }
    console.log(`planet osculating orbits at the demo epoch, project − astronomia VSOP87B: ${report.join(', ')}`);
  });

  it('records φ and δa/a_P of each plant as the detector screen computes them from the written elements', async () => {
    const rows = parse(readFileSync(join(dirA, 'coorbital-truth.csv')), { columns: true }) as Record<string, string>[];
    expect(rows.length).toBe(result.coorbitals.length);
    const cat = (await loadCatalogue([join(dirA, 'orbits.txt')])).catalogue;
    const screened = new Map<string, { x: number; phiDeg: number }>();
    for (const planet of SCENARIO_PLANETS) {
      const { entries } = screenCoorbitalZone(cat, [planet], [defaultZoneHalfWidth(planet)], new Vsop87Ephemeris());
      for (const e of entries) screened.set(`${planet} ${cat.designation[e.index]}`, { x: e.x, phiDeg: (e.phiRad * 180) / Math.PI });
    }
    let worst = 0;
    for (const row of rows) {
      const s = screened.get(`${row.planet} ${row.designation}`);
      expect(s, `${row.designation} is in ${row.planet}'s 1:1 zone`).toBeDefined();
      if (!s) continue;
      // the file prints φ with 6 decimals and x with 8
      expect(Math.abs(s.phiDeg - Number(row.phi_deg)), row.designation).toBeLessThanOrEqual(5.1e-7);
      expect(Math.abs(s.x - Number(row.delta_a_over_a)), row.designation).toBeLessThanOrEqual(5.1e-9);
      // placed about the detector's λ_P: the draw ranges of plantedCoorbitals.ts hold after
      // rounding (1e-3° of slack); a table mean longitude would miss by up to 2e rad
      const phi = s.phiDeg, slack = 1e-3;
      if (row.planted_as === 'quasi-satellite') expect(Math.abs(phi)).toBeLessThan(3 + slack);
      if (row.planted_as === 'horseshoe') expect(Math.abs(phi) >= 120 - slack && Math.abs(phi) <= 175 + slack, row.designation).toBe(true);
      if (row.planted_as === 'tadpole-L4') expect(Math.abs(phi - 60)).toBeLessThan(10 + slack);
      if (row.planted_as === 'tadpole-L5') expect(Math.abs(phi + 60)).toBeLessThan(10 + slack);
      worst = Math.max(worst, Math.abs(s.phiDeg - Number(row.phi_deg)));
      expect(row.state_now).toBe('not integrated'); // generated without the N-body judge
    }
    const classes = new Set(result.truth.filter((t) => t.detector === 'coorbital').map((t) => t.plantedClass));
    expect([...classes]).toEqual(['not-integrated']);
    console.log(`${rows.length} co-orbital plants: worst |φ recorded − φ screened| ${worst.toExponential(2)}°`);
  });
});

// The committed demo (npm run make-demo) is the one made with the N-body judge.
describe('the committed demo: co-orbital truth from the integration', () => {
  const rows = parse(readFileSync(join(ROOT, 'data/demo/coorbital-truth.csv')), { columns: true }) as Record<string, string>[];
  const truthRows = parse(readFileSync(join(ROOT, 'data/demo/truth.csv')), { columns: true }) as Record<string, string>[];
  const count = (planet: string, state: string): number => rows.filter((r) => r.planet === planet && r.state_now === state).length;

  it('holds every kind by its N-body state now, and truth.csv gives that state as the class', () => {
    for (const kind of ['quasi-satellite', 'horseshoe', 'tadpole-L4', 'tadpole-L5']) expect(count('earth', kind), kind).toBeGreaterThanOrEqual(3);
    expect(count('earth', 'compound')).toBeGreaterThanOrEqual(1);
    const captures = rows.filter((r) => r.temporary_capture === 'yes' && r.state_now !== 'passing');
    expect(captures.length).toBeGreaterThanOrEqual(1);
    for (const r of captures) expect(Number(r.captures)).toBeGreaterThan(0);
    const jupiter = count('jupiter', 'tadpole-L4') + count('jupiter', 'tadpole-L5');
    expect(jupiter).toBeGreaterThanOrEqual(10);
    expect(jupiter).toBeLessThanOrEqual(20);
    expect(Math.min(count('jupiter', 'tadpole-L4'), count('jupiter', 'tadpole-L5'))).toBeGreaterThanOrEqual(5);
    for (const p of ['mars', 'neptune']) expect(count(p, 'tadpole-L4') + count(p, 'tadpole-L5'), p).toBeGreaterThanOrEqual(3);
    // no Neptune control: none circulates once in ±500 yr (scripts/demo/coorbitalPlan.ts)
    for (const p of ['earth', 'mars', 'jupiter']) expect(count(p, 'passing'), `${p} passing control`).toBeGreaterThanOrEqual(1);
    for (const r of rows) {
      const t = truthRows.find((x) => x.designation === r.designation && x.detector === 'coorbital');
      expect(t?.class, r.designation).toBe(r.state_now);
      // a disagreement of prediction and N-body is listed with its reason, an agreement has none
      expect(r.agree === 'true' ? r.disagreement_reason === '' : r.disagreement_reason.length > 20, r.designation).toBe(true);
      // every year of the window is in some state (±500 yr less the sampling grid's ends)
      const years = Object.keys(r).filter((k) => k.startsWith('years_')).reduce((s, k) => s + Number(r[k] || 0), 0);
      expect(years, r.designation).toBeGreaterThan(980);
      expect(years, r.designation).toBeLessThanOrEqual(1000.2);
    }
    console.log(`committed co-orbital truth: ${rows.length} bodies, ${rows.filter((r) => r.agree === 'false').length} prediction/N-body disagreements`);
  });

  it('integrating a subset again (Jupiter Trojans at L4 and L5, a Jupiter control) gives the committed rows', async () => {
    const lines = readFileSync(join(ROOT, 'data/demo/orbits.txt'), 'latin1').split('\n');
    const pick = ['tadpole-L4', 'tadpole-L5', 'passing'].map((s) => rows.find((r) => r.planet === 'jupiter' && r.state_now === s)!);
    const judge = new CoorbitalJudge();
    for (const r of pick) {
      const row = emptyOrbitRow();
      parseOrbitExportLine(lines[Number(r.line) - 1], row, 'orbits.txt', Number(r.line));
      expect(row.designation).toBe(r.designation);
      const el = { ...emptyElements(), aAu: row.aAu, e: row.e, iDeg: row.iDeg, nodeDeg: row.nodeDeg, periDeg: row.periDeg, meanAnomalyDeg: row.meanAnomalyDeg };
      const j = await judge.judge(el, 'jupiter', true);
      expect(j.history!.stateAtEpoch, r.designation).toBe(r.state_now);
      expect(j.prediction!.state).toBe(r.predicted);
      expect(j.history!.segments.map((s) => s.state).join(' > ')).toBe(r.history);
      expect(j.history!.minDistanceAu.toFixed(6)).toBe(r.min_distance_au);
    }
  }, 180_000);
});

describe('population shape', () => {
  // Common practice: one-opposition orbits are a minority of an export and have much larger
  // uncertainty parameters than multi-opposition ones; the bounds below are loose on purpose
  // (the demo's shares are its own choice, 8 % one-opposition).
  it('has a small share of one-opposition orbits with worse U than numbered ones', () => {
    const back = readBack(join(dirA, 'orbits.txt'), 'orbit').filter((b) => b.row);
    const one = back.filter((b) => b.row!.nOpp === 1);
    const multi = back.filter((b) => b.row!.nOpp > 1);
    const meanU = (xs: ReadBack[]): number => xs.reduce((s, b) => s + b.row!.uncertainty, 0) / xs.length;
    const share = one.length / back.length;
    console.log(`one-opposition share ${(share * 100).toFixed(1)} %, mean U one-opposition ${meanU(one).toFixed(2)}, multi ${meanU(multi).toFixed(2)}`);
    expect(share).toBeGreaterThan(0.03);
    expect(share).toBeLessThan(0.15);
    expect(meanU(one)).toBeGreaterThan(meanU(multi) + 3);
    for (const b of one) expect(Number.isFinite(b.row!.arcDays) && Number.isNaN(b.row!.firstObsYear)).toBe(true);
  });
});
