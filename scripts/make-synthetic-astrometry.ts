/**
 * Synthetic astrometry of one invented body: `npx tsx scripts/make-synthetic-astrometry.ts`
 * (npm run synth:astrometry --) with the orbit, the injected non-gravitational terms, the
 * stations, span, count and seed as options. Writes, in --out: NAME.obs80.txt and/or NAME.psv,
 * NAME-elements.txt (the truth orbit, one-line orbit export format) and NAME-observations.csv
 * (each observation's truth). Made with the project's own dynamics and observation model
 * (src/fit/synthetic/); deterministic: the same options give the same bytes. Invented data,
 * for tests, benchmarks and demos. Exit codes: 2 for a usage error (a bad option, a station
 * not in the table, a request the generator refuses), 1 when the table cannot be read or not
 * every observation could be placed.
 */
import { Command, InvalidArgumentError, Option } from 'commander';
import { calendarToJd } from '../src/core/time/julian.js';
import { generateSyntheticAstrometry } from '../src/fit/synthetic/index.js';
import type { SyntheticStation } from '../src/fit/synthetic/types.js';
import { readObservatoryCodes } from '../src/io/astrometry/observatoryCodes.js';
import { UnreadableInputError } from '../src/io/errors.js';
import { elementsRow } from './synthetic/elementsRow.js';
import { writeSyntheticFiles, type SyntheticFormat } from './synthetic/syntheticFiles.js';

function num(value: string): number {
  const n = Number(value);
  if (value.trim() === '' || !Number.isFinite(n)) throw new InvalidArgumentError(`not a number: ${value}`);
  return n;
}

function int(value: string): number {
  const n = num(value);
  if (!Number.isInteger(n)) throw new InvalidArgumentError(`not an integer: ${value}`);
  return n;
}

function date(value: string): number {
  const m = /^(\d{4})-(\d\d)-(\d\d)$/.exec(value);
  if (!m) throw new InvalidArgumentError(`not a date YYYY-MM-DD: ${value}`);
  return calendarToJd(Number(m[1]), Number(m[2]), Number(m[3]));
}

/** 'F51:0.2,G96:0.3,675:1.5:P:1972-01-01:1990-01-01' → code, σ (″), note 2, first and last night. */
function stationSpecs(value: string): { code: string; sigma: number; note2: string; from: number; to: number }[] {
  return value.split(',').map((part) => {
    const [code, sigma, note2 = 'C', from, to] = part.split(':');
    if (!/^[0-9A-Z]{3}$/.test(code ?? '') || sigma === undefined) throw new InvalidArgumentError(`not CODE:SIGMA[:NOTE2[:FROM[:TO]]]: ${part}`);
    return { code, sigma: num(sigma), note2, from: from ? date(from) : -Infinity, to: to ? date(to) : Infinity };
  });
}

const program = new Command('make-synthetic-astrometry')
  .description('write synthetic astrometry of one invented body made with the project\'s own dynamics')
  .option('--designation <text>', 'readable designation of the invented body', '2031 QK12')
  .option('--a <au>', 'semimajor axis', num, 2.6)
  .option('--e <e>', 'eccentricity', num, 0.12)
  .option('--i <deg>', 'inclination, J2000 ecliptic', num, 8)
  .option('--node <deg>', 'longitude of the ascending node', num, 80)
  .option('--peri <deg>', 'argument of perihelion', num, 130)
  .option('--mean-anomaly <deg>', 'mean anomaly at the epoch', num, 30)
  .option('--epoch <date>', 'osculation epoch, 0h TT', '2032-05-10')
  .option('--h <mag>', 'absolute magnitude written in the elements row', num, 17.5)
  .option('--a1 <au/d2>', 'radial non-gravitational parameter A1', num, 0)
  .option('--a2 <au/d2>', 'transverse A2', num, 0)
  .option('--a3 <au/d2>', 'normal A3', num, 0)
  .addOption(new Option('--law <law>', 'radial law of A1–A3').choices(['inverse-square', 'comet-water']).default('inverse-square'))
  .option('--area-to-mass <m2/kg>', 'radiation pressure area-to-mass ratio', num, 0)
  .option('--cr <cr>', 'radiation pressure coefficient', num, 1)
  .option('--no-relativity', 'leave out the Sun\'s 1PN term')
  .option('--obscodes <file>', 'observatory-code table', 'test/fixtures/astrometry/observatory-codes.txt')
  .option('--stations <list>', 'CODE:SIGMA_ARCSEC[:NOTE2[:FROM[:TO]]],… (FROM/TO YYYY-MM-DD)', 'F51:0.2,G96:0.3,703:0.6,W84:0.25')
  .option('--start <date>', 'first night (UTC)', '2022-05-10')
  .option('--years <n>', 'span in Julian years', num, 10)
  .option('--count <n>', 'observations', int, 400)
  .option('--seed <n>', 'seed', int, 1)
  .option('--outliers <rate>', 'share of outliers (displaced 3–20″)', num, 0)
  .addOption(new Option('--format <f>', 'astrometry format').choices(['obs80', 'ades', 'both']).default('both'))
  .option('--out <dir>', 'output directory', 'synthetic-astrometry')
  .option('--name <stem>', 'file stem', 'synthetic')
  .exitOverride((err) => process.exit(err.code === 'synth.unreadable' ? 1 : err.exitCode === 0 ? 0 : 2))
  .parse();

/** A usage error (exit 2) or an unreadable input (exit 1): one line, no stack. */
function fail(err: unknown): never {
  if (err instanceof RangeError || err instanceof TypeError) program.error(`make-synthetic-astrometry: ${err.message}`, { exitCode: 2 });
  if (err instanceof UnreadableInputError) program.error(`make-synthetic-astrometry: ${err.message}`, { exitCode: 1, code: 'synth.unreadable' });
  throw err;
}

const o = program.opts();
const table = await readObservatoryCodes(o.obscodes).catch(fail);
const stations: SyntheticStation[] = stationSpecs(o.stations).map((s) => {
  const site = table.sites.get(s.code);
  if (site === undefined || !site.fixedSite) program.error(`station ${s.code}: not a fixed site of ${o.obscodes}`, { exitCode: 2 });
  return { site: site!, sigmaArcsec: s.sigma, note2: s.note2, fromJdUtc: s.from, toJdUtc: s.to };
});
/** The truth row and the observations of the options; RangeError for a request the generator refuses. */
function generate(): { el: ReturnType<typeof elementsRow>; result: ReturnType<typeof generateSyntheticAstrometry> } {
  const el = elementsRow({
    designation: o.designation, aAu: o.a, e: o.e, iDeg: o.i, nodeDeg: o.node, periDeg: o.peri, meanAnomalyDeg: o.meanAnomaly,
    epochJdTT: date(o.epoch), H: o.h, reference: 'SYNTHETIC',
  });
  const start = date(o.start);
  const ng: [number, number, number] = [o.a1, o.a2, o.a3];
  const result = generateSyntheticAstrometry(o.designation, {
    truth: {
      elements: el.elements, nonGravAuPerDay2: ng.every((v) => v === 0) ? null : ng, nonGravLaw: o.law,
      areaToMassM2PerKg: o.areaToMass, radiationPressureCoefficient: o.cr, relativity: o.relativity,
    },
    stations, startJdUtc: start, endJdUtc: start + 365.25 * o.years, count: o.count, seed: o.seed,
    outlierRate: o.outliers, outlierArcsec: [3, 20],
  });
  return { el, result };
}

let made: ReturnType<typeof generate>;
try {
  made = generate();
} catch (err) {
  fail(err);
}
const { el, result } = made;
const files = writeSyntheticFiles({ dir: o.out, name: o.name, format: o.format as SyntheticFormat, elementsLine: el.line, observations: result.observations });
for (const f of files) console.log(`wrote ${f}`);
console.log(`${result.observations.length} observations in ${result.tracklets} tracklets, ${result.apparitions} apparitions, ${result.candidateNights} candidate station-nights`);
if (result.shortBy > 0) {
  console.error(`make-synthetic-astrometry: ${result.shortBy} of ${result.requested} observations could not be placed (every observable night used)`);
  process.exitCode = 1;
}
