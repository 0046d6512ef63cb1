// The null model sees the observed catalogue's selection: bodies set apart (here: an excluded
// band and everything beyond a cut, as the proper elements the secular theory does not trust
// are set apart) still occupy space and are never scored, in the observed and in the null
// catalogues alike. Invented data (synthetic test): a smooth Gaussian cloud, no hard edge of
// its own. Under the null the fraction of scored bodies at null tail fraction ≤ α is α within
// its binomial uncertainty (helpers/nullRate.ts, common practice).
import { describe, expect, it } from 'vitest';
import { seededRandom, type Random } from '../../../src/core/random.js';
import { calibratedIsolation, DEFAULT_PROPER_OUTLIER_OPTIONS } from '../../../src/detect/families/outliers.js';
import { describeRate, nullRate } from './helpers/nullRate.js';

const N = 80_000;
const BAND = [0.42, 0.46] as const; // excluded band in x
const CUT = 0.6; // everything at x ≥ CUT excluded (about 16% of the cloud)
const RIM = 0.004; // about the 8th-neighbour distance near the band
const OPTS = { ...DEFAULT_PROPER_OUTLIER_OPTIONS, replicates: 4 };

const gauss = (r: Random): number => Math.sqrt(-2 * Math.log(1 - r())) * Math.cos(2 * Math.PI * r()); // Box & Muller 1958
const setApart = (x: number): boolean => (x >= BAND[0] && x < BAND[1]) || x >= CUT;
const onRim = (x: number): boolean => Math.abs(x - BAND[0]) < RIM || Math.abs(x - BAND[1]) < RIM;

/** Fractions of the given bodies (all scored ones, or those on the band's rim) at tail fraction ≤ α. */
function rates(xyz: Float64Array, fraction: Float64Array, alpha: number, nullSize: number) {
  const pick = (rimOnly: boolean) => Float64Array.from(
    [...fraction].filter((f, j) => !Number.isNaN(f) && !setApart(xyz[3 * j]) && (!rimOnly || onRim(xyz[3 * j]))));
  return { all: nullRate(pick(false), alpha, nullSize), rim: nullRate(pick(true), alpha, nullSize) };
}

describe('isolation outliers with bodies set apart', () => {
  const random = seededRandom(41);
  const xyz = new Float64Array(3 * N);
  for (let j = 0; j < N; j++) xyz.set([0.5 + 0.1 * gauss(random), 0.6 + 0.06 * gauss(random), 0.6 + 0.06 * gauss(random)], 3 * j);
  const scored = Uint8Array.from({ length: N }, (_, j) => (setApart(xyz[3 * j]) ? 0 : 1));

  it('flags a fraction α of the scored bodies, and of those on a band\'s rim, within 3σ binomial (α = 0.01, 0.05)', () => {
    const run = calibratedIsolation(xyz, seededRandom(5), OPTS, scored);
    for (let j = 0; j < N; j++) expect(Number.isNaN(run.nullTailFraction[j])).toBe(scored[j] === 0);
    expect(run.calibration.nullModel).toContain('set apart');
    for (const alpha of [0.01, 0.05]) {
      const r = rates(xyz, run.nullTailFraction, alpha, run.calibration.nullScoresSorted.length);
      console.log(`selection seen by the null: scored ${describeRate(r.all)}; rim ${describeRate(r.rim)}`);
      expect(r.all.within).toBe(true);
      expect(r.rim.within).toBe(true);
    }
  });

  it('the same check fails when the bodies set apart are removed instead (hard-edged holes, soft-edged null)', () => {
    // Measured: 0.63% of the kept bodies at α = 0.01 (the null's spill into the holes makes its
    // tail too heavy) and 7.8% of the rim at α = 0.05 (the rim bodies' neighbour balls half empty).
    const keep = [...Array(N).keys()].filter((j) => scored[j] === 1);
    const kept = Float64Array.from(keep.flatMap((j) => [xyz[3 * j], xyz[3 * j + 1], xyz[3 * j + 2]]));
    const run = calibratedIsolation(kept, seededRandom(5), OPTS);
    const r01 = rates(kept, run.nullTailFraction, 0.01, run.calibration.nullScoresSorted.length);
    const r05 = rates(kept, run.nullTailFraction, 0.05, run.calibration.nullScoresSorted.length);
    console.log(`bodies removed: scored ${describeRate(r01.all)}; rim ${describeRate(r05.rim)}`);
    expect(r01.all.within && r05.rim.within).toBe(false);
  });
});
