/**
 * An immutable instant that carries its time scale, held as a two-part Julian date
 * (jd1 = the midnight that starts the day, ending in .5; jd2 = fraction of that day in
 * [0, 1)) so that sub-microsecond precision survives at any epoch.
 *
 * Conversions go UTC ↔ TAI ↔ TT ↔ TDB with the offsets of timeScales.ts. For UTC on a day
 * that ends with a leap second, jd2 is the fraction of an 86 401 s day (IAU SOFA convention).
 * UT1 is not modelled: the frames take UT1 ≈ UTC (|UT1 − UTC| < 0.9 s by IERS rule).
 */
import type { TimeScale } from '../types.js';
import { MJD_OFFSET, SECONDS_PER_DAY } from '../constants.js';
import { calendarToJd, jdToCalendar } from './julian.js';
import { FIRST_LEAP_MJD_UTC, taiMinusUtcSeconds } from './leapSeconds.js';
import { parseIsoDateTime, TimeFormatError } from './isoTime.js';
import { TT_MINUS_TAI_S, tdbMinusTtSeconds, utcDayLengthSeconds, utcFractionToTai } from './timeScales.js';

const SCALES: readonly TimeScale[] = ['UTC', 'TAI', 'TT', 'TDB'];

function checkScale(scale: TimeScale): void {
  if (!SCALES.includes(scale)) throw new TypeError(`unknown time scale '${String(scale)}'`);
}

/** Seconds of the day length used for clock times in `scale` on the day starting at `midnightJd`. */
function dayLengthSeconds(midnightJd: number, scale: TimeScale): number {
  return scale === 'UTC' ? utcDayLengthSeconds(midnightJd) : SECONDS_PER_DAY;
}

export class Instant {
  /** Midnight Julian date starting the day (ends in .5). */
  readonly jd1: number;
  /** Fraction of that day, 0 ≤ jd2 < 1. */
  readonly jd2: number;
  readonly scale: TimeScale;

  private constructor(jd1: number, jd2: number, scale: TimeScale) {
    if (!Number.isFinite(jd1) || !Number.isFinite(jd2)) {
      throw new RangeError(`Instant: non-finite Julian date parts ${jd1}, ${jd2}`);
    }
    checkScale(scale);
    // Normalise: jd1 - 0.5 and subtracting floor() are exact in binary floating point.
    let whole = Math.floor(jd1 - 0.5);
    let frac = jd1 - 0.5 - whole + jd2;
    const k = Math.floor(frac);
    whole += k;
    frac -= k;
    this.jd1 = whole + 0.5;
    this.jd2 = frac;
    this.scale = scale;
    Object.freeze(this);
  }

  /** Instant from a two-part Julian date (any split, e.g. 2400000.5 + MJD). */
  static fromJdParts(jd1: number, jd2: number, scale: TimeScale): Instant {
    return new Instant(jd1, jd2, scale);
  }

  static fromJd(jd: number, scale: TimeScale): Instant {
    return new Instant(jd, 0, scale);
  }

  static fromMjd(mjd: number, scale: TimeScale): Instant {
    return new Instant(MJD_OFFSET, mjd, scale);
  }

  /**
   * Instant from a calendar date whose day carries a fraction (as readers meet it:
   * "2026 06 09.51234"). In UTC the fraction is of that day's length (SOFA convention).
   */
  static fromCalendar(year: number, month: number, dayWithFraction: number, scale: TimeScale): Instant {
    const dayInt = Math.floor(dayWithFraction);
    return new Instant(calendarToJd(year, month, dayInt), dayWithFraction - dayInt, scale);
  }

  /** Instant from a calendar day and seconds since its midnight (60.x allowed on a UTC leap-second day). */
  static fromCalendarSeconds(year: number, month: number, day: number, secondsOfDay: number, scale: TimeScale): Instant {
    const midnight = calendarToJd(year, month, day);
    const length = dayLengthSeconds(midnight, scale);
    if (!(secondsOfDay >= 0 && secondsOfDay < length)) {
      throw new RangeError(`Instant: ${secondsOfDay} s is outside the ${length} s ${scale} day ${year}-${month}-${day}`);
    }
    return new Instant(midnight, secondsOfDay / length, scale);
  }

  /**
   * Instant from ISO 8601 text (isoTime.ts). A 'Z' or scale word in the text wins; otherwise
   * `defaultScale`. Bad text: TimeFormatError.
   */
  static parse(text: string, defaultScale: TimeScale = 'UTC'): Instant {
    const p = parseIsoDateTime(text);
    const scale = p.scale ?? defaultScale;
    if (Number.isNaN(p.secondsOfDay)) return Instant.fromCalendar(p.year, p.month, p.day + p.dayFraction, scale);
    const midnight = calendarToJd(p.year, p.month, p.day);
    const length = dayLengthSeconds(midnight, scale);
    if (p.secondsOfDay >= length) throw new TimeFormatError(text, `second 60 on a ${scale} day without a leap second`);
    return new Instant(midnight, p.secondsOfDay / length, scale);
  }

  /** Single Julian date (precision about 20 µs near the present). */
  get jd(): number {
    return this.jd1 + this.jd2;
  }

  get mjd(): number {
    return this.jd1 - MJD_OFFSET + this.jd2;
  }

  /** The same instant in another scale. */
  to(scale: TimeScale): Instant {
    checkScale(scale);
    if (scale === this.scale) return this;
    if (scale === 'UTC') return taiToUtc(this.toTai());
    const tai = this.toTai();
    if (scale === 'TAI') return tai;
    const tt = new Instant(tai.jd1, tai.jd2 + TT_MINUS_TAI_S / SECONDS_PER_DAY, 'TT');
    if (scale === 'TT') return tt;
    return new Instant(tt.jd1, tt.jd2 + tdbMinusTtSeconds(tt.jd) / SECONDS_PER_DAY, 'TDB');
  }

  private toTai(): Instant {
    switch (this.scale) {
      case 'TAI':
        return this;
      case 'UTC':
        return new Instant(this.jd1, utcFractionToTai(this.jd1, this.jd2), 'TAI');
      case 'TT':
        return new Instant(this.jd1, this.jd2 - TT_MINUS_TAI_S / SECONDS_PER_DAY, 'TAI');
      case 'TDB': {
        // TT = TDB − (TDB − TT)(TT); evaluating the series at TDB instead errs below 1e-12 s.
        const dt = tdbMinusTtSeconds(this.jd);
        return new Instant(this.jd1, this.jd2 - (dt + TT_MINUS_TAI_S) / SECONDS_PER_DAY, 'TAI');
      }
    }
  }

  /** SI seconds from `other` to this instant (positive when this is later). */
  secondsSince(other: Instant): number {
    const scale: TimeScale = this.scale === 'TDB' || other.scale === 'TDB' ? 'TDB' : 'TAI';
    const a = this.to(scale);
    const b = other.to(scale);
    return ((a.jd1 - b.jd1) + (a.jd2 - b.jd2)) * SECONDS_PER_DAY;
  }

  /** This instant moved by `seconds` SI seconds; UTC moves through TAI so leap seconds count. */
  plusSeconds(seconds: number): Instant {
    if (this.scale === 'UTC') return this.to('TAI').plusSeconds(seconds).to('UTC');
    return new Instant(this.jd1, this.jd2 + seconds / SECONDS_PER_DAY, this.scale);
  }

  /** Calendar day and seconds of day in this instant's scale. */
  toCalendarSeconds(): { year: number; month: number; day: number; secondsOfDay: number } {
    const c = jdToCalendar(this.jd1);
    return { year: c.year, month: c.month, day: Math.round(c.day), secondsOfDay: this.jd2 * dayLengthSeconds(this.jd1, this.scale) };
  }

  /** ISO 8601 text, 'Z' for UTC and a scale word otherwise; seconds rounded to `fractionDigits`. */
  toIso(fractionDigits = 3): string {
    if (!Number.isInteger(fractionDigits) || fractionDigits < 0 || fractionDigits > 9) {
      throw new RangeError(`toIso: fractionDigits ${fractionDigits} not an integer 0..9`);
    }
    const scale10 = 10 ** fractionDigits;
    let mid = this.jd1;
    let ticks = Math.round(this.jd2 * dayLengthSeconds(mid, this.scale) * scale10);
    if (ticks >= dayLengthSeconds(mid, this.scale) * scale10) {
      ticks -= dayLengthSeconds(mid, this.scale) * scale10;
      mid += 1;
    }
    const c = jdToCalendar(mid);
    const secTicks = ticks % (60 * scale10);
    const minutesTotal = (ticks - secTicks) / (60 * scale10);
    // A leap second shows as 23:59:60: minutes stop at 1439.
    const minutes = Math.min(minutesTotal, 1439);
    const secondsTicks = secTicks + (minutesTotal - minutes) * 60 * scale10;
    const p2 = (n: number) => String(n).padStart(2, '0');
    const whole = Math.floor(secondsTicks / scale10);
    const fracText = fractionDigits > 0 ? '.' + String(secondsTicks - whole * scale10).padStart(fractionDigits, '0') : '';
    // Years before 1 (astronomical numbering, 0 = 1 BC) as a minus sign and four digits,
    // the expanded year form of ISO 8601 (from memory), which parse() reads back.
    const year = c.year < 0 ? '-' + String(-c.year).padStart(4, '0') : String(c.year).padStart(4, '0');
    const date = `${year}-${p2(c.month)}-${p2(Math.round(c.day))}`;
    const clock = `${p2(Math.floor(minutes / 60))}:${p2(minutes % 60)}:${p2(whole)}${fracText}`;
    return `${date}T${clock}${this.scale === 'UTC' ? 'Z' : ' ' + this.scale}`;
  }
}

/** TAI residual (s) below which the TAI → UTC iteration has converged: 1 ns (common practice). */
const TAI_TO_UTC_TOLERANCE_S = 1e-9;

/**
 * TAI → UTC by fixed-point iteration on utcFractionToTai (as SOFA taiutc does); 3 passes,
 * then the result is checked and a residual above 1 ns fails loudly with the state.
 */
function taiToUtc(tai: Instant): Instant {
  let mid = tai.jd1;
  // First guess from TAI−UTC at the TAI date (clamped into the table); the loop corrects it.
  let frac = tai.jd2 - taiMinusUtcSeconds(Math.max(tai.mjd, FIRST_LEAP_MJD_UTC)) / SECONDS_PER_DAY;
  for (let pass = 0; pass < 3; pass++) {
    const u = Instant.fromJdParts(mid, frac, 'UTC');
    const target = tai.jd1 - u.jd1 + tai.jd2; // TAI as a fraction relative to u's midnight
    frac = u.jd2 + (target - utcFractionToTai(u.jd1, u.jd2)) * (SECONDS_PER_DAY / utcDayLengthSeconds(u.jd1));
    mid = u.jd1;
  }
  const utc = Instant.fromJdParts(mid, frac, 'UTC');
  const residualS = (tai.jd1 - utc.jd1 + tai.jd2 - utcFractionToTai(utc.jd1, utc.jd2)) * SECONDS_PER_DAY;
  if (!(Math.abs(residualS) <= TAI_TO_UTC_TOLERANCE_S)) {
    throw new Error(
      `TAI → UTC did not converge: TAI ${tai.jd1} + ${tai.jd2}, UTC ${utc.jd1} + ${utc.jd2}, residual ${residualS} s after 3 passes`,
    );
  }
  return utc;
}
