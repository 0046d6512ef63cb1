/**
 * Worker-thread side of `check`'s fits (checkFitter.ts): holds the check's observations, σ and
 * its own planets' cache (same options as the main thread's), takes the main thread's filled
 * tables once, then answers each fit request with fitHere's outcome (an OrbitFitError as its
 * fields, to cross the thread boundary).
 */
import { workerData } from 'node:worker_threads';
import { EphemerisCache } from '../../core/ephemeris/ephemerisCache.js';
import { Vsop87Ephemeris } from '../../core/ephemeris/vsop87Ephemeris.js';
import { serveWorkerTasks } from '../../core/workerTasks.js';
import { orbitFitErrorRecord } from '../orbitFitTypes.js';
import { fitHere, type CheckFitInputs, type CheckWorkerData, type CheckWorkerTask, type FitOutcomeRecord } from './checkFitter.js';

if (workerData !== null && typeof workerData === 'object' && 'observations' in workerData && 'sigmas' in workerData) {
  const data = workerData as CheckWorkerData;
  const cache = data.cache === null ? undefined : new EphemerisCache(new Vsop87Ephemeris(), data.cache);
  const inputs: CheckFitInputs = { observations: data.observations, sites: data.sites, sigmas: data.sigmas, ephemeris: cache };
  serveWorkerTasks((task: CheckWorkerTask): FitOutcomeRecord | null => {
    if (task.kind === 'tables') {
      if (cache !== undefined) for (const t of task.tables) cache.importBody(t);
      return null;
    }
    const o = fitHere(inputs, task.request);
    return o.error === undefined ? { fit: o.fit } : { error: orbitFitErrorRecord(o.error) };
  });
}
