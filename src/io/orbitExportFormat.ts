/**
 * Writer of the one-line minor-planet orbit export format (published column layout of the
 * one-line minor-planet orbit export format; columns in ./orbitExportLayout.ts). Fields an
 * OrbitRow does not carry (perturbers, orbit computer) are left blank; the flags field is
 * written '0000'. Trailing blanks are trimmed, as in real files whose last fields are absent.
 * A semimajor axis too large for its 11 columns is left blank (the reader derives it from
 * the mean daily motion), as real lines do for distant bodies.
 */
import { jdToCalendar } from '../core/time/julian.js';
import type { OrbitRow } from './types.js';
import { fixedDecimal, fixedInteger, fixedText } from './fixedField.js';
import { packDesignation } from './packedDesignation.js';
import { packNumber } from './packedNumber.js';
import { packEpochJd } from './packedEpoch.js';

/** Packed designation to write: the row's own, else from its number, else its designation. */
function packedOf(row: OrbitRow): string {
  if (row.packedDesignation !== '') return row.packedDesignation;
  if (Number.isFinite(row.number)) return packNumber(row.number);
  return packDesignation(row.designation);
}

/** Arc field: first–last years when known, else the arc in days, else blank. */
function arcField(row: OrbitRow): string {
  if (Number.isFinite(row.firstObsYear) && Number.isFinite(row.lastObsYear)) {
    return `${fixedInteger(row.firstObsYear, 4, 'first year')}-${fixedInteger(row.lastObsYear, 4, 'last year')}`;
  }
  if (Number.isFinite(row.arcDays)) return `${fixedInteger(row.arcDays, 4, 'arc days')} days`;
  return ' '.repeat(9);
}

/**
 * Readable designation, columns 167–194: a number up to 99 999 in parentheses right-aligned
 * to column 174 then the name; anything else from column 175 (as in the real sample lines).
 */
function readableField(row: OrbitRow): string {
  let text: string;
  if (Number.isFinite(row.number)) {
    const num = `(${row.number})`;
    text = (row.number < 100_000 ? num.padStart(8) : ' '.repeat(8) + num) + (row.name ? ` ${row.name}` : '');
  } else {
    text = ' '.repeat(8) + row.designation;
  }
  // a long name may run past column 194 when no date follows, as in real lines
  return Number.isFinite(row.lastObsJdTT) ? fixedText(text, 28, 'readable designation') : text;
}

/** Semimajor axis, blank when it does not fit 11 columns (real lines leave it blank then). */
function semimajorAxisField(aAu: number): string {
  const text = Number.isFinite(aAu) ? aAu.toFixed(7) : '';
  return text.length > 11 ? ' '.repeat(11) : fixedDecimal(aAu, 7, 11, 'a');
}

function uncertaintyField(row: OrbitRow): string {
  if (row.uncertaintyCode !== '') return fixedText(row.uncertaintyCode, 1, 'uncertainty code');
  return Number.isFinite(row.uncertainty) ? fixedInteger(row.uncertainty, 1, 'U') : ' ';
}

function lastObsField(jdTT: number): string {
  if (!Number.isFinite(jdTT)) return '';
  const d = jdToCalendar(jdTT);
  return `${d.year}${String(d.month).padStart(2, '0')}${String(Math.floor(d.day)).padStart(2, '0')}`;
}

/** One line of the orbit export format for `row` (angles in degrees, epoch at 0h TT). */
export function formatOrbitExportLine(row: OrbitRow): string {
  const parts = [
    fixedText(packedOf(row), 7, 'packed designation'), ' ',
    fixedDecimal(row.H, 2, 5, 'H'), ' ',
    fixedDecimal(row.G, 2, 5, 'G'), ' ',
    packEpochJd(row.epochJdTT), ' ',
    fixedDecimal(row.meanAnomalyDeg, 5, 9, 'M'), '  ',
    fixedDecimal(row.periDeg, 5, 9, 'peri'), '  ',
    fixedDecimal(row.nodeDeg, 5, 9, 'node'), '  ',
    fixedDecimal(row.iDeg, 5, 9, 'incl'), '  ',
    fixedDecimal(row.e, 7, 9, 'e'), ' ',
    fixedDecimal(row.meanMotionDegPerDay, 8, 11, 'n'), ' ',
    semimajorAxisField(row.aAu), '  ',
    uncertaintyField(row), ' ',
    fixedText(row.reference, 9, 'reference'), ' ',
    fixedInteger(row.nObs, 5, 'nObs'), ' ',
    fixedInteger(row.nOpp, 3, 'nOpp'), ' ',
    arcField(row), ' ',
    fixedDecimal(row.rmsArcsec, 2, 4, 'rms'), ' ',
    '   ', ' ', '   ', ' ', ' '.repeat(10), ' ', // perturbers and orbit computer: not carried
    '0000', ' ',
    readableField(row),
    lastObsField(row.lastObsJdTT),
  ];
  return parts.join('').trimEnd();
}
