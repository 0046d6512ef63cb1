/**
 * The run summary (summary.json): row accounting overall and per file, reject and quality
 * counts, candidates per detector and class, options, version and, unless a reproducible
 * run was asked for, the timings and peak memory (the only parts that vary between runs).
 */
import { QUALITY_FLAGS, type Catalogue, type Reject } from '../clean/types.js';
import type { Candidate } from '../detect/types.js';
import { rejectExample, rejectGroups } from './rejectCategories.js';
import type { FileAccount, ScanSummary } from './types.js';

export interface SummaryInput {
  version: string;
  demoCatalogue?: boolean; // no files were named: the bundled demo catalogue was scanned
  files: FileAccount[];
  catalogue: Catalogue;
  rejects: readonly Reject[];
  candidates: readonly Candidate[];
  detectors: string[];
  options: Record<string, unknown>;
  timing?: Record<string, number>;
  peakRssMb?: number;
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

function candidateCounts(candidates: readonly Candidate[], detectors: string[]): Record<string, Record<string, number>> {
  const out: Record<string, Record<string, number>> = {};
  for (const d of detectors) out[d] = {};
  for (const c of candidates) out[c.detector][c.class] = (out[c.detector][c.class] ?? 0) + 1;
  for (const d of detectors) {
    const sorted = Object.entries(out[d]).sort((x, y) => (x[0] < y[0] ? -1 : 1));
    out[d] = Object.fromEntries([...sorted, ['total', sorted.reduce((s, [, n]) => s + n, 0)]]);
  }
  return out;
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
    candidates: candidateCounts(input.candidates, input.detectors),
    detectors: input.detectors,
    options: input.options,
  };
  if (input.timing) summary.timing = input.timing;
  if (input.peakRssMb !== undefined) summary.resources = { peakRssMb: input.peakRssMb };
  return summary;
}
