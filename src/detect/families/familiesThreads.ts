/**
 * The families stage's heavy pieces shared with worker threads (familiesWorker.ts), behind the
 * same synchronous calls as their serial forms, so the callers run unchanged:
 *   - the proper elements of the screen (familiesScreen.ts), blocks of rows of one epoch;
 *   - the clustering (familiesCluster.ts), handed whole to one worker at the start and collected
 *     when the outliers are done: the two are independent until the candidates, and the worker
 *     joins the outliers' pieces once it has clustered;
 *   - the k-nearest search of the outliers (kNearestSearch.ts: all points, the first m);
 *   - the levels of the QRL backgrounds (qrlCutoff.ts LevelRunner);
 *   - the null catalogues of the outliers' calibration, each drawn and scored whole by one
 *     thread (outlierNullReplicate.ts NullReplicateRunner), from its own seeded stream.
 * A job copies its inputs into shared memory and is handed to every worker; the calling thread
 * claims pieces alongside them from one shared counter, then blocks on a shared counter
 * (Atomics.wait) until every piece is done (not until every worker has seen the job: one may
 * still be clustering). Each piece depends on its own inputs alone (a
 * row on the grid and its point; a level on its background), so the results are the serial
 * ones bit for bit, whichever thread computed them and in whatever order.
 *
 * Two null catalogues on two threads run at once from draw to scores (the draw, the reordering
 * and the grids are serial work that sharing the k-nearest searches alone left on one thread).
 * Each thread then holds a catalogue's grid of its own: more memory than one shared search.
 */
import { MessageChannel, receiveMessageOnPort, type MessagePort, type Worker } from 'node:worker_threads';
import { startSiblingWorker } from '../../core/moduleWorker.js';
import { clusterFamilies, type ClusteringOptions, type FamiliesClustering } from '../familiesCluster.js';
import { checkK, checkOfFirst, finishKNearest, type KNearestResult } from './kNearest.js';
import type { KNearestGrid } from './kNearestGrid.js';
import { SERIAL_KNEAREST, type KNearestSearch } from './kNearestSearch.js';
import type { VelocitySpace } from './metricVelocity.js';
import { SERIAL_LEVELS, type LevelRunner } from './qrlCutoff.js';
import { SERIAL_PROPER, type ProperRunner } from '../familiesScreen.js';
import type { OutlierBackground } from './outlierBackground.js';
import { SERIAL_NULL_REPLICATES, type NullReplicateRunner } from './outlierNullReplicate.js';
import {
  CONTROL_SLOTS, FAILED, PIECES_DONE, piecesOf, runClaims, WORKER_CLAIMS, WORKERS_DONE, type ClusterJob, type FamiliesWorkerData, type SharedJob,
} from './familiesWorker.js';

/**
 * Sorted positions per k-nearest claim, at most: at 3–5 µs a query (1.5 million bodies, 4 a
 * cell) a claim takes 10–20 ms, long against an atomic add, short enough that the threads end
 * together; a small grid is cut into about 8 claims a thread, none under 64 positions (our choice).
 */
export const KNEAREST_CHUNK_POSITIONS = 4096;
const CLAIMS_PER_THREAD = 8;
const MIN_CHUNK_POSITIONS = 64;

/** How long one wait lasts before the workers are checked for having stopped (ms; our choice). */
const WAIT_SLICE_MS = 1000;

export interface FamiliesThreadOptions {
  chunkPositions?: number; // sorted positions per k-nearest claim; default from the grid's size (above)
  callerClaims?: boolean; // the calling thread takes claims too (default true; false: the workers do all, for tests)
}

/** The work of the families stage that threads may share. */
export interface FamiliesWork {
  readonly search: KNearestSearch;
  readonly levels: LevelRunner;
  readonly nullReplicates: NullReplicateRunner;
  /**
   * clusterFamilies(a, e, sinI, opts) started on another thread when there is one (its levels on
   * that thread); the function returned gives the result, waiting for it if need be. The same
   * clustering either way.
   */
  readonly clusterAside: (a: Float64Array, e: Float64Array, sinI: Float64Array, opts: ClusteringOptions) => () => FamiliesClustering;
  readonly proper: ProperRunner;
}

/** On this thread: the clustering is done at once. */
const clusterHere = (a: Float64Array, e: Float64Array, sinI: Float64Array, opts: ClusteringOptions): () => FamiliesClustering => {
  const c = clusterFamilies(a, e, sinI, opts, SERIAL_LEVELS);
  return () => c;
};

export const SERIAL_FAMILIES_WORK: FamiliesWork = {
  search: SERIAL_KNEAREST, levels: SERIAL_LEVELS, nullReplicates: SERIAL_NULL_REPLICATES, clusterAside: clusterHere, proper: SERIAL_PROPER,
};

/**
 * Rows of one epoch from which its proper elements are shared with the workers (our choice: each
 * thread builds the epoch's model and coefficient table, about 0.1–0.2 s, which a smaller set
 * does not repay), and claims per thread: a few, each building its own table.
 */
export const PROPER_SHARED_MIN_ROWS = 100_000;
const PROPER_CLAIMS_PER_THREAD = 2;

export interface FamiliesThreads extends FamiliesWork {
  readonly threads: number; // this thread and threads − 1 workers
  workerClaims(): number; // pieces the workers took in the jobs so far (the rest: this thread)
  close(): Promise<void>; // stops the workers
}

/** The families' work on `threads` threads (this one included); 1: serial, no worker. */
export async function startFamiliesThreads(threads: number, options: FamiliesThreadOptions = {}): Promise<FamiliesThreads> {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`startFamiliesThreads: threads must be a positive integer, got ${threads}`);
  const fixedChunk = options.chunkPositions;
  if (fixedChunk !== undefined && !(Number.isInteger(fixedChunk) && fixedChunk >= 1)) throw new RangeError(`startFamiliesThreads: chunkPositions must be a positive integer, got ${fixedChunk}`);
  if (threads === 1) return { ...SERIAL_FAMILIES_WORK, threads, workerClaims: () => 0, close: async () => {} };
  const { workers, errorPorts, resultPorts } = await startWorkers(threads - 1);
  let claimsByWorkers = 0;
  const failIfFailed = (control: Int32Array): void => {
    if (Atomics.load(control, FAILED) === 0) return;
    const messages = errorPorts.map((p) => receiveMessageOnPort(p)?.message).filter((x) => x !== undefined);
    throw new Error(`families: a worker thread failed: ${messages.join('; ')}`);
  };
  /** Runs a job on every thread and returns when its pieces are all done. */
  const runJob = (job: SharedJob): void => {
    for (const w of workers) w.postMessage(job);
    if (options.callerClaims ?? true) runClaims(job);
    waitForPieces(job.control, piecesOf(job), workers);
    claimsByWorkers += Atomics.load(job.control, WORKER_CLAIMS);
    failIfFailed(job.control);
  };
  const proper: ProperRunner = (epochJdTT, cols, out) => {
    const n = cols.a.length;
    if (n < PROPER_SHARED_MIN_ROWS) { SERIAL_PROPER(epochJdTT, cols, out); return; }
    const job: SharedJob = {
      kind: 'proper', epochJdTT, chunk: Math.ceil(n / (PROPER_CLAIMS_PER_THREAD * threads)), control: newControl(),
      cols: { a: sharedCopy(cols.a), e: sharedCopy(cols.e), i: sharedCopy(cols.i), node: sharedCopy(cols.node), peri: sharedCopy(cols.peri) },
      out: {
        aAu: sharedCopy(out.aAu), e: sharedCopy(out.e), sinI: sharedCopy(out.sinI), gArcsecPerYear: sharedCopy(out.gArcsecPerYear),
        sArcsecPerYear: sharedCopy(out.sArcsecPerYear), reliability: sharedOf(out.reliability),
      },
    };
    runJob(job);
    out.aAu.set(job.out.aAu); out.e.set(job.out.e); out.sinI.set(job.out.sinI);
    out.gArcsecPerYear.set(job.out.gArcsecPerYear); out.sArcsecPerYear.set(job.out.sArcsecPerYear); out.reliability.set(job.out.reliability);
  };
  const clusterAside = (a: Float64Array, e: Float64Array, sinI: Float64Array, opts: ClusteringOptions): () => FamiliesClustering => {
    const job: ClusterJob = {
      kind: 'cluster', a: sharedCopy(a), e: sharedCopy(e), sinI: sharedCopy(sinI),
      opts: { cutoffMPerS: opts.cutoffMPerS, minMembers: opts.minMembers, seed: opts.seed }, control: newControl(),
    };
    for (const w of workers) w.postMessage(job);
    return () => {
      waitForWorkers(job.control, workers);
      claimsByWorkers += Atomics.load(job.control, WORKER_CLAIMS);
      failIfFailed(job.control);
      for (const p of resultPorts) {
        const got = receiveMessageOnPort(p);
        if (got !== undefined) return got.message as FamiliesClustering;
      }
      throw new Error('families: no worker thread returned the clustering');
    };
  };
  const kNearest = (grid: KNearestGrid, k: number, m: number): KNearestResult => {
    const chunk = fixedChunk ?? Math.max(MIN_CHUNK_POSITIONS, Math.min(KNEAREST_CHUNK_POSITIONS, Math.ceil(grid.count / (CLAIMS_PER_THREAD * threads))));
    const job: SharedJob = {
      kind: 'k-nearest', grid: sharedGrid(grid), k, m, chunk,
      d2: new Float64Array(new SharedArrayBuffer(8 * m * k)), idx: new Int32Array(new SharedArrayBuffer(4 * m * k)), control: newControl(),
    };
    runJob(job);
    return finishKNearest(k, job.d2, job.idx);
  };
  const search: KNearestSearch = {
    all(grid, k) {
      checkK(k, grid.count - 1);
      return kNearest(grid, k, grid.count);
    },
    ofFirst(grid, inputXyz, m, k) {
      checkK(k, grid.count - 1);
      checkOfFirst(grid, inputXyz, m);
      return kNearest(grid, k, m);
    },
  };
  const levels: LevelRunner = (spaces, minMembers, resolution) => {
    const job: SharedJob = {
      kind: 'levels', spaces: spaces.map(sharedSpace), minMembers, resolution,
      levels: new Float64Array(new SharedArrayBuffer(8 * spaces.length)), control: newControl(),
    };
    runJob(job);
    return Float64Array.from(job.levels);
  };
  const nullReplicates: NullReplicateRunner = (bg, catalogueSize, opts, scored, seeds) => {
    const job: SharedJob = {
      kind: 'null-replicates', bg: sharedBackground(bg), catalogueSize, opts: { ...opts }, scored, seeds: Uint32Array.from(seeds),
      scores: new Float64Array(new SharedArrayBuffer(8 * seeds.length * scored)), counts: new Int32Array(new SharedArrayBuffer(4 * seeds.length)),
      control: newControl(),
    };
    runJob(job);
    return Array.from(seeds, (_, r) => Float64Array.from(job.scores.subarray(r * scored, r * scored + job.counts[r])));
  };
  return {
    threads, search, levels, nullReplicates, clusterAside, proper,
    workerClaims: () => claimsByWorkers,
    async close() {
      await Promise.all(workers.map((w) => w.terminate()));
      for (const p of [...errorPorts, ...resultPorts]) p.close();
    },
  };
}

/** Starts the workers, each with a port for its error messages and one for its results, and waits until each is ready. */
async function startWorkers(count: number): Promise<{ workers: Worker[]; errorPorts: MessagePort[]; resultPorts: MessagePort[] }> {
  const data: FamiliesWorkerData = { familiesWorker: true };
  const workers: Worker[] = [];
  const errorPorts: MessagePort[] = [];
  const resultPorts: MessagePort[] = [];
  try {
    for (let t = 0; t < count; t++) {
      const w = startSiblingWorker(import.meta.url, 'familiesWorker', data);
      workers.push(w);
      const errors = new MessageChannel(), results = new MessageChannel();
      errorPorts.push(errors.port1);
      resultPorts.push(results.port1);
      await new Promise<void>((resolve, reject) => {
        w.once('message', () => resolve());
        w.once('error', (e) => reject(new Error(`families worker failed to start: ${e.message}`)));
        w.postMessage({ errors: errors.port2, results: results.port2 }, [errors.port2, results.port2]);
      });
    }
  } catch (err) {
    await Promise.all(workers.map((w) => w.terminate()));
    throw err;
  }
  return { workers, errorPorts, resultPorts };
}

const newControl = (): Int32Array => new Int32Array(new SharedArrayBuffer(4 * CONTROL_SLOTS));

/** Blocks until `pieces` pieces are counted done or a worker has failed; throws if one has stopped running. */
function waitForPieces(control: Int32Array, pieces: number, workers: readonly Worker[]): void {
  for (;;) {
    const done = Atomics.load(control, PIECES_DONE);
    if (done >= pieces || Atomics.load(control, FAILED) !== 0) return;
    if (Atomics.wait(control, PIECES_DONE, done, WAIT_SLICE_MS) === 'timed-out' && workers.some((w) => w.threadId === -1)) {
      throw new Error('families: a worker thread stopped before finishing its share');
    }
  }
}

/** Blocks until every worker has counted itself done; throws if one has stopped running. */
function waitForWorkers(control: Int32Array, workers: readonly Worker[]): void {
  for (;;) {
    const done = Atomics.load(control, WORKERS_DONE);
    if (done >= workers.length) return;
    if (Atomics.wait(control, WORKERS_DONE, done, WAIT_SLICE_MS) === 'timed-out' && workers.some((w) => w.threadId === -1)) {
      throw new Error('families: a worker thread stopped before finishing its share');
    }
  }
}

function sharedCopy(a: Float64Array): Float64Array {
  const s = new Float64Array(new SharedArrayBuffer(a.byteLength));
  s.set(a);
  return s;
}

/** The grid with its per-point arrays copied into shared memory. */
function sharedGrid(g: KNearestGrid): KNearestGrid {
  const cellStart = new Uint32Array(new SharedArrayBuffer(g.cellStart.byteLength));
  cellStart.set(g.cellStart);
  const order = new Uint32Array(new SharedArrayBuffer(g.order.byteLength));
  order.set(g.order);
  return { count: g.count, cellSize: g.cellSize, origin: g.origin, dims: g.dims, cellStart, order, sortedXyz: sharedCopy(g.sortedXyz) };
}

function sharedOf<T extends Float64Array | Uint32Array | Uint8Array>(a: T): T {
  const s = new (a.constructor as { new (b: SharedArrayBuffer): T })(new SharedArrayBuffer(a.byteLength));
  s.set(a as never);
  return s;
}

/** The background with its arrays copied into shared memory. */
function sharedBackground(bg: OutlierBackground): OutlierBackground {
  return {
    xyz: sharedOf(bg.xyz), radius: sharedOf(bg.radius), cumulative: sharedOf(bg.cumulative), weightCap: bg.weightCap,
    weightedBodies: bg.weightedBodies, guide: sharedOf(bg.guide), scoredParent: bg.scoredParent === null ? null : sharedOf(bg.scoredParent),
  };
}

function sharedSpace(s: VelocitySpace): VelocitySpace {
  return { xMPerS: sharedCopy(s.xMPerS), yMPerS: sharedCopy(s.yMPerS), zMPerS: sharedCopy(s.zMPerS), aRefAu: s.aRefAu };
}
