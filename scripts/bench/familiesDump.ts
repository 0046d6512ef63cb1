/**
 * The dump the families benchmark scans (invented data), in the one-line orbit export format: a
 * main-belt catalogue of `bodies` natural rows drawn with the demo generator's own samplers —
 * the main-belt background and the demo families in proper elements, turned osculating through
 * the planets' forced vectors (scripts/demo/population.ts, mainBeltBackground.ts, families.ts,
 * properToOsculating.ts, secularForced.ts), H, rounding and orbit quality as the demo writes
 * them — plus `plants` isolated bodies, each at the centre of an empty pocket carved in it
 * (familiesPockets.ts): a natural body drawn inside a pocket is drawn again. Family members are
 * FAMILY_SHARE of the natural rows. The sections (numbered, multi-opposition, one-opposition)
 * take the demo's shares; the plants are numbered bodies spread evenly through that block.
 * Deterministic for the seed: the natural rows from one stream, the pockets and plants from
 * another.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { formatOrbitExportLine, packEpochJd } from '../../src/io/index.js';
import { emptyOrbitRow } from '../../src/io/types.js';
import { sectionSizes } from '../demo/asteroidFile.js';
import { DesignationAllocator } from '../demo/designations.js';
import { asteroidFileHeader } from '../demo/header.js';
import { LineWriter } from '../demo/lineWriter.js';
import { fillAsteroidRow, roundAsteroidElements } from '../demo/orbitRows.js';
import { demoPlanetOrbits, planetLongitudeDeg } from '../demo/planets.js';
import { emptyNaturalPlant, sampleNaturalAsteroid, type PopulationContext } from '../demo/population.js';
import { sampleQuality } from '../demo/quality.js';
import { mulberry32 } from '../demo/random.js';
import { DEMO_EPOCH_JD_TT, SECTIONS, type Section } from '../demo/scenario.js';
import { DemoSecularField } from '../demo/secularForced.js';
import { emptyElements, emptyQuality } from '../demo/types.js';
import { choosePockets, pocketOf, type Pocket } from './familiesPockets.js';

/** Share of family members among the natural rows (our choice: near the demo's numbered block, 6.7 family to 77.3 main-belt). */
export const FAMILY_SHARE = 0.08;
/** H of the planted isolated bodies (our choice: a typical numbered main-belt body). */
export const PLANT_H = 15.5;
const MAX_REDRAWS = 10_000;

export interface FamiliesDump {
  file: string;
  rows: number; // orbit lines written (bodies)
  planted: string[]; // designations of the planted isolated bodies, in pocket order
  pockets: Pocket[];
  redrawn: number; // natural bodies drawn inside a pocket and drawn again
}

/** Seed of the pockets' stream: the dump seed moved by an odd constant (a hash multiplier, common practice). */
export function pocketSeed(seed: number): number {
  return (seed + 0x27d4eb2f) >>> 0;
}

export async function writeFamiliesDump(dir: string, bodies: number, plants: number, seed: number): Promise<FamiliesDump> {
  mkdirSync(dir, { recursive: true });
  const orbits = demoPlanetOrbits();
  const ctx: PopulationContext = { jupiterLambdaDeg: planetLongitudeDeg(orbits, 'jupiter'), field: new DemoSecularField() };
  const pockets = choosePockets(mulberry32(pocketSeed(seed)), ctx.field, plants, Math.round(bodies * (1 - FAMILY_SHARE)), PLANT_H);
  const random = mulberry32(seed);
  const file = join(dir, 'orbits.txt');
  const w = new LineWriter(file);
  const header = asteroidFileHeader(seed, packEpochJd(DEMO_EPOCH_JD_TT), true);
  w.write('wayward families benchmark dump - invented main-belt orbits (background and families) with isolated bodies planted in emptied pockets');
  w.write(`Every number, designation and orbit below is invented (seed ${seed}); none is a real body.`);
  for (const line of header.slice(-2)) w.write(line);
  const allocator = new DesignationAllocator();
  const row = emptyOrbitRow();
  const el = emptyElements();
  const q = emptyQuality();
  const plant = emptyNaturalPlant();
  const sizes = sectionSizes(bodies);
  const planted: string[] = [];
  let redrawn = 0;
  let rows = 0;
  const writeRow = (section: Section): string => {
    if (section === 'numbered') {
      const number = allocator.number();
      fillAsteroidRow(row, el, q, `(${number})`, number, DEMO_EPOCH_JD_TT);
    } else {
      fillAsteroidRow(row, el, q, allocator.provisional(q.designationYear, q.designationHalfMonth), NaN, DEMO_EPOCH_JD_TT);
    }
    w.write(formatOrbitExportLine(row));
    rows++;
    return row.designation;
  };
  for (const section of SECTIONS) {
    const n = sizes[section];
    let nextPlant = 0;
    for (let j = 0; j < n; j++) {
      if (section === 'numbered') {
        while (nextPlant < pockets.length && Math.floor(((nextPlant + 1) * n) / (pockets.length + 1)) === j) {
          Object.assign(el, pockets[nextPlant].el);
          sampleQuality(random, section, el.H, q);
          planted.push(writeRow(section));
          nextPlant++;
        }
      }
      const cls = random() < FAMILY_SHARE ? 'family' : 'main-belt';
      for (let tries = 0; ; tries++) {
        if (tries >= MAX_REDRAWS) throw new Error(`writeFamiliesDump: ${MAX_REDRAWS} draws of a ${cls} body all fell in a pocket`);
        sampleNaturalAsteroid(random, cls, section, ctx, el, plant);
        if (pocketOf(pockets, plant.proper) < 0) break;
        redrawn++;
      }
      roundAsteroidElements(el);
      sampleQuality(random, section, el.H, q);
      writeRow(section);
    }
  }
  w.close();
  return { file, rows, planted, pockets, redrawn };
}
