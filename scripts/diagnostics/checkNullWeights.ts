/**
 * Why the null trials of the injection–recovery are conservative: `npx tsx
 * scripts/diagnostics/checkNullWeights.ts [--trials N] [--from I] [--seed S] [--fast]`.
 * Prints figures only; asserts nothing. Invented data (the injection's null bodies, the same
 * trial seeds as scripts/injection/injectionRecovery.ts for the seed and indices).
 *
 * Each gravity-only body is fitted three ways:
 *   check   — as `check` fits: the record's σ with the per-night factor √(N/4) for N > 4
 *             (src/fit/observationWeights.ts), outlier rejection (χ² > 8), comparison set;
 *   record  — the record's σ alone (the σ the noise was drawn with), rejection as check;
 *   plain   — the record's σ alone, no rejection: the textbook least-squares test.
 * Per way: χ²/dof of the gravity-only fit (dof = residuals − 6), observations rejected, and
 * Δχ² = χ²(gravity) − χ²(model) of thermal, comet and srp with the p-value compareModels
 * gives it (Pr(χ²_k ≥ Δχ²), k the model's extra parameters). For a correct weighting and a
 * linear model, χ²/dof ≈ 1 and Δχ² ~ χ²_k, mean k (common practice).
 */
import { Command } from 'commander';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { fitOptionsOf, runModelFits } from '../../src/fit/check/modelFits.js';
import { fitOrbit } from '../../src/fit/fitOrbit.js';
import { NONGRAV_MODELS } from '../../src/fit/models/index.js';
import { chiSquareSf } from '../../src/fit/models/tailFunctions.js';
import { observationSigmas } from '../../src/fit/observationWeights.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { readObservatoryCodes } from '../../src/io/astrometry/observatoryCodes.js';
import { makeTrialData, recordSigmas, trialSeed } from '../injection/injectionRecovery.js';
import { CANDIDATE_STATION_CODES, int } from './checkOptions.js';

const program = new Command('checkNullWeights')
  .option('--trials <n>', 'null trials', int, 10)
  .option('--from <i>', 'first trial index', int, 0)
  .option('--seed <n>', 'seed of the run', int, 1)
  .option('--fast', 'fewer observations a trial (60–100)', false)
  .option('--obscodes <file>', 'observatory-code table', 'test/fixtures/astrometry/observatory-codes.txt')
  .exitOverride((err) => process.exit(err.exitCode === 0 ? 0 : 2))
  .parse();
const o = program.opts();
const table = await readObservatoryCodes(o.obscodes);
const sites = CANDIDATE_STATION_CODES.map((c) => table.sites.get(c)!);
const MODELS = ['thermal', 'comet', 'srp'] as const;
type Way = 'check' | 'record' | 'plain';
const WAYS: Way[] = ['check', 'record', 'plain'];
const acc: Record<Way, { chi2dof: number[]; rejected: number[]; dchi2: Record<string, number[]> }> = {
  check: { chi2dof: [], rejected: [], dchi2: { thermal: [], comet: [], srp: [] } },
  record: { chi2dof: [], rejected: [], dchi2: { thermal: [], comet: [], srp: [] } },
  plain: { chi2dof: [], rejected: [], dchi2: { thermal: [], comet: [], srp: [] } },
};

for (let i = o.from; i < o.from + o.trials; i++) {
  const seed = trialSeed(o.seed, 'null', i);
  const d = makeTrialData('null', 0, seed, { fast: o.fast, sites });
  const obs = d.observations;
  const times = obs.map((x) => x.timeJdTT);
  const ephemeris = planetaryEphemerisOver(Math.min(...times, d.elements.epochJdTDB) - 2, Math.max(...times, d.elements.epochJdTDB) + 2);
  const checkSigmas = observationSigmas(obs, table.sites);
  const recSigmas = recordSigmas(checkSigmas);
  const inflated = checkSigmas.filter((s) => s.nightFactor > 1).length;
  const line: string[] = [`trial ${i} seed ${seed}: ${obs.length} obs, ${inflated} with night factor >1`];
  for (const way of WAYS) {
    try {
      let g: { chi2: number; n: number; rej: number };
      const dchi2: Record<string, number> = {};
      if (way === 'plain') {
        const start = { kind: 'elements' as const, elements: d.elements };
        const gf = fitOrbit(obs, table.sites, start, { sigmas: recSigmas, ephemeris, reject: false });
        g = { chi2: gf.chi2, n: 2 * gf.kept, rej: gf.rejected };
        for (const id of MODELS) {
          const mf = fitOrbit(obs, table.sites, { kind: 'state', epochJdTDB: gf.epochJdTDB, state: gf.state }, { ...fitOptionsOf(NONGRAV_MODELS[id]), sigmas: recSigmas, ephemeris, reject: false });
          dchi2[id] = gf.chi2 - mf.chi2;
        }
      } else {
        const mf = runModelFits({ observations: obs, sites: table.sites, sigmas: way === 'check' ? checkSigmas : recSigmas, ephemeris, start: { kind: 'elements', elements: d.elements }, models: MODELS });
        const gf = mf.fits.find((f) => f.id === 'gravity')!;
        g = { chi2: gf.chi2, n: gf.nResiduals, rej: gf.rejected };
        for (const id of MODELS) {
          const f = mf.fits.find((x) => x.id === id);
          dchi2[id] = f ? gf.chi2 - f.chi2 : NaN;
        }
      }
      const a = acc[way];
      a.chi2dof.push(g.chi2 / (g.n - 6));
      a.rejected.push(g.rej);
      for (const id of MODELS) a.dchi2[id].push(dchi2[id]);
      line.push(`  ${way}: χ²/dof ${(g.chi2 / (g.n - 6)).toFixed(3)} rej ${g.rej} Δχ² ${MODELS.map((id) => `${id} ${dchi2[id].toFixed(2)}`).join(' ')}`);
    } catch (e) {
      if (!(e instanceof OrbitFitError)) throw e;
      line.push(`  ${way}: failed ${e.message.split('\n')[0]}`);
    }
  }
  console.log(line.join('\n'));
}

const mean = (xs: number[]): number => { const f = xs.filter(Number.isFinite); return f.reduce((s, x) => s + x, 0) / f.length; };
const sem = (xs: number[]): number => { const f = xs.filter(Number.isFinite); const m = mean(f); return Math.sqrt(f.reduce((s, x) => s + (x - m) ** 2, 0) / (f.length - 1) / f.length); };
console.log('\n| way | trials | mean χ²/dof | mean rejected | ' + MODELS.map((id) => `mean Δχ² ${id} (k=${NONGRAV_MODELS[id].params.length}) | p<0.05 ${id}`).join(' | ') + ' |');
for (const way of WAYS) {
  const a = acc[way];
  const cells = MODELS.map((id) => {
    const k = NONGRAV_MODELS[id].params.length;
    const f = a.dchi2[id].filter(Number.isFinite);
    return `${mean(f).toFixed(2)} ± ${sem(f).toFixed(2)} | ${f.filter((x) => chiSquareSf(x, k) < 0.05).length}/${f.length}`;
  });
  console.log(`| ${way} | ${a.chi2dof.length} | ${mean(a.chi2dof).toFixed(3)} ± ${sem(a.chi2dof).toFixed(3)} | ${mean(a.rejected).toFixed(2)} | ${cells.join(' | ')} |`);
}
