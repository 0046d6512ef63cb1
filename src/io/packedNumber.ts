/**
 * Permanent minor-planet numbers in the 5-character packed form (published description of
 * the packed minor-planet designation form):
 *   1 ..  99 999      five digits, zero-padded            ('00001')
 *   100 000 .. 619 999  one base-62 letter for the leading ten-thousands (A = 10 .. z = 61)
 *                       followed by four digits             ('A0000' = 100 000, 'z9999')
 *   620 000 ..          '~' and four base-62 digits of (number − 620 000)
 *                                                           ('~0000' = 620 000, '~zzzz')
 */
import { base62Decode, base62Encode, base62Value } from './base62.js';
import { parseDigits } from './fixedField.js';

/** First number written in the tilde form. */
export const TILDE_NUMBER_BASE = 620_000;
/** Largest number the packed forms can carry: 620 000 + 62^4 − 1 = 15 396 335. */
export const MAX_PACKED_NUMBER = TILDE_NUMBER_BASE + 62 ** 4 - 1;

/**
 * Number carried by a 5-character packed number, or NaN when `packed` is not in one of the
 * three number forms (the caller decides what to report).
 */
export function unpackNumber(packed: string): number {
  if (packed.length !== 5) return NaN;
  const c0 = packed.charCodeAt(0);
  if (c0 === 126) {
    // '~' + four base-62 digits
    const v = base62Decode(packed, 1, 4);
    return v < 0 ? NaN : TILDE_NUMBER_BASE + v;
  }
  const low = parseDigits(packed, 1, 5);
  const lead = base62Value(c0);
  if (lead < 0 || low < 0) return NaN;
  const n = lead * 10_000 + low;
  return n > 0 ? n : NaN;
}

/** The 5-character packed form of a permanent number 1 .. MAX_PACKED_NUMBER. */
export function packNumber(n: number): string {
  if (!Number.isInteger(n) || n < 1 || n > MAX_PACKED_NUMBER) {
    throw new RangeError(`packNumber: ${n} is not a number 1..${MAX_PACKED_NUMBER}`);
  }
  if (n < 100_000) return String(n).padStart(5, '0');
  if (n < TILDE_NUMBER_BASE) {
    const lead = Math.floor(n / 10_000);
    return base62Encode(lead, 1) + String(n % 10_000).padStart(4, '0');
  }
  return '~' + base62Encode(n - TILDE_NUMBER_BASE, 4);
}
