/**
 * The main belt in three regions bounded by the 3:1 and 5:2 mean-motion resonances with
 * Jupiter, at proper a = 2.5 and 2.82 au (common practice: families are searched, and their
 * cutoffs set, region by region, the resonances being gaps that no family crosses).
 */

/** Region edges in au: inner | 3:1 | middle | 5:2 | outer (common practice). */
export const BELT_REGION_EDGES_AU: readonly [number, number] = [2.5, 2.82];

/** Region names in the order of regionOfAu's numbers. */
export const BELT_REGIONS = ['inner', 'middle', 'outer'] as const;
export type BeltRegion = (typeof BELT_REGIONS)[number];

/** 0 inner (a < 2.5 au), 1 middle (2.5 ≤ a < 2.82), 2 outer (a ≥ 2.82); −1 for NaN. */
export function regionOfAu(aAu: number): number {
  if (!(aAu === aAu)) return -1;
  return aAu < BELT_REGION_EDGES_AU[0] ? 0 : aAu < BELT_REGION_EDGES_AU[1] ? 1 : 2;
}

/** Indices of the bodies of `region` (0, 1, 2), ascending. */
export function regionMembers(aAu: ArrayLike<number>, region: number): Int32Array {
  if (region !== 0 && region !== 1 && region !== 2) throw new RangeError(`regionMembers: region must be 0, 1 or 2, got ${region}`);
  let m = 0;
  for (let k = 0; k < aAu.length; k++) if (regionOfAu(aAu[k]) === region) m++;
  const ids = new Int32Array(m);
  m = 0;
  for (let k = 0; k < aAu.length; k++) if (regionOfAu(aAu[k]) === region) ids[m++] = k;
  return ids;
}

/** The values of `column` at `ids`, in a new array. */
export function pick(column: ArrayLike<number>, ids: Int32Array): Float64Array {
  const out = new Float64Array(ids.length);
  for (let k = 0; k < ids.length; k++) out[k] = column[ids[k]];
  return out;
}
