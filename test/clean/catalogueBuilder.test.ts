import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { CatalogueBuilder } from '../../src/clean/catalogueBuilder.js';
import { qualityNames } from '../../src/clean/types.js';
import { GAUSS_K, RAD_PER_DEG } from '../../src/core/constants.js';
import { asteroidRow, cometRow } from './rowFactory.js';

describe('CatalogueBuilder', () => {
  it('derives q and perihelion time from a and M (q = a(1−e), n = k a^−3/2: Danby 1992 §6.3)', () => {
    const b = new CatalogueBuilder();
    b.add(asteroidRow({ aAu: 2.6, e: 0.12, meanAnomalyDeg: 30 }), 'f', 1, 'raw');
    const cat = b.finish();
    expect(cat.q[0]).toBeCloseTo(2.6 * 0.88, 12);
    const n = GAUSS_K / Math.pow(2.6, 1.5);
    expect(cat.tpJdTT[0]).toBeCloseTo(2_463_000.5 - (30 * RAD_PER_DEG) / n, 6);
    expect(cat.i[0]).toBeCloseTo(8.5 * RAD_PER_DEG, 14);
  });

  it('derives a and the mean anomaly of a comet from q and tp', () => {
    const b = new CatalogueBuilder();
    b.add(cometRow({ qAu: 1.4, e: 0.55, tpJdTT: 2_463_000.5 - 10 }), 'c', 3, 'raw');
    const cat = b.finish();
    expect(cat.a[0]).toBeCloseTo(1.4 / 0.45, 12);
    const n = GAUSS_K / Math.pow(1.4 / 0.45, 1.5);
    expect(cat.meanAnomaly[0]).toBeCloseTo(10 * n, 12);
  });

  it('keeps the newest epoch of a duplicated designation and reports the other', () => {
    const b = new CatalogueBuilder();
    b.add(asteroidRow({ designation: '2031 QQ1', epochJdTT: 2_462_000.5 }), 'old.txt', 5, 'old');
    b.add(asteroidRow({ designation: '2031 QQ1', epochJdTT: 2_463_000.5, aAu: 2.7 }), 'new.txt', 9, 'new');
    b.add(asteroidRow({ designation: '2031 QQ1', epochJdTT: 2_461_000.5 }), 'older.txt', 2, 'older');
    expect(b.read).toBe(3);
    const cat = b.finish();
    expect(cat.size).toBe(1);
    expect(cat.a[0]).toBe(2.7);
    expect(cat.files[cat.fileIndex[0]]).toBe('new.txt');
    expect(qualityNames(cat.quality[0])).toContain('duplicate-kept');
    expect(b.rejects.map((r) => [r.kind, r.file, r.line])).toEqual([
      ['duplicate', 'old.txt', 5],
      ['duplicate', 'older.txt', 2],
    ]);
    expect(b.rejects[0].reason).toBe('duplicate designation 2031 QQ1: older epoch than new.txt:9, which is kept');
  });

  it('a row given with a function for its text asks for it only when it is rejected', () => {
    const b = new CatalogueBuilder();
    const asked: number[] = [];
    const textOf = (line: number) => (): string => {
      asked.push(line);
      return `text of line ${line}`;
    };
    b.add(asteroidRow({ designation: '2031 QQ1' }), 'f', 1, textOf(1)); // kept
    b.add(asteroidRow({ designation: '2031 QQ2', e: -0.1 }), 'f', 2, textOf(2)); // invalid
    b.add(asteroidRow({ designation: '2031 QQ1', epochJdTT: 2_462_000.5 }), 'f', 3, textOf(3)); // older duplicate
    b.add(asteroidRow({ designation: '2031 QQ1', epochJdTT: 2_464_000.5 }), 'f', 4, textOf(4)); // newer: kept
    expect(asked).toEqual([2, 3]);
    expect(b.rejects.map((r) => [r.kind, r.line, r.text])).toEqual([
      ['invalid', 2, 'text of line 2'],
      ['duplicate', 3, 'text of line 3'],
      ['duplicate', 1, '2031 QQ1 (epoch JD 2463000.5)'], // superseded: named, its text not held
    ]);
  });

  it('duplicate rejects name the row finally kept, not one superseded later', () => {
    const b = new CatalogueBuilder();
    b.add(asteroidRow({ designation: '2031 QQ2', epochJdTT: 2_461_000.5 }), 'f', 1, 'first');
    b.add(asteroidRow({ designation: '2031 QQ2', epochJdTT: 2_460_000.5 }), 'f', 2, 'oldest');
    b.add(asteroidRow({ designation: '2031 QQ2', epochJdTT: 2_462_000.5 }), 'f', 3, 'second');
    b.add(asteroidRow({ designation: '2031 QQ2', epochJdTT: 2_463_000.5 }), 'f', 4, 'newest');
    const cat = b.finish();
    expect(cat.source[0]).toBe(4);
    expect(b.rejects.map((r) => [r.line, r.reason])).toEqual([
      [2, 'duplicate designation 2031 QQ2: epoch not newer than f:4, which is kept'],
      [1, 'duplicate designation 2031 QQ2: older epoch than f:4, which is kept'],
      [3, 'duplicate designation 2031 QQ2: older epoch than f:4, which is kept'],
    ]);
  });

  it('charges every reject to the input it came from, a file listed twice being two inputs', () => {
    // Invented rows. Input 0 'a' has X (old epoch) and Y; input 1 'b' has a newer X, which
    // supersedes input 0's X; input 2 is 'a' again: both its rows are duplicates of kept rows.
    const b = new CatalogueBuilder();
    const read: number[] = [];
    const offer = (file: string, rows: [string, number][]) => {
      const before = b.read;
      expect(b.beginFile(file)).toBe(read.length);
      rows.forEach(([designation, epochJdTT], k) => b.add(asteroidRow({ designation, epochJdTT }), file, k + 1, designation));
      read.push(b.read - before);
    };
    offer('a', [['X', 2_462_000.5], ['Y', 2_462_000.5]]);
    offer('b', [['X', 2_463_000.5]]);
    offer('a', [['X', 2_462_000.5], ['Y', 2_462_000.5]]);
    const accounts = read.map((n, k) => ({ read: n, accepted: n - b.rejectedIn(k), rejected: b.rejectedIn(k) }));
    const cat = b.finish();
    expect(accounts).toEqual([
      { read: 2, accepted: 1, rejected: 1 }, // its X superseded by b's
      { read: 1, accepted: 1, rejected: 0 },
      { read: 2, accepted: 0, rejected: 2 },
    ]);
    expect(cat.files).toEqual(['a', 'b', 'a']);
    // Accepted per input, counted from the catalogue itself, agrees with the accounts.
    const kept = [0, 0, 0];
    for (let k = 0; k < cat.size; k++) kept[cat.fileIndex[k]]++;
    expect(kept).toEqual(accounts.map((a) => a.accepted));
    expect(accounts.reduce((s, a) => s + a.rejected, 0)).toBe(b.rejects.length);
  });

  it('flags poor orbits without rejecting them', () => {
    const b = new CatalogueBuilder();
    b.add(asteroidRow({ nOpp: 1, arcDays: 6, nObs: 8, uncertainty: 8, lastObsJdTT: 2_455_000.5 }), 'f', 1, '');
    b.add(asteroidRow({ designation: 'x', uncertainty: Number.NaN, uncertaintyCode: 'E' }), 'f', 2, '');
    b.add(cometRow({ e: 1.02 }), 'f', 3, '');
    const cat = b.finish();
    expect(qualityNames(cat.quality[0])).toEqual([
      'single-opposition', 'short-arc', 'few-observations', 'poor-uncertainty', 'epoch-far-from-last-obs',
    ]);
    expect(qualityNames(cat.quality[1])).toEqual(['poor-uncertainty']);
    expect(qualityNames(cat.quality[2])).toEqual(['hyperbolic', 'no-quality-info']);
  });

  it('grows past its initial capacity and keeps columns aligned', () => {
    const b = new CatalogueBuilder();
    for (let k = 0; k < 10_000; k++) b.add(asteroidRow({ designation: `T${k}`, aAu: 2 + k * 1e-5 }), 'g', k + 1, '');
    const cat = b.finish();
    expect(cat.size).toBe(10_000);
    expect(cat.designation[9_999]).toBe('T9999');
    expect(cat.a[9_999]).toBeCloseTo(2 + 9_999e-5, 12);
    expect(cat.source[9_999]).toBe(10_000);
  });

  it('read = accepted + rejected for any mix of rows (property-based)', () => {
    const number = fc.oneof(fc.double(), fc.constant(Number.NaN), fc.double({ min: -10, max: 400 }));
    const rowArb = fc.record({
      designation: fc.oneof(fc.constantFrom('A', 'B', 'C', ''), fc.string()),
      e: number, aAu: number, qAu: number, iDeg: number, nodeDeg: number, periDeg: number,
      meanAnomalyDeg: number, tpJdTT: number, epochJdTT: fc.oneof(number, fc.constant(2_463_000.5)),
      H: number, uncertainty: number, nObs: number, arcDays: number,
    });
    fc.assert(
      fc.property(fc.array(fc.tuple(rowArb, fc.boolean()), { maxLength: 60 }), (rows) => {
        const b = new CatalogueBuilder();
        rows.forEach(([o, comet], k) => b.add(comet ? cometRow(o) : asteroidRow(o), 'p', k + 1, ''));
        const cat = b.finish();
        for (let k = 0; k < cat.size; k++) {
          if (!Number.isFinite(cat.q[k]) || !(cat.q[k] > 0)) return false; // no NaN flows on
        }
        return b.read === rows.length && cat.size + b.rejects.length === b.read;
      }),
    );
  });
});
