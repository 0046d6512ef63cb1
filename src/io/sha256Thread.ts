/**
 * SHA-256 (FIPS 180-4) of a byte stream, computed on a worker thread (./sha256Worker.ts)
 * while the caller goes on with the bytes: for large inputs, where hashing on the reading
 * thread took 0.2–0.45 s of a 300 MB read. Each chunk is copied once and handed over in
 * order, so the digest is of exactly the bytes the caller read. `sha256Of` picks the thread
 * or the caller's own thread (small inputs: starting a worker costs more than it saves).
 */
import { createHash } from 'node:crypto';
import type { Worker } from 'node:worker_threads';
import { startSiblingWorker } from '../core/moduleWorker.js';

/** Inputs at least this large are hashed on a worker thread. */
export const HASH_THREAD_MIN_BYTES = 32 << 20;

/** An incremental SHA-256: update with chunks in order, then one digest (hex). */
export interface Sha256Stream {
  readonly onThread: boolean; // hashed on a worker thread
  update(chunk: Buffer): void;
  digest(): Promise<string>;
  /** Stops it without a digest (the read failed or ended early). */
  abandon(): void;
}

/** SHA-256 on a worker thread. */
class ThreadSha256 implements Sha256Stream {
  readonly onThread = true;
  private readonly worker: Worker = startSiblingWorker(import.meta.url, 'sha256Worker', null);
  private readonly result: Promise<string>;

  constructor() {
    this.worker.unref(); // never what keeps the process alive
    this.result = new Promise<string>((resolve, reject) => {
      this.worker.once('message', resolve);
      this.worker.once('error', reject);
      this.worker.once('exit', (code) => reject(new Error(`hashing thread ended (exit ${code}) before its digest`)));
    });
    this.result.catch(() => {}); // an abandoned hash is never awaited
  }

  update(chunk: Buffer): void {
    const copy = chunk.buffer.slice(chunk.byteOffset, chunk.byteOffset + chunk.length) as ArrayBuffer;
    this.worker.postMessage(copy, [copy]);
  }

  async digest(): Promise<string> {
    this.worker.postMessage(null);
    try {
      return await this.result;
    } finally {
      void this.worker.terminate();
    }
  }

  abandon(): void {
    void this.worker.terminate();
  }
}

/** SHA-256 on the caller's thread. */
class LocalSha256 implements Sha256Stream {
  readonly onThread = false;
  private readonly hash = createHash('sha256');
  update(chunk: Buffer): void {
    this.hash.update(chunk);
  }
  digest(): Promise<string> {
    return Promise.resolve(this.hash.digest('hex'));
  }
  abandon(): void {}
}

/** A SHA-256 stream for an input of `bytes` bytes (NaN when unknown: the caller's thread). */
export function sha256Of(bytes: number): Sha256Stream {
  return bytes >= HASH_THREAD_MIN_BYTES ? new ThreadSha256() : new LocalSha256();
}
