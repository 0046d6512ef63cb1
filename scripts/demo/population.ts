/**
 * The natural asteroid population of the demo: class mixture by catalogue section,
 * magnitude laws, and the honest-truth rule that keeps unplanted bodies off the Tisserand
 * detector's list (a < 4.8 au outside the Trojan and Hilda zones ⇒ T_J ≥ 3.10).
 * Shares are chosen to show every class in a 20 000-body demo (rare classes are boosted
 * over their real shares); they are not a model of the real catalogue.
 */
import { DEMO_FAMILIES, FAMILY_WEIGHTS, sampleFamilyMember } from './families.js';
import {
  sampleAmor, sampleApollo, sampleAten, sampleHungaria, sampleMainBelt, sampleMarsCrosser,
} from './innerPopulation.js';
import { samplePowerLawH } from './magnitudes.js';
import { sampleCentaur, sampleHilda, sampleJupiterTrojan, sampleTno } from './outerPopulation.js';
import type { Random } from './random.js';
import { pickWeighted } from './random.js';
import type { Section } from './scenario.js';
import { asteroidRuleApplies, tisserandJupiter } from './tisserand.js';
import type { AsteroidClass, DemoElements } from './types.js';

export const ASTEROID_CLASSES: readonly AsteroidClass[] = [
  'main-belt', 'family', 'hungaria', 'hilda', 'jupiter-trojan',
  'apollo', 'aten', 'amor', 'mars-crosser', 'centaur', 'tno',
];

/** Class weights per section, in ASTEROID_CLASSES order (one-opposition: more NEOs). */
const SECTION_CLASS_WEIGHTS: Readonly<Record<Section, readonly number[]>> = {
  numbered: [70, 14, 2, 1.5, 4, 1, 0.2, 0.8, 3, 0.3, 3.2],
  multiOpposition: [68, 10, 2, 1.5, 4, 2.5, 0.4, 1.6, 3, 0.7, 6.3],
  oneOpposition: [62, 4, 1, 1, 3, 12, 2, 6, 3, 1, 5],
};

/** Power-law H range [min, max] and slope α per class (from memory, see magnitudes.ts). */
const H_LAW: Readonly<Record<AsteroidClass, readonly [number, number, number]>> = {
  'main-belt': [11, 19.5, 0.35], family: [11.5, 19.5, 0.35], hungaria: [13, 19, 0.35],
  hilda: [11, 17, 0.3], 'jupiter-trojan': [9, 16, 0.3], apollo: [15, 26, 0.35],
  aten: [16, 26, 0.35], amor: [15, 25, 0.35], 'mars-crosser': [13, 19.5, 0.35],
  centaur: [7, 14, 0.3], tno: [3.5, 9, 0.3],
};

/** Extra faintness of one-opposition bodies, mag (common practice: they are the faint end). */
const ONE_OPPOSITION_H_SHIFT = 1.5;

/** Natural asteroids under the rule must have T_J ≥ this (3.10 plus a rounding margin). */
export const NATURAL_ASTEROID_MIN_TJ = 3.105;
const MAX_TRIES = 10_000;

export function pickAsteroidClass(random: Random, section: Section): AsteroidClass {
  return ASTEROID_CLASSES[pickWeighted(random, SECTION_CLASS_WEIGHTS[section])];
}

function sampleOnce(random: Random, cls: AsteroidClass, jupiterLambdaDeg: number, out: DemoElements): void {
  switch (cls) {
    case 'main-belt': return sampleMainBelt(random, out);
    case 'family': return sampleFamilyMember(random, DEMO_FAMILIES[pickWeighted(random, FAMILY_WEIGHTS)], out);
    case 'hungaria': return sampleHungaria(random, out);
    case 'hilda': return sampleHilda(random, jupiterLambdaDeg, out);
    case 'jupiter-trojan': return sampleJupiterTrojan(random, jupiterLambdaDeg, out);
    case 'apollo': return sampleApollo(random, out);
    case 'aten': return sampleAten(random, out);
    case 'amor': return sampleAmor(random, out);
    case 'mars-crosser': return sampleMarsCrosser(random, out);
    case 'centaur': return sampleCentaur(random, out);
    case 'tno': return sampleTno(random, out);
  }
}

/**
 * Elements and H of one natural body of a class, resampled until the honest-truth rule
 * holds. Fails loudly (with the last sample) if a class cannot satisfy it.
 */
export function sampleNaturalAsteroid(
  random: Random, cls: AsteroidClass, section: Section, jupiterLambdaDeg: number, out: DemoElements,
): void {
  for (let k = 0; k < MAX_TRIES; k++) {
    sampleOnce(random, cls, jupiterLambdaDeg, out);
    if (!asteroidRuleApplies(out.aAu, out.e)) break;
    if (tisserandJupiter(out.aAu, out.e, out.iDeg) >= NATURAL_ASTEROID_MIN_TJ) break;
    if (k === MAX_TRIES - 1) {
      throw new Error(
        `sampleNaturalAsteroid: class ${cls} gave no orbit with T_J ≥ ${NATURAL_ASTEROID_MIN_TJ} ` +
          `in ${MAX_TRIES} tries; last a=${out.aAu} au, e=${out.e}, i=${out.iDeg}°`,
      );
    }
  }
  const [hMin, hMax, alpha] = H_LAW[cls];
  const shift = section === 'oneOpposition' ? ONE_OPPOSITION_H_SHIFT : 0;
  out.H = samplePowerLawH(random, hMin + shift, hMax + shift, alpha);
}
