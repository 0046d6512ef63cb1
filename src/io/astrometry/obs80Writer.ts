/**
 * Writer of the 80-column optical astrometry record (columns in ./obs80Layout.ts): the exact
 * inverse of the reader (./obs80Line.ts, ./obs80SecondLine.ts) for the fields an orbit fit
 * uses: designation (packed through the project's one packer), discovery asterisk, notes 1
 * and 2, the UTC date to 1e-5 or 1e-6 day, RA and Dec at the precision the observation
 * carries (`raResolutionArcsec`, `decResolutionArcsec`: 0.001 s and 0.01″ at most, what the
 * columns hold), magnitude and band, catalogue code, publication reference and station. A
 * space-based observation ('space') becomes the two-line pair ('S' then 's': the observer's
 * geocentric X, Y, Z in km with 4 decimals, or in au with 8 when a component is too wide).
 * Roving observers are not written. Anything that would not read back as given is a
 * RangeError or TypeError (caller misuse): a writer must never shift a column.
 */
import { KM_PER_AU, RAD_PER_DEG } from '../../core/constants.js';
import { jdToCalendar } from '../../core/time/julian.js';
import { fixedText } from '../fixedField.js';
import { packComet } from '../packedComet.js';
import { packNumber } from '../packedNumber.js';
import { packProvisional } from '../packedProvisional.js';
import { OBS80_LINE_LENGTH } from './obs80Layout.js';
import { formatDeclination, formatRightAscension, type SexagesimalUnit } from './sexagesimalFormat.js';
import type { AstrometryObservation } from './types.js';

/** The fields of an observation the writer reads. */
export type Obs80Fields = Pick<AstrometryObservation,
  'designation' | 'number' | 'provisional' | 'temporary' | 'discovery' | 'note1' | 'note2' | 'timeJdUtc'
  | 'raRad' | 'decRad' | 'raResolutionArcsec' | 'decResolutionArcsec' | 'mag' | 'band' | 'catalogue' | 'station'
  | 'kind' | 'observerGeocentricKm'>;

export interface Obs80WriteOptions {
  dateDecimals?: 5 | 6; // decimals of the day (default 6: 0.0864 s)
  magDecimals?: 1 | 2; // decimals of the magnitude (default 1)
  reference?: string; // publication reference, columns 73–77 (default blank)
}

const COMET = /^(?:\d+[PDI](?:-[A-Z]{1,2})?|[PCDXIA]\/.+)$/;

/** Columns 1–12 of an observation's designation. */
export function obs80DesignationField(o: Pick<AstrometryObservation, 'designation' | 'number' | 'provisional' | 'temporary'>): string {
  const fail = (why: string): never => {
    throw new RangeError(`obs80DesignationField: '${o.designation}' ${why}`);
  };
  if (o.temporary) {
    if (!/^[A-Za-z0-9]{1,7}$/.test(o.designation)) fail('is not an alphanumeric temporary designation of 1–7 characters');
    return '     ' + o.designation.padEnd(7);
  }
  if (COMET.test(o.designation)) {
    const packed = packComet(o.designation);
    if (packed === '') fail('is a comet designation in no packed form');
    if (packed.length === 8) return '    ' + packed; // provisional only: orbit type in column 5
    if (packed.length === 12 || o.provisional === '') return packed.padEnd(12);
    const prov = packComet(o.provisional);
    if (prov.length !== 8) fail(`has a provisional designation '${o.provisional}' in no packed comet form`);
    return packed + prov.slice(1);
  }
  if (Number.isInteger(o.number) && o.number > 0) {
    const prov = o.provisional === '' ? '' : packProvisional(o.provisional) || o.provisional;
    return packNumber(o.number) + fixedText(prov, 7, 'provisional designation');
  }
  const prov = packProvisional(o.designation);
  if (prov === '') fail('is neither numbered nor a provisional designation in packed form');
  return '     ' + prov;
}

/** Columns 16–32: 'YYYY MM DD.dddddd' (UTC) at `decimals` decimals of the day, padded to 17. */
export function formatObs80Date(jdUtc: number, decimals: 5 | 6): string {
  if (!Number.isFinite(jdUtc)) throw new RangeError(`formatObs80Date: non-finite JD ${jdUtc}`);
  if (decimals !== 5 && decimals !== 6) throw new RangeError(`formatObs80Date: decimals ${String(decimals)} not 5 or 6`);
  const scale = 10 ** decimals;
  let midnight = Math.floor(jdUtc - 0.5) + 0.5;
  let units = Math.round((jdUtc - midnight) * scale);
  if (units >= scale) {
    units -= scale;
    midnight += 1;
  }
  const c = jdToCalendar(midnight);
  const day = Math.round(c.day);
  if (c.year < 0 || c.year > 9999) throw new RangeError(`formatObs80Date: year ${c.year} not in 0..9999`);
  const text = `${String(c.year).padStart(4, '0')} ${String(c.month).padStart(2, '0')} ${String(day).padStart(2, '0')}.${String(units).padStart(decimals, '0')}`;
  return text.padEnd(17);
}

/**
 * The last written unit and its decimals from a resolution in arcseconds: RA 15″/10^d a
 * second of time or 900″/10^d a minute, Dec 1″/10^d or 60″/10^d (./sexagesimal.ts).
 */
export function sexagesimalPrecision(resolutionArcsec: number, secondArcsec: number, maxDecimals: number, what: string): { unit: SexagesimalUnit; decimals: number } {
  for (const unit of ['seconds', 'minutes'] as const) {
    const base = unit === 'seconds' ? secondArcsec : 60 * secondArcsec;
    const d = Math.round(Math.log10(base / resolutionArcsec));
    if (d >= 0 && Math.abs(base / 10 ** d / resolutionArcsec - 1) < 1e-9) {
      if (unit === 'seconds' && d > maxDecimals) break;
      return { unit, decimals: d };
    }
  }
  throw new RangeError(`${what} resolution ${resolutionArcsec}″ is not one written unit of the 80-column record (seconds with 0–${maxDecimals} decimals, or minutes)`);
}

function one(text: string, what: string): string {
  if (text.length > 1) throw new RangeError(`${what} '${text}' is longer than one column`);
  return text === '' ? ' ' : text;
}

function magnitudeField(mag: number, decimals: 1 | 2): string {
  if (Number.isNaN(mag)) return '     ';
  const text = mag.toFixed(decimals);
  if (!Number.isFinite(mag) || text.length > 5) throw new RangeError(`magnitude ${mag} does not fit in 5 columns`);
  return text.padEnd(5);
}

/** One signed component of the 's' line: sign in the first column, the number right-aligned in the next 10. */
function signedField(value: number, decimals: number): string | null {
  const text = Math.abs(value).toFixed(decimals);
  const negative = value < 0 && /[1-9]/.test(text); // a value that rounds to zero is written '+'
  return text.length > 10 ? null : (negative ? '-' : '+') + text.padStart(10);
}

/** The 's' line's columns 33–69: units flag, X, Y, Z (km with 4 decimals, else au with 8). */
function spacePositionColumns(km: readonly [number, number, number]): string {
  if (!km.every(Number.isFinite)) throw new RangeError(`space-based observer position is not finite: ${km.join(', ')} km`);
  const inKm = km.map((v) => signedField(v, 4));
  if (inKm.every((f) => f !== null)) return `1 ${inKm.join(' ')}`;
  const inAu = km.map((v) => signedField(v / KM_PER_AU, 8));
  if (inAu.some((f) => f === null)) throw new RangeError(`space-based observer position ${km.join(', ')} km does not fit the columns`);
  return `2 ${inAu.join(' ')}`;
}

/** The record's lines: one, or two for a space-based observation ('S' written in column 15). */
export function formatObs80Record(o: Obs80Fields, options: Obs80WriteOptions = {}): string[] {
  const dateDecimals = options.dateDecimals ?? 6;
  const reference = fixedText(options.reference ?? '', 5, 'publication reference');
  if (!/^[0-9A-Z]{3}$/.test(o.station)) throw new RangeError(`formatObs80Record: observatory code '${o.station}' is not three letters or digits`);
  if (o.kind === 'roving') throw new TypeError('formatObs80Record: roving observers are not written');
  const space = o.kind === 'space';
  if (space && o.observerGeocentricKm === null) throw new TypeError('formatObs80Record: a space-based observation without its observer position');
  const note2 = space ? 'S' : one(o.note2, 'note 2');
  if (!space && 'SsVv'.includes(note2)) throw new RangeError(`formatObs80Record: note 2 '${note2}' belongs to a two-line record; give kind 'space'`);
  const ra = sexagesimalPrecision(o.raResolutionArcsec, 15, 3, 'RA');
  const dec = sexagesimalPrecision(o.decResolutionArcsec, 1, 2, 'Dec');
  const designation = obs80DesignationField(o);
  const date = formatObs80Date(o.timeJdUtc, dateDecimals);
  const raText = formatRightAscension(o.raRad / (15 * RAD_PER_DEG), ra.decimals, ra.unit).padEnd(12);
  const decText = formatDeclination(o.decRad / RAD_PER_DEG, dec.decimals, dec.unit).padEnd(12);
  const first = designation + (o.discovery ? '*' : ' ') + one(o.note1, 'note 1') + note2 + date + raText + decText
    + ' '.repeat(9) + magnitudeField(o.mag, options.magDecimals ?? 1) + one(o.band, 'band') + one(o.catalogue, 'catalogue code')
    + reference + o.station;
  const lines = [first];
  if (space) {
    lines.push(designation + '  s' + date + spacePositionColumns(o.observerGeocentricKm!) + '   ' + reference + o.station);
  }
  for (const line of lines) {
    if (line.length !== OBS80_LINE_LENGTH) throw new Error(`formatObs80Record: internal: line of ${line.length} columns: '${line}'`);
  }
  return lines;
}
