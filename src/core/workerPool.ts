/**
 * Independent tasks spread over worker threads, results in input order, so the output is the
 * same for any number of threads. Tasks are handed out one at a time as workers come free
 * (the costs of tasks differ a lot: a body near a planet takes many more integrator steps).
 * The worker module answers with serveWorkerTasks (./workerTasks.ts); it is started with
 * startSiblingWorker, so it sits beside the caller's file.
 */
import type { Worker } from 'node:worker_threads';
import { startSiblingWorker } from './moduleWorker.js';

export interface WorkerPoolOptions {
  threads: number; // ≥ 1
  workerData?: unknown; // given to every worker once (e.g. a filled ephemeris table)
}

/** A message from a worker: the result of task `id`, or its error message. */
export interface WorkerReply<O> {
  id: number;
  output?: O;
  error?: string;
}

/**
 * Run `inputs` through the worker module `baseName` beside `callerUrl`, `threads` at a time.
 * Rejects with the first task error (naming the task) after stopping every worker.
 */
export async function mapInWorkers<I, O>(callerUrl: string, baseName: string, inputs: readonly I[], opts: WorkerPoolOptions): Promise<O[]> {
  if (!Number.isInteger(opts.threads) || opts.threads < 1) throw new RangeError(`mapInWorkers: threads must be a positive integer, got ${opts.threads}`);
  const results: O[] = new Array(inputs.length);
  if (inputs.length === 0) return results;
  const workers: Worker[] = [];
  let next = 0;
  let finished = 0;
  try {
    await new Promise<void>((resolve, reject) => {
      const feed = (w: Worker) => {
        if (next < inputs.length) {
          const id = next++;
          w.postMessage({ id, input: inputs[id] });
        }
      };
      const count = Math.min(opts.threads, inputs.length);
      for (let t = 0; t < count; t++) {
        const w = startSiblingWorker(callerUrl, baseName, opts.workerData ?? null);
        workers.push(w);
        w.on('message', (reply: WorkerReply<O>) => {
          if (reply.error !== undefined) return reject(new Error(`task ${reply.id} failed in a worker: ${reply.error}`));
          results[reply.id] = reply.output as O;
          if (++finished === inputs.length) return resolve();
          feed(w);
        });
        w.once('error', (e) => reject(new Error(`worker ${baseName} failed: ${e.message}`)));
        w.once('exit', (code) => {
          if (finished < inputs.length) reject(new Error(`worker ${baseName} exited (code ${code}) with tasks unfinished`));
        });
        feed(w);
      }
    });
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  return results;
}
