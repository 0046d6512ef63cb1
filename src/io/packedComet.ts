/**
 * Comet designations in their packed forms (published description of the packed comet
 * designation form):
 * - numbered periodic comets: four digits and the orbit type, `0001P` = 1P, `0002P` = 2P,
 *   also D (defunct) and I (interstellar): `0001I` = 1I;
 * - provisional designations: orbit type (P, C, D, X, I, A) then 7 characters: century
 *   letter and year, half-month letter, cycle count in two characters (as for minor
 *   planets), and a last character that is '0', or a lowercase fragment letter, or (for
 *   comets that kept a minor-planet-style designation) the uppercase second letter:
 *   `CJ95O010` = C/1995 O1, `PK04V05a` = P/2004 V5-A, `PK04FE0Y` = P/2004 FY140,
 *   `CJ42E00A` = C/1942 EA.
 * - fragments of numbered comets: the 12-column field with the lowercase fragment letters
 *   right-aligned in its last columns, `0073P      b` = 73P-B (placement from memory).
 * Functions return '' when the text is not in these forms.
 */
import {
  packCenturyYear, packCycle, packProvisional, unpackCenturyYear, unpackCycle,
  unpackProvisional, MAX_STANDARD_CYCLE,
} from './packedProvisional.js';

const ORBIT_TYPES = 'PCDXIA';

/** Readable form of a packed comet designation (5 or 8 characters), or ''. */
export function unpackComet(packed: string): string {
  if (packed.length === 12) {
    const m = /^(\d{4})([PDI]) {5,6}([a-z]{1,2})$/.exec(packed);
    return m && Number(m[1]) > 0 ? `${Number(m[1])}${m[2]}-${m[3].toUpperCase()}` : '';
  }
  if (packed.length === 5) {
    const m = /^(\d{4})([PDI])$/.exec(packed);
    return m && Number(m[1]) > 0 ? `${Number(m[1])}${m[2]}` : '';
  }
  if (packed.length !== 8 || !ORBIT_TYPES.includes(packed[0])) return '';
  const type = packed[0];
  const last = packed.charCodeAt(7);
  if (last >= 65 && last <= 90) {
    // minor-planet-style designation carried by a comet
    const mp = unpackProvisional(packed.slice(1));
    return mp === '' || !/^\d{4} [A-Z]{2}/.test(mp) ? '' : `${type}/${mp}`;
  }
  const year = unpackCenturyYear(packed, 1);
  const half = packed[4];
  const cycle = unpackCycle(packed, 5);
  if (Number.isNaN(year) || cycle < 1 || !/^[A-HJ-Y]$/.test(half)) return '';
  if (last === 48) return `${type}/${year} ${half}${cycle}`; // '0': no fragment
  if (last >= 97 && last <= 122) return `${type}/${year} ${half}${cycle}-${packed[7].toUpperCase()}`;
  return '';
}

/**
 * Packed form of a readable comet designation, or ''. A trailing name is dropped:
 * `1P/Halley` → `0001P`, `C/1995 O1 (Hale-Bopp)` → `CJ95O010`, `73P-B` → `0073P      b`.
 */
export function packComet(readable: string): string {
  const numbered = /^(\d{1,4})([PDI])(?:-([A-Z]{1,2}))?(?:\/.*)?$/.exec(readable);
  if (numbered) {
    if (Number(numbered[1]) === 0) return '';
    const head = numbered[1].padStart(4, '0') + numbered[2];
    return numbered[3] === undefined ? head : head + numbered[3].toLowerCase().padStart(7);
  }
  const desig = readable.replace(/ \(.*\)$/, '');
  const comet = /^([PCDXIA])\/(\d{4}) ([A-HJ-Y])([1-9]\d*)(?:-([A-Z]))?$/.exec(desig);
  if (comet) {
    const yy = packCenturyYear(Number(comet[2]));
    const cycle = Number(comet[4]);
    if (yy === '' || cycle > MAX_STANDARD_CYCLE) return '';
    const frag = comet[5] === undefined ? '0' : comet[5].toLowerCase();
    return `${comet[1]}${yy}${comet[3]}${packCycle(cycle)}${frag}`;
  }
  const mpStyle = /^([PCDXIA])\/(\d{4} [A-HJ-Y][A-HJ-Z]\d*)$/.exec(desig);
  if (mpStyle) {
    const p = packProvisional(mpStyle[2]);
    // only the standard 7-character form fits the comet field
    return p === '' || !/^[I-L]/.test(p) ? '' : mpStyle[1] + p;
  }
  return '';
}
