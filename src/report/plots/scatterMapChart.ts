/**
 * A general two-dimensional scatter (for example proper a against proper e), each point
 * coloured by its category, with an optional highlighted subset drawn on top as open black
 * diamonds. Thinned deterministically to at most maxPoints points: the highlighted points are
 * thinned apart from the rest (given at most half the budget), so a small subset is always
 * drawn in full. Points with a NaN coordinate cannot be placed and are counted in the subtitle.
 */
import type { TopLevelSpec } from 'vega-lite';
import { DEFAULT_MAX_POINTS, strideIndices } from './decimate.js';
import { CATEGORY_COLOURS } from './palette.js';

export interface ScatterMapChartInput {
  title: string;
  xTitle: string; // axis title with its unit, e.g. 'proper a (au)'
  yTitle: string;
  x: ArrayLike<number>; // NaN where unknown (not drawn, counted)
  y: ArrayLike<number>;
  category: readonly string[]; // one per point
  categoryTitle?: string; // legend title, default 'category'
  highlight?: ArrayLike<boolean | number>; // truthy: in the highlighted subset
  highlightLabel?: string; // legend entry of the subset, default 'highlighted'
  maxPoints?: number; // default DEFAULT_MAX_POINTS
}

export const SCATTER_WIDTH_PX = 560;
export const SCATTER_HEIGHT_PX = 420;

function checkInput(input: ScatterMapChartInput): void {
  const n = input.x.length;
  if (input.y.length !== n || input.category.length !== n || (input.highlight && input.highlight.length !== n)) {
    throw new RangeError(
      `x, y, category and highlight must have one entry per point: ${n}, ${input.y.length}, ` +
        `${input.category.length}, ${input.highlight?.length ?? n}`,
    );
  }
}

/** Indices of the subset and of the rest, each thinned by its own stride. */
function drawnIndices(input: ScatterMapChartInput, maxPoints: number): { rest: number[]; marked: number[] } {
  const marked: number[] = [];
  const rest: number[] = [];
  for (let i = 0; i < input.x.length; i++) (input.highlight?.[i] ? marked : rest).push(i);
  const markedKeep = strideIndices(marked.length, Math.max(2, Math.floor(maxPoints / 2)));
  const restBudget = Math.max(2, maxPoints - markedKeep.length);
  const restKeep = strideIndices(rest.length, restBudget);
  return { rest: Array.from(restKeep, (k) => rest[k]), marked: Array.from(markedKeep, (k) => marked[k]) };
}

/** The Vega-Lite specification of the chart (render it with renderChart). */
export function scatterMapChart(input: ScatterMapChartInput): TopLevelSpec {
  checkInput(input);
  const n = input.x.length;
  const { rest, marked } = drawnIndices(input, input.maxPoints ?? DEFAULT_MAX_POINTS);
  const placed = (i: number) => Number.isFinite(input.x[i]) && Number.isFinite(input.y[i]);
  const row = (i: number) => ({ x: input.x[i], y: input.y[i], c: input.category[i] });
  const restRows = rest.filter(placed).map(row);
  const markedRows = marked.filter(placed).map(row);
  const categories = [...new Set(input.category)].sort();
  const colour = categories.length <= CATEGORY_COLOURS.length
    ? { domain: categories, range: CATEGORY_COLOURS.slice(0, categories.length) }
    : { domain: categories, scheme: 'tableau20' };
  let unplaced = 0;
  for (let i = 0; i < n; i++) if (!placed(i)) unplaced++;
  const notes = [
    rest.length + marked.length < n ? `${rest.length + marked.length} of ${n} points drawn (evenly spaced)` : '',
    unplaced > 0 ? `${unplaced} without a value not drawn` : '',
  ].filter((s) => s !== '');
  const x = { field: 'x', type: 'quantitative', title: input.xTitle, scale: { zero: false } } as const;
  const y = { field: 'y', type: 'quantitative', title: input.yTitle, scale: { zero: false } } as const;
  const layer: object[] = [
    {
      data: { values: restRows },
      mark: { type: 'point', filled: true, size: 10, opacity: 0.8, aria: false },
      encoding: { x, y, color: { field: 'c', type: 'nominal', title: input.categoryTitle ?? 'category', scale: colour } },
    },
  ];
  if (input.highlight) {
    const label = input.highlightLabel ?? 'highlighted';
    layer.push({
      data: { values: markedRows.map((r) => ({ ...r, h: label })) },
      mark: { type: 'point', filled: false, color: 'black', size: 60, strokeWidth: 1.2, opacity: 1, aria: false },
      encoding: { x, y, shape: { field: 'h', type: 'nominal', title: '', scale: { domain: [label], range: ['diamond'] } } },
    });
  }
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: input.title, ...(notes.length > 0 ? { subtitle: notes.join('; ') } : {}) },
    width: SCATTER_WIDTH_PX,
    height: SCATTER_HEIGHT_PX,
    config: { legend: { labelLimit: 0 } }, // legend labels in full (Vega's default cuts at 160 px)
    layer,
  } as TopLevelSpec;
}
