/**
 * Worker-thread entry of ./sha256Thread.ts: hashes the chunks it is sent, in order (SHA-256,
 * FIPS 180-4, through node:crypto), and on `null` posts the hex digest. Not re-exported by
 * index.ts: importing it outside a worker does nothing.
 */
import { createHash } from 'node:crypto';
import { parentPort } from 'node:worker_threads';

if (parentPort !== null) {
  const port = parentPort;
  const hash = createHash('sha256');
  port.on('message', (chunk: ArrayBuffer | null) => {
    if (chunk !== null) hash.update(new Uint8Array(chunk));
    else {
      port.postMessage(hash.digest('hex'));
      port.close();
    }
  });
}
