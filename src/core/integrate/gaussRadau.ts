/**
 * Adaptive 15th-order Gauss–Radau integrator for second-order systems x'' = F(t, x, x').
 *
 * Equation and section numbers below are from memory of the papers.
 * Method: Everhart 1985 (IAU Colloq. 83, pp. 185–202), implicit Runge–Kutta on Gauss–Radau
 * spacings with a predictor–corrector iterated to convergence, and the step-size control of
 * Rein & Spiegel 2015 (MNRAS 446, 1424; "IAS15") and its revision by Pham, Rein & Spiegel 2024:
 *  - predictor–corrector iterated until the change of b6 relative to the accelerations drops
 *    below 1e-16, or stops decreasing (Rein & Spiegel sec. 2.5);
 *  - error estimate  b̃6 = max|b6| / max|F|  over the controlled components (their eq. 10),
 *    new step  dt' = dt · (ε / b̃6)^(1/7)  with ε = 1e-9 by default (their eq. 11) — or, the
 *    default, the timescale criterion of Pham, Rein & Spiegel 2024 (see `stepControl`); a step
 *    is rejected and redone when dt' < dt/4 (2015 sec. 2.4, safety factor 0.25), and a step
 *    may grow at most 4× at a time;
 *  - the next step's b predicted from the last one (Everhart eq. 13, with the correction
 *    "b − e" of the previous prediction carried along);
 *  - compensated (Kahan) summation of positions, velocities and time (Rein & Spiegel sec. 3.4).
 * Dense output: the step's own position polynomial (Everhart eq. 9) is evaluated at any time
 * inside the last accepted step, so samples need no extra force evaluations.
 * The step's arithmetic is in gaussRadauPolynomial.ts, the step-size rules in
 * gaussRadauStepControl.ts, the options and error in gaussRadauTypes.ts.
 *
 * Works forward and backward (negative steps). Components [0, errorDim) drive the step-size
 * control; any further components (variational vectors) ride along on the same steps.
 */
import { RADAU_SPACINGS } from './gaussRadauSpacings.js';
import { evalRadauPolynomial, predictRadauB, updateRadauCoefficients } from './gaussRadauPolynomial.js';
import { STEP_SAFETY as SAFETY, stepFromB6Ratio, stepFromDerivatives } from './gaussRadauStepControl.js';
import { IntegrationError } from './gaussRadauTypes.js';
import type { GaussRadauOptions, SecondOrderSystem } from './gaussRadauTypes.js';

export { IntegrationError } from './gaussRadauTypes.js';
export type { GaussRadauOptions, SecondOrderSystem } from './gaussRadauTypes.js';

const PC_TOLERANCE = 1e-16; // Rein & Spiegel 2015 sec. 2.5
const PC_MAX_ITERATIONS = 12; // Rein & Spiegel 2015 sec. 2.5
// This project's guard, not from the papers: each rejection shrinks the step at least 4× (or
// halves it when the corrector did not settle), so 60 in a row mean the step is hopeless.
const MAX_REJECTIONS_IN_A_ROW = 60;

export class GaussRadauIntegrator {
  readonly dim: number;
  readonly errorDim: number;
  readonly epsilon: number;
  readonly stepControl: 'b6-ratio' | 'derivatives';
  private readonly stepFactor: number; // (7! ε)^(1/7)
  /** Current position/velocity (read them after integrateTo). */
  readonly x: Float64Array;
  readonly v: Float64Array;
  /** Counters since construction. */
  steps = 0;
  rejectedSteps = 0;
  forceEvaluations = 0;

  private readonly system: SecondOrderSystem;
  private t: number;
  private tComp = 0; // Kahan compensation of t
  private readonly xComp: Float64Array;
  private readonly vComp: Float64Array;
  private readonly a0: Float64Array;
  private readonly b: Float64Array; // 7 × dim, b[m * dim + i]
  private readonly g: Float64Array;
  private readonly e: Float64Array; // predicted b of the current step
  private readonly bDone: Float64Array; // b of the last accepted step
  private readonly eDone: Float64Array; // its prediction
  private readonly xs: Float64Array; // substep scratch
  private readonly vs: Float64Array;
  private readonly at: Float64Array;
  private readonly deltaB6 = new Float64Array(2); // max |Δb6| of the bodies, of the variations
  // The last accepted step, for dense output.
  private readonly prevX: Float64Array;
  private readonly prevV: Float64Array;
  private readonly prevA: Float64Array;
  private readonly prevB: Float64Array;
  private prevT = NaN;
  private prevDt = 0;
  private dtDone = 0;
  private dtNext: number;
  private readonly minStep: number;
  private readonly maxStep: number;
  private readonly maxSteps: number;

  constructor(system: SecondOrderSystem, t0Jd: number, x0: ArrayLike<number>, v0: ArrayLike<number>,
    options: GaussRadauOptions = {}) {
    const n = system.dim;
    if (!Number.isInteger(n) || n <= 0) throw new RangeError(`GaussRadau: bad dimension ${n}`);
    if (x0.length !== n || v0.length !== n) {
      throw new RangeError(`GaussRadau: state lengths ${x0.length}/${v0.length}, expected ${n}`);
    }
    if (!Number.isFinite(t0Jd)) throw new RangeError(`GaussRadau: non-finite start time ${t0Jd}`);
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(x0[i]) || !Number.isFinite(v0[i])) {
        throw new RangeError(`GaussRadau: non-finite initial state at component ${i}`);
      }
    }
    this.epsilon = options.epsilon ?? 1e-9;
    if (!(this.epsilon > 0)) throw new RangeError(`GaussRadau: epsilon must be > 0, got ${this.epsilon}`);
    this.stepControl = options.stepControl ?? 'derivatives';
    this.stepFactor = Math.pow(5040 * this.epsilon, 1 / 7);
    this.system = system;
    this.dim = n;
    this.errorDim = system.errorDim;
    this.t = t0Jd;
    this.x = Float64Array.from(x0);
    this.v = Float64Array.from(v0);
    this.xComp = new Float64Array(n);
    this.vComp = new Float64Array(n);
    this.a0 = new Float64Array(n);
    this.b = new Float64Array(7 * n);
    this.g = new Float64Array(7 * n);
    this.e = new Float64Array(7 * n);
    this.bDone = new Float64Array(7 * n);
    this.eDone = new Float64Array(7 * n);
    this.xs = new Float64Array(n);
    this.vs = new Float64Array(n);
    this.at = new Float64Array(n);
    this.prevX = new Float64Array(n);
    this.prevV = new Float64Array(n);
    this.prevA = new Float64Array(n);
    this.prevB = new Float64Array(7 * n);
    this.dtNext = Math.abs(options.initialStepDays ?? 1);
    this.minStep = options.minStepDays ?? 1e-9;
    this.maxStep = options.maxStepDays ?? Infinity;
    this.maxSteps = options.maxSteps ?? 10_000_000;
    if (!(this.dtNext > 0)) throw new RangeError(`GaussRadau: initial step must be > 0`);
  }

  /** Current time, JD (TDB). */
  get timeJd(): number {
    return this.t + this.tComp;
  }

  /**
   * Integrate to `tEndJd` (either direction), landing on it exactly. When `sampleTimesJd`
   * is given (sorted in the direction of integration, inside the span), the state at each
   * sample time is written to `sampleOut` (x then v, 2·dim numbers per sample) from the
   * Gauss–Radau polynomial of the step that contains it.
   */
  integrateTo(tEndJd: number, sampleTimesJd?: ArrayLike<number>, sampleOut?: Float64Array): void {
    if (!Number.isFinite(tEndJd)) throw new RangeError(`GaussRadau: non-finite end time ${tEndJd}`);
    const nSamples = sampleTimesJd ? sampleTimesJd.length : 0;
    if (nSamples > 0 && (!sampleOut || sampleOut.length < 2 * this.dim * nSamples)) {
      throw new RangeError(`GaussRadau: sample buffer needs ${2 * this.dim * nSamples} numbers`);
    }
    const n = this.dim;
    const tStart = this.timeJd;
    const dir = tEndJd >= tStart ? 1 : -1;
    let next = 0;
    // Samples at the start time take the current state.
    while (next < nSamples && dir * (sampleTimesJd![next] - tStart) <= 0) {
      if (sampleTimesJd![next] !== tStart) break;
      sampleOut!.set(this.x, 2 * n * next);
      sampleOut!.set(this.v, 2 * n * next + n);
      next++;
    }
    let count = 0;
    while (dir * (tEndJd - this.timeJd) > 0) {
      if (++count > this.maxSteps) {
        throw new IntegrationError(`integration exceeded ${this.maxSteps} steps`, this.timeJd, dir * this.dtNext);
      }
      if (this.dtNext < this.minStep) {
        throw new IntegrationError('integration could not meet tolerance', this.timeJd, dir * this.dtNext);
      }
      const remaining = tEndJd - this.timeJd;
      let dt = dir * Math.min(this.dtNext, this.maxStep);
      const last = Math.abs(dt) >= Math.abs(remaining);
      if (last) dt = remaining;
      const dtBefore = this.dtNext;
      const taken = this.step(dt);
      if (last && taken === dt) {
        // Land exactly on the requested end (the compensated sum may sit an ulp away), and
        // keep the step the control had reached: a clipped last step says nothing against it.
        this.t = tEndJd;
        this.tComp = 0;
        this.dtNext = Math.max(this.dtNext, dtBefore);
      }
      // Samples inside the step just taken, from its polynomial.
      while (next < nSamples && dir * (sampleTimesJd![next] - this.timeJd) <= 0) {
        const ts = sampleTimesJd![next];
        if (dir * (ts - this.prevT) < 0) {
          throw new RangeError(`GaussRadau: sample times must be sorted inside the span; got ${ts}`);
        }
        this.denseStateInto(ts, sampleOut!, 2 * n * next);
        next++;
      }
    }
    if (next < nSamples) {
      throw new RangeError(`GaussRadau: sample time ${sampleTimesJd![next]} outside [${tStart}, ${tEndJd}]`);
    }
  }

  /**
   * Position and velocity at `tJd` inside the last accepted step, from its Gauss–Radau
   * polynomial (Everhart 1985 eqs. 9–10).
   */
  denseState(tJd: number, outX: Float64Array, outV: Float64Array): void {
    const dt = this.prevDt;
    evalRadauPolynomial(this.denseH(tJd), dt, this.dim, this.prevX, this.prevV, this.prevA, this.prevB, outX, outV, 0, 0);
  }

  /** As denseState, writing x then v (2·dim numbers) to out[offset..]. */
  denseStateInto(tJd: number, out: Float64Array, offset: number): void {
    const dt = this.prevDt;
    evalRadauPolynomial(this.denseH(tJd), dt, this.dim, this.prevX, this.prevV, this.prevA, this.prevB, out, out, offset,
      offset + this.dim);
  }

  private denseH(tJd: number): number {
    const dt = this.prevDt;
    if (dt === 0) throw new RangeError('GaussRadau: no step taken yet');
    const h = (tJd - this.prevT) / dt;
    if (!(h >= -1e-12 && h <= 1 + 1e-12)) {
      throw new RangeError(`GaussRadau: time ${tJd} outside the last step [${this.prevT}, ${this.prevT + dt}]`);
    }
    return h;
  }

  /** Predict b for a step of `dt` from the last accepted step (Everhart 1985 eq. 13). */
  private predict(dt: number): void {
    const q = this.dtDone === 0 ? 0 : dt / this.dtDone;
    if (this.dtDone === 0 || Math.abs(q) > 20) {
      // First step, or a prediction too far out to trust (past 20 × the last step: this
      // project's own limit, not from the papers): start from zero.
      this.b.fill(0);
      this.e.fill(0);
      this.g.fill(0);
      return;
    }
    predictRadauB(q, this.dim, this.bDone, this.eDone, this.b, this.e, this.g);
  }

  /** One step attempt loop: repeats with smaller steps until one is accepted. */
  private step(dtWanted: number): number {
    let dt = dtWanted;
    let rejections = 0;
    const t0 = this.t;
    const tc = this.tComp;
    this.system.accel(t0 + tc, this.x, this.v, this.a0);
    this.forceEvaluations++;
    for (;;) {
      this.predict(dt);
      const converged = this.iterateCorrector(t0, tc, dt);
      let dtNew = this.stepControl === 'b6-ratio'
        ? stepFromB6Ratio(dt, this.dim, this.errorDim, this.b, this.at, this.epsilon)
        : stepFromDerivatives(dt, this.dim, this.errorDim, this.b, this.a0, this.stepFactor);
      if (!Number.isFinite(dtNew)) {
        throw new IntegrationError('non-finite error estimate in Gauss–Radau step', t0 + tc, dt);
      }
      if (Math.abs(dtNew) > Math.abs(dt) / SAFETY) dtNew = dt / SAFETY;
      if (converged && Math.abs(dtNew) >= SAFETY * Math.abs(dt)) {
        this.accept(dt, tc);
        this.dtNext = Math.abs(dtNew);
        return dt;
      }
      // Reject: redo with the smaller step (halve when the corrector did not converge).
      this.rejectedSteps++;
      if (++rejections > MAX_REJECTIONS_IN_A_ROW) {
        throw new IntegrationError(`integration could not meet tolerance after ${rejections} rejected steps`, t0 + tc, dt);
      }
      dt = converged ? dtNew : 0.5 * dt;
      if (Math.abs(dt) < this.minStep) {
        throw new IntegrationError('integration could not meet tolerance', t0 + tc, dt);
      }
    }
  }

  /**
   * Predictor–corrector sweeps over the seven substeps until |Δb6| / |F| at the last substep
   * is below 1e-16 or stops decreasing (Rein & Spiegel 2015 sec. 2.5), bodies and variational
   * components each against their own scale. Returns false when 12 sweeps did not settle.
   */
  private iterateCorrector(t0: number, tc: number, dt: number): boolean {
    const n = this.dim, ne = this.errorDim;
    const x = this.x, v = this.v, a0 = this.a0, b = this.b, g = this.g;
    const xs = this.xs, vs = this.vs, at = this.at, deltaB6 = this.deltaB6;
    let pcErrorLast = Infinity;
    for (let iter = 0; iter < PC_MAX_ITERATIONS; iter++) {
      for (let s = 1; s < 8; s++) {
        const h = RADAU_SPACINGS[s];
        evalRadauPolynomial(h, dt, n, x, v, a0, b, xs, vs, 0, 0);
        this.system.accel(t0 + (tc + h * dt), xs, vs, at);
        this.forceEvaluations++;
        updateRadauCoefficients(s, n, ne, at, a0, g, b, deltaB6);
      }
      const pcError = Math.max(ratio(deltaB6[0], maxAbs(at, 0, ne)), ratio(deltaB6[1], maxAbs(at, ne, n)));
      if (!(pcError >= 0)) {
        throw new IntegrationError('non-finite acceleration in Gauss–Radau substeps', t0 + tc, dt);
      }
      if (pcError < PC_TOLERANCE) return true;
      if (iter > 2 && pcError >= pcErrorLast) return true;
      pcErrorLast = pcError;
    }
    return false;
  }

  /** Advance the state over an accepted step with compensated sums (Rein & Spiegel sec. 3.4). */
  private accept(dt: number, tc: number): void {
    const n = this.dim;
    const x = this.x, v = this.v, b = this.b;
    this.prevX.set(x);
    this.prevV.set(v);
    this.prevA.set(this.a0);
    this.prevB.set(b);
    this.prevT = this.t + tc;
    this.prevDt = dt;
    const xc = this.xComp, vc = this.vComp, a0 = this.a0;
    const dt2 = dt * dt;
    for (let i = 0; i < n; i++) {
      const b0 = b[i], b1 = b[n + i], b2 = b[2 * n + i], b3 = b[3 * n + i];
      const b4 = b[4 * n + i], b5 = b[5 * n + i], b6 = b[6 * n + i];
      const dx = dt * v[i] + dt2 * (a0[i] * 0.5 + b0 / 6 + b1 / 12 + b2 / 20 + b3 / 30 + b4 / 42 + b5 / 56 + b6 / 72);
      const dv = dt * (a0[i] + b0 / 2 + b1 / 3 + b2 / 4 + b3 / 5 + b4 / 6 + b5 / 7 + b6 / 8);
      // Kahan: add increments to x, v keeping the lost low-order bits.
      let y = dx - xc[i];
      let s = x[i] + y;
      xc[i] = (s - x[i]) - y;
      x[i] = s;
      y = dv - vc[i];
      s = v[i] + y;
      vc[i] = (s - v[i]) - y;
      v[i] = s;
    }
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(x[i]) || !Number.isFinite(v[i])) {
        throw new IntegrationError(`non-finite state component ${i} after step`, this.prevT, dt);
      }
    }
    {
      // Time as t + tComp (Fast2Sum; |t| ≫ |dt| for Julian dates).
      const y = dt + tc;
      const s = this.t + y;
      this.tComp = y - (s - this.t);
      this.t = s;
    }
    this.bDone.set(b);
    this.eDone.set(this.e);
    this.dtDone = dt;
    this.steps++;
  }
}

function ratio(num: number, den: number): number {
  return num === 0 ? 0 : num / den;
}

function maxAbs(a: Float64Array, from: number, to: number): number {
  let m = 0;
  for (let i = from; i < to; i++) {
    const v = Math.abs(a[i]);
    if (v > m) m = v;
  }
  return m;
}
