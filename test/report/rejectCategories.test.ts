import { describe, expect, it } from 'vitest';
import { rejectCategories, rejectExample, rejectGroups, reasonCategory } from '../../src/report/rejectCategories.js';
import type { Reject } from '../../src/clean/types.js';

// Expected categories written by hand from the reason texts of src/clean/validate.ts, the
// readers of src/io/ and the duplicate reasons of src/clean/catalogueBuilder.ts: quoted row
// text becomes '…' (never rewritten inside), values read from the row become '#', the
// rule's limits stay, the file a duplicate is compared with becomes FILE:LINE and the
// designation is dropped.
describe('reject categories', () => {
  it.each([
    ['eccentricity -0.1 is negative', 'eccentricity # is negative'],
    ['epoch JD 2000000.5 outside 2378496.5..2524593.5', 'epoch JD # outside 2378496.5..2524593.5'],
    ['absolute magnitude 1e+40 outside -3..35', 'absolute magnitude # outside -3..35'],
    ["packed date has a month outside 1..9, A..C: 'K32Z9'", "packed date has a month outside 1..9, A..C: '…'"],
    ["eccentricity is not a number: '0.1x3o56' (columns 71–79)", "eccentricity is not a number: '…' (columns 71–79)"],
    ["unknown packed designation form: '?? expo'", "unknown packed designation form: '…'"],
    ['line ends at column 58, before inclination (columns 60–68)', 'line ends at column #, before inclination (columns 60–68)'],
    ["column 'i' (field 5): not a number: 'three'", "column 'i' (field 5): not a number: '…'"],
    ["column 'pdes' gives number 1 but column 'full_name' gives 2: '2 Pallas (A802 FA)'",
      "column 'pdes' gives number # but column 'full_name' gives #: '…'"],
    ['duplicate designation (433) Eros: older epoch than data/2026/a1.txt:12, which is kept',
      'duplicate designation: older epoch than FILE:LINE, which is kept'],
    ['duplicate designation 2031 QQ1: epoch not newer than new.txt:9, which is kept',
      'duplicate designation: epoch not newer than FILE:LINE, which is kept'],
  ])('%s → %s', (reason, category) => {
    expect(reasonCategory(reason)).toBe(category);
  });

  const r = (kind: Reject['kind'], reason: string, line = 1): Reject => ({ kind, reason, file: 'f.txt', line, text: '' });

  it('counts by kind and category, most frequent first, then by name; "duplicate designation" said once', () => {
    const rejects = [
      r('invalid', 'node -1 deg outside 0..360'),
      r('duplicate', 'duplicate designation A: older epoch than x.txt:3, which is kept'),
      r('invalid', 'node 400 deg outside 0..360'),
      r('duplicate', 'duplicate designation B: epoch not newer than y.txt:7, which is kept'),
      r('duplicate', 'duplicate designation C: older epoch than z9.txt:1, which is kept'),
    ];
    expect(rejectCategories(rejects)).toEqual([
      ['duplicate designation: older epoch than FILE:LINE, which is kept', 2],
      ['invalid: node # deg outside 0..360', 2],
      ['duplicate designation: epoch not newer than FILE:LINE, which is kept', 1],
    ]);
  });

  it('keeps the first row of each group verbatim as its example', () => {
    const groups = rejectGroups([
      r('parse', "packed date has a month outside 1..9, A..C: 'K32Z9'", 10),
      r('parse', "packed date has a month outside 1..9, A..C: 'K31D0'", 20),
    ]);
    expect(groups).toHaveLength(1);
    expect(groups[0].count).toBe(2);
    expect(rejectExample(groups[0].example)).toBe("f.txt:10: packed date has a month outside 1..9, A..C: 'K32Z9'");
  });
});
