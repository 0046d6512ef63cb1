/**
 * The tables of the `coorbitals` command: one row per screened body (its prediction and,
 * when confirmed, its N-body state now) and one row per segment of each N-body history.
 * Dates as JD TDB and as years from the body's epoch; angles in degrees.
 */
import { DAYS_PER_JULIAN_YEAR } from '../core/constants.js';
import type { Catalogue } from '../clean/types.js';
import { stateNow, type CoorbitalBodyResult } from '../detect/coorbitalCandidate.js';

const r = (x: number, d: number): number => (Number.isFinite(x) ? Number(x.toFixed(d)) : NaN);

export const BODY_COLUMNS = [
  'designation', 'planet', 'delta_a_over_a', 'phi_deg', 'e', 'i_rel_deg', 'predicted', 'predicted_centre_deg',
  'predicted_period_yr', 'separatrix_margin', 'close_approach', 'confirmed_now', 'agree', 'segments',
  'min_distance_au', 'min_distance_jd_tdb', 'captures', 'unconfirmed_reason', 'source_file', 'source_line',
] as const;

/** One row per screened body, BODY_COLUMNS order. */
export function bodyRow(cat: Catalogue, b: CoorbitalBodyResult): (string | number)[] {
  const k = b.entry.index, p = b.prediction, h = b.history;
  return [
    cat.designation[k], b.entry.planet, r(b.entry.x, 7), r((b.entry.phiRad * 180) / Math.PI, 3), r(b.entry.shape.e, 5),
    r((b.entry.shape.iRad * 180) / Math.PI, 4), p.state, r(p.centreDeg, 2), r(p.periodYears, 1), r(p.separatrixMargin, 3),
    String(p.closeApproach), h ? stateNow(b) : '', h ? String(h.stateAtEpoch === p.state) : '', h ? h.segments.length : NaN,
    h ? r(h.minDistanceAu, 6) : NaN, h ? r(h.minDistanceJdTDB, 3) : NaN, h ? h.captures.length : NaN, b.unconfirmedReason,
    cat.files[cat.fileIndex[k]], cat.source[k],
  ];
}

export const SEGMENT_COLUMNS = [
  'designation', 'planet', 'state', 'start_jd_tdb', 'end_jd_tdb', 'start_yr', 'end_yr', 'centre_deg', 'amplitude_deg', 'period_yr',
] as const;

/** One row per segment of every confirmed body, in body then time order. */
export function segmentRows(cat: Catalogue, bodies: readonly CoorbitalBodyResult[]): (string | number)[][] {
  const rows: (string | number)[][] = [];
  for (const b of bodies) {
    if (!b.history) continue;
    const epoch = b.history.epochJdTDB;
    for (const s of b.history.segments) {
      rows.push([
        cat.designation[b.entry.index], b.entry.planet, s.state, r(s.startJdTDB, 3), r(s.endJdTDB, 3),
        r((s.startJdTDB - epoch) / DAYS_PER_JULIAN_YEAR, 2), r((s.endJdTDB - epoch) / DAYS_PER_JULIAN_YEAR, 2),
        r(s.centreDeg, 2), r(s.amplitudeDeg, 2), r(s.periodYears, 1),
      ]);
    }
  }
  return rows;
}
