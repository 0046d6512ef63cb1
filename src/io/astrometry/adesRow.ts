/**
 * One data row of an ADES PSV file (fields in ./adesColumns.ts) → an observation. Cells
 * are trimmed; an empty cell is a missing value. Every failure is an InputError naming the
 * file, line, the 1-based column of the cell's start and the field.
 *
 * Observer position (ADES Description, version 2017, from memory): sys ICRF_KM or ICRF_AU
 * with ctr 399 → a space-based observer at (pos1, pos2, pos3) from the geocentre,
 * equatorial J2000, kept in km; sys WGS84 → a roving observer at east longitude pos1 and
 * latitude pos2 (degrees) and altitude pos3 (metres). Other systems or centres are rejected
 * with the reason (not handled here).
 */
import { KM_PER_AU, RAD_PER_DEG } from '../../core/constants.js';
import { parseIsoDateTime, TimeFormatError } from '../../core/time/isoTime.js';
import { InputError } from '../types.js';
import type { AdesField } from './adesColumns.js';
import { timesFromUtcDay, timesFromUtcSeconds, type ObservationTimes } from './observationTime.js';
import type { AstrometryObservation } from './types.js';

/** Cells of one row with their 1-based start columns. */
export interface AdesCells {
  values: string[]; // trimmed
  columns: number[]; // 1-based column where each cell starts
}

/** Splits a PSV line on '|'. */
export function splitPsv(line: string): AdesCells {
  const values: string[] = [];
  const columns: number[] = [];
  let start = 0;
  for (;;) {
    const bar = line.indexOf('|', start);
    const end = bar < 0 ? line.length : bar;
    values.push(line.slice(start, end).trim());
    columns.push(start + 1);
    if (bar < 0) return { values, columns };
    start = bar + 1;
  }
}

class RowContext {
  constructor(
    readonly cells: AdesCells,
    readonly index: Record<AdesField, number>,
    readonly file: string,
    readonly lineNo: number,
    readonly text: string,
  ) {}

  get(f: AdesField): string {
    const k = this.index[f];
    return k < 0 ? '' : this.cells.values[k];
  }

  fail(f: AdesField, reason: string): never {
    const k = this.index[f];
    throw new InputError(this.file, this.lineNo, k < 0 ? 0 : this.cells.columns[k], `${reason} (field ${f})`, this.text);
  }

  number(f: AdesField, required: boolean): number {
    const t = this.get(f);
    if (t === '') {
      if (required) this.fail(f, 'missing value');
      return NaN;
    }
    if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t)) this.fail(f, `not a number: '${t}'`);
    return Number(t);
  }
}

/** Decimals written in a plain decimal number ('183.473921' → 6). */
function decimalsOf(text: string): number {
  const dot = text.indexOf('.');
  return dot < 0 ? 0 : text.length - dot - 1;
}

function readTime(c: RowContext): ObservationTimes {
  const text = c.get('obsTime');
  if (text === '') c.fail('obsTime', 'missing value');
  try {
    const p = parseIsoDateTime(text);
    if (p.scale !== null && p.scale !== 'UTC') c.fail('obsTime', `time scale ${p.scale}; the standard gives UTC: '${text}'`);
    return Number.isNaN(p.secondsOfDay) ? timesFromUtcDay(p.year, p.month, p.day + p.dayFraction) : timesFromUtcSeconds(p.year, p.month, p.day, p.secondsOfDay);
  } catch (err) {
    if (err instanceof TimeFormatError || err instanceof RangeError) c.fail('obsTime', `not an ISO 8601 UTC time: '${text}'`);
    throw err;
  }
}

function readDesignation(c: RowContext): Pick<AstrometryObservation, 'designation' | 'packed' | 'number' | 'provisional' | 'temporary'> {
  const perm = c.get('permID');
  const prov = c.get('provID');
  const trk = c.get('trkSub');
  if (perm !== '') {
    const numbered = /^\d+$/.test(perm);
    const number = numbered ? Number(perm) : /^(\d+)[PDI]$/.test(perm) ? Number(perm.slice(0, -1)) : NaN;
    return { designation: numbered ? `(${number})` : perm, packed: perm, number, provisional: prov, temporary: false };
  }
  if (prov !== '') return { designation: prov, packed: prov, number: NaN, provisional: prov, temporary: false };
  if (trk !== '') return { designation: trk, packed: trk, number: NaN, provisional: '', temporary: true };
  return c.fail('permID', 'no permID, provID or trkSub');
}

function readObserver(c: RowContext, obs: AstrometryObservation): void {
  const sys = c.get('sys');
  if (sys === '') return;
  const p = [c.number('pos1', true), c.number('pos2', true), c.number('pos3', sys !== 'WGS84')];
  if (sys === 'ICRF_KM' || sys === 'ICRF_AU') {
    const ctr = c.get('ctr');
    if (ctr !== '399') c.fail('ctr', `observer position centred on '${ctr}'; only the geocentre (399) is handled`);
    const scale = sys === 'ICRF_KM' ? 1 : KM_PER_AU;
    obs.observerGeocentricKm = [p[0] * scale, p[1] * scale, p[2] * scale];
    obs.kind = 'space';
  } else if (sys === 'WGS84') {
    if (p[0] < 0 || p[0] >= 360 || Math.abs(p[1]) > 90) c.fail('pos1', `roving site longitude ${p[0]}, latitude ${p[1]} out of range`);
    obs.rovingSite = { longitudeDegE: p[0], latitudeDeg: p[1], altitudeM: p[2] };
    obs.kind = 'roving';
  } else {
    c.fail('sys', `observer coordinate system '${sys}' is not handled (ICRF_KM, ICRF_AU, WGS84 are)`);
  }
}

/** The observation of one data row; InputError when it cannot be read. */
export function parseAdesRow(cells: AdesCells, index: Record<AdesField, number>, file: string, lineNo: number, text: string): AstrometryObservation {
  const c = new RowContext(cells, index, file, lineNo, text);
  const d = readDesignation(c);
  const times = readTime(c);
  const ra = c.number('ra', true);
  const dec = c.number('dec', true);
  if (ra < 0 || ra >= 360) c.fail('ra', `right ascension ${ra} is not in [0, 360) degrees`);
  if (Math.abs(dec) > 90) c.fail('dec', `declination ${dec} is not in [−90, 90] degrees`);
  const station = c.get('stn');
  if (!/^[0-9A-Z]{3}$/.test(station)) c.fail('stn', `observatory code is not three letters or digits: '${station}'`);
  const raDecimals = decimalsOf(c.get('ra'));
  const decDecimals = decimalsOf(c.get('dec'));
  const obs: AstrometryObservation = {
    designation: d.designation, packed: d.packed, number: d.number, provisional: d.provisional, temporary: d.temporary,
    timeJdUtc: times.jdUtc, timeJdTT: times.jdTT,
    raRad: ra * RAD_PER_DEG, decRad: dec * RAD_PER_DEG, raDecimals, decDecimals,
    raResolutionArcsec: 3600 / 10 ** raDecimals, decResolutionArcsec: 3600 / 10 ** decDecimals,
    sigmaRaCosDecArcsec: c.number('rmsRA', false), sigmaDecArcsec: c.number('rmsDec', false),
    correlationRaDec: c.number('rmsCorr', false), station, kind: 'optical',
    observerGeocentricKm: null, rovingSite: null, mag: c.number('mag', false), band: c.get('band'),
    note1: '', note2: '', mode: c.get('mode'), catalogue: c.get('astCat'), discovery: false,
    file, line: lineNo, lines: 1,
  };
  readObserver(c, obs);
  return obs;
}
