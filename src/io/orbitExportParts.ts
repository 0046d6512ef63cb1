/**
 * A plain orbit export file read on two threads: where to split it, and the worker that reads
 * the second part (./orbitExportPart.ts) while ./readOrbitFile.ts reads the first. The split
 * is the first line start at or after `mainShare` of the file's bytes; the worker's rows come
 * back in batches (./orbitRowBatch.ts) that the reading thread hands on in order after its
 * own lines, line numbers moved by its own line count: the same rows, rejects, counts and
 * hash as one thread gives.
 *
 * Split only when it pays and is safe: a regular file of at least PARALLEL_MIN_BYTES, not gzip
 * (its bytes cannot be entered in the middle), lines ending in LF or CRLF (not CR alone), and
 * the first `headLines` lines (those held back to find the header and format) all within the
 * first chunk; the split lies after them, so the reading thread, which learns of the split
 * when it has delivered them, has not passed it.
 */
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';
import type { Worker } from 'node:worker_threads';
import { startSiblingWorker } from '../core/moduleWorker.js';
import { CHUNK_BYTES } from './byteSource.js';
import { lineTerminator, type LineEncoding } from './lineSource.js';
import type { OrbitExportPartEnd, OrbitExportPartSpec } from './orbitExportPart.js';
import type { OrbitRowBatch } from './orbitRowBatch.js';

/** Files smaller than this are read on one thread (starting the worker costs ~0.1 s). */
export const PARALLEL_MIN_BYTES = 16 << 20;
/** Bytes read at a time while looking for the line start to split at. */
const SPLIT_WINDOW_BYTES = 64 << 10;

/** Where a file is split: the reading thread takes [0, split), the worker [split, size). */
export interface SplitPlan {
  split: number;
  size: number;
}

/**
 * The split of `path`, or null when it is read on one thread (see the file comment). `minBytes`
 * is PARALLEL_MIN_BYTES but for tests; `mainShare` in (0, 1).
 */
export function planSplit(path: string, mainShare: number, headLines: number, minBytes = PARALLEL_MIN_BYTES): SplitPlan | null {
  if (!(mainShare > 0 && mainShare < 1)) throw new RangeError(`planSplit: mainShare must be in (0, 1), got ${mainShare}`);
  if (path === '-') return null;
  let fd: number;
  try {
    fd = openSync(path, 'r');
  } catch {
    return null; // the one-thread read reports it
  }
  try {
    const st = fstatSync(fd);
    if (!st.isFile() || st.size < minBytes) return null;
    const head = Buffer.allocUnsafe(Math.min(CHUNK_BYTES, st.size));
    const got = readSync(fd, head, 0, head.length, 0);
    const first = head.subarray(0, got);
    if (first.length >= 2 && first[0] === 0x1f && first[1] === 0x8b) return null; // gzip (RFC 1952 §2.3.1)
    const headEnd = nthByte(first, 10, headLines); // the LF ending the last line held back
    if (lineTerminator(first) !== 10 || headEnd < 0) return null;
    const split = lineStartAtOrAfter(fd, Math.max(headEnd + 1, Math.floor(st.size * mainShare)), st.size);
    return split > 0 && split < st.size ? { split, size: st.size } : null;
  } finally {
    closeSync(fd);
  }
}

/** The byte after the first LF at or after `from`, or -1 when there is none before `size`. */
function lineStartAtOrAfter(fd: number, from: number, size: number): number {
  const window = Buffer.allocUnsafe(SPLIT_WINDOW_BYTES);
  for (let at = from; at < size; at += SPLIT_WINDOW_BYTES) {
    const got = readSync(fd, window, 0, Math.min(SPLIT_WINDOW_BYTES, size - at), at);
    if (got === 0) return -1;
    const lf = window.subarray(0, got).indexOf(10);
    if (lf >= 0) return at + lf + 1;
  }
  return -1;
}

/** Position of the `n`-th `byte` in `buf` (n ≥ 1), or -1. */
function nthByte(buf: Buffer, byte: number, n: number): number {
  let k = -1;
  for (let seen = 0; seen < n; seen++) {
    k = buf.indexOf(byte, k + 1);
    if (k < 0) return -1;
  }
  return k;
}

/** What the worker sends: a batch, the end of its part, or an unexpected failure. */
type PartMessage = { batch: OrbitRowBatch } | { end: OrbitExportPartEnd } | { error: string };

/** The worker reading bytes [split, size) of a file; its batches taken in order with `next`. */
export class OrbitExportPartThread {
  private readonly worker: Worker;
  private readonly queue: PartMessage[] = [];
  private waiting: ((m: PartMessage) => void) | null = null;
  private finished = false;

  constructor(path: string, readonly plan: SplitPlan, encoding: LineEncoding) {
    const spec: OrbitExportPartSpec = { path, start: plan.split, end: plan.size, encoding };
    this.worker = startSiblingWorker(import.meta.url, 'orbitExportPartWorker', spec);
    this.worker.unref(); // never what keeps the process alive
    this.worker.on('message', (m: PartMessage) => this.push(m));
    this.worker.once('error', (e) => this.push({ error: e.message }));
    this.worker.once('exit', (code) => this.push({ error: `the part's reading thread ended (exit ${code}) before its end` }));
  }

  private push(m: PartMessage): void {
    if (this.finished) return;
    if ('batch' in m === false) this.finished = true;
    const w = this.waiting;
    if (w !== null) {
      this.waiting = null;
      w(m);
    } else this.queue.push(m);
  }

  /** The next message in order: a batch, then at last the end (or an error). */
  next(): Promise<PartMessage> {
    const m = this.queue.shift();
    if (m !== undefined) return Promise.resolve(m);
    return new Promise((resolve) => (this.waiting = resolve));
  }

  /** Stops the worker (after its end, or on an early exit). */
  stop(): void {
    this.finished = true;
    void this.worker.terminate();
  }
}
export type { PartMessage };
