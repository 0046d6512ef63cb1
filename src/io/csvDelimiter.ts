/**
 * The delimiter of a CSV/TSV table, sniffed from its header line: the most frequent of
 * comma, tab and semicolon outside double quotes (comma on a tie). Quotes as in RFC 4180
 * (a quoted field may hold the delimiter).
 */

/** Delimiter of a header line: the most frequent of , \t ; outside quotes (',' on ties). */
export function sniffDelimiter(headerLine: string): string {
  const counts: Record<string, number> = { ',': 0, '\t': 0, ';': 0 };
  let quoted = false;
  for (const ch of headerLine) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && ch in counts) counts[ch]++;
  }
  let best = ',';
  for (const d of ['\t', ';']) if (counts[d] > counts[best]) best = d;
  return best;
}
