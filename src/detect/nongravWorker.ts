/**
 * Worker-thread side of the `nongrav` detector: checks each body it is sent (checkNongravBody)
 * and answers in mapInWorkers' reply form (src/core/workerPool.ts). The check is asynchronous,
 * so the reply is posted when it settles (serveWorkerTasks answers synchronous handlers only).
 */
import { parentPort } from 'node:worker_threads';
import type { WorkerReply } from '../core/workerPool.js';
import { checkNongravBody, type NongravOutcome, type NongravTask } from './nongravCheck.js';

const port = parentPort;
if (port !== null) {
  port.on('message', (msg: { id: number; input: NongravTask }) => {
    checkNongravBody(msg.input).then(
      (output) => port.postMessage({ id: msg.id, output } satisfies WorkerReply<NongravOutcome>),
      (err: unknown) => port.postMessage({ id: msg.id, error: err instanceof Error ? err.message : String(err) } satisfies WorkerReply<NongravOutcome>),
    );
  });
}
