/**
 * The co-orbital plants of the demo, drawn from their own seeded stream (so redraws do not
 * move the rest of the catalogue) and judged by the detector's own stages (coorbitalTruth.ts):
 * every kind asked for below is kept only when the N-body integration gives it at the epoch
 * (and, for a resonant kind, the prediction is not 'passing', since `scan` integrates only
 * the bodies predicted resonant); otherwise it is drawn again. A temporary capture must have
 * a capture episode in the window and be resonant now (so it is a candidate and carries the
 * flag). With `integrate` off (fast tests) the first draw inside the zone is kept and nothing
 * is claimed about its dynamics. A compound orbit is rare among draws: a draw for it is
 * integrated only when the prediction calls it compound too (a cheap first sieve; about a
 * third of those come out compound from the N-body run, which decides).
 */
import type { CoorbitalDraw } from './plantedCoorbitals.js';
import { drawCoorbital } from './plantedCoorbitals.js';
import { CoorbitalJudge, type CoorbitalJudgement } from './coorbitalTruth.js';
import { roundAsteroidElements } from './orbitRows.js';
import type { PlanetOrbits, ScenarioPlanet } from './planets.js';
import type { Random } from './random.js';
import { sampleUntilAsync } from './sampleUntil.js';
import type { DemoElements } from './types.js';
import { emptyElements } from './types.js';

/**
 * Bodies planted per planet and kind, in drawing order (Jupiter: a Trojan group at L4 and L5).
 * No passing control for Neptune: in its zone (|x| ≤ 0.023) the synodic period
 * P_N/(1.5|x|) is at least ~4 800 years, so no body there circulates once in ±500 years and
 * the segmentation (a full turn of φ) cannot call it passing.
 */
export const COORBITAL_PLAN: readonly (readonly [ScenarioPlanet, CoorbitalDraw, number])[] = [
  ['earth', 'quasi-satellite', 3], ['earth', 'horseshoe', 3], ['earth', 'tadpole-L4', 3], ['earth', 'tadpole-L5', 3],
  ['earth', 'compound', 1], ['earth', 'temporary-capture', 1], ['earth', 'passing', 2],
  ['mars', 'tadpole-L5', 2], ['mars', 'tadpole-L4', 1], ['mars', 'passing', 1],
  ['jupiter', 'tadpole-L4', 7], ['jupiter', 'tadpole-L5', 7], ['jupiter', 'passing', 2],
  ['neptune', 'tadpole-L4', 2], ['neptune', 'tadpole-L5', 1],
];

/** Most draws per planted body before the generator gives up (each costs one N-body run). */
export const MAX_COORBITAL_DRAWS = 300;

/** One planted co-orbital (or control) with what the detector's stages say of it. */
export interface CoorbitalPlant {
  planet: ScenarioPlanet;
  plantedAs: CoorbitalDraw;
  el: DemoElements; // rounded as written
  judgement: CoorbitalJudgement;
  draws: number; // draws made for this body (1 = the first was kept)
}

/** Whether a judged draw is what it was drawn for (file comment). */
function fits(kind: CoorbitalDraw, j: CoorbitalJudgement, integrate: boolean): boolean {
  if (!j.entry || !j.prediction) return false;
  const h = j.history;
  if (!integrate) return true;
  if (!h) return false; // sieved out before integration
  if (kind === 'passing') return h.stateAtEpoch === 'passing';
  if (j.prediction.state === 'passing' || h.stateAtEpoch === 'passing') return false;
  if (kind === 'temporary-capture') return h.captures.length > 0;
  return h.stateAtEpoch === kind;
}

/** Draws and judges every plant of COORBITAL_PLAN, in its order. */
export async function planCoorbitals(random: Random, orbits: PlanetOrbits, integrate: boolean): Promise<CoorbitalPlant[]> {
  const judge = new CoorbitalJudge();
  const out: CoorbitalPlant[] = [];
  for (const [planet, kind, count] of COORBITAL_PLAN) {
    for (let n = 0; n < count; n++) {
      const el = emptyElements();
      let judgement: CoorbitalJudgement = { entry: null, prediction: null, history: null };
      const draws = await sampleUntilAsync(`${planet} ${kind}`, MAX_COORBITAL_DRAWS, () => {
        drawCoorbital(random, orbits, planet, kind, el);
        roundAsteroidElements(el);
      }, async () => {
        judgement = await judge.judge(el, planet, integrate, kind === 'compound' ? (p) => p.state === 'compound' : undefined);
        return fits(kind, judgement, integrate);
      }, el);
      out.push({ planet, plantedAs: kind, el, judgement, draws });
    }
  }
  return out;
}
