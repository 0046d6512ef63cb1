/**
 * rejects.csv: every row set aside, with its file, line, kind, reason and raw text, ordered
 * by input file (in the order given) and line.
 */
import type { Reject } from '../clean/types.js';
import { AtomicFileWriter } from './atomicWrite.js';
import { csvRecord } from './csvField.js';

/** Sort rejects in place by file order, then line, then reason. */
export function sortRejectsInPlace(rejects: Reject[], fileOrder: readonly string[]): Reject[] {
  const pos = new Map(fileOrder.map((f, k) => [f, k]));
  return rejects.sort((x, y) =>
    (pos.get(x.file) ?? 1e9) - (pos.get(y.file) ?? 1e9) || x.line - y.line ||
    (x.reason < y.reason ? -1 : x.reason > y.reason ? 1 : 0),
  );
}

export async function writeRejectsCsv(path: string, rejects: readonly Reject[]): Promise<void> {
  const w = new AtomicFileWriter(path);
  try {
    await w.write('file,line,kind,reason,text\n');
    for (const r of rejects) await w.write(csvRecord([r.file, r.line, r.kind, r.reason, r.text]) + '\n');
    await w.commit();
  } catch (err) {
    await w.abort();
    throw err;
  }
}
