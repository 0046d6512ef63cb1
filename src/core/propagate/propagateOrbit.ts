/**
 * One body's orbit carried from its elements' epoch to another date: two-body motion about
 * the Sun (universal variables, universal.ts) or the Sun, the eight planet systems and,
 * optionally, the Sun's first post-Newtonian term (Gauss–Radau over the force model,
 * propagateTestBodies.ts) with planet positions from a Chebyshev cache over the direct
 * VSOP87B + ELP/MPP02 series. Returns the state, the osculating elements and, on request,
 * the heliocentric and geocentric distances at the target date.
 *
 * Frame and units: heliocentric J2000 ecliptic, au, au/day, angles in rad, dates JD TDB.
 */
import { GM_SUN_AU3_PER_DAY2, PLANETS } from '../constants.js';
import { createEphemeris } from '../ephemeris/ephemeris.js';
import { Vsop87Ephemeris } from '../ephemeris/vsop87Ephemeris.js';
import { propagateTwoBody } from '../orbit/universal.js';
import {
  perihelionElementsToState, semimajorElementsToState, stateToPerihelionElements, stateToSemimajorElements,
} from '../orbit/twoBody.js';
import { propagateTestBodies } from './propagateTestBodies.js';
import { Instant } from '../time/time.js';
import type { Ephemeris } from '../types.js';

/** Osculating heliocentric elements at `epochJdTDB`; angles in rad. */
export type OrbitElements =
  | { form: 'perihelion'; qAu: number; e: number; iRad: number; nodeRad: number; periRad: number; tpJdTDB: number; epochJdTDB: number }
  | { form: 'semimajor'; aAu: number; e: number; iRad: number; nodeRad: number; periRad: number; meanAnomalyRad: number; epochJdTDB: number };

export interface OrbitPropagationOptions {
  toJdTDB: number;
  /** Sun + eight planet systems integrated (true) or two-body about the Sun (false). */
  nbody: boolean;
  /** The Sun's 1PN term; read only with `nbody`. */
  relativity: boolean;
  /** Also the heliocentric and geocentric distances at `toJdTDB`. */
  distances: boolean;
  /**
   * Non-gravitational parameters A1, A2, A3 (au/day², radial, transverse, normal) under the
   * comet water-ice law (forces/nonGravLaw.ts); only with `nbody` (RangeError otherwise).
   * Absent or null: none.
   */
  nonGravAuPerDay2?: readonly [number, number, number] | null;
}

export interface OrbitPropagation {
  /** x, y, z (au), vx, vy, vz (au/day) at toJdTDB. */
  state: Float64Array;
  /** q (au), e, i, Ω, ω (rad), T (JD TDB) at toJdTDB (twoBody.ts layout). */
  perihelion: Float64Array;
  /** a (au) and M (rad) at toJdTDB; null for e ≥ 1. */
  semimajor: { aAu: number; meanAnomalyRad: number } | null;
  /** NaN unless `distances` was asked for. */
  heliocentricAu: number;
  geocentricAu: number;
  /** Accepted integrator steps; NaN for two-body motion. */
  steps: number;
}

/** First day of the Gregorian calendar, 1582 Oct 15 (JD at 0h); julian.ts counts earlier days in the Julian calendar. */
const GREGORIAN_START_JD = 2299160.5;

/** Calendar date (TDB) of a JD TDB, e.g. '3500-01-01', marked when it is a Julian-calendar date. */
function calendarDate(jdTDB: number): string {
  if (!Number.isFinite(jdTDB)) return `JD ${jdTDB}`;
  const day = Instant.fromJd(jdTDB, 'TDB').toIso(0).split('T')[0];
  return jdTDB < GREGORIAN_START_JD ? `${day} (Julian calendar)` : day;
}

/** The dates asked for lie outside what the planetary ephemeris can answer. Dates JD TDB. */
export class EphemerisSpanError extends RangeError {
  readonly fromJdTDB: number;
  readonly toJdTDB: number;
  readonly spanStartJdTDB: number;
  readonly spanEndJdTDB: number;
  constructor(fromJdTDB: number, toJdTDB: number, spanStartJdTDB: number, spanEndJdTDB: number) {
    super(`dates ${calendarDate(fromJdTDB)} to ${calendarDate(toJdTDB)} (JD ${fromJdTDB.toFixed(1)}–${toJdTDB.toFixed(1)} TDB) `
      + `lie outside the planetary ephemeris span ${calendarDate(spanStartJdTDB)} to ${calendarDate(spanEndJdTDB)} `
      + `(JD ${spanStartJdTDB}–${spanEndJdTDB} TDB)`);
    this.name = 'EphemerisSpanError';
    this.fromJdTDB = fromJdTDB;
    this.toJdTDB = toJdTDB;
    this.spanStartJdTDB = spanStartJdTDB;
    this.spanEndJdTDB = spanEndJdTDB;
  }
}

/** Days of planetary ephemeris kept beyond the propagation span on each side. */
const EPHEMERIS_MARGIN_DAYS = 1;

/**
 * A cached planetary ephemeris over [loJdTDB, hiJdTDB] (JD TDB) with a day of margin on each
 * side; EphemerisSpanError when that leaves the direct series' span.
 */
export function planetaryEphemerisOver(loJdTDB: number, hiJdTDB: number): Ephemeris {
  const src = new Vsop87Ephemeris();
  const start = loJdTDB - EPHEMERIS_MARGIN_DAYS, end = hiJdTDB + EPHEMERIS_MARGIN_DAYS;
  if (!(start >= src.startJdTDB && end <= src.endJdTDB)) {
    throw new EphemerisSpanError(loJdTDB, hiJdTDB, src.startJdTDB, src.endJdTDB);
  }
  return createEphemeris({ startJdTDB: start, endJdTDB: end, source: src });
}

/** Heliocentric state (6 numbers) at the elements' epoch, about a centre of GM `muAu3PerDay2`. */
export function orbitStateAtEpoch(el: OrbitElements, out: Float64Array, muAu3PerDay2 = GM_SUN_AU3_PER_DAY2): void {
  if (el.form === 'perihelion') {
    perihelionElementsToState(el.qAu, el.e, el.iRad, el.nodeRad, el.periRad, el.tpJdTDB, el.epochJdTDB, muAu3PerDay2, out);
  } else {
    semimajorElementsToState(el.aAu, el.e, el.iRad, el.nodeRad, el.periRad, el.meanAnomalyRad, muAu3PerDay2, out);
  }
}

/** Carry `el` to opts.toJdTDB. Throws EphemerisSpanError when the planets are needed outside their span. */
export function propagateOrbit(el: OrbitElements, opts: OrbitPropagationOptions): OrbitPropagation {
  const nonGrav = opts.nonGravAuPerDay2 ?? null;
  if (nonGrav !== null && !opts.nbody) throw new RangeError('propagateOrbit: non-gravitational parameters need nbody');
  const mu = GM_SUN_AU3_PER_DAY2;
  const s0 = new Float64Array(6);
  orbitStateAtEpoch(el, s0, mu);
  const state = new Float64Array(6);
  let eph: Ephemeris | null = null;
  let steps = NaN;
  if (opts.nbody) {
    eph = planetaryEphemerisOver(Math.min(el.epochJdTDB, opts.toJdTDB), Math.max(el.epochJdTDB, opts.toJdTDB));
    steps = propagateTestBodies({
      epochJdTDB: el.epochJdTDB, states: s0,
      params: nonGrav === null ? null : Float64Array.of(nonGrav[0], nonGrav[1], nonGrav[2], 0), // A/m 0: no radiation pressure
      forces: { planets: PLANETS, ephemeris: eph, relativity: opts.relativity },
    }, opts.toJdTDB, state).steps;
  } else {
    propagateTwoBody(s0, opts.toJdTDB - el.epochJdTDB, mu, state);
  }
  const perihelion = new Float64Array(6);
  stateToPerihelionElements(state, opts.toJdTDB, mu, perihelion);
  let semimajor: OrbitPropagation['semimajor'] = null;
  if (perihelion[1] < 1) {
    const se = new Float64Array(6);
    stateToSemimajorElements(state, mu, se);
    semimajor = { aAu: se[0], meanAnomalyRad: se[5] };
  }
  let heliocentricAu = NaN, geocentricAu = NaN;
  if (opts.distances) {
    eph ??= planetaryEphemerisOver(opts.toJdTDB, opts.toJdTDB);
    const earth = new Float64Array(6);
    eph.helioState('earth', opts.toJdTDB, earth, 0);
    heliocentricAu = Math.hypot(state[0], state[1], state[2]);
    geocentricAu = Math.hypot(state[0] - earth[0], state[1] - earth[1], state[2] - earth[2]);
  }
  return { state, perihelion, semimajor, heliocentricAu, geocentricAu, steps };
}
