// Calendar ↔ Julian date against Meeus, Astronomical Algorithms, 2nd ed. (1998), ch. 7:
// examples 7.a–7.d and the table of JDs on p. 62 (values from memory of the book), and
// against the general-purpose astronomia library (julian module, Meeus' algorithms ported).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { julian } from 'astronomia';
import { calendarToJd, jdToCalendar } from '../../src/core/time/julian.js';
import { jdToMjd, mjdToJd } from '../../src/core/time/readerEpochs.js';
import { daysInMonth } from '../../src/core/time/isoTime.js';

// Meeus p. 62 table, plus examples 7.a and 7.b. From memory of the book.
const MEEUS_TABLE: ReadonlyArray<readonly [number, number, number, number]> = [
  [1957, 10, 4.81, 2436116.31], // example 7.a (launch of Sputnik 1)
  [333, 1, 27.5, 1842713.0], // example 7.b
  [2000, 1, 1.5, 2451545.0],
  [1999, 1, 1.0, 2451179.5],
  [1987, 1, 27.0, 2446822.5],
  [1987, 6, 19.5, 2446966.0],
  [1988, 1, 27.0, 2447187.5],
  [1988, 6, 19.5, 2447332.0],
  [1900, 1, 1.0, 2415020.5],
  [1600, 1, 1.0, 2305447.5],
  [1600, 12, 31.0, 2305812.5],
  [837, 4, 10.3, 2026871.8],
  [-123, 12, 31.0, 1676496.5],
  [-122, 1, 1.0, 1676497.5],
  [-1000, 7, 12.5, 1356001.0],
  [-1000, 2, 29.0, 1355866.5],
  [-1001, 8, 17.9, 1355671.4],
  [-4712, 1, 1.5, 0.0],
];

describe('Julian dates (Meeus ch. 7)', () => {
  it('calendar → JD matches the worked examples and the p. 62 table', () => {
    let worstDays = 0;
    for (const [y, m, d, jd] of MEEUS_TABLE) {
      const err = Math.abs(calendarToJd(y, m, d) - jd);
      worstDays = Math.max(worstDays, err);
      // Book values carry 1–2 decimals; 1e-6 d (0.09 s) covers float rounding of d.dd inputs.
      expect(err, `${y}-${m}-${d}`).toBeLessThan(1e-6);
    }
    console.log(`Meeus ch. 7 calendar→JD: worst error ${(worstDays * 86400).toExponential(2)} s`);
  });

  it('JD → calendar inverts the table (example 7.c: JD 2436116.31 = 1957 Oct 4.81)', () => {
    for (const [y, m, d, jd] of MEEUS_TABLE) {
      const c = jdToCalendar(jd);
      expect([c.year, c.month]).toEqual([y, m]);
      expect(Math.abs(c.day - d)).toBeLessThan(1e-6);
    }
  });

  it('Halley perihelia 1910 Apr 20 → 1986 Feb 9 are 27 689 days apart (Meeus example 7.d)', () => {
    expect(calendarToJd(1986, 2, 9) - calendarToJd(1910, 4, 20)).toBe(27689);
  });

  it('Gregorian reform: 1582 Oct 4 (Julian) is followed by 1582 Oct 15 (Meeus ch. 7, common practice)', () => {
    expect(calendarToJd(1582, 10, 15) - calendarToJd(1582, 10, 4)).toBe(1);
  });

  it('month lengths follow the calendar of the date: Feb 1900 28 d, Feb 2000 29 d, Feb 1500 29 d (Julian rule), Oct 1582 21 d (common practice)', () => {
    expect(daysInMonth(1900, 2)).toBe(28);
    expect(daysInMonth(2000, 2)).toBe(29);
    expect(daysInMonth(1500, 2)).toBe(29);
    expect(daysInMonth(1582, 10)).toBe(21); // Oct 5–14 never happened
    expect(daysInMonth(2026, 12)).toBe(31);
  });

  it('MJD 0 is 1858 Nov 17.0 (IAU 1997 Resolution B1)', () => {
    expect(jdToMjd(calendarToJd(1858, 11, 17))).toBe(0);
    expect(mjdToJd(61200)).toBe(2461200.5);
  });

  it('round trip JD → calendar → JD (property, 1e-8 d = 0.9 ms)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 5_000_000, noNaN: true }), (jd) => {
        const c = jdToCalendar(jd);
        expect(Math.abs(calendarToJd(c.year, c.month, c.day) - jd)).toBeLessThan(1e-8);
      }),
      { numRuns: 2000, seed: 7 },
    );
  });

  it('agrees with astronomia julian.CalendarGregorianToJD / CalendarJulianToJD (property)', () => {
    let worst = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: -4000, max: 4000 }),
        fc.integer({ min: 1, max: 12 }),
        fc.double({ min: 1, max: 28.999, noNaN: true }),
        (y, m, d) => {
          const gregorian = y > 1582 || (y === 1582 && m > 10);
          const ref = gregorian ? julian.CalendarGregorianToJD(y, m, d) : julian.CalendarJulianToJD(y, m, d);
          const err = Math.abs(calendarToJd(y, m, d) - ref);
          worst = Math.max(worst, err);
          expect(err).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 2000, seed: 11 },
    );
    console.log(`calendar→JD vs astronomia: worst ${(worst * 86400).toExponential(2)} s`);
  });

  it('refuses non-finite input with RangeError', () => {
    expect(() => calendarToJd(2000, NaN, 1)).toThrow(RangeError);
    expect(() => jdToCalendar(-1)).toThrow(RangeError);
    // Month 13 used to fold silently into January of the next year (eq. 7.1 allows it).
    expect(() => calendarToJd(2020, 13, 1)).toThrow(/month an integer 1\.\.12/);
    expect(() => calendarToJd(2020, 0, 1)).toThrow(RangeError);
    expect(() => calendarToJd(2020.5, 6, 1)).toThrow(RangeError);
  });
});
