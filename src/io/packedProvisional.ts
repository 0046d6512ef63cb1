/**
 * Provisional and survey designations of minor planets in their packed forms (published
 * description of the packed minor-planet designation form):
 *
 * - Standard 7 characters `CYYHNNL`: century letter (I = 18, J = 19, K = 20, L = 21), two
 *   digits of the year, half-month letter (A..Y without I), cycle count in two characters
 *   (the first a base-62 digit giving the tens, so 'A0' = 100, 'z9' = 619), second letter
 *   (A..Z without I). `K19E05U` = 2019 EU5, `J95X00A` = 1995 XA, `K00AP5B` = 2000 AB255.
 * - Extended 7 characters for cycle counts past 619, `_YHVVVV`: an underscore, the year as
 *   one base-62 digit counted from 2000 ('E' = 2014), the half-month letter, then four
 *   base-62 digits of (cycle − 620) × 25 + index of the second letter (A = 0 .. Z = 24,
 *   I skipped). Worked out from the published description and checked against the real
 *   sample lines `_EW002J` = 2014 WT625, `_EW002K` = 2014 WU625, `_EW002N` = 2014 WX625:
 *   0·62³+0·62²+2·62+19 = 143 = 5 × 25 + 18 (T is the 19th letter without I, index 18).
 * - Survey designations `PLS2040` = 2040 P-L, `T1S3138` = 3138 T-1 (also T-2, T-3).
 *
 * Functions here return '' when the text is not in their form; packedDesignation.ts
 * turns that into a PackedFormError with a reason.
 */
import { base62Decode, base62Encode, base62Value } from './base62.js';
import { parseDigits } from './fixedField.js';

/** Letters of the half-month code and of the second letter: A..Z without I (25 letters). */
const LETTERS_NO_I = 'ABCDEFGHJKLMNOPQRSTUVWXYZ';
/** Largest cycle count of the standard packed form ('z9'). */
export const MAX_STANDARD_CYCLE = 619;
/** Years the extended form can carry: 2000 + one base-62 digit. */
const EXTENDED_FIRST_YEAR = 2000;
const SURVEYS: Readonly<Record<string, string>> = { PLS: 'P-L', T1S: 'T-1', T2S: 'T-2', T3S: 'T-3' };
const SURVEY_CODES: Readonly<Record<string, string>> = { 'P-L': 'PLS', 'T-1': 'T1S', 'T-2': 'T2S', 'T-3': 'T3S' };

function isHalfMonth(ch: string): boolean {
  return ch.length === 1 && ch !== 'I' && ch !== 'Z' && LETTERS_NO_I.includes(ch);
}

function isSecondLetter(ch: string): boolean {
  return ch.length === 1 && LETTERS_NO_I.includes(ch);
}

function isDigits(text: string, start: number, length: number): boolean {
  for (let k = start; k < start + length; k++) {
    const c = text.charCodeAt(k);
    if (!(c >= 48 && c <= 57)) return false;
  }
  return true;
}

/** Year from a century letter I..L and two digits at `start`; NaN if not that form. */
export function unpackCenturyYear(packed: string, start: number): number {
  const c = packed.charCodeAt(start);
  const yy = parseDigits(packed, start + 1, start + 3);
  if (c < 73 || c > 76 || yy < 0) return NaN; // 'I'..'L'
  return base62Value(c) * 100 + yy;
}

/** Century letter + two digits of a year 1800..2199, or '' when outside that range. */
export function packCenturyYear(year: number): string {
  if (!Number.isInteger(year) || year < 1800 || year > 2199) return '';
  return base62Encode(Math.floor(year / 100), 1) + String(year % 100).padStart(2, '0');
}

/** Cycle count from its two packed characters at `start`; -1 if not that form. */
export function unpackCycle(packed: string, start: number): number {
  const tens = base62Value(packed.charCodeAt(start));
  if (tens < 0 || !isDigits(packed, start + 1, 1)) return -1;
  return tens * 10 + (packed.charCodeAt(start + 1) - 48);
}

/** Two packed characters of a cycle count 0..619. */
export function packCycle(cycle: number): string {
  return base62Encode(Math.floor(cycle / 10), 1) + String(cycle % 10);
}

/** Readable provisional or survey designation of a 7-character packed one, or ''. */
export function unpackProvisional(packed: string): string {
  if (packed.length !== 7) return '';
  const survey = SURVEYS[packed.slice(0, 3)];
  if (survey !== undefined) return isDigits(packed, 3, 4) ? `${Number(packed.slice(3))} ${survey}` : '';
  if (packed[0] === '_') return unpackExtended(packed);
  const year = unpackCenturyYear(packed, 0);
  const cycle = unpackCycle(packed, 4);
  if (Number.isNaN(year) || cycle < 0 || !isHalfMonth(packed[3]) || !isSecondLetter(packed[6])) return '';
  return `${year} ${packed[3]}${packed[6]}${cycle > 0 ? cycle : ''}`;
}

function unpackExtended(packed: string): string {
  const yearDigit = base62Value(packed.charCodeAt(1));
  const v = base62Decode(packed, 3, 4);
  if (yearDigit < 0 || v < 0 || !isHalfMonth(packed[2])) return '';
  const cycle = 620 + Math.floor(v / 25);
  return `${EXTENDED_FIRST_YEAR + yearDigit} ${packed[2]}${LETTERS_NO_I[v % 25]}${cycle}`;
}

/** 7-character packed form of a readable provisional or survey designation, or ''. */
export function packProvisional(readable: string): string {
  const survey = /^(\d{1,4}) (P-L|T-[123])$/.exec(readable);
  if (survey) return SURVEY_CODES[survey[2]] + survey[1].padStart(4, '0');
  const m = /^(\d{4}) ([A-HJ-Y])([A-HJ-Z])([1-9]\d*)?$/.exec(readable);
  if (!m) return '';
  const year = Number(m[1]);
  const cycle = m[4] === undefined ? 0 : Number(m[4]);
  if (cycle <= MAX_STANDARD_CYCLE) {
    const yy = packCenturyYear(year);
    return yy === '' ? '' : `${yy}${m[2]}${packCycle(cycle)}${m[3]}`;
  }
  const v = (cycle - 620) * 25 + LETTERS_NO_I.indexOf(m[3]);
  if (year < EXTENDED_FIRST_YEAR || year > EXTENDED_FIRST_YEAR + 61 || v >= 62 ** 4) return '';
  return `_${base62Encode(year - EXTENDED_FIRST_YEAR, 1)}${m[2]}${base62Encode(v, 4)}`;
}
