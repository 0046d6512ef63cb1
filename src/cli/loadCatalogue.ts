/**
 * Reads input files through the io readers into a CatalogueBuilder and accounts for every
 * row per file. An unreadable file (missing, directory, binary, unknown header) does not
 * stop the others: it is listed with its error and the caller decides the exit code.
 */
import { CatalogueBuilder, type BuilderOptions } from '../clean/catalogueBuilder.js';
import type { Catalogue, Reject } from '../clean/types.js';
import { readOrbitFile } from '../io/readOrbitFile.js';
import { UnreadableInputError } from '../io/errors.js';
import type { InputFormat, OrbitRow } from '../io/types.js';
import type { FileAccount } from '../report/types.js';

export interface LoadOptions extends BuilderOptions {
  format?: InputFormat; // force a format instead of sniffing each file
  columns?: Record<string, string>; // explicit CSV column mapping: field → header
}

export interface LoadResult {
  catalogue: Catalogue;
  rejects: Reject[];
  files: FileAccount[];
  errors: UnreadableInputError[];
}

export async function loadCatalogue(paths: readonly string[], opts: LoadOptions = {}): Promise<LoadResult> {
  const builder = new CatalogueBuilder(opts);
  const files: FileAccount[] = [];
  const errors: UnreadableInputError[] = [];
  for (const path of paths) {
    const readBefore = builder.read;
    try {
      const info = await readOrbitFile(
        path,
        { format: opts.format, columns: opts.columns },
        (row: OrbitRow, line: number, text?: string) => builder.add(row, path, line, text ?? ""),
        (err) => builder.rejectUnparsed(path, err.line, err.reason, err.text),
      );
      files.push({
        file: path, format: info.format, sha256: info.sha256,
        rows: { read: builder.read - readBefore, accepted: 0, rejected: 0 },
        skippedLines: info.skipped,
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
  const rejects = builder.rejects;
  const catalogue = builder.finish();
  // Per-file rejected counts include superseded duplicates, attributed to their own file.
  const rejectedByFile = new Map<string, number>();
  for (const r of rejects) rejectedByFile.set(r.file, (rejectedByFile.get(r.file) ?? 0) + 1);
  for (const f of files) {
    f.rows.rejected = rejectedByFile.get(f.file) ?? 0;
    f.rows.accepted = f.rows.read - f.rows.rejected;
  }
  return { catalogue, rejects, files, errors };
}
