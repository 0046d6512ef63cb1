/**
 * Reader of the pipe-separated (PSV) form of the IAU Astrometry Data Exchange Standard
 * (ADES Description, version 2017, from memory): header lines starting with '#' (top-level
 * keywords: '# version=2017', '# observatory', …) or '!' (their sub-keywords:
 * '! mpcCode 568'), then one line of column names separated by '|', then data lines.
 * A '#' line after data starts a new block with its own header and column names.
 * Header and blank lines are skipped; each data line becomes an observation or is rejected
 * with its reason. A column-header line that lacks a required field is a whole-file error
 * (UnreadableInputError naming the file, line and the fields missing).
 */
import { UnreadableInputError } from '../errors.js';
import { InputError } from '../types.js';
import { adesColumnIndex, type AdesField } from './adesColumns.js';
import { parseAdesRow, splitPsv } from './adesRow.js';
import type { AstrometryObservation } from './types.js';

export interface AdesCounts {
  observations: number;
  rejected: number;
  skipped: number; // header, column-header and blank lines
  version: string; // from '# version=…', '' when none
}

export class AdesPsvReader {
  readonly counts: AdesCounts = { observations: 0, rejected: 0, skipped: 0, version: '' };
  private index: Record<AdesField, number> | null = null;
  private width = 0;

  constructor(
    private readonly file: string,
    private readonly onObservation: (obs: AstrometryObservation) => void,
    private readonly onReject: (err: InputError) => void,
  ) {}

  pushLine(text: string, lineNo: number): void {
    const first = text.trimStart()[0];
    if (text.trim() === '' || first === '#' || first === '!') {
      this.counts.skipped++;
      if (first === '#') {
        this.index = null; // a header block: new column names follow
        const v = /^#\s*version\s*=\s*(\S+)/.exec(text);
        if (v !== null) this.counts.version = v[1];
      }
      return;
    }
    if (this.index === null) return this.readColumnHeader(text, lineNo);
    const cells = splitPsv(text);
    try {
      if (cells.values.length !== this.width) {
        throw new InputError(this.file, lineNo, 0, `${cells.values.length} fields; the column header has ${this.width}`, text);
      }
      const obs = parseAdesRow(cells, this.index, this.file, lineNo, text);
      this.counts.observations++;
      this.onObservation(obs);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      this.counts.rejected++;
      this.onReject(err);
    }
  }

  private readColumnHeader(text: string, lineNo: number): void {
    const names = splitPsv(text).values;
    const index = adesColumnIndex(names);
    if (typeof index === 'string') {
      throw new UnreadableInputError(this.file, `line ${lineNo}: ADES column header lacks ${index}`);
    }
    this.index = index;
    this.width = names.length;
    this.counts.skipped++;
  }
}
