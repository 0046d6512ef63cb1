/**
 * The observations of one designation in an astrometry file, and the ones of them a fit cannot
 * use for a reason of the selection's own: a date before 1800 or after the latest date accepted
 * (the run's date by default: a future date is a typo in the year, most often), or a second record of the same station at the same instant (the
 * same observation sent twice; the first in the file is kept). Each set-aside record becomes an
 * InputError with its file and line; records of other designations are counted, not fitted.
 *
 * A designation is matched on the readable form ('2030 QW12', '(12893)'), the packed form as
 * written, the provisional designation beside a number, or a bare number ('12893'); records
 * tied to a number through their provisional designation (astrometryDesignations.ts) join it.
 */
import { InputError } from '../../io/types.js';
import type { AstrometryObservation } from '../../io/astrometry/types.js';

/** JD (UTC) of 1800 January 1.0: earlier dates are set aside (the earliest usable astrometry is 19th century; common practice). */
export const EARLIEST_JD_UTC = 2378496.5;

export interface BodySelection {
  /** The designation's records that remain, in input order. */
  observations: AstrometryObservation[];
  /** The designation's records set aside (dates, duplicates), in input order. */
  setAside: InputError[];
  /** Records of other designations, by designation in order of first appearance. */
  others: { designation: string; observations: number }[];
}

function normalise(text: string): string {
  return text.trim().replace(/\s+/g, ' ');
}

/** The readable and provisional names of the records `wanted` names. */
function namesOf(observations: readonly AstrometryObservation[], wanted: string): Set<string> {
  const w = normalise(wanted);
  const bare = /^\d+$/.test(w) ? Number(w) : NaN;
  const names = new Set<string>();
  for (const o of observations) {
    const hit = o.designation === w || o.packed === w || o.provisional === w || o.designation === `(${w})` || o.number === bare;
    if (!hit) continue;
    names.add(o.designation);
    if (o.provisional !== '') names.add(o.provisional);
  }
  return names;
}

/** Splits `observations` into the designation's usable records, its set-aside ones and the others (see the file comment). */
export function selectBody(observations: readonly AstrometryObservation[], designation: string, latestJdUtc: number): BodySelection {
  if (!(latestJdUtc > EARLIEST_JD_UTC)) throw new RangeError(`selectBody: the latest date JD ${latestJdUtc} is not after 1800`);
  const names = namesOf(observations, designation);
  const kept: AstrometryObservation[] = [];
  const setAside: InputError[] = [];
  const others = new Map<string, number>();
  const firstLineOf = new Map<string, number>(); // station|JD → line of the first record
  for (const o of observations) {
    if (!names.has(o.designation) && !(o.provisional !== '' && names.has(o.provisional))) {
      others.set(o.designation, (others.get(o.designation) ?? 0) + 1);
      continue;
    }
    if (!(o.timeJdUtc >= EARLIEST_JD_UTC)) {
      setAside.push(new InputError(o.file, o.line, 0, `date JD ${o.timeJdUtc} (UTC) is before 1800`, o.designation));
      continue;
    }
    if (o.timeJdUtc > latestJdUtc) {
      setAside.push(new InputError(o.file, o.line, 0, `date JD ${o.timeJdUtc} (UTC) is after the latest date accepted, JD ${latestJdUtc}`, o.designation));
      continue;
    }
    const key = `${o.station}|${o.timeJdUtc}`;
    const first = firstLineOf.get(key);
    if (first !== undefined) {
      setAside.push(new InputError(o.file, o.line, 0, `duplicate of line ${first}: the same station ${o.station} at the same time`, o.designation));
      continue;
    }
    firstLineOf.set(key, o.line);
    kept.push(o);
  }
  return { observations: kept, setAside, others: [...others].map(([d, n]) => ({ designation: d, observations: n })) };
}
