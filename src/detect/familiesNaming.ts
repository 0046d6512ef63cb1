/**
 * Names of the clusters. Every family gets an id `F-<region>-<n>` (n counting the region's
 * families in family-table order from 1). Its name: with a user's membership list, the label
 * most of its matched members carry (ties: the label first in code-point order); otherwise the
 * published family whose a, e and i ranges hold the cluster's median centre (several: the
 * closest by the velocity metric to the middle of the ranges); otherwise none (the id).
 */
import { DEG_PER_RAD } from '../core/constants.js';
import { findBodies } from '../clean/bodyLookup.js';
import type { Catalogue } from '../clean/types.js';
import type { PublishedFamily } from '../io/publishedFamilies.js';
import type { FamilyMember } from '../io/familyMembership.js';
import { velocityDistanceMPerS } from './families/metricVelocity.js';
import { BELT_REGIONS } from './families/qrlRegion.js';
import type { FamilyRow } from './families/familyTable.js';

export interface FamilyName {
  id: string; // F-<region>-<n>
  name: string; // published or user's label; the id when neither
  namedBy: 'published list' | 'membership list' | 'none';
  labelledMembers: number; // members carrying the chosen label (membership list), or 0
}

/** The published family whose ranges hold the centre, the closest one if several; undefined if none. */
export function publishedFamilyAt(aAu: number, e: number, sinI: number, list: readonly PublishedFamily[]): PublishedFamily | undefined {
  const iDeg = Math.asin(Math.min(1, sinI)) * DEG_PER_RAD;
  let best: PublishedFamily | undefined, bestD = Infinity;
  for (const f of list) {
    if (!(f.aMinAu <= aAu && aAu <= f.aMaxAu && f.eMin <= e && e <= f.eMax && f.iMinDeg <= iDeg && iDeg <= f.iMaxDeg)) continue;
    const midSinI = Math.sin(((f.iMinDeg + f.iMaxDeg) / 2) / DEG_PER_RAD);
    const d = velocityDistanceMPerS(aAu, e, sinI, (f.aMinAu + f.aMaxAu) / 2, (f.eMin + f.eMax) / 2, midSinI, aAu);
    if (d < bestD || (d === bestD && best !== undefined && f.id < best.id)) { best = f; bestD = d; }
  }
  return best;
}

/** The user's label per catalogue row ('' for none), and the list's designations no catalogue body matched. */
export function membershipLabels(cat: Catalogue, members: readonly FamilyMember[]): { label: string[]; unmatched: FamilyMember[] } {
  const label: string[] = new Array(cat.size).fill('');
  const unmatched: FamilyMember[] = [];
  findBodies(cat, members.map((m) => m.designation)).forEach((match, q) => {
    if (match.by === 'none' || (match.by === 'name' && match.rows.length > 1)) unmatched.push(members[q]);
    else for (const r of match.rows) if (label[r] === '') label[r] = members[q].family;
  });
  return { label, unmatched };
}

/** Names of every family of `table` (members as positions in `screened`, catalogue rows). */
export function nameFamilies(
  table: readonly FamilyRow[], familyRegion: Int32Array, screened: Int32Array,
  published: readonly PublishedFamily[], userLabel: readonly string[] | null,
): FamilyName[] {
  const perRegion = [0, 0, 0];
  return table.map((f) => {
    const id = `F-${BELT_REGIONS[familyRegion[f.id]]}-${++perRegion[familyRegion[f.id]]}`;
    if (userLabel) {
      const counts = new Map<string, number>();
      for (const m of f.members) {
        const l = userLabel[screened[m]];
        if (l !== '') counts.set(l, (counts.get(l) ?? 0) + 1);
      }
      let name = '', best = 0;
      for (const [l, c] of counts) if (c > best || (c === best && l < name)) { name = l; best = c; }
      return best > 0 ? { id, name, namedBy: 'membership list', labelledMembers: best } : { id, name: id, namedBy: 'none', labelledMembers: 0 };
    }
    const p = publishedFamilyAt(f.aAu.median, f.e.median, f.sinI.median, published);
    return p ? { id, name: p.name, namedBy: 'published list', labelledMembers: 0 } : { id, name: id, namedBy: 'none', labelledMembers: 0 };
  });
}
