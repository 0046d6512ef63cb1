/**
 * Packed dates: the worked examples K2669 = 2026-06-09 (the epoch of the real sample) and
 * the epochs of the sample's one-opposition lines, a property-based round trip over
 * 1800–2199 with the Julian dates checked against astronomy-engine (a general-purpose
 * reference library), and invalid forms with their reasons.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { packDate, packEpochJd, PackedFormError, unpackEpochJd } from '../../src/io/index.js';
import { isoToJd } from './fixtureCases.js';

describe('packed dates', () => {
  it.each([
    ['K2669', '2026-06-09'], // published description of the packed date form, from memory; the sample epoch
    ['J949P', '1994-09-25'], ['J94AF', '1994-10-15'], ['J99CS', '1999-12-28'], // real sample lines
    ['I0011', '1800-01-01'], ['K00C1', '2000-12-01'], ['K2422', '2024-02-02'], ['K242T', '2024-02-29'],
  ])('%s = %s', (packed, iso) => {
    expect(unpackEpochJd(packed)).toBe(isoToJd(iso));
    expect(packEpochJd(isoToJd(iso))).toBe(packed);
  });

  it('round-trips every day 1800–2199 and agrees with astronomy-engine (property)', () => {
    let worstDays = 0;
    fc.assert(fc.property(fc.date({ min: new Date('1800-01-01T00:00:00Z'), max: new Date('2199-12-31T00:00:00Z'), noInvalidDate: true }), (d) => {
      const y = d.getUTCFullYear();
      const m = d.getUTCMonth() + 1;
      const day = d.getUTCDate();
      const packed = packDate(y, m, day);
      const jd = unpackEpochJd(packed);
      const iso = `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
      worstDays = Math.max(worstDays, Math.abs(jd - isoToJd(iso)));
      return packEpochJd(jd) === packed && jd === isoToJd(iso);
    }), { numRuns: 3000 });
    console.log(`packed dates vs astronomy-engine: worst difference ${(worstDays * 86400).toFixed(6)} s`);
  });

  it.each([
    ['K26D9', 'packed date has a month outside 1..9, A..C'],
    ['K2620', 'packed date has a day outside its month'],
    ['K232T', 'packed date has a day outside its month'], // 2023 Feb 29: not a leap year
    ['K262U', 'packed date has a day outside its month'], // Feb 30
    ['M2669', 'packed date has no century letter I..L and year'],
    ['K266', 'packed date is not 5 characters'],
  ])('rejects %s: %s', (packed, reason) => {
    expect(() => unpackEpochJd(packed)).toThrow(new PackedFormError(reason, packed).message);
  });

  it('refuses epochs that are not at 0h (the form carries whole days)', () => {
    expect(() => packEpochJd(isoToJd('2026-06-09') + 0.5)).toThrow(RangeError);
  });
});
