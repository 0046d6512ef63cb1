/** Plain-text and Markdown tables from rows of strings. */

/** Columns padded to their widest cell, separated by two spaces; `right` aligns numerics. */
export function textTable(header: string[], rows: string[][], right: boolean[] = []): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((r) => r[c].length)));
  const line = (cells: string[]) =>
    cells.map((s, c) => (right[c] ? s.padStart(widths[c]) : s.padEnd(widths[c]))).join('  ').trimEnd();
  return [line(header), line(widths.map((w) => '-'.repeat(w))), ...rows.map(line)].join('\n');
}

/** A GitHub-flavoured Markdown table; pipes inside cells escaped. */
export function markdownTable(header: string[], rows: string[][], right: boolean[] = []): string {
  const esc = (s: string) => s.replace(/\|/g, '\\|');
  const rule = header.map((_, c) => (right[c] ? '---:' : '---'));
  return [header, rule, ...rows].map((r) => `| ${r.map(esc).join(' | ')} |`).join('\n');
}
