/**
 * Calendar-day checks against the JavaScript Date object (ECMA-262 §21.4, from memory: a
 * proleptic Gregorian calendar; Date.UTC rolls a day past a month's end into the next
 * month, so a day is valid exactly when it survives the round trip), over 1583–2199 where
 * the readers' calendar is Gregorian; and the Julian leap rule before 1583 (common practice).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellJd, daysInMonth, isCalendarDay } from '../../src/io/index.js';
import { isoToJd } from './fixtureCases.js';

/** Day-of-month survives Date.UTC: the ECMA-262 reference check. */
function dateAgrees(year: number, month: number, day: number): boolean {
  const d = new Date(Date.UTC(year, month - 1, day));
  return d.getUTCFullYear() === year && d.getUTCMonth() === month - 1 && d.getUTCDate() === day;
}

describe('calendar days', () => {
  it('agree with the JavaScript Date object for every whole day tried, 1583–2199 (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1583, max: 2199 }), fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 31 }),
      (y, m, d) => isCalendarDay(y, m, d) === dateAgrees(y, m, d)), { numRuns: 5000 });
  });

  it.each([
    [2024, 2, 29], [2000, 2, 29], [2026, 6, 30], [2026, 12, 31], [1500, 2, 29], // 1500: Julian leap year
  ])('accepts %d-%d-%d', (y, m, d) => {
    expect(isCalendarDay(y, m, d)).toBe(true);
  });

  it.each([
    [2023, 2, 29], [1900, 2, 29], [2026, 2, 30], [2026, 4, 31], [2026, 6, 31], [2026, 13, 1], [2026, 0, 1], [2026, 1, 0],
  ])('rejects %d-%d-%d', (y, m, d) => {
    expect(isCalendarDay(y, m, d)).toBe(false);
  });

  it('takes a fractional day up to the end of the month', () => {
    expect(isCalendarDay(1997, 3, 31.9999)).toBe(true); // a perihelion day
    expect(isCalendarDay(1997, 2, 28.5)).toBe(true);
    expect(isCalendarDay(1997, 2, 29.0342)).toBe(false);
    expect(daysInMonth(2024, 2)).toBe(29);
  });

  it.each(['2026-02-30', '2023-02-29', '2026-04-31T00:00:00Z', '20260631', '2026-02-29.5', '2026-06-09T24:30:00'])(
    'CSV date cell %j is bad data, not next month (rolling over is what calendarToJd does)', (text) => {
      expect(() => cellJd(text)).toThrow('not a calendar date');
    });

  it('CSV time 24:00:00 is the end of the day (ISO 8601, from memory): the next day at 0h by astronomy-engine', () => {
    expect(cellJd('2026-06-09T24:00:00')).toBe(isoToJd('2026-06-10'));
  });
});
