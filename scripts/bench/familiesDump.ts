/**
 * The dump the families benchmark scans (invented data): the demo generator's natural
 * population (main-belt background with the demo families, and every other class it draws;
 * scripts/demo/population.ts) in the one-line orbit export format, and after it `plants`
 * planted family outliers (scripts/demo/plantedOutliers.ts: isolated high inclination, unusual
 * eccentricity, inside a Kirkwood gap, far outside a family's spread), with provisional
 * designations of 2029, a year the demo never uses. Deterministic for the seed.
 */
import { appendFileSync } from 'node:fs';
import { join } from 'node:path';
import { formatOrbitExportLine } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import { provisionalText } from '../demo/designations.js';
import { generateDemo } from '../demo/generate.js';
import { fillAsteroidRow, roundAsteroidElements } from '../demo/orbitRows.js';
import { sampleFamilyOutlier, type OutlierVariant } from '../demo/plantedOutliers.js';
import { sampleQuality } from '../demo/quality.js';
import { mulberry32 } from '../demo/random.js';
import { DEMO_EPOCH_JD_TT } from '../demo/scenario.js';
import { emptyElements, emptyQuality } from '../demo/types.js';

const VARIANTS: readonly OutlierVariant[] = ['isolated-high-inclination', 'unusual-eccentricity', 'kirkwood-gap', 'family-halo'];
const PLANT_YEAR = 2029;

export interface FamiliesDump {
  file: string;
  rows: number; // orbit lines written
  planted: string[]; // designations of the planted outliers
}

export async function writeFamiliesDump(dir: string, bodies: number, plants: number, seed: number): Promise<FamiliesDump> {
  const gen = await generateDemo({ seed, outDir: dir, bodies, populationOnly: true });
  const file = join(dir, 'orbits.txt');
  const random = mulberry32((seed ^ 0x5bd1e995) >>> 0);
  const row = emptyOrbitRow();
  const planted: string[] = [];
  const lines: string[] = [];
  for (let k = 0; k < plants; k++) {
    const el = emptyElements();
    sampleFamilyOutlier(random, VARIANTS[k % VARIANTS.length], k, el);
    roundAsteroidElements(el);
    const q = emptyQuality();
    sampleQuality(random, 'multiOpposition', el.H, q);
    const designation = provisionalText(PLANT_YEAR, k % 24, Math.floor(k / 24));
    fillAsteroidRow(row, el, q, designation, NaN, DEMO_EPOCH_JD_TT);
    lines.push(formatOrbitExportLine(row));
    planted.push(designation);
  }
  appendFileSync(file, lines.join('\n') + '\n');
  return { file, rows: gen.orbitLines + plants, planted };
}
