/**
 * Grouping of rejects by kind of fault for summary.json and report.md, so rows rejected for
 * the same rule count together. A reason becomes its category by placeholders, never by
 * rewriting what the input said inside a quotation:
 * - the quoted input text of a reason (`…: 'K32Z9'`, `…: '0.1x3o56' (columns 71–79)`, the
 *   form every reader writes) becomes `'…'`;
 * - the row a duplicate was compared with (`than data/a.txt:12`) becomes `FILE:LINE`, and
 *   the duplicate's own designation is dropped;
 * - other numbers, the values read from the row (`eccentricity -0.12 is negative`), become
 *   `#`; the rule's own limits stay as written: ranges (`0..180`, `1..9, A..C`), column
 *   spans (`(columns 60–68)`) and CSV field positions (`(field 5)`).
 * Each group keeps its first reject (in the order given: file, then line) as the example a
 * reader can look up verbatim.
 */
import type { Reject } from '../clean/types.js';

/** A number as the readers and rules write it. */
const NUM = String.raw`[-+]?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?`;
/** Spans kept as written, or a number to mask. */
const KEPT_OR_NUMBER = new RegExp(String.raw`\(columns [^)]*\)|\(field \d+\)|${NUM}\.\.${NUM}|${NUM}`, 'g');
/** The quoted input text of a reason: after ': ', to the last quote, before an optional column span. */
const QUOTED_TEXT = /: '.*'( \(columns [^)]*\))?$/;

/** The category of one reason (see the file comment): 'e -0.2 is negative' → 'e # is negative'. */
export function reasonCategory(reason: string): string {
  return reason
    .replace(/^duplicate designation .*?: /, 'duplicate designation: ')
    .replace(QUOTED_TEXT, (_m, span: string | undefined) => `: '…'${span ?? ''}`)
    .replace(/ (of|than) \S+:\d+/g, ' $1 FILE:LINE')
    .replace(KEPT_OR_NUMBER, (m) => (m.startsWith('(') || m.includes('..') ? m : '#'));
}

/** The grouping key of a reject: its kind, then its category, the kind said once. */
export function rejectKey(r: Reject): string {
  const category = reasonCategory(r.reason);
  return category.startsWith(r.kind) ? category : `${r.kind}: ${category}`;
}

export interface RejectGroup {
  key: string; // kind and category, e.g. 'parse: eccentricity is not a number: '…' (columns 71–79)'
  count: number;
  example: Reject; // the first reject of the group, verbatim
}

/** Groups of rejects, sorted by count (desc) then key. */
export function rejectGroups(rejects: readonly Reject[]): RejectGroup[] {
  const groups = new Map<string, RejectGroup>();
  for (const r of rejects) {
    const key = rejectKey(r);
    const g = groups.get(key);
    if (g) g.count++;
    else groups.set(key, { key, count: 1, example: r });
  }
  return [...groups.values()].sort((x, y) => y.count - x.count || (x.key < y.key ? -1 : 1));
}

/** Counts of rejects by group key, sorted by count (desc) then key. */
export function rejectCategories(rejects: readonly Reject[]): [string, number][] {
  return rejectGroups(rejects).map((g) => [g.key, g.count]);
}

/** The example of a group as one line: `FILE:LINE: REASON`, the reason as the reader wrote it. */
export function rejectExample(r: Reject): string {
  return `${r.file}:${r.line}: ${r.reason}`;
}
