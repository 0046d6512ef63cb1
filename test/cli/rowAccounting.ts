/**
 * Checks a scan's row accounting against counts made without the numbers it reports
 * (summary.json derives `accepted` as read − rejected, so read = accepted + rejected holds
 * by construction and cannot catch a lost row). Not a test file itself.
 *  - rows read per input = its data lines, counted here from the file's text;
 *  - accepted = data lines − rows listed in rejects.csv (per input where names are unique);
 *  - accepted = the size of the catalogue the library builds from the same inputs, and per
 *    input the catalogue rows that name it as their source.
 * Data lines as counted in test/helpers/dataLines.ts.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parse } from 'csv-parse/sync';
import { expect } from 'vitest';
import { loadCatalogue, type LoadOptions } from '../../src/cli/loadCatalogue.js';
import { dataLineCount } from '../helpers/dataLines.js';
import { ROOT } from './cliHarness.js';

interface SummaryRows { read: number; accepted: number; rejected: number }

/**
 * Asserts that every data line of `inputs` (as given to the scan, relative to the project
 * root or absolute) is in the catalogue or in rejects.csv of the scan written to `out`.
 */
export async function expectEveryRowAccounted(out: string, inputs: readonly string[], options: LoadOptions = {}): Promise<void> {
  const summary = JSON.parse(readFileSync(resolve(out, 'summary.json'), 'utf8')) as {
    rows: SummaryRows; files: { file: string; rows: SummaryRows }[];
  };
  const rejects = parse(readFileSync(resolve(out, 'rejects.csv')), { columns: true }) as { file: string }[];
  const paths = inputs.map((p) => resolve(ROOT, p));
  const lines = paths.map(dataLineCount);
  const total = lines.reduce((s, n) => s + n, 0);

  expect(summary.files.map((f) => f.rows.read), 'rows read per input vs data lines counted in the file').toEqual(lines);
  expect(summary.rows.accepted, 'accepted vs data lines − rows in rejects.csv').toBe(total - rejects.length);
  const unique = new Set(paths).size === paths.length;
  if (unique) {
    const listed = paths.map((p) => rejects.filter((r) => resolve(ROOT, r.file) === p).length);
    expect(summary.files.map((f) => f.rows.accepted), 'accepted per input vs its data lines − its rows in rejects.csv')
      .toEqual(lines.map((n, k) => n - listed[k]));
  }

  const { catalogue } = await loadCatalogue(paths, options);
  expect(summary.rows.accepted, 'accepted vs the size of the catalogue built from the same inputs').toBe(catalogue.size);
  const kept = paths.map(() => 0);
  for (let k = 0; k < catalogue.size; k++) kept[catalogue.fileIndex[k]]++;
  expect(summary.files.map((f) => f.rows.accepted), 'accepted per input vs catalogue rows from that input').toEqual(kept);
}
