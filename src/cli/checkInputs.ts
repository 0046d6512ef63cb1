/**
 * The inputs of `wayward check`: the astrometry file read and split (the designation's
 * records, the ones set aside with file:line and reason, the other designations counted), the
 * observatory-code table, and the start from a designation's row of an orbit dump. Whole-file
 * problems and "nothing to fit" are CheckInputError (exit 1) naming the file.
 */
import { RAD_PER_DEG } from '../core/constants.js';
import type { OrbitElements } from '../core/propagate/propagateOrbit.js';
import { selectBody } from '../fit/check/index.js';
import { jdTTToTDB } from '../fit/observerPosition.js';
import type { OrbitFitStart } from '../fit/orbitFitTypes.js';
import { builtinObservatoryTable, checkStations, readAstrometryFile, readObservatoryCodes } from '../io/astrometry/index.js';
import type { ObservatoryTable } from '../io/astrometry/observatoryCodes.js';
import type { AstrometryObservation } from '../io/astrometry/types.js';
import { readOrbitFile } from '../io/readOrbitFile.js';
import type { OrbitRow } from '../io/types.js';
import type { CheckInputAccount, CheckSetAsideRecord } from '../report/checkTypes.js';

/** Nothing of the designation can be fitted, or a named input lacks what was asked of it: exit 1. */
export class CheckInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CheckInputError';
  }
}

export interface CheckInputs {
  observations: AstrometryObservation[];
  table: ObservatoryTable;
  start: OrbitFitStart;
  account: CheckInputAccount;
}

/** JD (UTC) of 0h UTC after the day of a Unix time in ms: JD 2440587.5 is 1970 January 1.0 (common practice; leap seconds do not move a day). */
export function endOfUtcDayJd(unixMs: number): number {
  return Math.floor(2440587.5 + unixMs / 86_400_000 - 0.5) + 1.5;
}

/** The designation's row of an orbit dump as fitOrbit's elements start, and its H. */
async function elementsStart(file: string, designation: string, matches: (row: OrbitRow) => boolean): Promise<{ start: OrbitFitStart; line: number; H: number }> {
  let found: { row: OrbitRow; line: number } | null = null;
  await readOrbitFile(file, {}, (row, line) => {
    if (found === null && matches(row)) found = { row: { ...row }, line };
  }, () => undefined);
  if (found === null) throw new CheckInputError(`${file}: no row of ${designation} in the orbit file`);
  const { row, line } = found as { row: OrbitRow; line: number };
  const angles = { iRad: row.iDeg * RAD_PER_DEG, nodeRad: row.nodeDeg * RAD_PER_DEG, periRad: row.periDeg * RAD_PER_DEG };
  const epochJdTDB = jdTTToTDB(row.epochJdTT);
  let elements: OrbitElements;
  if (Number.isFinite(row.aAu) && Number.isFinite(row.meanAnomalyDeg)) {
    elements = { form: 'semimajor', aAu: row.aAu, e: row.e, ...angles, meanAnomalyRad: row.meanAnomalyDeg * RAD_PER_DEG, epochJdTDB };
  } else if (Number.isFinite(row.qAu) && Number.isFinite(row.tpJdTT)) {
    elements = { form: 'perihelion', qAu: row.qAu, e: row.e, ...angles, tpJdTDB: jdTTToTDB(row.tpJdTT), epochJdTDB: Number.isFinite(epochJdTDB) ? epochJdTDB : jdTTToTDB(row.tpJdTT) };
  } else {
    throw new CheckInputError(`${file}:${line}: the row of ${designation} gives neither a and M nor q and the perihelion time`);
  }
  return { start: { kind: 'elements', elements }, line, H: row.H };
}

/** Reads and splits the inputs (see the file comment). */
export async function readCheckInputs(designation: string, obsFile: string, obscodesFile: string | undefined,
  elementsFile: string | undefined, notAfterJdUtc: number): Promise<CheckInputs> {
  const table = obscodesFile === undefined ? builtinObservatoryTable() : await readObservatoryCodes(obscodesFile);
  const read = await readAstrometryFile(obsFile);
  const selection = selectBody(read.observations, designation, notAfterJdUtc);
  const ofBody = selection.observations.length + selection.setAside.length;
  if (ofBody === 0) {
    const held = read.observations.length === 0 ? 'no observations' : `observations of ${selection.others.map((o) => `${o.designation} (${o.observations})`).join(', ')}`;
    throw new CheckInputError(`${obsFile}: no observations of ${designation}; the file holds ${held}${read.rejected.length > 0 ? ` and ${read.rejected.length} unreadable lines` : ''}`);
  }
  const stations = checkStations(selection.observations, table);
  const byLine = new Map(read.observations.map((o) => [o.line, o]));
  const setAside: CheckSetAsideRecord[] = [...stations.rejected, ...selection.setAside]
    .map((e) => ({ observation: byLine.get(e.line)!, reason: e.reason }))
    .sort((a, b) => a.observation.line - b.observation.line);
  if (stations.placed.length === 0) {
    const reasons = [...new Set(setAside.map((s) => s.reason))].join('; ');
    throw new CheckInputError(`${obsFile}: none of the ${ofBody} observations of ${designation} can be fitted: ${reasons}`);
  }
  let start: OrbitFitStart = { kind: 'gauss' };
  let startText = 'Gauss’s method on three of the observations';
  let absMagH = NaN;
  if (elementsFile !== undefined) {
    const names = new Set(stations.placed.flatMap((o) => [o.designation, o.provisional, o.packed]).filter((s) => s !== ''));
    const num = stations.placed.find((o) => Number.isFinite(o.number))?.number ?? NaN;
    const el = await elementsStart(elementsFile, designation, (row) => names.has(row.designation) || names.has(row.packedDesignation) || row.number === num);
    start = el.start;
    startText = `elements row ${elementsFile}:${el.line}`;
    absMagH = el.H;
  }
  return {
    observations: stations.placed, table, start,
    account: {
      file: obsFile, format: read.format, linesRead: read.linesRead, observationsRead: read.observations.length, unreadable: read.rejected,
      others: selection.others, setAside, obscodes: table.file, start: startText, absMagH,
    },
  };
}
