/**
 * The worker side of mapInWorkers (./workerPool.ts): answer each task message with the
 * handler's result, or with the error's message. Call it at the top level of a worker
 * module; outside a worker thread it does nothing.
 */
import { parentPort } from 'node:worker_threads';
import type { WorkerReply } from './workerPool.js';

export function serveWorkerTasks<I, O>(handle: (input: I) => O, transfer?: (output: O) => ArrayBuffer[]): void {
  const port = parentPort;
  if (port === null) return;
  port.on('message', (msg: { id: number; input: I }) => {
    let reply: WorkerReply<O>;
    try {
      reply = { id: msg.id, output: handle(msg.input) };
    } catch (err) {
      reply = { id: msg.id, error: err instanceof Error ? `${err.message}` : String(err) };
    }
    port.postMessage(reply, reply.output !== undefined && transfer ? transfer(reply.output) : []);
  });
}
