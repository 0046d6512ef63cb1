/**
 * Which screened bodies the co-orbital detector integrates, and the integrations themselves:
 * a body is confirmed when asked for (predicted resonant, or every body for the `coorbitals`
 * command), its orbit can be integrated, its window lies in the ephemeris and the budget
 * still pays for it; the others keep their prediction and say why. Bodies are taken in a
 * fixed order (firmest prediction first, then catalogue row), so the set confirmed and every
 * output are the same for any thread count. The planets are filled once for the union of the
 * windows, in parallel, and handed to every worker thread as tables.
 */
import { DAYS_PER_JULIAN_YEAR, GM_SUN_AU3_PER_DAY2 } from '../core/constants.js';
import type { CoorbitalHistory, CoorbitalPrediction } from '../core/coorbital/types.js';
import { createEphemeris } from '../core/ephemeris/ephemeris.js';
import type { EphemerisCache } from '../core/ephemeris/ephemerisCache.js';
import { PLANET_SYSTEM_BODIES } from '../core/ephemeris/ephemerisBody.js';
import { DYNAMICS_FIT_TOLERANCE_AU } from '../core/ephemeris/ephemerisCacheOptions.js';
import { prefillParallel } from '../core/ephemeris/ephemerisParallelFill.js';
import { VSOP87_DEFAULT_END_JD_TDB, VSOP87_DEFAULT_START_JD_TDB } from '../core/ephemeris/vsop87Ephemeris.js';
import { semimajorElementsToState } from '../core/orbit/twoBody.js';
import { mapInWorkers } from '../core/workerPool.js';
import { qualityBit, type Catalogue } from '../clean/types.js';
import type { CoorbitalBodyResult } from './coorbitalCandidate.js';
import { bodiesWithinBudget, type CoorbitalOptions } from './coorbitalOptions.js';
import type { ZoneEntry } from './coorbitalZone.js';
import { confirmTask, type ConfirmTask, type ConfirmWorkerData } from './coorbitalWorker.js';

/** An orbit from a few days of one opposition is too poor to integrate for centuries. */
const TOO_POOR = qualityBit('single-opposition') | qualityBit('short-arc');

/** Why an entry is not integrated, or '' when it should be. */
function skipReason(cat: Catalogue, e: ZoneEntry, p: CoorbitalPrediction, opts: CoorbitalOptions): string {
  if (opts.confirm === 'resonant' && p.state === 'passing') return 'predicted passing';
  if ((cat.quality[e.index] & TOO_POOR) === TOO_POOR) return 'orbit too poor to integrate (single opposition, short arc)';
  const w = opts.windowYears * DAYS_PER_JULIAN_YEAR;
  if (e.epochJdTDB - w < VSOP87_DEFAULT_START_JD_TDB || e.epochJdTDB + w > VSOP87_DEFAULT_END_JD_TDB) {
    return 'N-body window outside the ephemeris span (years 1000–3000)';
  }
  return '';
}

/** Firmest prediction first (separatrix margin, NaN last), then catalogue row. */
function byPriority(entries: readonly ZoneEntry[], predictions: readonly CoorbitalPrediction[]) {
  return (a: number, b: number): number => {
    const ma = predictions[a].separatrixMargin, mb = predictions[b].separatrixMargin;
    const fa = Number.isFinite(ma) ? ma : -1, fb = Number.isFinite(mb) ? mb : -1;
    return fb - fa || entries[a].index - entries[b].index;
  };
}

function taskOf(cat: Catalogue, e: ZoneEntry, windowYears: number, series: boolean): ConfirmTask {
  const k = e.index;
  const state = new Float64Array(6);
  semimajorElementsToState(cat.a[k], cat.e[k], cat.i[k], cat.node[k], cat.peri[k], cat.meanAnomaly[k], GM_SUN_AU3_PER_DAY2, state);
  return { state: Array.from(state), epochJdTDB: e.epochJdTDB, planet: e.planet, windowYears, series };
}

/** The planets over the union of the windows, filled in parallel. */
async function filledPlanets(tasks: readonly ConfirmTask[], windowYears: number, threads: number): Promise<EphemerisCache> {
  const w = windowYears * DAYS_PER_JULIAN_YEAR;
  const start = Math.min(...tasks.map((t) => t.epochJdTDB)) - w - 2;
  const end = Math.max(...tasks.map((t) => t.epochJdTDB)) + w + 2;
  const cache = createEphemeris({ startJdTDB: start, endJdTDB: end, fitToleranceAu: DYNAMICS_FIT_TOLERANCE_AU });
  await prefillParallel(cache, start, end, PLANET_SYSTEM_BODIES, threads);
  return cache;
}

/** The filled planets as tables a worker thread rebuilds its cache from. */
function workerData(cache: EphemerisCache): ConfirmWorkerData {
  return { cache: cache.options, tables: PLANET_SYSTEM_BODIES.map((b) => cache.exportBody(b)) };
}

/** Every entry's result, in entry order. */
export async function confirmEntries(
  cat: Catalogue, entries: readonly ZoneEntry[], predictions: readonly CoorbitalPrediction[], opts: CoorbitalOptions,
): Promise<CoorbitalBodyResult[]> {
  const reasons = entries.map((e, k) => skipReason(cat, e, predictions[k], opts));
  const queue = entries.map((_, k) => k).filter((k) => reasons[k] === '').sort(byPriority(entries, predictions));
  const paid = bodiesWithinBudget(opts);
  for (const k of queue.slice(paid)) reasons[k] = 'beyond the N-body budget (--coorbital-budget)';
  const chosen = queue.slice(0, paid);
  const tasks = chosen.map((k) => taskOf(cat, entries[k], opts.windowYears, opts.series ?? false));
  const histories: CoorbitalHistory[] = [];
  if (tasks.length > 0) {
    const planets = await filledPlanets(tasks, opts.windowYears, opts.threads);
    if (opts.threads === 1) histories.push(...tasks.map((t) => confirmTask(t, planets)));
    else histories.push(...await mapInWorkers<ConfirmTask, CoorbitalHistory>(import.meta.url, 'coorbitalWorker', tasks, { threads: opts.threads, workerData: workerData(planets) }));
  }
  const byEntry = new Map<number, CoorbitalHistory>(chosen.map((k, j) => [k, histories[j]]));
  return entries.map((entry, k) => ({
    entry, prediction: predictions[k], history: byEntry.get(k) ?? null, unconfirmedReason: byEntry.has(k) ? '' : reasons[k],
  }));
}

