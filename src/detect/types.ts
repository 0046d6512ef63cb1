/**
 * The detector contract: every detector reads the columnar Catalogue and returns Candidate
 * rows together with an account of the bodies it looked at and of those it did not, by
 * reason. A detector never prints and never reads options from the environment.
 *
 * Three numbers say how unusual a candidate is, and they are kept apart on purpose:
 *   - `score`: the detector's own measure in physical units (a distance in T, a libration
 *     amplitude, a velocity in m/s…), comparable within one detector only;
 *   - `tailFraction`: rarity within the population the detector screened, the fraction of
 *     that population at least as extreme, the body itself included. A rank, not a
 *     probability: the most extreme of N bodies always gets 1/N;
 *   - `falseAlarmProb`: the probability that a body of the detector's stated null model
 *     (`Detector.falseAlarmModel`) scores at least as high, from a calibration that can be
 *     rerun. NaN for a detector that states no null model.
 */
import type { PlanetName } from '../core/constants.js';
import type { Progress } from '../core/progress.js';
import type { Catalogue } from '../clean/types.js';
import type { CoorbitalOptions } from './coorbitalOptions.js';
import type { FamiliesOptions } from './familiesOptions.js';
import type { NongravOptions } from './nongravOptions.js';

/** One body raised by one detector. */
export interface Candidate {
  designation: string;
  index: number; // row in the Catalogue it came from
  detector: string; // which detector raised it
  class: string; // e.g. 'comet-like-T', 'asteroid-like-T', 'boundary'
  boundary: boolean; // within the detector's band of doubt: reported apart, ranked after anomalies
  score: number; // Detector.scoreMeaning; larger = more anomalous; ≤ 0 exactly for boundary cases
  tailFraction: number; // fraction of tailPopulation at least as extreme, itself included; NaN if none
  tailPopulation: number; // size of the population the tail fraction is taken over; 0 if none
  falseAlarmProb: number; // under Detector.falseAlarmModel; NaN when the detector states none
  flags: string[]; // data-quality caveats from clean/ plus detector caveats
  why: string; // one plain sentence a person can read; its numbers agree with the fields
  details: Record<string, number | string>; // the detector's numbers, in a fixed key order
}

/**
 * What a detector did with the catalogue: `screened` bodies were judged; every other
 * accepted body is counted once under the reason it was not (ids of
 * Detector.notScreenedReasons). screened + Σ notScreened = catalogue size.
 */
export interface ScreeningAccount {
  screened: number;
  notScreened: Record<string, number>; // reason id → bodies, every id of notScreenedReasons present
}

export interface DetectorResult extends ScreeningAccount {
  candidates: Candidate[];
  warnings?: string[]; // one line per body the detector could not judge for a reason of its own input (the CLI shows them)
}

/** What a run may use besides the catalogue and options. */
export interface DetectorContext {
  progress?: Progress;
  threads?: number; // worker threads a detector may use besides the options' own (outputs identical for any number); default 1
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
  coorbital: CoorbitalOptions;
  families: FamiliesOptions;
  nongrav: NongravOptions;
}

export interface Detector {
  id: string; // 'tisserand', 'coorbital', 'families', …
  description: string; // one line, for --help and the report
  scoreMeaning: string; // what `score` measures, with its unit
  tailMeaning: string; // the population `tailFraction` is taken over
  falseAlarmModel: string | null; // the null model falseAlarmProb is calibrated under; null: none
  notScreenedReasons: Readonly<Record<string, string>>; // reason id → plain description
  run(cat: Catalogue, opts: DetectorOptions, ctx?: DetectorContext): Promise<DetectorResult>;
}
