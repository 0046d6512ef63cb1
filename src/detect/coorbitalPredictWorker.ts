/**
 * Worker-thread side of the co-orbital predictions (coorbitalPredict.ts): each task is a
 * chunk of bodies, predicted in order with one workspace per thread. predictChunk is also
 * what a single-threaded run calls directly, so both give the same numbers.
 */
import { workerData } from 'node:worker_threads';
import { createCoorbitalWorkspace, predictCoorbital } from '../core/coorbital/predictCoorbital.js';
import type { AveragedOrbitShape, CoorbitalPrediction } from '../core/coorbital/types.js';
import { serveWorkerTasks } from '../core/workerTasks.js';

/** One body's inputs to the averaged problem. */
export interface PredictInput {
  shape: AveragedOrbitShape;
  x: number; // δa/aP
  phiRad: number;
  mu: number; // planet mass ratio
  planetPeriodDays: number;
}

/** Marks the predicting workers' workerData (the module is also imported by the main thread). */
export interface PredictWorkerData { predictWorker: true }

/** The grid and buffers, built on first use and kept for the thread's later chunks (scratch only). */
let workspace: ReturnType<typeof createCoorbitalWorkspace> | null = null;

export function predictChunk(chunk: readonly PredictInput[]): CoorbitalPrediction[] {
  workspace ??= createCoorbitalWorkspace();
  const ws = workspace;
  return chunk.map((b) => predictCoorbital(b.shape, b.x, b.phiRad, b.mu, b.planetPeriodDays, { workspace: ws }));
}

if (workerData !== null && typeof workerData === 'object' && 'predictWorker' in workerData) {
  serveWorkerTasks((chunk: PredictInput[]) => predictChunk(chunk));
}
