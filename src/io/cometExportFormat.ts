/**
 * Writer of the one-line comet orbit export format (published column layout of the
 * one-line comet orbit export format; columns in ./cometExportLayout.ts). The perihelion
 * date is written to 1e-4 day (8.6 s) as the layout allows; the epoch, a whole day, must
 * fall at 0h (RangeError otherwise, as in the orbit export writer); trailing blanks are
 * trimmed.
 */
import { jdToCalendar } from '../core/time/julian.js';
import type { OrbitRow } from './types.js';
import { fixedDecimal, fixedText } from './fixedField.js';
import { packDesignation } from './packedDesignation.js';
import { calendarDayAt0h } from './packedEpoch.js';

const two = (v: number): string => String(v).padStart(2, '0');

/** Columns 1–12: number + type (numbered periodic comets) or blanks + type + provisional. */
function designationColumns(packed: string): string {
  if (packed.length === 5) return packed + ' '.repeat(7); // '0001P'
  if (packed.length === 12) return packed; // '0073P      b'
  if (packed.length === 8) return '    ' + packed; // 'CJ95O010'
  throw new RangeError(`formatCometExportLine: '${packed}' is not a packed comet designation`);
}

/** Columns 15–29: perihelion date, day to 4 decimals (rounded in JD first so no day 32). */
function perihelionColumns(tpJdTT: number): string {
  if (!Number.isFinite(tpJdTT)) throw new RangeError('formatCometExportLine: perihelion time is required');
  const rounded = Math.round((tpJdTT - 0.5) * 1e4) / 1e4 + 0.5;
  const d = jdToCalendar(rounded);
  return `${d.year} ${two(d.month)} ${fixedDecimal(d.day, 4, 7, 'perihelion day')}`;
}

/** Columns 82–89: epoch YYYYMMDD at 0h TT; blank when the row has none. */
function epochColumns(epochJdTT: number): string {
  if (Number.isNaN(epochJdTT)) return ' '.repeat(8);
  const d = calendarDayAt0h(epochJdTT, 'formatCometExportLine', 'the epoch field');
  return `${d.year}${two(d.month)}${two(d.day)}`;
}

/** Readable designation and name: `1P/Halley` for numbered comets, `C/1995 O1 (Hale-Bopp)` else. */
function readableText(row: OrbitRow, packed: string): string {
  if (row.name === '') return row.designation;
  return packed.length !== 8 ? `${row.designation}/${row.name}` : `${row.designation} (${row.name})`;
}

/** One line of the comet orbit export format for `row` (kind 'comet'; q, e, tp required). */
export function formatCometExportLine(row: OrbitRow): string {
  const packed = row.packedDesignation !== '' ? row.packedDesignation : packDesignation(row.designation);
  const parts = [
    designationColumns(packed), '  ',
    perihelionColumns(row.tpJdTT), ' ',
    fixedDecimal(row.qAu, 6, 9, 'q'), '  ',
    fixedDecimal(row.e, 6, 8, 'e'), '  ',
    fixedDecimal(row.periDeg, 4, 8, 'peri'), '  ',
    fixedDecimal(row.nodeDeg, 4, 8, 'node'), '  ',
    fixedDecimal(row.iDeg, 4, 8, 'incl'), '  ',
    epochColumns(row.epochJdTT), '  ',
    fixedDecimal(row.H, 1, 4, 'H'), ' ',
    fixedDecimal(row.G, 1, 4, 'G'), '  ',
    fixedText(readableText(row, packed), 56, 'designation and name'), ' ',
    row.reference, // last field: real references (a circular's citation) run past column 168
  ];
  return parts.join('').trimEnd();
}
