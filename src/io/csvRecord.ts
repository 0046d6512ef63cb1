/**
 * One CSV/TSV record → OrbitRow, through the column index of ./columnMap.ts and the cell
 * readers of ./csvValues.ts. Every field of the scratch row is assigned. Angles are taken
 * in degrees. Derived values, each only where the file does not give it:
 * - a = q / (1 − e) for e < 1; else a = (k / n)^(2/3) from a mean motion n (deg/day),
 *   Kepler's third law in the Gaussian system (both in ./semimajorAxis.ts);
 * - epoch = tp when the file gives a perihelion time and no epoch (elements referred to it);
 * - arcDays = last_obs − first_obs when both are full dates.
 * Designation: from the designation column; a full-name column beside it (./columnMap.ts)
 * adds the proper name and the number where the designation cell lacks them, so pdes '1'
 * with full_name '1 Ceres (A801 AA)' reads as '(1) Ceres', number 1, name 'Ceres'; the two
 * naming different numbers is bad data.
 * Kind: by the designation pattern of ./bodyKind.ts ('1P', 'C/1995 O1' are comets), or the
 * kind the caller forces for the whole table.
 */
import type { ColumnIndex, CsvField } from './columnMap.js';
import type { CsvKindChoice } from './bodyKind.js';
import { kindOfDesignation } from './bodyKind.js';
import { cellDesignation, cellJd, cellNumber, cellYear, fullNameParts } from './csvValues.js';
import { PackedFormError } from './errors.js';
import { semimajorAxisFromMeanMotion, semimajorAxisFromPerihelion } from './semimajorAxis.js';
import { InputError, type OrbitRow } from './types.js';

/** Where a record came from, for error messages. */
export interface RecordContext {
  file: string;
  line: number;
  headers: readonly string[];
  raw: string;
  kind: CsvKindChoice; // 'auto': by designation pattern; else every row is of this kind
}

/** Reads the cell of `field` with `read`, turning a bad cell into an InputError. */
function cell<T>(record: readonly string[], index: ColumnIndex, field: CsvField, ctx: RecordContext, read: (t: string) => T, empty: T): T {
  const k = index[field];
  if (k < 0) return empty;
  const text = record[k];
  try {
    return read(text);
  } catch (err) {
    if (!(err instanceof PackedFormError)) throw err;
    throw new InputError(ctx.file, ctx.line, 0, `column '${ctx.headers[k]}' (field ${k + 1}): ${err.reason}: '${text}'`, ctx.raw);
  }
}

function required(value: number, field: CsvField, index: ColumnIndex, ctx: RecordContext): number {
  if (Number.isNaN(value)) {
    const where = index[field] >= 0 ? `column '${ctx.headers[index[field]]}' (field ${index[field] + 1})` : field;
    throw new InputError(ctx.file, ctx.line, 0, `missing ${where}`, ctx.raw);
  }
  return value;
}

function readQuality(record: readonly string[], index: ColumnIndex, ctx: RecordContext, row: OrbitRow): void {
  const u = cell(record, index, 'U', ctx, (t) => t, '');
  row.uncertainty = /^\d$/.test(u) ? Number(u) : NaN;
  row.uncertaintyCode = u !== '' && !/^\d$/.test(u) ? u : '';
  row.nObs = cell(record, index, 'nObs', ctx, cellNumber, NaN);
  row.nOpp = cell(record, index, 'nOpp', ctx, cellNumber, NaN);
  row.rmsArcsec = cell(record, index, 'rms', ctx, cellNumber, NaN);
  row.firstObsYear = cell(record, index, 'firstObs', ctx, cellYear, NaN);
  row.lastObsYear = cell(record, index, 'lastObs', ctx, cellYear, NaN);
  const first = cell(record, index, 'firstObs', ctx, (t) => (/^\d{4}$/.test(t) ? NaN : cellJd(t)), NaN);
  row.lastObsJdTT = cell(record, index, 'lastObs', ctx, (t) => (/^\d{4}$/.test(t) ? NaN : cellJd(t)), NaN);
  row.arcDays = cell(record, index, 'arcDays', ctx, cellNumber, NaN);
  if (Number.isNaN(row.arcDays)) row.arcDays = row.lastObsJdTT - first;
}

/** Name and number from the full-name cell where the designation cell lacks them (file comment). */
function addFullName(text: string, index: ColumnIndex, ctx: RecordContext, row: OrbitRow): void {
  const full = fullNameParts(text);
  if (Number.isFinite(full.number) && Number.isFinite(row.number) && full.number !== row.number) {
    const d = ctx.headers[index.designation];
    const f = ctx.headers[index.fullName];
    throw new InputError(ctx.file, ctx.line, 0,
      `column '${d}' gives number ${row.number} but column '${f}' gives ${full.number}: '${text.trim()}'`, ctx.raw);
  }
  if (row.name === '') row.name = full.name;
  if (Number.isFinite(full.number)) row.number = full.number;
  if (Number.isFinite(row.number) && row.designation === `(${row.number})` && row.name !== '') {
    row.designation = `(${row.number}) ${row.name}`;
  }
}

/** Fills `row` from one record (already checked to have the header's field count). */
export function parseCsvRecord(record: readonly string[], index: ColumnIndex, ctx: RecordContext, row: OrbitRow): void {
  row.name = cell(record, index, 'name', ctx, (t) => t, '');
  const desig = cell(record, index, 'designation', ctx, (t) => t, '');
  if (desig === '') required(NaN, 'designation', index, ctx);
  cellDesignation(desig, row);
  if (index.fullName >= 0) addFullName(record[index.fullName], index, ctx, row);
  row.packedDesignation = '';
  row.kind = ctx.kind === 'auto' ? kindOfDesignation(row.designation) : ctx.kind;
  row.e = required(cell(record, index, 'e', ctx, cellNumber, NaN), 'e', index, ctx);
  row.iDeg = required(cell(record, index, 'i', ctx, cellNumber, NaN), 'i', index, ctx);
  row.nodeDeg = required(cell(record, index, 'node', ctx, cellNumber, NaN), 'node', index, ctx);
  row.periDeg = required(cell(record, index, 'peri', ctx, cellNumber, NaN), 'peri', index, ctx);
  row.meanAnomalyDeg = cell(record, index, 'M', ctx, cellNumber, NaN);
  row.tpJdTT = cell(record, index, 'tp', ctx, (t) => cellJd(t), NaN);
  row.epochJdTT = index.epoch >= 0 ? cell(record, index, 'epoch', ctx, (t) => cellJd(t), NaN)
    : cell(record, index, 'epochMjd', ctx, (t) => cellJd(t, true), NaN);
  if (Number.isNaN(row.epochJdTT)) row.epochJdTT = row.tpJdTT;
  required(row.epochJdTT, index.epoch >= 0 ? 'epoch' : index.epochMjd >= 0 ? 'epochMjd' : 'tp', index, ctx);
  if (Number.isNaN(row.meanAnomalyDeg)) required(row.tpJdTT, index.M >= 0 ? 'M' : 'tp', index, ctx);
  row.qAu = cell(record, index, 'q', ctx, cellNumber, NaN);
  row.meanMotionDegPerDay = cell(record, index, 'n', ctx, cellNumber, NaN);
  row.aAu = cell(record, index, 'a', ctx, cellNumber, NaN);
  if (Number.isNaN(row.aAu)) row.aAu = semimajorAxisFromPerihelion(row.qAu, row.e);
  if (Number.isNaN(row.aAu)) row.aAu = semimajorAxisFromMeanMotion(row.meanMotionDegPerDay);
  if (Number.isNaN(row.aAu) && Number.isNaN(row.qAu)) required(NaN, index.a >= 0 ? 'a' : 'q', index, ctx);
  row.H = cell(record, index, 'H', ctx, cellNumber, NaN);
  row.G = cell(record, index, 'G', ctx, cellNumber, NaN);
  row.reference = '';
  readQuality(record, index, ctx, row);
}
