import { describe, expect, it } from 'vitest';
import { chebyshevValue } from '../../src/core/series/chebyshev.js';
import { planPoissonChebyshev, poissonChunkCoefficients } from '../../src/core/series/poissonChebyshev.js';
import type { PoissonChebyshevPlan } from '../../src/core/series/poissonChebyshev.js';
import type { PoissonSeries } from '../../src/core/series/poissonSeries.js';
import { seededRandom } from './ephemerisTestDates.js';

/**
 * Invented series (synthetic test data): 3 variables × 2 powers, `perBlock` terms each, with
 * amplitudes spread over 1e-12 … 1, periods from 5 days to 3 000 years (time unit 36 525 days)
 * and, when `quartic`, phase curvature of the size the lunar theory has (|φ2| ≤ 1e-3 rad/cy²).
 */
function inventSeries(seed: number, perBlock: number, quartic: boolean, sine: boolean): PoissonSeries {
  const random = seededRandom(seed);
  const blocks = 6;
  const count = blocks * perBlock;
  const degree = quartic ? 4 : 1;
  const amplitude = new Float64Array(count);
  const phase = new Float64Array(count * (degree + 1));
  for (let k = 0; k < count; k++) {
    amplitude[k] = (random() < 0.5 ? -1 : 1) * 10 ** (-12 * random());
    const periodDays = 5 * 10 ** (5.3 * random());
    phase[k * (degree + 1)] = 2 * Math.PI * random();
    phase[k * (degree + 1) + 1] = ((random() < 0.5 ? -1 : 1) * 2 * Math.PI * 36_525) / periodDays;
    if (quartic) {
      phase[k * 5 + 2] = 1e-3 * (2 * random() - 1);
      phase[k * 5 + 3] = 1.5e-6 * (2 * random() - 1);
      phase[k * 5 + 4] = 7e-9 * (2 * random() - 1);
    }
  }
  const blockStart = Int32Array.from({ length: blocks + 1 }, (_, b) => b * perBlock);
  return { variables: 3, powers: 2, blockStart, amplitude, phase, phaseDegree: degree, sine, daysPerUnit: 36_525 };
}

/** Block b of the series without its t^α factor, summed term by term at t. */
function directBlock(s: PoissonSeries, b: number, t: number): number {
  const d = s.phaseDegree;
  let sum = 0;
  for (let k = s.blockStart[b]; k < s.blockStart[b + 1]; k++) {
    let phi = 0;
    for (let i = d; i >= 0; i--) phi = phi * t + s.phase[k * (d + 1) + i];
    sum += s.amplitude[k] * (s.sine ? Math.sin(phi) : Math.cos(phi));
  }
  return sum;
}

/**
 * Worst |chunk expansion − direct sum| over random points of `segments` segments of
 * `segmentDays` starting at t0 (series units), every block, every level of the plan.
 */
function worstError(plan: PoissonChebyshevPlan, t0Start: number, segmentDays: number, segments: number, seed: number): number {
  const s = plan.series;
  const random = seededRandom(seed);
  const accs = plan.levels.map((lv) => {
    const groups = Math.ceil(segments / lv.group);
    const acc = new Float64Array(6 * groups * lv.slots);
    const firstMid = t0Start + (0.5 * lv.group * segmentDays) / s.daysPerUnit;
    poissonChunkCoefficients(plan, plan.levels.indexOf(lv), firstMid, groups, acc);
    return { acc, groups };
  });
  let worst = 0;
  for (let seg = 0; seg < segments; seg++) {
    for (let trial = 0; trial < 3; trial++) {
      const u = random(); // position inside the segment
      const t = t0Start + ((seg + u) * segmentDays) / s.daysPerUnit;
      for (let b = 0; b < 6; b++) {
        let value = 0;
        plan.levels.forEach((lv, L) => {
          const group = Math.floor(seg / lv.group);
          const x = (2 * (seg - group * lv.group + u)) / lv.group - 1;
          value += chebyshevValue(accs[L].acc, (b * accs[L].groups + group) * lv.slots, lv.slots, x);
        });
        worst = Math.max(worst, Math.abs(value - directBlock(s, b, t)));
      }
    }
  }
  return worst;
}

describe('Chebyshev coefficients of Poisson series in bulk (Jacobi–Anger, A&S 9.1.44–45)', () => {
  it('match the term-by-term sum for linear phases, cosine terms, one level (budget 0)', () => {
    const s = inventSeries(1, 40, false, false);
    const plan = planPoissonChebyshev(s, {
      levels: [{ group: 1, slots: 40 }], segmentDays: 32, tMin: -2, tMax: 2, variableWeight: [1, 1, 1], budget: 0,
    });
    const worst = worstError(plan, 1.37, 32, 64, 2);
    console.log(`linear phases, 64 × 32-day segments: worst ${worst.toExponential(2)} (terms up to 1)`);
    // Not rounding-level: both sides form phases of up to 46 000 rad/cy × 1.4 cy ≈ 6e4 rad,
    // rounded to ≈ 7e-12 rad each, on terms of amplitude ≤ 1 (the recurrence itself adds only
    // ~64 steps of a few ulps). A 5-day period on a 32-day segment (ω ≈ 20) fits in 40 slots.
    expect(worst).toBeLessThan(1e-11);
  });

  it('match for quartic phases and sine terms on two levels (groups of 8), within the stated linearisation error', () => {
    const s = inventSeries(3, 40, true, true);
    const plan = planPoissonChebyshev(s, {
      levels: [{ group: 1, slots: 40 }, { group: 8, slots: 96 }], segmentDays: 16, tMin: -10, tMax: 10,
      variableWeight: [1, 1, 1], budget: 0,
    });
    expect(plan.termsPerLevel[0] + plan.termsPerLevel[1]).toBe(plan.termsKept);
    expect(plan.termsPerLevel[1]).toBeGreaterThan(0);
    const worst = worstError(plan, 8.2, 16, 64, 4);
    console.log(`quartic phases, 64 × 16-day segments at T = 8.2 cy, levels ${Array.from(plan.termsPerLevel).join('/')}: worst ${worst.toExponential(2)}`);
    // Per unit amplitude: curvature inside a 128-day group |φ2| h² ≈ 3e-9 rad, ω moved by a
    // first-order Bessel update from T = 0 to 8.2 cy (Δω ≈ 2|φ2| T h ≈ 3e-5 rad, remainder
    // ≈ Δω² ≈ 1e-9), cubic drift of the recurrence ≈ 1e-12; summed over ~40 terms ≲ 1e-7.
    expect(worst).toBeLessThan(2e-7);
  });

  it('stays within the dropped-coefficient bound it reports when given a budget', () => {
    const s = inventSeries(5, 60, false, false);
    const budget = 1e-6;
    const plan = planPoissonChebyshev(s, {
      levels: [{ group: 1, slots: 40 }, { group: 8, slots: 96 }], segmentDays: 32, tMin: -1, tMax: 1,
      variableWeight: [1, 1, 1], budget,
    });
    const bound = plan.droppedBound.reduce((a, b) => a + b, 0);
    const worst = worstError(plan, -0.8, 32, 64, 6);
    console.log(`budget ${budget}: kept ${plan.termsKept}/${s.amplitude.length} terms, bound ${bound.toExponential(2)}, worst ${worst.toExponential(2)}`);
    expect(plan.termsKept).toBeLessThan(s.amplitude.length);
    expect(bound).toBeLessThanOrEqual(budget);
    // The per-block error is at most the bound of its variable (t^α ≤ 1 here) plus rounding.
    expect(worst).toBeLessThan(Math.max(...plan.droppedBound) + 1e-13);
  });

  it('rejects level lists that do not start with the cache segments', () => {
    const s = inventSeries(7, 2, false, false);
    expect(() => planPoissonChebyshev(s, {
      levels: [{ group: 8, slots: 40 }], segmentDays: 32, tMin: 0, tMax: 1, variableWeight: [1, 1, 1], budget: 0,
    })).toThrow(RangeError);
  });
});
