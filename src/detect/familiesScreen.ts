/**
 * Which bodies the families detector judges, and their proper elements (core/secular, linear
 * theory). Not screened, each body under the first reason that applies: from the comet
 * catalogue, elements missing, unbound (e ≥ 1 or a ≤ 0), e ≥ 0.9, a outside the range the
 * secular theory is used in. The rest get proper elements; those the theory does not trust
 * (`proper-unreliable`, core/secular/reliability.ts) are counted apart and listed with their
 * reasons, never clustered nor used in the outliers' calibration.
 */
import { planetarySecularModel } from '../core/secular/planetarySecularModel.js';
import { newProperColumns, properElementsColumns, type OsculatingColumns, type ProperColumns } from '../core/secular/properElementsColumns.js';
import { SECULAR_A_MAX_AU, SECULAR_A_MIN_AU } from '../core/secular/reliability.js';
import { KIND_COMET, type Catalogue } from '../clean/types.js';

/** Eccentricity from which a body is not screened (our choice: far beyond any family, where the second-order theory means nothing). */
export const FAMILIES_E_MAX = 0.9;

export const FAMILIES_NOT_SCREENED = {
  'comet-catalogue': 'from the comet catalogue (families are asteroid families)',
  'elements-missing': 'a, e, i, node, argument of perihelion or epoch missing',
  unbound: 'unbound: e ≥ 1 or a ≤ 0',
  'high-eccentricity': `e ≥ ${FAMILIES_E_MAX}`,
  'outside-secular-range': `a outside ${SECULAR_A_MIN_AU}–${SECULAR_A_MAX_AU} au, where the secular theory is used`,
  'proper-unreliable': 'proper elements not trusted (linear secular theory); listed with the reasons apart',
} as const;
export type FamiliesSkipReason = keyof typeof FAMILIES_NOT_SCREENED;

/** The screening reason of row k, or '' when its proper elements are computed. */
export function familiesSkipReason(cat: Catalogue, k: number): Exclude<FamiliesSkipReason, 'proper-unreliable'> | '' {
  if (cat.kind[k] === KIND_COMET) return 'comet-catalogue';
  const a = cat.a[k], e = cat.e[k];
  if (Number.isNaN(a) || Number.isNaN(e) || Number.isNaN(cat.i[k]) || Number.isNaN(cat.node[k]) || Number.isNaN(cat.peri[k]) || Number.isNaN(cat.epochJdTT[k])) return 'elements-missing';
  if (e >= 1 || a <= 0) return 'unbound';
  if (e >= FAMILIES_E_MAX) return 'high-eccentricity';
  if (a < SECULAR_A_MIN_AU || a > SECULAR_A_MAX_AU) return 'outside-secular-range';
  return '';
}

export interface FamiliesScreen {
  reason: (FamiliesSkipReason | '')[]; // per catalogue row; '' = screened (trusted proper elements)
  notScreened: Record<FamiliesSkipReason, number>;
  proper: ProperColumns; // per catalogue row; filled for rows with reason '' or 'proper-unreliable'
  screened: Int32Array; // rows with trusted proper elements, ascending
  models: number; // secular models built (one per distinct epoch)
}

/**
 * Proper elements of the rows of one epoch into `out`, with the planetary model of that epoch:
 * here (SERIAL_PROPER), or shared with worker threads (families/familiesThreads.ts), the same
 * numbers (each row is computed alone from the model).
 */
export type ProperRunner = (epochJdTT: number, cols: OsculatingColumns, out: ProperColumns) => void;

export const SERIAL_PROPER: ProperRunner = (epochJdTT, cols, out) => properElementsColumns(planetarySecularModel(epochJdTT), cols, out);

/**
 * Screens the catalogue and computes proper elements with one planetary model per distinct
 * epoch (the osculation epoch JD TT taken as TDB: they differ by under 2 ms, common practice);
 * `runProper`: on which threads.
 */
export function screenFamilies(cat: Catalogue, runProper: ProperRunner = SERIAL_PROPER): FamiliesScreen {
  const n = cat.size;
  const reason: (FamiliesSkipReason | '')[] = new Array(n);
  const notScreened = Object.fromEntries(Object.keys(FAMILIES_NOT_SCREENED).map((id) => [id, 0])) as Record<FamiliesSkipReason, number>;
  const proper = newProperColumns(n);
  proper.aAu.fill(NaN); proper.e.fill(NaN); proper.sinI.fill(NaN);
  const byEpoch = new Map<number, number[]>();
  for (let k = 0; k < n; k++) {
    reason[k] = familiesSkipReason(cat, k);
    if (reason[k] !== '') continue;
    const rows = byEpoch.get(cat.epochJdTT[k]);
    if (rows) rows.push(k); else byEpoch.set(cat.epochJdTT[k], [k]);
  }
  const epochs = [...byEpoch.keys()].sort((x, y) => x - y);
  for (const epoch of epochs) {
    const rows = byEpoch.get(epoch)!;
    const pickCol = (col: Float64Array) => {
      const picked = new Float64Array(rows.length); // a plain loop: Float64Array.from with a map function took 1 s on a million rows
      for (let m = 0; m < rows.length; m++) picked[m] = col[rows[m]];
      return picked;
    };
    const out = newProperColumns(rows.length);
    runProper(epoch, { a: pickCol(cat.a), e: pickCol(cat.e), i: pickCol(cat.i), node: pickCol(cat.node), peri: pickCol(cat.peri) }, out);
    for (let m = 0; m < rows.length; m++) {
      const k = rows[m];
      proper.aAu[k] = out.aAu[m]; proper.e[k] = out.e[m]; proper.sinI[k] = out.sinI[m];
      proper.gArcsecPerYear[k] = out.gArcsecPerYear[m]; proper.sArcsecPerYear[k] = out.sArcsecPerYear[m];
      proper.reliability[k] = out.reliability[m];
      if (out.reliability[m] !== 0) reason[k] = 'proper-unreliable';
    }
  }
  let m = 0;
  for (let k = 0; k < n; k++) if (reason[k] === '') m++; else notScreened[reason[k] as FamiliesSkipReason]++;
  const screened = new Int32Array(m);
  m = 0;
  for (let k = 0; k < n; k++) if (reason[k] === '') screened[m++] = k;
  return { reason, notScreened, proper, screened, models: epochs.length };
}
