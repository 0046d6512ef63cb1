/**
 * The published family list in the JSON form bundled in data/families/ (provenance there): an
 * object with `families`, an array of records holding family_id, family_name, cutoff_ms,
 * n_members, proper-element ranges a_min_au … i_max_deg and a flag. Each record is checked; a
 * malformed one is an UnreadableInputError naming the file and the record (JSON has no useful
 * line here: the record's position and family id are given instead). Records the list itself
 * marks as not usable for naming clusters are set aside with the reason, never dropped
 * silently: flag 'N' with no cutoff (e.g. a one-member entry), or the list's placeholders for
 * missing values (negative ranges, −0.9999 and −9.99, and an empty name).
 */
import { readFileSync } from 'node:fs';
import { UnreadableInputError } from './errors.js';

export interface PublishedFamily {
  id: number; // the list's family_id
  name: string;
  flag: string; // the list's flag ('-' or 'N')
  cutoffMs: number; // velocity cutoff of its identification, m/s
  members: number; // published member count
  aMinAu: number; aMaxAu: number; // proper semimajor axis range
  eMin: number; eMax: number; // proper eccentricity range
  iMinDeg: number; iMaxDeg: number; // proper inclination range, degrees
}

const NUMBER_FIELDS = ['family_id', 'cutoff_ms', 'n_members', 'a_min_au', 'a_max_au', 'e_min', 'e_max', 'i_min_deg', 'i_max_deg'] as const;

/** A record the list holds but that cannot name a cluster, and why. */
export interface SetAsideFamily {
  id: number;
  name: string;
  reason: string;
}

export interface PublishedFamilyList {
  families: PublishedFamily[];
  setAside: SetAsideFamily[];
}

/** Why a well-formed record cannot name a cluster, or ''. */
function unusable(f: PublishedFamily): string {
  if (f.aMinAu < 0 || f.eMin < 0 || f.iMinDeg < 0) return 'placeholder values instead of ranges';
  if (f.name === '') return 'no name';
  if (f.cutoffMs <= 0) return `no velocity cutoff (flag ${f.flag}, ${f.members} member${f.members === 1 ? '' : 's'})`;
  return '';
}

function familyOf(rec: unknown, k: number, file: string): PublishedFamily {
  if (typeof rec !== 'object' || rec === null) throw new UnreadableInputError(file, `family record ${k + 1} is not an object`);
  const r = rec as Record<string, unknown>;
  const where = `family record ${k + 1}${typeof r.family_id === 'number' ? ` (family_id ${r.family_id})` : ''}`;
  for (const f of NUMBER_FIELDS) {
    if (typeof r[f] !== 'number' || !Number.isFinite(r[f])) throw new UnreadableInputError(file, `${where}: ${f} is not a number`);
  }
  if (typeof r.family_name !== 'string') throw new UnreadableInputError(file, `${where}: family_name is not text`);
  const fam: PublishedFamily = {
    id: r.family_id as number, name: r.family_name.trim(), flag: typeof r.flag === 'string' ? r.flag : '', cutoffMs: r.cutoff_ms as number, members: r.n_members as number,
    aMinAu: r.a_min_au as number, aMaxAu: r.a_max_au as number, eMin: r.e_min as number, eMax: r.e_max as number,
    iMinDeg: r.i_min_deg as number, iMaxDeg: r.i_max_deg as number,
  };
  if (!(fam.aMinAu <= fam.aMaxAu && fam.eMin <= fam.eMax && fam.iMinDeg <= fam.iMaxDeg) && unusable(fam) === '') {
    throw new UnreadableInputError(file, `${where}: a range with its minimum above its maximum`);
  }
  return fam;
}

/** Parses the list's text; `file` names it in errors. */
export function parsePublishedFamilies(text: string, file: string): PublishedFamilyList {
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (err) {
    throw new UnreadableInputError(file, `not JSON: ${(err as Error).message}`);
  }
  const list = (doc as { families?: unknown } | null)?.families;
  if (!Array.isArray(list)) throw new UnreadableInputError(file, 'no "families" array');
  const families = list.map((rec, k) => familyOf(rec, k, file));
  const seen = new Set<number>();
  for (const f of families) {
    if (seen.has(f.id)) throw new UnreadableInputError(file, `family_id ${f.id} appears twice`);
    seen.add(f.id);
  }
  const out: PublishedFamilyList = { families: [], setAside: [] };
  for (const f of families) {
    const why = unusable(f);
    if (why === '') out.families.push(f);
    else out.setAside.push({ id: f.id, name: f.name, reason: why });
  }
  return out;
}

export function readPublishedFamilies(path: string): PublishedFamilyList {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch (err) {
    throw new UnreadableInputError(path, (err as NodeJS.ErrnoException).code === 'ENOENT' ? 'no such file' : (err as Error).message);
  }
  return parsePublishedFamilies(text, path);
}
