/**
 * The demo catalogue generator: one seeded PRNG drives everything, in a fixed order, so a
 * seed gives byte-identical files. Writes orbits.txt and, unless `populationOnly`,
 * comets.txt, truth.csv and README.md into `outDir`.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { writeAsteroidFile } from './asteroidFile.js';
import { writeCometFile } from './cometFile.js';
import { DesignationAllocator } from './designations.js';
import { planetMeanLongitudeDeg } from './planets.js';
import { planAsteroidPlants } from './plantedAsteroids.js';
import { planCometPlants } from './plantedComets.js';
import type { PlanetLongitudes } from './plantedCoorbitals.js';
import { mulberry32 } from './random.js';
import { writeDemoReadme } from './readme.js';
import { DEFAULT_BODIES, DEFAULT_COMETS, DEMO_EPOCH_JD_TT } from './scenario.js';
import { writeTruthCsv } from './truthTable.js';
import type { TruthRow } from './types.js';

export interface DemoOptions {
  seed: number;
  outDir: string;
  bodies?: number; // natural asteroid-file rows (default 20 000)
  comets?: number; // natural comets (default 300)
  populationOnly?: boolean; // orbits.txt only: no plants, bad rows, duplicates or other files
  duplicates?: number; // older re-submitted orbits (default 5)
}

export interface DemoResult {
  files: string[]; // paths written
  orbitLines: number;
  cometLines: number;
  truth: TruthRow[];
  asteroidClassCounts: Record<string, number>;
  cometClassCounts: Record<string, number>;
  planetLongitudesDeg: PlanetLongitudes;
}

/** Mean longitudes of Earth, Mars, Jupiter and Neptune at the demo epoch (planets.ts). */
export function demoPlanetLongitudes(): PlanetLongitudes {
  return {
    earth: planetMeanLongitudeDeg('earth', DEMO_EPOCH_JD_TT),
    mars: planetMeanLongitudeDeg('mars', DEMO_EPOCH_JD_TT),
    jupiter: planetMeanLongitudeDeg('jupiter', DEMO_EPOCH_JD_TT),
    neptune: planetMeanLongitudeDeg('neptune', DEMO_EPOCH_JD_TT),
  };
}

export function generateDemo(opts: DemoOptions): DemoResult {
  const bodies = opts.bodies ?? DEFAULT_BODIES;
  const comets = opts.comets ?? DEFAULT_COMETS;
  const populationOnly = opts.populationOnly ?? false;
  if (!Number.isInteger(bodies) || bodies < 100) throw new RangeError(`generateDemo: bodies must be an integer ≥ 100, got ${bodies}`);
  if (!Number.isInteger(comets) || comets < 0) throw new RangeError(`generateDemo: comets must be an integer ≥ 0, got ${comets}`);
  mkdirSync(opts.outDir, { recursive: true });
  const random = mulberry32(opts.seed);
  const lon = demoPlanetLongitudes();
  const allocator = new DesignationAllocator();
  const truth: TruthRow[] = [];
  const asteroidClassCounts: Record<string, number> = {};
  const cometClassCounts: Record<string, number> = {};
  const plants = populationOnly ? [] : planAsteroidPlants(random, lon);
  const cometPlants = populationOnly ? [] : planCometPlants(random);
  const orbitsPath = join(opts.outDir, 'orbits.txt');
  const orbitLines = writeAsteroidFile({
    path: orbitsPath, seed: opts.seed, random, bodies, plants, badRows: !populationOnly,
    duplicates: populationOnly ? 0 : (opts.duplicates ?? 5), jupiterLambdaDeg: lon.jupiter, allocator, truth,
    classCounts: asteroidClassCounts,
  }, populationOnly);
  const files = [orbitsPath];
  let cometLines = 0;
  if (!populationOnly) {
    const cometsPath = join(opts.outDir, 'comets.txt');
    cometLines = writeCometFile({ path: cometsPath, random, comets, plants: cometPlants, allocator, truth, classCounts: cometClassCounts });
    const truthPath = join(opts.outDir, 'truth.csv');
    writeTruthCsv(truthPath, truth);
    const readmePath = join(opts.outDir, 'README.md');
    const result = { files, orbitLines, cometLines, truth, asteroidClassCounts, cometClassCounts, planetLongitudesDeg: lon };
    writeDemoReadme(readmePath, opts, result);
    files.push(cometsPath, truthPath, readmePath);
  }
  return { files, orbitLines, cometLines, truth, asteroidClassCounts, cometClassCounts, planetLongitudesDeg: lon };
}
