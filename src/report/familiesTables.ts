/**
 * The tables of `wayward families` as CSV rows: the family table, the members, the outliers,
 * the bodies with untrusted proper elements and the bodies not screened. Numbers fixed to the
 * digits given; missing numbers are empty fields.
 */
import { DEG_PER_RAD } from '../core/constants.js';
import { reliabilityReasonIds, RELIABILITY_REASONS } from '../core/secular/reliability.js';
import type { Catalogue } from '../clean/types.js';
import type { FamiliesAnalysis } from '../detect/families.js';
import { FAMILIES_NOT_SCREENED, type FamiliesSkipReason } from '../detect/familiesScreen.js';
import { BELT_REGIONS } from '../detect/families/qrlRegion.js';

type Row = (string | number)[];
const num = (x: number, digits: number): string => (Number.isFinite(x) ? x.toFixed(digits) : '');
const where = (cat: Catalogue, k: number): Row => [cat.files[cat.fileIndex[k]], cat.source[k]];

export const FAMILY_COLUMNS = [
  'id', 'name', 'named_by', 'region', 'members', 'cutoff_mps',
  'a_median_au', 'e_median', 'sin_i_median', 'a_min_au', 'a_max_au', 'e_min', 'e_max', 'sin_i_min', 'sin_i_max',
] as const;

export function familyRows(r: FamiliesAnalysis): Row[] {
  return r.clustering.table.map((f) => {
    const n = r.names[f.id];
    return [n.id, n.name, n.namedBy, BELT_REGIONS[r.clustering.familyRegion[f.id]], f.memberCount, num(f.cutoffMPerS, 1),
      num(f.aAu.median, 5), num(f.e.median, 5), num(f.sinI.median, 5), num(f.aAu.min, 5), num(f.aAu.max, 5),
      num(f.e.min, 5), num(f.e.max, 5), num(f.sinI.min, 5), num(f.sinI.max, 5)];
  });
}

export const MEMBER_COLUMNS = ['designation', 'family_id', 'family_name', 'proper_a_au', 'proper_e', 'proper_sin_i', 'source_file', 'source_line'] as const;

/** One row per family member, family by family, members in catalogue order. */
export function memberRows(cat: Catalogue, r: FamiliesAnalysis): Row[] {
  const rows: Row[] = [];
  for (const f of r.clustering.table) {
    for (const j of f.members) {
      const k = r.screen.screened[j];
      rows.push([cat.designation[k], r.names[f.id].id, r.names[f.id].name, num(r.a[j], 6), num(r.e[j], 6), num(r.sinI[j], 6), ...where(cat, k)]);
    }
  }
  return rows;
}

export const OUTLIER_COLUMNS = [
  'designation', 'score', 'false_alarm_prob', 'false_alarm_from', 'q_value', 'fdr_pass', 'tail_fraction', 'tail_population', 'proper_a_au', 'proper_e', 'proper_sin_i',
  'nearest_family_id', 'nearest_family', 'nearest_family_mps', 'nearest_family_via', 'nearest_body_mps', 'flags', 'why',
] as const;

/** The candidates, most isolated first (ties in catalogue order). */
export function outlierRows(r: FamiliesAnalysis): Row[] {
  const sorted = [...r.candidates].sort((p, q) => q.score - p.score || p.index - q.index);
  return sorted.map((c) => [c.designation, c.score.toFixed(4), c.falseAlarmProb.toPrecision(3), String(c.details.false_alarm_from),
    (c.details.q_value as number).toPrecision(3), String(c.details.fdr_pass), c.tailFraction.toPrecision(3), c.tailPopulation,
    String(c.details.proper_a_au), String(c.details.proper_e), String(c.details.proper_sin_i), String(c.details.nearest_family_id),
    String(c.details.nearest_family), String(c.details.nearest_family_mps), String(c.details.nearest_family_via),
    String(c.details.nearest_body_mps), c.flags.join(';'), c.why]);
}

export const UNRELIABLE_COLUMNS = ['designation', 'reasons', 'why', 'proper_a_au', 'proper_e', 'proper_sin_i', 'a_au', 'e', 'i_deg', 'source_file', 'source_line'] as const;

/** Bodies whose proper elements the linear theory does not trust, in catalogue order, with the reasons. */
export function unreliableRows(cat: Catalogue, r: FamiliesAnalysis): Row[] {
  const rows: Row[] = [];
  const p = r.screen.proper;
  for (let k = 0; k < cat.size; k++) {
    if (r.screen.reason[k] !== 'proper-unreliable') continue;
    const ids = reliabilityReasonIds(p.reliability[k]);
    const texts = ids.map((id) => RELIABILITY_REASONS.find((x) => x.id === id)!.text);
    rows.push([cat.designation[k], ids.join(';'), texts.join('; '), num(p.aAu[k], 6), num(p.e[k], 6), num(p.sinI[k], 6),
      num(cat.a[k], 6), num(cat.e[k], 6), num(cat.i[k] * DEG_PER_RAD, 4), ...where(cat, k)]);
  }
  return rows;
}

export const NOT_SCREENED_COLUMNS = ['designation', 'reason', 'why', 'a_au', 'e', 'source_file', 'source_line'] as const;

/** Bodies not screened for a reason other than untrusted proper elements, in catalogue order. */
export function notScreenedRows(cat: Catalogue, r: FamiliesAnalysis): Row[] {
  const rows: Row[] = [];
  for (let k = 0; k < cat.size; k++) {
    const reason = r.screen.reason[k];
    if (reason === '' || reason === 'proper-unreliable') continue;
    rows.push([cat.designation[k], reason, FAMILIES_NOT_SCREENED[reason as FamiliesSkipReason], num(cat.a[k], 6), num(cat.e[k], 6), ...where(cat, k)]);
  }
  return rows;
}
