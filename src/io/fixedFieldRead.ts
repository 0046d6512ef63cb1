/**
 * Reading fields of a fixed-width data line with errors that name the columns: shared by
 * the one-line orbit and comet export parsers. A field is a 0-based half-open [start, end)
 * pair; messages give the published 1-based columns. Every failure is an InputError
 * `FILE:LINE:COL: reason` carrying the whole line. File and line travel as two arguments
 * (no per-line object).
 */
import { fieldText, isBlankField, parseFixedNumber } from './fixedField.js';
import { InputError } from './types.js';

export type Field = readonly [number, number];

/** 'column 5' or 'columns 9–13' (published 1-based numbering). */
export function columnsOf(field: Field): string {
  return field[1] - field[0] === 1 ? `column ${field[1]}` : `columns ${field[0] + 1}–${field[1]}`;
}

/** Throws the InputError for `field` of `line`. */
export function failAt(file: string, lineNo: number, line: string, field: Field, reason: string): never {
  throw new InputError(file, lineNo, field[0] + 1, reason, line);
}

/** True for a blank line or a separator line made of dashes (5 or more) and blanks. */
export function isSeparatorLine(line: string): boolean {
  let dashes = 0;
  for (let k = 0; k < line.length; k++) {
    const c = line.charCodeAt(k);
    if (c === 45) dashes++;
    else if (c !== 32 && c !== 9) return false;
  }
  return dashes === 0 || dashes >= 5;
}

/** Number from `field`, NaN when blank or past the end; InputError when cut or not a number. */
export function optionalNumber(line: string, field: Field, what: string, file: string, lineNo: number): number {
  if (line.length > field[0] && line.length < field[1]) {
    failAt(file, lineNo, line, field, `line ends at column ${line.length}, inside ${what} (${columnsOf(field)})`);
  }
  const v = parseFixedNumber(line, field[0], field[1]);
  if (Number.isNaN(v) && !isBlankField(line, field[0], field[1])) {
    failAt(file, lineNo, line, field, `${what} is not a number: '${fieldText(line, field[0], field[1])}' (${columnsOf(field)})`);
  }
  return v;
}

/** Number from `field`; InputError naming the field when blank, cut off, or not a number. */
export function requiredNumber(line: string, field: Field, what: string, file: string, lineNo: number): number {
  if (line.length <= field[0]) {
    failAt(file, lineNo, line, field, `line ends at column ${line.length}, before ${what} (${columnsOf(field)})`);
  }
  const v = optionalNumber(line, field, what, file, lineNo);
  if (Number.isNaN(v)) failAt(file, lineNo, line, field, `missing ${what} (${columnsOf(field)})`);
  return v;
}
