/**
 * The charts of the `coorbitals` command, per resonant body with an N-body series
 * (CoorbitalHistory.series): φ(t) in degrees against years from the epoch over the N-body
 * state segments as bands (plots/resonantAngleChart.ts), and the body's path in the frame
 * rotating with the planet (plots/rotatingFrameChart.ts). Each chart is written as
 * plots/STEM-phi.svg/.png and plots/STEM-rotating.svg/.png into the run's output stage, STEM
 * from the designation and planet (safeFileStems.ts). Rendered one body after another, in
 * the order given, so the files are the same for any thread count.
 */
import { dirname } from 'node:path';
import { DAYS_PER_JULIAN_YEAR } from '../core/constants.js';
import type { CoorbitalHistory } from '../core/coorbital/types.js';
import type { Catalogue } from '../clean/types.js';
import type { CoorbitalBodyResult } from '../detect/coorbitalCandidate.js';
import type { OutputStage } from './outputStage.js';
import { renderChart, resonantAngleChart, rotatingFrameChart, writeChartFiles, type StateBand } from './plots/index.js';
import { safeFileStems } from './safeFileStems.js';

/** The output folder of the charts. */
export const PLOTS_FOLDER = 'plots';

/** The chart files of one body, relative to the output directory, without extension. */
export interface BodyPlots {
  phi: string; // plots/STEM-phi
  rotating: string; // plots/STEM-rotating
}

/** 'earth' → 'Earth'. */
function planetTitle(planet: string): string {
  return planet.charAt(0).toUpperCase() + planet.slice(1);
}

/** The history's segments as bands in years from the epoch. */
export function stateBands(h: CoorbitalHistory): StateBand[] {
  return h.segments
    .map((s) => ({
      startYears: (s.startJdTDB - h.epochJdTDB) / DAYS_PER_JULIAN_YEAR,
      endYears: (s.endJdTDB - h.epochJdTDB) / DAYS_PER_JULIAN_YEAR,
      state: s.state,
    }))
    .filter((b) => b.startYears < b.endYears);
}

/** "years −74.9 to +74.9 from the epoch" for the path's first and last times. */
function pathSpan(tYears: readonly number[]): string {
  if (tYears.length === 0) return '';
  const signed = (y: number): string => `${y < 0 ? '−' : '+'}${Math.abs(y).toFixed(1)}`;
  return `years ${signed(tYears[0])} to ${signed(tYears[tYears.length - 1])} from the epoch`;
}

/**
 * Render and stage the two charts of every body given that has a series (the others get
 * none); returns each plotted body's chart files.
 */
export async function writeCoorbitalPlots(
  stage: OutputStage, cat: Catalogue, bodies: readonly CoorbitalBodyResult[],
): Promise<Map<CoorbitalBodyResult, BodyPlots>> {
  const plotted = bodies.filter((b) => b.history?.series !== undefined);
  const out = new Map<CoorbitalBodyResult, BodyPlots>();
  if (plotted.length === 0) return out;
  await stage.folder(PLOTS_FOLDER);
  const stems = safeFileStems(plotted.map((b) => `${cat.designation[b.entry.index]} ${b.entry.planet}`));
  for (let j = 0; j < plotted.length; j++) {
    const b = plotted[j];
    const h = b.history!;
    const s = h.series!;
    const designation = cat.designation[b.entry.index];
    const planet = planetTitle(b.entry.planet);
    const names = { phi: `${stems[j]}-phi`, rotating: `${stems[j]}-rotating` };
    const phi = await renderChart(resonantAngleChart({ designation, planet, tYears: s.tYears, phiDeg: s.phiDeg, bands: stateBands(h) }));
    const rot = await renderChart(rotatingFrameChart({
      designation, planet, xAu: s.xAu, yAu: s.yAu, planetDistanceAu: s.planetDistanceAu, span: pathSpan(s.pathTYears),
    }));
    for (const [name, chart] of [[names.phi, phi], [names.rotating, rot]] as const) {
      const svgPath = stage.path(`${PLOTS_FOLDER}/${name}.svg`);
      stage.path(`${PLOTS_FOLDER}/${name}.png`);
      await writeChartFiles(dirname(svgPath), name, chart);
    }
    out.set(b, { phi: `${PLOTS_FOLDER}/${names.phi}`, rotating: `${PLOTS_FOLDER}/${names.rotating}` });
  }
  return out;
}
