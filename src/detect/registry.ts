/** Every detector the project has, in the order `scan` runs them. */
import { coorbitalDetector } from './coorbital.js';
import { familiesDetector } from './families.js';
import { nongravDetector } from './nongrav.js';
import { tisserandDetector } from './tisserand.js';
import type { Detector } from './types.js';

export const DETECTORS: readonly Detector[] = [tisserandDetector, coorbitalDetector, familiesDetector, nongravDetector];

/**
 * The detectors `scan` runs when none are named: the three that read the catalogue alone
 * (`scan --obs DIR` adds `nongrav`, which needs astrometry). `families` tests every body outside
 * the families at once, and its candidates are those with a Benjamini–Hochberg q-value below the
 * false-discovery level (`--family-fdr`, 0.05), not every body below a false-alarm threshold
 * (which would list about α × bodies tested from the background alone).
 */
export const DEFAULT_DETECTOR_IDS: readonly string[] = [tisserandDetector.id, coorbitalDetector.id, familiesDetector.id];

/** Detector by id, or undefined. */
export function detectorById(id: string): Detector | undefined {
  return DETECTORS.find((d) => d.id === id);
}
