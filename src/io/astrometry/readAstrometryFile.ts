/**
 * Reads one astrometry file of either format, detected from its content: the first line
 * that is not blank starts with '#' or '!' or holds a '|' → ADES PSV; otherwise 80-column
 * records. Returns the observations in file order, the rejected lines with their reasons
 * (InputError: file, line, column, reason, text), the counts, and the designations met
 * (mixed designations are reported, the caller decides). Invariants: for 80-column files
 * linesRead = linesInObservations + rejected (a two-line record counts both lines); for
 * ADES linesRead = observations + rejected; lines = linesRead + skipped.
 * Whole-file errors (missing, unreadable, binary, an ADES column header without required
 * fields): UnreadableInputError.
 */
import { forEachLine, type LineEncoding } from '../lineSource.js';
import type { InputError } from '../types.js';
import { AdesPsvReader } from './adesPsvReader.js';
import { summariseDesignations, type DesignationSummary } from './astrometryDesignations.js';
import { Obs80Reader } from './obs80Reader.js';
import type { AstrometryFormat, AstrometryObservation } from './types.js';

export interface AstrometryReadOptions {
  format?: AstrometryFormat; // skip detection
  encoding?: LineEncoding; // default 'utf8'
}

export interface AstrometryRead {
  file: string;
  format: AstrometryFormat;
  observations: AstrometryObservation[];
  rejected: InputError[]; // in line order
  linesRead: number; // data lines
  linesInObservations: number;
  skipped: number; // blank and header lines
  lines: number; // physical lines
  withoutTT: number; // observations before 1972: TT = NaN (no leap-second table entry)
  kinds: { optical: number; space: number; roving: number };
  designations: DesignationSummary;
  sha256: string; // of the raw bytes
  adesVersion: string; // '# version=…' of an ADES file, '' otherwise
}

/** Format of a file from its first non-blank line. */
export function detectAstrometryFormat(firstLine: string): AstrometryFormat {
  const t = firstLine.trimStart();
  return t.startsWith('#') || t.startsWith('!') || t.includes('|') ? 'ades-psv' : 'obs80';
}

/** Reads `path` ('-' = stdin); see the file comment. */
export async function readAstrometryFile(path: string, options: AstrometryReadOptions = {}): Promise<AstrometryRead> {
  const observations: AstrometryObservation[] = [];
  const rejected: InputError[] = [];
  const onObs = (o: AstrometryObservation): void => void observations.push(o);
  const onReject = (e: InputError): void => void rejected.push(e);
  let format = options.format;
  let obs80: Obs80Reader | null = null;
  let ades: AdesPsvReader | null = null;
  let leadingBlank = 0;
  const stats = await forEachLine(path, (text, lineNo) => {
    if (format === undefined) {
      if (text.trim() === '') return void leadingBlank++;
      format = detectAstrometryFormat(text);
    }
    if (format === 'obs80') (obs80 ??= new Obs80Reader(path, onObs, onReject)).pushLine(text, lineNo);
    else (ades ??= new AdesPsvReader(path, onObs, onReject)).pushLine(text, lineNo);
  }, { encoding: options.encoding });
  format ??= 'obs80';
  const c80 = (obs80 as Obs80Reader | null)?.finish();
  const cAdes = (ades as AdesPsvReader | null)?.counts;
  rejected.sort((a, b) => a.line - b.line);
  const linesInObservations = c80?.linesInObservations ?? cAdes?.observations ?? 0;
  const kinds = { optical: 0, space: 0, roving: 0 };
  let withoutTT = 0;
  for (const o of observations) {
    kinds[o.kind]++;
    if (Number.isNaN(o.timeJdTT)) withoutTT++;
  }
  return {
    file: path, format, observations, rejected,
    linesRead: linesInObservations + rejected.length, linesInObservations,
    skipped: leadingBlank + (c80?.skipped ?? cAdes?.skipped ?? 0), lines: stats.lines,
    withoutTT, kinds, designations: summariseDesignations(observations), sha256: stats.sha256,
    adesVersion: cAdes?.version ?? '',
  };
}
