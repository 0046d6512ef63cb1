/**
 * The short stdout summary of a scan: totals, then for each detector what it screened, the
 * top candidates of each class, its boundary cases apart, and where all of them are.
 */
import type { Candidate } from '../detect/types.js';
import {
  FALSE_ALARM_HEADING, TAIL_FRACTION_HEADING, falseAlarmCell, flagsCell, scoreCell, tailFractionCell,
} from '../report/candidateCells.js';
import { boundaryCases, topByClass } from '../report/rank.js';
import { textTable } from '../report/textTable.js';
import type { DetectorSummary } from '../report/types.js';
import type { ScanResult } from './scan.js';

const BOLD = '\u001b[1m';
const RESET = '\u001b[0m';

function candidateRows(list: readonly Candidate[]): string {
  const rows = list.map((c) => [c.designation, scoreCell(c), tailFractionCell(c), falseAlarmCell(c), flagsCell(c)]);
  return textTable(['designation', 'score', TAIL_FRACTION_HEADING, FALSE_ALARM_HEADING, 'flags'], rows, [false, true, true, true, false]);
}

function screeningLine(id: string, ds: DetectorSummary): string {
  const not = Object.entries(ds.notScreened).filter(([, n]) => n > 0).map(([r, n]) => `${r} ${n}`).join(', ');
  return `${id}: ${ds.screened} of ${ds.accepted} accepted bodies screened${not ? ` (not screened: ${not})` : ''}`;
}

/** 'top 5 of 25' or 'all 3'. */
function shownOf(shown: number, total: number): string {
  return shown < total ? `top ${shown} of ${total}` : `all ${total}`;
}

export function scanStdoutTable(result: ScanResult, top: number, colour: boolean): string {
  const s = result.summary;
  const bold = (t: string) => (colour ? `${BOLD}${t}${RESET}` : t);
  const lines = [
    `${s.rows.read} rows read: ${s.rows.accepted} accepted, ${s.rows.rejected} rejected (see ${result.outDir}/rejects.csv)`,
  ];
  for (const [id, ds] of Object.entries(s.detectors)) {
    lines.push('', bold(screeningLine(id, ds)));
    for (const { cls, best, total } of topByClass(result.ranked, id, top)) {
      lines.push(`${cls}: ${shownOf(best.length, total)}`, candidateRows(best));
    }
    const boundary = boundaryCases(result.ranked, id);
    if (boundary.length > 0) {
      const shown = boundary.slice(0, top);
      lines.push(`boundary cases: ${shownOf(shown.length, boundary.length)}`, candidateRows(shown));
    }
    lines.push(`${TAIL_FRACTION_HEADING}: ${ds.definitions.tailFraction}.`, `${FALSE_ALARM_HEADING}: ${ds.definitions.falseAlarmProb}.`);
  }
  lines.push(
    '', `All candidates, with the orbit quality they were judged with: ${result.outDir}/candidates.csv`,
    `Screening candidates only: check flags and confirm with follow-up before any claim. Outputs in ${result.outDir}/`,
  );
  return lines.join('\n') + '\n';
}
