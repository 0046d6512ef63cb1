/**
 * Families benchmark: `npx tsx scripts/bench-families.ts [--rows N] [--plants N] [--seed N]
 * [--no-reference] [--no-budget-free] [--sdss] [--build]` (npm run bench:families). Prints figures
 * only; asserts nothing (the machine is shared: figures vary run to run, so the load average
 * is printed at the start and end of every part, and `uptime` at the start and the end).
 *
 * 1. End to end: a main-belt dump of `--rows` natural bodies (default 1 500 000: the demo's
 *    main-belt background and families in proper elements, turned osculating) plus `--plants`
 *    isolated bodies, each at the centre of an empty pocket carved in it, in the one-line orbit
 *    export format, generated with the seed (scripts/bench/familiesDump.ts; invented data).
 *    `wayward scan --detectors tisserand,coorbital,families` (every detector) of the built CLI,
 *    as a child process under /usr/bin/time, on 1 and on 2 threads: wall and CPU time, peak RSS
 *    (/usr/bin/time and the scan's own summary.json), the scan's per-stage timing, the ratio,
 *    whether the candidates are the same bytes, and how many plants the scan listed. Unless
 *    --no-budget-free, also the 2-thread scan with the co-orbital N-body confirmation switched
 *    off (--coorbital-budget 0), to show what the confirmation costs.
 * 2. The families stages in this process on the same file: ingest, screen and proper
 *    elements (and what became of the plants: screened, or set apart with a reason),
 *    clustering (QRL per region and HCM), outlier scoring and null calibration on 1 and 2
 *    threads (and whether their numbers are the same bits); then the whole families analysis
 *    once on 2 threads (the scan's numbers), and what became of each plant: its isolation
 *    score, nearest and 8th-nearest distances, false-alarm probability, q-value, and whether the
 *    scan listed it; and the null model's calibration on the dump: of the unplanted bodies tested,
 *    the fraction below false-alarm probability 0.01 and 0.05 against α with its binomial σ, and
 *    how many pass q below the false-discovery level.
 * 3. scikit-learn's DBSCAN (Debian python3-sklearn, scripts/bench/dbscanSklearn.py) on the same
 *    proper elements, region by region in the same velocity space (reference a the region's
 *    mean a) at the region's cutoff, min_samples = 2, clusters under N_min then turned to
 *    noise: HCM with N_min is that DBSCAN (clusterHcm.ts; the same equivalence as
 *    scripts/fixtures/make-dbscan-sklearn.py). Both times, their ratio and the adjusted Rand
 *    index of the two labelings. Without scikit-learn the script says so and goes on.
 * With --sdss, also the earlier grid index + HCM figures on the 186 922 SDSS proper elements
 * and 1.5 M synthetic points beside DBSCAN, and the QRL per region on the SDSS bodies.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { loadCatalogue } from '../src/cli/loadCatalogue.js';
import { seededRandom } from '../src/core/random.js';
import { clusterHcm } from '../src/detect/families/clusterHcm.js';
import { buildGridIndex } from '../src/detect/families/gridIndex.js';
import { startFamiliesThreads } from '../src/detect/families/familiesThreads.js';
import { toVelocitySpace, type VelocitySpace } from '../src/detect/families/metricVelocity.js';
import { buildOutlierBackground } from '../src/detect/families/outlierBackground.js';
import { calibrateIsolation, nullCataloguePlan, nullTailFractions } from '../src/detect/families/outlierCalibration.js';
import { scaledProperCoordinates } from '../src/detect/families/outlierMetric.js';
import { DEFAULT_NULL_SCORES_WANTED, DEFAULT_PROPER_OUTLIER_OPTIONS } from '../src/detect/families/outliers.js';
import { isolationScores } from '../src/detect/families/outlierScore.js';
import { quasiRandomLevel } from '../src/detect/families/qrlCutoff.js';
import { BELT_REGIONS, pick, regionMembers } from '../src/detect/families/qrlRegion.js';
import { clusterFamilies, type FamiliesClustering } from '../src/detect/familiesCluster.js';
import { FAMILIES_DEFAULTS } from '../src/detect/familiesOptions.js';
import { analyseFamilies } from '../src/detect/families.js';
import { screenFamilies } from '../src/detect/familiesScreen.js';
import { adjustedRandIndex } from '../test/helpers/partition.js';
import { distinctBodies, readProperElements } from '../test/helpers/properElements.js';
import { writeFamiliesDump } from './bench/familiesDump.js';
import type { Pocket } from './bench/familiesPockets.js';
import type { Catalogue } from '../src/clean/types.js';
import type { FamiliesAnalysis } from '../src/detect/families.js';
import { DEFAULT_SEED } from './demo/scenario.js';

const ROOT = resolve(import.meta.dirname, '..');
const CLI = join(ROOT, 'dist', 'src', 'cli', 'main.js');
const PYTHON = '/usr/bin/python3';
const A_REF_AU = 2.75;
const TARGET_SECONDS = 20;
const TARGET_PEAK_RSS_MB = 1536; // 1.5 GB
const DETECTORS = 'tisserand,coorbital,families';

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

const seconds = (t0: bigint): number => Number(process.hrtime.bigint() - t0) / 1e9;
const fmt = (n: number): string => Math.round(n).toLocaleString('en-US').replace(/,/g, ' ');
const load = (): string => loadavg().map((x) => x.toFixed(2)).join(' ');
const verdict = (ok: boolean): string => (ok ? 'met' : 'NOT met');

/** Runs fn and returns its value with its wall seconds. */
function timed<T>(fn: () => T): [T, number] {
  const t0 = process.hrtime.bigint();
  const v = fn();
  return [v, seconds(t0)];
}

async function timedAsync<T>(fn: () => Promise<T>): Promise<[T, number]> {
  const t0 = process.hrtime.bigint();
  const v = await fn();
  return [v, seconds(t0)];
}

function ensureBuilt(force: boolean): void {
  if (!force && existsSync(CLI)) return;
  console.log('building dist/ (npm run build) ...');
  const r = spawnSync('npm', ['run', 'build'], { cwd: ROOT, stdio: ['ignore', 'inherit', 'inherit'] });
  if (!existsSync(CLI)) throw new Error(`build did not produce ${CLI} (npm run build exit ${r.status})`);
}

interface ScanRun { seconds: number; status: number | null; stderr: string; maxRssKb: number; cpuSeconds: number; summary: Record<string, any> | null }

/** `wayward scan` as a child process, under /usr/bin/time when there is one. */
function runScan(file: string, outDir: string, threads: number, extra: string[] = []): ScanRun {
  const args = [CLI, 'scan', file, '--detectors', DETECTORS, '--threads', String(threads), '--out', outDir, '--quiet', ...extra];
  const useTime = existsSync('/usr/bin/time');
  const [cmd, argv] = useTime ? ['/usr/bin/time', ['-f', 'maxrss-kb=%M cpu-user=%U cpu-sys=%S', process.execPath, ...args]] : [process.execPath, args];
  const t0 = process.hrtime.bigint();
  const r = spawnSync(cmd, argv, { cwd: ROOT, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8', maxBuffer: 1 << 26 });
  const wall = seconds(t0);
  const m = /maxrss-kb=(\d+) cpu-user=([\d.]+) cpu-sys=([\d.]+)/.exec(r.stderr ?? '');
  const summaryPath = join(outDir, 'summary.json');
  return {
    seconds: wall, status: r.status, stderr: (r.stderr ?? '').replace(/maxrss-kb=.*\n?/, '').trim(),
    maxRssKb: m ? Number(m[1]) : NaN, cpuSeconds: m ? Number(m[2]) + Number(m[3]) : NaN,
    summary: existsSync(summaryPath) ? JSON.parse(readFileSync(summaryPath, 'utf8')) : null,
  };
}

function printScan(label: string, s: ScanRun): void {
  if (s.status !== 0) {
    console.log(`  ${label}: FAILED (exit ${s.status}) after ${s.seconds.toFixed(2)} s: ${s.stderr}`);
    return;
  }
  const peak = s.summary?.resources?.peakRssMb;
  console.log(`  ${label}: ${s.seconds.toFixed(2)} s wall, ${s.cpuSeconds.toFixed(2)} s CPU (user+sys, all threads); peak RSS ${(s.maxRssKb / 1024).toFixed(0)} MB (/usr/bin/time), ${peak ?? '?'} MB (summary.json)`);
  const t = s.summary?.timing as Record<string, number> | undefined;
  if (t) console.log(`    stages (summary.json): ${Object.entries(t).map(([k, v]) => `${k.replace(/Seconds$/, '')} ${v.toFixed(2)} s`).join(', ')}`);
}

const fileHash = (path: string): string => createHash('sha256').update(readFileSync(path)).digest('hex');

/** Designations the families detector listed in a scan's candidates.jsonl. */
function familiesListed(outDir: string): Set<string> {
  const listed = new Set<string>();
  for (const line of readFileSync(join(outDir, 'candidates.jsonl'), 'utf8').split('\n')) {
    if (line === '') continue;
    const c = JSON.parse(line) as { designation: string; detector: string };
    if (c.detector === 'families') listed.add(c.designation);
  }
  return listed;
}

const plantsListed = (outDir: string, planted: readonly string[]): number => {
  const listed = familiesListed(outDir);
  return planted.filter((d) => listed.has(d)).length;
};

/** `uptime`'s line, or the load averages when there is no uptime. */
function uptime(): string {
  const r = spawnSync('uptime', { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim() : `load average ${load()}`;
}

function hashArrays(arrays: readonly ArrayBufferView[]): string {
  const h = createHash('sha256');
  for (const a of arrays) h.update(new Uint8Array(a.buffer, a.byteOffset, a.byteLength));
  return h.digest('hex').slice(0, 16);
}

function hasSklearn(): boolean {
  return existsSync(PYTHON) && spawnSync(PYTHON, ['-c', 'import sklearn'], { stdio: 'ignore' }).status === 0;
}

/** scikit-learn's DBSCAN on the points: its fit time and labels, or a reason it did not run. */
function referenceDbscan(space: VelocitySpace, eps: number): { seconds: number; labels: Int32Array; version: string } | string {
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-families-'));
  try {
    const n = space.xMPerS.length;
    const xyz = new Float64Array(3 * n);
    for (let k = 0; k < n; k++) { xyz[3 * k] = space.xMPerS[k]; xyz[3 * k + 1] = space.yMPerS[k]; xyz[3 * k + 2] = space.zMPerS[k]; }
    writeFileSync(join(dir, 'points.f64'), xyz);
    const run = spawnSync(PYTHON, [join(ROOT, 'scripts/bench/dbscanSklearn.py'), join(dir, 'points.f64'), String(eps), join(dir, 'labels.i32')], { encoding: 'utf8', maxBuffer: 1 << 20 });
    if (run.status !== 0) return `scikit-learn run failed (exit ${run.status}${run.signal ? `, ${run.signal}` : ''}): ${(run.stderr ?? '').trim().split('\n').pop()}`;
    const out = JSON.parse(run.stdout.trim().split('\n').pop()!);
    const buf = readFileSync(join(dir, 'labels.i32'));
    return { seconds: out.seconds, labels: new Int32Array(buf.buffer, buf.byteOffset, n), version: out.version };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function benchOne(title: string, space: VelocitySpace, cutoff: number, reference: boolean): void {
  const n = space.xMPerS.length;
  let t0 = process.hrtime.bigint();
  const index = buildGridIndex(space.xMPerS, space.yMPerS, space.zMPerS, cutoff);
  const indexS = seconds(t0);
  t0 = process.hrtime.bigint();
  const res = clusterHcm(space, cutoff, 2);
  const hcmS = seconds(t0);
  console.log(`${title}: ${fmt(n)} points, cutoff ${cutoff} m/s, ${fmt(index.cellKeys.length)} occupied cells`);
  console.log(`  grid index alone ${indexS.toFixed(2)} s; index + HCM ${hcmS.toFixed(2)} s; ${fmt(res.linkedPairs)} pairs within the cutoff, ${fmt(res.memberCounts.length)} groups of ≥ 2, largest ${fmt(res.memberCounts[0] ?? 0)}`);
  if (!reference) return;
  const ref = referenceDbscan(space, cutoff);
  if (typeof ref === 'string') { console.log(`  reference DBSCAN: ${ref}`); return; }
  const ari = adjustedRandIndex(res.labels, ref.labels);
  console.log(`  scikit-learn ${ref.version} DBSCAN(eps=${cutoff}, min_samples=2) fit ${ref.seconds.toFixed(2)} s; ratio reference / ours ${(ref.seconds / hcmS).toFixed(1)}×; adjusted Rand index ${ari.toFixed(6)}`);
}

/** Real bodies drawn at random, each moved uniformly within ±jitter in a, e and sin i (invented data). */
function syntheticSet(a: Float64Array, e: Float64Array, s: Float64Array, n: number, seed: number): VelocitySpace {
  const random = seededRandom(seed);
  const jitter = 0.005;
  const sa = new Float64Array(n), se = new Float64Array(n), ss = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const j = Math.floor(random() * a.length);
    sa[k] = a[j] + jitter * (2 * random() - 1);
    se[k] = e[j] + jitter * (2 * random() - 1);
    ss[k] = s[j] + jitter * (2 * random() - 1);
  }
  return toVelocitySpace(sa, se, ss, A_REF_AU);
}

/** The earlier figures: grid index + HCM on the SDSS table and synthetic points, QRL per region. */
function sdss(seed: number, reference: boolean): void {
  const opts = { seed, synthetic: 1_500_000 };
  const raw = readProperElements();
  if (raw.badLines.length) console.log(`${raw.badLines.length} rows with a cell that is not a number (NaN, left out of the index): ${raw.badLines[0]} …`);
  benchOne('SDSS proper elements, all rows', toVelocitySpace(raw.aAu, raw.e, raw.sinI, A_REF_AU), 50, reference);
  benchOne('synthetic', syntheticSet(raw.aAu, raw.e, raw.sinI, opts.synthetic, opts.seed), 25, reference);
  const p = distinctBodies(raw);
  console.log(`QRL per region on the ${fmt(p.aAu.length)} distinct bodies (N_min 20, 3 coarse-cell backgrounds of 0.02 au × 0.02 × 0.02, seed ${opts.seed}):`);
  for (let r = 0; r < 3; r++) {
    const ids = regionMembers(p.aAu, r);
    const a = pick(p.aAu, ids);
    const aRefAu = a.reduce((x, y) => x + y, 0) / a.length;
    const t0 = process.hrtime.bigint();
    const q = quasiRandomLevel(a, pick(p.e, ids), pick(p.sinI, ids), { minMembers: 20, aRefAu, backgrounds: 3, seed: opts.seed, background: { cell: { aAu: 0.02, e: 0.02, sinI: 0.02 } }, resolutionMPerS: 0.5 });
    console.log(`  ${BELT_REGIONS[r]}: ${fmt(ids.length)} bodies, a_ref ${aRefAu.toFixed(3)} au, QRL ${q.cutoffMPerS} m/s (backgrounds ${Array.from(q.perBackgroundMPerS).join(', ')}), ${seconds(t0).toFixed(1)} s`);
  }
}


/** Part 1: the scan end to end, 1 and 2 threads, and without the N-body confirmation. */
function endToEnd(file: string, dir: string, planted: readonly string[], budgetFree: boolean): boolean {
  console.log(`1. wayward scan --detectors ${DETECTORS}, child process (load average ${load()})`);
  const one = runScan(file, join(dir, 'scan-1'), 1);
  printScan('1 thread ', one);
  const two = runScan(file, join(dir, 'scan-2'), 2);
  printScan('2 threads', two);
  if (one.status === 0 && two.status === 0) {
    const same = ['candidates.jsonl', 'candidates.csv'].every((f) => fileHash(join(dir, 'scan-1', f)) === fileHash(join(dir, 'scan-2', f)));
    console.log(`  ratio 1 thread / 2 threads: ${(one.seconds / two.seconds).toFixed(2)} (families stage ${(one.summary!.timing.familiesSeconds / two.summary!.timing.familiesSeconds).toFixed(2)}); candidates the same bytes: ${same ? 'yes' : 'NO'}`);
    const peakMb = two.maxRssKb / 1024;
    console.log(`  target: whole scan < ${TARGET_SECONDS} s on 2 threads: ${verdict(two.seconds < TARGET_SECONDS)} (${two.seconds.toFixed(2)} s); peak RSS < ${TARGET_PEAK_RSS_MB} MB: ${verdict(Math.max(peakMb, one.maxRssKb / 1024) < TARGET_PEAK_RSS_MB)}`);
    console.log(`  planted isolated bodies the scan listed (families candidates): ${plantsListed(join(dir, 'scan-2'), planted)} of ${planted.length}`);
  }
  if (budgetFree) {
    const free = runScan(file, join(dir, 'scan-2-no-confirmation'), 2, ['--coorbital-budget', '0']);
    printScan('2 threads, --coorbital-budget 0 (no N-body confirmation)', free);
  }
  console.log(`  load average at the end ${load()}`);
  return two.status === 0;
}

/** Part 2: the families stages in this process; returns the proper elements and clustering for part 3. */
async function stages(file: string, seed: number, planted: readonly string[], pockets: readonly Pocket[], scanDir: string | null): Promise<{ a: Float64Array; e: Float64Array; sinI: Float64Array; clustering: FamiliesClustering }> {
  console.log(`2. families stages in this process (load average ${load()})`);
  const [loaded, ingestS] = await timedAsync(() => loadCatalogue([file], {}));
  const cat = loaded.catalogue;
  console.log(`  ingest ${ingestS.toFixed(2)} s: ${fmt(cat.size)} bodies accepted, ${fmt(loaded.rejects.length)} rejected`);
  const [screen, screenS] = timed(() => screenFamilies(cat));
  const a = pick(screen.proper.aAu, screen.screened), e = pick(screen.proper.e, screen.screened), sinI = pick(screen.proper.sinI, screen.screened);
  console.log(`  screen and proper elements ${screenS.toFixed(2)} s: ${fmt(a.length)} screened with trusted proper elements, ${fmt(screen.notScreened['proper-unreliable'])} untrusted`);
  const plantReasons = new Map<string, number>();
  const plantSet = new Set(planted);
  for (let k = 0; k < cat.size; k++) {
    if (!plantSet.has(cat.designation[k])) continue;
    const why = screen.reason[k] === '' ? 'screened' : screen.reason[k];
    plantReasons.set(why, (plantReasons.get(why) ?? 0) + 1);
  }
  console.log(`  the ${planted.length} planted isolated bodies: ${[...plantReasons].map(([why, count]) => `${count} ${why}`).join(', ')}`);
  const options = DEFAULT_PROPER_OUTLIER_OPTIONS;
  const xyz = scaledProperCoordinates(a, e, sinI);
  const n = a.length;
  const plan = nullCataloguePlan(n, options.replicates, options.nullScoresWanted ?? DEFAULT_NULL_SCORES_WANTED);
  const times: number[] = [];
  const hashes: string[] = [];
  let clustering: FamiliesClustering | null = null;
  for (const count of [1, 2]) {
    const threads = await startFamiliesThreads(count);
    try {
      const [, properS] = timed(() => screenFamilies(cat, threads.proper));
      const [c, clusterS] = timed(() => clusterFamilies(a, e, sinI, { ...FAMILIES_DEFAULTS, seed }, threads.levels));
      clustering = c;
      const [scores, scoreS] = timed(() => isolationScores(xyz, options, threads.search));
      const [tails, nullS] = timed(() => {
        const bg = buildOutlierBackground(xyz, scores, options.weightCap);
        const cal = calibrateIsolation(bg, n, options, plan.replicates, seededRandom(seed), plan.scoredPerReplicate, threads.search, threads.nullReplicates);
        return nullTailFractions(scores.score, cal);
      });
      times.push(clusterS + scoreS + nullS);
      hashes.push(hashArrays([Float64Array.from(c.regionCutoffMPerS), c.labels, scores.score, scores.neighbours.distance, scores.neighbours.index, tails]));
      console.log(`  ${count} thread${count > 1 ? 's' : ' '}: screen and proper elements ${properS.toFixed(2)} s; clustering incl. QRL ${clusterS.toFixed(2)} s (cutoffs ${c.regionCutoffMPerS.map((v) => `${v}`).join(', ')} m/s, ${c.table.length} families); ` +
        `outlier scoring ${scoreS.toFixed(2)} s; null calibration (${plan.replicates} catalogues, ${fmt(plan.scoredPerReplicate)} scored in each) ${nullS.toFixed(2)} s; pieces taken by workers ${threads.workerClaims()}`);
    } finally {
      await threads.close();
    }
  }
  console.log(`  clustering + outliers, 1 thread / 2 threads: ${(times[0] / times[1]).toFixed(2)}; the same bits: ${hashes[0] === hashes[1] ? 'yes' : 'NO'} (load average ${load()})`);
  await plantsFate(cat, planted, pockets, seed, scanDir);
  return { a, e, sinI, clustering: clustering! };
}

/** What became of each planted isolated body in the whole families analysis (2 threads: the scan's numbers). */
async function plantsFate(cat: Catalogue, planted: readonly string[], pockets: readonly Pocket[], seed: number, scanDir: string | null): Promise<void> {
  const threads = await startFamiliesThreads(2);
  let r: FamiliesAnalysis;
  let analysisS: number;
  try {
    [r, analysisS] = timed(() => analyseFamilies(cat, { ...FAMILIES_DEFAULTS, seed }, threads));
  } finally {
    await threads.close();
  }
  const listed = scanDir !== null ? familiesListed(scanDir) : null;
  const row = new Map<string, number>();
  for (let k = 0; k < cat.size; k++) row.set(cat.designation[k], k);
  const position = new Int32Array(cat.size).fill(-1);
  r.screen.screened.forEach((k, j) => { position[k] = j; });
  const o = r.outliers;
  console.log(`  the planted isolated bodies in the whole families analysis (2 threads, ${analysisS.toFixed(1)} s; ${fmt(r.tested)} bodies tested, ${r.candidates.length} with false-alarm probability < ${FAMILIES_DEFAULTS.fapThreshold}, ${r.fdrCandidates.length} with q < ${FAMILIES_DEFAULTS.fdrLevel}):`);
  console.log('    designation      pocket m/s  nearest m/s  8th m/s  score   false-alarm prob  q-value    listed by scan');
  let counted = 0, listedCount = 0;
  planted.forEach((d, m) => {
    const k = row.get(d) ?? -1;
    const j = k >= 0 ? position[k] : -1;
    const isListed = listed ? listed.has(d) : r.fdrCandidates.some((c) => c.designation === d);
    if (isListed) listedCount++;
    const label = isListed ? 'yes' : 'no';
    if (j < 0 || o === null || r.qValue === null) {
      console.log(`    ${d.padEnd(16)} ${pockets[m].radiusMPerS.toFixed(0).padStart(10)}  not screened (${k >= 0 ? r.screen.reason[k] : 'not in the catalogue'})  listed: ${label}`);
      return;
    }
    counted++;
    console.log(`    ${d.padEnd(16)} ${pockets[m].radiusMPerS.toFixed(0).padStart(10)} ${o.nearestDistanceMps[j].toFixed(0).padStart(12)} ${o.kthDistanceMps[j].toFixed(0).padStart(8)} ${o.score[j].toFixed(2).padStart(6)}   ${o.falseAlarmProb[j].toExponential(2).padStart(16)}  ${r.qValue[j].toExponential(2).padStart(9)}  ${label}`);
  });
  console.log(`  plants scored ${counted} of ${planted.length}; listed by the scan ${listedCount} of ${planted.length}${listed ? '' : ' (no scan output: from the analysis\'s own q < level)'}`);
  calibration(r, cat, new Set(planted));
}

/**
 * The null model's calibration on this dump: of the bodies tested (screened, outside every family)
 * that were not planted, the fraction at false-alarm probability < 0.01 and < 0.05 against the
 * nominal α, with the binomial σ √(α(1 − α)/N) (common practice), and how many of them pass
 * q < the false-discovery level (nominally about none: the dump's natural bodies hold no isolated
 * body of their own, though pockets of a smooth law can still leave one by chance).
 */
function calibration(r: FamiliesAnalysis, cat: Catalogue, planted: ReadonlySet<string>): void {
  const o = r.outliers;
  if (o === null || r.qValue === null) return;
  let tested = 0, q = 0;
  const below = [0, 0];
  const alphas = [0.01, 0.05];
  r.screen.screened.forEach((k, j) => {
    if (r.clustering.labels[j] >= 0 || planted.has(cat.designation[k])) return;
    tested++;
    alphas.forEach((alpha, m) => { if (o.falseAlarmProb[j] < alpha) below[m]++; });
    if (r.qValue![j] < FAMILIES_DEFAULTS.fdrLevel) q++;
  });
  const parts = alphas.map((alpha, m) => {
    const rate = below[m] / tested, sigma = Math.sqrt((alpha * (1 - alpha)) / tested);
    return `${fmt(below[m])} (${(100 * rate).toFixed(3)}%) below ${alpha}, nominal ${100 * alpha}% ± ${(100 * sigma).toFixed(3)}% (1σ binomial), ${((rate - alpha) / sigma).toFixed(1)}σ`;
  });
  console.log(`  calibration: of ${fmt(tested)} unplanted bodies tested, false-alarm probability ${parts.join('; ')}; ${q} unplanted with q < ${FAMILIES_DEFAULTS.fdrLevel}`);
}

/** Part 3: scikit-learn's DBSCAN against HCM, region by region, on the screened proper elements. */
function againstSklearn(a: Float64Array, e: Float64Array, sinI: Float64Array, c: FamiliesClustering, minMembers: number): void {
  console.log(`3. HCM against scikit-learn DBSCAN on the same proper elements (load average ${load()})`);
  if (!hasSklearn()) {
    console.log('  scikit-learn cannot be run (apt-get install -y python3-sklearn): no reference');
    return;
  }
  let oursS = 0, refS = 0;
  const ours: number[] = [], theirs: number[] = [];
  let offset = 0;
  for (let r = 0; r < 3; r++) {
    const cut = c.regionCutoffMPerS[r];
    const ids = regionMembers(a, r);
    if (!Number.isFinite(cut) || ids.length === 0) continue;
    const ar = pick(a, ids);
    const aRef = ar.reduce((x, y) => x + y, 0) / ar.length;
    const space = toVelocitySpace(ar, pick(e, ids), pick(sinI, ids), aRef);
    const [hcm, hcmS] = timed(() => clusterHcm(space, cut, minMembers));
    const ref = referenceDbscan(space, cut);
    if (typeof ref === 'string') { console.log(`  ${BELT_REGIONS[r]}: ${ref}`); return; }
    const refLabels = minMembersOnly(ref.labels, minMembers);
    const ari = adjustedRandIndex(hcm.labels, refLabels);
    oursS += hcmS; refS += ref.seconds;
    for (let k = 0; k < ids.length; k++) {
      ours.push(hcm.labels[k] < 0 ? -1 : offset + hcm.labels[k]);
      theirs.push(refLabels[k] < 0 ? -1 : offset + refLabels[k]);
    }
    offset += ids.length;
    console.log(`  ${BELT_REGIONS[r]}: ${fmt(ids.length)} bodies, cutoff ${cut} m/s: HCM (grid + union-find) ${hcmS.toFixed(2)} s, ${hcm.memberCounts.length} families; scikit-learn ${ref.version} DBSCAN(eps=${cut}, min_samples=2) fit ${ref.seconds.toFixed(2)} s; ratio ${(ref.seconds / hcmS).toFixed(1)}×; adjusted Rand index ${ari.toFixed(6)}`);
  }
  console.log(`  all regions: HCM ${oursS.toFixed(2)} s, DBSCAN ${refS.toFixed(2)} s, ratio DBSCAN / HCM ${(refS / oursS).toFixed(1)}×, adjusted Rand index ${adjustedRandIndex(ours, theirs).toFixed(6)}`);
}

/** DBSCAN labels with clusters under minMembers turned to noise (HCM's N_min). */
function minMembersOnly(labels: Int32Array, minMembers: number): Int32Array {
  const size = new Map<number, number>();
  for (const l of labels) if (l >= 0) size.set(l, (size.get(l) ?? 0) + 1);
  return labels.map((l) => (l >= 0 && size.get(l)! >= minMembers ? l : -1));
}

async function main(): Promise<void> {
  const o = new Command('bench-families')
    .option('--rows <n>', 'natural bodies in the generated dump', integerAtLeast(1000), 1_500_000)
    .option('--plants <n>', 'isolated bodies planted in emptied pockets', integerAtLeast(0), 40)
    .option('--seed <n>', 'seed of the dump, the QRL backgrounds and the null catalogues', integerAtLeast(0), DEFAULT_SEED)
    .option('--no-reference', 'skip the scikit-learn DBSCAN runs')
    .option('--no-budget-free', 'skip the scan without co-orbital N-body confirmation')
    .option('--sdss', 'also the grid/HCM figures on the SDSS proper elements and synthetic points')
    .option('--build', 'rebuild dist/ first even if it exists', false)
    .parse(process.argv)
    .opts<{ rows: number; plants: number; seed: number; reference: boolean; budgetFree: boolean; sdss?: boolean; build: boolean }>();
  ensureBuilt(o.build);
  console.log(`families benchmark; uptime at the start: ${uptime()}`);
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-families-'));
  try {
    const [dump, genS] = await timedAsync(() => writeFamiliesDump(join(dir, 'dump'), o.rows, o.plants, o.seed));
    const radii = dump.pockets.map((p) => p.radiusMPerS).sort((x, y) => x - y);
    console.log(`dump: ${fmt(dump.rows)} rows (${fmt(o.rows)} natural main-belt bodies + ${o.plants} isolated bodies each at the centre of an emptied pocket, radii ${radii.length ? `${radii[0].toFixed(0)}–${radii[radii.length - 1].toFixed(0)}` : '-'} m/s; ${fmt(dump.redrawn)} draws fell in a pocket and were drawn again), seed ${o.seed}, generated in ${genS.toFixed(1)} s (not measured below)`);
    const scanned = endToEnd(dump.file, dir, dump.planted, o.budgetFree);
    const s = await stages(dump.file, FAMILIES_DEFAULTS.seed, dump.planted, dump.pockets, scanned ? join(dir, 'scan-2') : null);
    if (o.reference) againstSklearn(s.a, s.e, s.sinI, s.clustering, FAMILIES_DEFAULTS.minMembers);
    else console.log('3. scikit-learn reference skipped (--no-reference)');
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  if (o.sdss) sdss(o.seed, o.reference && hasSklearn());
  console.log(`uptime at the end: ${uptime()}`);
}

await main();
