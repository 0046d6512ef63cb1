import { describe, expect, it } from 'vitest';
import { KM_PER_AU } from '../../src/core/constants.js';
import { Vsop87Ephemeris, VSOP87_DEFAULT_END_JD_TDB, VSOP87_DEFAULT_START_JD_TDB } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import {
  CACHE_FILL_CHUNK, DEFAULT_CHEBYSHEV_LAYOUTS, DEFAULT_FIT_TOLERANCE_AU, DYNAMICS_FIT_TOLERANCE_AU, EphemerisCache,
} from '../../src/core/ephemeris/ephemerisCache.js';
import type { CacheFillChoice, CacheFillMethod, CacheVelocityMode } from '../../src/core/ephemeris/ephemerisCache.js';
import { EPHEMERIS_BODIES, PLANET_SYSTEM_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import type { Ephemeris, EphemerisBody } from '../../src/core/types.js';
import { randomDates } from './ephemerisTestDates.js';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';

// Reference for every comparison here: the direct VSOP87B/ELP series (vsop87Ephemeris.ts),
// itself checked against the published VSOP87 check values, astronomia and astronomy-engine
// in ephemerisVsop87.test.ts and ephemerisAstronomyEngine.test.ts.
const source = new Vsop87Ephemeris();
const START = VSOP87_DEFAULT_START_JD_TDB; // J2000 − 1 000 years
const END = VSOP87_DEFAULT_END_JD_TDB; // J2000 + 1 000 years
const M_PER_AU = KM_PER_AU * 1000;
const MM_PER_S_PER_AU_PER_DAY = (KM_PER_AU * 1e6) / 86_400;

interface Row { body: EphemerisBody; pos: number; vel: number }

/** Worst position (au) and velocity (au/day) differences of a against b at random dates. */
function worst(a: Ephemeris, b: Ephemeris, dates: Float64Array, bodies: readonly EphemerisBody[] = EPHEMERIS_BODIES): Row[] {
  const sa = new Float64Array(6);
  const sb = new Float64Array(6);
  return bodies.map((body) => {
    let pos = 0;
    let vel = 0;
    for (const jd of dates) {
      a.helioState(body, jd, sa);
      b.helioState(body, jd, sb);
      pos = Math.max(pos, Math.hypot(sa[0] - sb[0], sa[1] - sb[1], sa[2] - sb[2]));
      vel = Math.max(vel, Math.hypot(sa[3] - sb[3], sa[4] - sb[4], sa[5] - sb[5]));
    }
    return { body, pos, vel };
  });
}

function report(title: string, rows: Row[]): void {
  const text = rows.map((r) => `${r.body} ${(r.pos * M_PER_AU).toFixed(2)} m / ${(r.vel * MM_PER_S_PER_AU_PER_DAY).toFixed(3)} mm/s`);
  console.log(`${title}: ${text.join(', ')}`);
}

function cache(fill: CacheFillChoice, velocity: CacheVelocityMode = 'derivative', fitToleranceAu?: number): EphemerisCache {
  return new EphemerisCache(source, { startJdTDB: START, endJdTDB: END, fill, velocity, fitToleranceAu });
}

describe('bulk cache fill against the direct series over the whole ±1 000-year span', () => {
  it('keeps positions within 1e-9 au and velocities within 1e-9 au/day at the default tolerance', () => {
    // Far from J2000 the t^α blocks of VSOP87 (α ≤ 5) and the lunar polynomials weigh most.
    const rows = worst(cache('bulk'), source, randomDates(41, 16, START, END));
    report('bulk fill (tolerance 1e-10 au) vs direct series, 1000–3000', rows);
    for (const r of rows) {
      expect(r.pos).toBeLessThan(1e-9);
      expect(r.vel).toBeLessThan(1e-9);
    }
  });

  it("keeps separately fitted velocities ('fitted') within 1e-10 au/day", () => {
    const rows = worst(cache('bulk', 'fitted'), source, randomDates(42, 8, START, END));
    report("bulk fill, 'fitted' velocities, vs direct series", rows);
    for (const r of rows) {
      expect(r.pos).toBeLessThan(1e-9);
      // Measured ≤ 2e-11 au/day; the derivative of the lunar-theory node values adds to the
      // 'nodes' path's 7.5e-12 au/day, hence not the 3e-11 of the 200-year test.
      expect(r.vel).toBeLessThan(1e-10);
    }
  });

  it('agrees with the node-sampling fill on the same segments to the size of both fit errors', () => {
    const dates = randomDates(43, 6, START, END);
    const rows = worst(cache('bulk'), cache('nodes'), dates);
    report('bulk vs node-sampling fill', rows);
    // Each is within ~3e-11 au of the direct series (measured); their difference likewise.
    for (const r of rows) expect(r.pos).toBeLessThan(1e-10);
  });

  it('stays far inside its bound at the dynamics tolerance', () => {
    const c = cache('bulk', 'derivative', DYNAMICS_FIT_TOLERANCE_AU);
    const rows = worst(c, source, randomDates(44, 10, START, END), PLANET_SYSTEM_BODIES);
    report('bulk fill (dynamics tolerance 1e-8 au) vs direct series', rows);
    for (const r of rows) {
      const bound = c.bulkFitter(r.body).droppedBoundAu;
      expect(bound).toBeLessThanOrEqual(DYNAMICS_FIT_TOLERANCE_AU);
      // The bound is a worst case over thousands of coefficients of either sign; the fit's
      // own error (≤ 3e-11 au) comes on top of it.
      expect(r.pos).toBeLessThan(bound + 1e-10);
    }
  });

  it('reports a dropped-term bound within the tolerance for every body', () => {
    const c = cache('auto');
    for (const body of EPHEMERIS_BODIES) {
      expect(c.fillMethod(body)).toBe('bulk'); // 'auto' over 2 000 years
      const f = c.bulkFitter(body);
      expect(f.droppedBoundAu).toBeLessThanOrEqual(DEFAULT_FIT_TOLERANCE_AU);
      expect(f.termsKept).toBeGreaterThan(0.9 * f.termsTotal);
    }
  });
});

describe('prefill and lazy filling', () => {
  it('give bit-identical states whatever the order of filling', () => {
    const start = 2_451_545 - 3_000;
    const end = 2_451_545 + 3_000;
    const eager = new EphemerisCache(source, { startJdTDB: start, endJdTDB: end });
    eager.prefill(start, end);
    const lazy = new EphemerisCache(source, { startJdTDB: start, endJdTDB: end });
    const dates = randomDates(45, 40, start, end);
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    let differing = 0;
    for (let k = dates.length - 1; k >= 0; k--) {
      for (const body of EPHEMERIS_BODIES) {
        lazy.helioState(body, dates[k], a);
        eager.helioState(body, dates[k], b);
        for (let j = 0; j < 6; j++) if (a[j] !== b[j]) differing++;
      }
    }
    expect(differing).toBe(0);
  });

  it('fits only the runs of segments that overlap the range, for the bodies asked, once', () => {
    const start = 2_451_545 - 10_000;
    const end = 2_451_545 + 10_000;
    const c = new EphemerisCache(source, { startJdTDB: start, endJdTDB: end });
    // Mars: 64-day segments, so one run of CACHE_FILL_CHUNK covers 4 096 days.
    c.prefill(start + 100, start + 200, ['mars']);
    expect(c.fittedSegmentCount).toBe(CACHE_FILL_CHUNK);
    c.prefill(start + 150, start + 4_000, ['mars']);
    expect(c.fittedSegmentCount).toBe(CACHE_FILL_CHUNK);
    // Clipped to the span: the last run of Mars only.
    const marsSegments = Math.ceil((end - start) / DEFAULT_CHEBYSHEV_LAYOUTS[3].segmentDays);
    c.prefill(end - 1, end + 1e6, ['mars']);
    expect(c.fittedSegmentCount).toBe(CACHE_FILL_CHUNK + (marsSegments % CACHE_FILL_CHUNK || CACHE_FILL_CHUNK));
  });

  it('createEphemeris with a list of bodies as `eager` fits exactly their segments', () => {
    const start = 2_451_545;
    const end = start + 20 * 365.25;
    const eph = createEphemeris({ startJdTDB: start, endJdTDB: end, eager: PLANET_SYSTEM_BODIES });
    const expected = PLANET_SYSTEM_BODIES.reduce(
      (n, body) => n + Math.ceil((end - start) / DEFAULT_CHEBYSHEV_LAYOUTS[EPHEMERIS_BODIES.indexOf(body)].segmentDays), 0,
    );
    expect(eph.fittedSegmentCount).toBe(expected);
  });

  it('merges bodies fitted by separate caches (as separate threads would) into bit-identical states', () => {
    const start = 2_451_545 - 4_000;
    const end = 2_451_545 + 4_000;
    const opts = { startJdTDB: start, endJdTDB: end };
    const single = new EphemerisCache(source, opts);
    single.prefill(start, end, ['mars', 'emb']);
    const workerA = new EphemerisCache(source, opts);
    workerA.prefill(start, end, ['mars']);
    const workerB = new EphemerisCache(source, opts);
    workerB.prefill(start, end, ['emb']);
    const merged = new EphemerisCache(source, opts);
    // structuredClone is what postMessage does to the tables between threads.
    merged.importBody(structuredClone(workerA.exportBody('mars')));
    merged.importBody(structuredClone(workerB.exportBody('emb')));
    expect(merged.fittedSegmentCount).toBe(single.fittedSegmentCount);
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    let differing = 0;
    for (const jd of randomDates(46, 50, start, end)) {
      for (const body of ['mars', 'emb'] as const) {
        merged.helioState(body, jd, a);
        single.helioState(body, jd, b);
        for (let j = 0; j < 6; j++) if (a[j] !== b[j]) differing++;
      }
    }
    expect(differing).toBe(0);
    expect(merged.fittedSegmentCount).toBe(single.fittedSegmentCount); // nothing refitted
  });

  it('refuses tables fitted under other options, naming the field', () => {
    const opts = { startJdTDB: 2_451_000, endJdTDB: 2_455_000 };
    const table = new EphemerisCache(source, opts).exportBody('venus');
    const looser = new EphemerisCache(source, { ...opts, fitToleranceAu: DYNAMICS_FIT_TOLERANCE_AU });
    expect(() => looser.importBody(table)).toThrow(/fitToleranceAu/);
    const longer = new EphemerisCache(source, { ...opts, endJdTDB: 2_455_001 });
    expect(() => longer.importBody(table)).toThrow(RangeError);
  });

  it('rejects a bulk fill over a source without one, bad tolerances, bad methods and reversed ranges', () => {
    const plain: Ephemeris = {
      name: 'plain', startJdTDB: START, endJdTDB: END,
      helioState: (body, jd, out, offset = 0) => source.helioState(body, jd, out, offset),
    };
    expect(() => new EphemerisCache(plain, { startJdTDB: 2_451_000, endJdTDB: 2_452_000, fill: 'bulk' })).toThrow(TypeError);
    expect(new EphemerisCache(plain, { startJdTDB: START, endJdTDB: END }).fillMethod('mars')).toBe('nodes');
    expect(() => new EphemerisCache(source, { startJdTDB: 2_451_000, endJdTDB: 2_452_000, fitToleranceAu: -1 })).toThrow(RangeError);
    const bad = 'spline' as CacheFillMethod;
    expect(() => new EphemerisCache(source, { startJdTDB: 2_451_000, endJdTDB: 2_452_000, fill: bad })).toThrow(TypeError);
    const c = new EphemerisCache(source, { startJdTDB: 2_451_000, endJdTDB: 2_452_000 });
    expect(() => c.prefill(2_451_500, 2_451_400)).toThrow(RangeError);
    expect(() => c.prefill(2_451_400, 2_451_500, ['moon' as EphemerisBody])).toThrow(TypeError);
  });
});
