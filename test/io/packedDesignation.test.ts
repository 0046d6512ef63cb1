/**
 * Packed ↔ readable designations, checked against
 * - worked examples of the published description of the packed designation forms
 *   (marked "from memory" where recalled rather than read),
 * - the real sample lines in test/fixtures/orbit-export and test/fixtures/comet-export
 *   (stored gzip-compressed, read through gunzipSync)
 *   (packed columns 1–7 against the readable designation written on the same line),
 * - property-based round trips (fast-check) over the whole number range and provisional space.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  MAX_PACKED_NUMBER, PackedFormError, packDesignation, packNumber, unpackDesignation, unpackNumber,
} from '../../src/io/index.js';
import { readFixtureText } from './fixtureCases.js';

const FIXTURES = new URL('../fixtures/', import.meta.url);

describe('permanent numbers', () => {
  // Published description of the packed form; values from memory.
  const cases: [string, number][] = [
    ['00001', 1], ['99999', 99_999], ['A0000', 100_000], ['A9999', 109_999], ['Z9999', 359_999],
    ['a0000', 360_000], ['z9999', 619_999], ['~0000', 620_000], ['~000z', 620_061],
    ['~0010', 620_062], ['~zzzz', 15_396_335],
  ];
  it.each(cases)('%s = %d', (packed, n) => {
    expect(unpackNumber(packed)).toBe(n);
    expect(packNumber(n)).toBe(packed);
    expect(unpackDesignation(packed)).toBe(`(${n})`);
    expect(packDesignation(`(${n})`)).toBe(packed);
  });

  it('round-trips every number 1..MAX_PACKED_NUMBER (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: MAX_PACKED_NUMBER }), (n) => {
      const p = packNumber(n);
      return p.length === 5 && unpackNumber(p) === n;
    }), { numRuns: 5000 });
  });

  it('packs numbers in increasing order within each form (property)', () => {
    // common practice: the letter prefix and base-62 digits keep ASCII order = number order
    // inside each of the three forms
    fc.assert(fc.property(fc.integer({ min: 1, max: MAX_PACKED_NUMBER - 1 }), (n) => {
      const a = packNumber(n);
      const b = packNumber(n + 1);
      return a[0] === '~' ? b > a : b[0] === '~' || b > a;
    }), { numRuns: 3000 });
  });

  it('rejects numbers outside the packed range', () => {
    expect(() => packNumber(0)).toThrow(RangeError);
    expect(() => packNumber(MAX_PACKED_NUMBER + 1)).toThrow(RangeError);
    expect(() => packDesignation('(15396336)')).toThrow(PackedFormError);
  });
});

describe('provisional designations', () => {
  // Published description of the packed provisional form; examples from memory.
  const cases: [string, string][] = [
    ['J95X00A', '1995 XA'], ['J95X01L', '1995 XL1'], ['J95F13B', '1995 FB13'],
    ['J98SA8Q', '1998 SQ108'], ['J98SC7V', '1998 SV127'], ['J98SG2S', '1998 SS162'],
    ['K99AJ3Z', '2099 AZ193'], ['K08Aa0A', '2008 AA360'], ['K07Tf8A', '2007 TA418'],
    ['K19E05U', '2019 EU5'], ['I99A00A', '1899 AA'],
    // survey designations, from memory of the same description
    ['PLS2040', '2040 P-L'], ['T1S3138', '3138 T-1'], ['T2S1010', '1010 T-2'], ['T3S4101', '4101 T-3'],
    // extended form: the real sample lines (test/fixtures/orbit-export), see below
    ['_EW002J', '2014 WT625'], ['_EW002K', '2014 WU625'], ['_EW002N', '2014 WX625'],
  ];
  it.each(cases)('%s = %s', (packed, readable) => {
    expect(unpackDesignation(packed)).toBe(readable);
    expect(packDesignation(readable)).toBe(packed);
  });

  const halfMonth = fc.constantFrom(...'ABCDEFGHJKLMNOPQRSTUVWXY');
  const second = fc.constantFrom(...'ABCDEFGHJKLMNOPQRSTUVWXYZ');

  it('round-trips the standard space 1800–2199, cycles 0–619 (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1800, max: 2199 }), halfMonth, second, fc.integer({ min: 0, max: 619 }),
      (year, h, l, cycle) => {
        const readable = `${year} ${h}${l}${cycle > 0 ? cycle : ''}`;
        const packed = packDesignation(readable);
        return packed.length === 7 && /^[I-L]\d\d[A-Y][0-9A-Za-z]\d[A-Z]$/.test(packed) &&
          unpackDesignation(packed) === readable;
      }), { numRuns: 5000 });
  });

  it('round-trips the extended space 2000–2061, cycles 620 and beyond (property)', () => {
    const maxCycle = 620 + Math.floor((62 ** 4 - 1) / 25) - 1;
    fc.assert(fc.property(fc.integer({ min: 2000, max: 2061 }), halfMonth, second, fc.integer({ min: 620, max: maxCycle }),
      (year, h, l, cycle) => {
        const readable = `${year} ${h}${l}${cycle}`;
        const packed = packDesignation(readable);
        return packed.length === 7 && packed[0] === '_' && unpackDesignation(packed) === readable;
      }), { numRuns: 5000 });
  });

  it('round-trips any valid 7-character packed provisional (property, packed side)', () => {
    const digit62 = fc.constantFrom(...'0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz');
    const d = fc.constantFrom(...'0123456789');
    fc.assert(fc.property(fc.constantFrom('I', 'J', 'K', 'L'), d, d, halfMonth, digit62, d, second,
      (...chars) => {
        const packed = chars.join('');
        return packDesignation(unpackDesignation(packed)) === packed;
      }), { numRuns: 5000 });
  });

  it.each([
    ['K19I05U', 'unknown packed designation form'], // I is not a half-month letter
    ['K19E05I', 'unknown packed designation form'], // I is not a second letter
    ['M19E05U', 'unknown packed designation form'], // no century M in the packed form
    ['00000', 'unknown packed designation form'],
    ['K19E05', 'unknown packed designation form'],
    ['', 'unknown packed designation form'],
  ])('rejects packed %j with a reason', (packed, reason) => {
    expect(() => unpackDesignation(packed)).toThrow(new PackedFormError(reason, packed).message);
  });

  it.each(['2019 IU5', '2019 EU05', 'ceres', '2230 AB'])('rejects readable %j with a reason', (readable) => {
    expect(() => packDesignation(readable)).toThrow(`designation in no packable form: '${readable}'`);
  });
});

describe('comet designations', () => {
  const cases: [string, string][] = [
    ['CJ95O010', 'C/1995 O1'], // published description, from memory
    ['PJ30J010', 'P/1930 J1'], // from memory
    ['DJ93F02b', 'D/1993 F2-B'], // fragment, from memory
    ['0001P', '1P'], ['0002P', '2P'], ['0001I', '1I'], // periodic numbers, from memory
    ['0073P      b', '73P-B'], ['0073P     aa', '73P-AA'], // numbered fragments, placement from memory
    ['PK04V05a', 'P/2004 V5-A'], ['PK04FE0Y', 'P/2004 FY140'], ['CJ42E00A', 'C/1942 EA'], // real sample
  ];
  it.each(cases)('%s = %s', (packed, readable) => {
    expect(unpackDesignation(packed)).toBe(readable);
    expect(packDesignation(readable)).toBe(packed);
  });

  it('drops names when packing', () => {
    expect(packDesignation('1P/Halley')).toBe('0001P');
    expect(packDesignation('C/1995 O1 (Hale-Bopp)')).toBe('CJ95O010');
  });
});

/** Real sample lines, fixed-width: packed columns against the readable columns. */
describe('real sample lines', () => {
  it('orbit export: packed 1–7 unpacks to the readable designation 167–194', () => {
    const lines = readFixtureText(new URL('orbit-export/orbits-export-sample.txt.gz', FIXTURES)).split('\n');
    let checked = 0;
    for (const line of lines) {
      const packed = line.slice(0, 7).trim();
      const readable = line.slice(166).replace(/\s+\d{8}$/, '').trim();
      if (packed === '' || readable === '') continue;
      const unpacked = unpackDesignation(packed);
      // numbered bodies carry '(N) Name' in the readable columns
      expect(readable.startsWith(unpacked), `${packed} → ${unpacked} vs '${readable}'`).toBe(true);
      expect(packDesignation(readable)).toBe(packed);
      checked++;
    }
    expect(checked).toBe(258);
  });

  it('comet export: packed 1–12 unpacks to the designation in 103–158', () => {
    const lines = readFixtureText(new URL('comet-export/comets-export-sample.txt.gz', FIXTURES)).split('\n');
    let checked = 0;
    for (const line of lines) {
      if (line.trim() === '') continue;
      const packed = line.slice(0, 4).trim() !== '' ? line.slice(0, 5) : line.slice(4, 12);
      const readable = line.slice(102, 158).trim();
      expect(readable.startsWith(unpackDesignation(packed)), `${packed} vs '${readable}'`).toBe(true);
      expect(packDesignation(readable)).toBe(packed);
      checked++;
    }
    expect(checked).toBe(100);
  });
});
