/**
 * Look-ahead over the natural rows of the asteroid file: draws them again from a fresh copy
 * of the natural stream (the same bodies, in the same order, that the file writer will
 * write) and keeps those whose proper elements the families stage will trust, in the
 * stage's own scaled coordinates (src/detect/families/outlierMetric.ts). The planted
 * outliers are placed against these bodies (plantedOutliers.ts). Counted on the way: the
 * background bodies drawn and, per empty pocket (mainBeltBackground.ts), the background draws
 * it turned away.
 */
import { scaledProperCoordinates } from '../../src/detect/families/outlierMetric.js';
import { drawNaturalRow } from './naturalRows.js';
import { emptyNaturalPlant, type PopulationContext } from './population.js';
import type { Random } from './random.js';
import { SECTIONS, type Section } from './scenario.js';
import type { StageProper } from './secularForced.js';
import { emptyElements, emptyQuality } from './types.js';
import { POCKETS } from './mainBeltBackground.js';

export interface TrustedBodies {
  count: number;
  xyz: Float64Array; // scaled coordinates (√(5/4) ln a, √2 e, √2 sin i), interleaved
  backgroundBodies: number; // main-belt background bodies drawn, trusted or not
  carved: number[]; // per pocket, background draws turned away
}

export function trustedNaturalBodies(random: Random, sizes: Record<Section, number>, population: PopulationContext): TrustedBodies {
  const carved = POCKETS.map(() => 0);
  const ctx: PopulationContext = { ...population, carved };
  let backgroundBodies = 0;
  const el = emptyElements(), q = emptyQuality(), plant = emptyNaturalPlant();
  const p: StageProper = { aAu: NaN, e: NaN, sinI: NaN, code: 0 };
  const a: number[] = [], e: number[] = [], s: number[] = [];
  for (const section of SECTIONS) {
    for (let j = 0; j < sizes[section]; j++) {
      drawNaturalRow(random, section, ctx, el, q, plant);
      if (plant.role === 'background') backgroundBodies++;
      ctx.field.properOf(el, p);
      if (p.code !== 0) continue;
      a.push(p.aAu); e.push(p.e); s.push(p.sinI);
    }
  }
  return { count: a.length, xyz: scaledProperCoordinates(a, e, s), backgroundBodies, carved };
}
