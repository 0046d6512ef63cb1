import { describe, expect, it } from 'vitest';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import { assignBodies, prefillParallel } from '../../src/core/ephemeris/ephemerisParallelFill.js';
import { EPHEMERIS_BODIES, PLANET_SYSTEM_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import type { Ephemeris } from '../../src/core/types.js';
import { randomDates } from './ephemerisTestDates.js';

describe('parallel cache fill over worker threads', () => {
  it('gives bit-identical states for 1, 2 and 3 threads', async () => {
    // Common practice for parallel numerics: the result must not depend on the thread count.
    const start = 2_451_545 - 4 * 365.25;
    const end = 2_451_545 + 4 * 365.25;
    const caches = [1, 2, 3].map(() => createEphemeris({ startJdTDB: start, endJdTDB: end, fill: 'bulk' }));
    await prefillParallel(caches[0], start, end, PLANET_SYSTEM_BODIES, 1);
    await prefillParallel(caches[1], start, end, PLANET_SYSTEM_BODIES, 2);
    await prefillParallel(caches[2], start, end, PLANET_SYSTEM_BODIES, 3);
    expect(caches[1].fittedSegmentCount).toBe(caches[0].fittedSegmentCount);
    expect(caches[2].fittedSegmentCount).toBe(caches[0].fittedSegmentCount);
    const a = new Float64Array(6);
    const b = new Float64Array(6);
    let differing = 0;
    for (const other of [caches[1], caches[2]]) {
      for (const jd of randomDates(47, 30, start, end)) {
        for (const body of PLANET_SYSTEM_BODIES) {
          caches[0].helioState(body, jd, a);
          other.helioState(body, jd, b);
          for (let j = 0; j < 6; j++) if (a[j] !== b[j]) differing++;
        }
      }
    }
    expect(differing).toBe(0);
  });

  it('balances bodies heaviest first and keeps every body exactly once', () => {
    const groups = assignBodies(EPHEMERIS_BODIES, 2);
    expect(groups.flat().sort()).toEqual([...EPHEMERIS_BODIES].sort());
    // The two heaviest (Earth–Moon barycentre, Mercury) start different threads.
    expect(groups[0][0]).toBe('emb');
    expect(groups[1][0]).toBe('mercury');
    expect(assignBodies(['mars'], 4)).toEqual([['mars']]);
  });

  it('fills in this thread for other sources, and rejects a bad thread count', async () => {
    const start = 2_451_545;
    const end = start + 400;
    const inner = createEphemeris({ startJdTDB: start, endJdTDB: end });
    const plain: Ephemeris = {
      name: 'plain', startJdTDB: start, endJdTDB: end,
      helioState: (body, jd, out, offset = 0) => inner.helioState(body, jd, out, offset),
    };
    const cache = createEphemeris({ startJdTDB: start, endJdTDB: end, source: plain });
    await prefillParallel(cache, start, end, ['venus'], 4);
    expect(cache.fittedSegmentCount).toBe(Math.ceil(400 / 64));
    await expect(prefillParallel(cache, start, end, ['venus'], 0)).rejects.toThrow(RangeError);
  });
});
