// Naming clusters from the published family list (data/families/families-2015.json, Nesvorný
// 2015 family list as bundled; provenance in its README): a centre inside a family's a/e/i
// ranges takes its name; several: the closest by the velocity metric; none: no name.
import { describe, expect, it } from 'vitest';
import { publishedFamilyAt } from '../../src/detect/familiesNaming.js';
import { readPublishedFamilies } from '../../src/io/publishedFamilies.js';
import type { PublishedFamily } from '../../src/io/publishedFamilies.js';

const list = readPublishedFamilies('data/families/families-2015.json').families;
const sinDeg = (d: number) => Math.sin((d * Math.PI) / 180);

describe('publishedFamilyAt', () => {
  it("names centres inside the published ranges: Eos (a 2.9533–3.1549, e 0.0296–0.1069, i 8.71–11.42° in the list)", () => {
    expect(publishedFamilyAt(3.05, 0.07, sinDeg(10), list)?.name).toBe('Eos');
    expect(publishedFamilyAt(3.13, 0.15, sinDeg(1.5), list)?.name).toBe('Themis'); // the list's Themis ranges
  });

  it('gives no name outside every range', () => {
    expect(publishedFamilyAt(2.675, 0.15, sinDeg(45), list)).toBeUndefined();
  });

  it('picks the family whose range middle is closest when ranges overlap', () => {
    const box = (id: number, name: string, aMid: number): PublishedFamily => ({
      id, name, flag: '-', cutoffMs: 50, members: 100, aMinAu: aMid - 0.1, aMaxAu: aMid + 0.1, eMin: 0, eMax: 0.2, iMinDeg: 0, iMaxDeg: 10,
    });
    const two = [box(1, 'Far', 2.75), box(2, 'Near', 2.65)];
    expect(publishedFamilyAt(2.67, 0.1, sinDeg(5), two)?.name).toBe('Near');
    expect(publishedFamilyAt(2.73, 0.1, sinDeg(5), two)?.name).toBe('Far');
  });
});
