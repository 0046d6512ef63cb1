// The maps `wayward families` writes in plots/, read back from the files (SVG parsed as XML by
// @xmldom/xmldom; PNG header per ISO/IEC 15948 §5.2–5.3, §11.2.2). The catalogue is the
// invented one of familiesSynthetic.ts. Counts are checked against the rows the other
// outputs hold, not against the code that drew them.
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DOMParser, type Document } from '@xmldom/xmldom';
import { parse } from 'csv-parse/sync';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli, tempDir } from './cliHarness.js';
import { GROUP_SIZE, ISOLATED, writeSyntheticCatalogue } from './familiesSynthetic.js';

type Row = Record<string, string>;
const table = (dir: string, name: string): Row[] => parse(readFileSync(join(dir, name)), { columns: true }) as Row[];
const MAPS = ['proper-a-e', 'proper-a-sini'];

function svgDoc(path: string): Document {
  return new DOMParser({ onError: (level, message) => { throw new Error(`${path} is not well-formed XML (${level}): ${message}`); } })
    .parseFromString(readFileSync(path, 'utf8'), 'image/svg+xml');
}
/** Groups carrying every class in `cls` (space-separated; Vega's scenegraph class names). */
const groupsOf = (doc: Document, cls: string) =>
  Array.from(doc.getElementsByTagName('g')).filter((g) => cls.split(' ').every((c) => (g.getAttribute('class') ?? '').split(/\s+/).includes(c)));
const textsOf = (doc: Document, cls: string, tag = 'text') =>
  groupsOf(doc, cls).flatMap((g) => Array.from(g.getElementsByTagName(tag)).map((t) => t.textContent ?? ''));

describe('wayward families: proper-element maps', () => {
  const dir = tempDir();
  const { file, group } = writeSyntheticCatalogue(dir);
  const labels = join(dir, 'labels.csv');
  writeFileSync(labels, ['designation,family', ...group.map((d) => `${d},Planted`)].join('\n') + '\n');
  const out = join(dir, 'out');
  let status = -1;
  beforeAll(() => {
    status = runCli(['families', file, '--families', labels, '--out', out]).status;
  });

  it('writes both maps as SVG and PNG in plots/ and links each from report.md', () => {
    expect(status).toBe(0);
    expect(readdirSync(join(out, 'plots')).sort()).toEqual(MAPS.flatMap((m) => [`${m}.png`, `${m}.svg`]));
    const report = readFileSync(join(out, 'report.md'), 'utf8');
    const links = [...report.matchAll(/\]\((plots\/[^)]+)\)/g)].map((m) => m[1]);
    expect(links.sort()).toEqual(MAPS.flatMap((m) => [`plots/${m}.png`, `plots/${m}.svg`]).sort());
    for (const l of links) expect(existsSync(join(out, l)), l).toBe(true);
    for (const m of MAPS) {
      const png = readFileSync(join(out, 'plots', `${m}.png`));
      expect([...png.subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // PNG signature
      expect(png.toString('latin1', 12, 16)).toBe('IHDR');
    }
  });

  it('names the planted family in the legend, marks every outlier and says how many untrusted bodies it left out', () => {
    const outliers = table(out, 'outliers.csv');
    const unreliable = table(out, 'unreliable.csv').length;
    const fams = table(out, 'families.csv');
    const planted = fams.find((f) => f.name === 'Planted')!;
    for (const m of MAPS) {
      const doc = svgDoc(join(out, 'plots', `${m}.svg`));
      const legend = textsOf(doc, 'role-legend-label');
      expect(legend).toContain(`Planted, ${planted.id} (${planted.members})`);
      expect(Number(planted.members)).toBeGreaterThanOrEqual(GROUP_SIZE);
      const marks = groupsOf(doc, 'mark-symbol role-mark');
      expect(marks).toHaveLength(3); // outside families, outliers, members
      expect(Array.from(marks[1].childNodes).filter((n) => n.nodeType === 1)).toHaveLength(outliers.length);
      const sub = textsOf(doc, 'role-title-subtitle', 'tspan');
      expect(sub).toContain(`${unreliable} bodies with untrusted proper elements not drawn (unreliable.csv)`);
      const screened = JSON.parse(readFileSync(join(out, 'families.json'), 'utf8')).screened;
      expect(textsOf(doc, 'role-title-text')[0]).toMatch(new RegExp(`^Proper a–(e|sin i) of ${screened} screened bodies$`));
      if (outliers.length <= 15) expect(textsOf(doc, 'mark-text role-mark').sort()).toEqual(outliers.map((o) => o.designation).sort());
    }
    expect(outliers.map((o) => o.designation)).toContain(ISOLATED);
    expect(outliers.length).toBeLessThanOrEqual(15); // so the names are checked above
  });

  it('writes the same bytes for the same input', () => {
    const again = join(dir, 'again');
    expect(runCli(['families', file, '--families', labels, '--out', again]).status).toBe(0);
    for (const m of MAPS) {
      for (const ext of ['svg', 'png']) {
        const f = `plots/${m}.${ext}`;
        expect(readFileSync(join(again, f)).equals(readFileSync(join(out, f))), f).toBe(true);
      }
    }
    expect(readFileSync(join(again, 'report.md'))).toEqual(readFileSync(join(out, 'report.md')));
  });
});
