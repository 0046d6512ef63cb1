/**
 * The one-line minor-planet orbit export format read straight from a line's bytes: the fast
 * path of ./readOrbitFile.ts. It fills the scratch row with exactly what
 * parseOrbitExportLine (./orbitExportLine.ts) fills it with on the decoded line, field by
 * field in the same order and by the same rules, but reads numbers, the packed epoch and the
 * dates from byte ranges and makes no string for the line. It never rejects: wherever the
 * text parser would skip the line, reject it, or take a slow path (a number in exponent form,
 * an arc in days written oddly, …), `read` returns false and the caller hands the decoded
 * line to parseOrbitExportLine, so every skip and every error message comes from one place.
 *
 * Only for lines whose bytes are their characters (an all-ASCII chunk, or the latin1
 * encoding): ./lineSource.ts says which. Strings it still makes per row: the packed and the
 * readable designation (and the name when there is one); references and the letter codes
 * of U repeat and come from a small cache. Packed epochs and last-observation dates repeat
 * too: the last one of each is remembered with its Julian date.
 */
import { DAYS_PER_JULIAN_YEAR } from '../core/constants.js';
import { calendarToJd } from '../core/time/julian.js';
import { isCalendarDay } from './calendarDay.js';
import { PackedFormError } from './errors.js';
import { digitsAt, isBlankBytes, NOT_PLAIN, plainNumberAt } from './fixedFieldBytes.js';
import type { Field } from './fixedFieldRead.js';
import { ORBIT_COLUMNS as C } from './orbitExportLayout.js';
import { fillDesignation } from './orbitExportLine.js';
import { unpackEpochJd } from './packedEpoch.js';
import { semimajorAxisFromMeanMotion } from './semimajorAxis.js';
import type { OrbitRow } from './types.js';

/** Entries of the reference cache (a power of two). */
const REFERENCE_CACHE_SIZE = 256;

/**
 * The text parser's optionalNumber on bytes: NaN when the line ends before the field or it
 * is blank, the value when plain, NOT_PLAIN when the line ends inside the field or the
 * text parser must decide (an error, or Number() on an unusual form).
 */
function optionalAt(bytes: Buffer, s: number, len: number, f: Field): number {
  if (len <= f[0]) return NaN;
  if (len < f[1]) return NOT_PLAIN;
  const v = plainNumberAt(bytes, s + f[0], s + f[1]);
  return v !== v && !isBlankBytes(bytes, s + f[0], s + f[1]) ? NOT_PLAIN : v;
}

/** The text parser's requiredNumber on bytes: the value, or NOT_PLAIN (blank, cut off, …). */
function requiredAt(bytes: Buffer, s: number, len: number, f: Field): number {
  if (len < f[1]) return NOT_PLAIN;
  const v = plainNumberAt(bytes, s + f[0], s + f[1]);
  return v !== v ? NOT_PLAIN : v;
}

/** Reads orbit export lines from bytes; one per file read (its caches are per reader). */
export class OrbitExportBytesReader {
  private epochKey = -1; // the last packed epoch's five bytes, as one number
  private epochJd = NaN;
  private lastObsKey = -1; // the last date of last observation as YYYYMMDD
  private lastObsJd = NaN;
  private readonly referenceText: string[] = new Array<string>(REFERENCE_CACHE_SIZE).fill('');

  /**
   * Fills `row` from the line `bytes[start, end)` as parseOrbitExportLine would from its
   * text and returns true; or returns false, leaving `row` partly filled, when the text
   * parser must read the line (a skip, a reject, or an unusual form).
   */
  read(bytes: Buffer, start: number, end: number, row: OrbitRow): boolean {
    const s = start;
    const len = end - start;
    // not a blank or separator line: its first character is no blank, tab or dash
    if (len === 0 || bytes[s] === 32 || bytes[s] === 9 || bytes[s] === 45) return false;
    row.kind = 'asteroid';
    if (!this.readDesignation(bytes, s, len, row)) return false;
    const h = optionalAt(bytes, s, len, C.H);
    const g = optionalAt(bytes, s, len, C.G);
    if (h === NOT_PLAIN || g === NOT_PLAIN) return false;
    row.H = h;
    row.G = g;
    if (!this.readElements(bytes, s, len, row)) return false;
    row.qAu = NaN;
    row.tpJdTT = NaN;
    const u = C.U[0] < len ? bytes[s + C.U[0]] : 32;
    const digit = u >= 48 && u <= 57;
    row.uncertainty = digit ? u - 48 : NaN;
    row.uncertaintyCode = u === 32 || digit ? '' : String.fromCharCode(u);
    row.reference = this.reference(bytes, s, len);
    const nObs = optionalAt(bytes, s, len, C.nObs);
    const nOpp = optionalAt(bytes, s, len, C.nOpp);
    if (nObs === NOT_PLAIN || nOpp === NOT_PLAIN || !readArc(bytes, s, len, row)) return false;
    row.nObs = nObs;
    row.nOpp = nOpp;
    row.rmsArcsec = optionalAt(bytes, s, len, C.rms);
    return row.rmsArcsec !== NOT_PLAIN && this.readLastObs(bytes, s, len, row);
  }

  /** Packed (1–7) and readable (167–194) designations, through the text parser's rule. */
  private readDesignation(bytes: Buffer, s: number, len: number, row: OrbitRow): boolean {
    const packed = fieldTextAt(bytes, s + C.packed[0], s + Math.min(C.packed[1], len));
    if (packed === '') return false; // blank packed designation
    const readable = fieldTextAt(bytes, s + C.readable[0], s + Math.min(readableEnd(bytes, s, len), len));
    try {
      return fillDesignation(packed, readable, row);
    } catch (err) {
      if (err instanceof PackedFormError) return false;
      throw err;
    }
  }

  /** Epoch (packed, 21–25) and the elements, a from n when blank. */
  private readElements(bytes: Buffer, s: number, len: number, row: OrbitRow): boolean {
    const e0 = s + C.epoch[0];
    if (len < C.epoch[1]) return false; // the text parser rejects a cut or short epoch
    const b0 = bytes[e0], b1 = bytes[e0 + 1], b2 = bytes[e0 + 2], b3 = bytes[e0 + 3], b4 = bytes[e0 + 4];
    if (b0 <= 32 || b1 <= 32 || b2 <= 32 || b3 <= 32 || b4 <= 32) return false; // not 5 characters
    const key = (((b0 * 256 + b1) * 256 + b2) * 256 + b3) * 256 + b4; // below 2^40: exact
    if (key !== this.epochKey) {
      try {
        this.epochJd = unpackEpochJd(latin1(bytes, e0, e0 + 5));
      } catch (err) {
        if (err instanceof PackedFormError) return false;
        throw err;
      }
      this.epochKey = key;
    }
    row.epochJdTT = this.epochJd;
    row.meanAnomalyDeg = requiredAt(bytes, s, len, C.M);
    row.periDeg = requiredAt(bytes, s, len, C.peri);
    row.nodeDeg = requiredAt(bytes, s, len, C.node);
    row.iDeg = requiredAt(bytes, s, len, C.incl);
    row.e = requiredAt(bytes, s, len, C.e);
    row.meanMotionDegPerDay = optionalAt(bytes, s, len, C.n);
    row.aAu = optionalAt(bytes, s, len, C.a);
    if (row.meanAnomalyDeg === NOT_PLAIN || row.periDeg === NOT_PLAIN || row.nodeDeg === NOT_PLAIN ||
        row.iDeg === NOT_PLAIN || row.e === NOT_PLAIN || row.meanMotionDegPerDay === NOT_PLAIN || row.aAu === NOT_PLAIN) {
      return false;
    }
    if (Number.isNaN(row.aAu)) row.aAu = semimajorAxisFromMeanMotion(row.meanMotionDegPerDay);
    return !Number.isNaN(row.aAu);
  }

  /** Reference (108–116), trimmed; the same string for the same bytes from a small cache. */
  private reference(bytes: Buffer, s: number, len: number): string {
    const to = s + Math.min(C.reference[1], len);
    const a = trimStart(bytes, s + C.reference[0], to);
    const b = trimEnd(bytes, a, to);
    if (a === b) return '';
    let hash = 0x811c9dc5; // 32-bit FNV-1a (Fowler, Noll & Vo; IETF draft-eastlake-fnv)
    for (let k = a; k < b; k++) hash = Math.imul(hash ^ bytes[k], 0x01000193);
    const slot = (hash >>> 0) & (REFERENCE_CACHE_SIZE - 1);
    const cached = this.referenceText[slot];
    if (cached.length === b - a) {
      let same = true;
      for (let k = a; k < b && same; k++) same = cached.charCodeAt(k - a) === bytes[k];
      if (same) return cached;
    }
    const text = latin1(bytes, a, b);
    this.referenceText[slot] = text;
    return text;
  }

  /** Date of last observation (195–202), YYYYMMDD, blank → NaN; false where the text parser rejects it. */
  private readLastObs(bytes: Buffer, s: number, len: number, row: OrbitRow): boolean {
    row.lastObsJdTT = NaN;
    const a = C.lastObs[0];
    const b = C.lastObs[1];
    if (readableEnd(bytes, s, len) !== C.readable[1] || isBlankBytes(bytes, s + a, s + Math.min(b, len))) return true;
    if (len < b) return false;
    const year = digitsAt(bytes, s + a, s + a + 4);
    const month = digitsAt(bytes, s + a + 4, s + a + 6);
    const day = digitsAt(bytes, s + a + 6, s + a + 8);
    if (year < 0 || !isCalendarDay(year, month, day) || !isBlankBytes(bytes, s + b, s + len)) return false;
    const key = year * 10_000 + month * 100 + day;
    if (key !== this.lastObsKey) {
      this.lastObsJd = calendarToJd(year, month, day);
      this.lastObsKey = key;
    }
    row.lastObsJdTT = this.lastObsJd;
    return true;
  }
}

/**
 * Arc field (128–136): 'YYYY-YYYY' or 'N days', blank → NaN, as the text parser reads it;
 * false where it rejects the field.
 */
function readArc(bytes: Buffer, s: number, len: number, row: OrbitRow): boolean {
  row.firstObsYear = NaN;
  row.lastObsYear = NaN;
  row.arcDays = NaN;
  const a = C.arc[0];
  const b = C.arc[1];
  if (isBlankBytes(bytes, s + a, s + Math.min(b, len))) return true;
  const first = a + 4 <= len ? digitsAt(bytes, s + a, s + a + 4) : -1;
  const last = a + 4 < len && bytes[s + a + 4] === 45 && b <= len ? digitsAt(bytes, s + a + 5, s + b) : -1; // '-'
  if (first >= 0 && last >= 0) {
    row.firstObsYear = first;
    row.lastObsYear = last;
    row.arcDays = (last - first) * DAYS_PER_JULIAN_YEAR;
    return true;
  }
  // 'N days': digits, one blank, 'days' (the text parser's /^(\d+) days$/ on the trimmed field)
  const ta = trimStart(bytes, s + a, s + Math.min(b, len));
  const tb = trimEnd(bytes, ta, s + Math.min(b, len));
  const digitsEnd = tb - 5;
  if (digitsEnd <= ta || bytes[digitsEnd] !== 32 || bytes[digitsEnd + 1] !== 100 || bytes[digitsEnd + 2] !== 97 ||
      bytes[digitsEnd + 3] !== 121 || bytes[digitsEnd + 4] !== 115) {
    return false;
  }
  const days = digitsAt(bytes, ta, digitsEnd);
  if (days < 0) return false;
  row.arcDays = days;
  return true;
}

/**
 * End of the readable designation (0-based column): 194, or the end of the line when the
 * text runs across the 194|195 boundary without a blank (as the text parser decides it).
 */
function readableEnd(bytes: Buffer, s: number, len: number): number {
  const b = C.readable[1];
  return len > b && bytes[s + b - 1] !== 32 && bytes[s + b] !== 32 ? len : b;
}

/** First position in [from, to) of a byte above 32 (fieldText's trim), or `from` ≥ `to`. */
function trimStart(bytes: Buffer, from: number, to: number): number {
  let a = from;
  while (a < to && bytes[a] <= 32) a++;
  return a;
}

/** End of [from, to) with bytes ≤ 32 dropped from the end; `from` when nothing is left. */
function trimEnd(bytes: Buffer, from: number, to: number): number {
  let b = to;
  while (b > from && bytes[b - 1] <= 32) b--;
  return b > from ? b : from;
}

/** fieldText over bytes [from, to): the text with bytes ≤ 32 dropped at both ends, or ''. */
function fieldTextAt(bytes: Buffer, from: number, to: number): string {
  const a = trimStart(bytes, from, to);
  const b = trimEnd(bytes, a, to);
  return a < b ? latin1(bytes, a, b) : '';
}

/** The latin1 text of bytes [from, to): one character a byte. */
function latin1(bytes: Buffer, from: number, to: number): string {
  return bytes.toString('latin1', from, to);
}
