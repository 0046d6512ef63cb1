/**
 * The charts of the `families` command: the proper-element maps a–e and a–sin i of the
 * screened bodies (plots/properElementMapChart.ts), coloured by family, the outliers marked.
 * Bodies whose proper elements the theory does not trust are not drawn (the subtitle says how
 * many). Written as plots/proper-a-e.svg/.png and plots/proper-a-sini.svg/.png into the run's
 * output stage, one after the other, so the files are the same on every run.
 */
import { dirname } from 'node:path';
import type { Catalogue } from '../clean/types.js';
import type { FamiliesAnalysis } from '../detect/families.js';
import type { OutputStage } from './outputStage.js';
import { properElementMapChart, renderChart, writeChartFiles, type MapFamily, type ProperElementMapInput } from './plots/index.js';

/** The output folder of the charts. */
export const FAMILIES_PLOTS_FOLDER = 'plots';

/** One chart written: its file stem relative to the output directory (plots/NAME) and what it shows. */
export interface FamiliesPlot {
  stem: string;
  caption: string;
}

/** The maps' input but for the vertical axis: families in table order, outliers in screened order. */
export function familiesMapInput(cat: Catalogue, analysis: FamiliesAnalysis, fapThreshold: number): Omit<ProperElementMapInput, 'element' | 'y'> {
  const table = analysis.clustering.table;
  const position = new Map<number, number>(); // family id → its index in the table
  table.forEach((f, k) => position.set(f.id, k));
  const families: MapFamily[] = table.map((f) => {
    const nm = analysis.names[f.id];
    return { label: nm.name === nm.id ? nm.id : `${nm.name}, ${nm.id}`, members: f.memberCount };
  });
  const family = Int32Array.from(analysis.clustering.labels, (l) => (l >= 0 ? position.get(l) ?? -1 : -1));
  const candidateRows = new Set(analysis.candidates.map((c) => c.index));
  const outliers: number[] = [];
  const outlierDesignations: string[] = [];
  analysis.screen.screened.forEach((row, j) => {
    if (candidateRows.has(row)) { outliers.push(j); outlierDesignations.push(cat.designation[row]); }
  });
  const untrusted = analysis.screen.notScreened['proper-unreliable'];
  return {
    aAu: analysis.a, family, families, outliers, outlierDesignations,
    bodiesNoun: ['screened body', 'screened bodies'],
    outlierLegend: `outlier (false-alarm prob. < ${fapThreshold})`,
    notes: untrusted > 0 ? [`${untrusted} ${untrusted === 1 ? 'body' : 'bodies'} with untrusted proper elements not drawn (unreliable.csv)`] : [],
  };
}

/** Render and stage the two maps; returns the charts written. */
export async function writeFamiliesPlots(stage: OutputStage, cat: Catalogue, analysis: FamiliesAnalysis, fapThreshold: number): Promise<FamiliesPlot[]> {
  await stage.folder(FAMILIES_PLOTS_FOLDER);
  const base = familiesMapInput(cat, analysis, fapThreshold);
  const maps = [
    { name: 'proper-a-e', element: 'e' as const, y: analysis.e, caption: 'proper a against proper e' },
    { name: 'proper-a-sini', element: 'sin i' as const, y: analysis.sinI, caption: 'proper a against proper sin i' },
  ];
  const out: FamiliesPlot[] = [];
  for (const m of maps) {
    const chart = await renderChart(properElementMapChart({ ...base, element: m.element, y: m.y }));
    const svgPath = stage.path(`${FAMILIES_PLOTS_FOLDER}/${m.name}.svg`);
    stage.path(`${FAMILIES_PLOTS_FOLDER}/${m.name}.png`);
    await writeChartFiles(dirname(svgPath), m.name, chart);
    out.push({ stem: `${FAMILIES_PLOTS_FOLDER}/${m.name}`, caption: m.caption });
  }
  return out;
}
