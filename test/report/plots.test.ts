import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { DOMParser, type Document, type Element } from '@xmldom/xmldom';
import type { TopLevelSpec } from 'vega-lite';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_PNG_WIDTH_PX,
  renderChart,
  resonantAngleChart,
  rotatingFrameChart,
  ROTATING_FRAME_SIDE_PX,
  scatterMapChart,
  STATE_COLOURS,
  strideIndices,
  writeChartFiles,
} from '../../src/report/plots/index.js';

// ---- reading the outputs back, by the published formats ----------------------------------

const SVG_NS = 'http://www.w3.org/2000/svg'; // W3C SVG 1.1, §1.3 (the SVG namespace)

/** Parse as XML (W3C XML 1.0 well-formedness, checked by @xmldom/xmldom); any error throws. */
function parseSvg(svg: string): Document {
  const parser = new DOMParser({
    onError: (level, message) => {
      throw new Error(`SVG is not well-formed XML (${level}): ${message}`);
    },
  });
  return parser.parseFromString(svg, 'image/svg+xml');
}

function hasClasses(el: Element, classes: string[]): boolean {
  const own = (el.getAttribute('class') ?? '').split(/\s+/);
  return classes.every((c) => own.includes(c));
}

/** The <g> elements carrying all the given classes (Vega's scenegraph class names). */
function groups(doc: Document, ...classes: string[]): Element[] {
  return Array.from(doc.getElementsByTagName('g')).filter((g) => hasClasses(g, classes));
}

/** Direct children of an element with a given tag name. */
function children(el: Element, tag: string): Element[] {
  return Array.from(el.childNodes).filter((n): n is Element => n.nodeType === 1 && (n as Element).tagName === tag);
}

function texts(doc: Document, ...classes: string[]): string[] {
  return groups(doc, ...classes).flatMap((g) => Array.from(g.getElementsByTagName('text')).map((t) => t.textContent ?? ''));
}

/** translate(x,y) of an element's transform attribute. */
function translate(el: Element): [number, number] {
  const m = /translate\(([-\d.e]+),([-\d.e]+)\)/.exec(el.getAttribute('transform') ?? '');
  if (!m) throw new Error(`no translate in ${el.getAttribute('transform')}`);
  return [Number(m[1]), Number(m[2])];
}

// PNG: ISO/IEC 15948:2004 (W3C PNG 2nd ed.) §5.2 signature, §5.3 chunk layout (4-byte
// big-endian length, 4-byte type), §11.2.2 IHDR first: width and height as 4-byte
// big-endian unsigned integers at offsets 16 and 20 of the file.
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
function pngHeader(png: Buffer): { widthPx: number; heightPx: number } {
  expect([...png.subarray(0, 8)]).toEqual(PNG_SIGNATURE);
  expect(png.readUInt32BE(8)).toBe(13); // IHDR data length
  expect(png.toString('latin1', 12, 16)).toBe('IHDR');
  return { widthPx: png.readUInt32BE(16), heightPx: png.readUInt32BE(20) };
}

/** φ advancing at `rateDegPerYear` from 0, wrapped to (−180, 180] (common practice). */
function wrappedPhi(tYears: Float64Array, rateDegPerYear: number): Float64Array {
  return Float64Array.from(tYears, (t) => {
    const p = ((((rateDegPerYear * t + 180) % 360) + 360) % 360) - 180;
    return p === -180 ? 180 : p;
  });
}

const years = (n: number, step: number) => Float64Array.from({ length: n }, (_, i) => i * step);

// ---- tests ----------------------------------------------------------------------------------

describe('renderChart: SVG and PNG', () => {
  it('draws one symbol per point, with the axis titles, as well-formed SVG and a PNG of the stated width', async () => {
    const n = 137;
    const t = years(n, 0.05);
    const spec = resonantAngleChart({ designation: '2099 AB', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 40), style: 'points' });
    const { svg, png } = await renderChart(spec, { pngWidthPx: 800 });
    const doc = parseSvg(svg);
    const root = doc.documentElement!;
    expect(root.tagName).toBe('svg');
    expect(root.namespaceURI).toBe(SVG_NS);
    const symbolGroups = groups(doc, 'mark-symbol', 'role-mark');
    expect(symbolGroups).toHaveLength(1);
    expect(children(symbolGroups[0], 'path')).toHaveLength(n);
    expect(texts(doc, 'role-axis-title').sort()).toEqual(['time from epoch (years)', 'φ (degrees)'].sort());
    expect(texts(doc, 'role-title-text')).toEqual(['2099 AB: resonant angle φ = λ − λ(Earth)']);

    const { widthPx, heightPx } = pngHeader(png);
    expect(widthPx).toBe(800);
    // Height follows the SVG's aspect ratio (resvg rounds to whole pixels).
    const svgW = Number(root.getAttribute('width'));
    const svgH = Number(root.getAttribute('height'));
    expect(Math.abs(heightPx - (800 * svgH) / svgW)).toBeLessThanOrEqual(1);
  });

  it('uses the default PNG width when none is asked for, and refuses a silly one', async () => {
    const t = years(10, 1);
    const spec = resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 10) });
    expect(pngHeader((await renderChart(spec)).png).widthPx).toBe(DEFAULT_PNG_WIDTH_PX);
    expect(() => renderChart(spec, { pngWidthPx: 0 })).toThrow(RangeError);
  });

  it('rerendering gives byte-identical SVG and PNG, clip-path ids included', async () => {
    // A clipped mark makes Vega number a clip path from a module-wide counter; without the
    // reset before each render the second SVG would say clip2 where the first said clip1.
    const clipped = {
      data: { values: [{ x: 0, y: 0 }, { x: 2, y: 1 }, { x: 5, y: 3 }] },
      mark: { type: 'line', clip: true },
      encoding: {
        x: { field: 'x', type: 'quantitative', scale: { domain: [0, 3] } },
        y: { field: 'y', type: 'quantitative' },
      },
    } as TopLevelSpec;
    const a = await renderChart(clipped);
    const b = await renderChart(clipped);
    expect(a.svg).toContain('clip-path="url(#clip1)"');
    expect(b.svg).toBe(a.svg);
    expect(b.png.equals(a.png)).toBe(true);

    const t = years(500, 0.1);
    const spec = () => resonantAngleChart({
      designation: '2099 AB', planet: 'Venus', tYears: t, phiDeg: wrappedPhi(t, 25),
      bands: [{ startYears: 0, endYears: 20, state: 'horseshoe' }, { startYears: 20, endYears: 50, state: 'passing' }],
    });
    const c = await renderChart(spec());
    const d = await renderChart(spec());
    expect(d.svg).toBe(c.svg);
    expect(d.png.equals(c.png)).toBe(true);
  });

  it('a fresh process (the built program) renders the same bytes as this one', async () => {
    // dist/ is built by the tests' global setup; the child has none of this process's state.
    const input = { designation: '2099 GH', planet: 'Earth', xAu: [1, 1.1, 0.9, 1], yAu: [0, 0.2, -0.1, 0], planetDistanceAu: 1 };
    const sha = (b: string | Buffer) => createHash('sha256').update(b).digest('hex');
    const here = await renderChart(rotatingFrameChart(input));
    const plots = resolve(import.meta.dirname, '../../dist/src/report/plots/index.js');
    const script = `import { createHash } from 'node:crypto';
      const p = await import(${JSON.stringify(plots)});
      const c = await p.renderChart(p.rotatingFrameChart(${JSON.stringify(input)}));
      const sha = (b) => createHash('sha256').update(b).digest('hex');
      console.log(sha(c.svg) + ' ' + sha(c.png));`;
    const r = spawnSync(process.execPath, ['--input-type=module', '-e', script], { encoding: 'utf8' });
    expect(r.stderr).toBe('');
    expect(r.stdout.trim()).toBe(`${sha(here.svg)} ${sha(here.png)}`);
  });

  it('refuses to load data from a URL or file: chart data are inline (no network at run time)', async () => {
    const remote = { data: { url: 'https://example.org/data.json' }, mark: 'point' } as TopLevelSpec;
    await expect(renderChart(remote)).rejects.toThrow(/must be inline/);
    const local = { data: { url: '/etc/hostname', format: { type: 'csv' } }, mark: 'point' } as TopLevelSpec;
    await expect(renderChart(local)).rejects.toThrow(/must be inline/);
  });
});

describe('resonant-angle chart', () => {
  it('the colour legend lists the states given, in the fixed order, in their fixed colours', async () => {
    const t = years(200, 0.5);
    const spec = resonantAngleChart({
      designation: '2099 CD', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 3),
      bands: [
        { startYears: 0, endYears: 30, state: 'passing' },
        { startYears: 30, endYears: 60, state: 'tadpole-L5' },
        { startYears: 60, endYears: 80, state: 'horseshoe' },
        { startYears: 80, endYears: 100, state: 'tadpole-L5' },
      ],
    });
    const doc = parseSvg((await renderChart(spec)).svg);
    expect(texts(doc, 'role-legend-title')).toEqual(['state']);
    expect(texts(doc, 'role-legend-label')).toEqual(['tadpole-L5', 'horseshoe', 'passing']);
    const swatches = groups(doc, 'role-legend-symbol').map((g) => children(g, 'path')[0].getAttribute('fill'));
    expect(swatches).toEqual([STATE_COLOURS['tadpole-L5'], STATE_COLOURS.horseshoe, STATE_COLOURS.passing]);
    expect(children(groups(doc, 'mark-rect', 'role-mark')[0], 'path')).toHaveLength(4); // one band each
  });

  it('has no legend without bands', async () => {
    const t = years(20, 1);
    const doc = parseSvg((await renderChart(resonantAngleChart({ designation: 'x', planet: 'Mars', tYears: t, phiDeg: wrappedPhi(t, 5) }))).svg);
    expect(groups(doc, 'role-legend')).toHaveLength(0);
  });

  it('breaks the line where φ wraps: one subpath more than the number of wraps', async () => {
    // φ = 100°/yr · t from 0 over 10 years passes 180° + 360°k at 180°, 540° and 900°:
    // three wraps (common practice: φ wrapped to (−180°, 180°]).
    const t = years(1001, 0.01);
    const spec = resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 100) });
    const doc = parseSvg((await renderChart(spec)).svg);
    const d = children(groups(doc, 'mark-line', 'role-mark')[0], 'path')[0].getAttribute('d') ?? '';
    expect(d.match(/M/g)).toHaveLength(4);
  });

  it('draws at most maxPoints samples, evenly spaced, and says so', () => {
    const t = years(20_001, 0.01);
    const spec = resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 1), maxPoints: 5000 });
    const rows = (spec as { layer: { data: { values: { phi: number | null }[] } }[] }).layer[0].data.values;
    // Stride ⌈20 000 / 4 999⌉ = 5: samples 0, 5, …, 20 000, i.e. 4 001 of them, plus one
    // break row where φ (1°/yr over 200 years) wraps at 180°.
    expect(rows.filter((r) => r.phi !== null)).toHaveLength(4001);
    expect(rows.filter((r) => r.phi === null)).toHaveLength(1);
    expect((spec as { title: { subtitle: string } }).title.subtitle).toBe('4001 of 20001 samples drawn (evenly spaced)');
  });

  it('refuses inconsistent input', () => {
    const t = years(3, 1);
    expect(() => resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: [0, 0] })).toThrow(/differ in length/);
    expect(() => resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: [0, -180, 0] })).toThrow(/outside/);
    expect(() => resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: [0, 2, 1], phiDeg: [0, 0, 0] })).toThrow(/decreases/);
    const bad = { startYears: 5, endYears: 5, state: 'horseshoe' } as const;
    expect(() => resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: [0, 0, 0], bands: [bad] })).toThrow(/start before/);
    const unknown = { startYears: 0, endYears: 1, state: 'trojan' } as unknown as typeof bad;
    expect(() => resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: [0, 0, 0], bands: [unknown] })).toThrow(/unknown co-orbital state "trojan"/);
  });
});

describe('rotating-frame chart', () => {
  // A path three times longer in y than in x: a chart scaling each axis to its own data
  // would stretch x.
  const k = years(400, Math.PI / 200);
  const input = {
    designation: '2099 EF', planet: 'Earth',
    xAu: Float64Array.from(k, (a) => 1 + 0.1 * Math.cos(a)),
    yAu: Float64Array.from(k, (a) => 0.3 * Math.sin(a)),
    planetDistanceAu: 1,
  };

  it('gives both axes one domain on a square plot area (the specification)', () => {
    const spec = rotatingFrameChart(input) as unknown as {
      width: number; height: number;
      layer: { encoding: { x: { scale: { domain: number[] } }; y: { scale: { domain: number[] } } } }[];
    };
    expect(spec.width).toBe(spec.height);
    for (const l of spec.layer) expect(l.encoding.x.scale.domain).toEqual(l.encoding.y.scale.domain);
  });

  it('draws one au as the same length on both axes, with the Sun at the origin and the planet at (aP, 0) (the SVG)', async () => {
    const doc = parseSvg((await renderChart(rotatingFrameChart(input))).svg);
    // Tick labels (U+2212 is Vega's minus sign) against their pixel positions, per axis.
    const labelGroups = groups(doc, 'role-axis-label');
    const ticks = labelGroups.map((g) =>
      Array.from(g.getElementsByTagName('text')).map((t) => ({
        au: Number((t.textContent ?? '').replace('−', '-')),
        anchor: t.getAttribute('text-anchor'),
        at: translate(t),
      })),
    );
    const xTicks = ticks.find((ts) => ts[0].anchor === 'middle')!;
    const yTicks = ticks.find((ts) => ts[0].anchor === 'end')!;
    const pxPerAu = (ts: typeof xTicks, axis: 0 | 1) =>
      Math.abs((ts[ts.length - 1].at[axis] - ts[0].at[axis]) / (ts[ts.length - 1].au - ts[0].au));
    const sx = pxPerAu(xTicks, 0);
    const sy = pxPerAu(yTicks, 1);
    expect(Math.abs(sx - sy) / sx).toBeLessThan(1e-9);
    expect(sx * 2 * 1.5).toBeCloseTo(ROTATING_FRAME_SIDE_PX, 6); // domain ±1.5 au for this input

    // Sun and planet: two symbols, at the centre and aP to its right.
    const markers = children(groups(doc, 'mark-symbol', 'role-mark')[0], 'path').map(translate);
    const c = ROTATING_FRAME_SIDE_PX / 2;
    expect(markers[0][0]).toBeCloseTo(c, 6);
    expect(markers[0][1]).toBeCloseTo(c, 6);
    expect(markers[1][0]).toBeCloseTo(c + sx * 1, 6);
    expect(markers[1][1]).toBeCloseTo(c, 6);
    expect(texts(doc, 'mark-text', 'role-mark')).toEqual(['Sun', 'Earth']);
    expect(texts(doc, 'role-axis-title').sort()).toEqual(['x (au), rotating with Earth', 'y (au)']);
  });

  it('refuses mismatched coordinates and a planet distance that is not positive', () => {
    expect(() => rotatingFrameChart({ ...input, yAu: [0] })).toThrow(/differ in length/);
    expect(() => rotatingFrameChart({ ...input, planetDistanceAu: 0 })).toThrow(/positive/);
  });
});

describe('scatter map chart', () => {
  const n = 12_000;
  const x = Float64Array.from({ length: n }, (_, i) => 2 + ((i * 0.618034) % 1.3));
  const y = Float64Array.from({ length: n }, (_, i) => (i * 0.414214) % 0.35);
  x[5] = NaN; // a point without a value
  const category = Array.from({ length: n }, (_, i) => ['Themis', 'Flora', 'background'][i % 3]);
  const highlight = Array.from({ length: n }, (_, i) => i % 1000 === 7);

  it('draws at most maxPoints, every highlighted point, the categories in the legend, and says what it left out', async () => {
    const spec = scatterMapChart({
      title: 'proper elements', xTitle: 'proper a (au)', yTitle: 'proper e', x, y, category,
      highlight, highlightLabel: 'far from every family', maxPoints: 3000,
    });
    const doc = parseSvg((await renderChart(spec)).svg);
    const layers = groups(doc, 'mark-symbol', 'role-mark').map((g) => children(g, 'path').length);
    expect(layers[1]).toBe(12); // i % 1000 === 7 for 12 of the 12 000
    expect(layers[0] + layers[1]).toBeLessThanOrEqual(3000);
    expect(texts(doc, 'role-legend-label')).toEqual(['Flora', 'Themis', 'background', 'far from every family']);
    expect(texts(doc, 'role-axis-title').sort()).toEqual(['proper a (au)', 'proper e']);
    const subtitle = texts(doc, 'role-title-subtitle').join(' ');
    expect(subtitle).toMatch(/^\d+ of 12000 points drawn \(evenly spaced\)/);
    expect(subtitle).toContain('1 without a value not drawn');
  });

  it('refuses arrays of different lengths', () => {
    expect(() => scatterMapChart({ title: 't', xTitle: 'a', yTitle: 'e', x: [1, 2], y: [1], category: ['a', 'b'] })).toThrow(RangeError);
  });
});

describe('deterministic thinning', () => {
  it('keeps every k-th index, the first and the last, never more than asked (common practice)', () => {
    expect([...strideIndices(10, 4)]).toEqual([0, 3, 6, 9]);
    expect([...strideIndices(3, 5)]).toEqual([0, 1, 2]);
    for (const [count, max] of [[20_001, 5000], [5001, 5000], [1_000_000, 5000], [7, 2]]) {
      const idx = strideIndices(count, max);
      expect(idx.length).toBeLessThanOrEqual(max);
      expect(idx[0]).toBe(0);
      expect(idx[idx.length - 1]).toBe(count - 1);
    }
    expect(() => strideIndices(10, 1)).toThrow(RangeError);
  });
});

describe('writeChartFiles', () => {
  it('writes NAME.svg and NAME.png with the rendered bytes and leaves no temporary file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'wayward-plots-'));
    const t = years(30, 1);
    const chart = await renderChart(resonantAngleChart({ designation: 'x', planet: 'Earth', tYears: t, phiDeg: wrappedPhi(t, 7) }));
    await writeChartFiles(dir, 'phi-2099AB', chart);
    expect(readdirSync(dir).sort()).toEqual(['phi-2099AB.png', 'phi-2099AB.svg']);
    expect(readFileSync(join(dir, 'phi-2099AB.svg'), 'utf8')).toBe(chart.svg);
    expect(readFileSync(join(dir, 'phi-2099AB.png')).equals(chart.png)).toBe(true);
    await expect(writeChartFiles(dir, '../escape', chart)).rejects.toThrow(RangeError);
  });
});
