/**
 * Planted isolated bodies for the families detector: main-belt bodies placed, in proper
 * elements, in the emptiest places of the drawn catalogue, inside boxes where the families
 * stage trusts the secular theory with a margin (away from mean-motion bands, from the
 * Mars-crossing edge, from the e and sin i limits of reliability.ts, and from the demo's
 * own T_J rule in the outer belt).
 *
 * By construction against the drawn bodies (naturalTrusted.ts: every natural body the stage
 * will trust, family members included): candidates uniform in the boxes (their own seeded
 * stream) are kept when the nearest drawn body is at least MIN_NEAREST_MPS away in the
 * families metric (Zappalà et al. 1990, outlierMetric.ts); they are ranked by how many
 * background bodies the generator's own smooth density would put within the distance of
 * the 8th nearest drawn body (the emptiest places against the background first; k = 8 as in
 * the stage's isolation score, which is not used here), and taken greedily at least
 * MIN_APART_MPS from each other. Their osculating elements come from properToOsculating.ts
 * like every other main-belt body; H uniform 14–17 (our choice). All keep T_J ≥ 3.105 so they
 * do not also fall on the Tisserand list.
 */
import { buildKNearestGrid } from '../../src/detect/families/kNearestGrid.js';
import { cellSizeForOccupancy } from '../../src/detect/families/kNearestCellSize.js';
import { kNearestOf } from '../../src/detect/families/kNearest.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT } from '../../src/detect/families/outlierMetric.js';
import type { TrustedBodies } from './naturalTrusted.js';
import { roundAsteroidElements } from './orbitRows.js';
import { properToOsculating, type ProperPlant } from './properToOsculating.js';
import type { Random } from './random.js';
import { pickWeighted, uniform } from './random.js';
import type { DemoSecularField, StageProper } from './secularForced.js';
import { backgroundDensity } from './mainBeltBackground.js';
import { tisserandJupiter } from './tisserand.js';
import { emptyElements, type DemoElements } from './types.js';

/** Planted isolated bodies (our choice: within the 10–20 a 20 000-body demo can hold apart). */
export const OUTLIER_COUNT = 15;
/** Least distance to any drawn body, m/s (our choice: several times the families' spread). */
export const MIN_NEAREST_MPS = 600;
/** Least distance between two planted isolated bodies, m/s (our choice). */
export const MIN_APART_MPS = 1000;
const CANDIDATES = 40_000;
const K = 8;
const MIN_TJ = 3.105;

/**
 * Proper-element boxes [aMin, aMax, eMin, eMax, sinIMin, sinIMax] (our choice, see the file
 * comment): each at least 0.015 au inside a trusted zone, with the osculating e and sin i
 * (proper plus forced: e_f ≈ 0.04, sin i_f ≈ 0.015–0.021 there) below the 0.3 limits.
 */
export const OUTLIER_BOXES: readonly (readonly number[])[] = [
  [2.28, 2.4, 0.03, 0.16, 0.03, 0.27], // inner belt, between the 7:2 and Mars's 1:2; q stays above 1.75 au
  [2.545, 2.785, 0.03, 0.24, 0.03, 0.265], // middle belt, between the 3:1 and 5:2
  [2.865, 2.93, 0.03, 0.24, 0.03, 0.265], // between the 5:2 and 7:3
];

export interface OutlierPlant {
  proper: ProperPlant; // planted proper elements
  el: DemoElements; // osculating, rounded as written
  nearestMPerS: number; // to the nearest drawn body
  eighthMPerS: number; // to the 8th nearest drawn body
}

function boxVolume(b: readonly number[]): number {
  return (Math.log(b[1] / b[0])) * (b[3] - b[2]) * (b[5] - b[4]);
}

interface Candidate { proper: ProperPlant; xyz: number[]; nearest: number; eighth: number; expected: number }

function drawCandidates(random: Random, trusted: TrustedBodies): Candidate[] {
  const weights = OUTLIER_BOXES.map(boxVolume);
  const out: Candidate[] = [];
  const query = new Float64Array(3 * CANDIDATES);
  for (let c = 0; c < CANDIDATES; c++) {
    const b = OUTLIER_BOXES[pickWeighted(random, weights)];
    const proper = { aAu: b[0] * Math.exp(uniform(random, 0, Math.log(b[1] / b[0]))), e: uniform(random, b[2], b[3]), sinI: uniform(random, b[4], b[5]) };
    const xyz = [SCALED_A_WEIGHT * Math.log(proper.aAu), SCALED_E_WEIGHT * proper.e, SCALED_SIN_I_WEIGHT * proper.sinI];
    query.set(xyz, 3 * c);
    out.push({ proper, xyz, nearest: NaN, eighth: NaN, expected: NaN });
  }
  const grid = buildKNearestGrid(trusted.xyz, cellSizeForOccupancy(trusted.xyz, 4, 1 << 20));
  const nn = kNearestOf(grid, query, K);
  out.forEach((c, j) => {
    const v = orbitalSpeedMPerS(c.proper.aAu);
    c.nearest = nn.distance[j * K] * v;
    c.eighth = nn.distance[j * K + K - 1] * v;
    c.expected = expectedWithin(c.proper, nn.distance[j * K + K - 1]);
  });
  return out;
}

/**
 * How many background bodies the generator's own density (mainBeltBackground.ts) puts, per
 * background body drawn, in the ball of scaled radius r about a place: density × ball volume,
 * the volume taken to (a, e, sin i) by the Jacobian of the scaled coordinates,
 * da de d(sin i) = a / (√(5/4) · √2 · √2) dz³. Only its ranking is used.
 */
function expectedWithin(p: ProperPlant, rScaled: number): number {
  const jacobian = p.aAu / (SCALED_A_WEIGHT * SCALED_E_WEIGHT * SCALED_SIN_I_WEIGHT);
  return backgroundDensity(p.aAu, p.e, p.sinI) * jacobian * (4 / 3) * Math.PI * rScaled ** 3;
}

function apartMPerS(x: Candidate, y: Candidate): number {
  return Math.hypot(x.xyz[0] - y.xyz[0], x.xyz[1] - y.xyz[1], x.xyz[2] - y.xyz[2]) * orbitalSpeedMPerS(x.proper.aAu);
}

/** The planted isolated bodies, most isolated first. Throws when fewer than OUTLIER_COUNT fit. */
export function chooseOutliers(random: Random, field: DemoSecularField, trusted: TrustedBodies): OutlierPlant[] {
  if (trusted.count <= K) throw new RangeError(`chooseOutliers: need more than ${K} trusted bodies, got ${trusted.count}`);
  const ranked = drawCandidates(random, trusted)
    .filter((c) => c.nearest >= MIN_NEAREST_MPS)
    .sort((x, y) => y.eighth - x.eighth || x.proper.aAu - y.proper.aAu);
  const chosen: Candidate[] = [];
  const out: OutlierPlant[] = [];
  const stage: StageProper = { aAu: NaN, e: NaN, sinI: NaN, code: 0 };
  for (const c of ranked) {
    if (out.length === OUTLIER_COUNT) break;
    if (chosen.some((o) => apartMPerS(c, o) < MIN_APART_MPS)) continue;
    const el = emptyElements();
    if (!properToOsculating(random, field, c.proper, el)) continue;
    el.H = uniform(random, 14, 17);
    roundAsteroidElements(el);
    if (field.properOf(el, stage).code !== 0 || tisserandJupiter(el.aAu, el.e, el.iDeg) < MIN_TJ) continue;
    chosen.push(c);
    out.push({ proper: c.proper, el, nearestMPerS: c.nearest, eighthMPerS: c.eighth });
  }
  if (out.length < OUTLIER_COUNT) {
    throw new Error(`chooseOutliers: only ${out.length} of ${OUTLIER_COUNT} places found ${MIN_NEAREST_MPS} m/s from every drawn body and ${MIN_APART_MPS} m/s apart`);
  }
  return out;
}
