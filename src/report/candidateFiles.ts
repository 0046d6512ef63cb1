/**
 * candidates.jsonl and candidates.csv: one row per (body, detector), in rank order, with the
 * common fields first and the detector's own numbers after. Streamed through atomic writers.
 */
import type { Catalogue } from '../clean/types.js';
import type { Candidate } from '../detect/types.js';
import { AtomicFileWriter } from './atomicWrite.js';
import { csvRecord } from './csvField.js';
import { ORBIT_QUALITY_COLUMNS, orbitQuality } from './orbitQuality.js';

const orNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** JSON-ready record of one candidate (fixed key order; NaN as null). */
export function candidateRecord(c: Candidate, rank: number, cat: Catalogue): Record<string, unknown> {
  return {
    rank,
    designation: c.designation,
    detector: c.detector,
    class: c.class,
    boundary: c.boundary,
    score: c.score,
    tailFraction: orNull(c.tailFraction),
    tailPopulation: c.tailPopulation,
    falseAlarmProb: orNull(c.falseAlarmProb),
    flags: c.flags,
    orbitQuality: orbitQuality(cat, c.index),
    why: c.why,
    source: { file: cat.files[cat.fileIndex[c.index]], line: cat.source[c.index] },
    details: c.details,
  };
}

/** Write candidates.jsonl (candidates already ranked). */
export async function writeCandidatesJsonl(path: string, ranked: readonly Candidate[], cat: Catalogue): Promise<void> {
  const w = new AtomicFileWriter(path);
  try {
    for (let k = 0; k < ranked.length; k++) {
      await w.write(JSON.stringify(candidateRecord(ranked[k], k + 1, cat)) + '\n');
    }
    await w.commit();
  } catch (err) {
    await w.abort();
    throw err;
  }
}

/** Union of detail keys in order of first appearance. */
function detailColumns(ranked: readonly Candidate[]): string[] {
  const seen = new Set<string>();
  for (const c of ranked) for (const key of Object.keys(c.details)) seen.add(key);
  return [...seen];
}

/** Write candidates.csv (candidates already ranked). */
export async function writeCandidatesCsv(path: string, ranked: readonly Candidate[], cat: Catalogue): Promise<void> {
  const details = detailColumns(ranked);
  const w = new AtomicFileWriter(path);
  try {
    const head = [
      'rank', 'designation', 'detector', 'class', 'boundary', 'score', 'tail_fraction', 'tail_population',
      'false_alarm_prob', 'flags', ...ORBIT_QUALITY_COLUMNS.map(([, name]) => name), 'why', 'source_file', 'source_line',
    ];
    await w.write(csvRecord([...head, ...details]) + '\n');
    for (let k = 0; k < ranked.length; k++) {
      const c = ranked[k];
      const q = orbitQuality(cat, c.index);
      const fields: (string | number)[] = [
        k + 1, c.designation, c.detector, c.class, String(c.boundary), c.score, c.tailFraction, c.tailPopulation,
        c.falseAlarmProb, c.flags.join(';'), ...ORBIT_QUALITY_COLUMNS.map(([key]) => q[key] ?? NaN), c.why,
        cat.files[cat.fileIndex[c.index]], cat.source[c.index],
      ];
      for (const key of details) fields.push(c.details[key] ?? '');
      await w.write(csvRecord(fields) + '\n');
    }
    await w.commit();
  } catch (err) {
    await w.abort();
    throw err;
  }
}
