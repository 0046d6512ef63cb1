/**
 * The runs test on the signs of residuals in time order (Wald & Wolfowitz 1940, Annals of
 * Mathematical Statistics 11, 147). A run is a maximal stretch of residuals of one sign. A
 * model that leaves a systematic signature behind gives long stretches of one sign: fewer runs
 * than independent errors would give.
 *
 * With n₁ positive and n₂ negative residuals (n = n₁ + n₂), under the null hypothesis that every
 * arrangement of the signs is equally likely, the number of runs R has
 *   E[R] = 1 + 2n₁n₂/n,   Var[R] = 2n₁n₂(2n₁n₂ − n) / (n²(n − 1))      (Wald & Wolfowitz 1940)
 * and z = (R − E[R]) / √Var[R] is close to normal for large n₁, n₂ (no continuity correction).
 * The exact distribution (Swed & Eisenhart 1943, Annals of Mathematical Statistics 14, 66):
 *   P(R = 2k)     = 2 C(n₁−1, k−1) C(n₂−1, k−1) / C(n, n₁)
 *   P(R = 2k + 1) = [C(n₁−1, k) C(n₂−1, k−1) + C(n₁−1, k−1) C(n₂−1, k)] / C(n, n₁)
 * gives the exact one-sided tail Pr(R ≤ r) for n ≤ EXACT_MAX_N.
 * Residuals exactly 0 have no sign: they are left out and counted (`zeros`).
 */
import { lnGamma } from './incompleteGamma.js';
import { normalSf, normalTwoSidedSf } from './tailFunctions.js';

/** Up to this many signs the exact lower tail is summed (terms via ln Γ, relative error ~1e-13). */
export const EXACT_MAX_N = 200;

export interface RunsTestResult {
  /** Residuals with a sign, and of each sign. */
  n: number;
  nPositive: number;
  nNegative: number;
  /** Residuals exactly 0 (left out). */
  zeros: number;
  runs: number;
  expectedRuns: number;
  sdRuns: number;
  /** (runs − expected)/sd; NaN when either sign is absent. */
  z: number;
  /** Normal approximation: Pr(Z ≤ z), the tail of too few runs. */
  pFewRunsNormal: number;
  /** Normal approximation: Pr(|Z| ≥ |z|). */
  pTwoSidedNormal: number;
  /** Exact Pr(R ≤ runs) for n ≤ EXACT_MAX_N, else NaN. */
  pFewRunsExact: number;
}

function lnChoose(n: number, k: number): number {
  if (k < 0 || k > n) return -Infinity;
  if (k === 0 || k === n) return 0;
  return lnGamma(n + 1) - lnGamma(k + 1) - lnGamma(n - k + 1);
}

/** Exact P(R = r) for n1 signs of one kind and n2 of the other (Swed & Eisenhart 1943). */
export function runsProbability(r: number, n1: number, n2: number): number {
  if (!Number.isInteger(n1) || !Number.isInteger(n2) || n1 < 1 || n2 < 1) throw new RangeError(`runsProbability: bad counts ${n1}, ${n2}`);
  if (!Number.isInteger(r) || r < 2 || r > n1 + n2) return 0;
  const lnAll = lnChoose(n1 + n2, n1);
  if (r % 2 === 0) {
    const k = r / 2;
    return 2 * Math.exp(lnChoose(n1 - 1, k - 1) + lnChoose(n2 - 1, k - 1) - lnAll);
  }
  const k = (r - 1) / 2;
  return Math.exp(lnChoose(n1 - 1, k) + lnChoose(n2 - 1, k - 1) - lnAll)
    + Math.exp(lnChoose(n1 - 1, k - 1) + lnChoose(n2 - 1, k) - lnAll);
}

/** The runs test on the signs of `residuals`, which must be in time order. */
export function runsTest(residuals: ArrayLike<number>): RunsTestResult {
  let n1 = 0, n2 = 0, zeros = 0, runs = 0, last = 0;
  for (let i = 0; i < residuals.length; i++) {
    const x = residuals[i];
    if (Number.isNaN(x)) throw new RangeError(`runsTest: residual ${i} is NaN`);
    if (x === 0) { zeros++; continue; }
    const s = x > 0 ? 1 : -1;
    if (s > 0) n1++; else n2++;
    if (s !== last) runs++;
    last = s;
  }
  const n = n1 + n2;
  const m = n1 * n2;
  const expectedRuns = n > 0 ? 1 + (2 * m) / n : NaN;
  const sdRuns = n > 1 ? Math.sqrt((2 * m * (2 * m - n)) / (n * n * (n - 1))) : NaN;
  const z = m > 0 && sdRuns > 0 ? (runs - expectedRuns) / sdRuns : NaN;
  let pFewRunsExact = NaN;
  if (m > 0 && n <= EXACT_MAX_N) {
    pFewRunsExact = 0;
    for (let r = 2; r <= runs; r++) pFewRunsExact += runsProbability(r, n1, n2);
    pFewRunsExact = Math.min(1, pFewRunsExact);
  }
  return {
    n, nPositive: n1, nNegative: n2, zeros, runs, expectedRuns, sdRuns, z,
    pFewRunsNormal: normalSf(-z),
    pTwoSidedNormal: normalTwoSidedSf(z),
    pFewRunsExact,
  };
}
