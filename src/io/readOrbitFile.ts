/**
 * Reads one orbit input of any known format: streams its lines (./lineSource.ts), finds a
 * header block, detects the format (./detectFormat.ts) unless told, and hands every data row
 * to `onRow` in one reused scratch OrbitRow (copy what you keep) with its line number and a
 * function that gives its raw text (for CSV: the record's lines), or every bad one to
 * `onReject`. The text is decoded only when asked for, and only during the call (like the
 * row, it belongs to the line being read): a kept row needs none. Invariant the pipeline builds on: linesRead = rows + rejected, where linesRead
 * counts data lines (records for CSV); header, blank and separator lines are `skipped`.
 * Fatal problems with the whole file → UnreadableInputError (`FILE: reason`).
 *
 * The first PROBE_LINES lines are held back to decide the header block and the format, then
 * replayed; after that every line goes straight to its parser. Orbit export lines are read
 * from their bytes (./orbitExportBytes.ts) and decoded for the text parser only when that
 * reader cannot take them (bad or unusual lines, non-ASCII UTF-8): the same rows, the same
 * rejects with the same messages.
 *
 * With `threads` ≥ 2 a large plain orbit export file is read on two threads
 * (./orbitExportParts.ts): once the format is known, a worker parses the lines from a line
 * start near `MAIN_SHARE` of the file to its end while this thread parses the lines before
 * it (and still reads and hashes every byte); the worker's rows, rejects and skipped lines
 * are then handed on after this thread's own, with their line numbers: the same calls in the
 * same order as one thread makes, the same summary. The raw text of a worker's row is read
 * back from the file when asked for. Gzip, CSV, the comet format, stdin and files under
 * PARALLEL_MIN_BYTES stay on one thread.
 */
import type { BodyKindRule, CsvKindChoice } from './bodyKind.js';
import type { ColumnMapping } from './columnMap.js';
import { parseCometExportLine } from './cometExportLine.js';
import { CsvTableReader } from './csvTable.js';
import { detectFormat, headerBlockLength } from './detectFormat.js';
import { forEachLineBytes, MAX_LINE_BYTES, type LineEncoding } from './lineSource.js';
import { UnreadableInputError } from './errors.js';
import { OrbitExportBytesReader } from './orbitExportBytes.js';
import { parseOrbitExportLine } from './orbitExportLine.js';
import { OrbitExportPartThread, planSplit, PARALLEL_MIN_BYTES } from './orbitExportParts.js';
import { unpackBatch, type PackedReject } from './orbitRowBatch.js';
import { closeSync, openSync, readSync } from 'node:fs';
import { emptyOrbitRow, InputError, type InputFormat, type OrbitRow } from './types.js';

/** Lines held back to find a header block and the format (a real header is ~45 lines). */
export const PROBE_LINES = 200;
/**
 * Share of a file's bytes this thread parses when a worker takes the rest. This thread also
 * unpacks the worker's rows and hands every row on (to the catalogue builder), the worker
 * packs its rows; the share balances the two threads' CPU time on the 1.5 M-row bench dump
 * (this thread / the others: 2.9–3.0 s / ≈ 5 s at 0.2, 3.2–3.9 / ≈ 4 at 0.35, 3.5–3.6 / ≈ 4
 * at 0.42, loaded machine; DEVELOPERS.md, ingest row).
 */
export const MAIN_SHARE = 0.45;

export interface ReadOrbitOptions {
  format?: InputFormat; // skip detection
  columns?: ColumnMapping; // CSV: explicit field → header mapping
  csvKind?: CsvKindChoice; // CSV: class rows by designation ('auto', default) or force one kind
  encoding?: LineEncoding; // default 'utf8'
  threads?: number; // ≥ 2: a large plain orbit export file is parsed on two threads; default 1
  parallelMinBytes?: number; // smallest file read on two threads; PARALLEL_MIN_BYTES but for tests
  mainShare?: number; // MAIN_SHARE but for tests and benchmarks
}

export interface ReadOrbitSummary {
  file: string;
  format: InputFormat;
  linesRead: number; // data rows = rows + rejected
  rows: number;
  rejected: number;
  skipped: number; // header, blank and separator lines
  lines: number; // physical lines in the input
  bytes: number; // raw bytes read (compressed size for gzip)
  gzip: boolean;
  sha256: string; // of the raw bytes as read, hex
  kindRule: BodyKindRule; // what classed the rows as asteroids or comets (./bodyKind.ts)
  kinds: { asteroid: number; comet: number }; // rows handed on as each kind (rows = their sum)
  parseThreads: number; // 2 when a worker parsed the second part of the file, else 1
}

type Sink = (text: string, lineNo: number) => void;
/** Receives each good row: the scratch row, its line number, and its raw text on demand. */
export type OrbitRowSink = (row: OrbitRow, lineNo: number, text: () => string) => void;
type LineParser = typeof parseOrbitExportLine;
type Counts = { rows: number; rejected: number; skipped: number };

/**
 * Sink of a fixed-width format: each line parsed into the scratch `row`, then counted as a
 * row (handed to `onRow`), a skip, or a reject (its InputError handed to `onReject`).
 */
function fixedWidthSink(
  parse: LineParser,
  path: string,
  row: OrbitRow,
  counts: Counts,
  onRow: (row: OrbitRow, lineNo: number, text: string) => void,
  onReject: (err: InputError) => void,
): Sink {
  return (text, lineNo) => {
    let outcome;
    try {
      outcome = parse(text, row, path, lineNo);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      counts.rejected++;
      onReject(err);
      return;
    }
    if (outcome === 'skip') counts.skipped++;
    else {
      counts.rows++;
      onRow(row, lineNo, text);
    }
  };
}

/** Reads `path` ('-' = stdin); see the file comment. */
export async function readOrbitFile(
  path: string,
  options: ReadOrbitOptions,
  onRow: OrbitRowSink,
  onReject: (err: InputError) => void,
): Promise<ReadOrbitSummary> {
  const row = emptyOrbitRow();
  const counts: Counts = { rows: 0, rejected: 0, skipped: 0 };
  let format: InputFormat | undefined = options.format;
  let sink: Sink | null = null;
  let csv: CsvTableReader | null = null;
  let fast: OrbitExportBytesReader | null = null; // orbit export lines straight from their bytes
  const heldTexts: string[] = [];
  const heldNos: number[] = [];
  const kinds = { asteroid: 0, comet: 0 };
  // The raw text of the row being handed on: given, or decoded from its bytes when asked for.
  let rowText: string | null = null;
  let rowBytes: Buffer | null = null;
  let rowStart = 0;
  let rowEnd = 0;
  let rowEncoding: LineEncoding = 'latin1';
  const textOfRow = (): string => (rowText ??= rowBytes!.toString(rowEncoding, rowStart, rowEnd));
  const countRow = (r: OrbitRow, lineNo: number, text: string): void => {
    kinds[r.kind]++;
    rowText = text;
    onRow(r, lineNo, textOfRow);
  };

  // Two threads: the worker reading past the split (once the format is known), and the byte
  // where this thread's lines stop; `reading` is false once the lines are all delivered.
  let reading = true;
  const two = { part: null as OrbitExportPartThread | null };
  const until = { byte: Infinity };

  const decide = (): void => {
    const header = format === 'csv' ? 0 : headerBlockLength(heldTexts);
    format ??= detectFormat(heldTexts.slice(header), path);
    if (format === 'orbit-export' && reading && (options.threads ?? 1) >= 2) {
      const plan = planSplit(path, options.mainShare ?? MAIN_SHARE, PROBE_LINES, options.parallelMinBytes ?? PARALLEL_MIN_BYTES);
      if (plan !== null) {
        two.part = new OrbitExportPartThread(path, plan, options.encoding ?? 'utf8');
        until.byte = plan.split;
      }
    }
    if (format === 'csv') {
      csv = new CsvTableReader(path, options.columns ?? {}, row, countRow, onReject, options.csvKind ?? 'auto');
      const reader = csv;
      sink = (text, lineNo) => reader.pushLine(text, lineNo);
    } else {
      const parse = format === 'orbit-export' ? parseOrbitExportLine : parseCometExportLine;
      sink = fixedWidthSink(parse, path, row, counts, countRow, onReject);
      if (format === 'orbit-export') fast = new OrbitExportBytesReader();
    }
    counts.skipped += header;
    for (let k = header; k < heldTexts.length; k++) sink(heldTexts[k], heldNos[k]);
    heldTexts.length = 0;
    heldNos.length = 0;
  };

  let stats;
  try {
    stats = await forEachLineBytes(path, (bytes, start, end, lineNo, encoding) => {
      if (fast !== null && encoding === 'latin1' && fast.read(bytes, start, end, row)) {
        counts.rows++;
        kinds[row.kind]++;
        rowText = null;
        rowBytes = bytes;
        rowStart = start;
        rowEnd = end;
        rowEncoding = encoding;
        onRow(row, lineNo, textOfRow);
        return;
      }
      const text = bytes.toString(encoding, start, end);
      if (sink !== null) return sink(text, lineNo);
      heldTexts.push(text);
      heldNos.push(lineNo);
      if (heldTexts.length >= PROBE_LINES) decide();
    }, {
      encoding: options.encoding,
      onChunkEnd: () => (csv !== null ? (csv as CsvTableReader).flush() : undefined),
      until,
    });
    reading = false;
    if (sink === null) decide();
    const part = two.part;
    if (part !== null) {
      if (stats.rawBytes !== part.plan.size) {
        throw new UnreadableInputError(path, `changed while it was read (${part.plan.size} bytes at the start, ${stats.rawBytes} read)`);
      }
      stats.lines += await handOnPart(part, path, stats.lines, options.encoding ?? 'utf8', row, counts, kinds, onRow, onReject);
    }
  } finally {
    two.part?.stop();
  }
  if (csv !== null) {
    const c = await (csv as CsvTableReader).finish();
    counts.rows = c.rows;
    counts.rejected = c.rejected;
    counts.skipped = c.skipped;
  }
  return {
    file: path, format: format!, linesRead: counts.rows + counts.rejected, ...counts,
    lines: stats.lines, bytes: stats.rawBytes, gzip: stats.gzip, sha256: stats.sha256,
    kindRule: format !== 'csv' ? 'format' : (options.csvKind ?? 'auto') === 'auto' ? 'designation-pattern' : 'forced',
    kinds, parseThreads: two.part !== null ? 2 : 1,
  };
}

/**
 * Hands on the worker's part in order, after this thread's `linesBefore` lines: its rows
 * (raw text read back from the file when asked for), rejects and skipped lines, counted as
 * one thread counts them. Returns the part's line count; a line too long there is fatal here
 * as it would have been on one thread, after the lines before it.
 */
async function handOnPart(
  part: OrbitExportPartThread, path: string, linesBefore: number, encoding: LineEncoding, row: OrbitRow,
  counts: Counts, kinds: { asteroid: number; comet: number }, onRow: OrbitRowSink, onReject: (err: InputError) => void,
): Promise<number> {
  const fd = openSync(path, 'r');
  let textByte = 0;
  let textLength = 0;
  let text: string | null = null;
  const textOfRow = (): string => (text ??= lineText(fd, textByte, textLength, encoding));
  const sink = {
    row(r: OrbitRow, line: number, byte: number, length: number): void {
      counts.rows++;
      kinds[r.kind]++;
      textByte = byte;
      textLength = length;
      text = null;
      onRow(r, linesBefore + line, textOfRow);
    },
    reject(j: PackedReject): void {
      counts.rejected++;
      onReject(new InputError(path, linesBefore + j.line, j.column, j.reason, j.text));
    },
  };
  try {
    for (;;) {
      const m = await part.next();
      if ('error' in m) throw new Error(`${path}: reading the second part on a worker thread failed: ${m.error}`);
      if ('end' in m) {
        if (m.end.tooLongLine > 0) {
          throw new UnreadableInputError(path, `line ${linesBefore + m.end.tooLongLine} is longer than ${MAX_LINE_BYTES} bytes; not a line-oriented text file`);
        }
        return m.end.lines;
      }
      counts.skipped += m.batch.skipped;
      unpackBatch(m.batch, row, sink);
    }
  } finally {
    closeSync(fd);
  }
}

/** The text of bytes [byte, byte + length) of the open file, decoded as the line reader decodes it. */
function lineText(fd: number, byte: number, length: number, encoding: LineEncoding): string {
  const buf = Buffer.allocUnsafe(length);
  let got = 0;
  while (got < length) {
    const n = readSync(fd, buf, got, length - got, byte + got);
    if (n === 0) break;
    got += n;
  }
  return buf.toString(encoding, 0, got);
}
