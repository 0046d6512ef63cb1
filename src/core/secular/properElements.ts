/**
 * Proper elements of one body as a result object, with the flag `proper-unreliable` and
 * each reason's id and text when the theory breaks (reliability.ts). For catalogues use
 * properElementsColumns.ts; this form is for single bodies and reports.
 */
import { PLANETS, type PlanetName } from '../constants.js';
import { MAIN_BELT_RESONANCES } from './meanMotionResonances.js';
import { newProperScratch, properElementsKernel } from './properElementsKernel.js';
import { BIT_MEAN_MOTION_RESONANCE, BIT_NOT_COMPUTED, BIT_SECULAR_RESONANCE, PROPER_UNRELIABLE_FLAG, RELIABILITY_REASONS, SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR, type ReliabilityReasonId } from './reliability.js';
import type { SecularModel } from './types.js';

export interface ProperElementsResult {
  aAu: number; // proper a = osculating a (linear theory)
  e: number; // proper (free) eccentricity; NaN when not computed
  sinI: number; // proper (free) sin i
  gArcsecPerYear: number; // free precession rate of ϖ (A)
  sArcsecPerYear: number; // free regression rate of Ω (B)
  eForced: number; // |(h_0, k_0)| at the epoch
  sinIForced: number; // |(p_0, q_0)| at the epoch
  reliabilityCode: number; // bits of reliability.ts; 0 = none found
  flag: '' | typeof PROPER_UNRELIABLE_FLAG;
  reasons: { id: ReliabilityReasonId; text: string }[];
}

/** Conventional number of a mode (1 Mercury … 8 Neptune, common practice): the planet's place among the eight. */
function modeNumber(model: SecularModel, mode: number): number {
  return PLANETS.indexOf(model.planets[mode]?.name as PlanetName) + 1 || mode + 1;
}

export function properElements(model: SecularModel, aAu: number, e: number, iRad: number, nodeRad: number, periRad: number): ProperElementsResult {
  const sc = newProperScratch(model);
  const code = properElementsKernel(model, sc, aAu, e, iRad, nodeRad, periRad);
  const s = sc.secular;
  const reasons = RELIABILITY_REASONS.flatMap((r, b) => {
    if (!(code & (1 << b))) return [];
    let text: string = r.text;
    if (1 << b === BIT_SECULAR_RESONANCE) {
      const parts: string[] = [];
      if (s.minDivisorG < SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR) {
        const k = modeNumber(model, s.modeG);
        parts.push(`ν${k}, |A − g${k}| = ${s.minDivisorG.toFixed(2)}″/yr`);
      }
      if (s.minDivisorS < SECULAR_DIVISOR_MIN_ARCSEC_PER_YEAR) {
        const k = modeNumber(model, s.modeS);
        parts.push(`ν1${k}, |B − s${k}| = ${s.minDivisorS.toFixed(2)}″/yr`);
      }
      text = `${text}: ${parts.join('; ')}`;
    }
    if (1 << b === BIT_MEAN_MOTION_RESONANCE && sc.mmr >= 0) {
      const res = MAIN_BELT_RESONANCES[sc.mmr];
      text = `${text}: ${res.label} at ${res.centreAu.toFixed(3)} ± ${res.halfWidthAu} au`;
    }
    return [{ id: r.id, text }];
  });
  return {
    aAu: code & BIT_NOT_COMPUTED ? NaN : aAu, e: sc.eProper, sinI: sc.sinIProper,
    gArcsecPerYear: s.gArcsecPerYear, sArcsecPerYear: s.sArcsecPerYear,
    eForced: Math.hypot(s.hForced, s.kForced), sinIForced: Math.hypot(s.pForced, s.qForced),
    reliabilityCode: code, flag: code ? PROPER_UNRELIABLE_FLAG : '', reasons,
  };
}
