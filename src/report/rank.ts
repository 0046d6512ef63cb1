/**
 * Ranking of candidates: by detector (in the order they ran), anomalies before boundary
 * cases, then score descending, then designation and catalogue row, so the order is total
 * and the output deterministic.
 */
import type { Candidate } from '../detect/types.js';

/** Sort candidates in place into report order. */
export function rankInPlace(candidates: Candidate[], detectorOrder: readonly string[]): Candidate[] {
  const pos = new Map(detectorOrder.map((id, k) => [id, k]));
  return candidates.sort((x, y) =>
    (pos.get(x.detector) ?? 1e9) - (pos.get(y.detector) ?? 1e9) ||
    Number(x.boundary) - Number(y.boundary) ||
    y.score - x.score ||
    (x.designation < y.designation ? -1 : x.designation > y.designation ? 1 : 0) ||
    x.index - y.index,
  );
}

/** The best candidates of one class of a detector, and how many the class has in all. */
export interface ClassTop {
  cls: string;
  best: Candidate[]; // at most n, in rank order
  total: number;
}

/**
 * The best `n` candidates of each class of one detector, from ranked candidates, classes in
 * order of their best score. Boundary cases are left out (see boundaryCases).
 */
export function topByClass(ranked: readonly Candidate[], detector: string, n: number): ClassTop[] {
  const groups = new Map<string, ClassTop>();
  for (const c of ranked) {
    if (c.detector !== detector || c.boundary) continue;
    let g = groups.get(c.class);
    if (!g) groups.set(c.class, (g = { cls: c.class, best: [], total: 0 }));
    if (g.best.length < n) g.best.push(c);
    g.total++;
  }
  return [...groups.values()];
}

/** The boundary cases of one detector, in rank order. */
export function boundaryCases(ranked: readonly Candidate[], detector: string): Candidate[] {
  return ranked.filter((c) => c.detector === detector && c.boundary);
}
