/**
 * The model table of `check`: one row per model fitted (failed ones with their reason) —
 * parameters ± σ, S/N, χ², weighted RMS, kept/rejected on the comparison set (and the model's
 * own rejections), Δχ², p-value and ΔBIC against gravity only.
 */
import type { CheckResult } from '../fit/check/index.js';
import { fixed, sig3 } from './checkNumbers.js';
import { textTable } from './textTable.js';

export const CHECK_TABLE_HEADER = ['model', 'parameters ± σ', 'S/N', 'χ²', 'wRMS (″)', 'kept/rejected (own)', 'Δχ²', 'p-value', 'ΔBIC'];

/** A p-value; one that underflows to 0 as '< 1e-300' (the χ² tail's double range). */
export function pValueText(p: number): string {
  return p === 0 ? '< 1e-300' : sig3(p);
}

/** The table's rows as text cells. */
export function checkTableRows(r: CheckResult): string[][] {
  const rows = r.fits.map((f) => {
    const row = r.comparison.rows.find((c) => c.id === f.id)!;
    const params = f.params.length === 0 ? '–' : f.params.map((p) => `${p.name} ${sig3(p.value)} ± ${sig3(p.sigma)} ${p.unit}`).join('; ');
    const snr = f.params.length === 0 ? '–' : f.params.map((p) => fixed(Math.abs(p.value) / p.sigma, 1)).join('; ');
    const isG = f.id === 'gravity';
    return [
      f.id + (f.id === r.preferred ? ' *' : ''), params, snr, fixed(f.chi2, 1), fixed(f.weightedRmsArcsec, 3), `${f.kept}/${f.rejected} (${f.ownRejected})`,
      isG ? '–' : fixed(row.deltaChiSquare, 1), isG ? '–' : pValueText(row.pValue), isG ? '–' : fixed(row.deltaBic, 1),
    ];
  });
  return rows;
}

/** The table as aligned text, with a line saying what * marks. */
export function checkTableText(r: CheckResult): string {
  return textTable(CHECK_TABLE_HEADER, checkTableRows(r), [false, false, true, true, true, true, true, true, true])
    + `\n* preferred (${r.comparison.rule}); kept/rejected on the comparison set, own = the model's own outlier rejections`
    + (r.gravityRestart === null ? ''
      : `\ngravity: fitted from the ${r.gravityRestart.from} solution on the observations ${r.gravityRestart.from} kept, no rejections of its own; from the start given it failed: ${r.gravityRestart.firstFailure}`)
    + r.failures.map((x) => `\n${x.id}: not compared, its fit failed: ${x.message}`).join('');
}
