/**
 * Worker-thread side of the co-orbital predictions (coorbitalPredict.ts): each task is a
 * chunk of bodies, predicted in order with one workspace per thread. predictChunk is also
 * what a single-threaded run calls directly, so both give the same numbers.
 */
import { workerData } from 'node:worker_threads';
import { createTwoStageWorkspace, predictCoorbitalTwoStage, type TwoStageWorkspace } from '../core/coorbital/predictTwoStage.js';
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

/**
 * The grids and buffers, built on first use and kept for the thread's later chunks (scratch
 * only: each body's prediction depends on its own inputs alone).
 */
let workspace: TwoStageWorkspace | null = null;

/** Each body through the two-stage prediction (core/coorbital/predictTwoStage.ts), in order. */
export function predictChunk(chunk: readonly PredictInput[]): CoorbitalPrediction[] {
  workspace ??= createTwoStageWorkspace();
  const ws = workspace;
  return chunk.map((b) => predictCoorbitalTwoStage(b.shape, b.x, b.phiRad, b.mu, b.planetPeriodDays, ws));
}

if (workerData !== null && typeof workerData === 'object' && 'predictWorker' in workerData) {
  serveWorkerTasks((chunk: PredictInput[]) => predictChunk(chunk));
}
