/**
 * Finding bodies in a Catalogue from what a user types: numbers, packed or readable
 * designations with or without blanks, names (keys in ./bodyKeys.ts). One pass over the
 * catalogue answers any number of queries, so a list of designations costs what one does.
 *
 * A number or a designation that matches is a firm match and wins; a name is looked at only
 * when nothing matched firmly (a name can belong to several bodies, a designation cannot).
 * A query that finds nothing gets near spellings: the bodies whose number, designation or
 * name is fewest edits away (./editDistance.ts).
 */
import { boundedEditDistance } from './editDistance.js';
import { emptyBodyKeys, queryKeys, rowKeys, type BodyKeys } from './bodyKeys.js';
import { bodyName, type Catalogue } from './types.js';

/** The columns a lookup reads. */
export type CatalogueNames = Pick<Catalogue, 'size' | 'designation' | 'names'>;

/** What matched a query: 'number' and 'designation' are firm, 'name' may list several bodies. */
export type MatchKind = 'number' | 'designation' | 'name' | 'none';

export interface BodyMatch {
  query: string;
  by: MatchKind;
  rows: number[]; // catalogue rows in catalogue order; empty when by = 'none'
}

/** Readable label of row k: its designation, with the name in parentheses when the designation lacks it. */
export function bodyLabel(cat: CatalogueNames, k: number): string {
  const d = cat.designation[k], name = bodyName(cat, k);
  return name === '' || d.includes(name) ? d : `${d} (${name})`;
}

function addTo<K>(map: Map<K, number[]>, key: K, q: number): void {
  const list = map.get(key);
  if (list) list.push(q);
  else map.set(key, [q]);
}

/** Rows of `cat` each query names (see the file comment for the rules). */
export function findBodies(cat: CatalogueNames, queries: readonly string[]): BodyMatch[] {
  const keys = queries.map(queryKeys);
  const byNumber = new Map<number, number[]>(), byDesignation = new Map<string, number[]>(), byName = new Map<string, number[]>();
  keys.forEach((k, q) => {
    if (Number.isFinite(k.number)) addTo(byNumber, k.number, q);
    if (k.designation !== '') addTo(byDesignation, k.designation, q);
    if (k.name !== '') addTo(byName, k.name, q);
  });
  const firm: { by: MatchKind; rows: number[] }[] = queries.map(() => ({ by: 'none', rows: [] }));
  const named: number[][] = queries.map(() => []);
  const row = emptyBodyKeys();
  for (let r = 0; r < cat.size; r++) {
    rowKeys(cat.designation[r], bodyName(cat, r), row);
    if (Number.isFinite(row.number)) {
      for (const q of byNumber.get(row.number) ?? []) {
        firm[q].by = 'number';
        firm[q].rows.push(r);
      }
    }
    if (row.designation !== '') {
      for (const q of byDesignation.get(row.designation) ?? []) {
        firm[q].by = 'designation';
        firm[q].rows.push(r);
      }
    }
    if (row.name !== '') for (const q of byName.get(row.name) ?? []) named[q].push(r);
  }
  return queries.map((query, q) => {
    if (firm[q].rows.length > 0) return { query, by: firm[q].by, rows: firm[q].rows };
    return { query, by: named[q].length > 0 ? 'name' : 'none', rows: named[q] };
  });
}

/** A near spelling: the row and how many single-character edits separate it from the query. */
export interface NearMatch {
  row: number;
  distance: number;
}

/** The spellings a distance is measured between: number digits, designation, name without blanks. */
function spellings(k: BodyKeys): string[] {
  const out: string[] = [];
  if (Number.isFinite(k.number)) out.push(String(k.number));
  if (k.designation !== '') out.push(k.designation);
  if (k.name !== '') {
    const compact = k.name.replace(/ /g, '');
    if (compact !== k.designation) out.push(compact);
  }
  return out;
}

/**
 * Up to `limit` rows spelled nearest to `query`, nearest first (ties in catalogue order).
 * Only spellings within a third of the query's length (at least 1, at most 3 edits) count,
 * so a wild query gets no suggestions rather than arbitrary ones.
 */
export function nearMatches(cat: CatalogueNames, query: string, limit = 5): NearMatch[] {
  if (!Number.isInteger(limit) || limit < 1) throw new RangeError(`nearMatches: limit ${limit} is not a positive integer`);
  const wanted = spellings(queryKeys(query));
  if (wanted.length === 0) return [];
  const longest = Math.max(...wanted.map((s) => s.length));
  const maxDistance = Math.min(3, Math.max(1, Math.floor(longest / 3)));
  const best: NearMatch[] = []; // sorted by distance, then row
  const row = emptyBodyKeys();
  for (let r = 0; r < cat.size; r++) {
    rowKeys(cat.designation[r], bodyName(cat, r), row);
    const bound = best.length === limit ? best[limit - 1].distance - 1 : maxDistance;
    if (bound < 0) break; // `limit` exact spellings found
    let d = bound + 1;
    for (const have of spellings(row)) {
      for (const want of wanted) d = Math.min(d, boundedEditDistance(want, have, Math.min(bound, d)));
    }
    if (d > bound) continue;
    let at = best.length;
    while (at > 0 && best[at - 1].distance > d) at--;
    best.splice(at, 0, { row: r, distance: d });
    if (best.length > limit) best.pop();
  }
  return best;
}
