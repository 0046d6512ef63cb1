/**
 * The bytes of one input: a file path or '-' for standard input, gzip read transparently
 * when the first two bytes are the gzip magic 1f 8b (RFC 1952 §2.3.1; the extension is not
 * looked at). Yields decoded chunks; hashes the raw bytes as read (SHA-256, FIPS 180-4) so
 * a run can name exactly what it read; a large file on a worker thread (./sha256Thread.ts). Problems with the whole input (missing, a directory,
 * unreadable, corrupt gzip, binary content) → UnreadableInputError `FILE: reason`.
 */
import { promises as fsp } from 'node:fs';
import { Readable } from 'node:stream';
import { createGunzip } from 'node:zlib';
import { UnreadableInputError } from './errors.js';
import { sha256Of, type Sha256Stream } from './sha256Thread.js';

/** Read size; 1 MiB keeps the per-chunk overhead small against the per-line work. */
export const CHUNK_BYTES = 1 << 20;
/** How much decoded content is checked for NUL bytes to call a file binary. */
const BINARY_PROBE_BYTES = 64 * 1024;

/** What a byte source knows once it is drained. */
export interface ByteSourceInfo {
  rawBytes: number; // bytes read from the file or stdin, before gunzip
  gzip: boolean;
  sha256: string; // hex digest of the raw bytes
}

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  EISDIR: 'is a directory, not a file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  ENOTDIR: 'a path component is not a directory',
  ELOOP: 'too many symbolic links',
};

/** One-line reason for a file-system error. */
export function fileErrorReason(err: unknown): string {
  const code = (err as NodeJS.ErrnoException | undefined)?.code ?? '';
  return REASONS[code] ?? `cannot read (${code || (err as Error)?.message || String(err)})`;
}

/**
 * The raw chunks of `path` ('-' = stdin) and its size (NaN for stdin), checked up front so
 * errors name the file. A file stream is returned as a Readable so that an early exit can
 * destroy it (closing the file).
 */
async function rawStream(path: string): Promise<{ stream: Readable; bytes: number }> {
  if (path === '-') return { stream: process.stdin, bytes: NaN };
  try {
    const st = await fsp.stat(path);
    if (st.isDirectory()) throw Object.assign(new Error('directory'), { code: 'EISDIR' });
    const fh = await fsp.open(path, 'r'); // surfaces EACCES now rather than mid-stream
    // closes the handle at the end
    return { stream: fh.createReadStream({ highWaterMark: CHUNK_BYTES }), bytes: st.size };
  } catch (err) {
    throw new UnreadableInputError(path, fileErrorReason(err));
  }
}

async function* hashed(source: AsyncIterable<Buffer>, hash: Sha256Stream, info: ByteSourceInfo, path: string): AsyncGenerator<Buffer> {
  try {
    for await (const chunk of source) {
      hash.update(chunk);
      info.rawBytes += chunk.length;
      yield chunk;
    }
  } catch (err) {
    throw err instanceof UnreadableInputError ? err : new UnreadableInputError(path, fileErrorReason(err));
  }
}

async function* gunzipped(raw: AsyncIterable<Buffer>, path: string): AsyncGenerator<Buffer> {
  const gunzip = createGunzip({ chunkSize: CHUNK_BYTES });
  const input = Readable.from(raw);
  input.on('error', (err) => gunzip.destroy(err));
  input.pipe(gunzip);
  try {
    for await (const chunk of gunzip) yield chunk as Buffer;
  } catch (err) {
    if (err instanceof UnreadableInputError) throw err;
    throw new UnreadableInputError(path, `corrupt gzip data (${(err as Error).message})`);
  } finally {
    input.destroy(); // a no-op once drained; on an early exit it stops pulling from the file
  }
}

function checkNotBinary(chunk: Buffer, path: string): void {
  const nul = chunk.subarray(0, BINARY_PROBE_BYTES).indexOf(0);
  if (nul >= 0) throw new UnreadableInputError(path, `binary content (NUL byte at offset ${nul}), not a text file`);
}

/**
 * Decoded chunks of `path`; `info` is filled as the source is drained (complete when the
 * iteration ends). The first chunk is probed for gzip magic and then for NUL bytes.
 * However the iteration ends (drained, a binary probe, a consumer that throws or breaks),
 * the file is closed: an early exit would otherwise leave the file stream suspended inside
 * `hashed`, its descriptor open until garbage collection.
 */
export async function* openByteSource(path: string, info: ByteSourceInfo): AsyncGenerator<Buffer> {
  const { stream: source, bytes } = await rawStream(path);
  const hash = sha256Of(bytes);
  const raw = hashed(source, hash, info, path);
  let drained = false;
  try {
    const first = await raw.next();
    if (!first.done) {
      const head: Buffer = first.value;
      info.gzip = head.length >= 2 && head[0] === 0x1f && head[1] === 0x8b;
      const all = (async function* () {
        yield head;
        yield* raw;
      })();
      let probed = false;
      for await (const chunk of info.gzip ? gunzipped(all, path) : all) {
        if (!probed) {
          checkNotBinary(chunk, path);
          probed = true;
        }
        yield chunk;
      }
    }
    drained = true;
  } finally {
    // never stdin: it belongs to the process; destroying a drained file stream is a no-op
    if (source !== process.stdin) source.destroy();
    if (!drained) hash.abandon();
  }
  info.sha256 = await hash.digest();
}
