/**
 * Quality flags of one row: caveats that do not reject it but travel with every candidate
 * it raises. See QUALITY_FLAGS in types.ts for their meaning, thresholds.ts for defaults.
 */
import { calendarToJd } from '../core/time/julian.js';
import type { OrbitRow } from '../io/types.js';
import type { QualityThresholds } from './thresholds.js';
import { qualityBit } from './types.js';

const SINGLE_OPPOSITION = qualityBit('single-opposition');
const SHORT_ARC = qualityBit('short-arc');
const FEW_OBSERVATIONS = qualityBit('few-observations');
const POOR_UNCERTAINTY = qualityBit('poor-uncertainty');
const EPOCH_FAR = qualityBit('epoch-far-from-last-obs');
const HYPERBOLIC = qualityBit('hyperbolic');
const NO_QUALITY_INFO = qualityBit('no-quality-info');

/** Last-observation date of the row: the exact date if given, else the end of the last year. */
function lastObservationJd(row: OrbitRow): number {
  if (Number.isFinite(row.lastObsJdTT)) return row.lastObsJdTT;
  if (Number.isFinite(row.lastObsYear)) return calendarToJd(row.lastObsYear, 12, 31);
  return NaN;
}

/** Quality word (bit flags) for a row that passed validation. */
export function qualityWord(row: OrbitRow, t: QualityThresholds): number {
  let word = 0;
  if (row.nOpp === 1) word |= SINGLE_OPPOSITION;
  if (row.arcDays < t.shortArcDays) word |= SHORT_ARC;
  if (row.nObs < t.fewObservations) word |= FEW_OBSERVATIONS;
  if (row.uncertainty >= t.poorUncertainty || row.uncertaintyCode !== '') word |= POOR_UNCERTAINTY;
  const last = lastObservationJd(row);
  if (Math.abs(row.epochJdTT - last) > t.epochGapDays) word |= EPOCH_FAR;
  if (row.e >= 1) word |= HYPERBOLIC;
  const noInfo =
    Number.isNaN(row.uncertainty) && row.uncertaintyCode === '' &&
    Number.isNaN(row.arcDays) && Number.isNaN(row.nObs) && Number.isNaN(row.nOpp);
  if (noInfo) word |= NO_QUALITY_INFO;
  return word;
}
