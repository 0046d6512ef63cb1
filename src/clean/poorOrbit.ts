/**
 * Which quality flags say that an orbit is poorly determined, so that any position predicted
 * from it carries a large uncertainty the flags alone do not size: a single opposition, a
 * short arc, few observations, a poor uncertainty parameter, an epoch far from the last
 * observation (common practice: each is a usual reason to distrust an extrapolation).
 * 'hyperbolic' and 'duplicate-kept' describe the orbit or the input, not its quality;
 * 'no-quality-info' says that quality cannot be judged (see qualityUnknown).
 */
import { qualityBit, qualityNames, type QualityFlag } from './types.js';

const POOR_ORBIT_MASK =
  qualityBit('single-opposition') | qualityBit('short-arc') | qualityBit('few-observations')
  | qualityBit('poor-uncertainty') | qualityBit('epoch-far-from-last-obs');

/** The flags of `word` that mark a poorly determined orbit, in QUALITY_FLAGS order. */
export function poorOrbitFlags(word: number): QualityFlag[] {
  return qualityNames(word & POOR_ORBIT_MASK);
}

/** Whether the input gave nothing to judge the orbit's quality by. */
export function qualityUnknown(word: number): boolean {
  return (word & qualityBit('no-quality-info')) !== 0;
}
