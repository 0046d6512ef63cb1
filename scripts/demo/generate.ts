/**
 * The demo catalogue generator: seeded PRNGs drive everything, in a fixed order, so a seed
 * gives byte-identical files. The co-orbital plants have a stream of their own (they are
 * drawn again until the N-body integration gives the kind asked for: coorbitalPlan.ts), so
 * their redraws do not move the rest of the catalogue. The natural rows of the asteroid file
 * have a stream of their own too: they are drawn once ahead (naturalTrusted.ts) to place the
 * isolated bodies of the families detector against them (plantedOutliers.ts, again a stream
 * of its own), then drawn again, identically, as the file is written. Writes orbits.txt and,
 * unless `populationOnly`, comets.txt, truth.csv, families-truth.csv, coorbital-truth.csv and
 * README.md into `outDir`.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { writeAsteroidFile } from './asteroidFile.js';
import { writeCometFile } from './cometFile.js';
import { DesignationAllocator } from './designations.js';
import { planCoorbitals } from './coorbitalPlan.js';
import { writeCoorbitalTruthCsv, type CoorbitalTruthRow } from './coorbitalTruthTable.js';
import { demoPlanetOrbits, planetLongitudeDeg, SCENARIO_PLANETS, type ScenarioPlanet } from './planets.js';
import { planAsteroidPlants } from './plantedAsteroids.js';
import { planCometPlants } from './plantedComets.js';
import { mulberry32 } from './random.js';
import { writeDemoReadme } from './readme.js';
import { DEFAULT_BODIES, DEFAULT_COMETS } from './scenario.js';
import { FamiliesTruthWriter } from './familiesTruthTable.js';
import { trustedNaturalBodies } from './naturalTrusted.js';
import { chooseOutliers, type OutlierPlant } from './plantedOutliers.js';
import { sectionSizes } from './asteroidFile.js';
import { DemoSecularField } from './secularForced.js';
import type { PopulationContext } from './population.js';
import { writeTruthCsv } from './truthTable.js';
import type { TrailingRow, TruthRow } from './types.js';

export interface DemoOptions {
  seed: number;
  outDir: string;
  bodies?: number; // natural asteroid-file rows (default 20 000)
  comets?: number; // natural comets (default 300)
  populationOnly?: boolean; // orbits.txt only: no plants, bad rows, duplicates or other files
  duplicates?: number; // older re-submitted orbits (default 5)
  integrate?: boolean; // judge co-orbital plants by N-body (default true; false: fast tests, no claim on their state)
  checkBody?: TrailingRow | null; // the demo body for check, appended to orbits.txt as a block of its own (not with populationOnly)
}

export interface DemoResult {
  files: string[]; // paths written
  orbitLines: number;
  cometLines: number;
  truth: TruthRow[];
  asteroidClassCounts: Record<string, number>;
  cometClassCounts: Record<string, number>;
  planetLongitudesDeg: Readonly<Record<ScenarioPlanet, number>>; // osculating λ_P at the epoch (VSOP87B)
  coorbitals: CoorbitalTruthRow[]; // the co-orbital plants and controls as written
  outliers: OutlierPlant[]; // the families detector's planted isolated bodies
  trustedNatural: number; // natural bodies the families stage will trust (those the isolated bodies were placed against)
  familiesTruthRows: number; // rows of families-truth.csv
  familiesTruthCounts: Record<string, number>; // its rows per role ('family member <id>' per family)
}

/** Seed of the co-orbital plants' own stream: the demo seed moved by the golden-ratio Weyl constant (common practice). */
export function coorbitalSeed(seed: number): number {
  return (seed + 0x9e3779b9) >>> 0;
}

/** Seed of the natural rows' stream: the demo seed moved by a second odd constant (a hash multiplier, common practice). */
export function naturalSeed(seed: number): number {
  return (seed + 0x85ebca6b) >>> 0;
}

/** Seed of the planted isolated bodies' stream (a third odd constant, common practice). */
export function outlierSeed(seed: number): number {
  return (seed + 0xc2b2ae35) >>> 0;
}

export async function generateDemo(opts: DemoOptions): Promise<DemoResult> {
  const bodies = opts.bodies ?? DEFAULT_BODIES;
  const comets = opts.comets ?? DEFAULT_COMETS;
  const populationOnly = opts.populationOnly ?? false;
  if (!Number.isInteger(bodies) || bodies < 100) throw new RangeError(`generateDemo: bodies must be an integer ≥ 100, got ${bodies}`);
  if (!Number.isInteger(comets) || comets < 0) throw new RangeError(`generateDemo: comets must be an integer ≥ 0, got ${comets}`);
  mkdirSync(opts.outDir, { recursive: true });
  const random = mulberry32(opts.seed);
  const orbits = demoPlanetOrbits();
  const lon = Object.fromEntries(SCENARIO_PLANETS.map((p) => [p, planetLongitudeDeg(orbits, p)])) as Record<ScenarioPlanet, number>;
  const allocator = new DesignationAllocator();
  const truth: TruthRow[] = [];
  const asteroidClassCounts: Record<string, number> = {};
  const cometClassCounts: Record<string, number> = {};
  const coorbitalPlants = populationOnly ? [] : await planCoorbitals(mulberry32(coorbitalSeed(opts.seed)), orbits, opts.integrate ?? true);
  const population: PopulationContext = { jupiterLambdaDeg: lon.jupiter, field: new DemoSecularField() };
  const sizes = sectionSizes(bodies);
  const trusted = populationOnly ? null : trustedNaturalBodies(mulberry32(naturalSeed(opts.seed)), sizes, population);
  const outliers = trusted ? chooseOutliers(mulberry32(outlierSeed(opts.seed)), population.field, trusted) : [];
  const plants = populationOnly ? [] : planAsteroidPlants(random, coorbitalPlants, outliers);
  const coorbitals: CoorbitalTruthRow[] = [];
  const cometPlants = populationOnly ? [] : planCometPlants(random);
  const orbitsPath = join(opts.outDir, 'orbits.txt');
  const familiesTruthPath = join(opts.outDir, 'families-truth.csv');
  const familiesTruth = populationOnly ? null : new FamiliesTruthWriter(familiesTruthPath);
  const orbitLines = writeAsteroidFile({
    path: orbitsPath, seed: opts.seed, random, naturalRandom: mulberry32(naturalSeed(opts.seed)), population, familiesTruth,
    bodies, plants, badRows: !populationOnly, duplicates: populationOnly ? 0 : (opts.duplicates ?? 5), allocator, truth,
    classCounts: asteroidClassCounts, coorbitals, trailing: populationOnly ? null : (opts.checkBody ?? null),
  }, populationOnly);
  familiesTruth?.close();
  const extra = { outliers, trustedNatural: trusted ? trusted.count : 0, familiesTruthRows: familiesTruth ? familiesTruth.rows : 0, familiesTruthCounts: familiesTruth ? familiesTruth.counts : {} };
  const files = [orbitsPath];
  let cometLines = 0;
  if (!populationOnly) {
    const cometsPath = join(opts.outDir, 'comets.txt');
    cometLines = writeCometFile({ path: cometsPath, random, comets, plants: cometPlants, allocator, truth, classCounts: cometClassCounts });
    const truthPath = join(opts.outDir, 'truth.csv');
    writeTruthCsv(truthPath, truth);
    const coorbitalPath = join(opts.outDir, 'coorbital-truth.csv');
    writeCoorbitalTruthCsv(coorbitalPath, coorbitals);
    const readmePath = join(opts.outDir, 'README.md');
    const result = { files, orbitLines, cometLines, truth, asteroidClassCounts, cometClassCounts, planetLongitudesDeg: lon, coorbitals, ...extra };
    writeDemoReadme(readmePath, opts, result);
    files.push(cometsPath, truthPath, familiesTruthPath, coorbitalPath, readmePath);
  }
  return { files, orbitLines, cometLines, truth, asteroidClassCounts, cometClassCounts, planetLongitudesDeg: lon, coorbitals, ...extra };
}
