/**
 * Ephemeris body identifiers as small integers, so caches can index typed arrays by body,
 * and the span check shared by every Ephemeris implementation.
 */
import { PLANETS } from '../constants.js';
import type { EphemerisBody } from '../types.js';

/** Bodies an Ephemeris answers for, in index order: the eight planets, then 'emb'. */
export const EPHEMERIS_BODIES: readonly EphemerisBody[] = [...PLANETS, 'emb'];

/**
 * The eight planet systems as the dynamics reads them: the planets with the Earth–Moon
 * barycentre in place of the Earth (sunBarycentricState, the force model).
 */
export const PLANET_SYSTEM_BODIES: readonly EphemerisBody[] = PLANETS.map((p) => (p === 'earth' ? 'emb' : p));

const INDEX: ReadonlyMap<string, number> = new Map(EPHEMERIS_BODIES.map((b, k) => [b, k]));

/** Index of `body` in EPHEMERIS_BODIES; TypeError for anything else. */
export function ephemerisBodyIndex(body: EphemerisBody): number {
  const k = INDEX.get(body);
  if (k === undefined) {
    throw new TypeError(`unknown ephemeris body '${String(body)}'; expected one of ${EPHEMERIS_BODIES.join(', ')}`);
  }
  return k;
}

/** RangeError unless startJdTDB ≤ jdTDB ≤ endJdTDB (NaN fails too). */
export function assertInSpan(source: string, jdTDB: number, startJdTDB: number, endJdTDB: number): void {
  if (!(jdTDB >= startJdTDB && jdTDB <= endJdTDB)) {
    throw new RangeError(
      `${source}: JD ${jdTDB} (TDB) is outside the ephemeris span [${startJdTDB}, ${endJdTDB}]`,
    );
  }
}
