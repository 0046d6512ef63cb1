/**
 * Bodies planted in the comet file: active bodies on main-belt-like orbits (asteroid-like
 * T_J ≥ 3.15 with a < 4.5 au; generated with T_J ≥ 3.17 as a rounding margin) and boundary
 * cases within 0.05 of 3 on the asteroid-like side (generated 3.005 ≤ T_J ≤ 3.045). The note
 * goes to truth.csv.
 */
import { perihelionTimeFromRandomPhase } from './cometPopulation.js';
import type { CometElements } from './orbitRows.js';
import { cometSemimajorAxisAu, emptyCometElements, roundCometElements } from './orbitRows.js';
import type { Random } from './random.js';
import { rayleigh, uniform, uniformAngleDeg } from './random.js';
import { tisserandJupiter } from './tisserand.js';

export const PLANTED_ASTEROID_LIKE_MIN_TJ = 3.17;
const MAX_TRIES = 100_000;

export interface PlantedComet {
  plantedClass: string;
  detector: string;
  c: CometElements; // rounded as written
  note: string;
}

function drawUntil(random: Random, label: string, aRange: readonly [number, number], eRange: readonly [number, number],
  iSigmaDeg: number, accept: (t: number, a: number) => boolean): CometElements {
  const c = emptyCometElements();
  for (let k = 0; k < MAX_TRIES; k++) {
    const a = uniform(random, aRange[0], aRange[1]);
    c.e = uniform(random, eRange[0], eRange[1]);
    c.qAu = a * (1 - c.e);
    c.iDeg = Math.min(rayleigh(random, iSigmaDeg), 25);
    c.nodeDeg = uniformAngleDeg(random);
    c.periDeg = uniformAngleDeg(random);
    c.tpJdTT = perihelionTimeFromRandomPhase(random, a);
    c.magnitudeM1 = uniform(random, 12, 17);
    c.slopeK1 = 4;
    roundCometElements(c);
    const aw = cometSemimajorAxisAu(c);
    if (accept(tisserandJupiter(aw, c.e, c.iDeg), aw)) return c;
  }
  throw new Error(`${label}: no acceptable draw in ${MAX_TRIES} tries; last q=${c.qAu} au, e=${c.e}, i=${c.iDeg}°`);
}

/** Ten main-belt-like active bodies and two boundary comets, in a fixed order. */
export function planCometPlants(random: Random): PlantedComet[] {
  const out: PlantedComet[] = [];
  for (let k = 0; k < 10; k++) {
    const c = drawUntil(random, 'asteroid-like comet', [2.55, 3.25], [0.05, 0.3], 6,
      (t, a) => t >= PLANTED_ASTEROID_LIKE_MIN_TJ && a < 4.5);
    out.push({ plantedClass: 'asteroid-like-T', detector: 'tisserand', c, note: 'active body on a main-belt-like orbit' });
  }
  for (let k = 0; k < 2; k++) {
    const c = drawUntil(random, 'boundary comet', [2.0, 3.6], [0.3, 0.85], 8,
      (t, a) => t >= 3.005 && t <= 3.045 && a < 4.5);
    out.push({ plantedClass: 'boundary', detector: 'tisserand', c, note: 'T_J just above 3 (within 0.05): boundary band, not an anomaly' });
  }
  return out;
}
