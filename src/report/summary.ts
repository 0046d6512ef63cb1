/**
 * The run summary (summary.json): row accounting overall and per file, reject and quality
 * counts, per detector the bodies screened and not screened (by reason) and the candidates
 * by class with the definitions of their numbers, options, version and, unless a reproducible
 * run was asked for, the timings and peak memory (the only parts that vary between runs).
 */
import { QUALITY_FLAGS, type Catalogue, type Reject } from '../clean/types.js';
import type { Candidate, Detector, ScreeningAccount } from '../detect/types.js';
import { rejectExample, rejectGroups } from './rejectCategories.js';
import type { DetectorSummary, FileAccount, ScanSummary } from './types.js';

/** One detector as it ran: the detector and its screening account. */
export interface DetectorRun {
  detector: Detector;
  account: ScreeningAccount;
}

export interface SummaryInput {
  version: string;
  demoCatalogue?: boolean; // no files were named: the bundled demo catalogue was scanned
  files: FileAccount[];
  catalogue: Catalogue;
  rejects: readonly Reject[];
  candidates: readonly Candidate[];
  runs: readonly DetectorRun[]; // in the order they ran
  options: Record<string, unknown>;
  timing?: Record<string, number>;
  peakRssMb?: number;
  twoThreadReadFiles?: number; // input files parsed on two threads (depends on --threads and file size)
}

function qualityCounts(cat: Catalogue): Record<string, number> {
  const out: Record<string, number> = {};
  QUALITY_FLAGS.forEach((name, bit) => {
    let n = 0;
    for (let k = 0; k < cat.size; k++) if (cat.quality[k] & (1 << bit)) n++;
    out[name] = n;
  });
  return out;
}

/** Candidates of one detector by class (classes sorted), then 'total'. */
function classCounts(candidates: readonly Candidate[], detector: string): Record<string, number> {
  const counts: Record<string, number> = {};
  let total = 0;
  for (const c of candidates) {
    if (c.detector !== detector) continue;
    counts[c.class] = (counts[c.class] ?? 0) + 1;
    total++;
  }
  const sorted = Object.entries(counts).sort((x, y) => (x[0] < y[0] ? -1 : 1));
  return Object.fromEntries([...sorted, ['total', total]]);
}

/** The definitions of a detector's three numbers, in words, for summary.json and report.md. */
export function numberDefinitions(d: Detector): DetectorSummary['definitions'] {
  return {
    score: d.scoreMeaning,
    tailFraction: `fraction of ${d.tailMeaning} (a rank within this run, not a probability)`,
    falseAlarmProb: d.falseAlarmModel ?? 'not given: this detector states no null model to calibrate one against',
  };
}

function detectorSummary(run: DetectorRun, candidates: readonly Candidate[], accepted: number): DetectorSummary {
  const id = run.detector.id;
  return {
    accepted,
    screened: run.account.screened,
    notScreened: run.account.notScreened,
    candidates: classCounts(candidates, id),
    boundaryCases: candidates.filter((c) => c.detector === id && c.boundary).length,
    definitions: numberDefinitions(run.detector),
  };
}

/** Reject counts by group and the first reject of each group, verbatim (./rejectCategories.ts). */
function rejectsByReason(rejects: readonly Reject[]): Pick<ScanSummary['rejects'], 'byReason' | 'examples'> {
  const groups = rejectGroups(rejects);
  return {
    byReason: Object.fromEntries(groups.map((g) => [g.key, g.count])),
    examples: Object.fromEntries(groups.map((g) => [g.key, rejectExample(g.example)])),
  };
}

export function buildSummary(input: SummaryInput): ScanSummary {
  const rows = { read: 0, accepted: 0, rejected: 0 };
  for (const f of input.files) {
    rows.read += f.rows.read;
    rows.accepted += f.rows.accepted;
    rows.rejected += f.rows.rejected;
  }
  const byKind: Record<string, number> = { parse: 0, invalid: 0, duplicate: 0 };
  for (const r of input.rejects) byKind[r.kind]++;
  const summary: ScanSummary = {
    tool: 'wayward',
    version: input.version,
    demoCatalogue: input.demoCatalogue ?? false,
    rows,
    files: input.files,
    rejects: { byKind, ...rejectsByReason(input.rejects) },
    qualityFlags: qualityCounts(input.catalogue),
    detectors: Object.fromEntries(input.runs.map((r) => [r.detector.id, detectorSummary(r, input.candidates, input.catalogue.size)])),
    options: input.options,
  };
  if (input.timing) summary.timing = input.timing;
  if (input.peakRssMb !== undefined) {
    summary.resources = { peakRssMb: input.peakRssMb, ...(input.twoThreadReadFiles !== undefined ? { twoThreadReadFiles: input.twoThreadReadFiles } : {}) };
  }
  return summary;
}
