/**
 * Natural comets of the demo: Jupiter-family, Halley-type and long-period comets, all with
 * comet-like T_J ≤ 2.95 (the honest-truth rule: only planted comets may look asteroidal).
 * Class boundaries follow Levison (1996) in T_J and the customary 20-year and 200-year
 * period limits (common practice); ranges and scales are from memory.
 */
import { DEMO_EPOCH_JD_TT } from './scenario.js';
import type { CometElements } from './orbitRows.js';
import { cometSemimajorAxisAu, roundCometElements } from './orbitRows.js';
import type { Random } from './random.js';
import { pickWeighted, rayleigh, uniform, uniformAngleDeg } from './random.js';
import { tisserandJupiter } from './tisserand.js';
import type { CometClass } from './types.js';

export const COMET_CLASSES: readonly CometClass[] = ['jupiter-family', 'halley-type', 'long-period'];
const COMET_CLASS_WEIGHTS = [0.55, 0.1, 0.35];

/** Natural comets must have T_J ≤ this (2.95 less a rounding margin). */
export const NATURAL_COMET_MAX_TJ = 2.945;
const MAX_TRIES = 10_000;
const DAYS_PER_YEAR = 365.25;

/** Isotropic inclination: cos i uniform in [−1, 1]. */
function isotropicInclinationDeg(random: Random): number {
  return (Math.acos(uniform(random, -1, 1)) * 180) / Math.PI;
}

/**
 * Perihelion time of an elliptic orbit with a uniform mean anomaly at the epoch, taking the
 * perihelion passage nearest the epoch (mean anomaly in [−180°, 180°)).
 */
export function perihelionTimeFromRandomPhase(random: Random, aAu: number): number {
  const periodDays = aAu ** 1.5 * DAYS_PER_YEAR; // Kepler's third law in years and au
  return DEMO_EPOCH_JD_TT + (random() - 0.5) * periodDays;
}

function sampleOnce(random: Random, cls: CometClass, out: CometElements): void {
  out.nodeDeg = uniformAngleDeg(random);
  out.periDeg = uniformAngleDeg(random);
  if (cls === 'jupiter-family') {
    out.qAu = uniform(random, 0.8, 4.5);
    out.e = uniform(random, 0.2, 0.75);
    out.iDeg = Math.min(rayleigh(random, 10), 40);
    out.tpJdTT = perihelionTimeFromRandomPhase(random, out.qAu / (1 - out.e));
  } else if (cls === 'halley-type') {
    const a = (uniform(random, 20, 200)) ** (2 / 3);
    out.qAu = uniform(random, 0.5, 3);
    out.e = 1 - out.qAu / a;
    out.iDeg = isotropicInclinationDeg(random);
    out.tpJdTT = perihelionTimeFromRandomPhase(random, a);
  } else {
    out.qAu = uniform(random, 0.3, 8);
    out.e = random() < 0.08 ? uniform(random, 1.0001, 1.003) : uniform(random, 0.985, 0.99999);
    out.iDeg = isotropicInclinationDeg(random);
    out.tpJdTT = DEMO_EPOCH_JD_TT + uniform(random, -730, 730);
  }
}

export function pickCometClass(random: Random): CometClass {
  return COMET_CLASSES[pickWeighted(random, COMET_CLASS_WEIGHTS)];
}

/** Elements of a natural comet, resampled until T_J ≤ 2.945 and, for JFCs, P < 20 yr. */
export function sampleNaturalComet(random: Random, cls: CometClass, out: CometElements): void {
  for (let k = 0; k < MAX_TRIES; k++) {
    sampleOnce(random, cls, out);
    out.magnitudeM1 = uniform(random, 5, 17);
    out.slopeK1 = random() < 0.7 ? 4 : 2;
    roundCometElements(out); // decide on the values as written
    const a = cometSemimajorAxisAu(out);
    const t = tisserandJupiter(a, out.e, out.iDeg);
    const periodOk = cls !== 'jupiter-family' || a ** 1.5 < 20;
    if (periodOk && t <= NATURAL_COMET_MAX_TJ && (cls !== 'jupiter-family' || t >= 2)) return;
  }
  throw new Error(`sampleNaturalComet: class ${cls} gave no orbit with T_J ≤ ${NATURAL_COMET_MAX_TJ} in ${MAX_TRIES} tries; ` +
    `last q=${out.qAu} au, e=${out.e}, i=${out.iDeg}°`);
}

/** Invented comet names (discoverer-style), used in turn. */
export const INVENTED_COMET_NAMES: readonly string[] = [
  'Larkspur', 'Hollowmere', 'Cinderfell', 'Marrowdene', 'Quillwater', 'Ashgrove',
  'Brindlecombe', 'Tarnwick', 'Sedgemoor Survey', 'Oakhallow', 'Ravelston', 'Fernreach',
];
