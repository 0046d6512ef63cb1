/**
 * Parsed orbit rows packed for a trip between threads (./orbitExportParts.ts): the numbers of
 * up to BATCH_ROWS rows in one Float64Array (its buffer is transferred, not copied), their
 * strings joined into one string, and the lines rejected or skipped in the same stretch of
 * lines. Unpacking gives back every OrbitRow field as it was (numbers bit for bit, NaN
 * included; strings equal), so a row read on another thread reaches the catalogue exactly as
 * a row read here. Line numbers are those of the part the rows came from (1 = its first line).
 */
import type { InputError, OrbitRow } from './types.js';

/** Rows a batch holds (about 3 MB of numbers). */
export const BATCH_ROWS = 16_384;

/**
 * A batch row: the numeric OrbitRow fields in the order of `writeNumbers`, then the kind
 * (1 = comet), the line number, the line's first byte and its length.
 */
const KIND = 21;
const LINE = KIND + 1;
const BYTE = KIND + 2;
const LENGTH = KIND + 3;
/** Numbers a batch row takes. */
const ROW_SLOTS = KIND + 4;

/**
 * The numeric fields of `row` into v[o, o + KIND), written out: a loop over the field names
 * took 3.2 s of the worker's CPU profile on the 1.5 M-row bench dump, this 0.7 s.
 */
function writeNumbers(row: OrbitRow, v: Float64Array, o: number): void {
  v[o] = row.number; v[o + 1] = row.epochJdTT; v[o + 2] = row.aAu; v[o + 3] = row.qAu; v[o + 4] = row.e;
  v[o + 5] = row.iDeg; v[o + 6] = row.nodeDeg; v[o + 7] = row.periDeg; v[o + 8] = row.meanAnomalyDeg;
  v[o + 9] = row.tpJdTT; v[o + 10] = row.meanMotionDegPerDay; v[o + 11] = row.H; v[o + 12] = row.G;
  v[o + 13] = row.uncertainty; v[o + 14] = row.nObs; v[o + 15] = row.nOpp; v[o + 16] = row.arcDays;
  v[o + 17] = row.firstObsYear; v[o + 18] = row.lastObsYear; v[o + 19] = row.lastObsJdTT; v[o + 20] = row.rmsArcsec;
}

/** The numeric fields of `row` back from v[o, o + KIND). */
function readNumbers(v: Float64Array, o: number, row: OrbitRow): void {
  row.number = v[o]; row.epochJdTT = v[o + 1]; row.aAu = v[o + 2]; row.qAu = v[o + 3]; row.e = v[o + 4];
  row.iDeg = v[o + 5]; row.nodeDeg = v[o + 6]; row.periDeg = v[o + 7]; row.meanAnomalyDeg = v[o + 8];
  row.tpJdTT = v[o + 9]; row.meanMotionDegPerDay = v[o + 10]; row.H = v[o + 11]; row.G = v[o + 12];
  row.uncertainty = v[o + 13]; row.nObs = v[o + 14]; row.nOpp = v[o + 15]; row.arcDays = v[o + 16];
  row.firstObsYear = v[o + 17]; row.lastObsYear = v[o + 18]; row.lastObsJdTT = v[o + 19]; row.rmsArcsec = v[o + 20];
}

/** Strings a row carries, in this order, joined with '\n' (no field of a line holds one). */
const STRING_COUNT = 5;

/** A line the text parser rejected, as it crosses threads (its InputError's fields). */
export interface PackedReject {
  line: number; // in the part
  column: number;
  reason: string;
  text: string;
}

/** Rows, rejects and skipped lines of one stretch of a part, in line order. */
export interface OrbitRowBatch {
  numbers: ArrayBuffer; // ROW_SLOTS numbers a row
  rows: number;
  strings: string; // designation, packed designation, name, U code, reference of each row
  rejects: PackedReject[];
  skipped: number; // blank and separator lines
}

/** Collects rows into batches; `take` hands the batch over and starts the next. */
export class OrbitRowBatchWriter {
  private numbers = new Float64Array(BATCH_ROWS * ROW_SLOTS);
  private strings: string[] = [];
  private rejects: PackedReject[] = [];
  rows = 0;
  private skipped = 0;

  get full(): boolean {
    return this.rows === BATCH_ROWS;
  }

  /** Adds `row`, read from part line `line`, whose bytes are [byte, byte + length) of the file. */
  addRow(row: OrbitRow, line: number, byte: number, length: number): void {
    const v = this.numbers;
    const o = this.rows * ROW_SLOTS;
    writeNumbers(row, v, o);
    v[o + KIND] = row.kind === 'comet' ? 1 : 0;
    v[o + LINE] = line;
    v[o + BYTE] = byte;
    v[o + LENGTH] = length;
    this.strings.push(row.designation, row.packedDesignation, row.name, row.uncertaintyCode, row.reference);
    this.rows++;
  }

  addReject(err: InputError, line: number): void {
    this.rejects.push({ line, column: err.column, reason: err.reason, text: err.text });
  }

  addSkip(): void {
    this.skipped++;
  }

  /** The batch so far (its numbers' buffer to be transferred), and a fresh one begun. */
  take(): OrbitRowBatch {
    const batch: OrbitRowBatch = {
      numbers: this.numbers.buffer as ArrayBuffer, rows: this.rows, strings: this.strings.join('\n'),
      rejects: this.rejects, skipped: this.skipped,
    };
    this.numbers = new Float64Array(BATCH_ROWS * ROW_SLOTS);
    this.strings = [];
    this.rejects = [];
    this.rows = 0;
    this.skipped = 0;
    return batch;
  }
}

/** Receives a batch's rows and rejects, in line order (line numbers of the part). */
export interface BatchSink {
  row(row: OrbitRow, line: number, byte: number, length: number): void;
  reject(r: PackedReject): void;
}

/**
 * Unpacks `batch` into the scratch `row`, handing rows and rejects to `sink` in line order
 * (each batch holds one stretch of lines, so batches taken in order give every line in order).
 */
export function unpackBatch(batch: OrbitRowBatch, row: OrbitRow, sink: BatchSink): void {
  const v = new Float64Array(batch.numbers, 0, batch.rows * ROW_SLOTS);
  const strings = batch.rows > 0 ? batch.strings.split('\n') : [];
  if (strings.length !== batch.rows * STRING_COUNT) {
    throw new RangeError(`unpackBatch: ${strings.length} strings for ${batch.rows} rows`);
  }
  let r = 0; // next reject
  for (let k = 0; k < batch.rows; k++) {
    const o = k * ROW_SLOTS;
    const line = v[o + LINE];
    while (r < batch.rejects.length && batch.rejects[r].line < line) sink.reject(batch.rejects[r++]);
    readNumbers(v, o, row);
    row.kind = v[o + KIND] === 1 ? 'comet' : 'asteroid';
    const s = k * STRING_COUNT;
    row.designation = strings[s];
    row.packedDesignation = strings[s + 1];
    row.name = strings[s + 2];
    row.uncertaintyCode = strings[s + 3];
    row.reference = strings[s + 4];
    sink.row(row, line, v[o + BYTE], v[o + LENGTH]);
  }
  while (r < batch.rejects.length) sink.reject(batch.rejects[r++]);
}
