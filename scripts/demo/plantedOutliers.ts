/**
 * Planted isolated bodies for the families detector: one main-belt body at the centre of each
 * empty pocket the background is drawn around (mainBeltBackground.ts POCKETS): a ball in the
 * families metric (Zappalà et al. 1990, outlierMetric.ts) inside the populated, trusted part of
 * the belt, where the smooth background density predicts tens of bodies and the generator
 * leaves none. A body stands out against the whole catalogue only there: in a sparse region
 * the smooth null model itself makes such gaps.
 *
 * For each pocket: the expected count, the background bodies drawn times the probability of
 * one smooth draw landing in the ball (pocketProbability), and the count actually carved (the
 * background draws the pocket turned away, counted in the look-ahead of naturalTrusted.ts).
 * The distances from the planted body to the nearest and 8th-nearest drawn body the stage will
 * trust (every natural body, family members and other classes included) are measured; a body
 * of another class or a family member inside the pocket is not carved, so a nearest body
 * closer than MIN_NEAREST_FRACTION of the radius stops the generator. Osculating elements come
 * from properToOsculating.ts like every other main-belt body (drawn again, from this file's
 * own seeded stream, until the stage trusts them and T_J ≥ 3.105 so they do not also fall on the
 * Tisserand list); H uniform 14–17 (our choice).
 *
 * Measured on the default seed (test/cli/familiesDemo.test.ts): all six below q = 0.05 at
 * q 0.047, false-alarm probabilities 2.0–2.8e-5; the margin is thin and holds for this seed and
 * these pockets (mainBeltBackground.ts), not by construction: another seed or detector setting
 * can move q over 0.05.
 */
import { buildKNearestGrid } from '../../src/detect/families/kNearestGrid.js';
import { cellSizeForOccupancy } from '../../src/detect/families/kNearestCellSize.js';
import { kNearestOf } from '../../src/detect/families/kNearest.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { scaledProperCoordinates } from '../../src/detect/families/outlierMetric.js';
import { POCKETS, pocketProbability, type Pocket } from './mainBeltBackground.js';
import type { TrustedBodies } from './naturalTrusted.js';
import { roundAsteroidElements } from './orbitRows.js';
import { properToOsculating, type ProperPlant } from './properToOsculating.js';
import type { Random } from './random.js';
import { uniform } from './random.js';
import type { DemoSecularField, StageProper } from './secularForced.js';
import { tisserandJupiter } from './tisserand.js';
import { emptyElements, type DemoElements } from './types.js';

/** Planted isolated bodies: one per pocket. */
export const OUTLIER_COUNT = POCKETS.length;
/** The nearest drawn body must be at least this fraction of the pocket radius away (our choice: the short-period scatter is ~10 m/s). */
export const MIN_NEAREST_FRACTION = 0.9;
const K = 8;
const MIN_TJ = 3.105;
const MAX_TRIES = 100;

export interface OutlierPlant {
  proper: ProperPlant; // planted proper elements (the pocket's centre)
  el: DemoElements; // osculating, rounded as written
  nearestMPerS: number; // to the nearest drawn body
  eighthMPerS: number; // to the 8th nearest drawn body
  pocket: Pocket; // the pocket it sits in
  expectedInPocket: number; // background bodies the smooth law would put in the pocket
  carvedFromPocket: number; // background draws the pocket turned away
}

/** The planted isolated bodies, one per pocket in POCKETS order. Throws when a pocket holds a drawn body. */
export function chooseOutliers(random: Random, field: DemoSecularField, trusted: TrustedBodies): OutlierPlant[] {
  if (trusted.count <= K) throw new RangeError(`chooseOutliers: need more than ${K} trusted bodies, got ${trusted.count}`);
  const centres = scaledProperCoordinates(POCKETS.map((p) => p.aAu), POCKETS.map((p) => p.e), POCKETS.map((p) => p.sinI));
  const grid = buildKNearestGrid(trusted.xyz, cellSizeForOccupancy(trusted.xyz, 4, 1 << 20));
  const nn = kNearestOf(grid, centres, K);
  const stage: StageProper = { aAu: NaN, e: NaN, sinI: NaN, code: 0 };
  return POCKETS.map((pocket, j) => {
    const v = orbitalSpeedMPerS(pocket.aAu);
    const nearestMPerS = nn.distance[j * K] * v;
    if (nearestMPerS < MIN_NEAREST_FRACTION * pocket.radiusMPerS) {
      throw new Error(`chooseOutliers: a drawn body lies ${nearestMPerS.toFixed(0)} m/s from the centre of pocket ${j + 1} (radius ${pocket.radiusMPerS} m/s)`);
    }
    const proper = { aAu: pocket.aAu, e: pocket.e, sinI: pocket.sinI };
    const el = emptyElements();
    for (let t = 0; ; t++) {
      if (t === MAX_TRIES) throw new Error(`chooseOutliers: no trusted orbit with T_J ≥ ${MIN_TJ} at the centre of pocket ${j + 1} in ${MAX_TRIES} tries`);
      if (!properToOsculating(random, field, proper, el)) continue;
      el.H = uniform(random, 14, 17);
      roundAsteroidElements(el);
      if (field.properOf(el, stage).code === 0 && tisserandJupiter(el.aAu, el.e, el.iDeg) >= MIN_TJ) break;
    }
    return {
      proper, el, nearestMPerS, eighthMPerS: nn.distance[j * K + K - 1] * v, pocket,
      expectedInPocket: trusted.backgroundBodies * pocketProbability(pocket), carvedFromPocket: trusted.carved[j],
    };
  });
}
