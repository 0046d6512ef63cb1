/**
 * Types of the observation model: where an observer was, a body's heliocentric motion as the
 * model asks for it, and the computed astrometric place. Frames: the core's dynamics frame is
 * the heliocentric J2000 ecliptic (src/core/types.ts); the observation model answers in the
 * ICRF equatorial frame (`Icrf` in a name). Lengths au, velocities au/day, times JD.
 * Missing-value policy as in src/core: a number the input does not give is NaN.
 */

/**
 * The body's heliocentric state at `jdTDB` in the J2000 ecliptic (au, au/day), written to
 * out[0..5]. Two-body (universal.ts) or N-body propagation (src/core/propagate) plug in here.
 */
export type BodyStateEclipticFn = (jdTDB: number, out: Float64Array) => void;

/** Where the observer was, as far as the model needs it. */
export type ObserverPlace =
  /** A fixed site: east longitude and parallax constants in Earth equatorial radii (6378.1366 km). */
  | { kind: 'site'; longitudeDegE: number; rhoCosPhiPrime: number; rhoSinPhiPrime: number }
  /** A site given by geodetic coordinates on the WGS84 ellipsoid (altitude NaN: taken as 0 m). */
  | { kind: 'geodetic'; longitudeDegE: number; latitudeDeg: number; altitudeM: number }
  /** A space-based observer: geocentre → observer, ICRF equatorial, km (no velocity given). */
  | { kind: 'space'; geocentricKm: readonly [number, number, number] };

/** Heliocentric observer state, ICRF equatorial. */
export interface ObserverState {
  positionIcrfAu: Float64Array; // x, y, z, au
  velocityIcrfAuPerDay: Float64Array; // vx, vy, vz, au/day; NaN for a space-based observer (the record gives no velocity)
  jdTDB: number; // the instant of the observation in TDB
}

/** The computed astrometric place of a body seen from one observer. */
export interface AstrometricPlace {
  raRad: number; // right ascension in [0, 2π), ICRF
  decRad: number; // declination, ICRF
  distanceAu: number; // observer → body at the emission instant, au
  lightTimeDays: number; // τ = distanceAu / c
  emitJdTDB: number; // observation instant − τ, TDB
  iterations: number; // light-time iterations used
  /** The body's heliocentric state at emitJdTDB, J2000 ecliptic (au, au/day). */
  bodyStateEcliptic: Float64Array;
  /**
   * ∂(α cos δ, δ)/∂r (rad/au) with r the body's heliocentric J2000-ecliptic position at the
   * emission instant, the light-time's own dependence on r included: row-major 2×3,
   * [∂(α cos δ)/∂x, …/∂y, …/∂z, ∂δ/∂x, ∂δ/∂y, ∂δ/∂z].
   */
  partialsEcliptic: Float64Array;
}
