/**
 * Worker-thread side of the shared k-nearest search (kNearestThreads.ts): each job names a
 * grid and output rows in shared memory; the worker claims chunks of sorted positions from a
 * shared counter, fills their rows with kNearestSortedRange (kNearest.ts), the same function
 * the calling thread runs on the chunks it claims, and then counts itself done.
 */
import { parentPort, workerData, type MessagePort } from 'node:worker_threads';
import { kNearestSortedRange } from './kNearest.js';
import type { KNearestGrid } from './kNearestGrid.js';

/** Marks this module's workerData (the module is also imported by the main thread). */
export interface KNearestWorkerData { kNearestWorker: true }

/** Slots of the shared control array. */
export const NEXT_CHUNK = 0; // next chunk to claim
export const WORKERS_DONE = 1; // workers finished with the job
export const FAILED = 2; // 1 when a worker failed (its message is on its error port)
export const WORKER_CLAIMS = 3; // claims the workers took
export const CONTROL_SLOTS = 4;

/** One search over shared memory. */
export interface KNearestJob {
  grid: KNearestGrid; // every array on shared memory
  k: number;
  m: number; // rows of input indices below m
  chunk: number; // sorted positions per claim
  d2: Float64Array; // shared output rows, squared distances
  idx: Int32Array; // shared output rows, input indices
  control: Int32Array; // shared: NEXT_CHUNK, WORKERS_DONE, FAILED
}

/** Claims chunks until none is left, filling their rows; returns how many it took. */
export function runClaims(job: KNearestJob): number {
  const n = job.grid.count;
  for (let claims = 0; ; claims++) {
    const first = Atomics.add(job.control, NEXT_CHUNK, 1) * job.chunk;
    if (first >= n) return claims;
    kNearestSortedRange(job.grid, job.k, job.m, first, Math.min(n, first + job.chunk), job.d2, job.idx);
  }
}

if (workerData !== null && typeof workerData === 'object' && 'kNearestWorker' in workerData && parentPort !== null) {
  const port = parentPort;
  let errors: MessagePort | null = null; // the first message hands the port errors are reported on
  port.on('message', (msg: KNearestJob | { errors: MessagePort }) => {
    if ('errors' in msg) {
      errors = msg.errors;
      port.postMessage('ready');
      return;
    }
    try {
      Atomics.add(msg.control, WORKER_CLAIMS, runClaims(msg));
    } catch (err) {
      errors?.postMessage(err instanceof Error ? err.message : String(err));
      Atomics.store(msg.control, FAILED, 1);
    }
    Atomics.add(msg.control, WORKERS_DONE, 1);
    Atomics.notify(msg.control, WORKERS_DONE);
  });
}
