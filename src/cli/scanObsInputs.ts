/**
 * `scan --obs DIR`: every regular file of DIR (not its subdirectories), in name order, read
 * by the astrometry readers (80-column records or ADES PSV, detected from the content); the
 * observations grouped by designation across the files (a provisional designation given beside
 * a number joins the number's group, as within one file: astrometryDesignations.ts); each group
 * matched to a catalogue row as `propagate` finds a body (clean/bodyLookup.ts: number or
 * designation, packed or readable, any case); its records selected as `check` selects them
 * (bodySelection.ts: dates before 1800 or after --not-after, one station's instant twice) and
 * placed by the observatory-code table (observationStations.ts).
 *
 * Nothing is dropped silently: unreadable lines, records set aside and records given again in
 * a later file (the same station less than REPEAT_DAYS apart: the 80-column and the ADES form
 * of one observation differ in their time by the rounding of either) become rejects with file,
 * line and reason; a file with no astrometry record is named with the reason; designations not
 * in the catalogue are counted and named. A directory that cannot be listed, holds no file, or
 * no file of which holds a record is an ObsInputError (exit 1).
 */
import { readdir, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { findBodies } from '../clean/bodyLookup.js';
import type { Catalogue, Reject, RejectKind } from '../clean/types.js';
import type { NongravBody } from '../detect/nongravOptions.js';
import { selectBody } from '../fit/check/index.js';
import { builtinObservatoryTable, checkStations, readAstrometryFile, readObservatoryCodes } from '../io/astrometry/index.js';
import type { ObservatoryTable } from '../io/astrometry/observatoryCodes.js';
import type { AstrometryObservation } from '../io/astrometry/types.js';
import { InputError } from '../io/types.js';

/** Two records of one station closer than this in time are one observation given twice: 1e-5 day = 0.86 s, shorter than any exposure (our choice). */
export const REPEAT_DAYS = 1e-5;

/** --obs DIR cannot be used at all: exit 1, nothing written. */
export class ObsInputError extends Error {
  constructor(message: string, readonly lines: string[] = []) {
    super(message);
    this.name = 'ObsInputError';
  }
}

export interface ObsFileRead {
  file: string;
  format: string; // 'obs80' | 'ades-psv'
  linesRead: number;
  observations: number;
  rejectedLines: number;
}

/** The astrometry of DIR, read and grouped, before it meets the catalogue. */
export interface ObsDirRead {
  dir: string;
  obscodes: string; // the table's file; '' for the built-in one
  table: ObservatoryTable;
  files: ObsFileRead[];
  notAstrometry: { file: string; reason: string }[];
  groups: { designation: string; first: { file: string; line: number }; observations: AstrometryObservation[]; setAside: InputError[] }[]; // in order of first appearance
  rejects: Reject[]; // unreadable lines (parse) and, after matching, records set aside
}

export interface ObsMatch {
  bodies: NongravBody[]; // in catalogue order
  unmatched: { designation: string; observations: number; file: string; line: number }[];
  setAside: number; // records of matched bodies set aside (dates, repeats, stations)
  warnings: string[];
}

function rejectOf(e: InputError, kind: RejectKind): Reject {
  return { kind, file: e.file, line: e.line, reason: e.reason, text: e.text };
}

/** Regular files of `dir`, by name. */
async function filesOf(dir: string): Promise<string[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).sort();
  } catch (err) {
    const code = (err as { code?: string }).code;
    const why = code === 'ENOENT' ? 'no such directory' : code === 'ENOTDIR' ? 'not a directory' : `cannot be listed (${code ?? (err as Error).message})`;
    throw new ObsInputError(`--obs ${dir}: ${why}`);
  }
  const files: string[] = [];
  for (const name of names) {
    const path = join(dir, name);
    if ((await stat(path).catch(() => null))?.isFile()) files.push(path);
  }
  if (files.length === 0) throw new ObsInputError(`--obs ${dir}: the directory holds no files; nothing to check`);
  return files;
}

/** Sets aside, in place, records given again in a later file (see the file comment). */
function setAsideRepeats(obs: AstrometryObservation[], setAside: InputError[]): AstrometryObservation[] {
  const seen = new Map<string, AstrometryObservation[]>(); // station|time bin → records kept
  const kept: AstrometryObservation[] = [];
  for (const o of obs) {
    const bin = Math.floor(o.timeJdUtc / REPEAT_DAYS);
    const near = [bin - 1, bin, bin + 1].flatMap((b) => seen.get(`${o.station}|${b}`) ?? [])
      .find((p) => p.file !== o.file && Math.abs(p.timeJdUtc - o.timeJdUtc) < REPEAT_DAYS);
    if (near !== undefined) {
      setAside.push(new InputError(o.file, o.line, 0, `the observation of ${near.file}:${near.line} given again (station ${o.station}, the same instant within ${REPEAT_DAYS} day)`, o.designation));
      continue;
    }
    const key = `${o.station}|${bin}`;
    const list = seen.get(key);
    if (list) list.push(o);
    else seen.set(key, [o]);
    kept.push(o);
  }
  return kept;
}

/** Reads DIR and the observatory-code table (see the file comment). */
export async function readObsDir(dir: string, obscodesFile: string | undefined, notAfterJdUtc: number): Promise<ObsDirRead> {
  let table: ObservatoryTable;
  try {
    table = obscodesFile === undefined ? builtinObservatoryTable() : await readObservatoryCodes(obscodesFile);
  } catch (err) {
    throw new ObsInputError(`--obscodes ${(err as Error).message}`);
  }
  const files: ObsFileRead[] = [];
  const notAstrometry: { file: string; reason: string }[] = [];
  const rejects: Reject[] = [];
  const all: AstrometryObservation[] = [];
  for (const path of await filesOf(dir)) {
    let read;
    try {
      read = await readAstrometryFile(path);
    } catch (err) {
      notAstrometry.push({ file: path, reason: (err as Error).message.replace(`${path}: `, '') });
      continue;
    }
    if (read.observations.length === 0) {
      const first = read.rejected[0];
      notAstrometry.push({ file: path, reason: read.linesRead === 0 ? 'no data lines' : `none of its ${read.linesRead} data lines is an astrometry record (line ${first.line}: ${first.reason})` });
      continue;
    }
    files.push({ file: path, format: read.format, linesRead: read.linesRead, observations: read.observations.length, rejectedLines: read.rejected.length });
    for (const e of read.rejected) rejects.push(rejectOf(e, 'parse'));
    for (const o of read.observations) all.push(o);
  }
  if (files.length === 0) {
    throw new ObsInputError(`--obs ${dir}: no file of the directory holds an astrometry record (80-column or ADES PSV)`, notAstrometry.map((n) => `${n.file}: ${n.reason}`));
  }
  return { dir, obscodes: table.file, table, files, notAstrometry, groups: groupsOf(all, notAfterJdUtc), rejects };
}

/** The observations by designation, each group's records selected as check selects them. */
function groupsOf(all: readonly AstrometryObservation[], notAfterJdUtc: number): ObsDirRead['groups'] {
  const alias = new Map<string, string>(); // provisional → numbered designation
  for (const o of all) if (o.provisional !== '' && o.provisional !== o.designation && !alias.has(o.provisional)) alias.set(o.provisional, o.designation);
  const byKey = new Map<string, AstrometryObservation[]>();
  for (const o of all) {
    const key = alias.get(o.designation) ?? o.designation;
    const list = byKey.get(key);
    if (list) list.push(o);
    else byKey.set(key, [o]);
  }
  return [...byKey].map(([designation, obs]) => {
    const setAside: InputError[] = [];
    const unrepeated = setAsideRepeats(obs, setAside);
    const selection = selectBody(unrepeated, designation, notAfterJdUtc);
    return { designation, first: { file: obs[0].file, line: obs[0].line }, observations: selection.observations, setAside: [...setAside, ...selection.setAside] };
  });
}

/** Matches the groups to catalogue rows and places their records (see the file comment). */
export function matchObsToCatalogue(read: ObsDirRead, cat: Catalogue): ObsMatch {
  const matches = findBodies(cat, read.groups.map((g) => g.designation));
  const byRow = new Map<number, AstrometryObservation[]>();
  const unmatched: ObsMatch['unmatched'] = [];
  const warnings: string[] = [];
  let setAside = 0;
  read.groups.forEach((g, j) => {
    const m = matches[j];
    const all = g.observations.length + g.setAside.length;
    if (m.by !== 'number' && m.by !== 'designation') {
      unmatched.push({ designation: g.designation, observations: all, ...g.first });
      warnings.push(`${g.first.file}:${g.first.line}: ${g.designation} (${all} observation${all === 1 ? '' : 's'}) is not in the catalogue; not checked`);
      return;
    }
    const stations = checkStations(g.observations, read.table);
    for (const e of g.setAside) read.rejects.push(rejectOf(e, e.reason.includes('given again') || e.reason.startsWith('duplicate') ? 'duplicate' : 'invalid'));
    for (const e of stations.rejected) read.rejects.push(rejectOf(e, 'invalid'));
    const n = g.setAside.length + stations.rejected.length;
    setAside += n;
    if (n > 0) warnings.push(`${g.designation}: ${n} of its ${all} records set aside (${summariseReasons([...g.setAside, ...stations.rejected])})`);
    const row = m.rows[0];
    const list = byRow.get(row);
    if (list) list.push(...stations.placed);
    else byRow.set(row, [...stations.placed]);
  });
  const bodies = [...byRow].sort((a, b) => a[0] - b[0]).map(([index, observations]) => ({ index, observations }));
  return { bodies, unmatched, setAside, warnings };
}

/** 'given again in another file 480, observatory code … 3': reasons with their counts, the text after a colon or parenthesis dropped. */
function summariseReasons(errors: readonly InputError[]): string {
  const counts = new Map<string, number>();
  for (const e of errors) {
    const kind = e.reason.includes('given again') ? 'given again in another file'
      : e.reason.startsWith('duplicate') ? 'the same station and instant twice in one file'
        : e.reason.startsWith('observatory code') ? `station ${e.text} not placed`
          : e.reason.startsWith('date') ? 'date out of range' : e.reason;
    counts.set(kind, (counts.get(kind) ?? 0) + 1);
  }
  return [...counts].map(([k, n]) => `${k}: ${n}`).join(', ');
}
