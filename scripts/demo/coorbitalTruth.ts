/**
 * The truth of a planted co-orbital is what the dynamics does, judged by the detector's own
 * stages on the written (rounded) elements, exactly as `wayward scan` / `wayward coorbitals`
 * run them on the catalogue line:
 *  - the screen (src/detect/coorbitalZone.ts screenCoorbitalZone) gives x = δa/a_P, φ = λ − λ_P
 *    and the shape, with the planet's osculating orbit from the VSOP87B ephemeris at the epoch;
 *  - the prediction (src/detect/coorbitalPredict.ts predictEntries, the averaged problem);
 *  - the N-body confirmation (src/core/coorbital/confirm.ts via confirmTask, the detector's
 *    default window of ±500 years, eight planets and the Sun's 1PN term), with the planets
 *    filled as src/detect/coorbitalConfirm.ts fills them (the epoch ± window ± 2 days at
 *    DYNAMICS_FIT_TOLERANCE_AU), so the history is the detector's to the last bit.
 * The catalogue conversions are the builder's (degrees × RAD_PER_DEG) and the screen's
 * (TT → TDB at the epoch); the state is from the elements with GM_sun as in coorbitalConfirm.ts.
 */
import { DAYS_PER_JULIAN_YEAR, GM_SUN_AU3_PER_DAY2, RAD_PER_DEG } from '../../src/core/constants.js';
import type { CoorbitalHistory, CoorbitalPrediction } from '../../src/core/coorbital/types.js';
import { createEphemeris } from '../../src/core/ephemeris/ephemeris.js';
import { PLANET_SYSTEM_BODIES } from '../../src/core/ephemeris/ephemerisBody.js';
import type { EphemerisCache } from '../../src/core/ephemeris/ephemerisCache.js';
import { DYNAMICS_FIT_TOLERANCE_AU } from '../../src/core/ephemeris/ephemerisCacheOptions.js';
import { prefillParallel } from '../../src/core/ephemeris/ephemerisParallelFill.js';
import { Vsop87Ephemeris } from '../../src/core/ephemeris/vsop87Ephemeris.js';
import { semimajorElementsToState } from '../../src/core/orbit/twoBody.js';
import type { Catalogue } from '../../src/clean/types.js';
import { COORBITAL_DEFAULTS } from '../../src/detect/coorbitalOptions.js';
import { predictEntries } from '../../src/detect/coorbitalPredict.js';
import { confirmTask } from '../../src/detect/coorbitalWorker.js';
import { defaultZoneHalfWidth, screenCoorbitalZone, type ZoneEntry } from '../../src/detect/coorbitalZone.js';
import type { ScenarioPlanet } from './planets.js';
import { DEMO_EPOCH_JD_TT } from './scenario.js';
import type { DemoElements } from './types.js';

/** What the detector's stages say about one planted body. */
export interface CoorbitalJudgement {
  entry: ZoneEntry | null; // null: not in the planet's 1:1 zone
  prediction: CoorbitalPrediction | null;
  history: CoorbitalHistory | null; // null when not integrated
}

/** A one-row catalogue of the written elements, converted as the catalogue builder does. */
function oneRowCatalogue(el: DemoElements): Catalogue {
  const one = (x: number): Float64Array => Float64Array.of(x);
  return {
    size: 1, designation: ['planted'], epochJdTT: one(DEMO_EPOCH_JD_TT), a: one(el.aAu), e: one(el.e),
    i: one(el.iDeg * RAD_PER_DEG), node: one(el.nodeDeg * RAD_PER_DEG), peri: one(el.periDeg * RAD_PER_DEG),
    meanAnomaly: one(el.meanAnomalyDeg * RAD_PER_DEG),
  } as unknown as Catalogue; // the screen reads only these columns
}

/** Judges planted bodies; fills the planets over the window once, on first use. */
export class CoorbitalJudge {
  readonly windowYears = COORBITAL_DEFAULTS.windowYears;
  private planets: EphemerisCache | null = null;
  private readonly vsop = new Vsop87Ephemeris();

  /** The screen's entry of the written elements for `planet`, or null outside its zone. */
  screen(el: DemoElements, planet: ScenarioPlanet): ZoneEntry | null {
    const { entries } = screenCoorbitalZone(oneRowCatalogue(el), [planet], [defaultZoneHalfWidth(planet)], this.vsop);
    return entries[0] ?? null;
  }

  private async filled(epochJdTDB: number): Promise<EphemerisCache> {
    if (!this.planets) {
      const w = this.windowYears * DAYS_PER_JULIAN_YEAR;
      const start = epochJdTDB - w - 2, end = epochJdTDB + w + 2;
      this.planets = createEphemeris({ startJdTDB: start, endJdTDB: end, fitToleranceAu: DYNAMICS_FIT_TOLERANCE_AU });
      await prefillParallel(this.planets, start, end, PLANET_SYSTEM_BODIES, 1);
    }
    return this.planets;
  }

  /**
   * Screen, predict and (when `integrate`, and `worthIntegrating` of the prediction when given)
   * confirm by N-body one body's written elements.
   */
  async judge(
    el: DemoElements, planet: ScenarioPlanet, integrate: boolean, worthIntegrating?: (p: CoorbitalPrediction) => boolean,
  ): Promise<CoorbitalJudgement> {
    const entry = this.screen(el, planet);
    if (!entry) return { entry: null, prediction: null, history: null };
    const [prediction] = await predictEntries([entry], 1);
    if (!integrate || (worthIntegrating && !worthIntegrating(prediction))) return { entry, prediction, history: null };
    const state = new Float64Array(6);
    semimajorElementsToState(el.aAu, el.e, el.iDeg * RAD_PER_DEG, el.nodeDeg * RAD_PER_DEG, el.periDeg * RAD_PER_DEG,
      el.meanAnomalyDeg * RAD_PER_DEG, GM_SUN_AU3_PER_DAY2, state);
    const task = { state: Array.from(state), epochJdTDB: entry.epochJdTDB, planet, windowYears: this.windowYears, series: false };
    return { entry, prediction, history: confirmTask(task, await this.filled(entry.epochJdTDB)) };
  }
}
