/**
 * Where `check`'s orbit fits run. Every fit of a check is fitOrbit on the same observations,
 * σ and planets; only the start and a few options differ (a FitRequest). The computation asks
 * for them in batches of fits that do not depend on each other (the models from the gravity
 * solution, the refits on the comparison set, the leave-one-station-out refits) and gets the
 * outcomes back in request order, so what it does with them does not depend on where they ran.
 *
 * On one thread: one after another here. On `threads` > 1: this thread and threads − 1 workers
 * (checkFitWorker.ts), started at once with the observations, σ and the planets' cache options
 * so that they load while this thread fits gravity only; each is sent, before its first fit,
 * the planets' Chebyshev tables this thread has filled by then (under 1 MB for 20 years), and
 * fills any other segment itself, to the same coefficients (EphemerisCache: a segment's
 * coefficients do not depend on the order or way of filling). Every thread of a batch, this
 * one included (its code is already compiled hot by the gravity fit, a fresh worker's is not),
 * takes the next request from a shared counter; a batch of one fit runs here. Fits give the same numbers on any thread, so the outputs are the same for
 * any number of threads.
 */
import type { Worker } from 'node:worker_threads';
import { EphemerisCache, type EphemerisCacheOptions } from '../../core/ephemeris/ephemerisCache.js';
import { EPHEMERIS_BODIES } from '../../core/ephemeris/ephemerisBody.js';
import type { CacheBodyTable } from '../../core/ephemeris/ephemerisCacheTable.js';
import { startSiblingWorker } from '../../core/moduleWorker.js';
import type { WorkerReply } from '../../core/workerPool.js';
import type { Ephemeris } from '../../core/types.js';
import type { AstrometryObservation, ObservatorySite } from '../../io/astrometry/types.js';
import { fitOrbit } from '../fitOrbit.js';
import type { ObservationSigma } from '../observationWeights.js';
import { OrbitFitError, rebuildOrbitFitError, type OrbitFit, type OrbitFitErrorRecord, type OrbitFitOptions, type OrbitFitStart } from '../orbitFitTypes.js';

/** What every fit of one check shares. */
export interface CheckFitInputs {
  observations: readonly AstrometryObservation[];
  sites: ReadonlyMap<string, ObservatorySite>;
  sigmas: readonly ObservationSigma[];
  ephemeris: Ephemeris | undefined;
}

/** One fit: fitOrbit on the shared inputs from `start` with `options`. */
export interface FitRequest {
  start: OrbitFitStart;
  options: Pick<OrbitFitOptions, 'solveFor' | 'law' | 'params' | 'reject' | 'exclude'>;
}

/** A fit's outcome: the orbit, or why there is none. */
export type FitOutcome = { fit: OrbitFit; error?: undefined } | { fit?: undefined; error: OrbitFitError };

/** The same outcome as a worker sends it (an OrbitFitError as its fields). */
export type FitOutcomeRecord = { fit: OrbitFit; error?: undefined } | { fit?: undefined; error: OrbitFitErrorRecord };

/** Runs one request on this thread; errors other than OrbitFitError are thrown. */
export function fitHere(inputs: CheckFitInputs, request: FitRequest): FitOutcome {
  try {
    return { fit: fitOrbit(inputs.observations, inputs.sites, request.start, { ...request.options, sigmas: inputs.sigmas, ephemeris: inputs.ephemeris }) };
  } catch (e) {
    if (e instanceof OrbitFitError) return { error: e };
    throw e;
  }
}

export interface CheckFitter {
  readonly threads: number;
  /** Runs the requests; their outcomes in request order. */
  fitAll(requests: readonly FitRequest[]): Promise<FitOutcome[]>;
  /** Stops the workers (none here). */
  close(): Promise<void>;
}

/** The batches of a computation: it yields requests and is given their outcomes. */
export type FitSteps<R> = Generator<FitRequest[], R, FitOutcome[]>;

/** Runs `steps` with every fit on this thread, synchronously. */
export function runStepsHere<R>(steps: FitSteps<R>, inputs: CheckFitInputs): R {
  let step = steps.next([]);
  while (!step.done) step = steps.next(step.value.map((r) => fitHere(inputs, r)));
  return step.value;
}

/** Runs `steps` with its fits on `fitter`. */
export async function runStepsOn<R>(steps: FitSteps<R>, fitter: CheckFitter): Promise<R> {
  let step = steps.next([]);
  while (!step.done) step = steps.next(await fitter.fitAll(step.value));
  return step.value;
}

/** What a check worker starts with (checkFitWorker.ts). */
export interface CheckWorkerData {
  observations: readonly AstrometryObservation[];
  sites: ReadonlyMap<string, ObservatorySite>;
  sigmas: readonly ObservationSigma[];
  /** The planets' cache options; null when the fits make their own planets (no ephemeris given). */
  cache: EphemerisCacheOptions | null;
}

/**
 * A batch for a check worker: the requests, the counter every thread takes the next one from,
 * and the filled planets' tables before the worker's first batch (null after).
 */
export interface CheckWorkerTask {
  kind: 'batch';
  requests: FitRequest[];
  counter: Int32Array; // on a SharedArrayBuffer
  tables: CacheBodyTable[] | null;
}

/** A worker's answer to a batch: the outcomes of the requests it took, by index. */
export type WorkerBatchDone = [number, FitOutcomeRecord][];

/**
 * A fitter on `threads` threads (an integer ≥ 1): this one and threads − 1 workers. The planets
 * must be undefined or an EphemerisCache (what runCheck makes): other ephemerides cannot be
 * carried to a worker, and their fits run here.
 */
export function startCheckFitter(inputs: CheckFitInputs, threads: number): CheckFitter {
  if (!Number.isInteger(threads) || threads < 1) throw new RangeError(`startCheckFitter: threads must be a positive integer, got ${threads}`);
  const eph = inputs.ephemeris;
  if (threads === 1 || (eph !== undefined && !(eph instanceof EphemerisCache))) {
    return { threads: 1, fitAll: async (requests) => requests.map((r) => fitHere(inputs, r)), close: async () => undefined };
  }
  return new WorkerFitter(inputs, threads);
}

class WorkerFitter implements CheckFitter {
  readonly threads: number;
  private readonly inputs: CheckFitInputs;
  private readonly workers: Worker[] = [];
  private readonly primed: boolean[] = [];
  private tables: CacheBodyTable[] | null = null;
  /** Batches sent and not yet answered, by message id. */
  private readonly waiting = new Map<number, { resolve: (done: WorkerBatchDone) => void; reject: (e: Error) => void }>();
  private nextId = 0;
  /** A worker's error or exit (every batch waiting is rejected with it; later ones at once). */
  private failure: Error | null = null;

  constructor(inputs: CheckFitInputs, threads: number) {
    this.inputs = inputs;
    this.threads = threads;
    const cache = inputs.ephemeris instanceof EphemerisCache ? inputs.ephemeris.options : null;
    const data: CheckWorkerData = { observations: inputs.observations, sites: inputs.sites, sigmas: inputs.sigmas, cache };
    for (let t = 1; t < threads; t++) {
      const w = startSiblingWorker(import.meta.url, 'checkFitWorker', data);
      w.on('message', (reply: WorkerReply<WorkerBatchDone>) => {
        const p = this.waiting.get(reply.id);
        if (p === undefined) return;
        this.waiting.delete(reply.id);
        if (reply.error !== undefined) p.reject(new Error(`a check fit failed in a worker: ${reply.error}`));
        else p.resolve(reply.output!);
      });
      w.on('error', (e) => this.fail(new Error(`a check worker failed: ${e.message}`)));
      w.on('exit', (code) => this.fail(new Error(`a check worker exited (code ${code})`)));
      this.workers.push(w);
      this.primed.push(false);
    }
  }

  private fail(e: Error): void {
    this.failure ??= e;
    for (const p of this.waiting.values()) p.reject(this.failure);
    this.waiting.clear();
  }

  /**
   * Every worker is sent the whole batch and a shared counter; each thread, this one included,
   * takes the next request by incrementing it (Atomics), until none is left. No thread waits for
   * another to hand out work, and the last fit to finish started before every thread ran dry.
   */
  async fitAll(requests: readonly FitRequest[]): Promise<FitOutcome[]> {
    if (requests.length <= 1) return requests.map((r) => fitHere(this.inputs, r));
    if (this.failure !== null) throw this.failure;
    const counter = new Int32Array(new SharedArrayBuffer(4));
    const replies = this.workers.map((w, k) => {
      const id = this.nextId++;
      const task: CheckWorkerTask = { kind: 'batch', requests: [...requests], counter, tables: this.primed[k] ? null : this.filledTables() };
      this.primed[k] = true;
      const reply = new Promise<WorkerBatchDone>((resolve, reject) => this.waiting.set(id, { resolve, reject }));
      w.postMessage({ id, input: task });
      return reply;
    });
    const out: FitOutcome[] = new Array(requests.length);
    try {
      for (let id = Atomics.add(counter, 0, 1); id < requests.length; id = Atomics.add(counter, 0, 1)) out[id] = fitHere(this.inputs, requests[id]);
    } catch (e) {
      Atomics.store(counter, 0, requests.length); // the workers take no more
      await Promise.allSettled(replies);
      throw e;
    }
    for (const done of await Promise.all(replies)) {
      for (const [id, o] of done) out[id] = o.error === undefined ? { fit: o.fit } : { error: rebuildOrbitFitError(o.error) };
    }
    return out;
  }

  /** The planets' tables as filled now (exported once: the fits here after that add nothing the workers need). */
  private filledTables(): CacheBodyTable[] {
    const eph = this.inputs.ephemeris;
    if (this.tables === null) this.tables = eph instanceof EphemerisCache ? EPHEMERIS_BODIES.map((b) => eph.exportBody(b)) : [];
    return this.tables;
  }

  async close(): Promise<void> {
    this.failure ??= new Error('the check fitter is closed');
    await Promise.all(this.workers.map((w) => w.terminate()));
  }
}
