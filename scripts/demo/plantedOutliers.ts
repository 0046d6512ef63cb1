/**
 * Planted family outliers for the families detector: main-belt bodies deliberately away
 * from every demo family and from dense background (isolated high inclination, unusual
 * eccentricity, inside a Kirkwood gap, family-halo bodies far outside a family's spread).
 * All keep T_J ≥ 3.105 so they do not also fall on the Tisserand list.
 */
import { DEMO_FAMILIES } from './families.js';
import type { Random } from './random.js';
import { uniform, uniformAngleDeg } from './random.js';
import { sampleUntil } from './sampleUntil.js';
import { tisserandJupiter } from './tisserand.js';
import type { DemoElements } from './types.js';

export type OutlierVariant = 'isolated-high-inclination' | 'unusual-eccentricity' | 'kirkwood-gap' | 'family-halo';

const MIN_TJ = 3.105;

/** Ranges per variant: [aMin, aMax, eMin, eMax, iMin, iMax]. */
function ranges(variant: OutlierVariant, k: number): readonly number[] {
  switch (variant) {
    case 'isolated-high-inclination': return [2.3, 2.45, 0.03, 0.1, 38, 45];
    case 'unusual-eccentricity': return [2.86, 2.94, 0.28, 0.32, 14, 18];
    case 'kirkwood-gap': return [2.498, 2.506, 0.02, 0.06, 22, 26];
    case 'family-halo': {
      // Koronis or Eos a range, e and i 6–8 half-widths away from the centre
      const f = DEMO_FAMILIES.find((x) => x.name === (k % 2 === 0 ? 'Koronis' : 'Eos'));
      if (!f) throw new RangeError('plantedOutliers: family table lacks Koronis/Eos');
      return [f.aMinAu, f.aMaxAu, f.eCentre + 6 * f.eHalfWidth, f.eCentre + 8 * f.eHalfWidth,
        f.iCentreDeg + 6 * f.iHalfWidthDeg, f.iCentreDeg + 8 * f.iHalfWidthDeg];
    }
  }
}

export function sampleFamilyOutlier(random: Random, variant: OutlierVariant, k: number, out: DemoElements): void {
  const [a0, a1, e0, e1, i0, i1] = ranges(variant, k);
  sampleUntil(
    `family outlier (${variant})`,
    () => {
      out.aAu = uniform(random, a0, a1);
      out.e = uniform(random, e0, e1);
      out.iDeg = uniform(random, i0, i1);
      out.nodeDeg = uniformAngleDeg(random);
      out.periDeg = uniformAngleDeg(random);
      out.meanAnomalyDeg = uniformAngleDeg(random);
    },
    () => tisserandJupiter(out.aAu, out.e, out.iDeg) >= MIN_TJ,
    out,
  );
  out.H = uniform(random, 14, 17);
}
