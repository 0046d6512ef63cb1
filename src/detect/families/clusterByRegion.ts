/**
 * HCM over the main belt region by region (qrlRegion.ts: inner, middle, outer, split at the
 * 3:1 and 5:2 resonances), each region at its own cutoff and with the metric's reference a at
 * the mean a of the region's bodies (metricVelocity.ts). The regions' families are numbered
 * together by the rule of clusterLabels.ts (size, then lowest member index), so the labels are
 * deterministic. A body with a NaN element is LABEL_MISSING.
 */
import { clusterHcm } from './clusterHcm.js';
import { LABEL_MISSING } from './clusterLabels.js';
import { toVelocitySpace } from './metricVelocity.js';
import { pick, regionMembers } from './qrlRegion.js';

export interface RegionClustering {
  readonly labels: Int32Array;        // family id, LABEL_NOISE or LABEL_MISSING per body
  readonly memberCounts: Int32Array;  // per family id
  readonly familyRegion: Int32Array;  // region (0 inner, 1 middle, 2 outer) per family id
  readonly familyCutoffMPerS: Float64Array; // cutoff the family was found at
  readonly regionARefAu: Float64Array; // the metric's reference a of each region (NaN if empty)
}

/** Families of each region at `cutoffsMPerS[region]` with at least `minMembers` members. */
export function clusterByRegion(
  aAu: ArrayLike<number>, e: ArrayLike<number>, sinI: ArrayLike<number>,
  cutoffsMPerS: readonly [number, number, number], minMembers: number,
): RegionClustering {
  const n = aAu.length;
  const labels = new Int32Array(n).fill(LABEL_MISSING);
  const found: { region: number; size: number; low: number; members: number[] }[] = [];
  const regionARefAu = new Float64Array(3).fill(NaN);
  for (let region = 0; region < 3; region++) {
    const ids = regionMembers(aAu, region);
    if (ids.length === 0) continue;
    const a = pick(aAu, ids);
    let sum = 0;
    for (const v of a) sum += v;
    regionARefAu[region] = sum / a.length;
    const res = clusterHcm(toVelocitySpace(a, pick(e, ids), pick(sinI, ids), regionARefAu[region]), cutoffsMPerS[region], minMembers);
    const members: number[][] = Array.from(res.memberCounts, () => []);
    for (let k = 0; k < ids.length; k++) {
      const l = res.labels[k];
      if (l >= 0) members[l].push(ids[k]);
      else labels[ids[k]] = l;
    }
    for (const m of members) found.push({ region, size: m.length, low: m[0], members: m });
  }
  found.sort((p, q) => q.size - p.size || p.low - q.low);
  const memberCounts = new Int32Array(found.length);
  const familyRegion = new Int32Array(found.length);
  const familyCutoffMPerS = new Float64Array(found.length);
  found.forEach((f, id) => {
    for (const k of f.members) labels[k] = id;
    memberCounts[id] = f.size;
    familyRegion[id] = f.region;
    familyCutoffMPerS[id] = cutoffsMPerS[f.region];
  });
  return { labels, memberCounts, familyRegion, familyCutoffMPerS, regionARefAu };
}
