/**
 * The residual plots of `check`: O−C in α cos δ and δ (arcsec) against time (decimal year,
 * UTC), one chart per model fitted, the comparison set's outliers marked; rendered headless to
 * SVG and PNG through the project's chart pipeline (plots/) into the run's stage.
 */
import { dirname } from 'node:path';
import { DAYS_PER_JULIAN_YEAR } from '../core/constants.js';
import type { CheckModelFit } from '../fit/check/index.js';
import type { AstrometryObservation } from '../io/astrometry/types.js';
import type { TopLevelSpec } from 'vega-lite';
import type { OutputStage } from './outputStage.js';
import { renderChart, scatterMapChart, writeChartFiles } from './plots/index.js';

export const CHECK_PLOTS_FOLDER = 'plots';

/** JD of J2000.0, 2000 January 1.5 (IAU; common practice). */
const JD_J2000 = 2451545.0;

/** Decimal year of a JD (UTC), 2000.0 at J2000; good to a day, enough for a time axis. */
export function decimalYear(jdUtc: number): number {
  return 2000 + (jdUtc - JD_J2000) / DAYS_PER_JULIAN_YEAR;
}

/** Years on the time axis as plain integers ('2031', not the default grouping '2,031'). */
function plainYearAxis(spec: TopLevelSpec): TopLevelSpec {
  for (const layer of (spec as { layer?: { encoding?: { x?: object } }[] }).layer ?? []) {
    if (layer.encoding?.x) layer.encoding.x = { ...layer.encoding.x, axis: { format: 'd' } };
  }
  return spec;
}

/** Stages plots/residuals-MODEL.svg and .png for each fit; returns the file stems written. */
export async function writeCheckPlots(stage: OutputStage, observations: readonly AstrometryObservation[], fits: readonly CheckModelFit[]): Promise<string[]> {
  await stage.folder(CHECK_PLOTS_FOLDER);
  const stems: string[] = [];
  for (const f of fits) {
    const x: number[] = [], y: number[] = [], category: string[] = [], highlight: boolean[] = [];
    observations.forEach((o, i) => {
      if (f.status[i] === 'unusable') return;
      const r = f.fit.observations[i];
      for (const [label, value] of [['α cos δ', r.residualRaCosDecArcsec], ['δ', r.residualDecArcsec]] as const) {
        x.push(decimalYear(o.timeJdUtc)); y.push(value); category.push(label); highlight.push(f.status[i] === 'rejected');
      }
    });
    const spec = plainYearAxis(scatterMapChart({
      title: `O−C, ${f.id} model (${f.kept} kept, ${f.rejected} outliers, weighted RMS ${f.weightedRmsArcsec.toFixed(3)}″)`,
      xTitle: 'time (year, UTC)', yTitle: 'O−C (arcsec)', x, y, category, categoryTitle: 'coordinate',
      highlight, highlightLabel: 'outlier (not fitted)',
    }));
    const chart = await renderChart(spec);
    const name = `residuals-${f.id}`;
    const svgPath = stage.path(`${CHECK_PLOTS_FOLDER}/${name}.svg`);
    stage.path(`${CHECK_PLOTS_FOLDER}/${name}.png`);
    await writeChartFiles(dirname(svgPath), name, chart);
    stems.push(`${CHECK_PLOTS_FOLDER}/${name}`);
  }
  return stems;
}
