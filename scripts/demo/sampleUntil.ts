/**
 * Rejection sampling with an iteration limit: draws until `accept` holds, and fails loudly
 * with the last draw when it never does (a sampler whose ranges cannot meet its condition).
 */
import type { DemoElements } from './types.js';

export const MAX_REJECTION_TRIES = 100_000;

export function sampleUntil(
  label: string, draw: () => void, accept: () => boolean, last: DemoElements,
): void {
  for (let k = 0; k < MAX_REJECTION_TRIES; k++) {
    draw();
    if (accept()) return;
  }
  throw new Error(
    `${label}: no acceptable draw in ${MAX_REJECTION_TRIES} tries; last a=${last.aAu} au, ` +
      `e=${last.e}, i=${last.iDeg}°`,
  );
}

/**
 * sampleUntil for an acceptance that takes time (an N-body run): draws until `accept` holds,
 * at most `maxTries` times; returns the number of draws made. Fails loudly like sampleUntil.
 */
export async function sampleUntilAsync(
  label: string, maxTries: number, draw: () => void, accept: () => Promise<boolean>, last: DemoElements,
): Promise<number> {
  for (let k = 1; k <= maxTries; k++) {
    draw();
    if (await accept()) return k;
  }
  throw new Error(`${label}: no acceptable draw in ${maxTries} tries; last a=${last.aAu} au, e=${last.e}, i=${last.iDeg}°`);
}
