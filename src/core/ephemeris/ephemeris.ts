/**
 * The core's planetary ephemeris factory and the Sun's barycentric state.
 *
 * `createEphemeris` returns the Chebyshev cache (ephemerisCache.ts) over a source that
 * implements the Ephemeris interface: by default the direct VSOP87B + ELP/MPP02 series
 * (vsop87Ephemeris.ts). A reader of a user-supplied binary planetary ephemeris plugs in as
 * another `source` (same interface, heliocentric J2000-ecliptic states in au and au/day).
 */
import { GM_SUN_AU3_PER_DAY2, PLANETS, planetGmAu3PerDay2 } from '../constants.js';
import type { Ephemeris, EphemerisBody } from '../types.js';
import { EphemerisCache } from './ephemerisCache.js';
import type { CacheFillChoice, CacheVelocityMode, ChebyshevLayout } from './ephemerisCache.js';
import { Vsop87Ephemeris } from './vsop87Ephemeris.js';

export interface CreateEphemerisOptions {
  /** Span the cache answers for (TDB Julian dates, inclusive); outside it: RangeError. */
  startJdTDB: number;
  endJdTDB: number;
  /** Underlying source; default: direct VSOP87B + ELP/MPP02 series. */
  source?: Ephemeris;
  velocity?: CacheVelocityMode;
  layouts?: readonly ChebyshevLayout[];
  /**
   * Fit every segment now instead of at first touch (default false); a list of bodies fits
   * only theirs, e.g. PLANET_SYSTEM_BODIES for the dynamics.
   */
  eager?: boolean | readonly EphemerisBody[];
  /** How segments are fitted; default 'auto' (CacheFillChoice in ephemerisCache.ts). */
  fill?: CacheFillChoice;
  /**
   * Bulk fill: worst-case bound (au) of left-out series terms; default
   * DEFAULT_FIT_TOLERANCE_AU (1e-10), or DYNAMICS_FIT_TOLERANCE_AU (1e-8) for dynamics.
   */
  fitToleranceAu?: number;
}

/**
 * A cached planetary ephemeris over [startJdTDB, endJdTDB]. Segments are fitted at first
 * touch; a long integration should call `prefill(start, end, PLANET_SYSTEM_BODIES)` (or pass
 * `eager`) first: a bulk fill of 1 000 years of those eight bodies takes a few seconds.
 */
export function createEphemeris(opts: CreateEphemerisOptions): EphemerisCache {
  const source = opts.source ?? new Vsop87Ephemeris();
  const cache = new EphemerisCache(source, {
    startJdTDB: opts.startJdTDB,
    endJdTDB: opts.endJdTDB,
    velocity: opts.velocity,
    layouts: opts.layouts,
    fill: opts.fill,
    fitToleranceAu: opts.fitToleranceAu,
  });
  if (opts.eager === true) cache.fillAll();
  else if (Array.isArray(opts.eager)) cache.prefill(cache.startJdTDB, cache.endJdTDB, opts.eager);
  return cache;
}

/**
 * Mass of each planet system over the Sun's, μ_i = GM_i / GM_sun (DE430 values via
 * constants.ts). 'earth' is the Earth–Moon system, so its position is taken at the EMB.
 */
const MASS_RATIOS = PLANETS.map((p) => planetGmAu3PerDay2(p) / GM_SUN_AU3_PER_DAY2);
const TOTAL_MASS_OVER_SUN = 1 + MASS_RATIOS.reduce((a, b) => a + b, 0);
const planetState = new Float64Array(6);

/**
 * State of the Sun relative to the solar-system barycentre (J2000 ecliptic, au, au/day)
 * at `jdTDB`, into out[offset .. offset+5]. From the definition of the barycentre,
 * Σ m_i (r_i − r_sun) + M_total r_sun = 0 with heliocentric r_i:
 *   r_sun,bary = −Σ μ_i r_i,helio / (1 + Σ μ_i)   (μ_i = m_i / M_sun),
 * and likewise for velocities (definition of the centre of mass; common practice).
 * Eight planet systems only: Pluto–Charon (M_sun/M ≈ 1.36e8, from memory) would move the
 * Sun by up to ~3e-7 au (≈ 45 km) and the main belt by ~1e-9 au; both are ignored.
 */
export function sunBarycentricState(eph: Ephemeris, jdTDB: number, out: Float64Array, offset = 0): void {
  let x = 0, y = 0, z = 0, vx = 0, vy = 0, vz = 0;
  for (let k = 0; k < PLANETS.length; k++) {
    const planet = PLANETS[k];
    eph.helioState(planet === 'earth' ? 'emb' : planet, jdTDB, planetState, 0);
    const mu = MASS_RATIOS[k];
    x += mu * planetState[0];
    y += mu * planetState[1];
    z += mu * planetState[2];
    vx += mu * planetState[3];
    vy += mu * planetState[4];
    vz += mu * planetState[5];
  }
  const f = -1 / TOTAL_MASS_OVER_SUN;
  out[offset] = f * x;
  out[offset + 1] = f * y;
  out[offset + 2] = f * z;
  out[offset + 3] = f * vx;
  out[offset + 4] = f * vy;
  out[offset + 5] = f * vz;
}
