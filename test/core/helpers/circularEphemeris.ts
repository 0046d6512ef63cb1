/**
 * A small analytic ephemeris for synthetic tests: chosen planets on circular, coplanar
 * Keplerian orbits about the Sun in the ecliptic plane, with mean motion from Kepler's third
 * law for the Sun + planet mass, n² a³ = G(M_sun + m) (Murray & Dermott 1999, eq. 2.22).
 * Invented data, for synthetic tests only; it implements the core's Ephemeris interface.
 */
import type { Ephemeris, EphemerisBody } from '../../../src/core/types.js';
import { GM_SUN_AU3_PER_DAY2, planetGmAu3PerDay2, type PlanetName } from '../../../src/core/constants.js';

export interface CircularPlanet {
  planet: PlanetName;
  aAu: number;
  /** Mean longitude at epochJd, rad. */
  lambda0Rad: number;
}

export class CircularEphemeris implements Ephemeris {
  readonly name = 'circular test planets';
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  private readonly bodies = new Map<EphemerisBody, { a: number; n: number; l0: number }>();

  constructor(planets: readonly CircularPlanet[], readonly epochJd: number, spanDays: number) {
    this.startJdTDB = epochJd - spanDays;
    this.endJdTDB = epochJd + spanDays;
    for (const p of planets) {
      const n = Math.sqrt((GM_SUN_AU3_PER_DAY2 + planetGmAu3PerDay2(p.planet)) / p.aAu ** 3);
      const entry = { a: p.aAu, n, l0: p.lambda0Rad };
      this.bodies.set(p.planet, entry);
      if (p.planet === 'earth') this.bodies.set('emb', entry);
    }
  }

  /** Mean motion of a planet, rad/day. */
  meanMotion(planet: PlanetName): number {
    return this.bodies.get(planet)!.n;
  }

  helioState(body: EphemerisBody, jdTDB: number, out: Float64Array, offset = 0): void {
    if (!(jdTDB >= this.startJdTDB && jdTDB <= this.endJdTDB)) {
      throw new RangeError(`${this.name}: JD ${jdTDB} outside [${this.startJdTDB}, ${this.endJdTDB}]`);
    }
    const b = this.bodies.get(body);
    if (!b) throw new RangeError(`${this.name}: no body ${body}`);
    const l = b.l0 + b.n * (jdTDB - this.epochJd);
    const c = Math.cos(l), s = Math.sin(l);
    out[offset] = b.a * c;
    out[offset + 1] = b.a * s;
    out[offset + 2] = 0;
    out[offset + 3] = -b.a * b.n * s;
    out[offset + 4] = b.a * b.n * c;
    out[offset + 5] = 0;
  }
}
