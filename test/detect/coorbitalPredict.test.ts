/**
 * The prediction stage over many bodies: the same predictions, in entry order, on one thread
 * and spread over two worker threads, and equal to the averaged problem called body by body
 * (the two-stage prediction, predictTwoStage.ts; its accuracy against the fine grid is checked
 * in coorbitalTwoStage.test.ts). Bodies: every body of the invented demo catalogue in any
 * planet's 1:1 zone (several chunks of PREDICT_CHUNK_BODIES).
 */
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { GM_SUN_AU3_PER_DAY2, PLANETS, planetGmAu3PerDay2 } from '../../src/core/constants.js';
import { createTwoStageWorkspace, predictCoorbitalTwoStage } from '../../src/core/coorbital/predictTwoStage.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { loadCatalogue } from '../../src/cli/loadCatalogue.js';
import { PREDICT_CHUNK_BODIES, predictEntries } from '../../src/detect/coorbitalPredict.js';
import { defaultZoneHalfWidth, planetMassRatio, screenCoorbitalZone, type ZoneEntry } from '../../src/detect/coorbitalZone.js';

const ROOT = resolve(import.meta.dirname, '../..');

describe('predictEntries', () => {
  let entries: ZoneEntry[];
  beforeAll(async () => {
    const { catalogue } = await loadCatalogue([join(ROOT, 'data/demo/orbits.txt')]);
    ({ entries } = screenCoorbitalZone(catalogue, PLANETS, PLANETS.map(defaultZoneHalfWidth), new Vsop87Ephemeris()));
  });

  it('gives the same predictions in the same order with 1 and with 2 threads', async () => {
    expect(entries.length).toBeGreaterThan(2 * PREDICT_CHUNK_BODIES); // several chunks, so both threads work
    const one = await predictEntries(entries, 1);
    const two = await predictEntries(entries, 2);
    expect(two).toHaveLength(entries.length);
    expect(two).toEqual(one);
    expect(new Set(one.map((p) => p.state)).size).toBeGreaterThan(1); // not a trivial population
  });

  it('matches the two-stage prediction called body by body (period from Kepler\'s third law)', async () => {
    const some = entries.filter((_, k) => k % 7 === 0);
    const got = await predictEntries(some, 2);
    some.forEach((e, k) => {
      const periodDays = 2 * Math.PI * Math.sqrt(e.planetAAu ** 3 / (GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2(e.planet)));
      const direct = predictCoorbitalTwoStage(e.shape, e.x, e.phiRad, planetMassRatio(e.planet), periodDays, createTwoStageWorkspace());
      expect(got[k], `entry ${k}`).toEqual(direct);
    });
  });

  it('refuses a thread count below one', async () => {
    await expect(predictEntries(entries, 0)).rejects.toThrow(RangeError);
  });
});
