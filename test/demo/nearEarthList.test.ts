/**
 * The synthetic near-Earth list of the co-orbital benchmark (scripts/bench/nearEarthList.ts):
 * every line re-read by the project's own parser, exactly the placed bodies in the Earth's
 * 1:1 zone, the rest NEO-like, every row multi-opposition, the same bytes for the same seed.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseOrbitExportLine } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import { writeNearEarthList } from '../../scripts/bench/nearEarthList.js';

const dir = mkdtempSync(join(tmpdir(), 'wayward-near-earth-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function write(name: string, rows: number, zoneBodies: number, seed: number): string[] {
  const path = join(dir, name);
  writeNearEarthList(path, { rows, zoneBodies, seed });
  return readFileSync(path, 'utf8').trimEnd().split('\n');
}

describe('writeNearEarthList', () => {
  it('writes rows that parse, with exactly the placed bodies in the Earth zone, all multi-opposition', () => {
    const lines = write('a.txt', 3000, 40, 7);
    expect(lines).toHaveLength(3000);
    const row = emptyOrbitRow();
    let inZone = 0, nearEarth = 0;
    lines.forEach((line, k) => {
      expect(parseOrbitExportLine(line, row, 'a.txt', k + 1)).not.toBe('skip');
      expect(row.nOpp).toBeGreaterThanOrEqual(2);
      // 0.983–1.017 au: the range of a of the known Earth co-orbitals (Kaplan & Cengiz 2020, MNRAS, abstract).
      if (Math.abs(row.aAu - 1) < 0.017) inZone++;
      // Near-Earth: perihelion q = a(1 − e) ≤ 1.3 au (common practice).
      if (row.aAu * (1 - row.e) <= 1.3) nearEarth++;
    });
    expect(inZone).toBe(40);
    expect(nearEarth).toBe(3000);
  });

  it('is the same for the same seed and differs for another', () => {
    expect(write('b.txt', 500, 5, 11)).toEqual(write('c.txt', 500, 5, 11));
    expect(write('d.txt', 500, 5, 12)).not.toEqual(write('c.txt', 500, 5, 11));
  });

  it('refuses more zone bodies than rows', () => {
    expect(() => writeNearEarthList(join(dir, 'e.txt'), { rows: 10, zoneBodies: 11, seed: 1 })).toThrow(RangeError);
  });
});
