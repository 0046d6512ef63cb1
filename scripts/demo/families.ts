/**
 * The demo's own asteroid families: invented break-ups at invented places of the main belt,
 * in zones where the families stage trusts the linear secular theory (away from the
 * mean-motion bands of src/core/secular/meanMotionResonances.ts and the secular-resonance
 * divisors of reliability.ts; between 2.1 and 3.58 au the trusted a zones at the demo epoch
 * are 2.099–2.249, 2.265–2.413, 2.425–2.471, 2.531–2.799, 2.849–2.945, 2.969–3.024,
 * 3.036–3.069, 3.081–3.227 and 3.327–3.574 au, measured with the stage's own kernel at
 * e = 0.1, i = 0.05 rad), and where no family of the bundled published list has its ranges
 * (test/demo/demoFamilies.test.ts checks both).
 *
 * A member's proper elements: the parent's plus the Gauss-equation change of an isotropic
 * ejection velocity (breakup.ts), each component normal with σ = `sigmaMPerS` (a Maxwellian
 * speed), σ of order a parent's escape speed, 15–60 m/s (our choice per family), plus a
 * Yarkovsky drift in a since the break-up (yarkovsky.ts). Then osculating elements from the
 * planets' forced vectors (properToOsculating.ts).
 */
import { DEG_PER_RAD } from '../../src/core/constants.js';
import { gaussChange, type GaussChange } from './breakup.js';
import type { ProperPlant } from './properToOsculating.js';
import type { Random } from './random.js';
import { normal } from './random.js';
import { yarkovskyDriftAu } from './yarkovsky.js';

export interface DemoFamily {
  id: string; // id in families-truth.csv
  name: string; // invented
  weight: number; // relative share of family members (expected members in the 20 000-body demo ≈ weight)
  aAu: number; e: number; sinI: number; // parent's proper elements at the break-up
  sigmaMPerS: number; // σ of each ejection-velocity component
  trueAnomalyDeg: number; // f at the break-up
  argLatitudeDeg: number; // ω + f at the break-up
  albedo: number; // geometric albedo p_V, for D from H
  ageMyr: number; // time since the break-up (Yarkovsky drift)
}

/** Invented; every number is our choice (see the file comment for the constraints). */
export const DEMO_FAMILIES: readonly DemoFamily[] = [
  { id: 'A', name: 'Demo family A', weight: 260, aAu: 2.175, e: 0.085, sinI: 0.14, sigmaMPerS: 20, trueAnomalyDeg: 90, argLatitudeDeg: 50, albedo: 0.25, ageMyr: 40 },
  { id: 'B', name: 'Demo family B', weight: 180, aAu: 2.345, e: 0.17, sinI: 0.155, sigmaMPerS: 35, trueAnomalyDeg: 60, argLatitudeDeg: 120, albedo: 0.2, ageMyr: 25 },
  { id: 'C', name: 'Demo family C', weight: 380, aAu: 2.68, e: 0.06, sinI: 0.14, sigmaMPerS: 50, trueAnomalyDeg: 120, argLatitudeDeg: 30, albedo: 0.07, ageMyr: 60 },
  { id: 'D', name: 'Demo family D', weight: 110, aAu: 2.897, e: 0.19, sinI: 0.087, sigmaMPerS: 15, trueAnomalyDeg: 100, argLatitudeDeg: 80, albedo: 0.22, ageMyr: 10 },
  { id: 'E', name: 'Demo family E', weight: 220, aAu: 3.15, e: 0.05, sinI: 0.245, sigmaMPerS: 40, trueAnomalyDeg: 75, argLatitudeDeg: 150, albedo: 0.06, ageMyr: 50 },
  { id: 'F', name: 'Demo family F', weight: 90, aAu: 3.4, e: 0.06, sinI: 0.07, sigmaMPerS: 25, trueAnomalyDeg: 140, argLatitudeDeg: 20, albedo: 0.05, ageMyr: 20 },
];

export const FAMILY_WEIGHTS: readonly number[] = DEMO_FAMILIES.map((f) => f.weight);

/** What a member was given, for families-truth.csv. */
export interface MemberDraw {
  ejectionMPerS: number; // |δV|
  yarkovskyAu: number; // drift in a since the break-up
  diameterKm: number;
}

const change: GaussChange = { daAu: NaN, de: NaN, diRad: NaN };

/** A member's proper elements into `proper`; H must be known (it sets D for the drift). */
export function sampleFamilyMember(random: Random, family: DemoFamily, H: number, proper: ProperPlant, draw: MemberDraw): void {
  const vr = normal(random, 0, family.sigmaMPerS), vt = normal(random, 0, family.sigmaMPerS), vw = normal(random, 0, family.sigmaMPerS);
  gaussChange(family.aAu, family.e, family.trueAnomalyDeg / DEG_PER_RAD, family.argLatitudeDeg / DEG_PER_RAD, vr, vt, vw, change);
  const yark = yarkovskyDriftAu(random, H, family.albedo, family.ageMyr);
  const iParent = Math.asin(family.sinI);
  proper.aAu = family.aAu + change.daAu + yark.driftAu;
  proper.e = Math.abs(family.e + change.de);
  proper.sinI = Math.abs(Math.sin(iParent + change.diRad));
  draw.ejectionMPerS = Math.hypot(vr, vt, vw);
  draw.yarkovskyAu = yark.driftAu;
  draw.diameterKm = yark.diameterKm;
}
