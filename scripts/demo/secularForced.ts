/**
 * The planets' secular field at the demo epoch, as the families stage sees it: the same
 * eight-planet model (src/core/secular planetarySecularModel, built for the osculation epoch
 * JD TT taken as TDB, as src/detect/familiesScreen.ts does) and the same per-body kernel
 * (properElementsKernel: the particle table's interpolated coefficients). The demo reads from
 * it the forced vectors at a semimajor axis (to turn planted proper elements into osculating
 * ones) and the proper elements and reliability code of written elements (to know which
 * drawn bodies the stage will trust).
 */
import { RAD_PER_DEG } from '../../src/core/constants.js';
import { planetarySecularModel } from '../../src/core/secular/planetarySecularModel.js';
import { newProperScratch, properElementsKernel, type ProperScratch } from '../../src/core/secular/properElementsKernel.js';
import type { SecularModel } from '../../src/core/secular/types.js';
import { DEMO_EPOCH_JD_TT } from './scenario.js';
import type { DemoElements } from './types.js';

/** Forced vectors at one a: h₀ = e_f sin ϖ_f, k₀ = e_f cos ϖ_f, p₀ = sin i_f sin Ω_f, q₀ = sin i_f cos Ω_f. */
export interface ForcedVectors { h: number; k: number; p: number; q: number }

/** Proper elements of written elements as the stage computes them, with its reliability code (0 = trusted). */
export interface StageProper { aAu: number; e: number; sinI: number; code: number }

export class DemoSecularField {
  readonly model: SecularModel;
  private readonly sc: ProperScratch;

  constructor(epochJdTT: number = DEMO_EPOCH_JD_TT) {
    this.model = planetarySecularModel(epochJdTT);
    this.sc = newProperScratch(this.model);
  }

  /** Forced vectors at aAu into `out` (NaN where the theory is not evaluated: a within 2 % of a planet's). */
  forcedAt(aAu: number, out: ForcedVectors): ForcedVectors {
    properElementsKernel(this.model, this.sc, aAu, 0, 0, 0, 0);
    const s = this.sc.secular;
    out.h = s.hForced; out.k = s.kForced; out.p = s.pForced; out.q = s.qForced;
    return out;
  }

  /** The stage's proper elements and reliability code of elements as written (degrees). */
  properOf(el: DemoElements, out: StageProper): StageProper {
    out.code = properElementsKernel(
      this.model, this.sc, el.aAu, el.e, el.iDeg * RAD_PER_DEG, el.nodeDeg * RAD_PER_DEG, el.periDeg * RAD_PER_DEG,
    );
    out.aAu = el.aAu; out.e = this.sc.eProper; out.sinI = this.sc.sinIProper;
    return out;
  }
}
