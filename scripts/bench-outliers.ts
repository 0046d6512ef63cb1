/**
 * Cost of the families stage's isolation outliers: `npx tsx scripts/bench-outliers.ts
 * [--synthetic N] [--replicates N] [--seed N]` (npm run bench:outliers). Runs the stage on
 * (1) the 186 922 rows of the real proper-element file as given (test/fixtures/proper-elements-sdss/:
 * repeat detections included, so many exact ties), (2) its 89 622 distinct bodies, and (3) a
 * synthetic catalogue (default 1 500 000 bodies) drawn from the real belt's smooth background,
 * and prints wall and CPU time of each phase: scaled coordinates, the observed scores (grid, k
 * nearest, coarse density), the background, the null catalogues (draw and score, per replicate),
 * the tail fractions. Asserts nothing: the machine is shared and figures vary run to run.
 */
import { readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { Command, InvalidArgumentError } from 'commander';
import { seededRandom } from '../src/core/random.js';
import { scaledProperCoordinates, SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT } from '../src/detect/families/outlierMetric.js';
import { isolationScores } from '../src/detect/families/outlierScore.js';
import { buildOutlierBackground, drawFromBackground } from '../src/detect/families/outlierBackground.js';
import { calibrateIsolation, nullCataloguePlan, nullTailFractions } from '../src/detect/families/outlierCalibration.js';
import { DEFAULT_NULL_SCORES_WANTED, DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers } from '../src/detect/families/outliers.js';

const FILE = new URL('../test/fixtures/proper-elements-sdss/proper-elements-sdss.csv', import.meta.url);

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

const program = new Command()
  .option('--synthetic <n>', 'bodies in the synthetic catalogue', integerAtLeast(100), 1_500_000)
  .option('--replicates <n>', 'null catalogues', integerAtLeast(1), DEFAULT_PROPER_OUTLIER_OPTIONS.replicates)
  .option('--seed <n>', 'seed of the null draws', integerAtLeast(0), 1)
  .option('--null-scores <n>', 'null scores wanted', integerAtLeast(1), DEFAULT_NULL_SCORES_WANTED)
  .parse();
const opts = program.opts<{ synthetic: number; replicates: number; seed: number; nullScores: number }>();
const options = { ...DEFAULT_PROPER_OUTLIER_OPTIONS, replicates: opts.replicates, nullScoresWanted: opts.nullScores };

interface Elements { a: Float64Array; e: Float64Array; s: Float64Array }

function readReal(distinct: boolean): Elements {
  const lines = readFileSync(FILE, 'utf8').split('\n').slice(1).filter((l) => l !== '');
  const keep = distinct ? [...new Set(lines.map((l) => l.split(',').slice(0, 3).join(',')))] : lines;
  const a = new Float64Array(keep.length), e = new Float64Array(keep.length), s = new Float64Array(keep.length);
  keep.forEach((l, j) => { const f = l.split(','); a[j] = Number(f[0]); e[j] = Number(f[1]); s[j] = Number(f[2]); });
  return { a, e, s };
}

/** A synthetic belt: n bodies drawn from the smooth background of the distinct real bodies. */
function synthetic(real: Elements, n: number): Elements {
  const xyz = scaledProperCoordinates(real.a, real.e, real.s);
  const bg = buildOutlierBackground(xyz, isolationScores(xyz, options), options.weightCap);
  const z = drawFromBackground(bg, n, seededRandom(12_345));
  const a = new Float64Array(n), e = new Float64Array(n), s = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    a[j] = Math.exp(z[3 * j] / SCALED_A_WEIGHT); e[j] = z[3 * j + 1] / SCALED_E_WEIGHT; s[j] = z[3 * j + 2] / SCALED_SIN_I_WEIGHT;
  }
  return { a, e, s };
}

/** Runs fn, prints its wall and CPU seconds, returns its value. */
function timed<T>(label: string, fn: () => T): T {
  const wall0 = process.hrtime.bigint();
  const cpu0 = process.cpuUsage();
  const value = fn();
  const cpu = process.cpuUsage(cpu0);
  const wall = Number(process.hrtime.bigint() - wall0) / 1e9;
  console.log(`  ${label.padEnd(34)} ${wall.toFixed(2).padStart(7)} s wall ${((cpu.user + cpu.system) / 1e6).toFixed(2).padStart(7)} s CPU`);
  return value;
}

function bench(name: string, el: Elements): void {
  const n = el.a.length;
  const plan = nullCataloguePlan(n, options.replicates, options.nullScoresWanted);
  console.log(`${name}: ${n.toLocaleString('en-US')} bodies, k = ${options.k}, ${plan.replicates} null catalogues of which ${plan.scoredPerReplicate} scored (load average ${loadavg()[0].toFixed(1)})`);
  const t0 = process.hrtime.bigint();
  const xyz = timed('scaled coordinates', () => scaledProperCoordinates(el.a, el.e, el.s));
  const scores = timed('observed scores', () => isolationScores(xyz, options));
  const bg = timed('background', () => buildOutlierBackground(xyz, scores, options.weightCap));
  const cal = timed(`null: ${plan.replicates} × (draw + score), sort`, () => calibrateIsolation(bg, n, options, plan.replicates, seededRandom(opts.seed), plan.scoredPerReplicate));
  const fractions = timed('tail fractions', () => nullTailFractions(scores.score, cal));
  const total = Number(process.hrtime.bigint() - t0) / 1e9;
  let raised = 0;
  for (const f of fractions) if (f <= 0.01) raised++;
  console.log(`  total ${total.toFixed(2)} s wall; ${cal.nullScoresSorted.length} null scores (${cal.scoredPerReplicate} a catalogue); null tail fraction ≤ 0.01: ${raised} (${(100 * raised / n).toFixed(2)}%)`);
}

const rows = readReal(false);
bench('real proper elements, every row', rows);
const distinct = readReal(true);
bench('real proper elements, distinct bodies', distinct);
bench('synthetic belt', synthetic(distinct, opts.synthetic));
// One end-to-end call, as the families stage makes it, on the distinct real bodies.
timed('properOutliers (distinct real bodies)', () => properOutliers(distinct.a, distinct.e, distinct.s, seededRandom(opts.seed), options));
