/**
 * Family clustering benchmark: `npx tsx scripts/bench-families.ts [--synthetic N] [--seed N]
 * [--no-reference]` (npm run bench:families). Times the grid index and HCM (N_min = 2, i.e.
 * DBSCAN with minPts = 2; clusterHcm.ts) on
 *   1. the 186 922 rows of the SDSS proper-element table (test/fixtures/proper-elements-sdss/),
 *      repeated detections included, in velocity space at a = 2.75 au, cutoff 50 m/s;
 *   2. a synthetic set (default 1 500 000 points: real bodies drawn at random, each moved
 *      uniformly within ±0.005 in a (au), e and sin i; invented data), cutoff 25 m/s (about
 *      8× the density, so about the same neighbours per point);
 * and, where Debian's python3-sklearn is installed, scikit-learn's DBSCAN(eps, min_samples=2)
 * on the same points (scripts/bench/dbscanSklearn.py): both times, their ratio and the
 * adjusted Rand index of the two labelings. Also the QRL per belt region on the distinct
 * bodies. Prints figures only; asserts nothing (the machine is shared).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { seededRandom } from '../src/core/random.js';
import { clusterHcm } from '../src/detect/families/clusterHcm.js';
import { buildGridIndex } from '../src/detect/families/gridIndex.js';
import { toVelocitySpace, type VelocitySpace } from '../src/detect/families/metricVelocity.js';
import { quasiRandomLevel } from '../src/detect/families/qrlCutoff.js';
import { BELT_REGIONS, pick, regionMembers } from '../src/detect/families/qrlRegion.js';
import { adjustedRandIndex } from '../test/helpers/partition.js';
import { distinctBodies, readProperElements } from '../test/helpers/properElements.js';

const ROOT = resolve(import.meta.dirname, '..');
const PYTHON = '/usr/bin/python3';
const A_REF_AU = 2.75;

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

const seconds = (t0: bigint): number => Number(process.hrtime.bigint() - t0) / 1e9;
const fmt = (n: number): string => Math.round(n).toLocaleString('en-US').replace(/,/g, ' ');

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

function main(): void {
  const opts = new Command()
    .option('--synthetic <n>', 'points in the synthetic set', integerAtLeast(1), 1_500_000)
    .option('--seed <n>', 'seed of the synthetic set and the QRL backgrounds', integerAtLeast(0), 2026)
    .option('--no-reference', 'skip the scikit-learn DBSCAN runs')
    .parse(process.argv)
    .opts<{ synthetic: number; seed: number; reference: boolean }>();
  const reference = opts.reference && hasSklearn();
  if (opts.reference && !reference) console.log('scikit-learn is not installed (apt-get install -y python3-sklearn): no reference DBSCAN times');
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

main();
