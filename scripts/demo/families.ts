/**
 * Asteroid families of the demo main belt. Centres and ranges of proper a, e, i are taken
 * from Nesvorný (2015), "Nesvorny HCM Asteroid Families V3.0", NASA Planetary Data System
 * (the table /work/shared/data/families-2015.json: a_center_au, e_center, i_center_deg and
 * the min/max ranges), for six families chosen for their spread over the belt. The demo
 * places members with osculating elements equal to proper elements plus small noise, so
 * that families stay tight clusters; real osculating elements scatter more (forced terms).
 */
import type { Random } from './random.js';
import { normal, uniform, uniformAngleDeg } from './random.js';
import type { DemoElements } from './types.js';

export interface DemoFamily {
  name: string;
  weight: number; // relative share of family members
  aMinAu: number;
  aMaxAu: number;
  eCentre: number;
  eHalfWidth: number;
  iCentreDeg: number;
  iHalfWidthDeg: number;
}

/** Nesvorný (2015) rows 401 Vesta, 502 Eunomia, 602 Themis, 605 Koronis, 606 Eos, 610 Karin. */
export const DEMO_FAMILIES: readonly DemoFamily[] = [
  { name: 'Vesta', weight: 3, aMinAu: 2.2407, aMaxAu: 2.4897, eCentre: 0.104, eHalfWidth: 0.0294, iCentreDeg: 6.56, iHalfWidthDeg: 1.19 },
  { name: 'Eunomia', weight: 1.5, aMinAu: 2.5257, aMaxAu: 2.7102, eCentre: 0.1498, eHalfWidth: 0.0249, iCentreDeg: 13.105, iHalfWidthDeg: 1.095 },
  { name: 'Themis', weight: 1.5, aMinAu: 3.019, aMaxAu: 3.2398, eCentre: 0.1489, eHalfWidth: 0.0374, iCentreDeg: 1.49, iHalfWidthDeg: 0.83 },
  { name: 'Koronis', weight: 1.5, aMinAu: 2.8273, aMaxAu: 2.9638, eCentre: 0.0615, eHalfWidth: 0.0386, iCentreDeg: 2.095, iHalfWidthDeg: 0.495 },
  { name: 'Eos', weight: 2, aMinAu: 2.9533, aMaxAu: 3.1549, eCentre: 0.0683, eHalfWidth: 0.0387, iCentreDeg: 10.065, iHalfWidthDeg: 1.355 },
  { name: 'Karin', weight: 0.3, aMinAu: 2.8575, aMaxAu: 2.8755, eCentre: 0.0445, eHalfWidth: 0.0028, iCentreDeg: 2.08, iHalfWidthDeg: 0.06 },
];

export const FAMILY_WEIGHTS: readonly number[] = DEMO_FAMILIES.map((f) => f.weight);

/**
 * A family member: a uniform in the family's range, e and i normal about the centre with
 * σ = half-width / 2 (so ~95 % fall inside the published range). Angles uniform.
 */
export function sampleFamilyMember(random: Random, family: DemoFamily, out: DemoElements): void {
  out.aAu = uniform(random, family.aMinAu, family.aMaxAu);
  out.e = Math.max(0.001, normal(random, family.eCentre, family.eHalfWidth / 2));
  out.iDeg = Math.max(0.01, normal(random, family.iCentreDeg, family.iHalfWidthDeg / 2));
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  out.meanAnomalyDeg = uniformAngleDeg(random);
}
