/**
 * report.md: a person's summary of the run: what went in, what was set aside and why,
 * and the strongest candidates of each detector with their caveats. No timings, so the
 * file is byte-identical for the same input.
 */
import type { Catalogue } from '../clean/types.js';
import type { Candidate, Detector } from '../detect/types.js';
import { falseAlarmCell, flagsCell, scoreCell } from './candidateCells.js';
import { topByClass } from './rank.js';
import { markdownTable } from './textTable.js';
import type { ScanSummary } from './types.js';

export const SCREENING_CAVEAT =
  'These are screening candidates, not discoveries and not impact predictions. Most unusual ' +
  'orbits in a catalogue are artefacts of short arcs, poor orbits or bad rows: read the flags ' +
  'of every candidate, check the orbit with the official orbit-computation and impact-monitoring ' +
  'services of the minor-body clearinghouses, and confirm with follow-up observation before ' +
  'drawing any conclusion.';

function inputSection(s: ScanSummary): string {
  const rows = s.files.map((f) => [
    f.file, f.format, String(f.rows.read), String(f.rows.accepted), String(f.rows.rejected),
    f.error ?? f.sha256.slice(0, 16),
  ]);
  rows.push(['**total**', '', String(s.rows.read), String(s.rows.accepted), String(s.rows.rejected), '']);
  const demo = s.demoCatalogue ? ['No files were named: this is the bundled demo catalogue (invented data).', ''] : [];
  return ['## Input', '', ...demo, markdownTable(['file', 'format', 'read', 'accepted', 'rejected', 'sha256 (first 16) or error'], rows, [false, false, true, true, true, false])].join('\n');
}

function rejectSection(s: ScanSummary): string {
  const entries = Object.entries(s.rejects.byReason);
  if (entries.length === 0) return '## Rejected rows\n\nNone.';
  const shown = entries.slice(0, 15).map(([reason, n]) => [reason, String(n), s.rejects.examples[reason] ?? '']);
  const more = entries.length > 15 ? `\n\n${entries.length - 15} further reasons: see rejects.csv.` : '';
  const intro = 'Every rejected row is in rejects.csv with its file, line and raw text. Rows are grouped by reason, ' +
    "with the text quoted from the row shown as '…' and values read from it as #; the first row of each group is shown as written.";
  return ['## Rejected rows', '', intro, '',
    markdownTable(['reason', 'rows', 'first row (file:line: reason)'], shown, [false, true, false]) + more].join('\n');
}

function qualitySection(s: ScanSummary): string {
  const rows = Object.entries(s.qualityFlags).map(([flag, n]) => [flag, String(n)]);
  return ['## Quality flags on accepted rows', '', markdownTable(['flag', 'rows'], rows, [false, true])].join('\n');
}

function detectorSection(d: Detector, ranked: readonly Candidate[], s: ScanSummary, top: number): string {
  const counts = s.candidates[d.id] ?? {};
  const countLine = Object.entries(counts).map(([cls, n]) => `${cls} ${n}`).join(', ');
  const parts = [`## ${d.id}`, '', `${d.description}.`, '', `Candidates: ${countLine || 'none'}.`];
  for (const [cls, best] of topByClass(ranked, d.id, top)) {
    const rows = best.map((c, k) => [String(k + 1), c.designation, scoreCell(c), falseAlarmCell(c), flagsCell(c), c.why]);
    parts.push('', `### ${cls} (top ${best.length} of ${counts[cls]})`, '',
      markdownTable(['#', 'designation', 'score', 'false alarm', 'flags', 'why'], rows, [true, false, true, true, false, false]));
  }
  return parts.join('\n');
}

export function reportMarkdown(s: ScanSummary, ranked: readonly Candidate[], detectors: readonly Detector[], cat: Catalogue, top = 20): string {
  const head = [
    '# wayward scan report', '', `wayward ${s.version}; ${s.rows.read} rows read, ${cat.size} bodies accepted, ${s.rows.rejected} rejected.`, '',
    `> ${SCREENING_CAVEAT}`,
  ].join('\n');
  const sections = [head, inputSection(s), rejectSection(s), qualitySection(s)];
  for (const d of detectors) sections.push(detectorSection(d, ranked, s, top));
  return sections.join('\n\n') + '\n';
}
