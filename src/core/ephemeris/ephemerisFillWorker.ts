/**
 * Worker-thread entry of the parallel cache fill (ephemerisParallelFill.ts): rebuilds the
 * direct VSOP87/ELP source and an empty cache with the same options, fills its bodies and
 * posts their tables back (buffers transferred, not copied). Not re-exported by index.ts:
 * importing it outside a worker does nothing.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { Vsop87Ephemeris } from './vsop87Ephemeris.js';
import type { Vsop87EphemerisOptions } from './vsop87Ephemeris.js';
import { EphemerisCache } from './ephemerisCache.js';
import type { EphemerisCacheOptions } from './ephemerisCache.js';
import type { EphemerisBody } from '../types.js';

/** What one worker is asked to fill. */
export interface CacheFillJob {
  readonly source: Vsop87EphemerisOptions;
  readonly cache: EphemerisCacheOptions;
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  readonly bodies: readonly EphemerisBody[];
}

if (parentPort !== null && workerData !== null && typeof workerData === 'object' && 'bodies' in workerData) {
  const job = workerData as CacheFillJob;
  const cache = new EphemerisCache(new Vsop87Ephemeris(job.source), job.cache);
  cache.prefill(job.startJdTDB, job.endJdTDB, job.bodies);
  const tables = job.bodies.map((body) => cache.exportBody(body));
  parentPort.postMessage(tables, tables.flatMap((t) => [t.coeffs.buffer as ArrayBuffer, t.built.buffer as ArrayBuffer]));
}
