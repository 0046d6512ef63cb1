/**
 * Parallel prefill of a Chebyshev cache over the direct VSOP87/ELP series: bodies are
 * spread over worker threads (node:worker_threads), each thread fills its bodies in its own
 * cache (ephemerisFillWorker.ts) and the tables are merged with importBody. Every segment's
 * coefficients come from the same deterministic code whichever thread runs it, so the result
 * is bit-identical for any thread count (tested).
 *
 * Balance: bodies go to the least-loaded thread, heaviest first (longest-processing-time
 * rule; Graham 1969, SIAM J. Appl. Math. 17, 416), with the relative costs measured for the
 * bulk fill over 1 000 years (scripts/bench/ephemeris.ts), per body in EPHEMERIS_BODIES order.
 */
import { availableParallelism } from 'node:os';
import type { EphemerisCache } from './ephemerisCache.js';
import type { CacheFillJob } from './ephemerisFillWorker.js';
import type { CacheBodyTable } from './ephemerisCacheTable.js';
import { EPHEMERIS_BODIES, ephemerisBodyIndex } from './ephemerisBody.js';
import { Vsop87Ephemeris } from './vsop87Ephemeris.js';
import { startSiblingWorker } from '../moduleWorker.js';
import type { EphemerisBody } from '../types.js';

/** Relative bulk-fill cost per span, EPHEMERIS_BODIES order (measured CPU seconds per 1 000 years × 10). */
const RELATIVE_COST = [15, 3.5, 6, 5, 3.3, 4, 4, 3, 25];

/** Bodies per thread by the longest-processing-time rule. */
export function assignBodies(bodies: readonly EphemerisBody[], threads: number): EphemerisBody[][] {
  const groups: EphemerisBody[][] = Array.from({ length: threads }, () => []);
  const load = new Float64Array(threads);
  const order = [...bodies].sort((a, b) => RELATIVE_COST[ephemerisBodyIndex(b)] - RELATIVE_COST[ephemerisBodyIndex(a)]);
  for (const body of order) {
    let t = 0;
    for (let k = 1; k < threads; k++) if (load[k] < load[t]) t = k;
    groups[t].push(body);
    load[t] += RELATIVE_COST[ephemerisBodyIndex(body)];
  }
  return groups.filter((g) => g.length > 0);
}

function runJob(job: CacheFillJob): Promise<CacheBodyTable[]> {
  return new Promise((resolve, reject) => {
    const worker = startSiblingWorker(import.meta.url, 'ephemerisFillWorker', job);
    let done = false;
    worker.once('message', (tables: CacheBodyTable[]) => {
      done = true;
      resolve(tables);
      void worker.terminate();
    });
    worker.once('error', (e) => reject(new Error(`cache fill thread for ${job.bodies.join(', ')} failed: ${e.message}`)));
    worker.once('exit', (code) => {
      if (!done) reject(new Error(`cache fill thread for ${job.bodies.join(', ')} exited (code ${code}) without its tables`));
    });
  });
}

/**
 * Fill [startJdTDB, endJdTDB] of `cache` for `bodies` using up to `threads` worker threads
 * (default: the machine's available parallelism). Falls back to cache.prefill in this thread
 * for one thread, or when the cache's source is not the direct VSOP87/ELP series (a thread
 * can only rebuild that source from its options).
 */
export async function prefillParallel(
  cache: EphemerisCache, startJdTDB: number, endJdTDB: number,
  bodies: readonly EphemerisBody[] = EPHEMERIS_BODIES, threads = availableParallelism(),
): Promise<void> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`prefillParallel: threads must be a positive integer, got ${threads}`);
  const source = cache.source;
  if (threads === 1 || !(source instanceof Vsop87Ephemeris)) {
    cache.prefill(startJdTDB, endJdTDB, bodies);
    return;
  }
  if (!(startJdTDB <= endJdTDB)) throw new RangeError(`prefillParallel: bad range [${startJdTDB}, ${endJdTDB}]`);
  const groups = assignBodies(bodies, threads);
  const jobs = groups.map((g): CacheFillJob => ({
    source: { startJdTDB: source.startJdTDB, endJdTDB: source.endJdTDB },
    cache: cache.options, startJdTDB, endJdTDB, bodies: g,
  }));
  const results = await Promise.all(jobs.map(runJob));
  for (const tables of results) for (const t of tables) cache.importBody(t);
}
