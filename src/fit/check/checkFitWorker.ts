/**
 * Worker-thread side of `check`'s fits (checkFitter.ts): holds the check's observations, σ and
 * its own planets' cache (same options as the main thread's), takes the main thread's filled
 * tables with its first batch, then for each batch fits the requests it takes from the shared
 * counter and answers with their outcomes by index (an OrbitFitError as its fields, to cross
 * the thread boundary).
 */
import { workerData } from 'node:worker_threads';
import { EphemerisCache } from '../../core/ephemeris/ephemerisCache.js';
import { Vsop87Ephemeris } from '../../core/ephemeris/vsop87Ephemeris.js';
import { serveWorkerTasks } from '../../core/workerTasks.js';
import { orbitFitErrorRecord } from '../orbitFitTypes.js';
import { fitHere, type CheckFitInputs, type CheckWorkerData, type CheckWorkerTask, type WorkerBatchDone } from './checkFitter.js';

if (workerData !== null && typeof workerData === 'object' && 'observations' in workerData && 'sigmas' in workerData) {
  const data = workerData as CheckWorkerData;
  const cache = data.cache === null ? undefined : new EphemerisCache(new Vsop87Ephemeris(), data.cache);
  const inputs: CheckFitInputs = { observations: data.observations, sites: data.sites, sigmas: data.sigmas, ephemeris: cache };
  serveWorkerTasks((task: CheckWorkerTask): WorkerBatchDone => {
    if (task.tables !== null && cache !== undefined) for (const t of task.tables) cache.importBody(t);
    const done: WorkerBatchDone = [];
    const n = task.requests.length;
    for (let id = Atomics.add(task.counter, 0, 1); id < n; id = Atomics.add(task.counter, 0, 1)) {
      const o = fitHere(inputs, task.requests[id]);
      done.push([id, o.error === undefined ? { fit: o.fit } : { error: orbitFitErrorRecord(o.error) }]);
    }
    return done;
  });
}
