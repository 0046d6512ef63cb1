/**
 * The orbit-quality fields a candidate was judged with, read from its catalogue row, so a
 * candidate can be weighed without going back to the input: osculation epoch, observed arc,
 * oppositions, observations used and the uncertainty parameter U (or the letter written in
 * its place). Missing values are null in JSON and empty in CSV.
 */
import { jdToCalendar } from '../core/time/julian.js';
import type { Catalogue } from '../clean/types.js';

export interface OrbitQuality {
  epochJdTT: number | null; // osculation epoch, JD TT
  epoch: string; // the same as a calendar date (TT), e.g. '2032-05-10.0'; '' when unknown
  arcDays: number | null; // observed arc
  oppositions: number | null;
  observations: number | null; // observations used in the orbit
  U: number | string | null; // uncertainty parameter 0 (best)..9, or the letter code given instead
}

/** Keys of OrbitQuality in output order, with their CSV column names. */
export const ORBIT_QUALITY_COLUMNS: readonly [keyof OrbitQuality, string][] = [
  ['epochJdTT', 'epoch_jd_tt'], ['epoch', 'epoch'], ['arcDays', 'arc_days'],
  ['oppositions', 'oppositions'], ['observations', 'observations'], ['U', 'U'],
];

const orNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** Calendar date of a JD as YYYY-MM-DD.d (one decimal of the day: catalogue epochs fall at 0h). */
export function calendarDateText(jd: number): string {
  if (!Number.isFinite(jd)) return '';
  const { year, month, day } = jdToCalendar(jd);
  return `${year}-${String(month).padStart(2, '0')}-${day.toFixed(1).padStart(4, '0')}`;
}

export function orbitQuality(cat: Catalogue, k: number): OrbitQuality {
  const code = cat.uncertaintyCode[k];
  return {
    epochJdTT: orNull(cat.epochJdTT[k]),
    epoch: calendarDateText(cat.epochJdTT[k]),
    arcDays: orNull(cat.arcDays[k]),
    oppositions: orNull(cat.nOpp[k]),
    observations: orNull(cat.nObs[k]),
    U: code !== 0 ? String.fromCharCode(code) : orNull(cat.uncertainty[k]),
  };
}
