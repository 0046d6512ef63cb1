/**
 * Joins observations to the observatory-code table, so that the fit gets only observations
 * whose observer it can place: an observation at a fixed site ('optical') needs its station
 * in the table with a fixed site; a space-based or roving observation carries its own
 * position and needs no table entry. Anything else is rejected with its reason (file and
 * line of the record, the station code as the offending text); nothing is dropped silently.
 */
import { InputError } from '../types.js';
import type { ObservatoryTable } from './observatoryCodes.js';
import type { AstrometryObservation } from './types.js';

export interface StationCheck {
  placed: AstrometryObservation[]; // in input order
  rejected: InputError[];
  unknownStations: string[]; // codes not in the table, sorted, each once
}

/** Splits `observations` into those whose observer can be placed and the rest (see the file comment). */
export function checkStations(observations: readonly AstrometryObservation[], table: ObservatoryTable): StationCheck {
  const placed: AstrometryObservation[] = [];
  const rejected: InputError[] = [];
  const unknown = new Set<string>();
  const tableName = table.file === '' ? 'the built-in table (500 only; give an observatory-code table)' : `the observatory-code table ${table.file}`;
  for (const o of observations) {
    if (o.kind !== 'optical') {
      placed.push(o);
      continue;
    }
    const site = table.sites.get(o.station);
    if (site === undefined) {
      unknown.add(o.station);
      rejected.push(new InputError(o.file, o.line, 0, `observatory code ${o.station} is not in ${tableName}`, o.station));
    } else if (!site.fixedSite) {
      rejected.push(new InputError(o.file, o.line, 0, `observatory code ${o.station} (${site.name}) has no fixed site and the record gives no observer position`, o.station));
    } else {
      placed.push(o);
    }
  }
  return { placed, rejected, unknownStations: [...unknown].sort() };
}
