/**
 * Base-62 digits of the packed designation forms: 0-9 = 0..9, A-Z = 10..35, a-z = 36..61.
 * The same alphabet serves the letter-prefixed and tilde-prefixed permanent numbers, the
 * cycle-count letters of provisional designations and the century/day letters of packed
 * dates (published description of the packed minor-planet designation and date forms).
 */

export const BASE62_DIGITS = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz';

/** Value of one base-62 digit character code, or -1 when the code is not a base-62 digit. */
export function base62Value(code: number): number {
  if (code >= 48 && code <= 57) return code - 48; // '0'..'9'
  if (code >= 65 && code <= 90) return code - 55; // 'A'..'Z'
  if (code >= 97 && code <= 122) return code - 61; // 'a'..'z'
  return -1;
}

/** Value of `length` base-62 digits of `text` from `start`; -1 if any is not a digit. */
export function base62Decode(text: string, start: number, length: number): number {
  let v = 0;
  for (let k = start; k < start + length; k++) {
    const d = base62Value(text.charCodeAt(k));
    if (d < 0) return -1;
    v = v * 62 + d;
  }
  return v;
}

/** `value` written as exactly `width` base-62 digits (RangeError when it does not fit). */
export function base62Encode(value: number, width: number): string {
  if (!Number.isInteger(value) || value < 0 || value >= 62 ** width) {
    throw new RangeError(`base62Encode: ${value} does not fit in ${width} base-62 digits`);
  }
  let out = '';
  let v = value;
  for (let k = 0; k < width; k++) {
    out = BASE62_DIGITS[v % 62] + out;
    v = Math.floor(v / 62);
  }
  return out;
}
