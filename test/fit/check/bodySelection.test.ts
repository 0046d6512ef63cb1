// The designation's records of a file and the ones set aside (src/fit/check/bodySelection.ts),
// on invented records (a synthetic test: designations, times and stations made up here).
import { describe, expect, it } from 'vitest';
import { EARLIEST_JD_UTC, selectBody } from '../../../src/fit/check/bodySelection.js';
import type { AstrometryObservation } from '../../../src/io/astrometry/types.js';

const LATEST = 2461400.5;

function obs(line: number, designation: string, timeJdUtc: number, station = 'F51', extra: Partial<AstrometryObservation> = {}): AstrometryObservation {
  return {
    designation, packed: designation, number: NaN, provisional: '', temporary: false, timeJdUtc, timeJdTT: timeJdUtc + 0.0008,
    raRad: 1, decRad: 0.1, raDecimals: 3, decDecimals: 2, raResolutionArcsec: 0.015, decResolutionArcsec: 0.01,
    sigmaRaCosDecArcsec: NaN, sigmaDecArcsec: NaN, correlationRaDec: NaN, station, kind: 'optical', observerGeocentricKm: null,
    rovingSite: null, mag: NaN, band: '', note1: '', note2: 'C', mode: '', catalogue: '', discovery: false, file: 'f.txt', line, lines: 1,
    ...extra,
  };
}

describe('selectBody', () => {
  it('keeps the designation’s records in input order and counts the others by designation', () => {
    const all = [obs(1, '2030 QW12', 2460000.5), obs(2, '2001 AB', 2460000.6), obs(3, '2030 QW12', 2460001.5), obs(4, '2001 AB', 2460002.5), obs(5, '1999 XY', 2460003.5)];
    const s = selectBody(all, '2030 QW12', LATEST);
    expect(s.observations.map((o) => o.line)).toEqual([1, 3]);
    expect(s.others).toEqual([{ designation: '2001 AB', observations: 2 }, { designation: '1999 XY', observations: 1 }]);
    expect(s.setAside).toEqual([]);
  });

  it('matches a bare number, the packed form, and the provisional designation tied to a number', () => {
    const numbered = obs(1, '(12893)', 2460000.5, 'F51', { number: 12893, packed: '12893', provisional: '1994 CA1' });
    const provisionalOnly = obs(2, '1994 CA1', 2460001.5, 'F51', { packed: 'J94C01A', provisional: '1994 CA1' });
    const other = obs(3, '(1)', 2460001.5, 'F51', { number: 1, packed: '00001' });
    for (const name of ['12893', '(12893)', '1994 CA1', 'J94C01A', '  12893 ']) {
      expect(selectBody([numbered, provisionalOnly, other], name, LATEST).observations.map((o) => o.line), name).toEqual([1, 2]);
    }
  });

  it('sets aside dates before 1800 and after the latest accepted, and a second record of a station at the same instant', () => {
    const all = [
      obs(1, 'X', 2460000.5), obs(2, 'X', EARLIEST_JD_UTC - 1), obs(3, 'X', LATEST + 0.25),
      obs(4, 'X', 2460000.5), obs(5, 'X', 2460000.5, 'G96'),
    ];
    const s = selectBody(all, 'X', LATEST);
    expect(s.observations.map((o) => o.line)).toEqual([1, 5]); // G96 at the same instant is another observation
    expect(s.setAside.map((e) => e.message)).toEqual([
      `f.txt:2: date JD ${EARLIEST_JD_UTC - 1} (UTC) is before 1800`,
      `f.txt:3: date JD ${LATEST + 0.25} (UTC) is after the latest date accepted, JD ${LATEST}`,
      'f.txt:4: duplicate of line 1: the same station F51 at the same time',
    ]);
  });

  it('refuses a latest date before 1800 (caller misuse)', () => {
    expect(() => selectBody([], 'X', EARLIEST_JD_UTC - 10)).toThrow(RangeError);
  });
});
