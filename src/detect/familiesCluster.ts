/**
 * The families of the trusted proper elements: HCM region by region (families/clusterByRegion.ts)
 * at each region's quasi-random level (families/qrlCutoff.ts) or at one cutoff for all, then
 * the family table (families/familyTable.ts). A region with fewer bodies than N_min has no
 * cutoff (NaN) and no family.
 */
import { clusterByRegion } from './families/clusterByRegion.js';
import { buildFamilyTable, type FamilyRow } from './families/familyTable.js';
import { qrlBackgroundSpaces, SERIAL_LEVELS, type LevelRunner } from './families/qrlCutoff.js';
import type { VelocitySpace } from './families/metricVelocity.js';
import { pick, regionMembers, regionOfAu } from './families/qrlRegion.js';
import { LABEL_NOISE } from './families/clusterLabels.js';
import { FAMILIES_QRL, type FamiliesOptions } from './familiesOptions.js';

export interface FamiliesClustering {
  labels: Int32Array; // per screened body (position in the screened list): family id or LABEL_NOISE
  table: FamilyRow[]; // members as positions in the screened list
  familyRegion: Int32Array; // 0 inner, 1 middle, 2 outer per family id
  regionCutoffMPerS: [number, number, number]; // NaN for a region without enough bodies
  cutoffFromQrl: boolean;
}

/** The options the clustering reads. */
export type ClusteringOptions = Pick<FamiliesOptions, 'cutoffMPerS' | 'minMembers' | 'seed'>;

/**
 * Clusters the screened bodies' proper elements (a, e, sin i, one entry per screened body).
 * The QRL backgrounds of all three regions are drawn first (each region from its own seed, as
 * quasiRandomLevel draws them) and their levels found together by `levels`, serial or on
 * worker threads (familiesThreads.ts): the same cutoffs either way.
 */
export function clusterFamilies(a: Float64Array, e: Float64Array, sinI: Float64Array, opts: ClusteringOptions, levels: LevelRunner = SERIAL_LEVELS): FamiliesClustering {
  const cut: [number, number, number] = [NaN, NaN, NaN];
  const spaces: VelocitySpace[] = [];
  const spaceRegion: number[] = [];
  for (let r = 0; r < 3; r++) {
    const ids = regionMembers(a, r);
    if (ids.length < opts.minMembers) continue;
    if (opts.cutoffMPerS !== null) { cut[r] = opts.cutoffMPerS; continue; }
    const ar = pick(a, ids);
    const aRefAu = ar.reduce((x, y) => x + y, 0) / ar.length;
    for (const space of qrlBackgroundSpaces(ar, pick(e, ids), pick(sinI, ids), { ...FAMILIES_QRL, minMembers: opts.minMembers, aRefAu, seed: opts.seed + r })) {
      spaces.push(space);
      spaceRegion.push(r);
    }
  }
  // The QRL of a region is its lowest background level; a background with no level (NaN: too
  // few bodies for any chance group of N_min below the highest cutoff tried) leaves the region
  // without a cutoff, and so without families.
  const found = spaces.length > 0 ? levels(spaces, opts.minMembers, FAMILIES_QRL.resolutionMPerS) : new Float64Array(0);
  const lowest = [Infinity, Infinity, Infinity];
  for (let t = 0; t < found.length; t++) {
    const r = spaceRegion[t];
    lowest[r] = Number.isNaN(found[t]) || Number.isNaN(lowest[r]) ? NaN : Math.min(lowest[r], found[t]);
  }
  for (const r of new Set(spaceRegion)) cut[r] = lowest[r];
  // a region without a cutoff is left out of the linking (its bodies read as missing, then as no family)
  const aUsed = new Float64Array(a.length);
  for (let k = 0; k < a.length; k++) aUsed[k] = Number.isFinite(cut[regionOfAu(a[k])]) ? a[k] : NaN;
  const used = cut.map((v) => (Number.isFinite(v) ? v : 1)) as [number, number, number];
  const c = clusterByRegion(aUsed, e, sinI, used, opts.minMembers);
  for (let k = 0; k < c.labels.length; k++) if (c.labels[k] < 0) c.labels[k] = LABEL_NOISE;
  const table = buildFamilyTable(a, e, sinI, c.labels, c.familyCutoffMPerS);
  return { labels: c.labels, table, familyRegion: c.familyRegion, regionCutoffMPerS: cut, cutoffFromQrl: opts.cutoffMPerS === null };
}
