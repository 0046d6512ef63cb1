/**
 * The body `wayward propagate` carries: found in catalogue files by what the user typed
 * (src/clean/bodyLookup.ts), with its elements and what is known of its orbit's quality, or
 * the elements given on the command line.
 */
import { DEG_PER_RAD } from '../core/constants.js';
import { Instant } from '../core/time/time.js';
import { bodyLabel, findBodies, nearMatches, type MatchKind } from '../clean/bodyLookup.js';
import { poorOrbitFlags, qualityUnknown } from '../clean/poorOrbit.js';
import { bodyName, KIND_COMET, qualityNames, type Catalogue, type QualityFlag } from '../clean/types.js';
import { loadCatalogue } from './loadCatalogue.js';
import type { ElementsSpec } from './propagateInput.js';

/** The input does not hold what was asked for, or cannot be read (exit code 1). */
export class PropagateInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PropagateInputError';
  }
}

/** The body propagated and what is known of its orbit's quality. */
export interface BodyInfo {
  label: string; // designation (and name), or 'elements from the command line'
  designation: string; // '' for command-line elements
  name: string; // '' when none
  kind: 'asteroid' | 'comet' | 'unknown'; // unknown for command-line elements
  source: string; // 'file:line' or 'command line'
  matchedBy: MatchKind | null; // null for command-line elements
  quality: { flags: QualityFlag[]; poor: QualityFlag[]; unknown: boolean; uncertainty: number; nObs: number; arcDays: number } | null;
}

/** At most this many bodies are listed when a name is shared (near spellings: 5). */
const LISTED = 10;

/** The one row `query` names in `cat`, or a PropagateInputError listing the shared or near ones. */
function findRow(cat: Catalogue, query: string, files: string[]): { row: number; by: MatchKind } {
  const where = `${files.join(', ')} (${cat.size} bodies accepted)`;
  const m = findBodies(cat, [query])[0];
  if (m.rows.length === 1) return { row: m.rows[0], by: m.by };
  if (m.rows.length > 1) {
    const more = m.rows.length > LISTED ? `, and ${m.rows.length - LISTED} more` : '';
    throw new PropagateInputError(`'${query}' matches ${m.rows.length} bodies by ${m.by} in ${where}: `
      + `${m.rows.slice(0, LISTED).map((r) => bodyLabel(cat, r)).join('; ')}${more}; give one designation or number`);
  }
  const near = nearMatches(cat, query, 5);
  const hint = near.length > 0
    ? `; nearest: ${near.map((n) => bodyLabel(cat, n.row)).join('; ')}`
    : '; no number, designation or name is within 3 edits of it';
  throw new PropagateInputError(`'${query}' is not a number, designation or name in ${where}${hint}`);
}

/** Elements and description of the body `query` names in the catalogue files. */
export async function bodyFromCatalogue(query: string, files: string[]): Promise<{ body: BodyInfo; el: ElementsSpec }> {
  const loaded = await loadCatalogue(files);
  if (loaded.errors.length > 0) throw new PropagateInputError(loaded.errors.map((e) => e.message).join('; '));
  const cat = loaded.catalogue;
  const { row: k, by } = findRow(cat, query, files);
  const tt = (jd: number) => Instant.fromJd(jd, 'TT'); // catalogue epochs are TT
  const common = {
    e: cat.e[k], iDeg: cat.i[k] * DEG_PER_RAD, nodeDeg: cat.node[k] * DEG_PER_RAD, periDeg: cat.peri[k] * DEG_PER_RAD,
    epoch: tt(cat.epochJdTT[k]),
  };
  const el: ElementsSpec = Number.isFinite(cat.meanAnomaly[k]) && Number.isFinite(cat.a[k])
    ? { form: 'semimajor', aAu: cat.a[k], meanAnomalyDeg: cat.meanAnomaly[k] * DEG_PER_RAD, ...common }
    : { form: 'perihelion', qAu: cat.q[k], tp: tt(cat.tpJdTT[k]), ...common };
  const word = cat.quality[k];
  const body: BodyInfo = {
    label: bodyLabel(cat, k), designation: cat.designation[k], name: bodyName(cat, k),
    kind: cat.kind[k] === KIND_COMET ? 'comet' : 'asteroid',
    source: `${cat.files[cat.fileIndex[k]]}:${cat.source[k]}`, matchedBy: by,
    quality: {
      flags: qualityNames(word), poor: poorOrbitFlags(word), unknown: qualityUnknown(word),
      uncertainty: cat.uncertainty[k], nObs: cat.nObs[k], arcDays: cat.arcDays[k],
    },
  };
  return { body, el };
}

export const COMMAND_LINE_BODY: BodyInfo = {
  label: 'elements from the command line', designation: '', name: '', kind: 'unknown', source: 'command line',
  matchedBy: null, quality: null,
};
