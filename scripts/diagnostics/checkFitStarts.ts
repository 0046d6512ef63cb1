/**
 * Does a model fit of a null body stop where it should? `npx tsx
 * scripts/diagnostics/checkFitStarts.ts [--trials N] [--from I] [--seed S] [--fast] [--model thermal|comet|srp]`.
 * Prints figures only; asserts nothing. Invented data (the injection's null bodies, the same
 * trial seeds as scripts/injection/injectionRecovery.ts).
 *
 * Each gravity-only body is fitted with gravity only (the records' σ, no rejection), then with
 * the model from that solution three times: its first parameter starting at 0 (as `check`
 * does), at +3σ and at −3σ (σ of the first model fit). Least squares has one minimum here (a
 * nearly linear problem): the three fits should agree in the parameter to far below σ and in
 * χ². A spread means the iterations stop short of the minimum.
 */
import { Command, Option } from 'commander';
import { planetaryEphemerisOver } from '../../src/core/propagate/propagateOrbit.js';
import { fitOptionsOf } from '../../src/fit/check/modelFits.js';
import { fitOrbit } from '../../src/fit/fitOrbit.js';
import { NONGRAV_MODELS } from '../../src/fit/models/index.js';
import { observationSigmas } from '../../src/fit/observationWeights.js';
import { OrbitFitError } from '../../src/fit/orbitFitTypes.js';
import { readObservatoryCodes } from '../../src/io/astrometry/observatoryCodes.js';
import { makeTrialData, recordSigmas, trialSeed } from '../injection/injectionRecovery.js';
import { CANDIDATE_STATION_CODES, int } from './checkOptions.js';

const program = new Command('checkFitStarts')
  .option('--trials <n>', 'null trials', int, 10)
  .option('--from <i>', 'first trial index', int, 0)
  .option('--seed <n>', 'seed of the run', int, 1)
  .option('--fast', 'fewer observations a trial (60–100)', false)
  .addOption(new Option('--model <id>', 'model fitted').choices(['thermal', 'comet', 'srp']).default('thermal'))
  .option('--obscodes <file>', 'observatory-code table', 'test/fixtures/astrometry/observatory-codes.txt')
  .exitOverride((err) => process.exit(err.exitCode === 0 ? 0 : 2))
  .parse();
const o = program.opts();
const table = await readObservatoryCodes(o.obscodes);
const sites = CANDIDATE_STATION_CODES.map((c) => table.sites.get(c)!);
const model = NONGRAV_MODELS[o.model as 'thermal' | 'comet' | 'srp'];
const fi = model.params[0].forceIndex;

for (let i = o.from; i < o.from + o.trials; i++) {
  const d = makeTrialData('null', 0, trialSeed(o.seed, 'null', i), { fast: o.fast, sites });
  const obs = d.observations;
  const times = obs.map((x) => x.timeJdTT);
  const ephemeris = planetaryEphemerisOver(Math.min(...times, d.elements.epochJdTDB) - 2, Math.max(...times, d.elements.epochJdTDB) + 2);
  const sigmas = recordSigmas(observationSigmas(obs, table.sites));
  try {
    const g = fitOrbit(obs, table.sites, { kind: 'elements', elements: d.elements }, { sigmas, ephemeris, reject: false });
    const from = { kind: 'state' as const, epochJdTDB: g.epochJdTDB, state: g.state };
    const fit = (p0: number) => {
      const params = new Float64Array(4);
      params[fi] = p0;
      return fitOrbit(obs, table.sites, from, { ...fitOptionsOf(model), params, sigmas, ephemeris, reject: false });
    };
    const f0 = fit(0);
    const m = f0.columns.length;
    const sigma = Math.sqrt(f0.covariance[6 * m + 6]);
    const rows = [f0, fit(3 * sigma), fit(-3 * sigma)].map((f) => `${(f.params[fi] / sigma).toFixed(4)}σ χ² ${f.chi2.toFixed(4)} (${f.iterations} it)`);
    console.log(`trial ${i}: ${obs.length} obs, gravity χ² ${g.chi2.toFixed(4)}; ${model.id} from 0: ${rows[0]}; from +3σ: ${rows[1]}; from −3σ: ${rows[2]}`);
  } catch (e) {
    if (!(e instanceof OrbitFitError)) throw e;
    console.log(`trial ${i}: failed ${e.message.split('\n')[0]}`);
  }
}
