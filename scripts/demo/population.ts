/**
 * The natural asteroid population of the demo: class mixture by catalogue section,
 * magnitude laws, and the honest-truth rule that keeps unplanted bodies off the Tisserand
 * detector's list (a < 4.8 au outside the Trojan and Hilda zones ⇒ T_J ≥ 3.10).
 * Shares are chosen to show every class in a 20 000-body demo (rare classes are boosted
 * over their real shares); they are not a model of the real catalogue. The main-belt
 * background and the family members are drawn in proper elements (mainBeltBackground.ts,
 * families.ts) and given osculating elements through the planets' forced vectors
 * (properToOsculating.ts); the other classes are drawn in osculating elements.
 */
import { DEMO_FAMILIES, FAMILY_WEIGHTS, sampleFamilyMember, type MemberDraw } from './families.js';
import {
  sampleAmor, sampleApollo, sampleAten, sampleHungaria, sampleMarsCrosser,
} from './innerPopulation.js';
import { sampleBackgroundProper } from './mainBeltBackground.js';
import { properToOsculating, type ProperPlant } from './properToOsculating.js';
import type { DemoSecularField } from './secularForced.js';
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
  numbered: [77.3, 6.7, 2, 1.5, 4, 1, 0.2, 0.8, 3, 0.3, 3.2],
  multiOpposition: [72.5, 5.5, 2, 1.5, 4, 2.5, 0.4, 1.6, 3, 0.7, 6.3],
  oneOpposition: [63, 3, 1, 1, 3, 12, 2, 6, 3, 1, 5],
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

/** What a natural main-belt or family body was planted as (families-truth.csv); role '' for other classes. */
export interface NaturalPlant {
  role: '' | 'background' | 'family member';
  family: number; // index into DEMO_FAMILIES, −1 for none
  proper: ProperPlant; // planted proper elements
  member: MemberDraw; // ejection speed, Yarkovsky drift, D (family members)
}

export function emptyNaturalPlant(): NaturalPlant {
  return {
    role: '', family: -1, proper: { aAu: NaN, e: NaN, sinI: NaN },
    member: { ejectionMPerS: NaN, yarkovskyAu: NaN, diameterKm: NaN },
  };
}

/** What the samplers need besides the random stream. */
export interface PopulationContext {
  jupiterLambdaDeg: number;
  field: DemoSecularField; // the planets' secular field at the epoch
  carved?: number[]; // per pocket of mainBeltBackground.ts, background draws it turned away (counted when given)
}

function clearPlant(plant: NaturalPlant): void {
  plant.role = ''; plant.family = -1;
  plant.member.ejectionMPerS = NaN; plant.member.yarkovskyAu = NaN; plant.member.diameterKm = NaN;
}

/** False when the draw must be repeated (forced vectors undefined at that a). */
function sampleOnce(random: Random, cls: AsteroidClass, ctx: PopulationContext, out: DemoElements, plant: NaturalPlant): boolean {
  clearPlant(plant);
  switch (cls) {
    case 'main-belt':
      plant.role = 'background';
      sampleBackgroundProper(random, plant.proper, ctx.carved);
      return properToOsculating(random, ctx.field, plant.proper, out);
    case 'family': {
      plant.role = 'family member';
      plant.family = pickWeighted(random, FAMILY_WEIGHTS);
      sampleFamilyMember(random, DEMO_FAMILIES[plant.family], out.H, plant.proper, plant.member);
      return properToOsculating(random, ctx.field, plant.proper, out);
    }
    case 'hungaria': sampleHungaria(random, out); return true;
    case 'hilda': sampleHilda(random, ctx.jupiterLambdaDeg, out); return true;
    case 'jupiter-trojan': sampleJupiterTrojan(random, ctx.jupiterLambdaDeg, out); return true;
    case 'apollo': sampleApollo(random, out); return true;
    case 'aten': sampleAten(random, out); return true;
    case 'amor': sampleAmor(random, out); return true;
    case 'mars-crosser': sampleMarsCrosser(random, out); return true;
    case 'centaur': sampleCentaur(random, out); return true;
    case 'tno': sampleTno(random, out); return true;
  }
}

/**
 * H, then elements of one natural body of a class, resampled until the honest-truth rule
 * holds (H is kept: it only sets a family member's Yarkovsky drift). Fails loudly (with the
 * last sample) if a class cannot satisfy it.
 */
export function sampleNaturalAsteroid(
  random: Random, cls: AsteroidClass, section: Section, ctx: PopulationContext, out: DemoElements, plant: NaturalPlant,
): void {
  const [hMin, hMax, alpha] = H_LAW[cls];
  const shift = section === 'oneOpposition' ? ONE_OPPOSITION_H_SHIFT : 0;
  out.H = samplePowerLawH(random, hMin + shift, hMax + shift, alpha);
  for (let k = 0; k < MAX_TRIES; k++) {
    const drawn = sampleOnce(random, cls, ctx, out, plant);
    if (drawn && !asteroidRuleApplies(out.aAu, out.e)) break;
    if (drawn && tisserandJupiter(out.aAu, out.e, out.iDeg) >= NATURAL_ASTEROID_MIN_TJ) break;
    if (k === MAX_TRIES - 1) {
      throw new Error(
        `sampleNaturalAsteroid: class ${cls} gave no orbit with T_J ≥ ${NATURAL_ASTEROID_MIN_TJ} ` +
          `in ${MAX_TRIES} tries; last a=${out.aAu} au, e=${out.e}, i=${out.iDeg}°`,
      );
    }
  }
}
