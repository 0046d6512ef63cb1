/**
 * Three well-spaced observations for Gauss's method: the widest pair of observations no more
 * than `maxArcDays` apart, and between them the observation nearest the middle of the pair,
 * each of the three at least `minSeparationDays` from its neighbour, so the three are not
 * from one night. Gauss's method wants a short arc (its series in the time intervals, the
 * f and g refinement) that is not too short (three points of one night hardly bend).
 * Defaults (common practice): arc at most 60 days, neighbours at least 0.5 day apart.
 * Nearest the middle is also the best possible middle: it maximises the smaller of the two
 * intervals, so when it fails the separation, every middle for that pair fails.
 */

export interface ChooseThreeOptions {
  maxArcDays?: number; // default 60
  minSeparationDays?: number; // default 0.5
}

export interface ThreeChosen {
  indices: [number, number, number] | null; // into the caller's array, in time order; null when no three qualify
  arcDays: number; // last − first of the three; NaN when none
  reason: string; // '' when chosen, else why not
}

/** Choose three observations from `timesJd` (any one time scale; NaN times are passed over). */
export function chooseThreeObservations(timesJd: ArrayLike<number>, opts: ChooseThreeOptions = {}): ThreeChosen {
  const maxArc = opts.maxArcDays ?? 60;
  const minSep = opts.minSeparationDays ?? 0.5;
  if (!(maxArc > 0) || !(minSep >= 0) || 2 * minSep > maxArc) {
    throw new RangeError(`chooseThreeObservations: need maxArcDays > 0 and 0 ≤ 2·minSeparationDays ≤ maxArcDays, got ${maxArc}, ${minSep}`);
  }
  const order: number[] = [];
  for (let k = 0; k < timesJd.length; k++) if (Number.isFinite(timesJd[k])) order.push(k);
  order.sort((a, b) => timesJd[a] - timesJd[b] || a - b);
  const t = order.map((k) => timesJd[k]);
  const n = t.length;
  if (n < 3) return { indices: null, arcDays: NaN, reason: `fewer than three observations with a time (${n})` };
  // For each first observation, the farthest last one within the arc; widest pairs first.
  const pairs: [number, number][] = [];
  let j = 0;
  for (let i = 0; i < n; i++) {
    if (j < i) j = i;
    while (j + 1 < n && t[j + 1] - t[i] <= maxArc) j++;
    if (j - i >= 2) pairs.push([i, j]);
  }
  pairs.sort((a, b) => t[b[1]] - t[b[0]] - (t[a[1]] - t[a[0]]) || a[0] - b[0]);
  for (const [i, last] of pairs) {
    const m = nearestInside(t, i, last, 0.5 * (t[i] + t[last]));
    if (t[m] - t[i] >= minSep && t[last] - t[m] >= minSep) {
      return { indices: [order[i], order[m], order[last]], arcDays: t[last] - t[i], reason: '' };
    }
  }
  return {
    indices: null, arcDays: NaN,
    reason: `no three observations within ${maxArc} days with neighbours at least ${minSep} days apart (span of the file ${(t[n - 1] - t[0]).toFixed(3)} days)`,
  };
}

/** Index in (lo, hi) (exclusive) of the sorted times nearest to `target`, by binary search. */
function nearestInside(t: readonly number[], lo: number, hi: number, target: number): number {
  let a = lo + 1, b = hi - 1;
  while (a < b) {
    const mid = (a + b) >> 1;
    if (t[mid] < target) a = mid + 1;
    else b = mid;
  }
  // a is the first at or after target (or hi − 1); its predecessor may be nearer.
  if (a - 1 > lo && Math.abs(t[a - 1] - target) <= Math.abs(t[a] - target)) return a - 1;
  return a;
}
