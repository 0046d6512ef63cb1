/**
 * The tracklet planner on invented candidate nights: tracklets never hold fewer than the
 * stated minimum, whatever the windows allow; apparitions split at the stated gap; instants lie
 * on the written time grid. Invented nights (synthetic test).
 */
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../../src/core/random.js';
import { apparitionsOf, DEFAULT_CADENCE, onTimeGrid, planTracklets, type CandidateNight } from '../../../src/fit/synthetic/index.js';

const night = (k: number, windowDays: number, station = 0): CandidateNight => ({
  station, midnightJdUtc: 2462000.5 + k, windowStartJdUtc: 2462000.4 + k, windowEndJdUtc: 2462000.4 + k + windowDays,
});

describe('tracklet planner', () => {
  it('never leaves a lone observation, even when narrow windows force small tracklets', () => {
    for (let seed = 1; seed <= 40; seed++) {
      const nights = Array.from({ length: 30 }, (_, k) => night(k, 0.0205)); // 29.5 min: two observations at most
      const count = 3 + (seed % 9);
      const plan = planTracklets(nights, count, DEFAULT_CADENCE, 6, seededRandom(seed), () => true);
      const placed = plan.tracklets.reduce((s, t) => s + t.timesJdUtc.length, 0);
      for (const t of plan.tracklets) expect(t.timesJdUtc.length).toBeGreaterThanOrEqual(2);
      expect(placed).toBeLessThanOrEqual(count);
      // when only pairs fit, a remainder of 1 or 3 cannot be split into tracklets of two: left unplaced
      expect(count - placed).toBeLessThanOrEqual(3);
      if (count % 2 === 0) expect(placed % 2).toBe(0);
    }
  });

  it('places the full count in wide windows, with 2–5 observations a tracklet and each night used once', () => {
    const nights = Array.from({ length: 60 }, (_, k) => night(k, 0.3, k % 2));
    const plan = planTracklets(nights, 101, DEFAULT_CADENCE, 6, seededRandom(3), () => true);
    expect(plan.tracklets.reduce((s, t) => s + t.timesJdUtc.length, 0)).toBe(101);
    for (const t of plan.tracklets) {
      expect(t.timesJdUtc.length).toBeGreaterThanOrEqual(2);
      expect(t.timesJdUtc.length).toBeLessThanOrEqual(5);
      expect(t.timesJdUtc[0]).toBeGreaterThanOrEqual(t.night.windowStartJdUtc - 5e-7);
      expect(t.timesJdUtc[t.timesJdUtc.length - 1]).toBeLessThanOrEqual(t.night.windowEndJdUtc + 5e-7);
    }
    expect(new Set(plan.tracklets.map((t) => t.night)).size).toBe(plan.tracklets.length);
  });

  it('splits apparitions at gaps longer than the stated one and puts instants on the day grid', () => {
    const nights = [night(0, 0.1), night(10, 0.1), night(100, 0.1), night(130, 0.1), night(300, 0.1)];
    expect(apparitionsOf(nights, 60)).toEqual([0, 0, 1, 1, 2]);
    expect(onTimeGrid(2462000.5 + 0.12345678, 6)).toBeCloseTo(2462000.5 + 0.123457, 9);
    expect(onTimeGrid(2462000.5 + 0.99999999, 5)).toBeCloseTo(2462001.5, 9);
  });
});
