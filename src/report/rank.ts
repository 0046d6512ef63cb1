/**
 * Ranking of candidates: by detector (in the order they ran), then score descending, then
 * designation and catalogue row, so the order is total and the output deterministic.
 */
import type { Candidate } from '../detect/types.js';

/** Sort candidates in place into report order. */
export function rankInPlace(candidates: Candidate[], detectorOrder: readonly string[]): Candidate[] {
  const pos = new Map(detectorOrder.map((id, k) => [id, k]));
  return candidates.sort((x, y) =>
    (pos.get(x.detector) ?? 1e9) - (pos.get(y.detector) ?? 1e9) ||
    y.score - x.score ||
    (x.designation < y.designation ? -1 : x.designation > y.designation ? 1 : 0) ||
    x.index - y.index,
  );
}

/**
 * The best `n` candidates of each class of one detector, from ranked candidates, classes in
 * order of their best score. Candidates scoring ≤ 0 (boundary cases) are left out.
 */
export function topByClass(ranked: readonly Candidate[], detector: string, n: number): [string, Candidate[]][] {
  const groups = new Map<string, Candidate[]>();
  for (const c of ranked) {
    if (c.detector !== detector || !(c.score > 0)) continue;
    const list = groups.get(c.class) ?? [];
    if (list.length < n) list.push(c);
    groups.set(c.class, list);
  }
  return [...groups];
}
