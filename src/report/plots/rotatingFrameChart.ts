/**
 * A body's path in the frame co-rotating with a planet: the Sun at the origin, the planet
 * fixed on the +x axis at (aP, 0), x and y in au (the frame of the restricted three-body
 * problem, Murray & Dermott 1999, §3.2). Both axes share one domain, symmetric about the
 * Sun, and the plot area is square, so one au is the same length on both axes and the
 * loops keep their true shape. The path is drawn in time order.
 */
import type { TopLevelSpec } from 'vega-lite';
import { DEFAULT_MAX_POINTS, strideIndices, thinningNote } from './decimate.js';
import { OKABE_ITO } from './palette.js';

export interface RotatingFrameChartInput {
  designation: string;
  planet: string; // e.g. 'Earth'
  xAu: ArrayLike<number>; // rotating frame, Sun at origin, planet on +x; in time order
  yAu: ArrayLike<number>;
  planetDistanceAu: number; // aP: the planet sits at (aP, 0)
  span?: string; // what part of the history the path covers, for the subtitle (e.g. "−75 to +75 years from the epoch")
  maxPoints?: number; // default DEFAULT_MAX_POINTS
}

/** Side of the square plot area. */
export const ROTATING_FRAME_SIDE_PX = 480;

/**
 * Half-width of the shared axis domain: the largest |x|, |y| or aP plus 5%, rounded up to a
 * multiple of half the power of ten below it (1.05 → 1.5, 5.6 → 6, 0.23 → 0.25).
 */
export function symmetricHalfRangeAu(xAu: ArrayLike<number>, yAu: ArrayLike<number>, aP: number): number {
  let r = Math.abs(aP);
  for (let i = 0; i < xAu.length; i++) {
    if (Number.isFinite(xAu[i])) r = Math.max(r, Math.abs(xAu[i]));
    if (Number.isFinite(yAu[i])) r = Math.max(r, Math.abs(yAu[i]));
  }
  r *= 1.05;
  const step = 10 ** Math.floor(Math.log10(r)) / 2;
  return Math.ceil(r / step) * step;
}

function checkInput(input: RotatingFrameChartInput): void {
  if (input.xAu.length !== input.yAu.length) {
    throw new RangeError(`xAu and yAu differ in length: ${input.xAu.length} and ${input.yAu.length}`);
  }
  if (!(Number.isFinite(input.planetDistanceAu) && input.planetDistanceAu > 0)) {
    throw new RangeError(`planetDistanceAu must be a positive number, got ${input.planetDistanceAu}`);
  }
}

/** The Vega-Lite specification of the chart (render it with renderChart). */
export function rotatingFrameChart(input: RotatingFrameChartInput): TopLevelSpec {
  checkInput(input);
  const keep = strideIndices(input.xAu.length, input.maxPoints ?? DEFAULT_MAX_POINTS);
  const path = Array.from(keep, (i, k) => ({
    k,
    x: Number.isFinite(input.xAu[i]) ? input.xAu[i] : null,
    y: Number.isFinite(input.yAu[i]) ? input.yAu[i] : null,
  }));
  const half = symmetricHalfRangeAu(input.xAu, input.yAu, input.planetDistanceAu);
  const axis = (field: string, title: string) =>
    ({ field, type: 'quantitative' as const, title, scale: { domain: [-half, half], nice: false, zero: false } });
  const x = axis('x', `x (au), rotating with ${input.planet}`);
  const y = axis('y', 'y (au)');
  const markers = [
    { x: 0, y: 0, name: 'Sun', colour: OKABE_ITO.orange },
    { x: input.planetDistanceAu, y: 0, name: input.planet, colour: OKABE_ITO.blue },
  ];
  const note = [input.span ?? '', thinningNote(input.xAu.length, keep.length, 'positions')].filter((x) => x !== '').join('; ');
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: `${input.designation}: path in the frame rotating with ${input.planet}`, ...(note ? { subtitle: note } : {}) },
    width: ROTATING_FRAME_SIDE_PX,
    height: ROTATING_FRAME_SIDE_PX,
    layer: [
      {
        data: { values: path },
        mark: { type: 'line', color: 'black', strokeWidth: 0.5, opacity: 0.55, invalid: 'break-paths-show-domains', aria: false },
        encoding: { x, y, order: { field: 'k', type: 'quantitative' } },
      },
      {
        data: { values: markers },
        mark: { type: 'point', filled: true, size: 120, opacity: 1, stroke: 'black', strokeWidth: 0.5 },
        encoding: { x, y, color: { field: 'colour', type: 'nominal', scale: null } },
      },
      {
        data: { values: markers },
        mark: { type: 'text', dy: -14, fontSize: 12, fontWeight: 'bold' },
        encoding: { x, y, text: { field: 'name' } },
      },
    ],
  } as TopLevelSpec;
}
