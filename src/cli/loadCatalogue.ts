/**
 * Reads input files through the io readers into a CatalogueBuilder and accounts for every
 * row per file. An unreadable file (missing, directory, binary, unknown header) does not
 * stop the others: it is listed with its error and the caller decides the exit code.
 */
import { statSync } from 'node:fs';
import { CatalogueBuilder, type BuilderOptions } from '../clean/catalogueBuilder.js';
import type { Catalogue, Reject } from '../clean/types.js';
import { readOrbitFile } from '../io/readOrbitFile.js';
import { UnreadableInputError } from '../io/errors.js';
import type { CsvKindChoice } from '../io/bodyKind.js';
import type { InputFormat, OrbitRow } from '../io/types.js';
import type { FileAccount } from '../report/types.js';

export interface LoadOptions extends BuilderOptions {
  format?: InputFormat; // force a format instead of sniffing each file
  columns?: Record<string, string>; // explicit CSV column mapping: field → header
  csvKind?: CsvKindChoice; // CSV rows: classed by designation ('auto') or all one kind
  threads?: number; // ≥ 2: a large plain orbit export file is parsed on two threads (same result); default 1
}

export interface LoadResult {
  catalogue: Catalogue;
  rejects: Reject[];
  files: FileAccount[];
  errors: UnreadableInputError[];
  twoThreadFiles: number; // inputs parsed on two threads (see LoadOptions.threads)
}

/**
 * A guess of the row count from file sizes, so the columns start near their final size:
 * 160 bytes a row (an orbit export line is about 203; CSV rows are shorter), and gzip
 * taken as 5:1 (common practice for such text). Unknown sizes (stdin, missing) count 0.
 */
function expectedRows(paths: readonly string[]): number {
  let bytes = 0;
  for (const p of paths) {
    if (p === '-') continue;
    try {
      const st = statSync(p);
      if (st.isFile()) bytes += p.endsWith('.gz') ? 5 * st.size : st.size;
    } catch {
      // Unreadable files are reported when they are read.
    }
  }
  return bytes / 160;
}

export async function loadCatalogue(paths: readonly string[], opts: LoadOptions = {}): Promise<LoadResult> {
  const builder = new CatalogueBuilder({ expectedRows: expectedRows(paths), ...opts });
  const files: FileAccount[] = [];
  const errors: UnreadableInputError[] = [];
  let twoThreadFiles = 0;
  for (const path of paths) {
    builder.beginFile(path); // input number = index in `files`
    const readBefore = builder.read;
    try {
      const info = await readOrbitFile(
        path,
        { format: opts.format, columns: opts.columns, csvKind: opts.csvKind, threads: opts.threads },
        (row: OrbitRow, line: number, text: () => string) => builder.add(row, path, line, text),
        (err) => builder.rejectUnparsed(path, err.line, err.reason, err.text),
      );
      if (info.parseThreads === 2) twoThreadFiles++;
      files.push({
        file: path, format: info.format, sha256: info.sha256,
        rows: { read: builder.read - readBefore, accepted: 0, rejected: 0 },
        skippedLines: info.skipped,
        bodyKind: { rule: info.kindRule, ...info.kinds },
      });
    } catch (err) {
      if (!(err instanceof UnreadableInputError)) throw err;
      errors.push(err);
      files.push({
        file: path, format: 'unreadable', sha256: '',
        rows: { read: builder.read - readBefore, accepted: 0, rejected: 0 },
        skippedLines: 0, error: err.reason,
      });
    }
  }
  // Per-input rejected counts include superseded duplicates, charged to the input they
  // came from (by position, so a file listed twice is two inputs, each accounted for).
  files.forEach((f, k) => {
    f.rows.rejected = builder.rejectedIn(k);
    f.rows.accepted = f.rows.read - f.rows.rejected;
  });
  return { catalogue: builder.finish(), rejects: builder.rejects, files, errors, twoThreadFiles };
}
