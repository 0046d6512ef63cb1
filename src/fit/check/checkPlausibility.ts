/**
 * Physical plausibility of the fitted non-gravitational parameters (src/fit/models/): the
 * thermal model's A2 as a mean semimajor-axis drift ⟨da/dt⟩ (transverseDrift.ts) judged
 * against the largest drift a natural body of this H can have (yarkovskyPlausibility.ts); the
 * srp model's C_R·A/m (C_R as the model catalogue assumes) judged against the natural range for
 * this H (radiationPressurePlausibility.ts). H unknown (NaN): "no size to judge it by".
 * The orbit (a, e) is the fitted model's own.
 */
import {
  areaToMassPlausibility, driftAuPerMyrFromA2, driftPlausibility, SRP_ASSUMED_CR,
} from '../models/index.js';
import type { CheckModelFit, CheckPlausibility } from './types.js';

/** Judges the thermal and srp fits among `fits` (either may be absent). */
export function judgePlausibility(fits: readonly CheckModelFit[], absMagH: number): CheckPlausibility {
  const thermal = fits.find((f) => f.id === 'thermal');
  const srp = fits.find((f) => f.id === 'srp');
  const out: CheckPlausibility = { thermal: null, srp: null };
  if (thermal) {
    const a2 = thermal.params[0];
    const aAu = thermal.fit.elements.elements[0], e = thermal.fit.elements.elements[1];
    if (aAu > 0 && e >= 0 && e < 1) {
      const drift = driftAuPerMyrFromA2(a2.value, aAu, e);
      out.thermal = {
        a2AuPerDay2: a2.value, driftAuPerMyr: drift, driftSigmaAuPerMyr: Math.abs(driftAuPerMyrFromA2(a2.sigma, aAu, e)),
        judgement: driftPlausibility({ driftAuPerMyr: drift, aAu, e, absMagH }),
      };
    }
  }
  if (srp) {
    const am = srp.params[0];
    out.srp = { areaToMassM2PerKg: am.value, sigmaM2PerKg: am.sigma, assumedCR: SRP_ASSUMED_CR, judgement: areaToMassPlausibility({ areaToMassM2PerKg: am.value, absMagH }) };
  }
  return out;
}
