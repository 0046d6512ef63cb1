/**
 * residuals.csv of `check`: one row per observation of the designation and model fitted, in
 * input order (the models in the order fitted), with its time (UTC, ISO 8601), station, status
 * (kept in the comparison set, rejected as an outlier, unusable) and the reason when unusable,
 * O−C in α cos δ and δ (arcsec), the assumed σ and the 2-D residual's χ². A record set aside
 * before the fit (unknown station, date, duplicate) has one row, model '', status 'unusable'.
 */
import { Instant } from '../core/time/time.js';
import type { CheckModelFit } from '../fit/check/index.js';
import type { AstrometryObservation } from '../io/astrometry/types.js';
import type { CheckRun } from './checkTypes.js';
import { csvRecord } from './csvField.js';

export const RESIDUAL_COLUMNS = [
  'file', 'line', 'time_utc', 'station', 'model', 'status', 'reason',
  'oc_ra_cosdec_arcsec', 'oc_dec_arcsec', 'sigma_ra_cosdec_arcsec', 'sigma_dec_arcsec', 'chi2',
];

/** ISO 8601 UTC to the millisecond; the JD as text when the leap-second table cannot place it. */
export function utcIso(jdUtc: number): string {
  try {
    return Instant.fromJd(jdUtc, 'UTC').toIso(3);
  } catch {
    return `JD ${jdUtc} UTC`;
  }
}

function fittedRows(o: AstrometryObservation, i: number, fits: readonly CheckModelFit[], sra: number, sdec: number): (string | number)[][] {
  return fits.map((f) => {
    const r = f.fit.observations[i];
    const status = f.status[i];
    return [o.file, o.line, utcIso(o.timeJdUtc), o.station, f.id, status, status === 'unusable' ? 'no TT for the time (before 1972)' : '',
      r.residualRaCosDecArcsec, r.residualDecArcsec, sra, sdec, r.chi2];
  });
}

/** The text of residuals.csv. */
export function residualsCsvText(run: CheckRun): string {
  const r = run.result;
  const rows: { line: number; order: number; cells: (string | number)[] }[] = [];
  r.observations.forEach((o, i) => {
    fittedRows(o, i, r.fits, r.sigmaRaCosDecArcsec[i], r.sigmaDecArcsec[i]).forEach((cells, k) => rows.push({ line: o.line, order: k, cells }));
  });
  for (const s of run.account.setAside) {
    const o = s.observation;
    rows.push({ line: o.line, order: 0, cells: [o.file, o.line, utcIso(o.timeJdUtc), o.station, '', 'unusable', s.reason, NaN, NaN, NaN, NaN, NaN] });
  }
  rows.sort((a, b) => a.line - b.line || a.order - b.order);
  return [csvRecord(RESIDUAL_COLUMNS), ...rows.map((x) => csvRecord(x.cells))].join('\n') + '\n';
}
