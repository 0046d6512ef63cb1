/**
 * Worker-thread side of the co-orbital confirmations (coorbitalConfirm.ts): rebuilds the
 * planets' Chebyshev cache from the tables the main thread filled, once, then integrates
 * each body it is sent. confirmTask is also what a single-threaded run calls directly, with
 * the cache the main thread filled.
 */
import { workerData } from 'node:worker_threads';
import type { PlanetName } from '../core/constants.js';
import { confirmCoorbital } from '../core/coorbital/confirm.js';
import type { CoorbitalHistory } from '../core/coorbital/types.js';
import { EphemerisCache, type EphemerisCacheOptions } from '../core/ephemeris/ephemerisCache.js';
import type { CacheBodyTable } from '../core/ephemeris/ephemerisCacheTable.js';
import { Vsop87Ephemeris } from '../core/ephemeris/vsop87Ephemeris.js';
import { serveWorkerTasks } from '../core/workerTasks.js';
import type { Ephemeris } from '../core/types.js';

/** One body to integrate: heliocentric J2000-ecliptic state (au, au/day) at its epoch. */
export interface ConfirmTask {
  state: number[];
  epochJdTDB: number;
  planet: PlanetName;
  windowYears: number;
  series: boolean; // also return the thinned series for plots (CoorbitalHistory.series)
}

/** The planets, filled: the cache's options and one table per planet system body. */
export interface ConfirmWorkerData {
  cache: EphemerisCacheOptions;
  tables: CacheBodyTable[];
}

const built = new WeakMap<ConfirmWorkerData, EphemerisCache>();

function ephemerisOf(data: ConfirmWorkerData): EphemerisCache {
  let cache = built.get(data);
  if (!cache) {
    cache = new EphemerisCache(new Vsop87Ephemeris(), data.cache);
    for (const t of data.tables) cache.importBody(t);
    built.set(data, cache);
  }
  return cache;
}

/** One body's history with the planets of `ephemeris` (filled over the task's window). */
export function confirmTask(task: ConfirmTask, ephemeris: Ephemeris): CoorbitalHistory {
  return confirmCoorbital(Float64Array.from(task.state), task.epochJdTDB, task.planet, {
    windowYears: task.windowYears, ephemeris, series: task.series,
  });
}

if (workerData !== null && typeof workerData === 'object' && 'tables' in workerData) {
  const data = workerData as ConfirmWorkerData;
  serveWorkerTasks((task: ConfirmTask) => confirmTask(task, ephemerisOf(data)));
}
