/**
 * Worker-thread entry of ./orbitExportParts.ts: reads the part named in its workerData
 * (./orbitExportPart.ts) and posts each batch as it fills, its numbers' buffer transferred,
 * then `{ end }` (or `{ error }` with the message of anything unexpected). Not re-exported
 * by index.ts: importing it outside a worker does nothing.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { readOrbitExportPart, type OrbitExportPartSpec } from './orbitExportPart.js';

if (parentPort !== null) {
  const port = parentPort;
  try {
    const end = readOrbitExportPart(workerData as OrbitExportPartSpec, (batch) => port.postMessage({ batch }, [batch.numbers]));
    port.postMessage({ end });
  } catch (err) {
    port.postMessage({ error: err instanceof Error ? err.message : String(err) });
  }
}
