/**
 * Right ascension 'hh mm ss.sss' and declination 'sdd mm ss.ss' as the 80-column record
 * writes them, with the precision as written. The seconds may be left off and the minutes
 * carry the decimals instead ('hh mm.mmm', 'sdd mm.mm'): lower-precision positions are
 * written so (format description, from memory). One space between the parts (common
 * practice of the format). The number of decimals is kept: it sets a default weight later.
 */

/** A parsed sexagesimal angle: value in hours (RA) or degrees (Dec). */
export interface SexagesimalAngle {
  value: number; // hours for RA, degrees for Dec (signed)
  decimals: number; // decimals written in the last part
  resolutionArcsec: number; // one unit of the last written decimal, arcseconds (RA: of RA, not × cos δ)
}

const RA_PATTERN = /^(\d\d) (\d\d)(?:(\.\d*)| (\d\d)(\.\d*)?)?$/;
const DEC_PATTERN = /^([+-])(\d\d) (\d\d)(?:(\.\d*)| (\d\d)(\.\d*)?)?$/;

/** Decimals written after a '.' ('' or undefined: none). */
function decimalsOf(fraction: string | undefined): number {
  return fraction === undefined ? 0 : Math.max(0, fraction.length - 1);
}

/** Seconds of arc in one unit of the last part: RA 15″ a second of time, 900″ a minute; Dec 1″, 60″. */
function resolution(unitArcsec: number, decimals: number): number {
  return unitArcsec / 10 ** decimals;
}

/** RA in hours from 'hh mm ss.sss' / 'hh mm.mmm'; a one-line reason when it does not parse. */
export function parseRightAscension(text: string): SexagesimalAngle | string {
  const m = RA_PATTERN.exec(text);
  if (m === null) return `right ascension is not 'hh mm ss.sss': '${text}'`;
  const hours = Number(m[1]);
  const minutes = Number(m[2] + (m[3] ?? ''));
  const seconds = m[4] === undefined ? 0 : Number(m[4] + (m[5] ?? ''));
  if (hours > 23 || minutes >= 60 || seconds >= 60) return `right ascension out of range: '${text}'`;
  const value = hours + minutes / 60 + seconds / 3600;
  if (m[4] === undefined) return { value, decimals: decimalsOf(m[3]), resolutionArcsec: resolution(900, decimalsOf(m[3])) };
  return { value, decimals: decimalsOf(m[5]), resolutionArcsec: resolution(15, decimalsOf(m[5])) };
}

/** Dec in degrees from 'sdd mm ss.ss' / 'sdd mm.mm'; a one-line reason when it does not parse. */
export function parseDeclination(text: string): SexagesimalAngle | string {
  const m = DEC_PATTERN.exec(text);
  if (m === null) return `declination is not 'sdd mm ss.ss': '${text}'`;
  const degrees = Number(m[2]);
  const minutes = Number(m[3] + (m[4] ?? ''));
  const seconds = m[5] === undefined ? 0 : Number(m[5] + (m[6] ?? ''));
  const magnitude = degrees + minutes / 60 + seconds / 3600;
  if (minutes >= 60 || seconds >= 60 || magnitude > 90) return `declination out of range: '${text}'`;
  const value = m[1] === '-' ? -magnitude : magnitude;
  if (m[5] === undefined) return { value, decimals: decimalsOf(m[4]), resolutionArcsec: resolution(60, decimalsOf(m[4])) };
  return { value, decimals: decimalsOf(m[6]), resolutionArcsec: resolution(1, decimalsOf(m[6])) };
}
