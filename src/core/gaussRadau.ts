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
 *
 * Works forward and backward (negative steps). Components [0, errorDim) drive the step-size
 * control; any further components (variational vectors) ride along on the same steps.
 */
import { B_TO_G, G_TO_B, RADAU_INV_DIFF, RADAU_SPACINGS } from './gaussRadauSpacings.js';

/** A second-order system: `accel` writes F(t, x, v) into `out` (all of length `dim`). */
export interface SecondOrderSystem {
  readonly dim: number;
  /** Components [0, errorDim) drive the step-size control (the physical bodies). */
  readonly errorDim: number;
  accel(tJd: number, x: Float64Array, v: Float64Array, out: Float64Array): void;
}

export interface GaussRadauOptions {
  /** ε of Rein & Spiegel 2015 eq. 11 (dimensionless). Default 1e-9. */
  epsilon?: number;
  /** First trial step, days (sign ignored). Default 1 day; the control adapts it at once. */
  initialStepDays?: number;
  /** A step shorter than this (days) is a failure. Default 1e-9 days (86 µs). */
  minStepDays?: number;
  /** Upper bound on a step, days. Default Infinity. */
  maxStepDays?: number;
  /** Accepted-step limit per call of integrateTo. Default 10 000 000. */
  maxSteps?: number;
  /**
   * Step-size criterion. 'b6-ratio': Rein & Spiegel 2015 eqs. 10–11 (b̃6 = max|b6|/max|F|).
   * 'derivatives' (default): Pham, Rein & Spiegel 2024, from F and its first two derivatives.
   * Why the default is not the 2015 rule: b6 is a seventh divided difference of the forces
   * and carries their noise. Planet positions are asked for at a Julian date held in one
   * double (resolution 4.7e-10 day near JD 2.5e6), so near a planet the forces jitter by
   * ~1e-12 of their size; b6 then sits on a floor that does not shrink with the step, b̃6
   * stays above ε, and the 2015 rule drives the step to zero in a smooth stretch of orbit
   * (seen at 0.28 au from Jupiter in the restricted three-body test). The low-order b's the
   * 2024 rule uses are far above that noise.
   */
  stepControl?: 'b6-ratio' | 'derivatives';
}

/** The integration could not go on; carries the time and step reached. */
export class IntegrationError extends Error {
  readonly jdTDB: number;
  readonly stepDays: number;
  constructor(reason: string, jdTDB: number, stepDays: number) {
    super(`${reason} at JD ${jdTDB.toFixed(6)} step ${stepDays.toExponential(3)} days`);
    this.name = 'IntegrationError';
    this.jdTDB = jdTDB;
    this.stepDays = stepDays;
  }
}

const SAFETY = 0.25; // Rein & Spiegel 2015 sec. 2.4
const PC_TOLERANCE = 1e-16; // Rein & Spiegel 2015 sec. 2.5
const PC_MAX_ITERATIONS = 12; // Rein & Spiegel 2015 sec. 2.5
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
    this.evalPolynomial(this.denseH(tJd), dt, this.prevX, this.prevV, this.prevA, this.prevB, outX, outV, 0, 0);
  }

  /** As denseState, writing x then v (2·dim numbers) to out[offset..]. */
  denseStateInto(tJd: number, out: Float64Array, offset: number): void {
    const dt = this.prevDt;
    this.evalPolynomial(this.denseH(tJd), dt, this.prevX, this.prevV, this.prevA, this.prevB, out, out, offset, offset + this.dim);
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

  private evalPolynomial(h: number, dt: number, x0: Float64Array, v0: Float64Array, a0: Float64Array,
    b: Float64Array, outX: Float64Array, outV: Float64Array, ox: number, ov: number): void {
    const n = this.dim;
    const hdt = h * dt;
    const h2dt2 = hdt * hdt;
    for (let i = 0; i < n; i++) {
      const b0 = b[i], b1 = b[n + i], b2 = b[2 * n + i], b3 = b[3 * n + i];
      const b4 = b[4 * n + i], b5 = b[5 * n + i], b6 = b[6 * n + i];
      // x(h) = x0 + h dt v0 + (h dt)^2 [a0/2 + b0 h/6 + b1 h^2/12 + … + b6 h^7/72]
      const px = ((((((b6 * (1 / 72) * h + b5 * (1 / 56)) * h + b4 * (1 / 42)) * h + b3 * (1 / 30)) * h
        + b2 * (1 / 20)) * h + b1 * (1 / 12)) * h + b0 * (1 / 6)) * h + a0[i] * 0.5;
      // v(h) = v0 + h dt [a0 + b0 h/2 + b1 h^2/3 + … + b6 h^7/8]
      const pv = ((((((b6 * 0.125 * h + b5 * (1 / 7)) * h + b4 * (1 / 6)) * h + b3 * 0.2) * h
        + b2 * 0.25) * h + b1 * (1 / 3)) * h + b0 * 0.5) * h + a0[i];
      outX[ox + i] = x0[i] + (hdt * v0[i] + h2dt2 * px);
      outV[ov + i] = v0[i] + hdt * pv;
    }
  }

  /** Predict b for a step of `dt` from the last accepted step (Everhart 1985 eq. 13). */
  private predict(dt: number): void {
    const n = this.dim;
    const b = this.b, e = this.e, bd = this.bDone, ed = this.eDone, g = this.g;
    const q = this.dtDone === 0 ? 0 : dt / this.dtDone;
    if (this.dtDone === 0 || Math.abs(q) > 20) {
      // First step, or a prediction too far out to trust: start from zero.
      b.fill(0);
      e.fill(0);
      g.fill(0);
      return;
    }
    const q2 = q * q, q3 = q2 * q, q4 = q3 * q, q5 = q4 * q, q6 = q5 * q, q7 = q6 * q;
    for (let i = 0; i < n; i++) {
      const b0 = bd[i], b1 = bd[n + i], b2 = bd[2 * n + i], b3 = bd[3 * n + i];
      const b4 = bd[4 * n + i], b5 = bd[5 * n + i], b6 = bd[6 * n + i];
      // F(1 + q h') re-expanded in h': binomial coefficients C(m+1, j+1).
      const e0 = q * (b6 * 7 + b5 * 6 + b4 * 5 + b3 * 4 + b2 * 3 + b1 * 2 + b0);
      const e1 = q2 * (b6 * 21 + b5 * 15 + b4 * 10 + b3 * 6 + b2 * 3 + b1);
      const e2 = q3 * (b6 * 35 + b5 * 20 + b4 * 10 + b3 * 4 + b2);
      const e3 = q4 * (b6 * 35 + b5 * 15 + b4 * 5 + b3);
      const e4 = q5 * (b6 * 21 + b5 * 6 + b4);
      const e5 = q6 * (b6 * 7 + b5);
      const e6 = q7 * b6;
      b[i] = e0 + (b0 - ed[i]);
      b[n + i] = e1 + (b1 - ed[n + i]);
      b[2 * n + i] = e2 + (b2 - ed[2 * n + i]);
      b[3 * n + i] = e3 + (b3 - ed[3 * n + i]);
      b[4 * n + i] = e4 + (b4 - ed[4 * n + i]);
      b[5 * n + i] = e5 + (b5 - ed[5 * n + i]);
      b[6 * n + i] = e6 + (b6 - ed[6 * n + i]);
      e[i] = e0; e[n + i] = e1; e[2 * n + i] = e2; e[3 * n + i] = e3;
      e[4 * n + i] = e4; e[5 * n + i] = e5; e[6 * n + i] = e6;
      // g from b (Everhart eq. 8).
      for (let k = 0; k < 7; k++) {
        let s = 0;
        for (let m = k; m < 7; m++) s += B_TO_G[7 * m + k] * b[m * n + i];
        g[k * n + i] = s;
      }
    }
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
      let dtNew = this.stepControl === 'b6-ratio' ? this.nextStepB6(dt) : this.nextStepDerivatives(dt);
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
    const xs = this.xs, vs = this.vs, at = this.at;
    let pcErrorLast = Infinity;
    for (let iter = 0; iter < PC_MAX_ITERATIONS; iter++) {
      for (let s = 1; s < 8; s++) {
        const h = RADAU_SPACINGS[s];
        this.evalPolynomial(h, dt, x, v, a0, b, xs, vs, 0, 0);
        this.system.accel(t0 + (tc + h * dt), xs, vs, at);
        this.forceEvaluations++;
        this.updateCoefficients(s, at, a0, g, b, n);
      }
      const pcError = Math.max(ratio(this.lastDeltaB6, maxAbs(at, 0, ne)),
        ratio(this.lastDeltaB6Var, maxAbs(at, ne, n)));
      if (!(pcError >= 0)) {
        throw new IntegrationError('non-finite acceleration in Gauss–Radau substeps', t0 + tc, dt);
      }
      if (pcError < PC_TOLERANCE) return true;
      if (iter > 2 && pcError >= pcErrorLast) return true;
      pcErrorLast = pcError;
    }
    return false;
  }

  /**
   * Rein & Spiegel 2015: b̃6 = max|b6| / max|F| over the controlled components (eq. 10),
   * dt' = dt (ε / b̃6)^(1/7) (eq. 11).
   */
  private nextStepB6(dt: number): number {
    const n = this.dim, b = this.b, at = this.at;
    let maxB6 = 0;
    let maxA = 0;
    for (let i = 0; i < this.errorDim; i++) {
      const bb = Math.abs(b[6 * n + i]);
      const aa = Math.abs(at[i]);
      if (bb > maxB6 || bb !== bb) maxB6 = bb;
      if (aa > maxA || aa !== aa) maxA = aa;
    }
    const errB6 = maxB6 === 0 ? 0 : maxB6 / maxA;
    return errB6 > 0 ? dt * Math.pow(this.epsilon / errB6, 1 / 7) : dt / SAFETY;
  }

  /**
   * Pham, Rein & Spiegel 2024 (Open J. Astrophys. 7, "Re-evaluating the timestep criterion of
   * IAS15", eqs. 11–13 (numbers from memory)): a timescale per body from the acceleration and
   * its first two time derivatives at the end of the step, all from the low-order b's,
   *   τ² = 2 |y⁽²⁾|² / (|y⁽³⁾|² + |y⁽²⁾| |y⁽⁴⁾|),   dt' = (7! ε)^(1/7) min τ.
   * For a circular orbit τ = 1/n, so ε = 1e-9 gives ~36 steps per orbit like eq. 11 of 2015.
   */
  private nextStepDerivatives(dt: number): number {
    const n = this.dim, b = this.b, a0 = this.a0;
    const group = this.errorDim % 3 === 0 ? 3 : 1;
    let minTau2 = Infinity;
    for (let k = 0; k < this.errorDim; k += group) {
      let y2 = 0, y3 = 0, y4 = 0;
      for (let i = k; i < k + group; i++) {
        const b0 = b[i], b1 = b[n + i], b2 = b[2 * n + i], b3 = b[3 * n + i];
        const b4 = b[4 * n + i], b5 = b[5 * n + i], b6 = b[6 * n + i];
        const f = a0[i] + b0 + b1 + b2 + b3 + b4 + b5 + b6; // F(h = 1)
        const d1 = b0 + 2 * b1 + 3 * b2 + 4 * b3 + 5 * b4 + 6 * b5 + 7 * b6; // dt · dF/dt
        const d2 = 2 * b1 + 6 * b2 + 12 * b3 + 20 * b4 + 30 * b5 + 42 * b6; // dt² · d²F/dt²
        y2 += f * f;
        y3 += d1 * d1;
        y4 += d2 * d2;
      }
      const tau2 = (2 * y2) / (y3 + Math.sqrt(y4 * y2)); // in units of dt²
      // Bodies with no usable timescale (0/0, or no force variation) do not vote; non-finite
      // forces were already caught by the corrector.
      if (tau2 > 0 && tau2 < minTau2) minTau2 = tau2;
    }
    if (minTau2 === Infinity) return dt / SAFETY;
    return Math.sqrt(minTau2) * dt * this.stepFactor;
  }

  private lastDeltaB6 = 0;
  private lastDeltaB6Var = 0;

  /** Divided-difference update of g at substep s and the matching change of b (Everhart eq. 7). */
  private updateCoefficients(s: number, at: Float64Array, a0: Float64Array, g: Float64Array,
    b: Float64Array, n: number): void {
    const k = s - 1; // g index being refined
    const base = 7 * s;
    let maxDelta = 0;
    let maxDeltaVar = 0;
    const ne = this.errorDim;
    for (let i = 0; i < n; i++) {
      // g_k = F[h0, h1, …, h_s] by the divided-difference recursion.
      let tmp = (at[i] - a0[i]) * RADAU_INV_DIFF[base];
      for (let j = 1; j < s; j++) tmp = (tmp - g[(j - 1) * n + i]) * RADAU_INV_DIFF[base + j];
      const idx = k * n + i;
      const delta = tmp - g[idx];
      g[idx] = tmp;
      for (let m = 0; m <= k; m++) b[m * n + i] += G_TO_B[7 * k + m] * delta;
      if (s === 7) {
        const ad = Math.abs(delta);
        if (i < ne) {
          if (ad > maxDelta || ad !== ad) maxDelta = ad;
        } else if (ad > maxDeltaVar || ad !== ad) maxDeltaVar = ad;
      }
    }
    if (s === 7) {
      this.lastDeltaB6 = maxDelta;
      this.lastDeltaB6Var = maxDeltaVar;
    }
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
