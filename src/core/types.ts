/**
 * Types shared by the dynamics core. Frame convention for the whole core: heliocentric or
 * barycentric J2000 ecliptic (the VSOP87 "B" frame), lengths in au, times as Julian dates in
 * TDB for dynamics, velocities in au/day.
 */
import type { PlanetName } from './constants.js';

export type TimeScale = 'UTC' | 'TAI' | 'TT' | 'TDB';

/** Planet identifiers for ephemeris queries: the eight planets plus the Earth–Moon barycentre. */
export type EphemerisBody = PlanetName | 'emb';

/**
 * A planetary ephemeris. Implementations: direct VSOP87 series, the Chebyshev cache over it,
 * and (later) a user-supplied binary ephemeris. Writes into caller-owned buffers: no
 * allocation per call.
 */
export interface Ephemeris {
  readonly name: string;
  /** First and last Julian dates (TDB) the source can answer for; outside: RangeError. */
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  /**
   * Heliocentric J2000-ecliptic position (au) and velocity (au/day) of `body` at `jdTDB`,
   * written to out[offset .. offset+5] as x, y, z, vx, vy, vz.
   */
  helioState(body: EphemerisBody, jdTDB: number, out: Float64Array, offset?: number): void;
  /**
   * Optional fast path for the forces: positions only (au) of several bodies at one time,
   * bodies[j] to out[offset + stride·j .. +2], bit for bit the positions helioState gives.
   */
  helioPositions?(bodies: readonly EphemerisBody[], jdTDB: number, out: Float64Array, offset: number, stride: number): void;
}
