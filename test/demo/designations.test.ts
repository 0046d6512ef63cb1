// The demo's invented designations: the allocator steps over the skipped bare letter pairs and
// still hands out every other designation once, in order (synthetic test of the project's own
// generator; the designation scheme itself is common practice, see scripts/demo/designations.ts).
import { describe, expect, it } from 'vitest';
import { DesignationAllocator, HALF_MONTH_LETTERS, SECOND_LETTERS, SKIPPED_BARE_PAIRS } from '../../scripts/demo/designations.js';

describe('DesignationAllocator', () => {
  it('never hands out a skipped bare pair, and hands out every other one once', () => {
    const [h, l] = SKIPPED_BARE_PAIRS[0];
    const a = new DesignationAllocator();
    const f = HALF_MONTH_LETTERS.indexOf(h);
    const got = Array.from({ length: 3 * SECOND_LETTERS.length }, () => a.provisional(2031, f));
    expect(got).not.toContain(`2031 ${h}${l}`);
    expect(new Set(got).size).toBe(got.length);
    expect(got.slice(0, SECOND_LETTERS.length - 1)).toEqual(
      [...SECOND_LETTERS].filter((x) => x !== l).map((x) => `2031 ${h}${x}`),
    );
    expect(got).toContain(`2031 ${h}${l}1`); // with a cycle count the pair is not bare
    expect(SKIPPED_BARE_PAIRS).toContainEqual(['F', 'O']);
  });

  it('leaves the other half months untouched', () => {
    const a = new DesignationAllocator();
    const g = HALF_MONTH_LETTERS.indexOf('G');
    const got = Array.from({ length: SECOND_LETTERS.length }, () => a.provisional(2030, g));
    expect(got).toEqual([...SECOND_LETTERS].map((l) => `2030 G${l}`));
  });
});
