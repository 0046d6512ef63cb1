// Kepler's equation (elliptic, hyperbolic), Barker's equation and the Stumpff functions.
// Outside checks: Meeus, Astronomical Algorithms, 2nd ed. (1998), examples 30.a, 30.b, 34.a
// (printed values, from memory of the book); the rest are the equations' own identities
// (common practice: the residual of the solved equation).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { KeplerConvergenceError, solveBarker, solveKeplerElliptic, solveKeplerHyperbolic } from '../../src/core/orbit/kepler.js';
import { nextKeplerGuess, solveKeplerEllipticNear, solveKeplerEllipticNearInto } from '../../src/core/orbit/keplerNear.js';
import {
  eccentricFromTrue, hyperbolicFromTrue, meanAnomalyFromPerihelionTime, meanFromEccentric, meanFromHyperbolic,
  meanFromTrue, meanMotionRadPerDay, perihelionTimeFromMeanAnomaly, perihelionTimeOffsetDays,
  trueAnomalyFromPerihelionTime, trueFromEccentric, trueFromHyperbolic, trueFromMean,
} from '../../src/core/orbit/anomaly.js';
import { GAUSS_K } from '../../src/core/constants.js';
import { stumpffInto } from '../../src/core/orbit/stumpff.js';
import { wrapPi } from '../../src/core/math.js';
import { all, create } from 'mathjs';

const DEG = Math.PI / 180;
const ARCSEC = DEG / 3600;

describe('elliptic Kepler equation', () => {
  it('Meeus example 30.a: e = 0.1, M = 5° → E = 5.554589°', () => {
    expect(Math.abs(solveKeplerElliptic(5 * DEG, 0.1) / DEG - 5.554589)).toBeLessThan(5e-7);
  });

  it('Meeus example 30.b: e = 0.99, M = 2° → E = 32.361007° (where plain iteration fails)', () => {
    expect(Math.abs(solveKeplerElliptic(2 * DEG, 0.99) / DEG - 32.361007)).toBeLessThan(5e-7);
  });

  it('residual below 2e-15 rad for every e in [0, 1) and any M (property)', () => {
    let worst = 0;
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: 0, max: 0.999999999, noNaN: true }), fc.constantFrom(0, 0.5, 0.9, 0.99999, 1 - 1e-12)),
        fc.oneof(fc.double({ min: -1000, max: 1000, noNaN: true }), fc.double({ min: -1e-6, max: 1e-6, noNaN: true })),
        (e, m) => {
          const E = solveKeplerElliptic(m, e);
          // Same revolution as M: |E − M| ≤ e.
          expect(Math.abs(E - m)).toBeLessThanOrEqual(e + 1e-12);
          const res = Math.abs(wrapPi(meanFromEccentric(E, e) - m));
          worst = Math.max(worst, res);
          expect(res).toBeLessThan(2e-15 + 4e-16 * Math.abs(m));
        },
      ),
      { numRuns: 5000, seed: 42 },
    );
    console.log(`elliptic Kepler residual: worst ${(worst / ARCSEC).toExponential(2)}″`);
  });

  it('keeps relative precision for e = 0.99999 and tiny M', () => {
    for (const m of [1e-3, 1e-8, 1e-10, 1e-15, 1e-200]) {
      const E = solveKeplerElliptic(m, 0.99999);
      // Relative residual: the equation is evaluated as (1 − e)E + e(E − sin E).
      expect(Math.abs(meanFromEccentric(E, 0.99999) - m) / m, `M=${m}`).toBeLessThan(1e-14);
    }
    expect(solveKeplerElliptic(1e-10, 0)).toBe(1e-10); // e = 0: E = M exactly
    expect(solveKeplerElliptic(-3, 0)).toBe(-3);
  });

  it('fails loudly with its state when the iteration limit is too low', () => {
    let err: unknown;
    try {
      solveKeplerElliptic(2 * DEG, 0.99, 1);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(KeplerConvergenceError);
    expect((err as Error).message).toMatch(
      /^Kepler's equation \(elliptic\) did not converge: e=0\.99, M=0\.0349\d+ rad, last value=[-\d.e]+, last step=[-\d.e]+ after 1 iterations$/,
    );
  });

  it('refuses bad input with RangeError', () => {
    expect(() => solveKeplerElliptic(1, 1)).toThrow(RangeError);
    expect(() => solveKeplerElliptic(1, -0.1)).toThrow(/eccentricity -0.1 outside/);
    expect(() => solveKeplerElliptic(NaN, 0.1)).toThrow(RangeError);
    expect(() => solveKeplerHyperbolic(1, 0.5)).toThrow(RangeError);
  });
});

describe('elliptic Kepler equation from a nearby start (sweeps)', () => {
  it('a sweep of 720 mean anomalies over two turns, each from the previous root, agrees with the bracketed solver to 1e-14 rad, its sine and cosine too', () => {
    for (const e of [0, 0.05, 0.3, 0.6, 0.8, 0.9, 0.99]) { // 0.9 and 0.99: above NEAR_MAX_ECCENTRICITY, the fallback
      const h = (4 * Math.PI) / 720;
      const m0 = -2.5;
      const out = Float64Array.of(solveKeplerElliptic(m0, e), NaN, NaN);
      out[2] = Math.cos(out[0]);
      let worst = 0;
      for (let k = 1; k < 720; k++) {
        const m = m0 + k * h;
        solveKeplerEllipticNearInto(m, e, nextKeplerGuess(out[0], out[2], e, h), out);
        const ecc = out[0];
        worst = Math.max(worst, Math.abs(ecc - solveKeplerElliptic(m, e)), Math.abs(ecc - e * Math.sin(ecc) - m)); // residual: common practice
        worst = Math.max(worst, Math.abs(out[1] - Math.sin(ecc)), Math.abs(out[2] - Math.cos(ecc)));
        expect(solveKeplerEllipticNear(m, e, ecc + 1e-3)).toBeCloseTo(ecc, 14);
      }
      expect(worst, `e = ${e}`).toBeLessThan(1e-14); // measured ≤ 9e-16
    }
  });

  it('Meeus example 30.a from a poor start: e = 0.1, M = 5° → E = 5.554589° (Meeus 1998, from memory)', () => {
    expect(Math.abs(solveKeplerEllipticNear(5 * DEG, 0.1, 0) / DEG - 5.554589)).toBeLessThan(5e-7);
    expect(Math.abs(solveKeplerEllipticNear(5 * DEG, 0.1, NaN) / DEG - 5.554589)).toBeLessThan(5e-7); // no start: the bracketed solver
  });
});

describe('hyperbolic Kepler equation', () => {
  it('relative residual at rounding level (8ε(2+|H|)) for e in (1, 5], |M| up to 1e6 (property)', () => {
    let worst = 0;
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: 1 + 1e-9, max: 5, noNaN: true }), fc.constantFrom(1 + 1e-12, 1.0001, 5)),
        fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: -1e-6, max: 1e-6, noNaN: true })),
        (e, m) => {
          const H = solveKeplerHyperbolic(m, e);
          const res = Math.abs(meanFromHyperbolic(H, e) - m) / Math.max(Math.abs(m), 1e-300);
          worst = Math.max(worst, res);
          // Rounding bound: an ulp of H moves e sinh H by a relative ε·H, and evaluating
          // sinh and the residual adds a few ε: 8ε(2 + |H|).
          expect(res).toBeLessThan(8 * 2.3e-16 * (2 + Math.abs(H)));
        },
      ),
      { numRuns: 5000, seed: 43 },
    );
    console.log(`hyperbolic Kepler relative residual: worst ${worst.toExponential(2)}`);
  });

  it('e = 5 and large M: H = asinh-like growth, residual at rounding level', () => {
    for (const m of [10, 1e3, 1e6, 1e12, 1e100]) {
      const H = solveKeplerHyperbolic(m, 5);
      // Same rounding bound as above; H ≈ 460 for M = 1e100.
      expect(Math.abs(meanFromHyperbolic(H, 5) - m) / m, `M=${m}`).toBeLessThan(8 * 2.3e-16 * (2 + H));
      expect(solveKeplerHyperbolic(-m, 5)).toBe(-H);
    }
  });

  it('fails loudly with its state when the iteration limit is too low', () => {
    expect(() => solveKeplerHyperbolic(1e6, 5, 1)).toThrow(
      /^Kepler's equation \(hyperbolic\) did not converge: e=5, M=1000000 rad, last value=.*after 1 iterations$/,
    );
  });
});

describe("Barker's equation (parabolic)", () => {
  it('Meeus example 34.a: q = 0.921326 au, t − T = 138.4783 d → ν = 102.74426°, r = 2.364192 au', () => {
    const nu = trueAnomalyFromPerihelionTime(138.4783, 0.921326, 1);
    const r = 0.921326 / Math.cos(nu / 2) ** 2;
    console.log(`Meeus 34.a: ν error ${((nu / DEG - 102.74426) * 3600).toFixed(3)}″, r error ${((r - 2.364192) * 1.496e8).toFixed(1)} km`);
    expect(Math.abs(nu / DEG - 102.74426)).toBeLessThan(5e-6);
    expect(Math.abs(r - 2.364192)).toBeLessThan(5e-7);
  });

  it('solves D + D³/3 = W to rounding for any W (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), (w) => {
        const d = solveBarker(w);
        // sinh(asinh(1.5W)/3) carries a relative rounding of ε·asinh(1.5|W|) (≤ 29ε here), tripled by D³.
        const tol = 4e-16 * (3 + 3 * Math.asinh(1.5 * Math.abs(w))) * Math.abs(w) + 1e-300;
        expect(Math.abs(d + (d * d * d) / 3 - w)).toBeLessThanOrEqual(tol);
      }),
      { numRuns: 3000, seed: 44 },
    );
  });
});

describe('anomaly conversions', () => {
  it('true ↔ eccentric ↔ mean round trips (elliptic and hyperbolic, property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.9999, noNaN: true }), fc.double({ min: -3.1, max: 3.1, noNaN: true }), (e, nu) => {
        expect(Math.abs(trueFromEccentric(eccentricFromTrue(nu, e), e) - nu)).toBeLessThan(1e-12);
        expect(Math.abs(trueFromMean(meanFromTrue(nu, e), e) - nu)).toBeLessThan(1e-9);
      }),
      { numRuns: 2000, seed: 45 },
    );
    fc.assert(
      fc.property(fc.double({ min: 1.0001, max: 5, noNaN: true }), fc.double({ min: -0.999, max: 0.999, noNaN: true }), (e, frac) => {
        const nu = frac * Math.acos(-1 / e); // inside the asymptotes
        expect(Math.abs(trueFromHyperbolic(hyperbolicFromTrue(nu, e), e) - nu)).toBeLessThan(1e-12);
      }),
      { numRuns: 2000, seed: 46 },
    );
  });

  it('refuses an eccentricity outside the conic with RangeError instead of returning NaN', () => {
    // Before the guards trueFromEccentric(1, 1.2) and eccentricFromTrue(1, 1.5) returned NaN
    // and trueFromEccentric(1, 1) a finite wrong angle.
    expect(() => trueFromEccentric(1, 1.2)).toThrow('trueFromEccentric: eccentricity 1.2 outside [0, 1)');
    expect(() => trueFromEccentric(1, 1)).toThrow(RangeError);
    expect(() => eccentricFromTrue(1, 1.5)).toThrow(RangeError);
    expect(() => eccentricFromTrue(1, -0.1)).toThrow(RangeError);
    expect(() => trueFromHyperbolic(1, 0.5)).toThrow('trueFromHyperbolic: eccentricity 0.5 outside (1, ∞)');
    expect(() => hyperbolicFromTrue(0.1, 0.5)).toThrow(/eccentricity 0.5 outside/);
    expect(() => meanFromTrue(0.1, NaN)).toThrow('meanFromTrue: e=NaN has no mean anomaly');
    expect(() => trueFromMean(0.1, 1)).toThrow(/use trueAnomalyFromPerihelionTime/);
  });

  it('perihelion time ↔ mean anomaly: n = k at a = 1 au, the Gaussian year of 365.2568983 d (IAU 1976; common practice)', () => {
    expect(meanMotionRadPerDay(1)).toBe(GAUSS_K);
    expect((2 * Math.PI) / meanMotionRadPerDay(1)).toBeCloseTo(365.2568983, 6);
    const epoch = 2_461_200.5;
    for (const a of [0.7, 2.77, 5.2, -1.5]) {
      const tp = perihelionTimeFromMeanAnomaly(1.234, epoch, a);
      expect(Math.abs(meanAnomalyFromPerihelionTime(tp, epoch, a) - 1.234)).toBeLessThan(1e-9);
      // Kepler's third law: (epoch − T) n = M.
      expect(Math.abs((epoch - tp) * Math.sqrt(GAUSS_K ** 2 / Math.abs(a) ** 3) - 1.234)).toBeLessThan(1e-9);
    }
  });

  it('time from perihelion ↔ true anomaly round trips for every conic (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.oneof(fc.double({ min: 0, max: 5, noNaN: true }), fc.constantFrom(0, 1, 0.99999, 1.00001)),
        fc.double({ min: -0.95, max: 0.95, noNaN: true }),
        (q, e, frac) => {
          const limit = e < 1 ? Math.PI : Math.acos(-1 / e);
          const nu = frac * limit;
          const dt = perihelionTimeOffsetDays(nu, q, e);
          expect(Math.abs(trueAnomalyFromPerihelionTime(dt, q, e) - nu)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 2000, seed: 47 },
    );
  });

  it('time from perihelion is continuous through e = 1 (elliptic, parabolic, hyperbolic)', () => {
    // Common practice: the conic formulas share the parabolic limit.
    for (const nu of [-2.5, -1, 0.3, 2]) {
      const tPar = perihelionTimeOffsetDays(nu, 1.2, 1);
      for (const de of [1e-6, 1e-9, 1e-12]) {
        expect(Math.abs(perihelionTimeOffsetDays(nu, 1.2, 1 - de) - tPar)).toBeLessThan(Math.abs(tPar) * 1e-4 * (de / 1e-6) + 1e-9);
        expect(Math.abs(perihelionTimeOffsetDays(nu, 1.2, 1 + de) - tPar)).toBeLessThan(Math.abs(tPar) * 1e-4 * (de / 1e-6) + 1e-9);
      }
    }
  });
});

describe('Stumpff functions (Danby 1988 §6.9)', () => {
  it('match the closed forms and the recurrence x c_{k+2} = 1/k! − c_k', () => {
    const c = new Float64Array(4);
    for (const x of [-50, -4, -1.0000001, -1, -0.3, -1e-9, 0, 1e-9, 0.3, 0.9999999, 1, 1.0000001, 4, 39]) {
      stumpffInto(x, c);
      const r = Math.sqrt(Math.abs(x));
      const c0 = x > 0 ? Math.cos(r) : Math.cosh(r);
      const c1 = x === 0 ? 1 : x > 0 ? Math.sin(r) / r : Math.sinh(r) / r;
      expect(Math.abs(c[0] - c0), `c0(${x})`).toBeLessThan(1e-15 * Math.max(1, Math.abs(c0)));
      expect(Math.abs(c[1] - c1), `c1(${x})`).toBeLessThan(1e-15 * Math.max(1, Math.abs(c1)));
      expect(Math.abs(x * c[2] - (1 - c[0]))).toBeLessThan(4e-16 * Math.max(1, Math.abs(c[0])));
      expect(Math.abs(x * c[3] - (1 - c[1]))).toBeLessThan(4e-16 * Math.max(1, Math.abs(c[1])));
    }
    stumpffInto(0, c);
    expect(Array.from(c)).toEqual([1, 1, 0.5, 1 / 6]);
  });

  it('c0..c3 agree with 64-digit values from mathjs BigNumber (general-purpose library), series and closed-form ranges', () => {
    // The identities above are tautologies inside stumpff.ts (c0 = 1 − x c2 is how c0 is
    // made for |x| ≤ 1), so c2 and c3 are checked here against an outside evaluation: the
    // closed forms in 64 significant digits, where the cancellation of 1 − cos costs nothing
    // for |x| ≥ 1e-30 (it costs 30 of the 64 digits there).
    const big = create(all, { number: 'BigNumber', precision: 64 });
    const c = new Float64Array(4);
    const scale = [1, 1, 0.5, 1 / 6]; // c_k(0) = 1/k!: the error scale where c2 or c3 pass through 0
    let worst = 0;
    fc.assert(
      fc.property(
        fc.oneof(
          fc.double({ min: -1.1, max: 1.1, noNaN: true }),
          fc.double({ min: -1000, max: -1, noNaN: true }),
          fc.double({ min: 1, max: 60, noNaN: true }), // beyond (2π)², the largest x the universal solver meets on an ellipse
          fc.constantFrom(-1, 1, 1e-9, -1e-9, 4 * Math.PI * Math.PI),
        ),
        (x) => {
          if (Math.abs(x) < 1e-30) return; // the 64-digit reference would cancel to nothing
          stumpffInto(x, c);
          const bx = big.bignumber(x);
          const r = big.sqrt(big.abs(bx));
          const c0 = x > 0 ? big.cos(r) : big.cosh(r);
          const c1 = x > 0 ? big.divide(big.sin(r), r) : big.divide(big.sinh(r), r);
          const ref = [c0, c1, big.divide(big.subtract(1, c0), bx), big.divide(big.subtract(1, c1), bx)].map(Number);
          for (let k = 0; k < 4; k++) {
            const err = Math.abs(c[k] - ref[k]) / Math.max(Math.abs(ref[k]), scale[k]) / Number.EPSILON;
            // 4ε(1 + √|x|): a few roundings, plus the relative error ε·√|x| that cos/cosh of √x
            // inherit from the rounding of their argument (conditioning, not the method).
            const bound = 4 * (1 + Math.sqrt(Math.abs(x)));
            worst = Math.max(worst, err / bound);
            expect(err, `c${k}(${x})`).toBeLessThan(bound);
          }
        },
      ),
      { numRuns: 800, seed: 48 },
    );
    console.log(`Stumpff vs 64-digit mathjs: worst error ${worst.toFixed(2)} of the 4ε(1+√|x|) bound`);
  });
});
