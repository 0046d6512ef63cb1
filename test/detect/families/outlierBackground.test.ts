// The smooth background of the null model, on an invented catalogue (synthetic test): a uniform
// box with one dense clump standing in for a family.
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { DEFAULT_ISOLATION_OPTIONS, isolationScores } from '../../../src/detect/families/outlierScore.js';
import { buildOutlierBackground, drawFromBackground } from '../../../src/detect/families/outlierBackground.js';

describe('null background', () => {
  const uniform = 40_000, clump = 4_000;
  const random = seededRandom(21);
  const xyz = new Float64Array(3 * (uniform + clump));
  for (let j = 0; j < uniform; j++) xyz.set([1 + 0.2 * random(), 0.2 * random(), 0.2 * random()], 3 * j);
  // The clump: 4 000 bodies uniform in a cube of side 0.02 at (1.1, 0.1, 0.1), 100 times the box's density.
  for (let j = uniform; j < uniform + clump; j++) xyz.set([1.09 + 0.02 * random(), 0.09 + 0.02 * random(), 0.09 + 0.02 * random()], 3 * j);
  const scores = isolationScores(xyz, DEFAULT_ISOLATION_OPTIONS);
  const inClump = (z: Float64Array): number => {
    let c = 0;
    for (let p = 0; p < z.length; p += 3) if (Math.max(Math.abs(z[p] - 1.1), Math.abs(z[p + 1] - 0.1), Math.abs(z[p + 2] - 0.1)) < 0.01) c++;
    return c;
  };
  const expectedUniform = uniform * (0.02 / 0.2) ** 3; // 40 box bodies fall in the clump's cube

  it('down-weights a family-like clump: its excess mostly leaves the null draws', () => {
    const down = inClump(drawFromBackground(buildOutlierBackground(xyz, scores, 8), uniform + clump, seededRandom(22)));
    const kept = inClump(drawFromBackground(buildOutlierBackground(xyz, scores, Infinity), uniform + clump, seededRandom(22)));
    console.log(`clump cube: observed ${clump + expectedUniform} (expected), null draws ${down} with the weight cap 8, ${kept} with none`);
    // Without the cap the smoothed bootstrap reproduces the clump (about 4 040, less what the
    // kernels carry out of the cube); with it, each clump body counts at most 8× the coarse background.
    expect(kept).toBeGreaterThan(0.8 * clump);
    expect(down).toBeLessThan(0.5 * clump);
  });

  it('with no cap (∞) weighs every body 1, exact ties (score −∞) included', () => {
    const tied = Float64Array.from(xyz);
    // Bodies 0–19 written nine times over (rows 0–179): each has 8 others at distance 0, so r_k = 0.
    for (let c = 1; c < 9; c++) tied.set(tied.subarray(0, 3 * 20), 3 * 20 * c);
    const s = isolationScores(tied, DEFAULT_ISOLATION_OPTIONS);
    expect(s.score[0]).toBe(-Infinity);
    const bg = buildOutlierBackground(tied, s, Infinity);
    expect(bg.weightedBodies).toBe(uniform + clump);
    expect(bg.cumulative[bg.cumulative.length - 1]).toBe(uniform + clump);
  });

  it('never draws a negative e or sin i (reflection at 0)', () => {
    const flat = Float64Array.from(xyz);
    for (let p = 0; p < flat.length; p += 3) flat[p + 2] *= 0.01; // sin i within 0.002 of 0
    const draws = drawFromBackground(buildOutlierBackground(flat, isolationScores(flat, DEFAULT_ISOLATION_OPTIONS), 8), 20_000, seededRandom(23));
    let lowest = Infinity;
    for (let p = 0; p < draws.length; p += 3) lowest = Math.min(lowest, draws[p + 1], draws[p + 2]);
    expect(lowest).toBeGreaterThanOrEqual(0);
  });

  it('picks the body a binary search of the running weight sum picks, for every draw (inversion, common practice)', () => {
    // Kernels of radius 0, so each draw is the picked body itself; weights from 0 (an exact
    // tie, score −∞) to 1, in runs, so that guide slices hold many bodies or none.
    const m = 5_000;
    const random = seededRandom(24);
    const at = Float64Array.from({ length: 3 * m }, (_, t) => (t % 3 === 0 ? Math.floor(t / 3) : 0));
    const score = Float64Array.from({ length: m }, (_, j) => (j % 700 < 300 ? -Infinity : j % 700 < 350 ? -30 + 10 * random() : Math.log(random())));
    const fake = { score, neighbours: { k: 1, distance: new Float64Array(m), index: new Int32Array(m) } } as unknown as Parameters<typeof buildOutlierBackground>[1];
    // weight cap 8: weights 0 to 1; cap ∞: every weight 1, where the draw reads the body off u itself
    for (const cap of [8, Infinity]) {
      const bg = buildOutlierBackground(at, fake, cap);
      const draws = drawFromBackground(bg, 50_000, seededRandom(25));
      const replay = seededRandom(25);
      const total = bg.cumulative[m - 1];
      for (let j = 0; j < 50_000; j++) {
        const u = replay() * total;
        let lo = 0, hi = m - 1;
        while (lo < hi) { const mid = (lo + hi) >>> 1; if (bg.cumulative[mid] > u) hi = mid; else lo = mid + 1; }
        let x: number, y: number, z: number;
        do { x = 2 * replay() - 1; y = 2 * replay() - 1; z = 2 * replay() - 1; } while (x * x + y * y + z * z > 1);
        if (draws[3 * j] !== lo) expect(`cap ${cap}, draw ${j}: body ${draws[3 * j]}`).toBe(`cap ${cap}, draw ${j}: body ${lo}`);
      }
    }
  });
});
