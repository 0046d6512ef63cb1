/**
 * The observations every model is compared on. Models compared by Δχ² must be fitted to the
 * same residuals (compareModels refuses otherwise), but each model's own fit rejects its own
 * outliers: a gravity-only fit of a body pushed by radiation pressure rejects the places the
 * push moved, the right model keeps them. Rule: the comparison set is the kept set of the fit
 * that rejected the fewest observations (ties: fewer parameters, then the order fitted): the
 * model that explains the most observations says which ones are outliers. Every other model is
 * refitted to that set.
 *
 * A refit leaves the other observations out by excluding them (fitOrbit's `exclude`): they
 * take no part in it and cannot be recovered, and their residuals are still computed and
 * reported; χ² and the RMS are summed over the set alone (setStatistics).
 */
import type { ObservationSigma } from '../observationWeights.js';
import type { OrbitFit } from '../orbitFitTypes.js';

export const COMPARISON_SET_RULE =
  'every model fitted to the observations kept by the fit that rejected the fewest (ties: fewer parameters), the others left out';

/** Index of the fit defining the set among `fits` (see the file comment). */
export function comparisonSetSource(fits: readonly { fit: OrbitFit; nParams: number }[]): number {
  if (fits.length === 0) throw new RangeError('comparisonSetSource: no fits');
  let best = 0;
  fits.forEach((f, k) => {
    const b = fits[best];
    if (f.fit.rejected < b.fit.rejected || (f.fit.rejected === b.fit.rejected && f.nParams < b.nParams)) best = k;
  });
  return best;
}

/** True per observation when `fit` kept it. */
export function keptMask(fit: OrbitFit): boolean[] {
  return fit.observations.map((o) => o.status === 'kept');
}

/** Whether `fit` kept exactly the observations of `mask`. */
export function keepsExactly(fit: OrbitFit, mask: readonly boolean[]): boolean {
  return fit.observations.every((o, i) => (o.status === 'kept') === mask[i]);
}

/** Indices of the observations outside `mask`: fitOrbit's `exclude` for a refit on the set. */
export function indicesOutside(mask: readonly boolean[]): number[] {
  const out: number[] = [];
  mask.forEach((inSet, i) => { if (!inSet) out.push(i); });
  return out;
}

export interface SetStatistics {
  chi2: number;
  nResiduals: number;
  kept: number;
  rmsArcsec: number;
  weightedRmsArcsec: number;
}

/**
 * χ² = Σ rᵀ Γ⁻¹ r over the set, Γ = [[σα², ρσασδ], [ρσασδ, σδ²]] from the assumed σ; unweighted RMS √(Σ (rα² + rδ²) / 2n); weighted RMS √(Σ w r² / Σ w), w = 1/σ²
 * per coordinate (as fitOrbit's weightedRmsArcsec).
 */
export function setStatistics(fit: OrbitFit, sigmas: readonly ObservationSigma[], mask: readonly boolean[]): SetStatistics {
  let chi2 = 0, sum2 = 0, w = 0, wsum2 = 0, n = 0;
  fit.observations.forEach((o, i) => {
    if (!mask[i]) return;
    const { sigmaRaCosDecArcsec: sa, sigmaDecArcsec: sd, correlation: rho } = sigmas[i];
    const ra = o.residualRaCosDecArcsec, dec = o.residualDecArcsec;
    const det = sa * sa * sd * sd * (1 - rho * rho);
    chi2 += (sd * sd * ra * ra - 2 * rho * sa * sd * ra * dec + sa * sa * dec * dec) / det;
    sum2 += ra * ra + dec * dec;
    w += 1 / (sa * sa) + 1 / (sd * sd);
    wsum2 += (ra * ra) / (sa * sa) + (dec * dec) / (sd * sd);
    n++;
  });
  return { chi2, nResiduals: 2 * n, kept: n, rmsArcsec: Math.sqrt(sum2 / (2 * n)), weightedRmsArcsec: Math.sqrt(wsum2 / w) };
}
