import { describe, expect, it } from 'vitest';
import { rejectCategories, reasonCategory } from '../../src/report/rejectCategories.js';
import type { Reject } from '../../src/clean/types.js';

// Expected categories written by hand from the reason texts of src/clean/validate.ts and
// the duplicate reasons of src/clean/catalogueBuilder.ts: numbers become '#', the file a
// duplicate is compared with becomes 'FILE', the designation is dropped.
describe('reject categories', () => {
  it.each([
    ['eccentricity -0.1 is negative', 'eccentricity # is negative'],
    ['epoch JD 2000000.5 outside 2378496.5..2524593.5', 'epoch JD # outside #..#'],
    ['absolute magnitude 1e+40 outside -3..35', 'absolute magnitude # outside #..#'],
    ['duplicate designation (433) Eros: older epoch than data/2026/a1.txt:12, which is kept',
      'duplicate designation: older epoch than FILE:#, which is kept'],
    ['duplicate designation 2031 QQ1: epoch not newer than new.txt:9, which is kept',
      'duplicate designation: epoch not newer than FILE:#, which is kept'],
  ])('%s → %s', (reason, category) => {
    expect(reasonCategory(reason)).toBe(category);
  });

  it('counts by kind and category, most frequent first, then by name', () => {
    const r = (kind: Reject['kind'], reason: string): Reject => ({ kind, reason, file: 'f', line: 1, text: '' });
    const rejects = [
      r('invalid', 'node -1 deg outside 0..360'),
      r('duplicate', 'duplicate designation A: older epoch than x.txt:3, which is kept'),
      r('invalid', 'node 400 deg outside 0..360'),
      r('duplicate', 'duplicate designation B: epoch not newer than y.txt:7, which is kept'),
      r('duplicate', 'duplicate designation C: older epoch than z9.txt:1, which is kept'),
    ];
    expect(rejectCategories(rejects)).toEqual([
      ['duplicate: duplicate designation: older epoch than FILE:#, which is kept', 2],
      ['invalid: node # deg outside #..#', 2],
      ['duplicate: duplicate designation: epoch not newer than FILE:#, which is kept', 1],
    ]);
  });
});
