/**
 * Builds a columnar Catalogue row by row: validates, completes the element set, computes
 * quality flags, and settles duplicate designations (newest epoch kept, the others
 * rejected with a reason that names the row kept). Columns grow by doubling; no object
 * is kept per row. Every row offered is either accepted or rejected: read = accepted +
 * rejected holds at every moment.
 */
import { RAD_PER_DEG } from '../core/constants.js';
import type { OrbitRow } from '../io/types.js';
import { completeElements, type CompleteElements } from './derivedElements.js';
import { qualityWord } from './qualityFlags.js';
import { NumberSlotIndex, StringSlotIndex } from './slotIndex.js';
import { DEFAULT_QUALITY, DEFAULT_VALIDITY, type QualityThresholds, type ValidityLimits } from './thresholds.js';
import { KIND_ASTEROID, KIND_COMET, qualityBit, type Catalogue, type Reject } from './types.js';
import { invalidReason } from './validate.js';

const DUPLICATE_KEPT = qualityBit('duplicate-kept');
const FLOAT_COLUMNS = [
  'epochJdTT', 'a', 'q', 'e', 'i', 'node', 'peri', 'meanAnomaly', 'tpJdTT', 'H',
  'uncertainty', 'nObs', 'nOpp', 'arcDays',
] as const;
type FloatColumn = (typeof FLOAT_COLUMNS)[number];

/**
 * Key under which two unnumbered rows are the same body: the readable designation with
 * outer blanks dropped and inner runs of blanks made one (numbered rows match by number).
 */
export function designationKey(designation: string): string {
  const t = designation.trim();
  return t.includes('  ') || t.includes('\t') ? t.replace(/\s+/g, ' ') : t;
}

export interface BuilderOptions {
  validity?: Partial<ValidityLimits>;
  quality?: Partial<QualityThresholds>;
  expectedRows?: number; // capacity to start with (a guess is fine: columns grow past it)
}

export class CatalogueBuilder {
  private readonly validity: ValidityLimits;
  private readonly thresholds: QualityThresholds;
  private readonly elements: CompleteElements = { aAu: NaN, qAu: NaN, meanAnomalyRad: NaN, tpJdTT: NaN };
  private readonly slotByNumber: NumberSlotIndex; // numbered bodies
  private readonly slotByName: StringSlotIndex; // unnumbered, by designationKey
  private capacity = 0;
  private cols!: Record<FloatColumn, Float64Array>;
  private kind: Uint8Array = new Uint8Array(0);
  private quality: Uint32Array = new Uint32Array(0);
  private uncertaintyCode: Uint8Array = new Uint8Array(0);
  private fileIndex: Uint16Array = new Uint16Array(0);
  private source: Uint32Array = new Uint32Array(0);
  private readonly designation: string[] = [];
  private readonly names = new Map<number, string>(); // slot → proper name, named rows only
  private readonly files: string[] = []; // one entry per input, names may repeat
  private readonly fileSlot = new Map<string, number>(); // name → its latest input
  private readonly rejectedByFile: number[] = []; // rejects charged to each input
  private currentFile = -1; // input of the last row offered
  // Duplicate rejects whose reason names the row kept in `slot`: a later, newer row can
  // take the slot, so finish() names the row finally kept (duplicates only, rare).
  private readonly duplicateReasons: { reject: Reject; prefix: string; slot: number }[] = [];
  size = 0;
  read = 0;
  readonly rejects: Reject[] = [];

  constructor(options: BuilderOptions = {}) {
    this.validity = { ...DEFAULT_VALIDITY, ...options.validity };
    this.thresholds = { ...DEFAULT_QUALITY, ...options.quality };
    const expected = Math.max(1 << 12, Math.ceil(options.expectedRows ?? 0));
    this.grow(expected);
    // Presized for every row numbered, or half of them not (tables still grow past that).
    this.slotByNumber = new NumberSlotIndex(expected);
    this.slotByName = new StringSlotIndex(expected / 2);
  }

  get accepted(): number {
    return this.size;
  }

  /**
   * Start a new input: rows offered under `file` from now on are charged to it, even when
   * an earlier input had the same name (a file listed twice is two inputs). Returns its
   * input number, the index into Catalogue.files and rejectedIn().
   */
  beginFile(file: string): number {
    const k = this.files.length;
    if (k > 0xffff) throw new RangeError('more than 65 536 input files');
    this.files.push(file);
    this.rejectedByFile.push(0);
    this.fileSlot.set(file, k);
    this.currentFile = k;
    return k;
  }

  /**
   * Rows of input `k` rejected so far, superseded duplicates included (charged to the input
   * they came from). Its accepted rows are the rows read from it minus these.
   */
  rejectedIn(k: number): number {
    return this.rejectedByFile[k] ?? 0;
  }

  /** Record a row the io layer could not parse (it counts as read and rejected). */
  rejectUnparsed(file: string, line: number, reason: string, text: string): void {
    this.read++;
    this.rejectedByFile[this.fileNumber(file)]++;
    this.rejects.push({ kind: 'parse', file, line, reason, text });
  }

  /**
   * Offer a parsed row with its raw text, or a function that gives it (called only when the
   * row is rejected, during this call). Returns true if it is now in the catalogue.
   */
  add(row: OrbitRow, file: string, line: number, text: string | (() => string)): boolean {
    this.read++;
    const reason = invalidReason(row, this.validity);
    if (reason !== null) {
      this.rejectedByFile[this.fileNumber(file)]++;
      this.rejects.push({ kind: 'invalid', file, line, reason, text: typeof text === 'string' ? text : text() });
      return false;
    }
    // Claim the next slot under this body's key, unless a row of the same body holds one.
    const existing = Number.isFinite(row.number)
      ? this.slotByNumber.lookupOrInsert(row.number, this.size)
      : this.slotByName.lookupOrInsert(designationKey(row.designation), this.size);
    if (existing >= 0) return this.settleDuplicate(existing, row, file, line, text);
    if (this.size === this.capacity) this.grow(this.capacity * 2);
    const slot = this.size++;
    this.designation.push(row.designation);
    this.write(slot, row, file, line);
    return true;
  }

  private settleDuplicate(slot: number, row: OrbitRow, file: string, line: number, text: string | (() => string)): boolean {
    let reject: Reject;
    let prefix: string;
    const kept = row.epochJdTT > this.cols.epochJdTT[slot];
    if (kept) {
      // The new row is newer: it takes the slot; the row it replaces is reported. Its raw
      // text is no longer held (rows are not kept as text), so the reject names it instead.
      this.rejectedByFile[this.fileIndex[slot]]++;
      prefix = `duplicate designation ${row.designation}: older epoch than`;
      reject = {
        kind: 'duplicate', file: this.files[this.fileIndex[slot]], line: this.source[slot], reason: '',
        text: `${this.designation[slot]} (epoch JD ${this.cols.epochJdTT[slot]})`,
      };
      this.designation[slot] = row.designation;
      this.write(slot, row, file, line);
    } else {
      this.rejectedByFile[this.fileNumber(file)]++;
      prefix = `duplicate designation ${row.designation}: epoch not newer than`;
      reject = { kind: 'duplicate', file, line, text: typeof text === 'string' ? text : text(), reason: '' };
    }
    reject.reason = this.keptReason(prefix, slot);
    this.rejects.push(reject);
    this.duplicateReasons.push({ reject, prefix, slot });
    this.quality[slot] |= DUPLICATE_KEPT;
    return kept;
  }

  /** `prefix file:line, which is kept`, naming the row now in `slot`. */
  private keptReason(prefix: string, slot: number): string {
    return `${prefix} ${this.files[this.fileIndex[slot]]}:${this.source[slot]}, which is kept`;
  }

  private write(slot: number, row: OrbitRow, file: string, line: number): void {
    const el = this.elements;
    completeElements(row, el);
    const c = this.cols;
    c.epochJdTT[slot] = row.epochJdTT;
    c.a[slot] = el.aAu;
    c.q[slot] = el.qAu;
    c.e[slot] = row.e;
    c.i[slot] = row.iDeg * RAD_PER_DEG;
    c.node[slot] = row.nodeDeg * RAD_PER_DEG;
    c.peri[slot] = row.periDeg * RAD_PER_DEG;
    c.meanAnomaly[slot] = el.meanAnomalyRad;
    c.tpJdTT[slot] = el.tpJdTT;
    c.H[slot] = row.H;
    c.uncertainty[slot] = row.uncertainty;
    c.nObs[slot] = row.nObs;
    c.nOpp[slot] = row.nOpp;
    c.arcDays[slot] = row.arcDays;
    this.uncertaintyCode[slot] = row.uncertaintyCode === '' ? 0 : row.uncertaintyCode.charCodeAt(0);
    this.kind[slot] = row.kind === 'comet' ? KIND_COMET : KIND_ASTEROID;
    this.quality[slot] = qualityWord(row, this.thresholds);
    this.fileIndex[slot] = this.fileNumber(file);
    this.source[slot] = line;
    // Most rows have no name: nothing to store, and nothing to delete unless some row has one.
    if (row.name !== '') this.names.set(slot, row.name);
    else if (this.names.size > 0) this.names.delete(slot);
  }

  /** Input number of `file`: the current input when the name matches, else by name. */
  private fileNumber(file: string): number {
    const cur = this.currentFile;
    if (cur >= 0 && this.files[cur] === file) return cur;
    const k = this.fileSlot.get(file);
    this.currentFile = k === undefined ? this.beginFile(file) : k;
    return this.currentFile;
  }

  private grow(capacity: number): void {
    const next = {} as Record<FloatColumn, Float64Array>;
    for (const name of FLOAT_COLUMNS) {
      next[name] = new Float64Array(capacity);
      if (this.cols) next[name].set(this.cols[name].subarray(0, this.size));
    }
    this.cols = next;
    this.kind = resized(this.kind, capacity, this.size) as Uint8Array;
    this.quality = resized(this.quality, capacity, this.size) as Uint32Array;
    this.uncertaintyCode = resized(this.uncertaintyCode, capacity, this.size) as Uint8Array;
    this.fileIndex = resized(this.fileIndex, capacity, this.size) as Uint16Array;
    this.source = resized(this.source, capacity, this.size) as Uint32Array;
    this.capacity = capacity;
  }

  /**
   * The finished catalogue. Columns are views of the builder's buffers, trimmed to size
   * (no copy); the builder must not be used after. Duplicate rejects then name the row
   * finally kept for their body.
   */
  finish(): Catalogue {
    // Epochs only grow in a slot, so the row finally kept is as new as any row named before.
    for (const d of this.duplicateReasons) d.reject.reason = this.keptReason(d.prefix, d.slot);
    const n = this.size;
    const c = this.cols;
    return {
      size: n,
      designation: this.designation,
      names: this.names,
      kind: this.kind.subarray(0, n),
      epochJdTT: c.epochJdTT.subarray(0, n),
      a: c.a.subarray(0, n), q: c.q.subarray(0, n), e: c.e.subarray(0, n), i: c.i.subarray(0, n),
      node: c.node.subarray(0, n), peri: c.peri.subarray(0, n), meanAnomaly: c.meanAnomaly.subarray(0, n),
      tpJdTT: c.tpJdTT.subarray(0, n), H: c.H.subarray(0, n), uncertainty: c.uncertainty.subarray(0, n),
      uncertaintyCode: this.uncertaintyCode.subarray(0, n),
      nObs: c.nObs.subarray(0, n), nOpp: c.nOpp.subarray(0, n), arcDays: c.arcDays.subarray(0, n),
      quality: this.quality.subarray(0, n), fileIndex: this.fileIndex.subarray(0, n),
      source: this.source.subarray(0, n), files: this.files.slice(),
    };
  }
}

type TypedColumn = Uint8Array | Uint16Array | Uint32Array;

function resized(old: TypedColumn, capacity: number, used: number): TypedColumn {
  const Ctor = old.constructor as new (n: number) => TypedColumn;
  const next = new Ctor(capacity);
  next.set(old.subarray(0, used));
  return next;
}
