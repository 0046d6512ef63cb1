/**
 * The truth orbit as a row of the one-line orbit export format, and back: the elements are
 * written (rounded as the format writes them) and read again, and the read-back values are the
 * truth the astrometry is made from, so the written row is the exact truth and nothing hides
 * in the rounding. Angles in degrees in the row, radians in the elements; the epoch is TT in
 * the row and TDB in the elements (src/core/time/timeScales.ts, as the catalogue's users do).
 */
import { DEG_PER_RAD, GAUSS_K, RAD_PER_DEG } from '../../src/core/constants.js';
import type { OrbitElements } from '../../src/core/propagate/propagateOrbit.js';
import { jdTTToTDB } from '../../src/fit/observerPosition.js';
import { emptyOrbitRow, type OrbitRow } from '../../src/io/types.js';
import { formatOrbitExportLine } from '../../src/io/orbitExportFormat.js';
import { parseOrbitExportLine } from '../../src/io/orbitExportLine.js';

export interface ElementsInput {
  designation: string; // readable
  aAu: number;
  e: number;
  iDeg: number;
  nodeDeg: number;
  periDeg: number;
  meanAnomalyDeg: number;
  epochJdTT: number; // 0h TT of a calendar day (the format's packed epoch)
  H: number; // NaN when none
  reference: string; // up to 9 characters
}

export interface ElementsRow {
  line: string; // the export line as written
  row: OrbitRow; // as read back
  elements: OrbitElements; // the truth
}

/** Writes the row, reads it back, and gives the truth elements of what was read. */
export function elementsRow(input: ElementsInput, extra: Partial<OrbitRow> = {}): ElementsRow {
  const row = emptyOrbitRow();
  Object.assign(row, {
    designation: input.designation, kind: 'asteroid', epochJdTT: input.epochJdTT, aAu: input.aAu, e: input.e, iDeg: input.iDeg,
    nodeDeg: input.nodeDeg, periDeg: input.periDeg, meanAnomalyDeg: input.meanAnomalyDeg,
    meanMotionDegPerDay: (GAUSS_K * DEG_PER_RAD) / input.aAu ** 1.5, // Gauss's constant: n = k a^(−3/2) (k in rad/day)
    H: input.H, G: Number.isNaN(input.H) ? NaN : 0.15, reference: input.reference,
  }, extra);
  const line = formatOrbitExportLine(row);
  const back = emptyOrbitRow();
  parseOrbitExportLine(line, back, 'elements', 1);
  const elements: OrbitElements = {
    form: 'semimajor', aAu: back.aAu, e: back.e, iRad: back.iDeg * RAD_PER_DEG, nodeRad: back.nodeDeg * RAD_PER_DEG,
    periRad: back.periDeg * RAD_PER_DEG, meanAnomalyRad: back.meanAnomalyDeg * RAD_PER_DEG, epochJdTDB: jdTTToTDB(back.epochJdTT),
  };
  return { line, row: back, elements };
}
