/**
 * Writer of the pipe-separated (PSV) form of ADES (fields in ./adesColumns.ts; ADES
 * Description, version 2017, from memory): header keyword lines ('# version=2017', then
 * '# keyword' lines each followed by its '! sub-keyword value' lines), one line of column
 * names, one data line per observation. Columns are not padded (the reader trims cells; the
 * standard allows unpadded PSV, from memory). The exact inverse of ./adesRow.ts for what it
 * reads: designation (permID for numbered bodies and periodic comets, provID, or trkSub for a
 * temporary designation), obsTime in ISO 8601 UTC ('Z'), ra and dec in degrees, rmsRA (of
 * RA × cos δ) and rmsDec in arcseconds, rmsCorr, stn, mode, astCat, mag, band, and for a
 * space-based observer sys ICRF_KM, ctr 399 and pos1..pos3 (km). Roving observers are not
 * written (TypeError).
 */
import { RAD_PER_DEG } from '../../core/constants.js';
import { Instant } from '../../core/time/time.js';
import type { AstrometryObservation } from './types.js';

/** One top-level header keyword and its sub-keywords, e.g. observatory / mpcCode 568. */
export interface AdesHeaderBlock {
  keyword: string;
  entries: readonly (readonly [string, string])[];
}

export interface AdesWriteOptions {
  header?: readonly AdesHeaderBlock[]; // after '# version=2017'
  timeDecimals?: number; // decimals of the seconds of obsTime (default 3)
  angleDecimals?: number; // decimals of ra and dec in degrees (default: from each observation's resolution)
  sigmaDecimals?: number; // decimals of rmsRA, rmsDec (default 3)
  magDecimals?: number; // default 1
}

/** The fields of an observation the writer reads. */
export type AdesFields = Pick<AstrometryObservation,
  'designation' | 'number' | 'provisional' | 'temporary' | 'timeJdUtc' | 'raRad' | 'decRad'
  | 'raResolutionArcsec' | 'decResolutionArcsec' | 'sigmaRaCosDecArcsec' | 'sigmaDecArcsec' | 'correlationRaDec'
  | 'station' | 'mode' | 'catalogue' | 'mag' | 'band' | 'kind' | 'observerGeocentricKm'>;

const BASE_COLUMNS = ['permID', 'provID', 'trkSub', 'mode', 'stn', 'obsTime', 'ra', 'dec', 'rmsRA', 'rmsDec', 'rmsCorr', 'astCat', 'mag', 'band'];
const SPACE_COLUMNS = ['sys', 'ctr', 'pos1', 'pos2', 'pos3'];

/** Decimals of degrees fine enough for a resolution in arcseconds (3600″/10^d ≤ resolution). */
export function degreeDecimalsFor(resolutionArcsec: number): number {
  if (!(resolutionArcsec > 0) || !Number.isFinite(resolutionArcsec)) return 6;
  return Math.min(9, Math.max(0, Math.ceil(Math.log10(3600 / resolutionArcsec) - 1e-9)));
}

function cell(text: string, what: string): string {
  if (text.includes('|') || text.includes('\n')) throw new RangeError(`ADES ${what} '${text}' holds a '|' or a line break`);
  return text;
}

function numberCell(v: number, decimals: number): string {
  if (Number.isNaN(v)) return '';
  if (!Number.isFinite(v)) throw new RangeError(`ADES: non-finite value ${v}`);
  const text = v.toFixed(decimals);
  return /^-[0.]*$/.test(text) ? text.slice(1) : text; // a value that rounds to zero is written unsigned
}

/** permID, provID, trkSub of an observation. */
function identity(o: AdesFields): [string, string, string] {
  if (o.temporary) return ['', '', cell(o.designation, 'trkSub')];
  if (Number.isInteger(o.number) && o.number > 0) {
    const perm = o.designation.startsWith('(') ? String(o.number) : o.designation;
    return [cell(perm, 'permID'), cell(o.provisional, 'provID'), ''];
  }
  return ['', cell(o.designation, 'provID'), ''];
}

/** One data line; `space` adds the observer columns. */
export function formatAdesRow(o: AdesFields, space: boolean, options: AdesWriteOptions = {}): string {
  if (o.kind === 'roving') throw new TypeError('formatAdesRow: roving observers are not written');
  if (!/^[0-9A-Z]{3}$/.test(o.station)) throw new RangeError(`formatAdesRow: observatory code '${o.station}' is not three letters or digits`);
  const sd = options.sigmaDecimals ?? 3;
  const raDeg = o.raRad / RAD_PER_DEG;
  const decDeg = o.decRad / RAD_PER_DEG;
  const raDec = options.angleDecimals ?? degreeDecimalsFor(o.raResolutionArcsec);
  const decDec = options.angleDecimals ?? degreeDecimalsFor(o.decResolutionArcsec);
  let raText = numberCell(raDeg, raDec);
  if (Number(raText) >= 360) raText = (0).toFixed(raDec); // rounds up to a full turn
  const cells = [
    ...identity(o), cell(o.mode, 'mode'), o.station,
    Instant.fromJd(o.timeJdUtc, 'UTC').toIso(options.timeDecimals ?? 3),
    raText, numberCell(decDeg, decDec),
    numberCell(o.sigmaRaCosDecArcsec, sd), numberCell(o.sigmaDecArcsec, sd), numberCell(o.correlationRaDec, 3),
    cell(o.catalogue, 'astCat'), numberCell(o.mag, options.magDecimals ?? 1), cell(o.band, 'band'),
  ];
  if (space) {
    if (o.kind === 'space') {
      const km = o.observerGeocentricKm;
      if (km === null) throw new TypeError('formatAdesRow: a space-based observation without its observer position');
      cells.push('ICRF_KM', '399', ...km.map((v) => numberCell(v, 4)));
    } else {
      cells.push('', '', '', '', '');
    }
  }
  return cells.join('|');
}

/** The whole file's text (header, column names, rows), '\n' line ends and a final newline. */
export function formatAdesPsv(observations: readonly AdesFields[], options: AdesWriteOptions = {}): string {
  const lines = ['# version=2017'];
  for (const block of options.header ?? []) {
    if (!/^[A-Za-z][A-Za-z0-9]*$/.test(block.keyword)) throw new RangeError(`formatAdesPsv: header keyword '${block.keyword}' is not one word`);
    lines.push(`# ${block.keyword}`);
    for (const [k, v] of block.entries) {
      if (!/^[A-Za-z][A-Za-z0-9]*$/.test(k) || v.includes('\n')) throw new RangeError(`formatAdesPsv: header entry '${k}' '${v}' is not a word and a one-line value`);
      lines.push(`! ${k} ${v}`);
    }
  }
  const space = observations.some((o) => o.kind === 'space');
  lines.push((space ? [...BASE_COLUMNS, ...SPACE_COLUMNS] : BASE_COLUMNS).join('|'));
  for (const o of observations) lines.push(formatAdesRow(o, space, options));
  return lines.join('\n') + '\n';
}
