/**
 * The computed places of a trajectory at a set of observations, with the partials of
 * (α cos δ, δ) with respect to what the fit solves for: the rows of the design matrix.
 *
 * Light time: the emission instant t_e = t − τ depends on the trajectory itself. The
 * trajectory is sampled once, at a guessed emission instant t_g for each observation (the
 * caller's, e.g. the last iteration's, or from two-body motion of the state at the epoch:
 * universal.ts); the light-time equation is then solved on the sample's local expansion
 *   r(t) ≈ r_g + v_g (t − t_g) + ½ a_g (t − t_g)²,  a_g = −μ r_g / |r_g|³,
 * by computeAstrometricPlace (astrometricPlace.ts). |t_e − t_g| is the light-time error of
 * the guess (below 1e-3 day even for a two-body guess 0.1 au off), so what the expansion
 * leaves out (the planets' pull over that time and the third-order term) is below a metre.
 * The partials follow the same expansion to first order:
 *   ∂(α cos δ, δ)/∂p = P · (∂r_g/∂p + (t_e − t_g) ∂v_g/∂p),
 * P the 2×3 place partials of astrometricPlace.ts (light time included).
 */
import { GM_SUN_AU3_PER_DAY2 } from '../core/constants.js';
import { propagateTwoBody } from '../core/orbit/universal.js';
import { computeAstrometricPlace } from './astrometricPlace.js';
import { sampleTrajectory, type TrajectoryModel } from './trajectoryPartials.js';
import type { ObserverState } from './types.js';

/** Computed places and design rows, one pair of rows per observation. */
export interface PredictedPlaces {
  raRad: Float64Array;
  decRad: Float64Array;
  /** Emission instants (JD TDB): a good guess for the next call. */
  emitJdTDB: Float64Array;
  /** Columns of the design rows: 6 + the solve-for parameters. */
  columns: number;
  /** 2 × columns numbers per observation, row-major: ∂(α cos δ)/∂p then ∂δ/∂p, rad per unit of p. */
  design: Float64Array;
  /** Heliocentric ecliptic state at each emission instant, 6 per observation. */
  statesAtEmission: Float64Array;
  steps: number;
}

/** Emission instants from two-body motion of the epoch state (the first guess). */
export function twoBodyEmissionGuess(model: TrajectoryModel, observers: readonly ObserverState[]): Float64Array {
  const s0 = Float64Array.from(Array.from(model.state));
  const body = (jd: number, out: Float64Array) => propagateTwoBody(s0, jd - model.epochJdTDB, GM_SUN_AU3_PER_DAY2, out);
  return Float64Array.from(observers.map((o) => computeAstrometricPlace(body, o.positionIcrfAu, o.jdTDB).emitJdTDB));
}

/** Places and design rows of `model` at the observers (see the file comment). */
export function predictPlaces(model: TrajectoryModel, observers: readonly ObserverState[], emitGuessJdTDB?: ArrayLike<number>): PredictedPlaces {
  const n = observers.length;
  const guess = emitGuessJdTDB ?? twoBodyEmissionGuess(model, observers);
  if (guess.length !== n) throw new RangeError(`predictPlaces: ${guess.length} emission guesses for ${n} observations`);
  const traj = sampleTrajectory(model, guess);
  const m = traj.columns;
  const raRad = new Float64Array(n), decRad = new Float64Array(n), emit = new Float64Array(n);
  const design = new Float64Array(2 * m * n);
  const atEmission = new Float64Array(6 * n);
  const local = new Float64Array(6);
  for (let k = 0; k < n; k++) {
    const tg = guess[k];
    const s = traj.states.subarray(6 * k, 6 * k + 6);
    const r3 = Math.pow(s[0] * s[0] + s[1] * s[1] + s[2] * s[2], 1.5);
    const f = -GM_SUN_AU3_PER_DAY2 / r3;
    const body = (jd: number, out: Float64Array) => {
      const dt = jd - tg;
      for (let i = 0; i < 3; i++) {
        const a = f * s[i];
        out[i] = s[i] + s[3 + i] * dt + 0.5 * a * dt * dt;
        out[3 + i] = s[3 + i] + a * dt;
      }
    };
    const p = computeAstrometricPlace(body, observers[k].positionIcrfAu, observers[k].jdTDB);
    raRad[k] = p.raRad; decRad[k] = p.decRad; emit[k] = p.emitJdTDB;
    body(p.emitJdTDB, local);
    atEmission.set(local, 6 * k);
    const dt = p.emitJdTDB - tg;
    const part = traj.partials;
    const o = 6 * m * k;
    for (let row = 0; row < 2; row++) {
      for (let j = 0; j < m; j++) {
        let sum = 0;
        for (let i = 0; i < 3; i++) {
          sum += p.partialsEcliptic[3 * row + i] * (part[o + m * i + j] + dt * part[o + m * (i + 3) + j]);
        }
        design[2 * m * k + m * row + j] = sum;
      }
    }
  }
  return { raRad, decRad, emitJdTDB: emit, columns: m, design, statesAtEmission: atEmission, steps: traj.steps };
}
