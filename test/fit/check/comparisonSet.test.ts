// The comparison set and its statistics (src/fit/check/comparisonSet.ts) on invented residuals
// (synthetic): χ² of a 2-D residual against the closed-form inverse of its 2 × 2 covariance
// (common practice), RMS by hand.
import { describe, expect, it } from 'vitest';
import {
  comparisonSetSource, indicesOutside, keepsExactly, setStatistics,
} from '../../../src/fit/check/comparisonSet.js';
import type { ObservationSigma } from '../../../src/fit/observationWeights.js';
import type { OrbitFit } from '../../../src/fit/orbitFitTypes.js';

function fakeFit(residuals: [number, number][], status: ('kept' | 'rejected')[]): OrbitFit {
  return {
    rejected: status.filter((s) => s === 'rejected').length,
    observations: residuals.map(([ra, dec], i) => ({
      status: status[i], residualRaCosDecArcsec: ra, residualDecArcsec: dec, sigmaRaCosDecArcsec: 1, sigmaDecArcsec: 1, chi2: NaN,
    })),
  } as unknown as OrbitFit;
}

function sigma(sa: number, sd: number, correlation = 0): ObservationSigma {
  return { sigmaRaCosDecArcsec: sa, sigmaDecArcsec: sd, correlation, source: 'default', nightCount: 1, nightFactor: 1 };
}

describe('comparison set', () => {
  it('is the kept set of the fit with the fewest rejections; ties go to fewer parameters', () => {
    const a = fakeFit([[0, 0], [0, 0], [0, 0]], ['kept', 'rejected', 'rejected']);
    const b = fakeFit([[0, 0], [0, 0], [0, 0]], ['kept', 'kept', 'rejected']);
    const c = fakeFit([[0, 0], [0, 0], [0, 0]], ['rejected', 'kept', 'kept']);
    expect(comparisonSetSource([{ fit: a, nParams: 6 }, { fit: b, nParams: 7 }, { fit: c, nParams: 8 }])).toBe(1);
    expect(comparisonSetSource([{ fit: a, nParams: 6 }, { fit: c, nParams: 8 }, { fit: b, nParams: 7 }])).toBe(2);
    expect(keepsExactly(b, [true, true, false])).toBe(true);
    expect(keepsExactly(c, [true, true, false])).toBe(false);
  });

  it('leaves out, by index, exactly the observations outside the set', () => {
    expect(indicesOutside([true, false, true, false, false])).toEqual([1, 3, 4]);
    expect(indicesOutside([true, true])).toEqual([]);
  });

  it('sums χ², RMS and weighted RMS over the set alone, with the assumed σ and correlation', () => {
    const fit = fakeFit([[0.3, -0.4], [100, 100], [0.5, 0.1]], ['kept', 'kept', 'kept']);
    const sig = [sigma(0.5, 0.5, 0.6), sigma(1, 1), sigma(1, 2)];
    const st = setStatistics(fit, sig, [true, false, true]);
    // First: Γ = 0.25·[[1, 0.6], [0.6, 1]], Γ⁻¹ = 4/(1 − 0.36)·[[1, −0.6], [−0.6, 1]];
    // rᵀΓ⁻¹r = 6.25·(0.09 + 0.144 + 0.16) = 2.4625. Third: 0.25 + 0.0025 = 0.2525.
    expect(st.chi2).toBeCloseTo(2.4625 + 0.2525, 12);
    expect(st.nResiduals).toBe(4);
    expect(st.kept).toBe(2);
    expect(st.rmsArcsec).toBeCloseTo(Math.sqrt((0.09 + 0.16 + 0.25 + 0.01) / 4), 12);
    // weights 4, 4, 1, 0.25: (4·0.09 + 4·0.16 + 0.25 + 0.25·0.01) / 9.25
    expect(st.weightedRmsArcsec).toBeCloseTo(Math.sqrt((0.36 + 0.64 + 0.25 + 0.0025) / 9.25), 12);
  });
});
