/**
 * Cost of the families command's proper-element maps on a large catalogue: loads an orbit dump
 * (default: a population-only demo dump of --rows rows generated into a temporary folder), runs
 * the families analysis once (not timed here beyond one figure), then builds and renders each
 * map three times and prints the median build and render times, the SVG and PNG sizes, and how
 * many bodies of each kind were drawn. With --stress, instead a synthetic map input of --rows
 * bodies, a third of them members of 60 families (sizes falling as 1/rank, blobs of several
 * widths) and 1% of the others outliers: the case of a belt rich in families, which the demo
 * population is not. Figures only; nothing is asserted. Invented data unless a dump is given.
 * Usage: npx tsx scripts/bench/familiesPlots.ts [--file DUMP] [--rows N] [--stress]
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { readFamiliesInputs } from '../../src/cli/familiesInputs.js';
import { analyseFamilies } from '../../src/detect/families.js';
import { FAMILIES_DEFAULTS } from '../../src/detect/familiesOptions.js';
import { familiesMapInput } from '../../src/report/familiesPlots.js';
import { properElementMapChart, renderChart, type ProperElementMapInput } from '../../src/report/plots/index.js';
import { seededRandom } from '../../src/core/random.js';
import { generateDemo } from '../demo/generate.js';
import { DEFAULT_SEED } from '../demo/scenario.js';

const opts = new Command('bench-families-plots')
  .option('--file <dump>', 'an orbit dump to read instead of generating one')
  .option('--rows <n>', 'rows of the generated dump', (v: string) => {
    const n = Number(v.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < 100) throw new InvalidArgumentError(`not an integer ≥ 100: ${v}`);
    return n;
  }, 1_500_000)
  .option('--stress', 'a synthetic map input rich in families instead of a dump', false)
  .parse()
  .opts<{ file?: string; rows: number; stress: boolean }>();

const seconds = (t0: number) => (performance.now() - t0) / 1000;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[xs.length >> 1];

/** Build and render each map three times; print medians, sizes and the subtitle. */
async function timeMaps(base: Omit<ProperElementMapInput, 'element' | 'y'>, e: Float64Array, sinI: Float64Array): Promise<void> {
  let t0 = 0;
  for (const [element, y] of [['e', e], ['sin i', sinI]] as const) {
    const build: number[] = [], render: number[] = [];
    let svgBytes = 0, pngBytes = 0, subtitle: unknown = '';
    for (let k = 0; k < 3; k++) {
      t0 = performance.now();
      const spec = properElementMapChart({ ...base, element, y });
      build.push(seconds(t0));
      t0 = performance.now();
      const chart = await renderChart(spec);
      render.push(seconds(t0));
      svgBytes = Buffer.byteLength(chart.svg);
      pngBytes = chart.png.length;
      subtitle = (spec as { title: { subtitle: unknown } }).title.subtitle;
    }
    console.log(`a–${element}: build median ${median(build).toFixed(2)} s, render median ${median(render).toFixed(2)} s (renders ${render.map((s) => s.toFixed(2)).join(', ')} s), SVG ${(svgBytes / 1e6).toFixed(2)} MB, PNG ${(pngBytes / 1e6).toFixed(2)} MB`);
    console.log(`  subtitle: ${JSON.stringify(subtitle)}`);
  }
}

/** A belt rich in families: n bodies, a third in 60 families, 1% of the rest outliers. */
function stressInput(n: number): { base: Omit<ProperElementMapInput, 'element' | 'y'>; e: Float64Array; sinI: Float64Array } {
  const r = seededRandom(5);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r());
  const a = new Float64Array(n), e = new Float64Array(n), sinI = new Float64Array(n), family = new Int32Array(n).fill(-1);
  const inFamilies = Math.floor(n / 3), harmonic = Array.from({ length: 60 }, (_, k) => 1 / (k + 1)).reduce((x, y) => x + y, 0);
  const sizes = Array.from({ length: 60 }, (_, k) => Math.floor(inFamilies / (k + 1) / harmonic));
  let i = 0;
  sizes.forEach((size, f) => {
    const ca = 2.2 + 1.0 * r(), ce = 0.02 + 0.25 * r(), cs = 0.02 + 0.25 * r(), w = 0.005 + 0.025 * r();
    for (let t = 0; t < size; t++, i++) { a[i] = ca + w * gauss(); e[i] = Math.abs(ce + (w / 3) * gauss()); sinI[i] = Math.abs(cs + (w / 3) * gauss()); family[i] = f; }
  });
  const outliers: number[] = [];
  for (; i < n; i++) { a[i] = 2.1 + 1.2 * r(); e[i] = 0.3 * r(); sinI[i] = 0.3 * r(); if (r() < 0.01) outliers.push(i); }
  return {
    base: { aAu: a, family, families: sizes.map((members, f) => ({ label: `Family ${f + 1}`, members })), outliers,
      outlierDesignations: outliers.map((k) => `X${k}`), outlierLegend: 'outlier (false-alarm prob. < 0.01)', bodiesNoun: ['synthetic body', 'synthetic bodies'] },
    e, sinI,
  };
}

if (opts.stress) {
  const t0 = performance.now();
  const { base, e, sinI } = stressInput(opts.rows);
  console.log(`stress input of ${opts.rows} bodies in ${seconds(t0).toFixed(1)} s: ${base.families.reduce((s, f) => s + f.members, 0)} members in ${base.families.length} families, ${base.outliers.length} outliers`);
  await timeMaps(base, e, sinI);
  console.log(`peak RSS ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB; load average ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);
  process.exit(0);
}

const tmp = opts.file ? '' : mkdtempSync(join(tmpdir(), 'wayward-bench-families-plots-'));
try {
  let file = opts.file ?? '';
  if (!file) {
    const t0 = performance.now();
    file = (await generateDemo({ seed: DEFAULT_SEED, outDir: join(tmp, 'dump'), bodies: opts.rows, populationOnly: true })).files[0];
    console.log(`generated ${opts.rows} rows in ${seconds(t0).toFixed(1)} s`);
  }
  let t0 = performance.now();
  const { catalogue } = await loadCatalogue([file]);
  console.log(`loaded ${catalogue.size} bodies in ${seconds(t0).toFixed(1)} s`);
  const inputs = await readFamiliesInputs(undefined);
  t0 = performance.now();
  const analysis = analyseFamilies(catalogue, { ...FAMILIES_DEFAULTS, cutoffMPerS: null, published: inputs.published.families, membership: inputs.membership });
  const members = analysis.clustering.table.reduce((s, f) => s + f.memberCount, 0);
  console.log(`families analysis ${seconds(t0).toFixed(1)} s: ${analysis.a.length} screened, ${analysis.clustering.table.length} families, ${members} members, ${analysis.candidates.length} outliers`);
  t0 = performance.now();
  const base = familiesMapInput(catalogue, analysis, FAMILIES_DEFAULTS.fapThreshold);
  console.log(`map input ${seconds(t0).toFixed(2)} s`);
  await timeMaps(base, analysis.e, analysis.sinI);
  console.log(`peak RSS ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB; load average ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);
} finally {
  if (tmp) rmSync(tmp, { recursive: true, force: true });
}
