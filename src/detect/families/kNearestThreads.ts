/**
 * The k-nearest search shared with worker threads (kNearestWorker.ts), behind the same
 * synchronous calls as the serial one (kNearestSearch.ts), so the isolation scores and their
 * null calibration run unchanged. A search copies the grid into shared memory, hands every
 * worker the job, and claims chunks of sorted positions itself alongside them from one shared
 * counter; then it blocks on a shared counter (Atomics.wait) until every worker is done. Each
 * row depends on the grid and its own point alone (kNearestSortedRange), so the rows are the
 * serial ones bit for bit, whichever thread computed them and in whatever order.
 */
import { MessageChannel, receiveMessageOnPort, type MessagePort, type Worker } from 'node:worker_threads';
import { startSiblingWorker } from '../../core/moduleWorker.js';
import { checkK, checkOfFirst, finishKNearest, type KNearestResult } from './kNearest.js';
import type { KNearestGrid } from './kNearestGrid.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import { CONTROL_SLOTS, FAILED, runClaims, WORKER_CLAIMS, WORKERS_DONE, type KNearestJob, type KNearestWorkerData } from './kNearestWorker.js';

/**
 * Sorted positions per claim, at most: at 3–5 µs a query (1.5 million bodies, 4 a cell) a claim
 * takes 10–20 ms, long against an atomic add, short enough that the threads end together; a
 * small grid is cut into about 8 claims a thread, none under 64 positions (our choice).
 */
export const KNEAREST_CHUNK_POSITIONS = 4096;
const CLAIMS_PER_THREAD = 8;
const MIN_CHUNK_POSITIONS = 64;

export interface KNearestThreadOptions {
  chunkPositions?: number; // sorted positions per claim; default from the grid's size (above)
  callerClaims?: boolean; // the calling thread takes claims too (default true; false: the workers do all, for tests)
}

/** How long one wait lasts before the workers are checked for having stopped (ms; our choice). */
const WAIT_SLICE_MS = 1000;

export interface ThreadedKNearest extends KNearestSearch {
  readonly threads: number; // this thread and threads − 1 workers
  workerClaims(): number; // claims the workers took in the searches so far (the rest: this thread)
  close(): Promise<void>; // stops the workers
}

/** A search on `threads` threads (this one included); 1: the serial search, no worker. */
export async function startKNearestThreads(threads: number, options: KNearestThreadOptions = {}): Promise<ThreadedKNearest> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`startKNearestThreads: threads must be a positive integer, got ${threads}`);
  const fixedChunk = options.chunkPositions;
  if (fixedChunk !== undefined && !(Number.isInteger(fixedChunk) && fixedChunk >= 1)) throw new RangeError(`startKNearestThreads: chunkPositions must be a positive integer, got ${fixedChunk}`);
  if (threads === 1) return { ...SERIAL_KNEAREST, threads, workerClaims: () => 0, close: async () => {} };
  const data: KNearestWorkerData = { kNearestWorker: true };
  const workers: Worker[] = [];
  const errorPorts: MessagePort[] = [];
  try {
    for (let t = 1; t < threads; t++) {
      const w = startSiblingWorker(import.meta.url, 'kNearestWorker', data);
      workers.push(w);
      const channel = new MessageChannel();
      errorPorts.push(channel.port1);
      await new Promise<void>((resolve, reject) => {
        w.once('message', () => resolve());
        w.once('error', (e) => reject(new Error(`k-nearest worker failed to start: ${e.message}`)));
        w.postMessage({ errors: channel.port2 }, [channel.port2]);
      });
    }
  } catch (err) {
    await Promise.all(workers.map((w) => w.terminate()));
    throw err;
  }
  let claimsByWorkers = 0;
  const run = (grid: KNearestGrid, k: number, m: number): KNearestResult => {
    const shared = sharedGrid(grid);
    const chunk = fixedChunk ?? Math.max(MIN_CHUNK_POSITIONS, Math.min(KNEAREST_CHUNK_POSITIONS, Math.ceil(grid.count / (CLAIMS_PER_THREAD * threads))));
    const job: KNearestJob = {
      grid: shared, k, m, chunk,
      d2: new Float64Array(new SharedArrayBuffer(8 * m * k)), idx: new Int32Array(new SharedArrayBuffer(4 * m * k)),
      control: new Int32Array(new SharedArrayBuffer(4 * CONTROL_SLOTS)),
    };
    for (const w of workers) w.postMessage(job);
    if (options.callerClaims ?? true) runClaims(job);
    waitForWorkers(job.control, workers);
    claimsByWorkers += Atomics.load(job.control, WORKER_CLAIMS);
    if (Atomics.load(job.control, FAILED) !== 0) {
      const messages = errorPorts.map((p) => receiveMessageOnPort(p)?.message).filter((x) => x !== undefined);
      throw new Error(`k-nearest search failed in a worker thread: ${messages.join('; ')}`);
    }
    return finishKNearest(k, job.d2, job.idx);
  };
  return {
    threads,
    workerClaims: () => claimsByWorkers,
    all(grid, k) {
      checkK(k, grid.count - 1);
      return run(grid, k, grid.count);
    },
    ofFirst(grid, inputXyz, m, k) {
      checkK(k, grid.count - 1);
      checkOfFirst(grid, inputXyz, m);
      return run(grid, k, m);
    },
    async close() {
      await Promise.all(workers.map((w) => w.terminate()));
      for (const p of errorPorts) p.close();
    },
  };
}

/** Blocks until every worker has counted itself done; throws if one has stopped running. */
function waitForWorkers(control: Int32Array, workers: readonly Worker[]): void {
  for (;;) {
    const done = Atomics.load(control, WORKERS_DONE);
    if (done >= workers.length) return;
    if (Atomics.wait(control, WORKERS_DONE, done, WAIT_SLICE_MS) === 'timed-out' && workers.some((w) => w.threadId === -1)) {
      throw new Error('k-nearest search: a worker thread stopped before finishing its share');
    }
  }
}

/** The grid with its per-point arrays copied into shared memory. */
function sharedGrid(g: KNearestGrid): KNearestGrid {
  const cellStart = new Uint32Array(new SharedArrayBuffer(g.cellStart.byteLength));
  cellStart.set(g.cellStart);
  const order = new Uint32Array(new SharedArrayBuffer(g.order.byteLength));
  order.set(g.order);
  const sortedXyz = new Float64Array(new SharedArrayBuffer(g.sortedXyz.byteLength));
  sortedXyz.set(g.sortedXyz);
  return { count: g.count, cellSize: g.cellSize, origin: g.origin, dims: g.dims, cellStart, order, sortedXyz };
}
