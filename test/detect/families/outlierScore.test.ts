// The isolation score's background at a coarser scale, on invented catalogues (synthetic tests).
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { coarseDensity, densityAt } from '../../../src/detect/families/outlierDensity.js';
import { calibratedIsolation, DEFAULT_PROPER_OUTLIER_OPTIONS } from '../../../src/detect/families/outliers.js';
import { upperTailFraction } from '../../../src/detect/empiricalTail.js';
import { DEFAULT_ISOLATION_OPTIONS, isolationScores, isolationScoresOfFirst } from '../../../src/detect/families/outlierScore.js';

describe('coarse background density', () => {
  it('of uniform points is N/V inside the box, within 3 Poisson σ of a cell (common practice)', () => {
    const n = 200_000;
    const random = seededRandom(3);
    const xyz = Float64Array.from({ length: 3 * n }, () => 0.2 * random());
    const d = coarseDensity(xyz, 0.02);
    const expected = n / 0.2 ** 3;
    // Smoothed over 27 cells of ~200 bodies each: relative σ about 1/√(200·(8/3)) ≈ 4%; bound 12%.
    for (const p of [[0.1, 0.1, 0.1], [0.05, 0.13, 0.07], [0.15, 0.06, 0.12]]) {
      expect(Math.abs(densityAt(d, p[0], p[1], p[2]) / expected - 1)).toBeLessThan(0.12);
    }
  });
});

describe('isolation score', () => {
  it('does not raise bodies of a sparse but smooth region for the sparseness alone', () => {
    // Invented data: 60 000 bodies in a box whose density falls smoothly by a factor of 20
    // along x (ρ ∝ e^(−x/L), x in [0, 0.4), L = 0.4/ln 20; drawn by the inverse of its CDF).
    const n = 60_000, width = 0.4, L = width / Math.log(20);
    const random = seededRandom(4);
    const xyz = new Float64Array(3 * n);
    for (let j = 0; j < n; j++) {
      const x = -L * Math.log(1 - random() * (1 - Math.exp(-width / L)));
      xyz.set([1 + x, 0.2 * random(), 0.2 * random()], 3 * j);
    }
    const run = calibratedIsolation(xyz, seededRandom(5), { ...DEFAULT_PROPER_OUTLIER_OPTIONS, replicates: 4 });
    const k = run.scores.neighbours.k;
    const rk = Float64Array.from({ length: n }, (_, j) => run.scores.neighbours.distance[j * k + k - 1]);
    const sortedRk = rk.slice().sort();
    let sparse = 0, raised = 0, rawRaised = 0;
    for (let j = 0; j < n; j++) {
      if (xyz[3 * j] < 1 + 0.75 * width) continue; // the sparsest quarter, about 7 000 bodies
      sparse++;
      if (run.nullTailFraction[j] <= 0.01) raised++;
      // The same bodies judged by the k-th neighbour distance alone (a tail fraction among all).
      if (upperTailFraction(sortedRk, rk[j]) <= 0.01) rawRaised++;
    }
    console.log(`sparsest quarter: ${raised} of ${sparse} raised at α = 0.01 by the score; ${rawRaised} by the k-th distance alone`);
    // Bound 2α: the sparse end is also the edge of the box, where every ball is cut.
    expect(raised / sparse).toBeLessThan(0.02);
    expect(rawRaised / sparse).toBeGreaterThan(0.02);
  });

  it('of the first m bodies alone are those of a full scoring, bit for bit', () => {
    // Invented catalogue: a uniform box with a dense clump, some exact duplicates.
    const random = seededRandom(31);
    const n = 30_000;
    const xyz = new Float64Array(3 * n);
    for (let j = 0; j < n; j++) {
      const clump = j % 5 === 0;
      for (let c = 0; c < 3; c++) xyz[3 * j + c] = clump ? 0.5 + 0.01 * random() : random();
    }
    xyz.copyWithin(3 * 100, 3 * 7000, 3 * 7050); // bodies 100–149 repeat 7000–7049
    const full = isolationScores(xyz, DEFAULT_ISOLATION_OPTIONS).score;
    for (const m of [0, 1, 5_000, n]) {
      const first = isolationScoresOfFirst(xyz, DEFAULT_ISOLATION_OPTIONS, m);
      expect(first.length).toBe(m);
      expect(Buffer.from(first.buffer).equals(Buffer.from(full.buffer, 0, 8 * m))).toBe(true);
    }
  });
});
