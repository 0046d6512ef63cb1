/** Every detector the project has, in the order `scan` runs them. */
import { coorbitalDetector } from './coorbital.js';
import { familiesDetector } from './families.js';
import { tisserandDetector } from './tisserand.js';
import type { Detector } from './types.js';

export const DETECTORS: readonly Detector[] = [tisserandDetector, coorbitalDetector, familiesDetector];

/**
 * The detectors `scan` runs when none are named. `families` is run on request only
 * (`--detectors families`, or `wayward families`) until its candidate list accounts for
 * testing every screened body at once: at a false-alarm threshold α, about α × (bodies
 * screened) bodies of a catalogue drawn from the null model itself pass, so a default run
 * would list that many background bodies as outliers.
 */
export const DEFAULT_DETECTOR_IDS: readonly string[] = [tisserandDetector.id, coorbitalDetector.id];

/** Detector by id, or undefined. */
export function detectorById(id: string): Detector | undefined {
  return DETECTORS.find((d) => d.id === id);
}
