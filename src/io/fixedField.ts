/**
 * Fixed-column field helpers shared by the fixed-width line parsers and writers. Columns
 * are 0-based, half-open [start, end) here; the layouts cite the published 1-based columns.
 * The number parser reads char codes directly (no substring, no parseFloat): plain decimals
 * `[-+]ddd.ddd` are assembled as integer mantissa / 10^k, which is correctly rounded (both
 * are exact doubles below 2^53 and 10^22, and IEEE division rounds once), so it gives the
 * same double as Number(); anything else (exponents, long mantissas) falls back to Number().
 */

/** Powers of ten that are exact doubles (10^0 .. 10^22). */
const POW10 = Array.from({ length: 23 }, (_, k) => 10 ** k);

/** True when columns [start, end) of `line` are all spaces or past its end. */
export function isBlankField(line: string, start: number, end: number): boolean {
  const stop = end < line.length ? end : line.length;
  for (let k = start; k < stop; k++) if (line.charCodeAt(k) !== 32) return false;
  return true;
}

/** Columns [start, end) of `line` with surrounding spaces removed ('' past its end). */
export function fieldText(line: string, start: number, end: number): string {
  let a = start;
  let b = end < line.length ? end : line.length;
  while (a < b && line.charCodeAt(a) <= 32) a++;
  while (b > a && line.charCodeAt(b - 1) <= 32) b--;
  return a < b ? line.slice(a, b) : ''; // one slice, no intermediate string
}

/**
 * Number in columns [start, end) of `line`; NaN when blank or not a finite number (tell
 * the two apart with isBlankField on the NaN path only).
 */
export function parseFixedNumber(line: string, start: number, end: number): number {
  const stop = end < line.length ? end : line.length;
  let k = start;
  while (k < stop && line.charCodeAt(k) === 32) k++;
  let last = stop;
  while (last > k && line.charCodeAt(last - 1) === 32) last--;
  if (k === last) return NaN;
  let sign = 1;
  const c0 = line.charCodeAt(k);
  if (c0 === 45 || c0 === 43) {
    sign = c0 === 45 ? -1 : 1;
    k++;
  }
  let mantissa = 0;
  let digits = 0;
  let decimals = -1;
  for (; k < last; k++) {
    const c = line.charCodeAt(k);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (decimals >= 0) decimals++;
    } else if (c === 46 && decimals < 0) {
      decimals = 0;
    } else {
      return slowNumber(line, start, stop);
    }
  }
  if (digits === 0) return NaN;
  if (digits > 15 || decimals > 22) return slowNumber(line, start, stop);
  return decimals > 0 ? (sign * mantissa) / POW10[decimals] : sign * mantissa;
}

function slowNumber(line: string, start: number, stop: number): number {
  const text = line.slice(start, stop).trim();
  // Number() accepts '0x..', 'Infinity' and '' which are not numbers in these formats
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(text)) return NaN;
  const v = Number(text);
  return Number.isFinite(v) ? v : NaN; // '1e999' overflows to Infinity: not a value either
}

/**
 * `value` with `decimals` decimals right-aligned in `width` columns; blanks for NaN.
 * RangeError when it does not fit (a writer must never shift later columns).
 */
export function fixedDecimal(value: number, decimals: number, width: number, what: string): string {
  if (Number.isNaN(value)) return ' '.repeat(width);
  const text = value.toFixed(decimals);
  if (text.length > width || !Number.isFinite(value)) {
    throw new RangeError(`${what} = ${value} does not fit in ${width} columns with ${decimals} decimals`);
  }
  return text.padStart(width);
}

/** Integer right-aligned in `width` columns; blanks for NaN; RangeError when it does not fit. */
export function fixedInteger(value: number, width: number, what: string): string {
  return fixedDecimal(Number.isNaN(value) ? NaN : Math.round(value), 0, width, what);
}

/** Text left-aligned in `width` columns; RangeError when longer. */
export function fixedText(text: string, width: number, what: string): string {
  if (text.length > width) throw new RangeError(`${what} '${text}' is longer than ${width} columns`);
  return text.padEnd(width);
}

/** Unsigned integer written with exactly the digits in [start, end) of `text`; -1 otherwise. */
export function parseDigits(text: string, start: number, end: number): number {
  if (end > text.length || start >= end) return -1;
  let v = 0;
  for (let k = start; k < end; k++) {
    const c = text.charCodeAt(k);
    if (c < 48 || c > 57) return -1;
    v = v * 10 + (c - 48);
  }
  return v;
}
