/**
 * The wells of the averaged co-orbital potential V(φ) on its periodic grid, and the kind of
 * libration centre each well's minimum is.
 *
 * Labelling (project choice, following the co-orbital design note §1.4 item 5; the classes
 * are those of Namouni, Christou & Murray 1999, PRL 83, 2506 — journal details from memory):
 * - quasi-satellite: the minimum lies between the two barrier peaks that flank φ = 0, i.e.
 *   walking from φ = 0 towards it no local maximum of V is met, and both peaks lie within
 *   ±120° of the planet (a side whose first maximum is the L3 one near 180° has no barrier:
 *   φ = 0 is then on the slope of a tadpole well). If φ = 0 is itself a maximum (e = i = 0:
 *   the planet) there is no quasi-satellite well.
 * - otherwise by half-plane, not by the ±60° values (the centres move away from ±60° at larger
 *   e; Leleu et al. 2017, CMDA, doi 10.1007/s10569-017-9802-8): φ in (0°, 180°] → L4 (leads
 *   the planet; Morais 2001, A&A 369, 677, footnote), φ in (−180°, 0°) → L5.
 */
import { atIndex } from './periodicGrid.js';

export type WellKind = 'qs' | 'l4' | 'l5';

/** Grid point j (any integer, taken modulo n) is a local minimum (strict on the left, so a flat bottom counts once). */
export function isLocalMinimum(values: Float64Array, n: number, j: number): boolean {
  const v = atIndex(values, n, j);
  return v < atIndex(values, n, j - 1) && v <= atIndex(values, n, j + 1);
}

/** Grid point j (any integer, taken modulo n) is a local maximum (strict on the left). An infinite value is a maximum. */
export function isLocalMaximum(values: Float64Array, n: number, j: number): boolean {
  const v = atIndex(values, n, j);
  return (v > atIndex(values, n, j - 1) && v >= atIndex(values, n, j + 1)) || v === Infinity;
}

/**
 * Steps from φ = 0 to the first local maximum walking up (φ increasing) and walking down;
 * both 0 when φ = 0 is itself a maximum. Returned as [stepsUp, stepsDown].
 */
export function barrierSteps(values: Float64Array, n: number): [number, number] {
  if (isLocalMaximum(values, n, 0)) return [0, 0];
  let up = 1;
  while (up < n && !isLocalMaximum(values, n, up)) up++;
  let down = 1;
  while (down < n && !isLocalMaximum(values, n, n - down)) down++;
  return [up, down];
}

/**
 * Kind of a minimum at grid index j (0 … n−1), whose refined angle is centreRad;
 * barriers from barrierSteps.
 */
export function wellKind(n: number, j: number, centreRad: number, barriers: [number, number]): WellKind {
  const [up, down] = barriers;
  const k = ((j % n) + n) % n;
  // Both flanking maxima must be barrier peaks near the planet, within ±120°: when one side
  // has none before L3 (180°), φ = 0 lies on the slope of a tadpole well, not in a QS well.
  const flanked = up < n / 3 && down < n / 3;
  if ((k === 0 && up > 0) || (flanked && (k < up || n - k < down))) return 'qs'; // a minimum at φ = 0 itself is always one
  const s = Math.sin(centreRad);
  return s > 0 || (s === 0 && Math.cos(centreRad) < 0) ? 'l4' : 'l5';
}
