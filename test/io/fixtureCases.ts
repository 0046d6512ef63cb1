/**
 * Fixture-per-file runner for line parsers: `DIR/NAME.txt` holds one input line, sibling
 * `NAME.json` the expected fields (`row`) or the expected rejection (`reject`). Either file
 * may instead be stored gzip-compressed as `NAME.txt.gz` / `NAME.json.gz` (real lines whose
 * text must stay byte for byte); it is read through node:zlib gunzipSync. Fields whose
 * name ends in `JdTT` are written as ISO calendar dates (TT) and turned into Julian dates with
 * astronomy-engine (a general-purpose reference library; calendar arithmetic only, so its
 * UT/TT distinction plays no part). null stands for NaN. Not a test file itself.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { gunzipSync } from 'node:zlib';
import { MakeTime } from 'astronomy-engine';
import { expect } from 'vitest';
import { emptyOrbitRow, InputError, type LineOutcome, type OrbitRow } from '../../src/io/index.js';

export interface LineCase {
  name: string;
  file: string; // the line's file name as stored: NAME.txt or NAME.txt.gz
  line: string;
  source: string;
  row?: Record<string, number | string | null>;
  reject?: { column: number; reason: string };
  tolerances?: Record<string, number>;
}

/** Julian date of an ISO calendar date-time, through astronomy-engine. */
export function isoToJd(iso: string): number {
  const text = iso.length === 10 ? `${iso}T00:00:00Z` : `${iso}Z`;
  return MakeTime(new Date(text)).ut + 2_451_545.0;
}

/**
 * Bytes of a fixture file; a name ending in `.gz` is gunzipped (gunzipSync throws on
 * anything that is not gzip data, so a mislabelled file fails loudly).
 */
export function readFixtureBytes(url: URL): Buffer {
  const raw = readFileSync(url);
  return url.pathname.endsWith('.gz') ? gunzipSync(raw) : raw;
}

/** Text of a fixture file (plain or `.gz`), decoded as latin1 so every byte maps to one char. */
export function readFixtureText(url: URL): string {
  return readFixtureBytes(url).toString('latin1');
}

/** The one stored form of `NAME.EXT` in `files`: plain or `.gz`, never both, never neither. */
function storedName(files: ReadonlySet<string>, dir: URL, name: string, ext: string): string {
  const plain = `${name}.${ext}`;
  const gz = `${plain}.gz`;
  if (files.has(plain) && files.has(gz)) throw new Error(`fixture ${dir.pathname}: both ${plain} and ${gz}; keep one`);
  if (files.has(plain)) return plain;
  if (files.has(gz)) return gz;
  throw new Error(`fixture ${dir.pathname}: ${name} has no ${plain} or ${gz}`);
}

export function loadCases(dir: URL): LineCase[] {
  const files = new Set(readdirSync(dir));
  const caseName = (f: string, ext: string): string | undefined =>
    f.endsWith(`.${ext}`) ? f.slice(0, -ext.length - 1) : f.endsWith(`.${ext}.gz`) ? f.slice(0, -ext.length - 4) : undefined;
  const names = [...new Set([...files].map((f) => caseName(f, 'json')).filter((n): n is string => n !== undefined))].sort();
  // a line file without expectations would be silently skipped: refuse it
  for (const f of files) {
    const n = caseName(f, 'txt');
    if (n !== undefined && !names.includes(n)) throw new Error(`fixture ${dir.pathname}: ${f} has no ${n}.json or ${n}.json.gz`);
  }
  return names.map((name) => {
    const json = JSON.parse(readFixtureBytes(new URL(storedName(files, dir, name, 'json'), dir)).toString('utf8'));
    const file = storedName(files, dir, name, 'txt');
    const line = readFixtureText(new URL(file, dir)).replace(/\r?\n$/, '');
    return { name, file, line, ...json };
  });
}

type Parser = (line: string, row: OrbitRow, file: string, lineNo: number) => LineOutcome;

/**
 * Runs one case; returns the worst absolute difference per field seen, for printing.
 * Default tolerance 1e-12 relative: numbers read from text must come out as the same double.
 */
export function runCase(c: LineCase, parse: Parser, worst: Map<string, number>): void {
  const row = emptyOrbitRow();
  if (c.reject) {
    let caught: unknown;
    try {
      parse(c.line, row, c.file, 1);
    } catch (err) {
      caught = err;
    }
    expect(caught, c.name).toBeInstanceOf(InputError);
    const e = caught as InputError;
    expect(e.reason).toBe(c.reject.reason);
    expect(e.column).toBe(c.reject.column);
    expect(e.message).toBe(`${c.file}:1:${c.reject.column}: ${c.reject.reason}`);
    return;
  }
  expect(parse(c.line, row, c.file, 1)).toBe('row');
  for (const [field, want] of Object.entries(c.row ?? {})) {
    const got = (row as unknown as Record<string, unknown>)[field];
    if (typeof want === 'string' && !field.endsWith('JdTT')) {
      expect(got, `${c.name}.${field}`).toBe(want);
      continue;
    }
    if (want === null) {
      expect(Number.isNaN(got), `${c.name}.${field} should be NaN, is ${got}`).toBe(true);
      continue;
    }
    const expected = typeof want === 'string' ? isoToJd(want) : want;
    const diff = Math.abs((got as number) - expected);
    // dates: the fixtures write times to the millisecond and a JD near 2.46e6 resolves
    // ~4e-10 day, so 1e-6 day (0.09 s) is loose only against rounding, not against a
    // wrong day or hour; other numbers must be the same double (1e-12 relative)
    const tol = c.tolerances?.[field] ?? (field.endsWith('JdTT') ? 1e-6 : 1e-12 * Math.max(1, Math.abs(expected)));
    worst.set(field, Math.max(worst.get(field) ?? 0, diff));
    expect(diff, `${c.name}.${field}: got ${got}, want ${expected}`).toBeLessThanOrEqual(tol);
  }
}
