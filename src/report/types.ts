/** Types of the report layer: the run summary written to summary.json. */

export interface RowCounts {
  read: number; // data rows offered (header and blank lines excluded)
  accepted: number; // rows in the catalogue
  rejected: number; // rows set aside (see rejects.csv); read = accepted + rejected
}

export interface FileAccount {
  file: string; // as given on the command line ('-' for standard input)
  format: string; // detected or forced input format; 'unreadable' when it could not be read
  sha256: string; // of the bytes read ('' when unreadable)
  rows: RowCounts;
  skippedLines: number; // header, separator and blank lines
  // How rows were classed as asteroids or comets ('format': by the export format;
  // 'designation-pattern': CSV rows by the comet forms of src/io/bodyKind.ts; 'forced': CSV
  // rows all of the kind asked for) and how many rows read were classed each way (rows
  // rejected before they could be classed are in neither count). Absent when unreadable.
  bodyKind?: { rule: string; asteroid: number; comet: number };
  error?: string; // why the file could not be read
}

/** What one detector did: bodies screened, not screened by reason, candidates by class. */
export interface DetectorSummary {
  accepted: number; // bodies offered to it (the catalogue size); = screened + Σ notScreened
  screened: number;
  notScreened: Record<string, number>; // reason id → bodies (reasons described in report.md)
  candidates: Record<string, number>; // class → count, classes sorted, then 'total'
  boundaryCases: number; // candidates within the detector's band of doubt (included above)
  definitions: { score: string; tailFraction: string; falseAlarmProb: string };
}

export interface ScanSummary {
  tool: 'wayward';
  version: string;
  demoCatalogue: boolean; // true: no files were named and the bundled demo catalogue (invented data) was scanned
  rows: RowCounts;
  files: FileAccount[];
  rejects: {
    byKind: Record<string, number>;
    byReason: Record<string, number>; // group (kind and reason, quoted text as '…', values as '#') → rows
    examples: Record<string, string>; // group → its first row, 'FILE:LINE: REASON' as written
  };
  qualityFlags: Record<string, number>; // accepted rows carrying each flag
  detectors: Record<string, DetectorSummary>; // by id, in the order they ran
  options: Record<string, unknown>;
  timing?: Record<string, number>; // seconds per stage (omitted with --reproducible)
  resources?: { peakRssMb: number; twoThreadReadFiles?: number }; // omitted with --reproducible; files parsed on two threads
}
