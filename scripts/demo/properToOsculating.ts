/**
 * Osculating elements of a body planted in proper elements: the inverse of the families
 * stage's linear secular theory (src/core/secular/properElementsKernel.ts), plus a small
 * scatter standing in for the short-period terms.
 *
 * Linear theory (Murray & Dermott 1999, ch. 7; common practice for first-generation proper
 * elements): the osculating (h, k) = e (sin ϖ, cos ϖ) is the free vector, of length the
 * proper e at a phase that is the body's own, plus the forced vector (h₀, k₀) the planets
 * impose at its a; likewise (p, q) = sin i (sin Ω, cos Ω) with the proper sin i and (p₀, q₀).
 * The free phases are drawn uniform (our choice: nothing in a demo ties them together). The
 * forced vectors are taken at the osculating a, which is what the stage uses as proper a.
 *
 * Short-period scatter (our choice, see SHORT_PERIOD_MPS): normal deviates added to a, e and
 * sin i, each of the size a 6 m/s velocity difference has in the families metric (Zappalà et
 * al. 1990: d = n·a·√(5/4 (δa/a)² + 2 δe² + 2 δ(sin i)²)), about 10 m/s in all. Real
 * short-period terms are larger (osculating a swings by up to ~0.01 au in the outer belt,
 * e by ~0.01; from memory): this keeps the planted families' spread, which is tens of m/s,
 * the dominant one.
 */
import { DEG_PER_RAD } from '../../src/core/constants.js';
import { orbitalSpeedMPerS } from '../../src/detect/families/metricVelocity.js';
import type { Random } from './random.js';
import { normal, uniformAngleDeg } from './random.js';
import type { DemoSecularField, ForcedVectors } from './secularForced.js';
import type { DemoElements } from './types.js';

/** Short-period scatter per element, as a velocity in the families metric (m/s, our choice). */
export const SHORT_PERIOD_MPS = 6;

/** Planted proper elements of one body (the stage's proper a is its osculating a). */
export interface ProperPlant { aAu: number; e: number; sinI: number }

const forced: ForcedVectors = { h: NaN, k: NaN, p: NaN, q: NaN };

/**
 * Fills a, e, i, node, peri, mean anomaly of `out` (degrees) from planted proper elements.
 * Returns false when the forced vectors are not defined at that a (no elements written).
 */
export function properToOsculating(random: Random, field: DemoSecularField, proper: ProperPlant, out: DemoElements): boolean {
  const v = orbitalSpeedMPerS(proper.aAu);
  const a = proper.aAu * (1 + normal(random, 0, SHORT_PERIOD_MPS / (v * Math.sqrt(5 / 4))));
  field.forcedAt(a, forced);
  if (!Number.isFinite(forced.h + forced.p)) return false;
  const varpiFree = uniformAngleDeg(random) / DEG_PER_RAD;
  const nodeFree = uniformAngleDeg(random) / DEG_PER_RAD;
  const h = proper.e * Math.sin(varpiFree) + forced.h, k = proper.e * Math.cos(varpiFree) + forced.k;
  const p = proper.sinI * Math.sin(nodeFree) + forced.p, q = proper.sinI * Math.cos(nodeFree) + forced.q;
  const e = Math.abs(Math.hypot(h, k) + normal(random, 0, SHORT_PERIOD_MPS / (v * Math.SQRT2)));
  const sinI = Math.min(1, Math.abs(Math.hypot(p, q) + normal(random, 0, SHORT_PERIOD_MPS / (v * Math.SQRT2))));
  const varpi = Math.atan2(h, k), node = Math.atan2(p, q);
  out.aAu = a;
  out.e = e;
  out.iDeg = Math.asin(sinI) * DEG_PER_RAD;
  out.nodeDeg = ((node * DEG_PER_RAD) % 360 + 360) % 360;
  out.periDeg = (((varpi - node) * DEG_PER_RAD) % 360 + 360) % 360;
  out.meanAnomalyDeg = uniformAngleDeg(random);
  return true;
}
