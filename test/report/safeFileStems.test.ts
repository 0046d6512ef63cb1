import { describe, expect, it } from 'vitest';
import { readableStem, safeFileStems, STEM_MAX_CHARS } from '../../src/report/safeFileStems.js';

// File-name stems from designations. The characters kept are those of the POSIX portable
// filename character set (IEEE Std 1003.1, "Portable Filename Character Set": A–Z a–z 0–9 . _ -)
// less '.', so no stem is hidden or holds a separator; the designation forms below (spaces,
// '/', brackets) are the trade's usual ones (common practice).
describe('safe file-name stems', () => {
  it('keeps letters, digits and -, turns runs of anything else into one _', () => {
    expect(readableStem('2010 TK7 earth')).toBe('2010_TK7_earth');
    expect(readableStem('P/2030 Y2 neptune')).toBe('P_2030_Y2_neptune');
    expect(readableStem('(9004127) earth')).toBe('9004127_earth');
    expect(readableStem('../../etc')).toBe('etc');
    expect(readableStem('...')).toBe('body');
    expect(readableStem('x'.repeat(200)).length).toBe(STEM_MAX_CHARS);
    for (const s of ['C/2031 A1 (Name) earth', 'a\\b', ' Ω ']) expect(readableStem(s)).toMatch(/^[A-Za-z0-9][A-Za-z0-9_-]*$|^body$/);
  });

  it('is unique within one call, also without regard to case, and the same for the same keys', () => {
    const keys = ['P/2030 Y2 neptune', 'P 2030 Y2 neptune', 'p/2030 y2 neptune', 'P_2030_Y2_neptune-2', 'C/2030 Y2 neptune'];
    const stems = safeFileStems(keys);
    expect(stems).toEqual(['P_2030_Y2_neptune', 'P_2030_Y2_neptune-2', 'p_2030_y2_neptune-3', 'P_2030_Y2_neptune-2-2', 'C_2030_Y2_neptune']);
    expect(new Set(stems.map((s) => s.toLowerCase())).size).toBe(keys.length);
    expect(safeFileStems(keys)).toEqual(stems);
  });
});
