// Family lists: the bundled published list (data/families/families-2015.json: Nesvorný 2015,
// NASA PDS, provenance in data/families/README.md) and a user's membership table.
// Published values checked here are read from the PDS list itself (its own records); the
// count of 122 families is the data set's own description.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parsePublishedFamilies, readFamilyMembership, readPublishedFamilies, splitDelimited, UnreadableInputError } from '../../src/io/index.js';

const ROOT = resolve(import.meta.dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'wayward-families-'));
function file(name: string, text: string): string {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
}

describe('the bundled published family list', () => {
  const list = readPublishedFamilies(join(ROOT, 'data/families/families-2015.json'));
  const fams = list.families;
  it('holds the 122 records of the data set: 120 usable, 2 set aside with their reason', () => {
    expect(fams.length + list.setAside.length).toBe(122);
    expect(new Set([...fams.map((f) => f.id), ...list.setAside.map((f) => f.id)]).size).toBe(122);
    // the list's own records: flag N with no cutoff (a one-member entry) and a placeholder row;
    // the other flag-N record (F5, 8 members, 10 m/s) has ranges and stays usable
    expect(list.setAside).toEqual([
      { id: 7, name: 'Bond', reason: 'no velocity cutoff (flag N, 1 member)' },
      { id: 503, name: '', reason: 'placeholder values instead of ranges' },
    ]);
    expect(fams.find((f) => f.id === 640)).toMatchObject({ name: 'F5 (Gibbs)', flag: 'N', cutoffMs: 10, members: 8 });
  });
  it('reads the records as published (Vesta: id 401, 50 m/s, 15 252 members, a 2.2407–2.4897 au)', () => {
    const vesta = fams.find((f) => f.name === 'Vesta')!;
    expect(vesta).toEqual({
      id: 401, name: 'Vesta', flag: '-', cutoffMs: 50, members: 15252, aMinAu: 2.2407, aMaxAu: 2.4897, eMin: 0.0746, eMax: 0.1333, iMinDeg: 5.37, iMaxDeg: 7.75,
    });
    for (const f of fams) {
      expect(f.aMinAu).toBeLessThanOrEqual(f.aMaxAu);
      expect(f.cutoffMs).toBeGreaterThan(0);
    }
  });
  it('names the record and field of a bad entry', () => {
    const bad = '{"families":[{"family_id":1,"family_name":"A","cutoff_ms":50,"n_members":3,"a_min_au":2,"a_max_au":2.1,"e_min":0.1,"e_max":0.2,"i_min_deg":1,"i_max_deg":2},' +
      '{"family_id":2,"family_name":"B","cutoff_ms":"x","n_members":3,"a_min_au":2,"a_max_au":2.1,"e_min":0.1,"e_max":0.2,"i_min_deg":1,"i_max_deg":2}]}';
    expect(() => parsePublishedFamilies(bad, 'f.json')).toThrow('f.json: family record 2 (family_id 2): cutoff_ms is not a number');
    expect(() => parsePublishedFamilies('{"x":1}', 'g.json')).toThrow('g.json: no "families" array');
    expect(() => parsePublishedFamilies('{', 'h.json')).toThrow(UnreadableInputError);
    expect(() => readPublishedFamilies(join(dir, 'missing.json'))).toThrow('no such file');
  });
});

describe('a membership table', () => {
  it('reads members and rejects each bad line with its line number; nothing is dropped', async () => {
    const p = file('members.csv', [
      'number,name,family',
      '4,Vesta,Vesta',
      '',
      '"2090 AA",,"Flora, inner part"',
      '8,Flora,',
      '9,Metis,Flora,extra',
      '4,Vesta,Flora',
      '"unterminated,x,Eos',
      '221,Eos,Eos',
    ].join('\n') + '\n');
    const m = await readFamilyMembership(p);
    expect(m.members).toEqual([
      { designation: '4', family: 'Vesta', line: 2 },
      { designation: '2090 AA', family: 'Flora, inner part', line: 4 },
      { designation: '221', family: 'Eos', line: 9 },
    ]);
    expect(m.rejects.map((r) => [r.line, r.reason])).toEqual([
      [5, 'family is empty'],
      [6, '4 fields where the header has 3'],
      [7, 'designation 4 already in family Vesta (line 2)'],
      [8, 'unterminated quoted field'],
    ]);
    expect(m.rejects[0].message).toBe(`${p}:5: family is empty`);
    expect(m.members.length + m.rejects.length).toBe(m.dataLines); // every data line accounted for
  });
  it('takes the designation column by precedence and reads tab-separated tables', async () => {
    const m = await readFamilyMembership(file('members.tsv', 'name\tpdes\tfamily_id\nCeres\t1\t999\n'));
    expect(m.members).toEqual([{ designation: '1', family: '999', line: 2 }]);
  });
  it('a header without a family column is an error naming the file and line', async () => {
    await expect(readFamilyMembership(file('nofam.csv', '\ndesignation,group\n1,x\n'))).rejects.toThrow(/nofam\.csv: line 2: the header has no a family column/);
    await expect(readFamilyMembership(file('empty.csv', '\n\n'))).rejects.toThrow('empty: no header line');
  });
  it('splits quoted fields as RFC 4180 does, doubled quotes included', () => {
    expect(splitDelimited('a,"b,""c""",d', ',')).toEqual(['a', 'b,"c"', 'd']);
    expect(splitDelimited('a;;b', ';')).toEqual(['a', '', 'b']);
  });
});
