/**
 * `wayward check DESIGNATION --obs FILE`: one body's astrometry fitted with gravity only and
 * with non-gravitational models (src/fit/check/), the verdict and the model table on stdout,
 * progress and every record set aside (file:line: reason) on stderr. With --out DIR, staged and
 * put in place together: fit.json, residuals.csv and plots/residuals-MODEL.svg/.png.
 * Exit codes: 0 the check ran (whatever the verdict), 1 unreadable input, nothing of the
 * designation to fit, or the gravity-only fit failed (with its numbers), 2 usage.
 */
import { Command, InvalidArgumentError } from 'commander';
import { runCheck, type CheckResult } from '../fit/check/index.js';
import { OrbitFitError } from '../fit/orbitFitTypes.js';
import type { NongravModelId } from '../fit/models/index.js';
import { NONGRAV_MODEL_IDS } from '../fit/models/index.js';
import { writeFileAtomic } from '../report/atomicWrite.js';
import { checkJsonText } from '../report/checkJson.js';
import { writeCheckPlots } from '../report/checkPlots.js';
import { residualsCsvText } from '../report/checkResiduals.js';
import { checkTableText } from '../report/checkTable.js';
import type { CheckRun } from '../report/checkTypes.js';
import { OutputStage } from '../report/outputStage.js';
import { Instant } from '../core/time/time.js';
import { CheckInputError, endOfUtcDayJd, readCheckInputs } from './checkInputs.js';
import { withDefault } from './optionDefault.js';
import { parsePositiveInteger } from './optionParsers.js';

export const CHECK_MODELS_DEFAULT = 'gravity,thermal,comet,srp';
/** Stations refitted in the leave-one-station-out test hold at least this share of the observations (our choice: keeps the refits few). */
export const STATION_MIN_SHARE_DEFAULT = 0.05;

/** Threads by default: the two cores of the reference machine, as scan's --threads. */
export const CHECK_THREADS_DEFAULT = 2;

/** Records set aside shown on stderr; the rest are counted there and listed in the outputs. */
const STDERR_SET_ASIDE_LINES = 20;

export interface CheckCliOptions {
  obs: string;
  obscodes?: string;
  elements?: string;
  models: Exclude<NongravModelId, 'gravity'>[];
  out?: string;
  stationMinShare: number;
  /** Observations after this JD (UTC) are set aside; default the end of the run's UTC day. */
  notAfter?: number;
  /** Threads for the fits after gravity only (outputs identical for any number); default 1 here, CHECK_THREADS_DEFAULT from the command line. */
  threads?: number;
}

/** `--models a,b,…`: known ids, each once; gravity is always fitted and may be named. */
export function parseModelList(value: string): Exclude<NongravModelId, 'gravity'>[] {
  const ids = value.split(',').map((s) => s.trim()).filter((s) => s !== '');
  if (ids.length === 0) throw new InvalidArgumentError(`no model named (known: ${NONGRAV_MODEL_IDS.join(', ')})`);
  const out: Exclude<NongravModelId, 'gravity'>[] = [];
  for (const id of ids) {
    if (!(NONGRAV_MODEL_IDS as readonly string[]).includes(id)) throw new InvalidArgumentError(`unknown model '${id}' (known: ${NONGRAV_MODEL_IDS.join(', ')})`);
    if (id === 'gravity') continue;
    if (out.includes(id as never)) throw new InvalidArgumentError(`model '${id}' named twice`);
    out.push(id as Exclude<NongravModelId, 'gravity'>);
  }
  return out;
}

/** `--station-min-share f`: a share in [0, 1]. */
export function parseShare(value: string): number {
  const x = Number(value);
  if (value.trim() === '' || !Number.isFinite(x) || x < 0 || x > 1) throw new InvalidArgumentError(`'${value}' is not a share between 0 and 1`);
  return x;
}

/** `--not-after DATE`: an ISO date or date-time, UTC unless it names a scale → JD (UTC); a bare date means its end. */
export function parseNotAfter(value: string): number {
  const text = value.trim();
  try {
    const day = /^\d{4}-\d{2}-\d{2}$/.test(text);
    const t = Instant.parse(day ? `${text}T00:00:00Z` : text, 'UTC').to('UTC');
    return t.jd + (day ? 1 : 0);
  } catch {
    throw new InvalidArgumentError(`'${value}' is not an ISO date (e.g. 2033-01-01) or date-time`);
  }
}

/** Runs the check and writes its outputs; CheckInputError / OrbitFitError when nothing could be fitted. */
export async function runCheckCommand(designation: string, opts: CheckCliOptions, say: (line: string) => void): Promise<CheckRun> {
  const stage = opts.out === undefined ? null : await OutputStage.open(opts.out);
  try {
    const inputs = await readCheckInputs(designation, opts.obs, opts.obscodes, opts.elements, opts.notAfter ?? endOfUtcDayJd(Date.now()));
    const a = inputs.account;
    for (const e of a.unreadable.slice(0, STDERR_SET_ASIDE_LINES)) say(e.message);
    if (a.unreadable.length > STDERR_SET_ASIDE_LINES) say(`… and ${a.unreadable.length - STDERR_SET_ASIDE_LINES} more unreadable lines (all in fit.json with --out)`);
    for (const s of a.setAside.slice(0, STDERR_SET_ASIDE_LINES)) say(`${s.observation.file}:${s.observation.line}: ${s.reason}`);
    if (a.setAside.length > STDERR_SET_ASIDE_LINES) say(`… and ${a.setAside.length - STDERR_SET_ASIDE_LINES} more set aside (all in fit.json and residuals.csv with --out)`);
    if (a.others.length > 0) say(`${a.file}: ${a.others.reduce((n, o) => n + o.observations, 0)} observations of ${a.others.length} other designation(s) set aside`);
    let result: CheckResult;
    try {
      result = await runCheck(designation, inputs.observations, inputs.table.sites, {
        models: opts.models, start: inputs.start, absMagH: a.absMagH, stationMinShare: opts.stationMinShare, threads: opts.threads ?? 1, onProgress: say,
      });
    } catch (e) {
      if (e instanceof OrbitFitError) throw new CheckInputError(`the gravity-only orbit fit of ${designation} failed: ${e.message}`);
      throw e;
    }
    const run: CheckRun = { account: a, result, models: ['gravity', ...opts.models] };
    say('fits and guards done');
    if (stage !== null) {
      await writeFileAtomic(stage.path('fit.json'), checkJsonText(run));
      await writeFileAtomic(stage.path('residuals.csv'), residualsCsvText(run));
      say('fit.json and residuals.csv staged; drawing plots');
      await writeCheckPlots(stage, result.observations, result.fits);
      await stage.commit();
      say(`outputs written to ${opts.out}`);
    }
    return run;
  } catch (err) {
    await stage?.abort();
    throw err;
  }
}

/** What stdout shows: the verdict, the model table, the account, where the outputs are. */
export function checkStdout(run: CheckRun, out: string | undefined): string {
  const a = run.account, r = run.result;
  const others = a.others.reduce((n, o) => n + o.observations, 0);
  return [
    r.verdict, '',
    checkTableText(r), '',
    `${r.designation}: ${r.observations.length} observations fitted from ${a.file} (${a.start}); ${a.setAside.length} set aside, ${a.unreadable.length} unreadable lines, ${others} observations of other designations.`,
    `p-values: the probability of a Δχ² at least this large under the null hypothesis "${r.comparison.nullHypothesis}" — not the probability that a model is true.`,
    (out === undefined ? '' : `Outputs in ${out}/ (fit.json, residuals.csv, plots/). `)
      + `Screening result from this astrometry alone${r.preferred === 'gravity' ? '' : ': a candidate for follow-up, not a confirmed finding'}.`,
  ].join('\n') + '\n';
}

export function registerCheck(program: Command): void {
  program
    .command('check')
    .description("fit one body's astrometry with gravity only and with non-gravitational models, and say whether its orbit needs more than gravity")
    .argument('<designation>', "the body's designation as the astrometry writes it ('2030 QW12', '(12893)' or 12893, or the packed form)")
    .requiredOption('--obs <file>', 'astrometry: 80-column records or ADES PSV')
    .option('--obscodes <file>', 'observatory-code table (default: the built-in one, the geocentre 500 only)')
    .option('--elements <file>', "orbit dump holding the body's row: the fit's start and its H (default: Gauss's method, H unknown)")
    .addOption(withDefault('--models <list>', 'models fitted besides gravity only (gravity, thermal, comet, srp)', parseModelList(CHECK_MODELS_DEFAULT), CHECK_MODELS_DEFAULT, parseModelList))
    .addOption(withDefault('--station-min-share <f>', 'leave-one-station-out: refit without the stations holding at least this share of the observations', STATION_MIN_SHARE_DEFAULT, String(STATION_MIN_SHARE_DEFAULT), parseShare))
    .addOption(withDefault('--threads <n>', 'threads for the model fits and the leave-one-station-out refits: this one and n − 1 workers (outputs identical for any number)',
      CHECK_THREADS_DEFAULT, String(CHECK_THREADS_DEFAULT), parsePositiveInteger))
    .option('--not-after <date>', 'set aside observations dated after this (ISO date, UTC; default: the end of today)', parseNotAfter)
    .option('-o, --out <dir>', 'write fit.json, residuals.csv and plots/ here')
    .action(async (designation: string, flags: CheckCliOptions) => {
      const t0 = Date.now();
      const say = (line: string): void => void process.stderr.write(`wayward check [${((Date.now() - t0) / 1000).toFixed(1)} s]: ${line}\n`);
      try {
        const run = await runCheckCommand(designation, flags, say);
        process.stdout.write(checkStdout(run, flags.out));
      } catch (err) {
        if (err instanceof CheckInputError) {
          process.stderr.write(`wayward: ${err.message}\n`);
          process.exitCode = 1;
          return;
        }
        throw err;
      }
    });
}
