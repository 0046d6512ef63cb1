/**
 * Injection–recovery of non-gravitational signals on synthetic astrometry:
 * `npx tsx scripts/injection-recovery.ts` (npm run inject:check --) with --trials N (per
 * injected value, and null trials), --seed, --kind null|a2|srp|all, --fast (60–100
 * observations a trial instead of 300–600), --weights check|record (the fit's σ as `check`
 * gives them, or the records' own σ without the per-night factor). A run can be made in parts:
 * --range A:B runs trial numbers A … B−1 of each value, --json FILE writes the part's trials,
 * and --merge FILE… prints the report of parts together (the same as one run). Prints the tables of
 * scripts/injection/injectionRecovery.ts (null false-detection shares, per injected value the
 * detection share, the share within 1σ, the median pull, the detection threshold); progress on
 * stderr. Deterministic for the options. Exit codes: 2 for a usage error, 1 when the
 * observatory-code table cannot be read.
 */
import { Command, InvalidArgumentError, Option } from 'commander';
import { readObservatoryCodes } from '../src/io/astrometry/observatoryCodes.js';
import { UnreadableInputError } from '../src/io/errors.js';
import type { ObservatorySite } from '../src/io/astrometry/types.js';
import { readFileSync } from 'node:fs';
import {
  formatInjectionReport, mergeRuns, runFromJson, runInjectionRecovery, runToJson, type InjectionKind, type InjectionRun, type InjectionWeights,
} from './injection/injectionRecovery.js';
import { writeFileAtomic } from './synthetic/syntheticFiles.js';

function int(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isInteger(n)) throw new InvalidArgumentError(`not an integer: ${value}`);
  return n;
}

/** Survey stations with published sites in the table (the candidates drawn from, 3–4 a trial). */
const STATION_CODES = ['F51', 'G96', '703', 'W84', 'I41', 'Q55'];

const program = new Command('injection-recovery')
  .description('inject non-gravitational signals into synthetic astrometry and measure how the fits recover them')
  .option('--trials <n>', 'trials per injected value (and null trials)', int, 5)
  .option('--seed <n>', 'seed of the run', int, 1)
  .addOption(new Option('--kind <kind>', 'which trials').choices(['null', 'a2', 'srp', 'all']).default('all'))
  .option('--fast', 'fewer observations a trial (60–100)', false)
  .addOption(new Option('--weights <w>', 'σ of the fits: as check gives them, or the records\' own').choices(['check', 'record']).default('check'))
  .option('--range <a:b>', 'run trial numbers a … b−1 of each value (a part of the run)')
  .option('--json <file>', 'also write the trials as JSON (for --merge)')
  .option('--merge <files...>', 'print the report of parts written with --json (no trials run)')
  .option('--obscodes <file>', 'observatory-code table', 'test/fixtures/astrometry/observatory-codes.txt')
  .exitOverride((err) => process.exit(err.exitCode === 0 ? 0 : 2))
  .parse();

const o = program.opts();
if (o.merge) {
  let parts: InjectionRun[];
  try {
    parts = (o.merge as string[]).map((f) => runFromJson(readFileSync(f, 'utf8')));
  } catch (e) {
    console.error(`injection-recovery: cannot read the parts: ${(e as Error).message}`);
    process.exit(1);
  }
  try {
    process.stdout.write(formatInjectionReport(mergeRuns(parts)));
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    console.error(e.message);
    process.exit(2);
  }
  process.exit(0);
}
let range: [number, number] | undefined;
if (o.range !== undefined) {
  const m = /^(\d+):(\d+)$/.exec(o.range);
  if (!m) program.error(`injection-recovery: --range must be A:B, got ${o.range}`, { exitCode: 2 });
  range = [Number(m![1]), Number(m![2])];
}
let table;
try {
  table = await readObservatoryCodes(o.obscodes);
} catch (e) {
  if (e instanceof UnreadableInputError) {
    console.error(`injection-recovery: ${e.message}`);
    process.exit(1);
  }
  throw e;
}
const sites: ObservatorySite[] = STATION_CODES.map((c) => {
  const s = table.sites.get(c);
  if (s === undefined || !s.fixedSite) program.error(`injection-recovery: station ${c} is not a fixed site of ${o.obscodes}`, { exitCode: 2 });
  return s!;
});
const kinds: InjectionKind[] = o.kind === 'all' ? ['null', 'a2', 'srp'] : [o.kind];
if (o.trials < 1) program.error('injection-recovery: --trials must be at least 1', { exitCode: 2 });
if (range && !(range[0] < range[1] && range[1] <= o.trials)) program.error(`injection-recovery: --range ${o.range} is not inside 0:${o.trials}`, { exitCode: 2 });
let n = 0;
const run = runInjectionRecovery({
  trials: o.trials, seed: o.seed, kinds, fast: o.fast, sites, siteTable: table.sites, weights: o.weights as InjectionWeights, range,
  onTrial: (t) => {
    n += 1;
    const m = t.models[0];
    console.error(`trial ${n} (#${t.index}) ${t.kind} ${t.injected.toExponential(1)}: ${t.observations} obs [${t.stations.join(' ')}] preferred ${t.preferred}`
      + (t.failure ? ` (${t.failure})` : ` ${m.id} p=${m.pValue.toExponential(2)} value=${m.value.toExponential(3)}±${m.sigma.toExponential(2)}`));
  },
});
if (o.json) writeFileAtomic(o.json, runToJson(run));
process.stdout.write(formatInjectionReport(run));
