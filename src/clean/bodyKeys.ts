/**
 * Normalised keys under which a body is looked up: its permanent number, its designation
 * and its proper name. Text a user types and text a catalogue holds give equal keys for the
 * same body whatever the spelling:
 * - numbers: `1`, `(1)`, `(1) Ceres` and the packed `00001` all give number 1;
 * - designations: letter case and blanks are ignored (`2030 CO1` = `2030CO1` = `2030 co1`),
 *   and a packed designation is unpacked first (`K30C01O` → `2030 CO1`, `PK30E010` →
 *   `P/2030 E1`) by the io layer's unpacker (src/io/packedDesignation.ts);
 * - names: letter case, accents and runs of blanks are ignored (`van  de Hulst` = `Van de
 *   Hulst`, `Šteffl` = `Steffl`).
 * Readable texts that carry a name beside the designation are split as the trade writes them
 * (common practice): `(1) Ceres`, `1P/Halley`, `C/1995 O1 (Hale-Bopp)`.
 */
import { PackedFormError } from '../io/errors.js';
import { unpackDesignation } from '../io/packedDesignation.js';

/** Lookup keys of one body or of one user's text. Missing: NaN and ''. */
export interface BodyKeys {
  number: number; // permanent minor-planet number; NaN when none
  designation: string; // designation, blanks dropped, upper case; '' when none
  name: string; // proper name, accents dropped, blanks collapsed, upper case; '' when none
}

/** Fresh keys with every field missing (scratch for rowKeys). */
export function emptyBodyKeys(): BodyKeys {
  return { number: NaN, designation: '', name: '' };
}

/** Designation key: blanks dropped, upper case. */
export function designationLookupKey(text: string): string {
  return text.replace(/\s+/g, '').toUpperCase();
}

/** Name key: accents dropped (Unicode decomposition, marks removed), blanks collapsed, upper case. */
export function nameLookupKey(text: string): string {
  const plain = /^[\x20-\x7e]*$/.test(text) ? text : text.normalize('NFD').replace(/\p{M}/gu, '');
  return plain.trim().replace(/\s+/g, ' ').toUpperCase();
}

const NUMBERED = /^\((\d+)\)\s*(.*)$/; // (1) Ceres
const NUMBERED_COMET = /^(\d+[PDI](?:-[A-Z]{1,2})?)\/(.+)$/; // 1P/Halley
const NAME_IN_PARENTHESES = /^(.*\S)\s+\(([^()]*[^\d\s()][^()]*)\)$/; // C/1995 O1 (Hale-Bopp)

/** Keys of a readable designation that may carry a name, into `out`. */
function splitReadable(text: string, out: BodyKeys): void {
  out.number = NaN;
  out.designation = '';
  out.name = '';
  let m = NUMBERED.exec(text);
  if (m) {
    out.number = Number(m[1]);
    if (m[2] !== '') out.name = nameLookupKey(m[2]);
    return;
  }
  m = NUMBERED_COMET.exec(text) ?? NAME_IN_PARENTHESES.exec(text);
  if (m) {
    out.designation = designationLookupKey(m[1]);
    out.name = nameLookupKey(m[2]);
    return;
  }
  out.designation = designationLookupKey(text);
}

/**
 * Whether `text` has the shape of a packed form: numbers and numbered comets 5 characters,
 * provisional designations 7, comet provisional designations 8, all without blanks; comet
 * fragments 12 with blanks inside (`0073P      b`).
 */
function mayBePacked(text: string): boolean {
  const n = text.length;
  if (n === 12) return /^\d{4}[PDI] +[a-z]{1,2}$/.test(text);
  return (n === 5 || n === 7 || n === 8) && !/\s/.test(text);
}

/** Readable form of a packed designation, or '' when `text` is in no packed form. */
function unpackedOrEmpty(text: string): string {
  if (!mayBePacked(text)) return '';
  try {
    return unpackDesignation(text);
  } catch (err) {
    if (err instanceof PackedFormError) return '';
    throw err;
  }
}

/**
 * Keys of catalogue row text into `out`: its readable designation (or a packed one, as a
 * CSV may hold) and its name column ('' when none). No allocation beyond the key strings.
 */
export function rowKeys(designation: string, name: string, out: BodyKeys): void {
  const d = designation.trim();
  const unpacked = d.charCodeAt(0) === 40 ? '' : unpackedOrEmpty(d); // '(' starts '(N) …'
  splitReadable(unpacked !== '' ? unpacked : d, out);
  if (name !== '') out.name = nameLookupKey(name);
}

/**
 * Keys of a user's text: a number (`1`, `(1)`), a packed or readable designation with or
 * without blanks, a name, or a readable designation with its name. A bare word is tried
 * both as a designation and as a name (`Ceres`, `Larkspur`).
 */
export function queryKeys(text: string): BodyKeys {
  const t = text.trim().replace(/\s+/g, ' ');
  const out = emptyBodyKeys();
  const bare = /^\(?(\d+)\)?$/.exec(t);
  if (bare) {
    out.number = Number(bare[1]);
    return out;
  }
  // Packed forms are case-sensitive (base-62 digits, lowercase comet fragments): as typed first.
  const unpacked = unpackedOrEmpty(t) || unpackedOrEmpty(t.toUpperCase());
  splitReadable(unpacked !== '' ? unpacked : t, out);
  if (unpacked === '' && out.name === '' && Number.isNaN(out.number)) out.name = nameLookupKey(t);
  return out;
}
