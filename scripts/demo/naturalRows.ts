/**
 * One natural row of the asteroid file, drawn from the natural population's own seeded
 * stream: class, H and elements (population.ts), rounded as written, then quality. Shared by
 * the file writer and by the look-ahead (naturalTrusted.ts) that needs the same bodies before
 * the file is written, so both must call exactly this.
 */
import { roundAsteroidElements } from './orbitRows.js';
import { pickAsteroidClass, sampleNaturalAsteroid, type NaturalPlant, type PopulationContext } from './population.js';
import { sampleQuality } from './quality.js';
import type { Random } from './random.js';
import type { Section } from './scenario.js';
import type { AsteroidClass, DemoElements, DemoQuality } from './types.js';

export function drawNaturalRow(
  random: Random, section: Section, ctx: PopulationContext, el: DemoElements, q: DemoQuality, plant: NaturalPlant,
): AsteroidClass {
  const cls = pickAsteroidClass(random, section);
  sampleNaturalAsteroid(random, cls, section, ctx, el, plant);
  roundAsteroidElements(el);
  sampleQuality(random, section, el.H, q);
  return cls;
}
