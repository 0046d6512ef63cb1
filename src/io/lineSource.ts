/**
 * Lines of one input, streamed: never the whole file as one string. A byte-level splitter
 * over the decoded chunks of ./byteSource.ts (gzip, stdin, hashing, fatal errors there):
 * `Buffer.indexOf` finds each terminator (memchr speed) and each line's bytes are decoded on
 * their own (bytes after the last terminator of a chunk wait for the next one, so a
 * multi-byte character is never split). No per-line object is made: the caller's callback
 * gets (text, lineNo), or with `forEachLineBytes` the line's byte range in the chunk and
 * no string at all. Speed: scripts/bench/parse.ts.
 *
 * Line endings: LF, CRLF (the CR is dropped) and CR alone (old Mac files). The kind is
 * decided by the first terminator in the file: LF or CRLF → split on LF, a lone CR → on CR.
 * A UTF-8 byte-order mark at the start is dropped. The last line needs no terminator.
 * An empty input gives zero lines. A line longer than MAX_LINE_BYTES is fatal (the input is
 * not line-oriented text).
 *
 * A caller that reads the end of a plain file elsewhere (./orbitExportParts.ts) sets
 * `options.until.byte`, even while the lines are being delivered: no line ending at or
 * past that byte of the file is delivered, but every byte is still read (and hashed).
 */
import { isAscii } from 'node:buffer';
import { openByteSource, type ByteSourceInfo } from './byteSource.js';
import { UnreadableInputError } from './errors.js';

/** Longest line accepted, bytes. */
export const MAX_LINE_BYTES = 16 << 20;

export type LineEncoding = 'utf8' | 'latin1';

export interface LineSourceOptions {
  /** How each line's bytes become text; default 'utf8' (ASCII files read the same either way). */
  encoding?: LineEncoding;
  /** Awaited after the lines of each chunk (about 1 MiB): lets a consumer drain a stream. */
  onChunkEnd?: () => void | Promise<void>;
  /**
   * Byte offset in the file (plain files; for gzip, in the decompressed bytes) at which
   * delivering lines stops: a line is delivered only if its terminator lies before `byte`.
   * Read at every line, so it may be set during the read. Default: all lines.
   */
  until?: { byte: number };
}

export interface LineSourceStats extends ByteSourceInfo {
  lines: number; // lines delivered, header and blank lines included
}

function checkLineLength(carry: Buffer, lineNo: number, path: string): void {
  if (carry.length > MAX_LINE_BYTES) {
    throw new UnreadableInputError(path, `line ${lineNo + 1} is longer than ${MAX_LINE_BYTES} bytes; not a line-oriented text file`);
  }
}

/**
 * LF (10) when the first terminator in `buf` is an LF or a CR followed by LF; CR (13) when it
 * is a CR followed by anything else; -1 when undecided (none yet, or a CR as the last byte).
 */
export function lineTerminator(buf: Buffer): number {
  const lf = buf.indexOf(10);
  const cr = buf.indexOf(13);
  if (cr < 0 || (lf >= 0 && lf <= cr + 1)) return lf < 0 ? -1 : 10;
  return cr + 1 < buf.length ? 13 : -1;
}

/**
 * Calls `onLine(bytes, start, end, lineNo, encoding)` for every line of `path` ('-' = stdin),
 * lineNo from 1: the line is `bytes[start, end)` without its terminator, and
 * `bytes.toString(encoding, start, end)` is its text. The buffer is valid only during the
 * call (it is the chunk being split). `encoding` is 'latin1' (one byte, one character) for
 * every line of an all-ASCII chunk whatever the encoding asked for, else the one asked for.
 * For readers that decode fields straight from the bytes.
 */
export async function forEachLineBytes(
  path: string,
  onLine: (bytes: Buffer, start: number, end: number, lineNo: number, encoding: LineEncoding) => void,
  options: LineSourceOptions = {},
): Promise<LineSourceStats> {
  const encoding = options.encoding ?? 'utf8';
  const stats: LineSourceStats = { lines: 0, rawBytes: 0, gzip: false, sha256: '' };
  let terminator = -1; // 10 (LF) or 13 (CR), decided on the first chunk
  let carry: Buffer | null = null;
  let lineNo = 0;
  const until = options.until ?? { byte: Infinity };
  let stopped = false; // a line reached `until.byte`: the rest is only read
  let decoded = 0; // bytes the source gave so far
  for await (const chunk of openByteSource(path, stats)) {
    decoded += chunk.length;
    if (stopped) continue;
    let buf: Buffer = chunk;
    let start = 0;
    if (terminator < 0) {
      buf = carry === null ? chunk : Buffer.concat([carry, chunk]);
      carry = null;
      if (decoded === buf.length && buf.length >= 3 && buf[0] === 0xef && buf[1] === 0xbb && buf[2] === 0xbf) buf = buf.subarray(3);
      terminator = lineTerminator(buf);
      if (terminator < 0) {
        carry = buf; // no terminator yet, or a CR as the very last byte: wait for more
        checkLineLength(carry, lineNo, path);
        continue;
      }
    } else if (carry !== null) {
      // the line begun in the last chunk: only it is joined (copying every chunk behind the
      // carried bytes cost 0.3–0.5 s of a 300 MB read)
      const end = chunk.indexOf(terminator);
      if (end < 0) {
        carry = Buffer.concat([carry, chunk]);
        checkLineLength(carry, lineNo, path);
        continue;
      }
      if (decoded - chunk.length + end >= until.byte) {
        stopped = true;
        continue;
      }
      const line = Buffer.concat([carry, chunk.subarray(0, end)]);
      carry = null;
      const stop = terminator === 10 && line.length > 0 && line[line.length - 1] === 13 ? line.length - 1 : line.length;
      onLine(line, 0, stop, ++lineNo, asciiOr(line, encoding));
      start = end + 1;
    }
    const bufByte = decoded - buf.length; // offset in the (decoded) file of buf[0]
    // one decoder call per line over the bytes between terminators (by the consumer): after
    // JIT warm-up this runs at ~10 M lines/s, faster than decoding a whole 1 MiB chunk to one
    // string (scripts/bench/parse.ts); no string outlives its line, so nothing pins a chunk
    const enc = asciiOr(buf, encoding);
    let end = buf.indexOf(terminator, start);
    while (end >= 0) {
      if (bufByte + end >= until.byte) {
        stopped = true;
        break;
      }
      const stop = terminator === 10 && end > start && buf[end - 1] === 13 ? end - 1 : end;
      onLine(buf, start, stop, ++lineNo, enc);
      start = end + 1;
      end = buf.indexOf(terminator, start);
    }
    if (stopped) continue;
    carry = start < buf.length ? buf.subarray(start) : null;
    if (carry !== null) checkLineLength(carry, lineNo, path);
    if (options.onChunkEnd) await options.onChunkEnd();
  }
  // the last line, with no terminator: delivered when it starts before `until.byte`
  if (carry !== null && carry.length > 0 && decoded - carry.length < until.byte) {
    const stop = carry[carry.length - 1] === 13 ? carry.length - 1 : carry.length;
    onLine(carry, 0, stop, ++lineNo, asciiOr(carry, encoding));
  }
  stats.lines = lineNo;
  return stats;
}

/** 'latin1' for an all-ASCII buffer read as UTF-8 (the same text, a cheaper decoder). */
export function asciiOr(buf: Buffer, encoding: LineEncoding): LineEncoding {
  return encoding === 'utf8' && isAscii(buf) ? 'latin1' : encoding;
}

/** Calls `onLine(text, lineNo)` for every line of `path` ('-' = stdin), lineNo from 1. */
export function forEachLine(
  path: string,
  onLine: (text: string, lineNo: number) => void,
  options: LineSourceOptions = {},
): Promise<LineSourceStats> {
  return forEachLineBytes(path, (bytes, start, end, lineNo, enc) => onLine(bytes.toString(enc, start, end), lineNo), options);
}
