/**
 * Worker-thread side of the families stage's shared work (familiesThreads.ts). A job lives in
 * shared memory; every thread on it, the calling one included, claims pieces from one shared
 * counter and runs them with the same pure function a single thread runs:
 *   - 'k-nearest': chunks of grid positions, filled by kNearestSortedRange (kNearest.ts);
 *   - 'levels': one QRL background each, its level by levelOrNaN (qrlCutoff.ts);
 *   - 'null-replicates': one null catalogue each, drawn from its own seeded stream and scored by
 *     nullReplicateScores (outlierNullReplicate.ts) with this thread's own k-nearest searches;
 *   - 'proper': blocks of rows of one epoch, their proper elements by properElementsColumns
 *     (core/secular) with the epoch's model, which each thread builds at its first block.
 * Each finished piece is counted (PIECES_DONE), so the calling thread goes on once the pieces
 * are done, without waiting for a worker still busy with an earlier job to reach this one.
 * One job is a worker's alone: 'cluster', the whole clustering (familiesCluster.ts, its levels
 * on this thread), claimed by one worker and its result posted on that worker's result port
 * while the calling thread does other work; workers join the calling thread's jobs once it is done.
 * A worker counts itself done with a job when it has handled it.
 */
import { parentPort, workerData, type MessagePort } from 'node:worker_threads';
import { clusterFamilies, type ClusteringOptions } from '../familiesCluster.js';
import { planetarySecularModel } from '../../core/secular/planetarySecularModel.js';
import { properElementsColumns, type OsculatingColumns, type ProperColumns } from '../../core/secular/properElementsColumns.js';
import type { SecularModel } from '../../core/secular/types.js';
import { kNearestSortedRange } from './kNearest.js';
import type { KNearestGrid } from './kNearestGrid.js';
import type { VelocitySpace } from './metricVelocity.js';
import { levelOrNaN, SERIAL_LEVELS } from './qrlCutoff.js';
import { seededRandom } from '../../core/random.js';
import type { OutlierBackground } from './outlierBackground.js';
import { nullReplicateScores } from './outlierNullReplicate.js';
import type { IsolationOptions } from './outlierScore.js';

/** Marks this module's workerData (the module is also imported by the main thread). */
export interface FamiliesWorkerData { familiesWorker: true }

/** Slots of the shared control array. */
export const NEXT_CLAIM = 0; // next piece to claim
export const WORKERS_DONE = 1; // workers finished with the job
export const FAILED = 2; // 1 when a worker failed (its message is on its error port)
export const WORKER_CLAIMS = 3; // pieces the workers took
export const PIECES_DONE = 4; // pieces finished, by any thread
export const CONTROL_SLOTS = 5;

/** k nearest of the grid points at input indices below m, in chunks of sorted positions. */
export interface KNearestJob {
  kind: 'k-nearest';
  grid: KNearestGrid; // every array on shared memory
  k: number;
  m: number;
  chunk: number; // sorted positions per claim
  d2: Float64Array; // shared output rows, squared distances
  idx: Int32Array; // shared output rows, input indices
  control: Int32Array;
}

/** The QRL level of each space, one space a claim. */
export interface LevelsJob {
  kind: 'levels';
  spaces: VelocitySpace[]; // coordinates on shared memory
  minMembers: number;
  resolution: number;
  levels: Float64Array; // shared output, one per space
  control: Int32Array;
}

/** Null catalogues, one a claim: catalogue r's scores into scores[r·scored …], their number into counts[r]. */
export interface NullReplicatesJob {
  kind: 'null-replicates';
  bg: OutlierBackground; // every array on shared memory
  catalogueSize: number;
  opts: IsolationOptions;
  scored: number; // at most this many scores a catalogue
  seeds: Uint32Array;
  scores: Float64Array; // shared output, replicates × scored
  counts: Int32Array; // shared output, scores of each catalogue
  control: Int32Array;
}

/** Proper elements of the rows of one epoch, in blocks of rows (familiesScreen.ts ProperRunner); each thread builds the epoch's model once. */
export interface ProperJob {
  kind: 'proper';
  epochJdTT: number;
  cols: OsculatingColumns; // on shared memory
  out: ProperColumns; // shared output
  chunk: number; // rows per claim
  control: Int32Array;
}

/** The whole clustering of the screened bodies on one worker; its result goes out on that worker's result port. */
export interface ClusterJob {
  kind: 'cluster';
  a: Float64Array; e: Float64Array; sinI: Float64Array; // proper elements of the screened bodies, on shared memory
  opts: ClusteringOptions;
  control: Int32Array;
}

export type SharedJob = KNearestJob | LevelsJob | NullReplicatesJob | ProperJob;
export type FamiliesJob = SharedJob | ClusterJob;

/** Pieces a shared job is cut into. */
export function piecesOf(job: SharedJob): number {
  if (job.kind === 'proper') return Math.ceil(job.cols.a.length / job.chunk);
  return job.kind === 'levels' ? job.spaces.length : job.kind === 'null-replicates' ? job.seeds.length : Math.ceil(job.grid.count / job.chunk);
}

/**
 * Claims pieces of the job until none is left, filling their outputs and counting each when done
 * (a worker counts it among the workers' pieces first); returns how many it took.
 */
export function runClaims(job: SharedJob, byWorker = false): number {
  const pieces = piecesOf(job);
  let model: SecularModel | null = null; // a proper job's model, built at this thread's first claim
  for (let claims = 0; ; claims++) {
    const piece = Atomics.add(job.control, NEXT_CLAIM, 1);
    if (piece >= pieces) return claims;
    if (job.kind === 'proper') {
      model ??= planetarySecularModel(job.epochJdTT);
      properElementsColumns(model, job.cols, job.out, piece * job.chunk, Math.min(job.cols.a.length, (piece + 1) * job.chunk));
    } else if (job.kind === 'levels') {
      job.levels[piece] = levelOrNaN(job.spaces[piece], job.minMembers, job.resolution);
    } else if (job.kind === 'null-replicates') {
      const scores = nullReplicateScores(job.bg, job.catalogueSize, job.opts, job.scored, seededRandom(job.seeds[piece]));
      job.scores.set(scores, piece * job.scored);
      job.counts[piece] = scores.length;
    } else {
      const first = piece * job.chunk;
      kNearestSortedRange(job.grid, job.k, job.m, first, Math.min(job.grid.count, first + job.chunk), job.d2, job.idx);
    }
    if (byWorker) Atomics.add(job.control, WORKER_CLAIMS, 1);
    Atomics.add(job.control, PIECES_DONE, 1);
    Atomics.notify(job.control, PIECES_DONE);
  }
}

if (workerData !== null && typeof workerData === 'object' && 'familiesWorker' in workerData && parentPort !== null) {
  const port = parentPort;
  let errors: MessagePort | null = null; // the first message hands the ports errors and results are reported on
  let results: MessagePort | null = null;
  port.on('message', (msg: FamiliesJob | { errors: MessagePort; results: MessagePort }) => {
    if ('errors' in msg) {
      errors = msg.errors;
      results = msg.results;
      port.postMessage('ready');
      return;
    }
    try {
      if (msg.kind !== 'cluster') runClaims(msg, true);
      else if (Atomics.add(msg.control, NEXT_CLAIM, 1) === 0) {
        results!.postMessage(clusterFamilies(msg.a, msg.e, msg.sinI, msg.opts, SERIAL_LEVELS));
        Atomics.add(msg.control, WORKER_CLAIMS, 1);
      }
    } catch (err) {
      errors?.postMessage(err instanceof Error ? err.message : String(err));
      Atomics.store(msg.control, FAILED, 1);
      Atomics.notify(msg.control, PIECES_DONE);
    }
    Atomics.add(msg.control, WORKERS_DONE, 1);
    Atomics.notify(msg.control, WORKERS_DONE);
  });
}
