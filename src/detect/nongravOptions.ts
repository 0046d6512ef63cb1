/**
 * Options of the `nongrav` detector: the astrometry of the catalogue's bodies (read, grouped
 * by designation and matched to catalogue rows by the CLI, src/cli/scanObsInputs.ts), the
 * observatory sites, and how each body is checked (src/fit/check/runCheck.ts).
 */
import type { NongravModelId } from '../fit/models/index.js';
import type { AstrometryObservation, ObservatorySite } from '../io/astrometry/types.js';

/** One catalogue body's usable observations (placed, dates in range, repeats set aside), in input order. */
export interface NongravBody {
  index: number; // catalogue row
  observations: AstrometryObservation[];
}

export interface NongravOptions {
  bodies: readonly NongravBody[] | null; // null: no astrometry given (every body not screened)
  sites: ReadonlyMap<string, ObservatorySite>; // the observatory-code table's sites
  models: readonly Exclude<NongravModelId, 'gravity'>[]; // fitted besides gravity only
  stationMinShare: number; // leave-one-station-out: stations holding at least this share are refitted without
  minObservations: number; // fewer usable observations than this: not checked
}

export const NONGRAV_DEFAULTS: Readonly<NongravOptions> = {
  bodies: null,
  sites: new Map(),
  models: ['thermal', 'comet', 'srp'],
  stationMinShare: 0.05, // as `check` (src/cli/check.ts STATION_MIN_SHARE_DEFAULT)
  // Our choice: 20 residuals for at most 9 parameters (six elements and the comet model's three), so
  // every model keeps at least 11 degrees of freedom; Gauss's method alone needs 3 observations.
  minObservations: 10,
};
