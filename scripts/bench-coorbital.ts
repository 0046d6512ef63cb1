/**
 * Co-orbital detector benchmark: `npx tsx scripts/bench-coorbital.ts [options]`
 * (npm run bench:coorbital). Three parts, each printed next to its target, measured in one
 * run; nothing is asserted (the machine is shared: figures vary run to run).
 *  1. screen + predict: a population-only demo dump (default 1 500 000 rows) is generated
 *     into a temporary directory and loaded once with loadCatalogue (load time reported on
 *     its own); then screenCoorbitalZone and predictEntries for all eight planets are timed,
 *     with the bodies screened per planet and the prediction cost per body; the prediction
 *     with 1 and with 2 threads, and whether the two give the same predictions.
 *  2. confirmation cost on one core, per body per 1 000 years: the planetary cache fill over
 *     the window (one-off, shared by every body) timed apart from the confirmations of three
 *     invented bodies (an Earth Trojan, an Earth co-orbital with repeated encounters, a
 *     Jupiter Trojan; scripts/bench/coorbital.ts).
 *  3. a synthetic near-Earth list (scripts/bench/nearEarthList.ts; default 36 000 rows, 500 in
 *     the Earth's 1:1 zone) written to a file, loaded, and confirmed in full through
 *     analyseCoorbitals (confirm: 'all', unlimited budget, window ± years/2) with 1 and with
 *     2 threads: wall time each and their ratio; the two runs' results are compared. Each is
 *     preceded by the same run with a budget for one body (the fixed costs: screen, predict,
 *     planetary cache fill, worker start). `--zone-bodies` and `--years` shrink the case; the
 *     figures for the target size are then an estimate (the one-body run plus the further
 *     bodies' cost, linear in bodies and years), labelled SCALED. `--threads 2` runs the
 *     2-thread case alone (no ratio, no comparison of results).
 * The temporary directory is removed afterwards.
 */
import { mkdtempSync, rmSync, statSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { Command, InvalidArgumentError } from 'commander';
import { J2000_JD, PLANETS, type PlanetName } from '../src/core/constants.js';
import { confirmCoorbital } from '../src/core/coorbital/confirm.js';
import { createWindowEphemeris } from '../src/core/coorbital/sampleCoorbital.js';
import { Vsop87Ephemeris } from '../src/core/ephemeris/vsop87Ephemeris.js';
import { loadCatalogue } from '../src/cli/loadCatalogue.js';
import { analyseCoorbitals } from '../src/detect/coorbital.js';
import type { CoorbitalBodyResult } from '../src/detect/coorbitalCandidate.js';
import { COORBITAL_DEFAULTS, type CoorbitalOptions } from '../src/detect/coorbitalOptions.js';
import { predictEntries } from '../src/detect/coorbitalPredict.js';
import { defaultZoneHalfWidth, screenCoorbitalZone } from '../src/detect/coorbitalZone.js';
import { encounterBody, timed, turned } from './bench/coorbital.js';
import { NEAR_EARTH_DEFAULT_SEED, writeNearEarthList } from './bench/nearEarthList.js';
import { generateDemo } from './demo/generate.js';
import { DEFAULT_SEED } from './demo/scenario.js';

const TARGET_SCREEN_PREDICT_S = 10;
const TARGET_CONFIRM_CPU_S_PER_1000_YR = 1;
const TARGET_NEAR_EARTH_2_THREADS_S = 180;
const TARGET_ZONE_BODIES = 500;
const TARGET_YEARS = 1000;
const DAYS_PER_YEAR = 365.25;

function integerAtLeast(min: number): (value: string) => number {
  return (value: string): number => {
    const n = Number(value.replace(/_/g, ''));
    if (!Number.isInteger(n) || n < min) throw new InvalidArgumentError(`not an integer ≥ ${min}: ${value}`);
    return n;
  };
}

const PARTS = ['predict', 'confirm', 'near-earth'] as const;
type Part = (typeof PARTS)[number];
function partList(value: string): Part[] {
  const parts = value.split(',').map((s) => s.trim());
  for (const p of parts) if (!(PARTS as readonly string[]).includes(p)) throw new InvalidArgumentError(`unknown part ${p} (${PARTS.join(', ')})`);
  return parts as Part[];
}

function threadList(value: string): number[] {
  const list = value.split(',').map((s) => Number(s.trim()));
  if (!['1', '2', '1,2'].includes(list.join(','))) throw new InvalidArgumentError(`thread counts must be 1,2 or 1 or 2: ${value}`);
  return list;
}

const fmtInt = (n: number): string => Math.round(n).toLocaleString('en-US').replace(/,/g, ' ');
const verdict = (ok: boolean): string => (ok ? 'met' : 'NOT met');

async function timedAsync<T>(f: () => Promise<T>): Promise<{ value: T; wallS: number }> {
  const t0 = performance.now();
  const value = await f();
  return { value, wallS: (performance.now() - t0) / 1000 };
}

/** Part 1: screen and predict over a population-only dump, all eight planets. */
async function benchPredict(dir: string, rows: number, seed: number): Promise<void> {
  const gen = await timedAsync(() => generateDemo({ seed, outDir: join(dir, 'dump'), bodies: rows, populationOnly: true }));
  const file = gen.value.files[0];
  console.log(`1. screen + predict, all eight planets: ${fmtInt(rows)}-row dump (seed ${seed}), ${(statSync(file).size / 1e6).toFixed(1)} MB`);
  console.log(`   generation (not measured below): ${gen.wallS.toFixed(2)} s`);
  const load = await timedAsync(() => loadCatalogue([file]));
  const cat = load.value.catalogue;
  console.log(`   loadCatalogue (reported apart): ${load.wallS.toFixed(2)} s, ${fmtInt(cat.size)} rows accepted`);
  const widths = PLANETS.map((p) => defaultZoneHalfWidth(p));
  const screen = timed(() => screenCoorbitalZone(cat, PLANETS, widths, new Vsop87Ephemeris()));
  const { entries, notScreened } = screen.value;
  const perPlanet = new Map<PlanetName, number>(PLANETS.map((p) => [p, 0]));
  for (const e of entries) perPlanet.set(e.planet, (perPlanet.get(e.planet) ?? 0) + 1);
  console.log(`   screenCoorbitalZone: ${screen.wallS.toFixed(2)} s, ${fmtInt(entries.length)} bodies screened`);
  console.log(`     per planet: ${PLANETS.map((p) => `${p} ${fmtInt(perPlanet.get(p) ?? 0)}`).join(', ')}`);
  console.log(`     not screened: ${Object.entries(notScreened).map(([k, v]) => `${k} ${fmtInt(v)}`).join(', ')}`);
  const wall: number[] = [];
  const prints: string[] = [];
  for (const threads of [1, 2]) {
    const predict = await timedAsync(() => predictEntries(entries, threads));
    wall.push(predict.wallS);
    prints.push(JSON.stringify(predict.value));
    const msPerBody = entries.length > 0 ? (1000 * predict.wallS) / entries.length : NaN;
    const total = screen.wallS + predict.wallS;
    const scaled = rows === 1_500_000 ? '' : ' (dump not 1.5 M rows: compare with care)';
    console.log(`   predictEntries, threads ${threads}: ${predict.wallS.toFixed(2)} s, ${msPerBody.toFixed(2)} ms wall per predicted body`);
    console.log(`   screen + predict, threads ${threads}: ${total.toFixed(2)} s   target < ${TARGET_SCREEN_PREDICT_S} s: ${verdict(total < TARGET_SCREEN_PREDICT_S)}${scaled}`);
  }
  console.log(`   ratio predict threads 1 / threads 2: ${(wall[0] / wall[1]).toFixed(2)}; predictions identical: ${prints[0] === prints[1] ? 'yes' : 'NO'}`);
  console.log(`   ratio predict (1 thread) / screen ${(wall[0] / screen.wallS).toFixed(1)}; screen / load ${(screen.wallS / load.wallS).toFixed(2)}`);
}

/** Part 2: confirmation cost per body per 1 000 years on one core, cache fill apart. */
function benchConfirm(years: number): void {
  const half = (years * DAYS_PER_YEAR) / 2;
  const per1000 = 1000 / years;
  console.log(`2. confirmation on one core, window ${years} yr centred on J2000`);
  const fill = timed(() => createWindowEphemeris(J2000_JD - half, J2000_JD + half));
  const eph = fill.value;
  console.log(`   planetary cache fill (one-off, shared by every body): ${fill.wallS.toFixed(2)} s wall, ${fill.cpuS.toFixed(2)} s CPU`);
  confirmCoorbital(turned(eph, 'earth', 72), J2000_JD, 'earth', { windowYears: Math.min(50, years / 2), ephemeris: eph }); // warm-up
  const bodies: Array<[string, PlanetName, Float64Array]> = [
    ['Earth Trojan', 'earth', turned(eph, 'earth', -72)],
    ['Earth co-orbital with encounters', 'earth', encounterBody(eph)],
    ['Jupiter Trojan', 'jupiter', turned(eph, 'jupiter', 72)],
  ];
  let sum = 0;
  for (const [name, planet, s] of bodies) {
    const run = timed(() => confirmCoorbital(s, J2000_JD, planet, { windowYears: years / 2, ephemeris: eph }));
    const cpu = run.cpuS * per1000;
    sum += cpu;
    console.log(`   ${name}: ${cpu.toFixed(2)} s CPU per 1 000 yr (${run.wallS.toFixed(2)} s wall for ${years} yr), `
      + `states ${run.value.segments.map((x) => x.state).join(' → ')}`);
  }
  const mean = sum / bodies.length;
  console.log(`   mean ${mean.toFixed(2)} s CPU per body per 1 000 yr   target < ${TARGET_CONFIRM_CPU_S_PER_1000_YR} s: ${verdict(mean < TARGET_CONFIRM_CPU_S_PER_1000_YR)}`);
  console.log(`   ratio cache fill / mean body: ${(fill.cpuS / (mean / per1000)).toFixed(2)}`);
}

/** The parts of a result that must not depend on the thread count. */
function fingerprint(results: readonly CoorbitalBodyResult[]): string {
  return JSON.stringify(results.map((r) => [r.entry.index, r.prediction.state, r.unconfirmedReason,
    r.history ? [r.history.stateAtEpoch, r.history.minDistanceAu, r.history.segments.length, r.history.captures.length] : null]));
}

/** Part 3: a near-Earth list confirmed in full through analyseCoorbitals, 1 and 2 threads. */
async function benchNearEarth(
  dir: string, rows: number, zoneBodies: number, years: number, seed: number, threadCounts: readonly number[],
): Promise<void> {
  const file = join(dir, 'near-earth.txt');
  writeNearEarthList(file, { rows, zoneBodies, seed });
  console.log(`3. near-Earth list: ${fmtInt(rows)} rows (seed ${seed}), ${zoneBodies} placed in the Earth's 1:1 zone, confirmed in full over ±${years / 2} yr`);
  const load = await timedAsync(() => loadCatalogue([file]));
  const cat = load.value.catalogue;
  console.log(`   loadCatalogue: ${load.wallS.toFixed(2)} s, ${fmtInt(cat.size)} rows accepted`);
  const wall: number[] = [];
  const fixed: number[] = [];
  const prints: string[] = [];
  for (const threads of threadCounts) {
    const base: CoorbitalOptions = { ...COORBITAL_DEFAULTS, planets: ['earth'], confirm: 'all', windowYears: years / 2, threads };
    // The same run with a budget for one body: the fixed costs (screen, predict, planetary
    // cache fill, worker start) plus one body, so the per-body cost can be told apart.
    const oneBody = await timedAsync(() => analyseCoorbitals(cat, { ...base, budgetCpuSeconds: 1e-9 }));
    const cpu0 = process.cpuUsage();
    const run = await timedAsync(() => analyseCoorbitals(cat, { ...base, budgetCpuSeconds: 1e12 }));
    const cpu = process.cpuUsage(cpu0);
    const cpuS = (cpu.user + cpu.system) / 1e6; // this process, all its threads
    const confirmed = run.value.results.filter((r) => r.history !== null).length;
    wall.push(run.wallS);
    fixed.push(oneBody.wallS);
    prints.push(fingerprint(run.value.results));
    const marginal = confirmed > 1 ? (run.wallS - oneBody.wallS) / (confirmed - 1) : NaN;
    console.log(`   threads ${threads}: ${run.wallS.toFixed(1)} s wall (${cpuS.toFixed(1)} s CPU, all threads; load average ${loadavg()[0].toFixed(2)} after), `
      + `${run.value.results.length} screened, ${confirmed} confirmed; `
      + `with one body confirmed ${oneBody.wallS.toFixed(1)} s; each further body ${marginal.toFixed(2)} s wall (${(marginal * 1000 / years).toFixed(2)} s per 1 000 yr)`);
  }
  if (threadCounts.length === 2) {
    console.log(`   ratio threads 1 / threads 2: ${(wall[0] / wall[1]).toFixed(2)}; results identical: ${prints[0] === prints[1] ? 'yes' : 'NO'}`);
  }
  const atTarget = zoneBodies === TARGET_ZONE_BODIES && years === TARGET_YEARS;
  for (let k = 0; k < threadCounts.length; k++) {
    const two = threadCounts[k] === 2;
    if (atTarget) {
      console.log(`   threads ${threadCounts[k]}, ${TARGET_ZONE_BODIES} bodies ±${TARGET_YEARS / 2} yr: ${wall[k].toFixed(0)} s measured`
        + (two ? `   target < ${TARGET_NEAR_EARTH_2_THREADS_S} s: ${verdict(wall[k] < TARGET_NEAR_EARTH_2_THREADS_S)}` : ''));
      continue;
    }
    // Scaled: the one-body run plus the further bodies' cost, linear in bodies and in years.
    const perBody = zoneBodies > 1 ? (wall[k] - fixed[k]) / (zoneBodies - 1) : NaN;
    const est = fixed[k] * (TARGET_YEARS / years) + perBody * (TARGET_ZONE_BODIES - 1) * (TARGET_YEARS / years);
    console.log(`   threads ${threadCounts[k]}, ${TARGET_ZONE_BODIES} bodies ±${TARGET_YEARS / 2} yr: ≈ ${est.toFixed(0)} s SCALED (estimate from this `
      + `${zoneBodies}-body, ${years}-yr run: one-body run + ${TARGET_ZONE_BODIES - 1} × the further-body cost${years === TARGET_YEARS ? '' : `, × ${TARGET_YEARS}/${years} yr`})`
      + (two ? `   target < ${TARGET_NEAR_EARTH_2_THREADS_S} s: ${verdict(est < TARGET_NEAR_EARTH_2_THREADS_S)}` : ''));
  }
}

async function main(): Promise<void> {
  const o = new Command('bench-coorbital')
    .option('--rows <n>', 'rows in the generated dump (part 1)', integerAtLeast(100), 1_500_000)
    .option('--seed <n>', 'demo generator seed (part 1)', integerAtLeast(0), DEFAULT_SEED)
    .option('--confirm-years <n>', 'window of the one-core confirmation (part 2), years', integerAtLeast(2), TARGET_YEARS)
    .option('--near-earth-rows <n>', 'rows of the near-Earth list (part 3)', integerAtLeast(1), 36_000)
    .option('--zone-bodies <n>', "bodies placed in the Earth's zone (part 3)", integerAtLeast(1), TARGET_ZONE_BODIES)
    .option('--years <n>', 'N-body window of part 3, years (epoch ± years/2)', integerAtLeast(2), TARGET_YEARS)
    .option('--near-earth-seed <n>', 'near-Earth list seed (part 3)', integerAtLeast(0), NEAR_EARTH_DEFAULT_SEED)
    .option('--threads <list>', 'thread counts of part 3: 1,2 (default) or either alone', threadList, [1, 2])
    .option('--parts <list>', `parts to run, comma-separated (${PARTS.join(', ')})`, partList, [...PARTS])
    .parse()
    .opts<{ rows: number; seed: number; confirmYears: number; nearEarthRows: number; zoneBodies: number; years: number; nearEarthSeed: number; threads: number[]; parts: Part[] }>();
  if (o.zoneBodies > o.nearEarthRows) throw new InvalidArgumentError('--zone-bodies exceeds --near-earth-rows');
  const load = (): string => loadavg().map((x) => x.toFixed(2)).join(' ');
  console.log(`co-orbital benchmark: ${availableParallelism()} cores, load average ${load()} (1, 5, 15 min)`);
  const dir = mkdtempSync(join(tmpdir(), 'wayward-bench-coorbital-'));
  try {
    if (o.parts.includes('predict')) await benchPredict(dir, o.rows, o.seed);
    if (o.parts.includes('confirm')) benchConfirm(o.confirmYears);
    if (o.parts.includes('near-earth')) await benchNearEarth(dir, o.nearEarthRows, o.zoneBodies, o.years, o.nearEarthSeed, o.threads);
    console.log(`load average at the end ${load()}`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
