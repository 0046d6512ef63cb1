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

/** Reason with its numbers masked, so rejects group by kind of fault: 'e -0.2 …' → 'e # …'. */
export function reasonCategory(reason: string): string {
  return reason
    .replace(/^duplicate designation .*?: /, 'duplicate designation: ')
    .replace(/[-+]?\d+(\.\d+)?([eE][-+]?\d+)?/g, '#')
    .replace(/ of \S+:#| than \S+:#/g, (m) => m.replace(/\S+:#/, 'FILE:#'));
}

/** Counts of rejects by category, sorted by count (desc) then name. */
export function rejectCategories(rejects: readonly Reject[]): [string, number][] {
  const counts = new Map<string, number>();
  for (const r of rejects) {
    const key = `${r.kind}: ${reasonCategory(r.reason)}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return [...counts].sort((x, y) => y[1] - x[1] || (x[0] < y[0] ? -1 : 1));
}
