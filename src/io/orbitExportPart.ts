/**
 * The lines of bytes [start, end) of a plain orbit export file, parsed exactly as
 * ./readOrbitFile.ts parses them after the header (the byte reader of ./orbitExportBytes.ts,
 * the text parser where it declines), into batches (./orbitRowBatch.ts). Runs on a worker
 * thread for ./orbitExportParts.ts; a function of its own so tests can run it here.
 *
 * `start` must be the first byte of a line and the file's lines must end in LF or CRLF (the
 * CR is dropped as ./lineSource.ts drops it). Reads are aligned to the chunks the reading
 * thread's stream uses (CHUNK_BYTES from the start of the file), so a line too long for
 * ./lineSource.ts is found too long at the same line here. Line numbers count from 1 at
 * `start`. Nothing here is allocated per line but the strings the row keeps.
 */
import { closeSync, openSync, readSync } from 'node:fs';
import { CHUNK_BYTES } from './byteSource.js';
import { asciiOr, MAX_LINE_BYTES, type LineEncoding } from './lineSource.js';
import { OrbitExportBytesReader } from './orbitExportBytes.js';
import { parseOrbitExportLine } from './orbitExportLine.js';
import { OrbitRowBatchWriter, type OrbitRowBatch } from './orbitRowBatch.js';
import { emptyOrbitRow, InputError } from './types.js';

/** Where a part is and how its lines are decoded. */
export interface OrbitExportPartSpec {
  path: string; // as named in messages
  start: number; // first byte (the start of a line)
  end: number; // byte after the last (the file's size)
  encoding: LineEncoding; // as asked of ./lineSource.ts
}

/** How a part ended: its line count, or the line found too long (UnreadableInputError there). */
export interface OrbitExportPartEnd {
  lines: number;
  tooLongLine: number; // part line number of a line longer than MAX_LINE_BYTES, or 0
}

/** Reads the part, handing each full batch (and the last, partial one) to `onBatch` in order. */
export function readOrbitExportPart(spec: OrbitExportPartSpec, onBatch: (batch: OrbitRowBatch) => void): OrbitExportPartEnd {
  const row = emptyOrbitRow();
  const fast = new OrbitExportBytesReader();
  const out = new OrbitRowBatchWriter();
  let lineNo = 0;
  let lineByte = 0; // file offset of the line being handed on
  const onLine = (buf: Buffer, from: number, to: number, enc: LineEncoding): void => {
    lineNo++;
    if (enc === 'latin1' && fast.read(buf, from, to, row)) out.addRow(row, lineNo, lineByte, to - from);
    else {
      try {
        if (parseOrbitExportLine(buf.toString(enc, from, to), row, spec.path, lineNo) === 'skip') out.addSkip();
        else out.addRow(row, lineNo, lineByte, to - from);
      } catch (err) {
        if (!(err instanceof InputError)) throw err;
        out.addReject(err, lineNo);
      }
    }
    if (out.full) onBatch(out.take());
  };

  const fd = openSync(spec.path, 'r');
  try {
    let buf = Buffer.allocUnsafe(2 * CHUNK_BYTES); // reused: carry at its front, then the next chunk
    let carry = 0; // bytes of an unfinished line at buf[0, carry)
    let pos = spec.start; // next byte to read
    while (pos < spec.end) {
      const chunkEnd = Math.min(spec.end, (Math.floor(pos / CHUNK_BYTES) + 1) * CHUNK_BYTES);
      if (carry + (chunkEnd - pos) > buf.length) {
        const bigger = Buffer.allocUnsafe(2 * (carry + CHUNK_BYTES));
        buf.copy(bigger, 0, 0, carry);
        buf = bigger;
      }
      const filled = carry + readFully(fd, buf, carry, chunkEnd - pos, pos);
      const bufByte = pos - carry; // file offset of buf[0]
      pos = chunkEnd;
      const view = buf.subarray(0, filled);
      const enc = asciiOr(view, spec.encoding);
      let from = 0;
      let lf = view.indexOf(10, from);
      while (lf >= 0) {
        const to = lf > from && view[lf - 1] === 13 ? lf - 1 : lf;
        lineByte = bufByte + from;
        onLine(view, from, to, enc);
        from = lf + 1;
        lf = view.indexOf(10, from);
      }
      carry = filled - from;
      if (carry > MAX_LINE_BYTES) {
        onBatch(out.take());
        return { lines: lineNo, tooLongLine: lineNo + 1 };
      }
      if (from > 0) buf.copyWithin(0, from, filled);
      if (pos >= spec.end && carry > 0) {
        const to = buf[carry - 1] === 13 ? carry - 1 : carry;
        lineByte = bufByte + from;
        onLine(buf, 0, to, asciiOr(buf.subarray(0, carry), spec.encoding));
      }
    }
  } finally {
    closeSync(fd);
  }
  onBatch(out.take());
  return { lines: lineNo, tooLongLine: 0 };
}

/** Reads `length` bytes at file offset `position` into buf[at, …); fewer only at the end of the file. */
function readFully(fd: number, buf: Buffer, at: number, length: number, position: number): number {
  let got = 0;
  while (got < length) {
    const n = readSync(fd, buf, at + got, length - got, position + got);
    if (n === 0) break;
    got += n;
  }
  return got;
}
