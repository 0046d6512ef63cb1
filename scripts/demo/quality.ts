/**
 * Orbit-quality fields of demo rows: observation count, oppositions, arc (first–last years
 * for multi-opposition orbits, days for one-opposition orbits), uncertainty parameter U
 * 0–9, rms residual and date of last observation. The correlations follow common practice
 * (longer arcs → smaller U; brighter bodies → known longer, observed more); the numbers
 * are from memory and only need to look plausible.
 */
import { jdToCalendar } from '../../src/core/time/julian.js';
import { halfMonthIndex } from './designations.js';
import type { Random } from './random.js';
import { rayleigh, uniform, uniformInt } from './random.js';
import type { Section } from './scenario.js';
import { DEMO_CUT_JD_TT, PROVISIONAL_YEARS } from './scenario.js';
import type { DemoQuality } from './types.js';

const CUT = jdToCalendar(DEMO_CUT_JD_TT);
const LAST_HALF_MONTH_OF_CUT_YEAR = halfMonthIndex(CUT.month, Math.floor(CUT.day));

/** U from the arc in years for multi-opposition orbits (longer arc → better orbit). */
export function uncertaintyFromArcYears(random: Random, arcYears: number): number {
  if (arcYears >= 20) return random() < 0.8 ? 0 : 1;
  if (arcYears >= 10) return uniformInt(random, 0, 2);
  if (arcYears >= 5) return uniformInt(random, 1, 3);
  if (arcYears >= 2) return uniformInt(random, 2, 5);
  return uniformInt(random, 3, 6);
}

/** U from the arc in days for one-opposition orbits. */
export function uncertaintyFromArcDays(random: Random, arcDays: number): number {
  if (arcDays > 60) return uniformInt(random, 5, 7);
  if (arcDays >= 10) return uniformInt(random, 6, 8);
  return uniformInt(random, 8, 9);
}

function clearQuality(out: DemoQuality): void {
  out.firstObsYear = NaN; out.lastObsYear = NaN; out.arcDays = NaN;
  out.designationYear = NaN; out.designationHalfMonth = NaN;
}

/** Multi-opposition fields from first year and last-observation date (shared by sections). */
function fillMultiOpposition(random: Random, firstYearIn: number, lastObsJd: number, H: number, out: DemoQuality): void {
  let firstYear = firstYearIn;
  const lastYear = jdToCalendar(lastObsJd).year;
  if (firstYear >= lastYear) firstYear = lastYear - 1; // an earlier (precovery) sighting
  const years = lastYear - firstYear + 1;
  out.firstObsYear = firstYear;
  out.lastObsYear = lastYear;
  out.lastObsJdTT = lastObsJd;
  out.nOpp = Math.min(years, Math.max(2, Math.round(years * uniform(random, 0.45, 0.95))));
  const brightness = 1 + 0.3 * Math.max(0, 16 - H);
  out.nObs = Math.round(out.nOpp * uniform(random, 6, 30) * brightness);
  out.uncertainty = uncertaintyFromArcYears(random, lastYear - firstYear);
  out.rmsArcsec = uniform(random, 0.3, 0.95);
}

/** A JD at 0h TT (x.5) on or before `jd`. */
function startOfDay(jd: number): number {
  return Math.floor(jd - 0.5) + 0.5;
}

/** Last-observation date: before the cut, typically recent (Rayleigh scale in days). */
function lastObservation(random: Random, scaleDays: number): number {
  return startOfDay(DEMO_CUT_JD_TT - Math.min(rayleigh(random, scaleDays), 900));
}

/** Quality of a natural row of a section; H makes bright bodies older and better observed. */
export function sampleQuality(random: Random, section: Section, H: number, out: DemoQuality): void {
  clearQuality(out);
  if (section === 'numbered') {
    const back = Math.round(rayleigh(random, 6 + 1.5 * Math.max(0, 18 - H)));
    const first = Math.min(Math.max(2026 - back, 1900), 2026);
    fillMultiOpposition(random, first, lastObservation(random, 150), H, out);
  } else if (section === 'multiOpposition') {
    const yearIndex = uniformInt(random, 0, PROVISIONAL_YEARS.length - 1);
    const year = PROVISIONAL_YEARS[yearIndex];
    const maxHalf = yearIndex === PROVISIONAL_YEARS.length - 1 ? LAST_HALF_MONTH_OF_CUT_YEAR : 23;
    out.designationYear = year;
    out.designationHalfMonth = uniformInt(random, 0, maxHalf);
    const precovery = year === CUT.year || random() < 0.35;
    const first = precovery ? year - uniformInt(random, 1, 12) : year;
    fillMultiOpposition(random, first, lastObservation(random, 120), H, out);
  } else {
    fillOneOpposition(random, Math.round(Math.exp(uniform(random, 0, Math.log(150)))), out);
  }
}

/** One-opposition fields for an arc of about `arcDays` days ending before the cut. */
export function fillOneOpposition(random: Random, arcDays: number, out: DemoQuality): void {
  clearQuality(out);
  const firstJd = startOfDay(DEMO_CUT_JD_TT - uniform(random, 1, 300));
  const lastJd = Math.min(firstJd + Math.max(1, arcDays), DEMO_CUT_JD_TT);
  const first = jdToCalendar(firstJd);
  out.designationYear = first.year;
  out.designationHalfMonth = halfMonthIndex(first.month, Math.floor(first.day));
  out.arcDays = lastJd - firstJd;
  out.lastObsJdTT = lastJd;
  out.nOpp = 1;
  out.nObs = 3 + Math.round(out.arcDays ** 0.6 * uniform(random, 1, 4));
  out.uncertainty = uncertaintyFromArcDays(random, out.arcDays);
  out.rmsArcsec = uniform(random, 0.05, 0.7);
}

/** A deliberately poor orbit: one opposition, a few days, few observations, U 7–9. */
export function samplePoorQuality(random: Random, out: DemoQuality): void {
  fillOneOpposition(random, uniformInt(random, 1, 8), out);
  out.nObs = uniformInt(random, 4, 12);
  out.uncertainty = uniformInt(random, 7, 9);
}
