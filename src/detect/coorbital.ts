/**
 * The co-orbital detector: bodies in 1:1 mean-motion resonance with a planet (Earth by
 * default, any of the eight on request). Three stages:
 *   1. screen (coorbitalZone.ts): bodies whose a lies in the planet's 1:1 zone, with δa/aP,
 *      φ = λ − λ_P and the orbit shape relative to the planet's plane at their own epoch;
 *   2. predict (core/coorbital, the averaged problem): the kind of trajectory through the
 *      body's (δa, φ) on the phase portrait at its e, i, ω — every screened body, spread
 *      over worker threads in fixed chunks with results in entry order;
 *   3. confirm (core/coorbital, N-body over the epoch ± windowYears with the eight planets
 *      and the Sun's 1PN term): φ(t) segmented into states, closest approach, temporary
 *      capture — for the bodies predicted resonant (scan) or every screened body
 *      (`wayward coorbitals`), within the budget (coorbitalOptions.ts), spread over worker
 *      threads with results in input order.
 * Bodies not confirmed say why (budget, orbit too poor to integrate, window outside the
 * ephemeris). Candidates: bodies whose state now is resonant (coorbitalCandidate.ts).
 * tailFraction: the fraction of the screened bodies scoring at least as high (a passing
 * body counts as scoring lowest). No null model: falseAlarmProb is NaN.
 */
import { PLANETS } from '../core/constants.js';
import { Vsop87Ephemeris } from '../core/ephemeris/vsop87Ephemeris.js';
import { memberUpperTailFraction } from './empiricalTail.js';
import { coorbitalCandidate, type CoorbitalBodyResult } from './coorbitalCandidate.js';
import { confirmEntries } from './coorbitalConfirm.js';
import { predictEntries } from './coorbitalPredict.js';
import { COORBITAL_NOT_SCREENED, defaultZoneHalfWidth, screenCoorbitalZone, type ZoneSkip } from './coorbitalZone.js';
import type { Candidate, Detector, DetectorResult } from './types.js';
import type { Catalogue } from '../clean/types.js';
import type { CoorbitalOptions } from './coorbitalOptions.js';

/** Every screened body's result, in screening order (the `coorbitals` command writes them all). */
export async function analyseCoorbitals(cat: Catalogue, opts: CoorbitalOptions): Promise<{
  results: CoorbitalBodyResult[]; notScreened: Record<string, number>; skipped: ZoneSkip[];
}> {
  const planets = opts.planets.length > 0 ? opts.planets : PLANETS;
  const widths = planets.map((p) => opts.zoneHalfWidth ?? defaultZoneHalfWidth(p));
  const { entries, notScreened, skipped } = screenCoorbitalZone(cat, planets, widths, new Vsop87Ephemeris());
  const predictions = await predictEntries(entries, opts.threads);
  const results = await confirmEntries(cat, entries, predictions, opts);
  return { results, notScreened, skipped };
}

/** Candidates of the resonant bodies, with tail fractions over every screened body. */
export function coorbitalCandidates(cat: Catalogue, results: readonly CoorbitalBodyResult[]): Candidate[] {
  const provisional = results.map((r) => coorbitalCandidate(cat, r, NaN, 0));
  const scores = new Float64Array(results.length);
  provisional.forEach((c, k) => (scores[k] = c ? c.score : -Infinity));
  const sorted = Float64Array.from(scores).sort();
  const out: Candidate[] = [];
  for (const c of provisional) {
    if (!c) continue;
    out.push({ ...c, tailFraction: memberUpperTailFraction(sorted, c.score), tailPopulation: results.length });
  }
  return out;
}

export const coorbitalDetector: Detector = {
  id: 'coorbital',
  description: '1:1 mean-motion resonance with a planet: quasi-satellites, tadpole (Trojan) and horseshoe orbiters, compound orbits',
  scoreMeaning: 'libration cycles the body stays in its present resonant state within the N-body window, minus one (≤ 0: a transient, a window shorter than one libration period, or not confirmed)',
  tailMeaning: "bodies screened in the planets' 1:1 zones scoring at least as high, the body itself included",
  falseAlarmModel: null,
  notScreenedReasons: COORBITAL_NOT_SCREENED,
  async run(cat, all, ctx): Promise<DetectorResult> {
    ctx?.progress?.start('coorbital');
    const { results, notScreened } = await analyseCoorbitals(cat, all.coorbital);
    ctx?.progress?.end();
    return { candidates: coorbitalCandidates(cat, results), screened: results.length, notScreened };
  },
};
