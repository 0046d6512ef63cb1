/**
 * Deterministic number text for `check`'s outputs: the same double always gives the same
 * characters (toPrecision / toFixed / toExponential are exact functions of the value, ECMA-262
 * §21.1.3), NaN as '–' in tables.
 */

/** Three significant figures; '–' for NaN. */
export function sig3(x: number): string {
  if (Number.isNaN(x)) return '–';
  if (!Number.isFinite(x)) return String(x);
  const a = Math.abs(x);
  return a !== 0 && (a < 1e-3 || a >= 1e5) ? x.toExponential(2) : x.toPrecision(3);
}

/** Fixed decimals; '–' for NaN. */
export function fixed(x: number, digits: number): string {
  return Number.isNaN(x) ? '–' : x.toFixed(digits);
}

/** A JSON replacer: non-finite numbers become null, typed arrays plain arrays. */
export function jsonReplacer(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && !Number.isFinite(value)) return null;
  if (value instanceof Float64Array) return Array.from(value);
  return value;
}
