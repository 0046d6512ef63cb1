/**
 * The demo's planted co-orbitals as the generator recorded them (data/demo/coorbital-truth.csv:
 * the N-body state now, the prediction, captures, written by scripts/make-demo.ts from the
 * detector's own stages), and a small orbit file holding only some of them, so a test can run
 * the detector for the outer planets without integrating the whole natural population.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { ROOT, tempDir } from './cliHarness.js';

export interface CoorbitalTruth {
  designation: string; line: string; planet: string; planted_as: string; state_now: string; predicted: string;
  agree: string; disagreement_reason: string; phi_deg: string; temporary_capture: string; captures: string;
}

export const coorbitalTruth = parse(readFileSync(join(ROOT, 'data/demo/coorbital-truth.csv')), { columns: true }) as CoorbitalTruth[];

/** A copy of data/demo/orbits.txt with its header and only the rows of `bodies`; returns its path. */
export function demoSubsetFile(bodies: readonly CoorbitalTruth[]): string {
  const lines = readFileSync(join(ROOT, 'data/demo/orbits.txt'), 'latin1').split('\n');
  const header = lines.slice(0, lines.findIndex((l) => /^-{5,}\s*$/.test(l)) + 1);
  const path = join(tempDir(), 'subset.txt');
  writeFileSync(path, [...header, ...bodies.map((b) => lines[Number(b.line) - 1])].join('\n') + '\n', 'latin1');
  return path;
}
