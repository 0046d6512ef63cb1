/**
 * Which published families a family table recovers, for tests and the bench.
 *
 * - Nesvorný 2015 (bundled as data/families/families-2015.json, provenance in data/families/README.md): recovered when a found family's centre
 *   (median a, e, and i = asin(median sin i) in degrees) lies within the published proper a, e,
 *   i ranges.
 * - Parker et al. 2008 (test/fixtures/proper-elements-sdss/families-sdss-2008.csv), which gives
 *   medians only, to two decimals: recovered when a found family's median lies within 0.02 au
 *   in a and 0.01 in e and in sin i of the published median (our tolerance: twice the
 *   rounding in e and sin i, and in a the width of the published families' cores).
 *
 * `clustersUsed` counts the distinct found families that recover any: one giant chain can
 * hold the centres of several published families at a loose cutoff.
 */
import { readFileSync } from 'node:fs';
import type { FamilyRow } from '../../src/detect/families/familyTable.js';

export interface PublishedFamily {
  name: string; members: number; cutoffMPerS: number;
  aMinAu: number; aMaxAu: number; eMin: number; eMax: number; iMinDeg: number; iMaxDeg: number;
}
export interface ParkerFamily { name: string; members: number; aAu: number; e: number; sinI: number }

export function nesvorny2015(): PublishedFamily[] {
  const j = JSON.parse(readFileSync(new URL('../../data/families/families-2015.json', import.meta.url), 'utf8'));
  return j.families.map((f: Record<string, number | string>) => ({
    name: String(f.family_name), members: Number(f.n_members), cutoffMPerS: Number(f.cutoff_ms),
    aMinAu: Number(f.a_min_au), aMaxAu: Number(f.a_max_au), eMin: Number(f.e_min), eMax: Number(f.e_max),
    iMinDeg: Number(f.i_min_deg), iMaxDeg: Number(f.i_max_deg),
  }));
}

export function parker2008(): ParkerFamily[] {
  const lines = readFileSync(new URL('../fixtures/proper-elements-sdss/families-sdss-2008.csv', import.meta.url), 'utf8').trim().split(/\r?\n/);
  const h = lines[0].split(',');
  return lines.slice(1).map((l) => {
    const c = l.split(',');
    return { name: c[h.indexOf('Name')], members: Number(c[h.indexOf('N')]), aAu: Number(c[h.indexOf('ap')]), e: Number(c[h.indexOf('ep')]), sinI: Number(c[h.indexOf('sinip')]) };
  });
}

/** The largest `count` families by published member count. */
export function largest<T extends { members: number }>(families: T[], count: number): T[] {
  return [...families].sort((p, q) => q.members - p.members).slice(0, count);
}

export interface Recovery { recovered: string[]; missed: string[]; clustersUsed: number }

const DEG = 180 / Math.PI;

/** The id of a found family whose centre lies in the published ranges of `f`, or −1. */
export function matchNesvorny(table: FamilyRow[], f: PublishedFamily): number {
  for (const row of table) {
    const a = row.aAu.median, e = row.e.median, i = Math.asin(row.sinI.median) * DEG;
    if (a >= f.aMinAu && a <= f.aMaxAu && e >= f.eMin && e <= f.eMax && i >= f.iMinDeg && i <= f.iMaxDeg) return row.id;
  }
  return -1;
}

/** The id of a found family whose median lies near the Parker et al. median of `f`, or −1. */
export function matchParker(table: FamilyRow[], f: ParkerFamily): number {
  for (const row of table) {
    if (Math.abs(row.aAu.median - f.aAu) <= 0.02 && Math.abs(row.e.median - f.e) <= 0.01 && Math.abs(row.sinI.median - f.sinI) <= 0.01) return row.id;
  }
  return -1;
}

export function recovery<T extends { name: string }>(families: T[], match: (f: T) => number): Recovery {
  const used = new Set<number>();
  const recovered: string[] = [], missed: string[] = [];
  for (const f of families) {
    const id = match(f);
    if (id >= 0) { recovered.push(f.name); used.add(id); } else missed.push(f.name);
  }
  return { recovered, missed, clustersUsed: used.size };
}
