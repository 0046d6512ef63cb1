/**
 * truth.csv: one row per planted body, bad row and duplicate, with the numbers a reader of
 * the files gets back (T_J from the written, rounded elements).
 */
import { writeFileSync } from 'node:fs';
import type { TruthRow } from './types.js';

export const TRUTH_COLUMNS = ['designation', 'file', 'line', 'class', 'detector', 'a_au', 'e', 'i_deg', 'T_J', 'note'] as const;

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function num(x: number, decimals: number): string {
  return Number.isFinite(x) ? x.toFixed(decimals) : '';
}

export function truthCsv(rows: readonly TruthRow[]): string {
  const lines = [TRUTH_COLUMNS.join(',')];
  for (const r of rows) {
    lines.push([
      csvField(r.designation), r.file, String(r.line), r.plantedClass, r.detector,
      num(r.aAu, 7), num(r.e, 7), num(r.iDeg, 5), num(r.tisserandJ, 4), csvField(r.note),
    ].join(','));
  }
  return lines.join('\n') + '\n';
}

export function writeTruthCsv(path: string, rows: readonly TruthRow[]): void {
  writeFileSync(path, truthCsv(rows));
}
