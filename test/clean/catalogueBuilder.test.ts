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
