/**
 * Where the families isolation null model over- or under-flags: `npx tsx
 * scripts/diagnostics/familiesCalibration.ts [--rows N] [--plants N] [--seed N] [--file DUMP]
 * [--catalogues N]`. Prints figures only; asserts nothing.
 *
 * The benchmark's main-belt dump (scripts/bench/familiesDump.ts, invented data; `--rows` natural
 * bodies) or a given orbit file is run through the whole families analysis in this process (2
 * threads). Then `--catalogues` null catalogues are drawn again from the analysis's own
 * background (the same kernels, weights and selection as the calibration) and every body of them
 * scored, so each null body can be placed as the observed ones are. The threshold is the pooled
 * null's 99th-percentile score; the table gives, bin by bin, the fraction of the observed tested
 * bodies (screened, outside every family) at or above it against the fraction of null bodies
 * (those drawn from a scored parent) in the same bin, their ratio, and the observed excess
 * (observed above minus the bin's bodies times the null fraction). Bins: a (0.02 au), e and sin i
 * (0.02), distance to the nearest body set apart (in units of the body's own k-th neighbour
 * distance), the coarse background density, distance to the nearest family member (m/s; the
 * observed members for both), and how many of the k nearest are set apart.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { seededRandom } from '../../src/core/random.js';
import { clusterFamilies } from '../../src/detect/familiesCluster.js';
import { FAMILIES_DEFAULTS } from '../../src/detect/familiesOptions.js';
import { screenFamilies, type FamiliesScreen } from '../../src/detect/familiesScreen.js';
import { pick } from '../../src/detect/families/qrlRegion.js';
import { benjaminiHochbergQValues } from '../../src/detect/tailQValues.js';
import { startFamiliesThreads } from '../../src/detect/families/familiesThreads.js';
import { KdTreeNearest } from '../../src/detect/families/kdTreeNearest.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { buildOutlierBackground, drawFromBackground } from '../../src/detect/families/outlierBackground.js';
import { SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT } from '../../src/detect/families/outlierMetric.js';
import { DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers, type ProperOutlierOptions } from '../../src/detect/families/outliers.js';
import { isolationScores, type IsolationScores } from '../../src/detect/families/outlierScore.js';
import { writeFamiliesDump } from '../bench/familiesDump.js';
import { DEFAULT_SEED } from '../demo/scenario.js';

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

/** One catalogue's bodies as the table sees them. */
interface Placed {
  xyz: Float64Array;
  score: Float64Array;
  counted: Uint8Array; // 1: goes into the table (observed: tested; null: drawn from a scored parent)
  setApart: Uint8Array; // 1: occupies space, not scored
  rkScaled: Float64Array;
  background: Float64Array;
  untrustedAmongK: Uint8Array;
}

type Feature = { name: string; bin: (p: Placed, j: number, ctx: Ctx) => string };
interface Ctx { family: KdTreeNearest; setApartTree: KdTreeNearest; setApartIndex: Int32Array; medianBackground: number }

const aAu = (p: Placed, j: number) => Math.exp(p.xyz[3 * j] / SCALED_A_WEIGHT);
const binOf = (v: number, w: number) => (Math.floor(v / w) * w).toFixed(2);
const edges = (v: number, cuts: readonly number[], unit = ''): string => {
  for (let i = 0; i < cuts.length; i++) if (v < cuts[i]) return `${i === 0 ? '<' : `${cuts[i - 1]}–`}${cuts[i]}${unit}`;
  return `≥${cuts[cuts.length - 1]}${unit}`;
};

const FEATURES: Feature[] = [
  { name: 'a (au, 0.02 bins)', bin: (p, j) => binOf(aAu(p, j), 0.02) },
  { name: 'e (0.02 bins)', bin: (p, j) => binOf(p.xyz[3 * j + 1] / SCALED_E_WEIGHT, 0.02) },
  { name: 'sin i (0.02 bins)', bin: (p, j) => binOf(p.xyz[3 * j + 2] / SCALED_SIN_I_WEIGHT, 0.02) },
  {
    name: 'nearest set-apart body / own r_k', bin: (p, j, c) => {
      const q = c.setApartTree.nearest(p.xyz[3 * j], p.xyz[3 * j + 1], p.xyz[3 * j + 2]);
      return q.index < 0 ? 'none' : edges(Math.sqrt(q.distanceSquared) / p.rkScaled[j], [0.5, 1, 1.5, 2, 3, 5, 10, 30]);
    },
  },
  { name: 'coarse background / catalogue median', bin: (p, j, c) => edges(p.background[j] / c.medianBackground, [0.03, 0.1, 0.3, 0.6, 1, 1.5, 2, 3]) },
  {
    name: 'nearest family member (m/s)', bin: (p, j, c) => {
      const q = c.family.nearest(p.xyz[3 * j], p.xyz[3 * j + 1], p.xyz[3 * j + 2]);
      return q.index < 0 ? 'none' : edges(Math.sqrt(q.distanceSquared) * orbitalSpeedMPerS(aAu(p, j)), [100, 200, 400, 800, 1600, 3200, 6400]);
    },
  },
  { name: 'set-apart bodies among the k nearest', bin: (p, j) => String(p.untrustedAmongK[j]) },
];

function placed(xyz: Float64Array, s: IsolationScores, counted: Uint8Array, setApart: Uint8Array): Placed {
  const n = xyz.length / 3, k = s.neighbours.k;
  const rk = new Float64Array(n), among = new Uint8Array(n);
  for (let j = 0; j < n; j++) {
    rk[j] = s.neighbours.distance[j * k + k - 1];
    for (let m = 0; m < k; m++) among[j] += setApart[s.neighbours.index[j * k + m]];
  }
  return { xyz, score: s.score, counted, setApart, rkScaled: rk, background: s.backgroundDensity, untrustedAmongK: among };
}

function subset(xyz: Float64Array, mark: Uint8Array): Float64Array {
  const out: number[] = [];
  for (let j = 0; j < mark.length; j++) if (mark[j]) out.push(xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2]);
  return Float64Array.from(out);
}

function median(v: Float64Array, mark: Uint8Array): number {
  const s = Float64Array.from([...v].filter((_, j) => mark[j])).sort();
  return s[Math.floor(s.length / 2)];
}

function table(f: Feature, obs: Placed, nulls: Placed[], threshold: number, ctxObs: Ctx, ctxNull: Ctx[]): void {
  const rows = new Map<string, { on: number; oa: number; nn: number; na: number }>();
  const add = (p: Placed, c: Ctx, isObs: boolean) => {
    for (let j = 0; j < p.counted.length; j++) {
      if (!p.counted[j]) continue;
      const key = f.bin(p, j, c);
      const r = rows.get(key) ?? { on: 0, oa: 0, nn: 0, na: 0 };
      const above = p.score[j] >= threshold ? 1 : 0;
      if (isObs) { r.on++; r.oa += above; } else { r.nn++; r.na += above; }
      rows.set(key, r);
    }
  };
  add(obs, ctxObs, true);
  nulls.forEach((p, i) => add(p, ctxNull[i], false));
  console.log(`\n${f.name}`);
  console.log('  bin            observed  above  obs %    null   above  null %  obs/null  excess');
  const keys = [...rows.keys()].sort((x, y) => (Number.isNaN(parseFloat(x.replace(/[<≥–].*$/, ''))) ? x.localeCompare(y) : 0) || sortKey(x) - sortKey(y));
  for (const key of keys) {
    const r = rows.get(key)!;
    if (r.on < 200 && r.nn < 200) continue;
    const po = r.on ? r.oa / r.on : NaN, pn = r.nn ? r.na / r.nn : NaN;
    const excess = r.oa - r.on * pn;
    console.log(`  ${key.padEnd(14)} ${String(r.on).padStart(8)} ${String(r.oa).padStart(6)} ${(100 * po).toFixed(2).padStart(6)} ${String(r.nn).padStart(7)} ${String(r.na).padStart(6)} ${(100 * pn).toFixed(2).padStart(6)} ${(po / pn).toFixed(2).padStart(8)} ${excess.toFixed(0).padStart(7)}`);
  }
}

function sortKey(s: string): number {
  const m = /-?[\d.]+/.exec(s);
  if (!m) return Infinity;
  const v = parseFloat(m[0]);
  return s.startsWith('<') ? v - 1e-9 : s.startsWith('≥') ? v + 1e-9 : v;
}

/**
 * The outliers' stage's space as the families detector builds it (src/detect/families.ts): the
 * screened bodies, then those set apart for untrusted proper elements inside the box the screened
 * ones span, marked not scored.
 */
function withOccupying(screen: FamiliesScreen, a: Float64Array, e: Float64Array, sinI: Float64Array) {
  const range = (c: Float64Array) => c.reduce(([lo, hi], v) => [Math.min(lo, v), Math.max(hi, v)], [Infinity, -Infinity]);
  const [aLo, aHi] = range(a), [eLo, eHi] = range(e), [sLo, sHi] = range(sinI);
  const p = screen.proper;
  const rows: number[] = [];
  for (let k = 0; k < screen.reason.length; k++) {
    if (screen.reason[k] !== 'proper-unreliable') continue;
    if (p.aAu[k] >= aLo && p.aAu[k] <= aHi && p.e[k] >= eLo && p.e[k] <= eHi && p.sinI[k] >= sLo && p.sinI[k] <= sHi) rows.push(k);
  }
  const join = (screened: Float64Array, col: Float64Array) => Float64Array.from([...screened, ...rows.map((k) => col[k])]);
  const scored = rows.length > 0 ? Uint8Array.from({ length: a.length + rows.length }, (_, j) => (j < a.length ? 1 : 0)) : null;
  return { a: join(a, p.aAu), e: join(e, p.e), sinI: join(sinI, p.sinI), scored };
}

async function main(): Promise<void> {
  const o = new Command('families-calibration')
    .option('--rows <n>', 'natural bodies in the generated dump', integerAtLeast(1000), 300_000)
    .option('--plants <n>', 'isolated bodies planted in emptied pockets', integerAtLeast(0), 0)
    .option('--seed <n>', 'seed of the dump and of the analysis', integerAtLeast(0), DEFAULT_SEED)
    .option('--catalogues <n>', 'null catalogues drawn again and scored whole', integerAtLeast(1), 1)
    .option('--file <path>', 'an orbit file instead of the generated dump')
    .option('--weight-cap <x>', 'family down-weighting cap of the null background', Number, DEFAULT_PROPER_OUTLIER_OPTIONS.weightCap)
    .option('--clump-cap <x>', 'clump weight cap of the score\'s coarse background', Number, DEFAULT_PROPER_OUTLIER_OPTIONS.clumpCap)
    .option('--replicates <n>', 'most null catalogues', integerAtLeast(1), DEFAULT_PROPER_OUTLIER_OPTIONS.replicates)
    .option('--summary-only', 'the rates only, no table')
    .option('--save <dir>', 'keep the generated dump in this folder (for --file next time)')
    .parse(process.argv)
    .opts<{ rows: number; plants: number; seed: number; catalogues: number; file?: string; weightCap: number; clumpCap: number; replicates: number; summaryOnly?: boolean; save?: string }>();
  const dir = mkdtempSync(join(tmpdir(), 'wayward-families-calibration-'));
  try {
    const file = o.file ?? (await writeFamiliesDump(o.save ?? join(dir, 'dump'), o.rows, o.plants, o.seed)).file;
    if (o.save !== undefined) console.log(`dump written to ${file}`);
    const cat = (await loadCatalogue([file], {})).catalogue;
    const opts: ProperOutlierOptions = { ...DEFAULT_PROPER_OUTLIER_OPTIONS, weightCap: o.weightCap, clumpCap: o.clumpCap, replicates: o.replicates };
    const screen = screenFamilies(cat);
    const a = pick(screen.proper.aAu, screen.screened), e = pick(screen.proper.e, screen.screened), sinI = pick(screen.proper.sinI, screen.screened);
    const nScreened = a.length;
    const threads = await startFamiliesThreads(2);
    let labels: Int32Array, out;
    const space = withOccupying(screen, a, e, sinI);
    try {
      labels = clusterFamilies(a, e, sinI, { ...FAMILIES_DEFAULTS, seed: o.seed }, threads.levels).labels;
      out = properOutliers(space.a, space.e, space.sinI, seededRandom(o.seed), opts, space.scored, threads.search, threads.nullReplicates);
    } finally { await threads.close(); }
    const xyz = out.scaledXyz, n = xyz.length / 3;
    const scoredMark = out.scored;
    const tested = Uint8Array.from({ length: n }, (_, j) => (j < nScreened && labels[j] < 0 ? 1 : 0));
    const qValue = benjaminiHochbergQValues(out.falseAlarmProb, tested);
    let fap01 = 0, fap05 = 0, q05 = 0, testedN = 0;
    for (let j = 0; j < n; j++) {
      if (!tested[j]) continue;
      testedN++;
      if (out.falseAlarmProb[j] < 0.01) fap01++;
      if (out.falseAlarmProb[j] < 0.05) fap05++;
      if (qValue[j] < 0.05) q05++;
    }
    const sigma = (p: number) => 100 * Math.sqrt(p * (1 - p) / testedN);
    console.log(`${cat.size} rows; ${nScreened} screened, ${n - nScreened} set apart occupying space; weight cap ${opts.weightCap}, clump cap ${opts.clumpCap}, at most ${opts.replicates} null catalogues; ${testedN} tested: ` +
      `${fap01} (${(100 * fap01 / testedN).toFixed(2)}% ± ${sigma(0.01).toFixed(2)}%) at false-alarm probability < 0.01, ${fap05} (${(100 * fap05 / testedN).toFixed(2)}% ± ${sigma(0.05).toFixed(2)}%) < 0.05, ${q05} with q < 0.05`);
    const lowest = [...Array(n).keys()].filter((j) => tested[j]).sort((x, y) => out.falseAlarmProb[x] - out.falseAlarmProb[y]).slice(0, 10);
    console.log(`lowest false-alarm probabilities (score, q): ${lowest.map((j) => `${out.falseAlarmProb[j].toExponential(1)} (${out.score[j].toFixed(2)}, ${qValue[j].toFixed(3)})`).join(', ')}`);
    console.log(out.nullModel);
    if (o.summaryOnly) return;
    const s = isolationScores(xyz, opts);
    const bg = buildOutlierBackground(xyz, s, opts.weightCap, scoredMark.every((v) => v === 1) ? null : scoredMark);
    const setApartObs = Uint8Array.from(scoredMark, (v) => 1 - v);
    const obs = placed(xyz, s, tested, setApartObs);
    const familyTree = new KdTreeNearest(subset(xyz, Uint8Array.from({ length: n }, (_, j) => (j < nScreened && labels[j] >= 0 ? 1 : 0))));
    const ctxObs: Ctx = { family: familyTree, setApartTree: new KdTreeNearest(subset(xyz, setApartObs)), setApartIndex: new Int32Array(0), medianBackground: median(s.backgroundDensity, tested) };
    const nulls: Placed[] = [], ctxNull: Ctx[] = [];
    const random = seededRandom(o.seed + 1);
    const pooled: number[] = [];
    for (let c = 0; c < o.catalogues; c++) {
      const parent = new Int32Array(n);
      const drawn = drawFromBackground(bg, n, random, parent);
      const ns = isolationScores(drawn, opts);
      const fromScored = Uint8Array.from(parent, (p) => scoredMark[p]);
      const apart = Uint8Array.from(fromScored, (v) => 1 - v);
      nulls.push(placed(drawn, ns, fromScored, apart));
      ctxNull.push({ family: familyTree, setApartTree: new KdTreeNearest(subset(drawn, apart)), setApartIndex: new Int32Array(0), medianBackground: ctxObs.medianBackground });
      for (let j = 0; j < n; j++) if (fromScored[j]) pooled.push(ns.score[j]);
    }
    const sorted = Float64Array.from(pooled).sort();
    const threshold = sorted[Math.floor(0.99 * sorted.length)];
    let above = 0;
    for (let j = 0; j < n; j++) if (tested[j] && s.score[j] >= threshold) above++;
    console.log(`null 99th-percentile score ${threshold.toFixed(3)} (${sorted.length} null bodies from ${o.catalogues} catalogue(s)); observed tested at or above it: ${above} of ${testedN} (${(100 * above / testedN).toFixed(2)}%)`);
    for (const f of FEATURES) table(f, obs, nulls, threshold, ctxObs, ctxNull);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
