/** Every detector the project has, in the order `scan` runs them by default. */
import { coorbitalDetector } from './coorbital.js';
import { familiesDetector } from './families.js';
import { tisserandDetector } from './tisserand.js';
import type { Detector } from './types.js';

export const DETECTORS: readonly Detector[] = [tisserandDetector, coorbitalDetector, familiesDetector];

/** Detector by id, or undefined. */
export function detectorById(id: string): Detector | undefined {
  return DETECTORS.find((d) => d.id === id);
}
