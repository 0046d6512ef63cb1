// Finding bodies by what a user types (src/clean/bodyKeys.ts, bodyLookup.ts, editDistance.ts).
// Outside checks: the real sample lines of the one-line orbit and comet export formats
// (provenance in test/fixtures/orbit-export/ and test/fixtures/comet-export/), which give each
// body's packed and readable designations side by side, so every packed ↔ readable pair
// below is the publisher's own; edit distances of the textbook examples (common practice).
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { CatalogueBuilder } from '../../src/clean/catalogueBuilder.js';
import { bodyLabel, findBodies, nearMatches } from '../../src/clean/bodyLookup.js';
import { queryKeys, rowKeys, emptyBodyKeys } from '../../src/clean/bodyKeys.js';
import { boundedEditDistance } from '../../src/clean/editDistance.js';
import { bodyName, type Catalogue } from '../../src/clean/types.js';
import { readOrbitFile } from '../../src/io/readOrbitFile.js';
import { asteroidRow, cometRow } from './rowFactory.js';

const FIXTURES = join(import.meta.dirname, '../fixtures');
const ORBITS = join(FIXTURES, 'orbit-export/orbits-export-sample.txt.gz');
const COMETS = join(FIXTURES, 'comet-export/comets-export-sample.txt.gz');

async function catalogueOf(files: string[]): Promise<Catalogue> {
  const b = new CatalogueBuilder();
  for (const f of files) {
    b.beginFile(f);
    await readOrbitFile(f, {}, (row, line, text) => b.add(row, f, line, text), (err) => b.rejectUnparsed(f, err.line, err.reason, err.text));
  }
  return b.finish();
}

describe('edit distance', () => {
  it('textbook pairs (common practice): kitten→sitting 3, flaw→lawn 2, equal strings 0', () => {
    expect(boundedEditDistance('KITTEN', 'SITTING', 5)).toBe(3);
    expect(boundedEditDistance('FLAW', 'LAWN', 5)).toBe(2);
    expect(boundedEditDistance('2030CO1', '2030CO1', 0)).toBe(0);
    expect(boundedEditDistance('', 'ABC', 3)).toBe(3);
  });

  it('beyond the bound the answer is bound + 1, never a smaller wrong number', () => {
    expect(boundedEditDistance('KITTEN', 'SITTING', 2)).toBe(3);
    expect(boundedEditDistance('A', 'ABCDEF', 1)).toBe(2);
    expect(() => boundedEditDistance('A', 'B', -1)).toThrow(RangeError);
  });
});

describe('lookup keys', () => {
  it('a query and the catalogue text of the same body give the same keys', () => {
    const row = emptyBodyKeys();
    rowKeys('2030 CO1', '', row);
    for (const q of ['2030 CO1', '2030CO1', '2030 co1', ' 2030  CO1 ', 'K30C01O']) {
      expect(queryKeys(q).designation, q).toBe(row.designation);
    }
    rowKeys('(1) Ceres', 'Ceres', row);
    expect(row).toEqual({ number: 1, designation: '', name: 'CERES' });
    for (const q of ['1', '(1)', '00001', '(1) Ceres']) expect(queryKeys(q).number, q).toBe(1);
    expect(queryKeys('ceres').name).toBe('CERES');
  });

  it('names ignore case, accents and runs of blanks; names in the readable text are split off', () => {
    expect(queryKeys('van  de Hulst').name).toBe(queryKeys('Van de Hulst').name);
    expect(queryKeys('Šteffl').name).toBe('STEFFL');
    const row = emptyBodyKeys();
    rowKeys('C/1995 O1 (Hale-Bopp)', '', row);
    expect(row).toEqual({ number: NaN, designation: 'C/1995O1', name: 'HALE-BOPP' });
    rowKeys('1P/Halley', '', row);
    expect(row).toEqual({ number: NaN, designation: '1P', name: 'HALLEY' });
  });
});

describe('findBodies over real catalogue samples', () => {
  let cat: Catalogue;
  beforeAll(async () => {
    cat = await catalogueOf([ORBITS, COMETS]);
  });

  const cases: [string, string, string][] = [
    // query, how it matches, the body (as the sample files write it)
    ['4', 'number', '(4) Vesta'],
    ['(4)', 'number', '(4) Vesta'],
    ['00004', 'number', '(4) Vesta'],
    ['vesta', 'name', '(4) Vesta'],
    ['s1132', 'number', '(541132) Leleakuhonua'],
    ['~000v', 'number', '(620057)'],
    ['620057', 'number', '(620057)'],
    ['K19E05U', 'designation', '2019 EU5'],
    ['2019EU5', 'designation', '2019 EU5'],
    ['2019 eu5', 'designation', '2019 EU5'],
    ['_EW002J', 'designation', '2014 WT625'],
    ['2014 WT625', 'designation', '2014 WT625'],
    ['CJ95O010', 'designation', 'C/1995 O1 (Hale-Bopp)'],
    ['C/1995O1', 'designation', 'C/1995 O1 (Hale-Bopp)'],
    ['Hale-Bopp', 'name', 'C/1995 O1 (Hale-Bopp)'],
    ['hale-bopp', 'name', 'C/1995 O1 (Hale-Bopp)'],
    ['C/1995 O1 (Hale-Bopp)', 'designation', 'C/1995 O1 (Hale-Bopp)'],
  ];

  it.each(cases)('%s finds it by %s: %s', (query, by, label) => {
    const [m] = findBodies(cat, [query]);
    expect(m.by).toBe(by);
    expect(m.rows.map((r) => bodyLabel(cat, r))).toEqual([label]);
  });

  it('one pass answers a list of queries, in order, with misses marked', () => {
    const got = findBodies(cat, ['Ceres', 'no such body', '2019EU5']);
    expect(got.map((m) => m.by)).toEqual(['name', 'none', 'designation']);
    expect(got[1].rows).toEqual([]);
    expect(bodyLabel(cat, got[0].rows[0])).toBe('(1) Ceres');
  });

  it('a name several comets share lists them all (the sample names 14 comets exactly LINEAR, 3 more LINEAR-NEAT or LINEAR-Hill)', () => {
    const [m] = findBodies(cat, ['LINEAR']);
    expect(m.by).toBe('name');
    expect(m.rows).toHaveLength(14);
    for (const r of m.rows) expect(bodyName(cat, r)).toBe('LINEAR');
  });

  it('a miss gets the nearest spellings, nearest first', () => {
    expect(findBodies(cat, ['2019 EU6'])[0].by).toBe('none');
    const near = nearMatches(cat, '2019 EU6', 3);
    expect(bodyLabel(cat, near[0].row)).toBe('2019 EU5');
    expect(near[0].distance).toBe(1);
    const named = nearMatches(cat, 'Hale Bop', 3);
    expect(bodyLabel(cat, named[0].row)).toBe('C/1995 O1 (Hale-Bopp)');
    expect(nearMatches(cat, 'qqqqqqqqqqqq')).toEqual([]);
  });
});

describe('the Catalogue keeps proper names', () => {
  it('names from the input, \'\' where none; a newer duplicate brings its own name or none', () => {
    const b = new CatalogueBuilder();
    b.add(cometRow({ designation: 'P/2031 C4', name: 'Invented' }), 'c', 1, 'raw');
    b.add(asteroidRow({ designation: '2031 AB7' }), 'a', 1, 'raw');
    b.add(asteroidRow({ designation: '2031 AB7', name: 'Newname', epochJdTT: 2_463_100.5 }), 'a', 2, 'raw');
    b.add(asteroidRow({ designation: '2031 AB8', name: 'Oldname' }), 'a', 3, 'raw');
    b.add(asteroidRow({ designation: '2031 AB8', epochJdTT: 2_463_100.5 }), 'a', 4, 'raw');
    const cat = b.finish();
    expect([0, 1, 2].map((k) => bodyName(cat, k))).toEqual(['Invented', 'Newname', '']);
    expect(cat.size).toBe(3);
    expect(findBodies(cat, ['invented'])[0].rows).toEqual([0]);
    expect(findBodies(cat, ['Oldname'])[0].by).toBe('none');
  });
});
