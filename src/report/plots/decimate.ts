/**
 * Deterministic thinning of a series for plotting: every k-th sample, the first and the last
 * always kept, so a chart file stays small (at most `maxPoints` samples drawn) and the same
 * input always gives the same picture. No randomness, no dependence on the values.
 */

/** Default largest number of samples drawn in one chart (keeps SVG files well under 1 MB). */
export const DEFAULT_MAX_POINTS = 5000;

export { strideIndices } from '../../core/strideIndices.js';

/** A subtitle line saying what was left out, or '' when everything is drawn. */
export function thinningNote(total: number, drawn: number, unit = 'samples'): string {
  return drawn < total ? `${drawn} of ${total} ${unit} drawn (evenly spaced)` : '';
}
