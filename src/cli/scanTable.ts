/** The short stdout summary of a scan: totals and the top candidates of each detector. */
import { falseAlarmCell, flagsCell, scoreCell } from '../report/candidateCells.js';
import { topByClass } from '../report/rank.js';
import { textTable } from '../report/textTable.js';
import type { ScanResult } from './scan.js';

const BOLD = '\u001b[1m';
const RESET = '\u001b[0m';

export function scanStdoutTable(result: ScanResult, top: number, colour: boolean): string {
  const s = result.summary;
  const bold = (t: string) => (colour ? `${BOLD}${t}${RESET}` : t);
  const lines = [
    `${s.rows.read} rows read: ${s.rows.accepted} accepted, ${s.rows.rejected} rejected (see ${result.outDir}/rejects.csv)`,
  ];
  for (const d of s.detectors) {
    const counts = Object.entries(s.candidates[d]).map(([c, n]) => `${c} ${n}`).join(', ');
    lines.push('', bold(`${d}: ${counts}`));
    const best = topByClass(result.ranked, d, top).flatMap(([, list]) => list);
    if (best.length === 0) continue;
    const rows = best.map((c) => [c.designation, c.class, scoreCell(c), falseAlarmCell(c), flagsCell(c)]);
    lines.push(textTable(['designation', 'class', 'score', 'false alarm', 'flags'], rows, [false, false, true, true, false]));
  }
  lines.push('', `Screening candidates only: check flags and confirm with follow-up before any claim. Outputs in ${result.outDir}/`);
  return lines.join('\n') + '\n';
}
