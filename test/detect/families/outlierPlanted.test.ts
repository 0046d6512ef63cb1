// Planted isolated bodies in empty regions of the real main belt (test/fixtures/proper-elements-sdss/,
// provenance in its README) are raised; bodies inside dense families (Parker et al. 2008, Table 2,
// median proper elements, same folder) are not.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { cellSizeForOccupancy } from '../../../src/detect/families/kNearestCellSize.js';
import { buildKNearestGrid } from '../../../src/detect/families/kNearestGrid.js';
import { kNearestOf } from '../../../src/detect/families/kNearest.js';
import { SCALED_A_WEIGHT, SCALED_E_WEIGHT, SCALED_SIN_I_WEIGHT, scaledProperCoordinates } from '../../../src/detect/families/outlierMetric.js';
import { DEFAULT_ISOLATION_OPTIONS, isolationScores } from '../../../src/detect/families/outlierScore.js';
import { densityAt } from '../../../src/detect/families/outlierDensity.js';
import { properOutliers } from '../../../src/detect/families/outliers.js';
import { distinctProperElements, sdssFamilies } from './helpers/properElementsFixture.js';

const HOLE_RADIUS = 0.015; // scaled units: about 280 m/s at 2.6 au with no real body inside
const PLANTED = 20;

describe('isolation outliers on the real main belt', () => {
  const real = distinctProperElements();
  const xyz = scaledProperCoordinates(real.aAu, real.e, real.sinI);
  const n = real.aAu.length;
  const grid = buildKNearestGrid(xyz, cellSizeForOccupancy(xyz, 2, 4 * n));
  const own = isolationScores(xyz, DEFAULT_ISOLATION_OPTIONS);
  const quartileBackground = Float64Array.from(own.backgroundDensity).sort()[n >> 2];

  // Empty regions inside the populated belt: seeded uniform points in the catalogue's box with
  // no real body within HOLE_RADIUS, where the coarse background is at least its lower quartile
  // over the bodies (a hole among bodies, not the space outside the belt), 2·HOLE_RADIUS apart.
  const planted: number[] = [];
  const random = seededRandom(2026);
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  for (let j = 0; j < n; j++) for (let c = 0; c < 3; c++) { lo[c] = Math.min(lo[c], xyz[3 * j + c]); hi[c] = Math.max(hi[c], xyz[3 * j + c]); }
  for (let tries = 0; tries < 200_000 && planted.length < 3 * PLANTED; tries++) {
    const p = [0, 1, 2].map((c) => lo[c] + (hi[c] - lo[c]) * random());
    if (densityAt(own.background, p[0], p[1], p[2]) < quartileBackground) continue;
    if (kNearestOf(grid, Float64Array.from(p), 1).distance[0] < HOLE_RADIUS) continue;
    let apart = true;
    for (let t = 0; t < planted.length; t += 3) apart &&= Math.hypot(p[0] - planted[t], p[1] - planted[t + 1], p[2] - planted[t + 2]) >= 2 * HOLE_RADIUS;
    if (apart) planted.push(...p);
  }

  const a = Float64Array.from([...real.aAu, ...Array.from({ length: PLANTED }, (_, t) => Math.exp(planted[3 * t] / SCALED_A_WEIGHT))]);
  const e = Float64Array.from([...real.e, ...Array.from({ length: PLANTED }, (_, t) => planted[3 * t + 1] / SCALED_E_WEIGHT)]);
  const s = Float64Array.from([...real.sinI, ...Array.from({ length: PLANTED }, (_, t) => planted[3 * t + 2] / SCALED_SIN_I_WEIGHT)]);
  const result = properOutliers(a, e, s, seededRandom(99));

  it(`${PLANTED} bodies planted in empty regions get null tail fractions below 0.02, their median below 0.001`, () => {
    expect(planted.length / 3).toBeGreaterThanOrEqual(PLANTED);
    const near = result.nearestDistanceMps.subarray(n);
    const fractions = result.nullTailFraction.subarray(n);
    const worst = Math.max(...fractions);
    console.log(`planted: null tail fractions ${Array.from(fractions).sort((x, y) => x - y).map((x) => x.toExponential(1)).join(' ')}; ` +
      `worst ${worst.toExponential(2)} (smallest possible ${(1 / (result.nullScores + 1)).toExponential(2)}); ` +
      `nearest neighbours ${Math.min(...near).toFixed(0)}–${Math.max(...near).toFixed(0)} m/s`);
    for (let t = 0; t < PLANTED; t++) {
      const j = n + t;
      expect(result.nullTailFraction[j], `planted ${t}: a=${a[j].toFixed(4)} e=${e[j].toFixed(4)} sin i=${s[j].toFixed(4)}, nearest ${result.nearestDistanceMps[j].toFixed(0)} m/s`).toBeLessThan(0.02);
    }
    expect(Array.from(fractions).sort((x, y) => x - y)[PLANTED >> 1]).toBeLessThan(1e-3);
    // Measured: worst 1.01e-2 (a hole just wide enough: nearest body 275 m/s), median 5.4e-4.
    // Bound loosened from 0.01 for the worst one: the null now draws the families as the belt
    // holds them (outlierBackground.ts), and their surroundings, which score high, make its
    // upper tail a little heavier; with families down-weighted it was 8.8e-3, median 4.5e-4.
  });

  it('bodies nearest the centres of the five largest families do not', () => {
    const families = sdssFamilies().slice(0, 5);
    const k = 20;
    const centres = scaledProperCoordinates(families.map((f) => f.aAu), families.map((f) => f.e), families.map((f) => f.sinI));
    const nearest = kNearestOf(grid, centres, k);
    let lowest = 1;
    for (let f = 0; f < families.length; f++) {
      for (let m = 0; m < k; m++) {
        const j = nearest.index[f * k + m];
        lowest = Math.min(lowest, result.nullTailFraction[j]);
        expect(result.nullTailFraction[j], `${families[f].name} member ${j}`).toBeGreaterThan(0.01);
      }
    }
    console.log(`families ${families.map((f) => f.name).join(', ')}: ${k} bodies each, lowest null tail fraction ${lowest.toFixed(3)}`);
  });
});
