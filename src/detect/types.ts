/**
 * The detector contract: every detector reads the columnar Catalogue and returns Candidate
 * rows. A detector never prints and never reads options from the environment.
 */
import type { PlanetName } from '../core/constants.js';
import type { Progress } from '../core/progress.js';
import type { Catalogue } from '../clean/types.js';

/** One body raised by one detector. */
export interface Candidate {
  designation: string;
  index: number; // row in the Catalogue it came from
  detector: string; // which detector raised it
  class: string; // e.g. 'comet-like-T', 'asteroid-like-T', 'boundary'
  score: number; // larger = more anomalous, comparable within a detector
  falseAlarm: number; // calibrated probability where the detector can give one, else NaN
  flags: string[]; // data-quality caveats from clean/ plus detector caveats
  why: string; // one plain sentence a person can read
  details: Record<string, number | string>; // the detector's numbers, in a fixed key order
}

/** Options of the Tisserand screen (see detect/tisserand.ts for the sourced defaults). */
export interface TisserandOptions {
  planet: PlanetName; // the perturbing planet T is taken with respect to
  boundary: number; // the asteroid/comet dividing value of T
  margin: number; // half-width of the boundary band around it
  includeExterior: boolean; // also screen bodies whose perihelion lies beyond the planet (q > aP)
}

/** Options for every detector, one block per detector. */
export interface DetectorOptions {
  tisserand: TisserandOptions;
}

export interface Detector {
  id: string; // 'tisserand', 'coorbital', 'families', …
  description: string; // one line, for --help and the report
  run(cat: Catalogue, opts: DetectorOptions, progress?: Progress): Candidate[];
}
