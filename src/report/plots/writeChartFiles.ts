/**
 * Write one rendered chart as NAME.svg and NAME.png in a directory, each atomically
 * (written to a temporary sibling and renamed: atomicWrite.ts). Inside a run, pass the
 * staging directory's path so the charts are committed with the other outputs.
 */
import { join } from 'node:path';
import { writeFileAtomic } from '../atomicWrite.js';
import type { RenderedChart } from './renderChart.js';

/** A chart name: letters, digits, '.', '_' and '-', not starting with '.'; no path separators. */
const CHART_NAME = /^[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

/** Write `dir/NAME.svg` and `dir/NAME.png`; returns the two paths written (svg, png). */
export async function writeChartFiles(dir: string, name: string, chart: RenderedChart): Promise<[string, string]> {
  if (!CHART_NAME.test(name)) {
    throw new RangeError(`chart name must be letters, digits, '.', '_' or '-' (not starting with '.'), got "${name}"`);
  }
  const svgPath = join(dir, `${name}.svg`);
  const pngPath = join(dir, `${name}.png`);
  await writeFileAtomic(svgPath, chart.svg);
  await writeFileAtomic(pngPath, chart.png);
  return [svgPath, pngPath];
}
