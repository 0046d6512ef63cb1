// Segmentation of the resonant angle φ(t) (src/core/coorbital/segments.ts) on synthetic
// series: invented data built from known librations and circulation (allowed for synthetic
// tests), with seeded noise and a yearly term the smoothing must remove. The outside facts
// checked are those the series were built from (their periods, centres, amplitudes and switch
// times) and the kinds of motion as the design note on the co-orbital detector tabulates
// them (§6, after the libration types of Murray & Dermott 1999 ch. 3 — from memory).
import { describe, expect, it } from 'vitest';
import { classifyRange, segmentResonantAngle } from '../../src/core/coorbital/segments.js';
import { turningPointsInto } from '../../src/core/coorbital/turningPoints.js';
import { runningMeanInto } from '../../src/core/coorbital/runningMean.js';
import { besselJSequence } from '../../src/core/series/besselJ.js';
import { seededRandom } from '../../src/core/random.js';
import type { CoorbitalSegment } from '../../src/core/coorbital/types.js';

const YEAR = 365.25;
const DEG = Math.PI / 180;
const STEP = YEAR / 20; // a twentieth of the (Earth-like) planet period
const T0 = 2_451_545.0;

/** Times over `years` and φ (rad) from `phiDeg(tYears)`, plus noise: uniform ±1° and a 3° yearly term. */
function series(years: number, phiDeg: (tYears: number) => number, seed = 7): { t: Float64Array; phi: Float64Array } {
  const n = Math.floor((years * YEAR) / STEP) + 1;
  const t = new Float64Array(n), phi = new Float64Array(n);
  const random = seededRandom(seed);
  for (let k = 0; k < n; k++) {
    const ty = (k * STEP) / YEAR;
    t[k] = T0 + k * STEP;
    phi[k] = (phiDeg(ty) + 3 * Math.sin(2 * Math.PI * ty) + 2 * (random() - 0.5)) * DEG;
  }
  return { t, phi };
}

const segment = (s: { t: Float64Array; phi: Float64Array }): CoorbitalSegment[] =>
  segmentResonantAngle(s.t, s.phi, { smoothingDays: YEAR });
const years = (jd: number): number => (jd - T0) / YEAR;

describe('segmentation of synthetic resonant-angle series', () => {
  it('a tadpole about L4 (+60°): one segment with the built period, centre and amplitude', () => {
    const s = segment(series(1050, (t) => 60 + 15 * Math.cos((2 * Math.PI * t) / 150))); // 7 whole cycles
    expect(s.map((x) => x.state)).toEqual(['tadpole-L4']);
    expect(Math.abs(s[0].periodYears / 150 - 1)).toBeLessThan(0.01); // built: 150 yr
    expect(Math.abs(s[0].centreDeg - 60)).toBeLessThan(1);
    // Half the range is a max statistic: the ±1° noise and the residue of the yearly term
    // after the one-year mean raise it by up to ~1° (measured 16.0°).
    expect(Math.abs(s[0].amplitudeDeg - 15)).toBeLessThan(1.5);
    expect(s[0].startJdTDB).toBe(T0);
  });

  it('a tadpole about L5 (−60°)', () => {
    const s = segment(series(800, (t) => -60 + 20 * Math.sin((2 * Math.PI * t) / 220)));
    expect(s.map((x) => x.state)).toEqual(['tadpole-L5']);
    expect(Math.abs(s[0].periodYears / 220 - 1)).toBeLessThan(0.01);
    expect(Math.abs(s[0].centreDeg + 60)).toBeLessThan(1.5); // 800 yr is not a whole number of cycles
  });

  it('circulation is passing, with the circulation period; NaN centre and amplitude', () => {
    const s = segment(series(200, (t) => (-360 * t) / 13 + 40));
    expect(s.map((x) => x.state)).toEqual(['passing']);
    expect(Math.abs(s[0].periodYears / 13 - 1)).toBeLessThan(0.01);
    expect(s[0].centreDeg).toBeNaN();
    expect(s[0].amplitudeDeg).toBeNaN();
  });

  it('a compound orbit passing over 0 and 180° in every cycle', () => {
    const s = segment(series(1000, (t) => 105 + 145 * Math.sin((2 * Math.PI * t) / 200)) /* −40°…250° */);
    expect(s.map((x) => x.state)).toEqual(['compound']);
    expect(Math.abs(s[0].periodYears / 200 - 1)).toBeLessThan(0.01);
  });

  it('quasi-satellite → horseshoe → quasi-satellite: states, switch times and periods recovered', () => {
    // QS ±10° about 0 with a 50-yr period until 300 yr, ending at its +10° turning point; a
    // horseshoe 10°…350° (through 180°) with a 120-yr period for five cycles; then QS again.
    const phi = (t: number): number => {
      if (t < 300) return 10 * Math.cos((2 * Math.PI * (t - 300)) / 50);
      if (t < 900) return 180 - 170 * Math.cos((2 * Math.PI * (t - 300)) / 120);
      return 10 * Math.cos((2 * Math.PI * (t - 900)) / 50);
    };
    const s = segment(series(1200, phi));
    expect(s.map((x) => x.state)).toEqual(['quasi-satellite', 'horseshoe', 'quasi-satellite']);
    expect(Math.abs(years(s[1].startJdTDB) - 300)).toBeLessThan(2);
    expect(Math.abs(years(s[2].startJdTDB) - 900)).toBeLessThan(2);
    expect(s[0].endJdTDB).toBe(s[1].startJdTDB);
    expect(Math.abs(s[0].periodYears / 50 - 1)).toBeLessThan(0.02);
    expect(Math.abs(s[1].periodYears / 120 - 1)).toBeLessThan(0.01);
    expect(Math.abs(s[0].amplitudeDeg - 10)).toBeLessThan(1.5); // measured 10.9°: max statistic, as above
    expect(Math.abs(s[1].amplitudeDeg - 170)).toBeLessThan(1.5);
    // A horseshoe's centre is the middle of its range, L3 at 180°: its circular mean would
    // point to 0° — with φ = 180° − A cos θ, θ uniform, the mean of cos φ is −J0(A) (integral
    // form of the Bessel function, Abramowitz & Stegun 9.1.18 — from memory), and
    // J0(170° in rad) < 0.
    const j0 = new Float64Array(1);
    besselJSequence(170 * DEG, 1, j0);
    expect(j0[0]).toBeLessThan(0);
    expect(180 - Math.abs(s[1].centreDeg)).toBeLessThan(2);
    expect(Math.abs(s[0].centreDeg)).toBeLessThan(1);
  });

  it('a tadpole widening into a horseshoe switches at a turning point of the tadpole', () => {
    const phi = (t: number): number => (t < 300
      ? 70 + 30 * Math.cos((2 * Math.PI * (t - 300)) / 150) // L4 tadpole 40°…100°, at 100° at 300 yr
      : 220 - 120 * Math.cos((2 * Math.PI * (t - 300)) / 160)); // horseshoe 100°…340°
    const s = segment(series(700, phi));
    expect(s.map((x) => x.state)).toEqual(['tadpole-L4', 'horseshoe']);
    expect(Math.abs(years(s[1].startJdTDB) - 225)).toBeLessThan(2); // the tadpole's last minimum (40°)
  });
});

describe('pieces of the segmentation', () => {
  it('refuses a non-finite sample', () => {
    const t = Float64Array.of(0, 1, 2), phi = Float64Array.of(0, NaN, 0);
    expect(() => segmentResonantAngle(t, phi, { smoothingDays: 1 })).toThrow(/non-finite sample 1/);
  });

  it('classifyRange: the table of the design note (§6)', () => {
    expect(classifyRange(-10 * DEG, 12 * DEG)).toBe('quasi-satellite');
    expect(classifyRange(40 * DEG, 90 * DEG)).toBe('tadpole-L4');
    expect(classifyRange((360 - 90) * DEG, (360 - 40) * DEG)).toBe('tadpole-L5'); // unwrapped a turn up
    expect(classifyRange(20 * DEG, 340 * DEG)).toBe('horseshoe');
    expect(classifyRange(-30 * DEG, 190 * DEG)).toBe('compound');
    expect(classifyRange(-20 * DEG, 70 * DEG)).toBe('compound'); // QS with tadpole
    expect(classifyRange(0.1, 0.1 + 2 * Math.PI)).toBe('passing');
  });

  it('turning points: hysteresis ignores wiggles smaller than itself', () => {
    const n = 2000;
    const v = new Float64Array(n);
    for (let k = 0; k < n; k++) v[k] = 0.01 * k + 2 * Math.sin(k / 3) + 10 * Math.sin((2 * Math.PI * k) / 500);
    const out = new Int32Array(n);
    // The ramp with 2-unit wiggles and a 10-unit oscillation (period 500): turning points
    // only from the oscillation, two per period at most (4 periods).
    const count = turningPointsInto(v, 5, out);
    expect(count).toBeGreaterThanOrEqual(6);
    expect(count).toBeLessThanOrEqual(8);
    expect(turningPointsInto(v, 0.1, out)).toBeGreaterThan(100); // without hysteresis: every wiggle
  });

  it('running mean over a window removes a term of that period and keeps a slow line', () => {
    const n = 1000;
    const t = new Float64Array(n), v = new Float64Array(n), out = new Float64Array(n);
    for (let k = 0; k < n; k++) { t[k] = k; v[k] = 0.5 * k + 3 * Math.sin((2 * Math.PI * k) / 21); }
    runningMeanInto(t, v, 20, out); // 21 samples (±10) of a 21-sample period: the sine sums to 0
    let worst = 0;
    for (let k = 50; k < n - 50; k++) worst = Math.max(worst, Math.abs(out[k] - 0.5 * k));
    expect(worst).toBeLessThan(1e-9);
  });
});
