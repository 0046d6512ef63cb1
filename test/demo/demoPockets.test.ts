/**
 * The empty pockets of the demo's main-belt background (invented data, scripts/demo/
 * mainBeltBackground.ts). Checks: no background draw lands in a pocket and each pocket's turned-
 * away draws are counted; the probability a pocket holds under the smooth law, by quadrature,
 * against a plain Monte Carlo count of the uncarved law (common practice: a binomial proportion
 * within 4σ); each pocket's centre where the families stage trusts the secular theory (the stage's
 * own kernel), clear of the planted families and of the other pockets.
 */
import { describe, expect, it } from 'vitest';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import { DEMO_FAMILIES } from '../../scripts/demo/families.js';
import {
  pocketDistanceMPerS, pocketOf, pocketProbability, POCKETS, sampleBackgroundProper,
} from '../../scripts/demo/mainBeltBackground.js';
import { properToOsculating } from '../../scripts/demo/properToOsculating.js';
import { mulberry32 } from '../../scripts/demo/random.js';
import { DemoSecularField, type StageProper } from '../../scripts/demo/secularForced.js';
import { emptyElements } from '../../scripts/demo/types.js';

describe('the background\'s empty pockets', () => {
  it('hold no background body, and count the draws they turn away', () => {
    const random = mulberry32(3);
    const carved = POCKETS.map(() => 0);
    const p = { aAu: NaN, e: NaN, sinI: NaN };
    const n = 100_000;
    for (let j = 0; j < n; j++) {
      sampleBackgroundProper(random, p, carved);
      expect(pocketOf(p.aAu, p.e, p.sinI)).toBe(-1);
    }
    // each pocket turned away about n·P/(1 − ΣP) draws: within 4σ of that Poisson count
    const total = POCKETS.reduce((s, q) => s + pocketProbability(q), 0);
    POCKETS.forEach((q, k) => {
      const expected = (n * pocketProbability(q)) / (1 - total);
      expect(Math.abs(carved[k] - expected), `pocket ${k + 1}: ${carved[k]} carved, ${expected.toFixed(0)} expected`).toBeLessThan(4 * Math.sqrt(expected));
    });
  });

  it('hold, by quadrature, the fraction of the smooth law a Monte Carlo count finds in them', () => {
    // The smooth law is sampleBackgroundProper before carving: draw it with an empty pocket list by
    // counting, per pocket, the draws that fell in it among all draws (turned-away ones included).
    const random = mulberry32(5);
    const carved = POCKETS.map(() => 0);
    const p = { aAu: NaN, e: NaN, sinI: NaN };
    let draws = 0;
    for (let j = 0; j < 200_000; j++) sampleBackgroundProper(random, p, carved);
    draws = 200_000 + carved.reduce((s, c) => s + c, 0);
    POCKETS.forEach((q, k) => {
      const prob = pocketProbability(q);
      const sigma = Math.sqrt((prob * (1 - prob)) / draws);
      console.log(`pocket ${k + 1}: quadrature ${prob.toFixed(5)}, Monte Carlo ${(carved[k] / draws).toFixed(5)} (σ ${sigma.toFixed(5)})`);
      expect(Math.abs(carved[k] / draws - prob)).toBeLessThan(4 * sigma);
    });
  });

  it('are centred where the stage trusts the theory, clear of the planted families and of each other', () => {
    const field = new DemoSecularField();
    const random = mulberry32(9);
    const el = emptyElements(), stage: StageProper = { aAu: NaN, e: NaN, sinI: NaN, code: 0 };
    for (const [k, q] of POCKETS.entries()) {
      let trusted = 0;
      for (let t = 0; t < 50; t++) {
        properToOsculating(random, field, { aAu: q.aAu, e: q.e, sinI: q.sinI }, el);
        if (field.properOf(el, stage).code === 0) trusted++;
      }
      expect(trusted, `pocket ${k + 1} centre trusted (of 50)`).toBeGreaterThanOrEqual(45);
      // a family's parent at least the radius plus 500 m/s away (its members spread a few hundred m/s)
      for (const f of DEMO_FAMILIES) expect(pocketDistanceMPerS(q, f.aAu, f.e, f.sinI), `pocket ${k + 1} from ${f.name}`).toBeGreaterThan(q.radiusMPerS + 500);
      for (const [j, o] of POCKETS.entries()) {
        // disjoint balls in the scaled coordinates (each radius over its own centre's n·a)
        const apart = pocketDistanceMPerS(q, o.aAu, o.e, o.sinI) / orbitalSpeedMPerS(q.aAu);
        if (j !== k) expect(apart, `pockets ${k + 1} and ${j + 1}`).toBeGreaterThan(q.radiusMPerS / orbitalSpeedMPerS(q.aAu) + o.radiusMPerS / orbitalSpeedMPerS(o.aAu));
      }
    }
  });
});
