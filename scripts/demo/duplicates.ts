/**
 * Older re-submitted orbits: the same designation at an earlier epoch, the mean anomaly
 * moved back by n·Δt and the other elements nudged by a few units in their last written
 * digits, as a second solution from an older export would differ.
 */
import { jdToCalendar } from '../../src/core/time/julian.js';
import { meanMotionDegPerDay, roundAsteroidElements } from './orbitRows.js';
import type { Random } from './random.js';
import { normal } from './random.js';
import { DEMO_EPOCH_JD_TT } from './scenario.js';
import type { DemoElements } from './types.js';

/** Older epoch of the re-submitted orbits: 200 days before the demo epoch. */
export const DUPLICATE_EPOCH_JD_TT = DEMO_EPOCH_JD_TT - 200;

export function planDuplicate(random: Random, el: DemoElements): { el: DemoElements; epochJdTT: number; epochText: string } {
  const dt = DUPLICATE_EPOCH_JD_TT - DEMO_EPOCH_JD_TT;
  const old: DemoElements = {
    ...el,
    aAu: el.aAu * (1 + normal(random, 0, 2e-7)),
    e: Math.max(0, el.e + normal(random, 0, 2e-6)),
    iDeg: el.iDeg + normal(random, 0, 2e-5),
    meanAnomalyDeg: el.meanAnomalyDeg + meanMotionDegPerDay(el.aAu) * dt,
  };
  roundAsteroidElements(old);
  const d = jdToCalendar(DUPLICATE_EPOCH_JD_TT);
  const epochText = `${d.year}-${String(d.month).padStart(2, '0')}-${String(Math.floor(d.day)).padStart(2, '0')} TT`;
  return { el: old, epochJdTT: DUPLICATE_EPOCH_JD_TT, epochText };
}
