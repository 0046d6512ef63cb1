// Choosing three observations for Gauss's method. Times are invented (synthetic test); the
// expected choices are worked out by hand beside each case.
import { describe, expect, it } from 'vitest';
import { chooseThreeObservations } from '../../src/fit/chooseThree.js';

const T0 = 2460000;

describe('chooseThreeObservations', () => {
  it('takes the first, the last and the one nearest the middle, as indices of the caller’s order', () => {
    // Unsorted on purpose; the NaN time is passed over. Sorted: 0.7 (1), 0.75 (4), 4.9 (3),
    // 5.6 (6), 10.8 (0), 10.9 (5), 20.7 (7); middle of 0.7 and 20.7 is 10.7 → 10.8 (0).
    const t = [10.8, 0.7, NaN, 4.9, 0.75, 10.9, 5.6, 20.7].map((x) => T0 + x);
    const r = chooseThreeObservations(t);
    expect(r.indices).toEqual([1, 0, 7]);
    expect(r.arcDays).toBeCloseTo(20, 9);
    expect(r.reason).toBe('');
  });

  it('keeps the arc within maxArcDays, widest pair first', () => {
    // With 60 days: 0.1 … 50.2 is the widest pair (0.1 … 90.3 is too long); middle 25.15 → 24.9.
    const t = [0.1, 0.2, 24.9, 30.0, 50.2, 90.3].map((x) => T0 + x);
    expect(chooseThreeObservations(t).indices).toEqual([0, 2, 4]);
    // With 10 days no pair has a third observation between at least 0.5 day from both.
    const r = chooseThreeObservations(t, { maxArcDays: 10 });
    expect(r.indices).toBeNull();
    expect(r.reason).toMatch(/^no three observations within 10 days with neighbours at least 0.5 days apart/);
  });

  it('refuses three observations of one night and says why', () => {
    const night = [0.70, 0.72, 0.75, 0.80, 0.86].map((x) => T0 + x);
    const r = chooseThreeObservations(night);
    expect(r.indices).toBeNull();
    expect(r.reason).toMatch(/neighbours at least 0.5 days apart \(span of the file 0.160 days\)/);
    // Allowed when the caller asks for no separation: middle of 0.70 and 0.86 is 0.78 → 0.80.
    expect(chooseThreeObservations(night, { minSeparationDays: 0 }).indices).toEqual([0, 3, 4]);
  });

  it('passes over a widest pair whose middle is too near an end and takes the next', () => {
    // 0, 0.3, 19.8, 20: every pair's best middle is 0.2 or 0.3 day from an end, so none.
    // Add 10.1: the pair 0 … 20 takes it as its middle (nearest 10).
    const t = [0, 0.3, 19.8, 20].map((x) => T0 + x);
    expect(chooseThreeObservations(t).indices).toBeNull();
    expect(chooseThreeObservations([...t, T0 + 10.1]).indices).toEqual([0, 4, 3]);
  });

  it('needs three timed observations; refuses nonsense options', () => {
    expect(chooseThreeObservations([T0, NaN, T0 + 3]).reason).toBe('fewer than three observations with a time (2)');
    expect(() => chooseThreeObservations([T0], { maxArcDays: 1, minSeparationDays: 0.6 })).toThrow(RangeError);
  });
});
