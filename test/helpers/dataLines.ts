/**
 * Data lines of an orbit input, counted from its text without the project's readers, as
 * the formats are laid out (common practice for these exports): in the fixed-width export
 * files, the non-blank lines after an optional header block that ends in a line of dashes
 * (blank lines and lines of dashes between data lines are separators, not data); in
 * CSV/TSV, the non-blank lines after the header line (no quoted line breaks). Tests compare
 * the readers' counts with these, so a line lost or counted as a skip fails them.
 */
import { readFileSync } from 'node:fs';
import { gunzipSync } from 'node:zlib';

/** Header lines looked at for the dashed line that closes a header block. */
const HEADER_PROBE_LINES = 200;

/** A separator line of the fixed-width formats: blanks only, or blanks and five or more dashes. */
function isBlankOrDashes(line: string): boolean {
  return /^[ \t-]*$/.test(line) && (!line.includes('-') || line.split('-').length > 5);
}

/** Data lines of the text of one input. */
export function dataLinesOfText(text: string, layout: 'fixed-width' | 'csv'): number {
  const lines = text.split(/\r?\n/);
  let first = 0;
  if (layout === 'csv') {
    first = lines.findIndex((l) => l.trim() !== '') + 1;
    return lines.slice(first).filter((l) => l.trim() !== '').length;
  }
  for (let k = 0; k < Math.min(lines.length, HEADER_PROBE_LINES); k++) if (/^-{20,}\s*$/.test(lines[k])) first = k + 1;
  return lines.slice(first).filter((l) => !isBlankOrDashes(l)).length;
}

/** Data lines of one input file (gzip read by its magic bytes; CSV/TSV by name); 0 if unreadable. */
export function dataLineCount(path: string): number {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch {
    return 0;
  }
  if (bytes[0] === 0x1f && bytes[1] === 0x8b) bytes = gunzipSync(bytes);
  return dataLinesOfText(bytes.toString('latin1'), /\.(csv|tsv)(\.gz)?$/i.test(path) ? 'csv' : 'fixed-width');
}
