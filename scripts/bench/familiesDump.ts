/**
 * The dump the families benchmark scans (invented data): the demo generator's natural
 * population (main-belt background with the demo families planted in proper elements, and every
 * other class it draws; scripts/demo/population.ts) in the one-line orbit export format.
 * Planted isolated bodies are not added here yet: the demo's isolated bodies are placed against
 * the drawn population (scripts/demo/plantedOutliers.ts), which this dump does not yet do.
 * Deterministic for the seed.
 */
import { join } from 'node:path';
import { generateDemo } from '../demo/generate.js';

export interface FamiliesDump {
  file: string;
  rows: number; // orbit lines written
  planted: string[]; // designations of the planted outliers (none yet)
}

export async function writeFamiliesDump(dir: string, bodies: number, _plants: number, seed: number): Promise<FamiliesDump> {
  const gen = await generateDemo({ seed, outDir: dir, bodies, populationOnly: true });
  return { file: join(dir, 'orbits.txt'), rows: gen.orbitLines, planted: [] };
}
