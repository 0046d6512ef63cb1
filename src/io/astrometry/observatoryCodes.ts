/**
 * The observatory-code table in its standard fixed-column form, published openly by the
 * IAU Minor Planet Center (layout of its list of observatory codes, checked against the real
 * copy in /work/shared/data): code columns 1–3, east longitude (degrees) 4–13, parallax
 * constants ρ cos φ′ 14–21 and ρ sin φ′ 22–30 (Earth equatorial radii), name 31 on.
 * Values can run together without a space ('149.066080.855595-0.516262'), so fields are
 * read by column, never by splitting on spaces. Space-based and roving codes leave the
 * three position fields blank: they load with `fixedSite: false`. A line with some but not
 * all of them, or a number that is not one, is rejected with its reason; the read goes on.
 * The heading line ('Code  Long. …') and blank lines are skipped.
 *
 * The geocentric code 500 (longitude 0, ρ cos φ′ = ρ sin φ′ = 0) is built in, so a table
 * is needed only for other stations; a table that lists 500 gives it again.
 */
import { fieldText, isBlankField } from '../fixedField.js';
import { failAt, optionalNumber, type Field } from '../fixedFieldRead.js';
import { forEachLine } from '../lineSource.js';
import { InputError } from '../types.js';
import type { ObservatorySite } from './types.js';

const CODE: Field = [0, 3]; // 1–3
const LONGITUDE: Field = [3, 13]; // 4–13
const RHO_COS: Field = [13, 21]; // 14–21
const RHO_SIN: Field = [21, 30]; // 22–30

/** The geocentre, code 500, built in (values as the published table gives them). */
export const GEOCENTRE_SITE: ObservatorySite = Object.freeze({
  code: '500', longitudeDegE: 0, rhoCosPhiPrime: 0, rhoSinPhiPrime: 0, name: 'Geocentric', fixedSite: true,
});

/** One line of the table: its site, 'skip' (heading or blank), or InputError. */
export function parseObservatoryCodeLine(line: string, file: string, lineNo: number): ObservatorySite | 'skip' {
  if (line.trim() === '' || /^code\b/i.test(line)) return 'skip';
  const code = line.slice(CODE[0], CODE[1]);
  if (!/^[0-9A-Z]{3}$/.test(code)) failAt(file, lineNo, line, CODE, `observatory code is not three letters or digits: '${code}' (columns 1–3)`);
  const name = fieldText(line, 30, line.length);
  const fields = [LONGITUDE, RHO_COS, RHO_SIN];
  const blank = fields.map((f) => isBlankField(line, f[0], f[1]));
  if (blank.every(Boolean)) {
    return { code, longitudeDegE: NaN, rhoCosPhiPrime: NaN, rhoSinPhiPrime: NaN, name, fixedSite: false };
  }
  const missing = fields.findIndex((_, k) => blank[k]);
  if (missing >= 0) failAt(file, lineNo, line, fields[missing], `station ${code} gives some position columns and leaves others blank (columns 4–30)`);
  const longitudeDegE = optionalNumber(line, LONGITUDE, 'longitude', file, lineNo);
  const rhoCosPhiPrime = optionalNumber(line, RHO_COS, 'ρ cos φ′', file, lineNo);
  const rhoSinPhiPrime = optionalNumber(line, RHO_SIN, 'ρ sin φ′', file, lineNo);
  if (longitudeDegE < 0 || longitudeDegE >= 360) failAt(file, lineNo, line, LONGITUDE, `longitude ${longitudeDegE} is not in [0, 360) degrees east (columns 4–13)`);
  if (rhoCosPhiPrime < 0) failAt(file, lineNo, line, RHO_COS, `ρ cos φ′ ${rhoCosPhiPrime} is negative (columns 14–21)`);
  return { code, longitudeDegE, rhoCosPhiPrime, rhoSinPhiPrime, name, fixedSite: true };
}

export interface ObservatoryTable {
  sites: Map<string, ObservatorySite>; // by code; 500 always present
  file: string; // '' for the built-in table alone
  linesRead: number; // data lines = loaded + rejected
  loaded: number;
  rejected: InputError[];
  skipped: number;
  duplicates: string[]; // codes listed more than once (the later line wins), in file order
}

/** The built-in table: the geocentre alone. */
export function builtinObservatoryTable(): ObservatoryTable {
  return { sites: new Map([['500', GEOCENTRE_SITE]]), file: '', linesRead: 0, loaded: 0, rejected: [], skipped: 0, duplicates: [] };
}

/** Reads a table file ('-' = stdin) over the built-in one. Whole-file errors: UnreadableInputError. */
export async function readObservatoryCodes(path: string): Promise<ObservatoryTable> {
  const table = builtinObservatoryTable();
  table.file = path;
  const seen = new Set<string>();
  await forEachLine(path, (text, lineNo) => {
    let site;
    try {
      site = parseObservatoryCodeLine(text, path, lineNo);
    } catch (err) {
      if (!(err instanceof InputError)) throw err;
      table.linesRead++;
      table.rejected.push(err);
      return;
    }
    if (site === 'skip') {
      table.skipped++;
      return;
    }
    table.linesRead++;
    table.loaded++;
    if (seen.has(site.code)) table.duplicates.push(site.code);
    seen.add(site.code);
    table.sites.set(site.code, site);
  });
  return table;
}
