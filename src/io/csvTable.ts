/**
 * CSV/TSV tables with a header row, streamed through csv-parse. Lines come from the line
 * source (so gzip, stdin and hashing work as for every format) and are written to the
 * parser in one batch per chunk. The delimiter is sniffed from the header line
 * (./csvDelimiter.ts).
 *
 * Accounting: every non-blank line after the header ends up in exactly one accepted record
 * or one rejection. csv-parse runs with relax_column_count (a row with the wrong number of
 * fields is rejected here, by line, rather than stopping the file) and
 * skip_records_with_error (a quoting error rejects the record and parsing goes on). Records
 * and errors arrive in order (on_record and 'skip' are synchronous), each with the line it
 * ends on; the non-blank lines since the previous record belong to it. Lines a quoting error
 * swallowed are rejected one by one, naming the error.
 *
 * A header that lacks the required columns (./columnMap.ts missingRequired) or a mapping
 * naming a header the file lacks → UnreadableInputError for the whole file.
 */
import { once } from 'node:events';
import { finished } from 'node:stream/promises';
import { parse, type Options, type Parser } from 'csv-parse';
import type { CsvKindChoice } from './bodyKind.js';
import { checkColumnMapping, mapColumns, missingRequired, type ColumnIndex, type ColumnMapping } from './columnMap.js';
import { sniffDelimiter } from './csvDelimiter.js';
import { parseCsvRecord, type RecordContext } from './csvRecord.js';
import { UnreadableInputError } from './errors.js';
import { InputError, type OrbitRow } from './types.js';

export interface CsvCounts {
  rows: number;
  rejected: number;
  skipped: number; // header and blank lines
}

interface CsvError extends Error {
  lines?: number;
  raw?: string;
}

/** Streaming reader of one CSV/TSV input; feed it lines, then finish(). */
export class CsvTableReader {
  readonly counts: CsvCounts = { rows: 0, rejected: 0, skipped: 0 };
  private parser: Parser | null = null;
  private batch: string[] = [];
  private headers: string[] | null = null;
  private index: ColumnIndex | null = null;
  private fatal: Error | null = null;
  private pendingNos: number[] = []; // non-blank lines not yet given to a record
  private pendingTexts: string[] = [];
  private pendingHead = 0;
  /** Reused for every record (no per-record objects beyond csv-parse's own arrays). */
  private readonly ctx: RecordContext = { file: '', line: 0, headers: [], raw: '', kind: 'auto' };

  constructor(
    private readonly file: string,
    private readonly mapping: ColumnMapping,
    private readonly row: OrbitRow,
    private readonly onRow: (row: OrbitRow, lineNo: number, text: string) => void,
    private readonly onReject: (err: InputError) => void,
    kind: CsvKindChoice = 'auto', // how rows are classed (./bodyKind.ts)
  ) {
    checkColumnMapping(mapping);
    this.ctx.kind = kind;
  }

  /** One input line (from forEachLine), 1-based line numbers in order. */
  pushLine(text: string, lineNo: number): void {
    if (text.trim() === '') this.counts.skipped++;
    else {
      this.pendingNos.push(lineNo);
      this.pendingTexts.push(text);
      if (this.parser === null) this.parser = this.makeParser(sniffDelimiter(text));
    }
    this.batch.push(text);
  }

  /** Writes the batched lines to the parser; waits while it is full. */
  async flush(): Promise<void> {
    if (this.batch.length > 0 && this.parser !== null) {
      const text = this.batch.join('\n') + '\n';
      this.batch = [];
      // wait for room; events.once rejects if the parser fails meanwhile (no hang)
      if (!this.parser.write(text) && !this.parser.destroyed) {
        await once(this.parser, 'drain').catch((err: Error) => {
          this.fatal ??= err;
        });
      }
    }
    if (this.fatal) throw this.fatal;
  }

  /** Ends the input; rejects lines no record claimed; throws the file's fatal error if any. */
  async finish(): Promise<CsvCounts> {
    await this.flush();
    if (this.parser !== null) {
      const parser = this.parser;
      parser.end();
      parser.resume();
      // resolves on 'end', rejects on an error even if it was emitted already
      await finished(parser).catch((err: Error) => {
        this.fatal ??= err;
      });
    }
    if (this.fatal) throw this.fatal;
    this.claim(Infinity, 'not part of any record: an unterminated quoted field runs to the end of the file');
    return this.counts;
  }

  private makeParser(delimiter: string): Parser {
    const options: Options = {
      delimiter, relax_column_count: true, skip_empty_lines: true, skip_records_with_error: true,
      trim: true,
      on_record: (rec, ctx) => {
        this.onRecord(rec as string[], ctx.lines);
        return null; // handled here, nothing is buffered in the stream
      },
    };
    const parser = parse(options);
    parser.on('skip', (err: CsvError) => this.claim(err.lines ?? Infinity, `malformed CSV: ${err.message}`));
    parser.on('error', (err: Error & { code?: string }) => {
      // the parser's own failures name the file; anything else (a callback that threw) is
      // passed on as it is
      this.fatal ??= err.code?.startsWith('CSV_') ? new UnreadableInputError(this.file, `CSV parser failed: ${err.message}`) : err;
    });
    return parser;
  }

  /** Takes the pending lines up to `endLine`: rejected, each naming `reason`. */
  private claim(endLine: number, reason: string): void {
    while (this.pendingHead < this.pendingNos.length && this.pendingNos[this.pendingHead] <= endLine) {
      const k = this.pendingHead++;
      this.counts.rejected++;
      this.onReject(new InputError(this.file, this.pendingNos[k], 0, reason, this.pendingTexts[k]));
    }
    this.compact();
  }

  /**
   * Takes the pending lines of one record into ctx (its first line and raw text); false
   * when it has none (a line of blanks, already counted as skipped, that csv-parse turned
   * into an empty record).
   */
  private take(endLine: number): boolean {
    const first = this.pendingHead;
    while (this.pendingHead < this.pendingNos.length && this.pendingNos[this.pendingHead] <= endLine) this.pendingHead++;
    if (first === this.pendingHead) return false;
    this.ctx.line = this.pendingNos[first];
    this.ctx.raw = this.pendingHead - first === 1 ? this.pendingTexts[first]
      : this.pendingTexts.slice(first, this.pendingHead).join('\n');
    this.compact();
    return true;
  }

  private compact(): void {
    if (this.pendingHead > 4096 && this.pendingHead * 2 > this.pendingNos.length) {
      this.pendingNos = this.pendingNos.slice(this.pendingHead);
      this.pendingTexts = this.pendingTexts.slice(this.pendingHead);
      this.pendingHead = 0;
    }
  }

  private onRecord(record: string[], endLine: number): void {
    if (this.fatal) return;
    if (!this.take(endLine)) return;
    const { line, raw } = this.ctx;
    if (this.headers === null) {
      this.counts.skipped++;
      this.setHeader(record);
      return;
    }
    try {
      if (record.length !== this.headers.length) {
        throw new InputError(this.file, line, 0, `${record.length} fields where the header has ${this.headers.length}`, raw);
      }
      parseCsvRecord(record, this.index!, this.ctx, this.row);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      this.counts.rejected++;
      this.onReject(err);
      return;
    }
    this.counts.rows++;
    this.onRow(this.row, line, raw);
  }

  private setHeader(record: string[]): void {
    this.headers = record.map((h) => h.trim());
    this.ctx.file = this.file;
    this.ctx.headers = this.headers;
    const { index, missingMapped } = mapColumns(this.headers, this.mapping);
    const found = `headers found: ${this.headers.join(', ')}`;
    if (missingMapped.length > 0) {
      this.fatal = new UnreadableInputError(this.file, `column mapping names headers the file lacks (${missingMapped.join(', ')}); ${found}`, 'columns');
      return;
    }
    const missing = missingRequired(index);
    if (missing.length > 0) {
      this.fatal = new UnreadableInputError(this.file, `header lacks required orbit columns (${missing.join('; ')}); ${found}`, 'columns');
      return;
    }
    this.index = index;
  }
}
