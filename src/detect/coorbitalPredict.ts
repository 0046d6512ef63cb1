/**
 * The averaged-problem prediction for every screened body (core/coorbital), in entry order.
 * The bodies are cut into chunks of a fixed size (not depending on the thread count) and the
 * chunks spread over worker threads when there are several; each body's prediction depends
 * only on its own inputs, so the results are the same for any thread count.
 */
import type { CoorbitalPrediction } from '../core/coorbital/types.js';
import { planetKeplerGmAu3PerDay2 } from '../core/coorbital/resonantAngle.js';
import { mapInWorkers } from '../core/workerPool.js';
import { planetMassRatio, type ZoneEntry } from './coorbitalZone.js';
import { predictChunk, type PredictInput, type PredictWorkerData } from './coorbitalPredictWorker.js';

/**
 * Bodies per worker task: at about 0.3–0.5 ms a body (the two-stage prediction) a chunk takes
 * 0.1–0.2 s, long against the cost of a message, short enough to keep two threads evenly
 * loaded (common practice).
 */
export const PREDICT_CHUNK_BODIES = 400;

/** Osculating period of the planet (days) from its a at the body's epoch, with GM_sun + GM_planet (Kepler's third law). */
function planetPeriodDaysOf(e: ZoneEntry): number {
  return 2 * Math.PI * Math.sqrt(e.planetAAu ** 3 / planetKeplerGmAu3PerDay2(e.planet));
}

function inputOf(e: ZoneEntry): PredictInput {
  return { shape: e.shape, x: e.x, phiRad: e.phiRad, mu: planetMassRatio(e.planet), planetPeriodDays: planetPeriodDaysOf(e) };
}

/** Every entry's prediction, in entry order, on `threads` worker threads (1: this thread). */
export async function predictEntries(entries: readonly ZoneEntry[], threads = 1): Promise<CoorbitalPrediction[]> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`predictEntries: threads must be a positive integer, got ${threads}`);
  const inputs = entries.map(inputOf);
  if (threads === 1 || inputs.length <= PREDICT_CHUNK_BODIES) return predictChunk(inputs);
  const chunks: PredictInput[][] = [];
  for (let k = 0; k < inputs.length; k += PREDICT_CHUNK_BODIES) chunks.push(inputs.slice(k, k + PREDICT_CHUNK_BODIES));
  const data: PredictWorkerData = { predictWorker: true };
  const out = await mapInWorkers<PredictInput[], CoorbitalPrediction[]>(import.meta.url, 'coorbitalPredictWorker', chunks, { threads, workerData: data });
  return out.flat();
}
