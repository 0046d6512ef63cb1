/**
 * Which format an input is in, from its first lines (content first, file name only as a
 * tie-breaker): a CSV/TSV header, fixed-width orbit export lines (a packed date in columns
 * 21–25 and a number in 27–35), or comet export lines (an orbit type letter in column 5 and
 * a perihelion date in 15–29). Also where a header block ends: text before a line of dashes.
 */
import { COMET_ORBIT_TYPES } from './cometExportLayout.js';
import { UnreadableInputError } from './errors.js';
import { isSeparatorLine } from './fixedFieldRead.js';
import type { InputFormat } from './types.js';

/** True for a line with the shape of the one-line orbit export format. */
export function looksLikeOrbitLine(line: string): boolean {
  return line.length >= 80 && /^[I-L]\d\d[1-9A-C][1-9A-V] [ \d.+-]{9}/.test(line.slice(20, 35));
}

/** True for a line with the shape of the one-line comet export format. */
export function looksLikeCometLine(line: string): boolean {
  return line.length >= 79 && line[4] !== ' ' && COMET_ORBIT_TYPES.includes(line[4]) &&
    /^\d{4} [ \d]\d [ \d]\d\.\d*\s*$/.test(line.slice(14, 29));
}

/** True for a line that could be a CSV/TSV header: 3+ delimited fields, each with a letter. */
export function looksLikeCsvHeader(line: string): boolean {
  const fields = line.split(/[,;\t]/);
  return fields.length >= 3 && fields.every((f) => /[A-Za-z]/.test(f));
}

/** Number of leading lines that form a header block ending in a dashed line (0 if none). */
export function headerBlockLength(lines: readonly string[]): number {
  for (let k = 0; k < lines.length; k++) {
    const line = lines[k];
    if (looksLikeOrbitLine(line) || looksLikeCometLine(line)) return 0; // data before any dashes
    if (line.trim() !== '' && isSeparatorLine(line)) return k + 1;
  }
  return 0;
}

/**
 * Format of an input from its first lines (header block already removed). Throws
 * UnreadableInputError naming the file when the content fits no known format.
 */
export function detectFormat(firstLines: readonly string[], fileName: string): InputFormat {
  const sample = firstLines.filter((l) => !isSeparatorLine(l)).slice(0, 50);
  const byName: InputFormat | undefined = /\.(csv|tsv)(\.gz)?$/i.test(fileName) ? 'csv' : undefined;
  if (sample.length === 0) return byName ?? 'orbit-export';
  if (looksLikeCsvHeader(sample[0]) && !looksLikeOrbitLine(sample[0])) return 'csv';
  let orbit = 0;
  let comet = 0;
  for (const line of sample) {
    if (looksLikeOrbitLine(line)) orbit++;
    else if (looksLikeCometLine(line)) comet++;
  }
  if (orbit + comet > 0) return orbit >= comet ? 'orbit-export' : 'comet-export';
  if (byName) return byName;
  throw new UnreadableInputError(fileName,
    'cannot tell the format from the first lines (no CSV header, no fixed-width orbit or comet lines); name the format explicitly', 'format');
}
