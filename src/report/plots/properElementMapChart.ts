/**
 * A map of proper elements: proper a against proper e or proper sin i, one point a body,
 * coloured by family. The largest families (by members; ties by their order in `families`)
 * get the colours of FAMILY_COLOURS with their names in the legend, the other families one
 * grey, the bodies outside every family a light grey under everything else; the outliers are
 * open black diamonds (smaller when many), named when there are few of them.
 *
 * What is drawn, for any catalogue size (each said in the subtitle):
 * - bodies outside every family: at most `maxBackground`, evenly spaced in the order given
 *   (decimate.ts);
 * - family members: all, except that members of one family falling in the same 1-px cell of
 *   the plot share one symbol (cellMerge.ts; the symbols are wider than that cell, so every
 *   member lies inside a drawn symbol of its colour);
 * - outliers: all, each with its own symbol.
 * Axis domains are fixed here (niceDomain.ts) over every body given, so the cells are known.
 */
import type { TopLevelSpec } from 'vega-lite';
import { firstPerCell, type PixelAxis } from './cellMerge.js';
import { strideIndices } from './decimate.js';
import { niceDomain } from './niceDomain.js';
import { BACKGROUND_BODIES_COLOUR, FAMILY_COLOURS, OTHER_FAMILIES_COLOUR } from './palette.js';

export interface MapFamily {
  label: string; // legend name, unique among the families
  members: number;
}

export interface ProperElementMapInput {
  element: 'e' | 'sin i'; // the vertical axis
  aAu: ArrayLike<number>; // proper a per body; NaN where unknown (not drawn, counted)
  y: ArrayLike<number>; // proper e or sin i per body
  family: ArrayLike<number>; // index into `families` per body, −1 outside every family
  families: readonly MapFamily[];
  outliers: readonly number[]; // bodies drawn as outliers (indices, ascending)
  outlierDesignations: readonly string[]; // one per outlier, for the labels
  outlierLegend: string; // legend entry of the outliers, e.g. 'outlier (false-alarm prob. < 0.01)'
  bodiesNoun?: readonly [string, string]; // what the bodies are, one and many, for the title; default ['body', 'bodies']
  notes?: readonly string[]; // more subtitle lines from the caller (e.g. bodies left out and why)
  maxBackground?: number; // default MAP_MAX_BACKGROUND
  colouredFamilies?: number; // default FAMILY_COLOURS.length (the most there are colours for)
  maxLabels?: number; // outliers named when at most this many; default MAP_MAX_LABELS
}

export const MAP_WIDTH_PX = 720;
export const MAP_HEIGHT_PX = 440;
/** Default most bodies outside every family drawn (about 1.8 MB of SVG at 180 bytes a symbol, measured). */
export const MAP_MAX_BACKGROUND = 10_000;
/** Default most outliers named on the map (more would cover it). */
export const MAP_MAX_LABELS = 15;
/** Cell of the members' merge, in SVG pixels. */
export const MAP_MERGE_CELL_PX = 1;
/** Symbol area of family members in px²: radius √(9/π) ≈ 1.69 px, above the cell's diagonal √2 (cellMerge.ts). */
const MEMBER_SYMBOL_AREA_PX2 = 9;
const BACKGROUND_SYMBOL_AREA_PX2 = 6;

/** Symbol area of the outliers' diamonds in px²: smaller as they grow many, so they do not cover the map (our choice). */
export function outlierSymbolAreaPx2(outliers: number): number {
  return outliers <= 100 ? 50 : outliers <= 1000 ? 24 : 12;
}

function checkInput(input: ProperElementMapInput): void {
  const n = input.aAu.length;
  if (input.y.length !== n || input.family.length !== n) {
    throw new RangeError(`properElementMapChart: aAu, y and family must have one entry per body: ${n}, ${input.y.length}, ${input.family.length}`);
  }
  if (input.outlierDesignations.length !== input.outliers.length) {
    throw new RangeError(`properElementMapChart: ${input.outliers.length} outliers but ${input.outlierDesignations.length} designations`);
  }
  for (let t = 0; t < input.outliers.length; t++) {
    const i = input.outliers[t];
    if (!(Number.isInteger(i) && i >= 0 && i < n) || (t > 0 && i <= input.outliers[t - 1])) {
      throw new RangeError(`properElementMapChart: outlier indices must be ascending body indices below ${n}, got ${i} at ${t}`);
    }
  }
  if (new Set(input.families.map((f) => f.label)).size !== input.families.length) {
    throw new RangeError('properElementMapChart: family labels must be unique');
  }
}

/** Family ranks by size: rank[f] for family f, largest first, ties by index. */
function ranksBySize(families: readonly MapFamily[]): Int32Array {
  const order = families.map((_, f) => f).sort((p, q) => families[q].members - families[p].members || p - q);
  const rank = new Int32Array(families.length);
  order.forEach((f, r) => { rank[f] = r; });
  return rank;
}

const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The Vega-Lite specification of the map (render it with renderChart). */
export function properElementMapChart(input: ProperElementMapInput): TopLevelSpec {
  checkInput(input);
  const n = input.aAu.length;
  const coloured = Math.min(input.colouredFamilies ?? FAMILY_COLOURS.length, FAMILY_COLOURS.length, input.families.length);
  const rank = ranksBySize(input.families);
  const isOutlier = new Uint8Array(n);
  for (const i of input.outliers) isOutlier[i] = 1;
  // classes: 0 outside every family, 1 other families, 2 + r the family of rank r < coloured
  const cls = new Int32Array(n);
  const placed = (i: number) => Number.isFinite(input.aAu[i]) && Number.isFinite(input.y[i]);
  let aMin = Infinity, aMax = -Infinity, yMin = Infinity, yMax = -Infinity, unplaced = 0;
  const background: number[] = [];
  const members: number[][] = Array.from({ length: coloured + 1 }, () => []);
  for (let i = 0; i < n; i++) {
    const f = input.family[i];
    if (!(Number.isInteger(f) && f >= -1 && f < input.families.length)) {
      throw new RangeError(`properElementMapChart: family of body ${i} is ${f}, not −1 or an index below ${input.families.length}`);
    }
    if (!placed(i)) { unplaced++; continue; }
    aMin = Math.min(aMin, input.aAu[i]); aMax = Math.max(aMax, input.aAu[i]);
    yMin = Math.min(yMin, input.y[i]); yMax = Math.max(yMax, input.y[i]);
    cls[i] = f < 0 ? 0 : rank[f] < coloured ? 2 + rank[f] : 1;
    if (isOutlier[i]) continue;
    if (f < 0) background.push(i);
    else members[cls[i] === 1 ? 0 : cls[i] - 1].push(i);
  }
  if (aMin > aMax) { aMin = aMax = yMin = yMax = 0; } // nothing placed: any domain
  const xAxis: PixelAxis = { lo: 0, hi: 0, px: MAP_WIDTH_PX };
  [xAxis.lo, xAxis.hi] = niceDomain(aMin, aMax);
  const yAxis: PixelAxis = { lo: 0, hi: 0, px: MAP_HEIGHT_PX };
  [yAxis.lo, yAxis.hi] = niceDomain(yMin, yMax, 8, 0);

  const bgKeep = Array.from(strideIndices(background.length, Math.max(2, input.maxBackground ?? MAP_MAX_BACKGROUND)), (k) => background[k]);
  const memberOrder = members.flat(); // other families first, then the coloured ones largest first (drawn over them)
  const memberKeep = firstPerCell(memberOrder, input.aAu, input.y, cls, coloured + 2, xAxis, yAxis, MAP_MERGE_CELL_PX);

  let outsideOutliers = 0;
  for (const i of input.outliers) if (placed(i) && input.family[i] < 0) outsideOutliers++;
  const byRank = input.families.map((_, f) => f).sort((p, q) => rank[p] - rank[q]);
  const memberCount = memberOrder.length;
  const otherCount = input.families.length - coloured;
  const classLabel = [
    `outside every family (${background.length + outsideOutliers})`,
    `${count(otherCount, 'other family', 'other families')} (${members[0].length})`,
    ...byRank.slice(0, coloured).map((f) => `${input.families[f].label} (${input.families[f].members})`),
  ];
  const classColour = [BACKGROUND_BODIES_COLOUR, OTHER_FAMILIES_COLOUR, ...FAMILY_COLOURS.slice(0, coloured)];
  const shown = [...Array.from({ length: coloured }, (_, r) => 2 + r), ...(otherCount > 0 ? [1] : []), 0];
  const row = (i: number) => ({ a: input.aAu[i], y: input.y[i], c: classLabel[cls[i]] });
  const x = { field: 'a', type: 'quantitative', title: 'proper a (au)', scale: { domain: [xAxis.lo, xAxis.hi], nice: false, zero: false } } as const;
  const y = { field: 'y', type: 'quantitative', title: `proper ${input.element}`, scale: { domain: [yAxis.lo, yAxis.hi], nice: false, zero: false } } as const;
  const colour = {
    field: 'c', type: 'nominal', title: 'family (members)',
    scale: { domain: shown.map((c) => classLabel[c]), range: shown.map((c) => classColour[c]) },
  } as const;
  const outRows = input.outliers
    .map((i, t) => ({ a: input.aAu[i], y: input.y[i], h: input.outlierLegend, d: input.outlierDesignations[t] }))
    .filter((r) => Number.isFinite(r.a) && Number.isFinite(r.y));
  const labelled = outRows.length > 0 && outRows.length <= (input.maxLabels ?? MAP_MAX_LABELS);
  const symbols = (rows: object[], area: number) =>
    ({ data: { values: rows }, mark: { type: 'point', filled: true, size: area, opacity: 1, aria: false }, encoding: { x, y, color: colour } });
  // Outliers under the family members: outliers lie outside every family, so only when they
  // are many (crowding the map) do their symbols reach a family, which stays visible.
  const layer: object[] = [symbols(bgKeep.map(row), BACKGROUND_SYMBOL_AREA_PX2)];
  if (outRows.length > 0) {
    const area = outlierSymbolAreaPx2(outRows.length);
    layer.push({
      data: { values: outRows },
      mark: { type: 'point', filled: false, color: 'black', size: area, strokeWidth: area >= 50 ? 1.2 : 0.7, opacity: 1, aria: false },
      encoding: { x, y, shape: { field: 'h', type: 'nominal', title: '', scale: { domain: [input.outlierLegend], range: ['diamond'] } } },
    });
  }
  layer.push(symbols(memberKeep.map(row), MEMBER_SYMBOL_AREA_PX2));
  if (labelled) {
    layer.push({
      data: { values: outRows },
      mark: { type: 'text', align: 'left', dx: 6, dy: -6, fontSize: 9, color: 'black', aria: false },
      encoding: { x, y, text: { field: 'd' } },
    });
  }
  const notes = [
    input.families.length === 0 ? 'no family found'
      : otherCount > 0 ? `${input.families.length} families: the ${coloured} largest coloured, the other ${otherCount} in one grey` : `${count(input.families.length, 'family', 'families')}, each coloured`,
    bgKeep.length < background.length ? `${bgKeep.length} of the ${background.length} bodies outside every family drawn (evenly spaced in catalogue order)` : '',
    memberCount > 0 ? `${memberCount === 1 ? 'the 1 family member' : `all ${memberCount} family members`} drawn${memberKeep.length < memberCount ? ` as ${memberKeep.length} symbols (members of one family within one pixel share one)` : ''}` : '',
    outRows.length > 0 ? `${count(outRows.length, 'outlier', 'outliers')} marked ◇${labelled ? ' and named' : ''}` : 'no outlier',
    unplaced > 0 ? `${unplaced} without a value not drawn` : '',
    ...(input.notes ?? []),
  ].filter((s) => s !== '');
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: `Proper a–${input.element} of ${count(n - unplaced, ...(input.bodiesNoun ?? ['body', 'bodies']))}`, subtitle: notes },
    width: MAP_WIDTH_PX,
    height: MAP_HEIGHT_PX,
    config: { legend: { labelLimit: 0 } }, // legend labels in full (Vega's default cuts at 160 px)
    layer,
  } as TopLevelSpec;
}
