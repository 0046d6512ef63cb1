// The proper-element map: what it promises to draw, read back from the rendered SVG (W3C SVG
// 1.1, parsed as XML by @xmldom/xmldom). The belt below is invented (synthetic test data).
import { DOMParser, type Document, type Element } from '@xmldom/xmldom';
import { beforeAll, describe, expect, it } from 'vitest';
import { seededRandom } from '../../src/core/random.js';
import {
  BACKGROUND_BODIES_COLOUR, FAMILY_COLOURS, firstPerCell, MAP_HEIGHT_PX, MAP_WIDTH_PX, niceDomain, OTHER_FAMILIES_COLOUR,
  properElementMapChart, renderChart, type ProperElementMapInput,
} from '../../src/report/plots/index.js';

function parseSvg(svg: string): Document {
  return new DOMParser({ onError: (level, message) => { throw new Error(`SVG is not well-formed XML (${level}): ${message}`); } })
    .parseFromString(svg, 'image/svg+xml');
}
const groups = (doc: Document, ...classes: string[]): Element[] =>
  Array.from(doc.getElementsByTagName('g')).filter((g) => classes.every((c) => (g.getAttribute('class') ?? '').split(/\s+/).includes(c)));
const children = (el: Element, tag: string): Element[] =>
  Array.from(el.childNodes).filter((n): n is Element => n.nodeType === 1 && (n as Element).tagName === tag);
const texts = (doc: Document, ...classes: string[]): string[] =>
  groups(doc, ...classes).flatMap((g) => Array.from(g.getElementsByTagName('text')).map((t) => t.textContent ?? ''));
/** The subtitle's lines (one tspan each). */
const subtitle = (doc: Document): string[] =>
  groups(doc, 'role-title-subtitle').flatMap((g) => Array.from(g.getElementsByTagName('tspan')).map((t) => t.textContent ?? ''));
function translate(el: Element): [number, number] {
  const m = /translate\(([-\d.e]+),([-\d.e]+)\)/.exec(el.getAttribute('transform') ?? '');
  if (!m) throw new Error(`no translate in ${el.getAttribute('transform')}`);
  return [Number(m[1]), Number(m[2])];
}

/**
 * 15 families of 15 different sizes (one of 2 000 members packed tight, so that many of its
 * members share a pixel), 30 000 bodies outside them, and `outliers` of those marked.
 */
function belt(outliers: number): ProperElementMapInput {
  const r = seededRandom(17);
  const a: number[] = [], y: number[] = [], family: number[] = [];
  for (let t = 0; t < 30_000; t++) { a.push(2.1 + 1.2 * r()); y.push(0.3 * r()); family.push(-1); }
  const sizes = [2000, 40, 300, 25, 120, 60, 35, 500, 80, 45, 30, 220, 150, 22, 28];
  sizes.forEach((size, f) => {
    const ca = 2.2 + 0.07 * f, cy = 0.03 + 0.015 * f, w = f === 0 ? 0.002 : 0.01;
    for (let t = 0; t < size; t++) { a.push(ca + w * (r() - 0.5)); y.push(cy + w * (r() - 0.5)); family.push(f); }
  });
  const idx = Array.from({ length: outliers }, (_, t) => 100 * t + 3);
  return {
    element: 'e', aAu: Float64Array.from(a), y: Float64Array.from(y), family: Int32Array.from(family),
    families: sizes.map((members, f) => ({ label: `Fam${f}`, members })),
    outliers: idx, outlierDesignations: idx.map((i) => `2099 X${i}`), outlierLegend: 'outlier (false-alarm prob. < 0.01)',
    notes: ['7 bodies with untrusted proper elements not drawn (unreliable.csv)'],
  };
}

describe('proper-element map', () => {
  const input = belt(5);
  let doc: Document;
  let svg: string;
  let png: Buffer;
  beforeAll(async () => {
    ({ svg, png } = await renderChart(properElementMapChart(input)));
    doc = parseSvg(svg);
  });

  it('colours the 12 largest families in the palette, largest first, one grey for the others and a light grey background', () => {
    const bySize = input.families.map((f, k) => [f.members, k] as const).sort((p, q) => q[0] - p[0]);
    const top = bySize.slice(0, 12).map(([m, k]) => `Fam${k} (${m})`);
    const others = bySize.slice(12).reduce((s, [m]) => s + m, 0);
    expect(texts(doc, 'role-legend-label')).toEqual([...top, `3 other families (${others})`, 'outside every family (30000)', 'outlier (false-alarm prob. < 0.01)']);
    const swatches = groups(doc, 'role-legend-symbol').map((g) => children(g, 'path')[0].getAttribute('fill'));
    expect(swatches.slice(0, 14)).toEqual([...FAMILY_COLOURS, OTHER_FAMILIES_COLOUR, BACKGROUND_BODIES_COLOUR]);
    expect(texts(doc, 'role-axis-title').sort()).toEqual(['proper a (au)', 'proper e']);
  });

  it('marks every outlier with its own symbol and names it when few; says what it drew in the subtitle', () => {
    const marks = groups(doc, 'mark-symbol', 'role-mark');
    expect(marks).toHaveLength(3); // background, outliers, members (drawn over the outliers)
    expect(children(marks[1], 'path')).toHaveLength(5);
    expect(texts(doc, 'mark-text', 'role-mark')).toEqual(input.outlierDesignations);
    const bg = children(marks[0], 'path').length;
    expect(bg).toBeLessThanOrEqual(10_000);
    const sub = subtitle(doc);
    expect(sub).toContain(`${bg} of the 29995 bodies outside every family drawn (evenly spaced in catalogue order)`);
    expect(sub).toContain('15 families: the 12 largest coloured, the other 3 in one grey');
    expect(sub).toContain('5 outliers marked ◇ and named');
    expect(sub).toContain('7 bodies with untrusted proper elements not drawn (unreliable.csv)');
    expect(texts(doc, 'role-title-text')).toEqual([`Proper a–e of ${input.aAu.length} bodies`]);
  });

  it('draws every family member: each lies inside a drawn symbol of its family\'s colour', () => {
    const spec = properElementMapChart(input) as unknown as { layer: { encoding: { x: { scale: { domain: number[] } }; y: { scale: { domain: number[] } } } }[] };
    const [a0, a1] = spec.layer[0].encoding.x.scale.domain, [y0, y1] = spec.layer[0].encoding.y.scale.domain;
    const drawn = children(groups(doc, 'mark-symbol', 'role-mark')[2], 'path').map((p) => ({ at: translate(p), fill: p.getAttribute('fill') }));
    const members = input.family.length - 30_000;
    const sub = subtitle(doc);
    expect(sub).toContain(`all ${members} family members drawn as ${drawn.length} symbols (members of one family within one pixel share one)`);
    expect(drawn.length).toBeLessThan(members); // the packed family shares pixels
    const bySize = input.families.map((f, k) => [f.members, k] as const).sort((p, q) => q[0] - p[0]);
    const colourOf = new Map(bySize.map(([, k], rank) => [k, rank < 12 ? FAMILY_COLOURS[rank] : OTHER_FAMILIES_COLOUR]));
    const radiusPx = Math.sqrt(9 / Math.PI); // symbol area 9 px² (Vega's `size` is the area)
    let worst = 0;
    for (let i = 30_000; i < input.aAu.length; i++) {
      const px = ((input.aAu[i] - a0) / (a1 - a0)) * MAP_WIDTH_PX, py = MAP_HEIGHT_PX - ((input.y[i] - y0) / (y1 - y0)) * MAP_HEIGHT_PX;
      const colour = colourOf.get(input.family[i]);
      let best = Infinity;
      for (const d of drawn) if (d.fill === colour) best = Math.min(best, Math.hypot(d.at[0] - px, d.at[1] - py));
      worst = Math.max(worst, best);
    }
    expect(worst).toBeLessThan(radiusPx); // measured 0.96 px; at most the cell's diagonal, 1.41 px
  });

  it('renders the same bytes again', async () => {
    const again = await renderChart(properElementMapChart(belt(5)));
    expect(again.svg).toBe(svg);
    expect(again.png.equals(png)).toBe(true);
  });

  it('names no outlier when there are more than maxLabels, and draws them all', async () => {
    const many = belt(40);
    const d = parseSvg((await renderChart(properElementMapChart(many))).svg);
    expect(children(groups(d, 'mark-symbol', 'role-mark')[1], 'path')).toHaveLength(40);
    expect(groups(d, 'mark-text', 'role-mark')).toHaveLength(0);
    expect(subtitle(d)).toContain('40 outliers marked ◇');
  });

  it('draws many outliers with smaller diamonds, so they do not cover the map', async () => {
    // half-width of the first diamond's path (Vega draws a symbol of area A as a path around its centre)
    const halfWidthPx = async (outliers: number) => {
      const d = parseSvg((await renderChart(properElementMapChart(belt(outliers)))).svg);
      const path = children(groups(d, 'mark-symbol', 'role-mark')[1], 'path')[0].getAttribute('d') ?? '';
      return Math.max(...(path.match(/-?[\d.]+/g) ?? []).map((v) => Math.abs(Number(v))));
    };
    const few = await halfWidthPx(5), many = await halfWidthPx(250);
    expect(many / few).toBeCloseTo(Math.sqrt(24 / 50), 2); // areas 50 and 24 px²: widths as their square roots
  });

  it('says "body" of one body, and names what the bodies are when told', () => {
    const one = properElementMapChart({ ...belt(0), aAu: [2.5], y: [0.1], family: [-1], bodiesNoun: ['screened body', 'screened bodies'] });
    expect((one as { title: { text: string } }).title.text).toBe('Proper a–e of 1 screened body');
  });

  it('refuses inconsistent input (caller misuse)', () => {
    expect(() => properElementMapChart({ ...input, y: [0.1] })).toThrow(RangeError);
    expect(() => properElementMapChart({ ...input, outlierDesignations: [] })).toThrow(/designations/);
    expect(() => properElementMapChart({ ...input, outliers: [5, 3], outlierDesignations: ['a', 'b'] })).toThrow(/ascending/);
    expect(() => properElementMapChart({ ...input, family: Int32Array.from(input.family, (f) => (f === 3 ? 15 : f)) })).toThrow(/family of body/);
    expect(() => properElementMapChart({ ...input, families: input.families.map((f) => ({ ...f, label: 'same' })) })).toThrow(/unique/);
  });
});

describe('niceDomain', () => {
  it('holds the data and ends on multiples of a 1-2-5 step (common practice)', () => {
    expect(niceDomain(2.13, 3.27)).toEqual([2, 3.4]); // range 1.14 / 8 → step 0.2
    expect(niceDomain(0.0012, 0.297, 8, 0)).toEqual([0, 0.3]); // step 0.05
    expect(niceDomain(-0.3, 0.1, 8, 0)).toEqual([0, 0.1]); // bounded below by the floor
    expect(niceDomain(2.5, 2.5)).toEqual([2.495, 2.505]); // one value: 1% of it over 8 steps → 0.005, one step either side
    expect(() => niceDomain(1, 0)).toThrow(RangeError);
  });
});

describe('firstPerCell', () => {
  it('keeps the first point of each class in each cell, in the order given', () => {
    const ax = { lo: 0, hi: 10, px: 10 };
    // points 0 and 1 share a cell and a class; 2 shares it with another class; 3 is elsewhere
    const x = [0.2, 0.7, 0.5, 5.5], y = [0.2, 0.9, 0.5, 5.5], cls = [0, 0, 1, 0];
    expect(firstPerCell([0, 1, 2, 3], x, y, cls, 2, ax, ax, 1)).toEqual([0, 2, 3]);
    expect(firstPerCell([1, 0, 2, 3], x, y, cls, 2, ax, ax, 1)).toEqual([1, 2, 3]);
    expect(firstPerCell([0, 1], [NaN, 1], [0, 1], [0, 0], 1, ax, ax, 1)).toEqual([1]); // no value: skipped
    expect(() => firstPerCell([0], [1], [1], [2], 2, ax, ax, 1)).toThrow(RangeError);
  });
});
