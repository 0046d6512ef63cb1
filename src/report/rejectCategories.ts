/**
 * Grouping of rejects by kind of fault for summary.json and report.md: each reason with its
 * numbers and file names masked, so rows rejected for the same rule count together.
 */
import type { Reject } from '../clean/types.js';

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
