/**
 * The fixed-column field helpers of ./fixedField.ts over the bytes of a line instead of its
 * text, for lines whose bytes are their characters (ASCII, or latin1 read as latin1: byte
 * k is char code k). Positions are absolute indices into the buffer, half-open [from, to),
 * already cut at the end of the line by the caller. Each gives what its text counterpart
 * gives on the decoded line, or says that it cannot (NOT_PLAIN) where the text counterpart
 * would take its slow path: such a line goes to the text parser.
 */

/** Powers of ten that are exact doubles (10^0 .. 10^22), as in ./fixedField.ts. */
const POW10 = Array.from({ length: 23 }, (_, k) => 10 ** k);

/**
 * Returned by plainNumberAt where parseFixedNumber would fall back to Number() (exponents,
 * long mantissas, stray characters): the text parser must decide. Never a field's value
 * (parseFixedNumber gives only finite numbers or NaN).
 */
export const NOT_PLAIN = Infinity;

/** True when bytes [from, to) are all spaces (or none). */
export function isBlankBytes(bytes: Uint8Array, from: number, to: number): boolean {
  for (let k = from; k < to; k++) if (bytes[k] !== 32) return false;
  return true;
}

/**
 * Unsigned integer written with exactly the digits in [from, to), as parseDigits; -1
 * otherwise (also for an empty range).
 */
export function digitsAt(bytes: Uint8Array, from: number, to: number): number {
  if (from >= to) return -1;
  let v = 0;
  for (let k = from; k < to; k++) {
    const c = bytes[k];
    if (c < 48 || c > 57) return -1;
    v = v * 10 + (c - 48);
  }
  return v;
}

/**
 * parseFixedNumber over bytes [from, to): the same double for a plain decimal `[-+]ddd.ddd`
 * (mantissa / 10^k, correctly rounded as Number() is), NaN when blank or when no digit is
 * written, NOT_PLAIN where parseFixedNumber would hand the text to Number().
 */
export function plainNumberAt(bytes: Uint8Array, from: number, to: number): number {
  let k = from;
  while (k < to && bytes[k] === 32) k++;
  let last = to;
  while (last > k && bytes[last - 1] === 32) last--;
  if (k === last) return NaN;
  let sign = 1;
  const c0 = bytes[k];
  if (c0 === 45 || c0 === 43) {
    sign = c0 === 45 ? -1 : 1;
    k++;
  }
  const first = k; // first digit or the point
  let mantissa = 0;
  let point = -1;
  for (; k < last; k++) {
    const d = bytes[k] - 48;
    if (d >= 0 && d <= 9) mantissa = mantissa * 10 + d;
    else if (d === -2 && point < 0) point = k; // '.'
    else return NOT_PLAIN;
  }
  const digits = point < 0 ? last - first : last - first - 1;
  const decimals = point < 0 ? 0 : last - point - 1;
  if (digits === 0) return NaN;
  if (digits > 15 || decimals > 22) return NOT_PLAIN;
  return decimals > 0 ? (sign * mantissa) / POW10[decimals] : sign * mantissa;
}
