/**
 * Reader of a stream of 80-column astrometry lines: one call per line, in order. A one-line
 * record becomes an observation; the first line of a two-line record (note 2 'S' or 'V')
 * waits for its second ('s' or 'v') on the next data line, and the pair becomes one
 * observation. Every data line is accounted for: in an observation, or rejected with one
 * InputError (file, line, column, reason). An S or V line not followed by its second line,
 * a second line without its first, or a pair whose lines disagree: each line rejected with
 * its reason. Blank lines and the submission header lines (three-letter keyword and a
 * space: COD, CON, OBS, MEA, TEL, NET, BND, COM, NUM, ACK, AC2; format description, from
 * memory) are skipped, not data.
 */
import { InputError } from '../types.js';
import { parseObs80Designation } from './obs80Designation.js';
import { checkObs80Length, parseObs80Line } from './obs80Line.js';
import { noteTwoEntry } from './obs80NoteTwo.js';
import { applyRovingLine, applySpaceLine, pairMismatch } from './obs80SecondLine.js';
import type { AstrometryObservation } from './types.js';

const HEADER_LINE = /^(COD|CON|OBS|MEA|TEL|NET|BND|COM|NUM|ACK|AC2) /;
const NOTE2_COLUMN = 15;

export interface Obs80Counts {
  observations: number;
  linesInObservations: number; // 1 per one-line record, 2 per pair
  rejected: number; // rejected lines
  skipped: number; // blank and header lines
}

interface Pending {
  obs: AstrometryObservation;
  text: string;
  lineNo: number;
  second: 's' | 'v';
}

export class Obs80Reader {
  readonly counts: Obs80Counts = { observations: 0, linesInObservations: 0, rejected: 0, skipped: 0 };
  private pending: Pending | null = null;
  private lastRejectedFirst = 0; // line of the last S/V line rejected, for the reason of its second line

  constructor(
    private readonly file: string,
    private readonly onObservation: (obs: AstrometryObservation) => void,
    private readonly onReject: (err: InputError) => void,
  ) {}

  /** True for a line that is not data (blank or a submission header line). */
  static isSkippedLine(text: string): boolean {
    return text.trim() === '' || (text.length < 80 && HEADER_LINE.test(text));
  }

  pushLine(text: string, lineNo: number): void {
    if (Obs80Reader.isSkippedLine(text)) {
      this.counts.skipped++;
      return;
    }
    if (this.pending !== null) {
      const p = this.pending;
      this.pending = null;
      if (text[14] === p.second) return this.completePair(p, text, lineNo);
      this.rejectFirst(p, `${p.obs.note2} line without its ${p.second} line: the next line (${lineNo}) is not one`);
    }
    try {
      this.readLine(text, lineNo);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      if (text[14] === 'S' || text[14] === 'V') this.lastRejectedFirst = lineNo;
      this.reject(err);
    }
  }

  /** Call after the last line: an S or V line still waiting is rejected. */
  finish(): Obs80Counts {
    if (this.pending !== null) {
      const p = this.pending;
      this.pending = null;
      this.rejectFirst(p, `${p.obs.note2} line without its ${p.second} line: the file ends`);
    }
    return this.counts;
  }

  private readLine(text: string, lineNo: number): void {
    checkObs80Length(text, this.file, lineNo);
    const code = text[14];
    const entry = noteTwoEntry(code);
    if (entry === undefined) throw new InputError(this.file, lineNo, NOTE2_COLUMN, `unknown observation type '${code}' (note 2, column 15)`, text);
    if (entry.use === 'reject') throw new InputError(this.file, lineNo, NOTE2_COLUMN, `${entry.reason} (column 15)`, text);
    if (entry.use === 'pair-second') {
      const first = code.toUpperCase();
      const why = this.lastRejectedFirst === lineNo - 1 ? `its ${first} line (${lineNo - 1}) was rejected` : `no ${first} line before it`;
      throw new InputError(this.file, lineNo, NOTE2_COLUMN, `${code} line without its ${first} line: ${why}`, text);
    }
    const d = parseObs80Designation(text);
    if (typeof d === 'string') throw new InputError(this.file, lineNo, 1, d, text);
    const obs = parseObs80Line(text, this.file, lineNo, d);
    if (entry.use === 'pair-first') {
      this.pending = { obs, text, lineNo, second: code === 'S' ? 's' : 'v' };
      return;
    }
    this.accept(obs);
  }

  private completePair(p: Pending, text: string, lineNo: number): void {
    const differs = pairMismatch(p.text, text);
    if (differs !== '') {
      this.rejectFirst(p, `${p.obs.note2} line whose ${p.second} line (${lineNo}) differs in ${differs}`);
      this.reject(new InputError(this.file, lineNo, 1, `${p.second} line differs from its ${p.obs.note2} line (${p.lineNo}) in ${differs}`, text));
      return;
    }
    try {
      checkObs80Length(text, this.file, lineNo);
      if (p.second === 's') applySpaceLine(p.obs, text, this.file, lineNo);
      else applyRovingLine(p.obs, text, this.file, lineNo);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      this.rejectFirst(p, `${p.obs.note2} line whose ${p.second} line (${lineNo}) was rejected`);
      this.reject(err);
      return;
    }
    this.accept(p.obs);
  }

  private accept(obs: AstrometryObservation): void {
    this.counts.observations++;
    this.counts.linesInObservations += obs.lines;
    this.onObservation(obs);
  }

  private rejectFirst(p: Pending, reason: string): void {
    this.reject(new InputError(this.file, p.lineNo, NOTE2_COLUMN, reason, p.text));
  }

  private reject(err: InputError): void {
    this.counts.rejected++;
    this.onReject(err);
  }
}
