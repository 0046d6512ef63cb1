/**
 * The direct analytical ephemeris: VSOP87B planets (vsop87.ts) and the Earth–Moon
 * barycentre from VSOP87B Earth plus the ELP/MPP02 Moon (elpMoon.ts). Every call sums the
 * full series; use the Chebyshev cache (ephemerisCache.ts) for repeated queries.
 *
 * EMB = Earth + geocentric Moon / (1 + M_earth/M_moon), both already on the J2000 ecliptic
 * (elpMoon.ts applies the of-date → J2000 rotation). The Moon's errors enter divided by
 * 82.3: 0.1 km of lunar-series truncation becomes ~1 m. VSOP87's own lunar terms in the
 * Earth and the ELP Moon do not cancel exactly: the EMB keeps a ~2e-9 au (≈ 300 m) residual
 * with monthly periods, far below VSOP87's accuracy against modern ephemerides.
 */
import { J2000_JD } from '../constants.js';
import type { PlanetName } from '../constants.js';
import type { Ephemeris, EphemerisBody } from '../types.js';
import { assertInSpan, ephemerisBodyIndex } from './ephemerisBody.js';
import { DAYS_PER_JULIAN_MILLENNIUM, vsop87HelioState } from './vsop87.js';
import { elpGeocentricMoonState, MOON_TO_EMB_AU_PER_KM } from './elpMoon.js';
import type { SegmentFitter, SegmentFitterOptions, SegmentFitterSource, SegmentGrid } from './segmentFitter.js';
import { Vsop87SegmentFitter } from './vsop87SegmentFitter.js';

/**
 * Default span: J2000 ± 1 000 years. VSOP87 keeps about 1″ over ±4 000 years for Mercury–Mars
 * and ±2 000 years for Jupiter and Saturn (Bretagnon & Francou 1988, abstract; from memory);
 * the lunar theory is fitted to a numerical ephemeris over a few centuries and degrades
 * slowly outside it, which matters only for 'emb' (the Moon enters divided by 82.3).
 */
export const VSOP87_DEFAULT_START_JD_TDB = J2000_JD - DAYS_PER_JULIAN_MILLENNIUM;
export const VSOP87_DEFAULT_END_JD_TDB = J2000_JD + DAYS_PER_JULIAN_MILLENNIUM;


export interface Vsop87EphemerisOptions {
  startJdTDB?: number;
  endJdTDB?: number;
}

export class Vsop87Ephemeris implements Ephemeris, SegmentFitterSource {
  readonly name = 'VSOP87B + ELP/MPP02 (direct series)';
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  private readonly moon = new Float64Array(6);

  constructor(opts: Vsop87EphemerisOptions = {}) {
    this.startJdTDB = opts.startJdTDB ?? VSOP87_DEFAULT_START_JD_TDB;
    this.endJdTDB = opts.endJdTDB ?? VSOP87_DEFAULT_END_JD_TDB;
    if (!(this.startJdTDB < this.endJdTDB)) {
      throw new RangeError(`Vsop87Ephemeris: empty span [${this.startJdTDB}, ${this.endJdTDB}]`);
    }
  }

  helioState(body: EphemerisBody, jdTDB: number, out: Float64Array, offset = 0): void {
    const k = ephemerisBodyIndex(body);
    assertInSpan(this.name, jdTDB, this.startJdTDB, this.endJdTDB);
    if (k < 8) {
      vsop87HelioState(body as PlanetName, jdTDB, out, offset);
      return;
    }
    // EMB = Earth + geocentric Moon / (1 + M_earth/M_moon); both in the J2000 ecliptic.
    vsop87HelioState('earth', jdTDB, out, offset);
    elpGeocentricMoonState(jdTDB, this.moon, 0);
    for (let j = 0; j < 6; j++) out[offset + j] += this.moon[j] * MOON_TO_EMB_AU_PER_KM;
  }

  /**
   * Bulk fitter of cache segments for `body` (vsop87SegmentFitter.ts): the same fits as
   * sampling helioState at the Chebyshev nodes, from the series' own Chebyshev coefficients.
   */
  createSegmentFitter(body: EphemerisBody, grid: SegmentGrid, opts: SegmentFitterOptions): SegmentFitter {
    const endJd = grid.startJdTDB + grid.segmentCount * grid.segmentDays;
    if (grid.startJdTDB < this.startJdTDB || endJd > this.endJdTDB + 1e-6) {
      throw new RangeError(
        `${this.name}: segment grid [${grid.startJdTDB}, ${endJd}] exceeds the span [${this.startJdTDB}, ${this.endJdTDB}]`,
      );
    }
    return new Vsop87SegmentFitter(body, grid, opts);
  }
}
