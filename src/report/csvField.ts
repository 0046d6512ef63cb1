/**
 * CSV field quoting per RFC 4180 §2: fields holding a comma, double quote, CR or LF are
 * enclosed in double quotes, and inner double quotes are doubled.
 */
export function csvField(value: string | number): string {
  const s = typeof value === 'number' ? formatNumber(value) : value;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** Numbers as the shortest round-trip decimal; NaN as an empty field. */
export function formatNumber(x: number): string {
  return Number.isNaN(x) ? '' : String(x);
}

/** One CSV record (no trailing newline). */
export function csvRecord(fields: readonly (string | number)[]): string {
  return fields.map(csvField).join(',');
}
