/**
 * Empty pockets for the families benchmark's planted isolated bodies (invented data): each pocket
 * is a ball in the scaled proper-element coordinates of the families metric (z = (√(5/4)·ln a,
 * √2·e, √2·sin i), Zappalà et al. 1990, src/detect/families/outlierMetric.ts) around a centre
 * drawn from the demo's main-belt background (scripts/demo/mainBeltBackground.ts). Its radius is
 * the one that holds `expectedBodies` background bodies at the centre's density (the background's
 * own density, scripts/demo backgroundDensity, times the background bodies of the dump), so a
 * body at the centre of an emptied pocket has its 8th nearest neighbour at the pocket's rim where
 * its neighbours would be about a quarter of that distance at 60 bodies, a tenth at 1 000. The dump redraws any body whose planted
 * proper elements fall inside a pocket.
 *
 * A centre is kept when (our choices): the families stage trusts the secular theory at the planted
 * body's written elements (the demo's secular field, reliability code 0); the pocket stays clear of
 * e = 0, sin i = 0 and of e, sin i = 0.3 (the stage's limits); its radius is under MAX_RADIUS_MPS
 * (not in the belt's thin outskirts); it lies outside a box around each demo family's parent
 * (|δa| < 0.15 au, |δe| < 0.04, |δ sin i| < 0.04: the families' ejection spread and Yarkovsky
 * drift stay inside it); and it is at least two radii from every other pocket.
 */
import { DEMO_FAMILIES } from '../demo/families.js';
import { backgroundDensity, sampleBackgroundProper } from '../demo/mainBeltBackground.js';
import { roundAsteroidElements } from '../demo/orbitRows.js';
import { properToOsculating, type ProperPlant } from '../demo/properToOsculating.js';
import type { Random } from '../demo/random.js';
import type { DemoSecularField, StageProper } from '../demo/secularForced.js';
import { tisserandJupiter } from '../demo/tisserand.js';
import { emptyElements, type DemoElements } from '../demo/types.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT } from '../../src/detect/families/outlierMetric.js';

/**
 * Background bodies a pocket would hold (our choice). A Poisson count of 60 leaves fewer than 8
 * with probability ≈ 1e-18, yet on the 1.5 M-row dump such plants scored only ≈ 2 (false-alarm
 * probabilities 1–4·10⁻⁴, q ≈ 0.1 over the million bodies tested: none listed), because the
 * null model's own most isolated bodies reach that; 1 000 (an isolation score near ln(1000/8)
 * ≈ 4.8) is meant to stand out catalogue-wide.
 */
export const POCKET_EXPECTED_BODIES = 1000;
/** Largest pocket radius kept, m/s, in a dump of REFERENCE_BACKGROUND bodies; scaled by the cube root of the size ratio in others (our choice). */
export const MAX_RADIUS_MPS = 1000;
const REFERENCE_BACKGROUND = 1_380_000;
/** Upper limit of e and sin i where the stage trusts the theory (src/core/secular/reliability.ts). */
const E_SIN_I_LIMIT = 0.3;
/** Least T_J of a plant, as the demo's natural asteroids (scripts/demo/population.ts NATURAL_ASTEROID_MIN_TJ). */
const MIN_TJ = 3.105;
const MAX_TRIES = 1_000_000;

export interface Pocket {
  x: number; y: number; z: number; // centre, scaled coordinates
  radius: number; // scaled units
  radiusMPerS: number; // the same as a velocity, n·a at the centre
  proper: ProperPlant; // planted proper elements of the body at the centre
  el: DemoElements; // its written elements (rounded)
}

export function scaledOf(p: ProperPlant): [number, number, number] {
  return [SCALED_A_WEIGHT * Math.log(p.aAu), SCALED_E_WEIGHT * p.e, SCALED_SIN_I_WEIGHT * p.sinI];
}

/** Pocket radius (scaled units) holding `expected` of `backgroundBodies` at proper elements p. */
function radiusAt(p: ProperPlant, backgroundBodies: number, expected: number): number {
  // density per unit scaled volume: dz = (√(5/4)/a)·√2·√2 da de d(sin i) = (√5/a) da de d(sin i)
  const rho = backgroundBodies * backgroundDensity(p.aAu, p.e, p.sinI) * p.aAu / Math.sqrt(5);
  return Math.cbrt((3 * expected) / (4 * Math.PI * rho));
}

function nearFamily(p: ProperPlant): boolean {
  return DEMO_FAMILIES.some((f) => Math.abs(p.aAu - f.aAu) < 0.15 && Math.abs(p.e - f.e) < 0.04 && Math.abs(p.sinI - f.sinI) < 0.04);
}

/** `count` pockets for a dump of `backgroundBodies` background bodies; fails loudly when they cannot be placed. */
export function choosePockets(random: Random, field: DemoSecularField, count: number, backgroundBodies: number, H: number): Pocket[] {
  const pockets: Pocket[] = [];
  const stage: StageProper = { aAu: NaN, e: NaN, sinI: NaN, code: -1 };
  const maxRadiusMPerS = MAX_RADIUS_MPS * Math.max(1, Math.cbrt(REFERENCE_BACKGROUND / backgroundBodies));
  for (let tries = 0; pockets.length < count; tries++) {
    if (tries >= MAX_TRIES) throw new Error(`choosePockets: placed ${pockets.length} of ${count} pockets in ${MAX_TRIES} tries`);
    const proper: ProperPlant = { aAu: NaN, e: NaN, sinI: NaN };
    sampleBackgroundProper(random, proper);
    if (!(proper.aAu > 1.8 && proper.aAu < 3.6) || nearFamily(proper)) continue;
    const radius = radiusAt(proper, backgroundBodies, POCKET_EXPECTED_BODIES);
    const radiusMPerS = radius * orbitalSpeedMPerS(proper.aAu);
    if (!(radiusMPerS < maxRadiusMPerS)) continue;
    const de = radius / SCALED_E_WEIGHT, ds = radius / SCALED_SIN_I_WEIGHT;
    if (proper.e < 1.5 * de || proper.sinI < 1.5 * ds || proper.e + 1.5 * de > E_SIN_I_LIMIT || proper.sinI + 1.5 * ds > E_SIN_I_LIMIT) continue;
    const [x, y, z] = scaledOf(proper);
    if (pockets.some((q) => Math.hypot(q.x - x, q.y - y, q.z - z) < 2 * (q.radius + radius))) continue;
    const el = emptyElements();
    el.H = H;
    if (!properToOsculating(random, field, proper, el)) continue;
    roundAsteroidElements(el);
    if (field.properOf(el, stage).code !== 0 || tisserandJupiter(el.aAu, el.e, el.iDeg) < MIN_TJ) continue;
    pockets.push({ x, y, z, radius, radiusMPerS, proper, el });
  }
  return pockets;
}

/** Index of the pocket the proper elements fall in, or −1. */
export function pocketOf(pockets: readonly Pocket[], p: ProperPlant): number {
  const [x, y, z] = scaledOf(p);
  for (let k = 0; k < pockets.length; k++) {
    const q = pockets[k];
    const dx = q.x - x, dy = q.y - y, dz = q.z - z;
    if (dx * dx + dy * dy + dz * dz < q.radius * q.radius) return k;
  }
  return -1;
}
