/**
 * Fixture-per-file runner for line parsers: `DIR/NAME.txt` holds one input line, sibling
 * `NAME.json` the expected fields (`row`) or the expected rejection (`reject`). Fields whose
 * name ends in `JdTT` are written as ISO calendar dates (TT) and turned into Julian dates with
 * astronomy-engine (a general-purpose reference library; calendar arithmetic only, so its
 * UT/TT distinction plays no part). null stands for NaN. Not a test file itself.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { MakeTime } from 'astronomy-engine';
import { expect } from 'vitest';
import { emptyOrbitRow, InputError, type LineOutcome, type OrbitRow } from '../../src/io/index.js';

export interface LineCase {
  name: string;
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

export function loadCases(dir: URL): LineCase[] {
  const names = readdirSync(dir).filter((f) => f.endsWith('.json')).map((f) => f.slice(0, -5)).sort();
  return names.map((name) => {
    const json = JSON.parse(readFileSync(new URL(`${name}.json`, dir), 'utf8'));
    const line = readFileSync(new URL(`${name}.txt`, dir), 'latin1').replace(/\r?\n$/, '');
    return { name, line, ...json };
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
      parse(c.line, row, `${c.name}.txt`, 1);
    } catch (err) {
      caught = err;
    }
    expect(caught, c.name).toBeInstanceOf(InputError);
    const e = caught as InputError;
    expect(e.reason).toBe(c.reject.reason);
    expect(e.column).toBe(c.reject.column);
    expect(e.message).toBe(`${c.name}.txt:1:${c.reject.column}: ${c.reject.reason}`);
    return;
  }
  expect(parse(c.line, row, `${c.name}.txt`, 1)).toBe('row');
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
