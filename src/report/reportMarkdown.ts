/**
 * report.md: a person's summary of the run: what went in, what was set aside and why,
 * what each detector screened and what it did not (by reason), the strongest candidates of
 * each class with their orbit quality and caveats, and the boundary cases apart. No
 * timings, so the file is byte-identical for the same input.
 */
import type { Catalogue } from '../clean/types.js';
import type { Candidate, Detector } from '../detect/types.js';
import {
  FALSE_ALARM_HEADING, TAIL_FRACTION_HEADING, falseAlarmCell, flagsCell, orbitQualityCell, scoreCell, tailFractionCell,
} from './candidateCells.js';
import { orbitQuality } from './orbitQuality.js';
import { boundaryCases, topByClass } from './rank.js';
import { markdownTable } from './textTable.js';
import type { DetectorSummary, ScanSummary } from './types.js';

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

/** Screened and not-screened bodies of one detector; the rows add up to the accepted total. */
function screeningTable(d: Detector, ds: DetectorSummary): string {
  const rows = [['screened', String(ds.screened)]];
  for (const [reason, n] of Object.entries(ds.notScreened)) {
    rows.push([`not screened: ${d.notScreenedReasons[reason] ?? reason} (\`${reason}\`)`, String(n)]);
  }
  rows.push(['**accepted bodies**', String(ds.accepted)]);
  return markdownTable(['bodies', 'count'], rows, [false, true]);
}

function candidateTable(list: readonly Candidate[], cat: Catalogue): string {
  const rows = list.map((c, k) => [
    String(k + 1), c.designation, scoreCell(c), tailFractionCell(c), falseAlarmCell(c),
    orbitQualityCell(orbitQuality(cat, c.index)), flagsCell(c), c.why,
  ]);
  return markdownTable(
    ['#', 'designation', 'score', TAIL_FRACTION_HEADING, FALSE_ALARM_HEADING, 'orbit quality', 'flags', 'why'],
    rows, [true, false, true, true, true, false, false, false],
  );
}

/** '(top 20 of 25; all 25 in candidates.csv and candidates.jsonl)' or '(all 5)'. */
function shownOf(shown: number, total: number): string {
  return shown < total ? `top ${shown} of ${total}; all ${total} in candidates.csv and candidates.jsonl` : `all ${total}`;
}

function detectorSection(d: Detector, ranked: readonly Candidate[], s: ScanSummary, cat: Catalogue, top: number): string {
  const ds = s.detectors[d.id];
  const defs = ds.definitions;
  const countLine = Object.entries(ds.candidates).filter(([cls]) => cls !== 'total').map(([cls, n]) => `${cls} ${n}`).join(', ');
  const parts = [
    `## ${d.id}`, '', `${d.description}.`, '',
    `- **score**: ${defs.score}.`,
    `- **${TAIL_FRACTION_HEADING}**: ${defs.tailFraction}.`,
    `- **${FALSE_ALARM_HEADING}**: ${defs.falseAlarmProb}.`,
    '', '### Bodies screened', '', screeningTable(d, ds), '',
    `Candidates: ${countLine || 'none'} (total ${ds.candidates.total}, of which ${ds.boundaryCases} boundary cases).`,
  ];
  for (const { cls, best, total } of topByClass(ranked, d.id, top)) {
    parts.push('', `### ${cls} (${shownOf(best.length, total)})`, '', candidateTable(best, cat));
  }
  const boundary = boundaryCases(ranked, d.id);
  parts.push('', `### Boundary cases (${boundary.length === 0 ? 'none' : shownOf(Math.min(top, boundary.length), boundary.length)})`);
  if (boundary.length > 0) {
    parts.push('', 'Within the detector\'s band of doubt: listed for a look, not ranked as anomalies.', '', candidateTable(boundary.slice(0, top), cat));
  }
  return parts.join('\n');
}

export function reportMarkdown(s: ScanSummary, ranked: readonly Candidate[], detectors: readonly Detector[], cat: Catalogue, top = 20): string {
  const head = [
    '# wayward scan report', '', `wayward ${s.version}; ${s.rows.read} rows read, ${cat.size} bodies accepted, ${s.rows.rejected} rejected.`, '',
    `> ${SCREENING_CAVEAT}`,
  ].join('\n');
  const sections = [head, inputSection(s), rejectSection(s), qualitySection(s)];
  for (const d of detectors) sections.push(detectorSection(d, ranked, s, cat, top));
  return sections.join('\n\n') + '\n';
}
