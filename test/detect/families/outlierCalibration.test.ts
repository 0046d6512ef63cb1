// Calibration of isolation scores in proper-element space against their stated null model, on a
// background built from real proper elements (test/fixtures/proper-elements-sdss/, provenance in
// its README).
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { countAtLeast } from '../../../src/detect/empiricalTail.js';
import { scaledProperCoordinates } from '../../../src/detect/families/outlierMetric.js';
import { DEFAULT_ISOLATION_OPTIONS, isolationScores } from '../../../src/detect/families/outlierScore.js';
import { buildOutlierBackground, drawFromBackground } from '../../../src/detect/families/outlierBackground.js';
import { calibrateIsolation, nullCataloguePlan, nullCountsAtLeast, nullFalseAlarmProbs, nullTailFractions, replicateSeeds } from '../../../src/detect/families/outlierCalibration.js';
import { calibratedIsolation, DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers } from '../../../src/detect/families/outliers.js';
import { distinctProperElements } from './helpers/properElementsFixture.js';
import { describeRate, nullRate } from './helpers/nullRate.js';

const OPTS = DEFAULT_ISOLATION_OPTIONS;
const REPLICATES = 4;

describe('null tail fractions of isolation scores', () => {
  const real = distinctProperElements();
  const xyz = scaledProperCoordinates(real.aAu, real.e, real.sinI);
  const n = real.aAu.length;
  const background = buildOutlierBackground(xyz, isolationScores(xyz, OPTS), DEFAULT_PROPER_OUTLIER_OPTIONS.weightCap);
  // A catalogue of the null itself: bodies drawn from the smooth background of the real belt.
  const nullCatalogue = drawFromBackground(background, n, seededRandom(11));
  const nullScores = isolationScores(nullCatalogue, OPTS).score;
  const calibration = calibrateIsolation(background, n, OPTS, REPLICATES, seededRandom(12));
  const fractions = nullTailFractions(nullScores, calibration);

  it('under the null, the null tail fraction is ≤ α for a fraction α of bodies, within 3σ binomial (α = 0.01, 0.05)', () => {
    for (const alpha of [0.01, 0.05]) {
      const r = nullRate(fractions, alpha, calibration.nullScoresSorted.length);
      console.log(`null catalogue of ${n} bodies, ${REPLICATES}×${n} null scores: ${describeRate(r)}`);
      expect(r.within).toBe(true);
    }
  });

  it('with the background re-estimated from the null catalogue itself, tail fraction ≤ α for a fraction within 25% of α', () => {
    // The whole stage as it runs on a catalogue: its own background, its own null draws. The
    // re-estimate is smoother than the background the bodies came from, so this is not exact:
    // measured 0.89% at α = 0.01 and 4.85% at 0.05 (the default null, every body drawn alike;
    // with families down-weighted 0.89–0.97% and 4.82–4.97% over four seeds, up to 3σ below α);
    // the bound is 25% of α, the binomial 3σ being 11% at 0.01.
    const run = calibratedIsolation(nullCatalogue, seededRandom(14), { ...DEFAULT_PROPER_OUTLIER_OPTIONS, replicates: REPLICATES });
    for (const alpha of [0.01, 0.05]) {
      const r = nullRate(run.nullTailFraction, alpha, run.calibration.nullScoresSorted.length);
      console.log(`null catalogue, background re-estimated: ${describeRate(r)}`);
      expect(Math.abs(r.rate - alpha)).toBeLessThan(0.25 * alpha);
    }
  });

  it('with only the first 20 000 bodies of each null catalogue scored: those scores exactly, and the null rate within 3σ', () => {
    const scored = 20_000;
    const sub = calibrateIsolation(background, n, OPTS, REPLICATES, seededRandom(12), scored);
    expect(sub.scoredPerReplicate).toBe(scored);
    expect(sub.nullScoresSorted.length).toBe(REPLICATES * scored);
    expect(sub.nullModel).toContain(`the first ${scored} bodies of each`);
    // The same catalogues drawn again, each from its own stream (seeded by the r-th number the
    // generator gives), scored in full, their first 20 000 scores kept.
    const seeds = replicateSeeds(seededRandom(12), REPLICATES);
    const want = new Float64Array(REPLICATES * scored);
    for (let r = 0; r < REPLICATES; r++) want.set(isolationScores(drawFromBackground(background, n, seededRandom(seeds[r])), OPTS).score.subarray(0, scored), r * scored);
    want.sort();
    expect(Buffer.from(sub.nullScoresSorted.buffer).equals(Buffer.from(want.buffer))).toBe(true);
    for (const alpha of [0.01, 0.05]) {
      const r = nullRate(nullTailFractions(nullScores, sub), alpha, sub.nullScoresSorted.length);
      console.log(`null catalogue of ${n} bodies, ${REPLICATES}×${scored} null scores: ${describeRate(r)}`);
      expect(r.within).toBe(true);
    }
    expect(calibrateIsolation(background, 1000, OPTS, 1, seededRandom(12), 5000).scoredPerReplicate).toBe(1000);
    expect(() => calibrateIsolation(background, n, OPTS, 1, seededRandom(12), 0)).toThrow(RangeError);
  });

  it('the same check rejects a calibration broken on purpose', () => {
    // A wrong rank convention: the count over the pooled null divided by the catalogue size
    // instead of the pool's size (here 4 times too large a fraction).
    const pooled = calibration.nullScoresSorted;
    const wrongDenominator = nullScores.map((s) => (1 + countAtLeast(pooled, s)) / (n + 1));
    // Null catalogues not scored as the observed one: k = 4 for the null, 8 for the bodies.
    const otherK = nullTailFractions(nullScores, calibrateIsolation(background, n, { ...OPTS, k: 4 }, 1, seededRandom(13)));
    for (const broken of [wrongDenominator, otherK]) {
      const r = nullRate(broken, 0.01, pooled.length);
      console.log(`broken calibration: ${describeRate(r)}`);
      expect(r.within).toBe(false);
    }
  });

  it('from counts found once: the same tail fractions and false-alarm probabilities, bit for bit (counts of the wrong length refused)', () => {
    // the definition checked: (1 + #{null ≥ s}) / (N + 1), the plus-one rule (Davison & Hinkley 1997, eq. 4.11)
    const counts = nullCountsAtLeast(nullScores, calibration);
    const sorted = calibration.nullScoresSorted;
    for (const j of [0, 1, 17, n >> 1, n - 1]) expect(counts[j]).toBe(countAtLeast(sorted, nullScores[j]));
    const bytes = (x: ArrayBufferView) => Buffer.from(x.buffer, x.byteOffset, x.byteLength);
    expect(bytes(nullTailFractions(nullScores, calibration, counts)).equals(bytes(fractions))).toBe(true);
    const once = nullFalseAlarmProbs(nullScores, calibration, counts), alone = nullFalseAlarmProbs(nullScores, calibration);
    expect(bytes(once.p).equals(bytes(alone.p))).toBe(true);
    expect(bytes(once.from).equals(bytes(alone.from))).toBe(true);
    expect(() => nullTailFractions(nullScores, calibration, counts.subarray(1))).toThrow(RangeError);
    expect(() => nullFalseAlarmProbs(nullScores, calibration, counts.subarray(1))).toThrow(RangeError);
  });

  it('are reproducible byte for byte from the seed, and the seed matters', () => {
    const subset = 20_000; // the first 20 000 distinct bodies: the same code path, a shorter run
    const a = real.aAu.subarray(0, subset), e = real.e.subarray(0, subset), s = real.sinI.subarray(0, subset);
    const first = properOutliers(a, e, s, seededRandom(7));
    const again = properOutliers(a, e, s, seededRandom(7));
    const other = properOutliers(a, e, s, seededRandom(8));
    const bytes = (x: Float64Array) => Buffer.from(x.buffer, x.byteOffset, x.byteLength);
    expect(bytes(again.nullTailFraction).equals(bytes(first.nullTailFraction))).toBe(true);
    expect(bytes(again.score).equals(bytes(first.score))).toBe(true);
    expect(again.nullModel).toBe(first.nullModel);
    expect(bytes(other.nullTailFraction).equals(bytes(first.nullTailFraction))).toBe(false);
    expect(first.nullScores).toBe(20 * subset); // 400 000 null scores wanted: 20 catalogues of 20 000, every body scored (nullCataloguePlan)
    // A catalogue larger than the default bodies scored per null catalogue: that many from each.
    const few = properOutliers(a, e, s, seededRandom(7), { ...DEFAULT_PROPER_OUTLIER_OPTIONS, nullScoresWanted: 6_000 });
    expect(few.nullScores).toBe(6_000); // 2 catalogues, 3 000 scored in each
    expect(few.nullModel).toContain('2 such catalogues, the first 3000 bodies of each scored');
  });

  it('plans as few null catalogues as give the null scores wanted, at least 2, at most the replicates', () => {
    expect(nullCataloguePlan(1_500_000, 8, 400_000)).toEqual({ replicates: 2, scoredPerReplicate: 200_000 });
    expect(nullCataloguePlan(89_622, 8, 400_000)).toEqual({ replicates: 5, scoredPerReplicate: 80_000 });
    expect(nullCataloguePlan(20_000, 8, 400_000)).toEqual({ replicates: 8, scoredPerReplicate: 20_000 });
    expect(nullCataloguePlan(1_500_000, 1, 400_000)).toEqual({ replicates: 1, scoredPerReplicate: 400_000 });
    expect(() => nullCataloguePlan(100, 0, 400_000)).toThrow(RangeError);
  });
});
