/**
 * The contracts of the Gauss–Radau integrator (gaussRadau.ts): the system it integrates,
 * its options and its error.
 */

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
