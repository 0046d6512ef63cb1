import { describe, expect, it } from 'vitest';
import { KM_PER_AU } from '../../src/core/constants.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { CACHE_FILL_CHUNK, DEFAULT_CHEBYSHEV_LAYOUTS, EphemerisCache } from '../../src/core/ephemeris/ephemerisCache.js';
import type { CacheFillMethod, CacheVelocityMode } from '../../src/core/ephemeris/ephemerisCache.js';
import { createEphemeris, sunBarycentricState } from '../../src/core/ephemeris/ephemeris.js';
import { EPHEMERIS_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import type { Ephemeris, EphemerisBody } from '../../src/core/types.js';
import { JD_1900, JD_2100, randomDates } from './ephemerisTestDates.js';

const source = new Vsop87Ephemeris();
const MM_PER_S_PER_AU_PER_DAY = (KM_PER_AU * 1e6) / 86_400;

/** Worst position (au) and velocity (au/day) difference, cache vs direct, per body. */
function compare(mode: CacheVelocityMode, datesPerBody: number, seed: number, fill: CacheFillMethod = 'bulk') {
  const cache = new EphemerisCache(source, { startJdTDB: JD_1900, endJdTDB: JD_2100, velocity: mode, fill });
  const a = new Float64Array(6);
  const d = new Float64Array(6);
  const rows: Array<{ body: EphemerisBody; pos: number; vel: number }> = [];
  for (const body of EPHEMERIS_BODIES) {
    let pos = 0;
    let vel = 0;
    for (const jd of randomDates(seed, datesPerBody)) {
      cache.helioState(body, jd, a);
      source.helioState(body, jd, d);
      pos = Math.max(pos, Math.hypot(a[0] - d[0], a[1] - d[1], a[2] - d[2]));
      vel = Math.max(vel, Math.hypot(a[3] - d[3], a[4] - d[4], a[5] - d[5]));
    }
    rows.push({ body, pos, vel });
  }
  const text = rows.map((r) => `${r.body} ${(r.pos * KM_PER_AU * 1000).toFixed(2)} m / ${(r.vel * MM_PER_S_PER_AU_PER_DAY).toFixed(3)} mm/s`);
  console.log(`cache ('${mode}' velocities, '${fill}' fill) vs direct VSOP87, 1900–2100, worst position / velocity: ${text.join(', ')}`);
  return rows;
}

describe('Chebyshev cache over the direct series, 200-year span', () => {
  it("agrees with the direct series to ≤ 1e-9 au and ≤ 1e-9 au/day ('derivative' velocities, default)", () => {
    // Reference: the direct VSOP87B/ELP series (this project), itself checked against the
    // published VSOP87 check values and astronomia in ephemerisVsop87.test.ts.
    for (const r of compare('derivative', 60, 31)) {
      expect(r.pos).toBeLessThan(1e-9);
      expect(r.vel).toBeLessThan(1e-9);
    }
  });

  it("agrees to ≤ 1e-9 au and ≤ 1e-9 au/day when fitted by sampling the series at the nodes ('nodes')", () => {
    // The reference fill path: every node is one evaluation of the direct series.
    for (const r of compare('derivative', 12, 36, 'nodes')) {
      expect(r.pos).toBeLessThan(1e-9);
      expect(r.vel).toBeLessThan(1e-9);
    }
  });

  it("agrees to ≤ 1e-9 au and ≤ 3e-11 au/day with separately fitted velocities ('fitted')", () => {
    // Measured worst 7.5e-12 au/day (Earth, lunar wobble), i.e. ~5× better than 'derivative'.
    for (const r of compare('fitted', 30, 32)) {
      expect(r.pos).toBeLessThan(1e-9);
      expect(r.vel).toBeLessThan(3e-11);
    }
  });

  it('is continuous across segment boundaries to the fit accuracy', () => {
    const cache = new EphemerisCache(source, { startJdTDB: JD_1900, endJdTDB: JD_2100 });
    const before = new Float64Array(6);
    const after = new Float64Array(6);
    let worst = 0;
    // Mercury's nominal segment length; the span is cut into equal segments no longer.
    const nominal = DEFAULT_CHEBYSHEV_LAYOUTS[0].segmentDays;
    const segmentDays = (JD_2100 - JD_1900) / Math.ceil((JD_2100 - JD_1900) / nominal);
    for (let s = 1; s < 40; s++) {
      const edge = JD_1900 + 37 * s * segmentDays;
      const eps = 1e-6; // day; both sides of the edge, in different segments
      cache.helioState('mercury', edge - eps, before);
      cache.helioState('mercury', edge + eps, after);
      // Remove the motion over 2·eps (≈ 1e-7 au at Mercury's speed); the curvature term
      // a·(2 eps)²/2 ≈ 1e-15 au is negligible.
      let jump = 0;
      for (let a = 0; a < 3; a++) jump = Math.hypot(jump, after[a] - before[a] - 2 * eps * before[3 + a]);
      worst = Math.max(worst, jump);
    }
    console.log(`Mercury position jump across segment edges: ${(worst * KM_PER_AU * 1000).toFixed(2)} m`);
    // Fit error on each side (≤ 1.3e-11 au measured) plus Julian-date quantization near
    // 2.4e6 (≈ 5e-10 day × 0.03 au/day per side).
    expect(worst).toBeLessThan(1e-10);
  });

  it("fits lazily: with 'nodes' one query fits one segment, with 'bulk' its run of CACHE_FILL_CHUNK; fillAll fits the rest", () => {
    // 400 days cut into equal segments no longer than each body's nominal length.
    const expected = DEFAULT_CHEBYSHEV_LAYOUTS.reduce((n, l) => n + Math.ceil(400 / l.segmentDays), 0);
    const out = new Float64Array(6);
    const nodes = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_451_400, fill: 'nodes' });
    expect(nodes.fittedSegmentCount).toBe(0);
    nodes.helioState('jupiter', 2_451_100, out);
    nodes.helioState('jupiter', 2_451_101, out);
    expect(nodes.fittedSegmentCount).toBe(1);
    nodes.fillAll();
    expect(nodes.fittedSegmentCount).toBe(expected);

    // Jupiter: 48-day segments, so 400 days hold 9 (< CACHE_FILL_CHUNK): one run fits them all.
    const bulk = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_451_400, fill: 'bulk' });
    expect(bulk.fillMethod('jupiter')).toBe('bulk');
    // By default a span this short is fitted by node sampling (no set-up cost).
    expect(createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_451_400 }).fillMethod('jupiter')).toBe('nodes');
    bulk.helioState('jupiter', 2_451_100, out);
    expect(bulk.fittedSegmentCount).toBe(Math.min(CACHE_FILL_CHUNK, Math.ceil(400 / DEFAULT_CHEBYSHEV_LAYOUTS[4].segmentDays)));
    bulk.fillAll();
    expect(bulk.fittedSegmentCount).toBe(expected);
  });
});

describe('cache over another source (the seam for a binary planetary ephemeris)', () => {
  /** Invented source: body k on a circular orbit of radius 1 + k/4 au, period 80 (1 + k) days. */
  class CircularOrbits implements Ephemeris {
    readonly name = 'synthetic circular orbits';
    readonly startJdTDB = 2_400_000;
    readonly endJdTDB = 2_500_000;
    helioState(body: EphemerisBody, jd: number, out: Float64Array, offset = 0): void {
      const k = EPHEMERIS_BODIES.indexOf(body);
      const r = 1 + k / 4;
      const n = (2 * Math.PI) / (80 * (1 + k));
      const phase = n * (jd - 2_451_545);
      out[offset] = r * Math.cos(phase);
      out[offset + 1] = r * Math.sin(phase);
      out[offset + 2] = 0.01 * r * Math.sin(phase);
      out[offset + 3] = -r * n * Math.sin(phase);
      out[offset + 4] = r * n * Math.cos(phase);
      out[offset + 5] = 0.01 * r * n * Math.cos(phase);
    }
  }

  it('reproduces an exactly known smooth motion to 1e-10 au and 1e-9 au/day', () => {
    // Synthetic (invented) data: positions and velocities known in closed form, with periods
    // no shorter than Mercury's. Chebyshev coefficients of cos(ωx) fall like the Bessel
    // J_k(ω) (Mason & Handscomb 2003, ch. 5), so the fit error is at rounding level.
    const truth = new CircularOrbits();
    const cache = createEphemeris({ startJdTDB: 2_450_000, endJdTDB: 2_453_000, source: truth });
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    let pos = 0;
    let vel = 0;
    for (const body of EPHEMERIS_BODIES) {
      for (const jd of randomDates(35, 50, 2_450_000, 2_453_000)) {
        cache.helioState(body, jd, a);
        truth.helioState(body, jd, b);
        pos = Math.max(pos, Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]));
        vel = Math.max(vel, Math.hypot(a[3] - b[3], a[4] - b[4], a[5] - b[5]));
      }
    }
    console.log(`cache over synthetic circular orbits: worst ${(pos * KM_PER_AU * 1e6).toFixed(3)} mm, ${(vel * MM_PER_S_PER_AU_PER_DAY).toExponential(2)} mm/s`);
    // Not rounding-level: a Julian date near 2.45e6 is stored to ≈ 4.7e-10 day, so the source
    // is sampled at node times off by up to half that, and the fit takes the values as
    // exact; at 0.08 au/day that is ~2e-11 au per node (measured worst 3.5e-11 au), and the
    // derivative amplifies it by ~n²/(segment half-length) (measured 1.2e-10 au/day). The
    // same floor is in the VSOP87 comparisons above.
    expect(pos).toBeLessThan(1e-10);
    expect(vel).toBeLessThan(1e-9);
  });
});

describe('Earth–Moon barycentre', () => {
  it('lies ≈ 4 670 km from the geocentre', () => {
    // Common practice: the barycentre of the Earth–Moon system is ~4 671 km from the Earth's
    // centre (from memory); with the Moon between 356 400 and 406 700 km (perigee/apogee
    // extremes, common practice) divided by 1 + 81.3006 the offset stays in 4 330–4 945 km.
    const eph = createEphemeris({ startJdTDB: JD_1900, endJdTDB: JD_2100 });
    const e = new Float64Array(6);
    const m = new Float64Array(6);
    let sum = 0;
    let min = Infinity;
    let max = 0;
    const dates = randomDates(33, 300);
    for (const jd of dates) {
      eph.helioState('earth', jd, e);
      eph.helioState('emb', jd, m);
      const km = Math.hypot(m[0] - e[0], m[1] - e[1], m[2] - e[2]) * KM_PER_AU;
      sum += km;
      min = Math.min(min, km);
      max = Math.max(max, km);
    }
    console.log(`EMB − Earth: mean ${(sum / dates.length).toFixed(0)} km, range ${min.toFixed(0)}–${max.toFixed(0)} km`);
    expect(Math.abs(sum / dates.length - 4671)).toBeLessThan(40);
    expect(min).toBeGreaterThan(4330);
    expect(max).toBeLessThan(4945);
  });
});

describe('Sun about the barycentre', () => {
  it('has a velocity that is the rate of its position (5-point stencil, h = 1 day)', () => {
    // 4th-order central differences (common practice); the Sun's motion has periods of
    // ≥ 88 days at 1e-8 au, so the stencil error is ≲ 1e-13 au/day.
    const eph = createEphemeris({ startJdTDB: JD_1900, endJdTDB: JD_2100 });
    const s = new Float64Array(30);
    let worst = 0;
    for (const jd of randomDates(34, 20, JD_1900 + 10, JD_2100 - 10)) {
      for (let j = -2; j <= 2; j++) sunBarycentricState(eph, jd + j, s, 6 * (j + 2));
      for (let a = 0; a < 3; a++) {
        const d = (8 * (s[18 + a] - s[6 + a]) - (s[24 + a] - s[a])) / 12;
        worst = Math.max(worst, Math.abs(d - s[15 + a]));
      }
    }
    console.log(`Sun barycentric velocity vs position rate: ${(worst * MM_PER_S_PER_AU_PER_DAY).toFixed(4)} mm/s`);
    expect(worst).toBeLessThan(1e-12);
  });
});

describe('misuse', () => {
  it('throws RangeError, naming the date and the span, outside the cached span', () => {
    const eph = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    const out = new Float64Array(6);
    expect(() => eph.helioState('earth', 2_450_999.9, out)).toThrow(RangeError);
    expect(() => eph.helioState('earth', 2_452_000.1, out)).toThrow(/2452000\.1.*\[2451000, 2452000\]/);
    expect(() => eph.helioState('earth', Number.NaN, out)).toThrow(RangeError);
    // Both ends are inside.
    eph.helioState('neptune', 2_451_000, out);
    eph.helioState('neptune', 2_452_000, out);
    expect(Number.isFinite(out[5])).toBe(true);
  });

  it('rejects spans beyond the source, empty spans, bad layouts and unknown bodies', () => {
    const small = new Vsop87Ephemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    expect(() => createEphemeris({ startJdTDB: 2_450_000, endJdTDB: 2_451_500, source: small })).toThrow(RangeError);
    expect(() => createEphemeris({ startJdTDB: 2_451_500, endJdTDB: 2_451_500 })).toThrow(RangeError);
    expect(() => createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000, layouts: [] })).toThrow(RangeError);
    const bad = 'spline' as CacheVelocityMode;
    expect(() => createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000, velocity: bad })).toThrow(TypeError);
    const eph = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    expect(() => eph.helioState('moon' as EphemerisBody, 2_451_500, new Float64Array(6))).toThrow(TypeError);
  });

  it('writes at the given offset and nowhere else', () => {
    const eph = createEphemeris({ startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    const out = new Float64Array(10).fill(-1);
    eph.helioState('mars', 2_451_500, out, 2);
    expect([out[0], out[1], out[8], out[9]]).toEqual([-1, -1, -1, -1]);
    const direct = new Float64Array(6);
    source.helioState('mars', 2_451_500, direct);
    expect(Math.abs(out[2] - direct[0])).toBeLessThan(1e-9);
  });
});

describe('positions only for the forces (helioPositions)', () => {
  // Reference: the cache's own helioState (checked against the direct series above); the
  // positions-only path must give its positions bit for bit, lazily filled or not.
  const planets: EphemerisBody[] = ['mercury', 'venus', 'emb', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune'];
  for (const velocity of ['derivative', 'fitted'] as const) {
    it(`equals helioState's positions bit for bit, at the given stride, filling lazily ('${velocity}' velocities)`, () => {
      const opts = { startJdTDB: 2_451_000, endJdTDB: 2_453_000, velocity, fill: 'bulk' as const };
      const a = new EphemerisCache(source, opts);
      const b = new EphemerisCache(source, opts);
      const state = new Float64Array(6);
      const out = new Float64Array(3 + 7 * planets.length).fill(-1);
      for (const jd of [2_451_000, 2_451_017.25, 2_452_222.123456789, 2_453_000]) {
        a.helioPositions(planets, jd, out, 3, 7); // before b fits anything: fills its own segments
        planets.forEach((body, j) => {
          b.helioState(body, jd, state);
          expect(Array.from(out.subarray(3 + 7 * j, 6 + 7 * j))).toEqual(Array.from(state.subarray(0, 3)));
          expect(Array.from(out.subarray(6 + 7 * j, 10 + 7 * j))).toEqual([-1, -1, -1, -1]); // the gaps untouched
        });
        expect(Array.from(out.subarray(0, 3))).toEqual([-1, -1, -1]);
      }
    });
  }

  it('follows a change of the body list, and refuses dates outside the span and unknown bodies', () => {
    const eph = new EphemerisCache(source, { startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    const out = new Float64Array(6);
    const state = new Float64Array(6);
    eph.helioPositions(['mars', 'earth'], 2_451_500, out, 0, 3);
    eph.helioPositions(['earth', 'mars'], 2_451_500, out, 0, 3);
    eph.helioState('earth', 2_451_500, state);
    expect(Array.from(out.subarray(0, 3))).toEqual(Array.from(state.subarray(0, 3)));
    expect(() => eph.helioPositions(['earth'], 2_452_000.1, out, 0, 3)).toThrow(/2452000\.1.*\[2451000, 2452000\]/);
    expect(() => eph.helioPositions(['moon' as EphemerisBody], 2_451_500, out, 0, 3)).toThrow(TypeError);
  });
});
