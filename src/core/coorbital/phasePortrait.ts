/**
 * Reading the motion of φ from the phase portrait of the averaged 1:1 problem
 *
 *   h(x, φ) = −(3/8) x² − μ V(φ),   x = δa/a_P,   V = R̄ (averagedDisturbing.ts)        (1')
 *
 * (the Keplerian Hamiltonian in the rotating frame expanded to second order in δa — derived;
 * see the co-orbital design note §1.2; kinetic term plus μ times the averaged disturbing function
 * is common practice). A body at (x0, φ0)
 * moves on the level curve x(φ)² = (8/3) μ (L − V(φ)) with L = V(φ0) + (3/8) x0²/μ.
 *
 * Recipe (project choice; design note §1.4): the connected arc of {V ≤ L} through φ0 is
 * found by walking the grid both ways from φ0 and bisecting the crossing on the interpolated
 * V; the whole circle means circulation ('passing'); otherwise the minima of V inside the arc
 * (libration centres, labelled by potentialWells.ts) give the state:
 *   only a quasi-satellite well → quasi-satellite;  only L4 / only L5 → tadpole-L4 / -L5;
 *   L4 and L5 → horseshoe;  the quasi-satellite well with others → compound.
 * Features of V narrower than one grid step (0.5° by default) are not resolved.
 */
import { TWO_PI, wrapTwoPi } from '../math.js';
import type { CoorbitalPrediction, CoorbitalState } from './types.js';
import { atIndex, crossLevel, interpolatePeriodic, minimiseBetween } from './periodicGrid.js';
import { barrierSteps, isLocalMaximum, isLocalMinimum, wellKind, type WellKind } from './potentialWells.js';

/** The level curve through the body, in radians; angles unwrapped so that loRad ≤ hiRad. */
export interface PhasePortrait {
  state: CoorbitalState;
  compoundWith: CoorbitalPrediction['compoundWith'];
  level: number; // L
  loRad: number; // turning points (NaN for passing)
  hiRad: number;
  centreRad: number; // NaN for passing
  bottomRad: number; // the lowest enclosed minimum of V (NaN for passing)
  bottomValue: number; // V there
  separatrixMargin: number; // see separatrixMargin and passingPortrait
  maxOffsetRel: number; // √((8/3) μ (L − V_min)) over the arc
  minDistance: number; // units of a_P; see minDistanceOnArc
}

/** L = V(φ0) + (3/8) x0²/μ (derived; see design note §1.4 item 1). */
export function energyLevel(values: Float64Array, n: number, x0: number, phi0Rad: number, mu: number): number {
  return interpolatePeriodic(values, n, phi0Rad) + (3 / 8) * (x0 * x0) / mu;
}

/**
 * The connected arc of {V ≤ level} containing phi0Rad (φ0 taken in [0, 2π)), as
 * [loRad, hiRad] with loRad ≤ φ0 ≤ hiRad, or null when it is the whole circle.
 */
export function findArc(values: Float64Array, n: number, level: number, phi0Rad: number): [number, number] | null {
  const h = TWO_PI / n;
  const j0 = Math.min(Math.floor(phi0Rad / h), n - 1); // φ0 in cell [j0, j0 + 1]
  let up = j0 + 1;
  while (up <= j0 + n && !(atIndex(values, n, up) > level)) up++;
  if (up > j0 + n) return null;
  let down = j0;
  while (!(atIndex(values, n, down) > level)) down--;
  const hiRad = crossLevel(values, n, level, Math.max(phi0Rad, (up - 1) * h), up * h);
  const loRad = crossLevel(values, n, level, Math.min(phi0Rad, (down + 1) * h), down * h);
  return [loRad, hiRad];
}

/** What an arc encloses (enclosedWells). */
export interface Wells {
  kinds: Set<WellKind>;
  lowestRad: number; // refined angle of the lowest enclosed minimum
  lowestValue: number;
  highestInnerMax: number; // highest local maximum inside the arc (−∞ if none)
}

/** Minima and maxima of V strictly inside [loRad, hiRad]; a sub-step arc gets its own minimum. */
export function enclosedWells(values: Float64Array, n: number, loRad: number, hiRad: number): Wells {
  const h = TWO_PI / n;
  const barriers = barrierSteps(values, n);
  const wells: Wells = { kinds: new Set(), lowestRad: NaN, lowestValue: Infinity, highestInnerMax: -Infinity };
  for (let j = Math.ceil(loRad / h); j * h <= hiRad; j++) {
    if (isLocalMaximum(values, n, j)) {
      wells.highestInnerMax = Math.max(wells.highestInnerMax, atIndex(values, n, j));
    }
    if (!isLocalMinimum(values, n, j)) continue;
    addWell(wells, values, n, j, Math.max(loRad, (j - 1) * h), Math.min(hiRad, (j + 1) * h), barriers);
  }
  if (wells.kinds.size === 0) {
    const centre = minimiseBetween(values, n, loRad, hiRad);
    addWell(wells, values, n, Math.round(centre / h), loRad, hiRad, barriers);
  }
  return wells;
}

function addWell(wells: Wells, values: Float64Array, n: number, j: number, aRad: number, bRad: number, barriers: [number, number]): void {
  const centreRad = minimiseBetween(values, n, aRad, bRad);
  const v = interpolatePeriodic(values, n, centreRad);
  wells.kinds.add(wellKind(n, j, centreRad, barriers));
  if (v < wells.lowestValue) {
    wells.lowestValue = v;
    wells.lowestRad = centreRad;
  }
}

/** State from the kinds of enclosed wells (table in the header). */
export function stateOfWells(kinds: Set<WellKind>): [CoorbitalState, CoorbitalPrediction['compoundWith']] {
  const l4 = kinds.has('l4'), l5 = kinds.has('l5');
  const side: CoorbitalState = l4 && l5 ? 'horseshoe' : l4 ? 'tadpole-L4' : 'tadpole-L5';
  if (kinds.has('qs')) return l4 || l5 ? ['compound', side as CoorbitalPrediction['compoundWith']] : ['quasi-satellite', 'none'];
  return [side, 'none'];
}

/** The top of the rise of V beyond a turning point, walking away from the arc (step ±1). */
export function boundingPeak(values: Float64Array, n: number, fromRad: number, step: 1 | -1): number {
  const h = TWO_PI / n;
  let j = step > 0 ? Math.ceil(fromRad / h) : Math.floor(fromRad / h);
  for (let k = 0; k < n && !(atIndex(values, n, j + step) < atIndex(values, n, j)); k++) j += step;
  return atIndex(values, n, j);
}

/**
 * Separatrix margin (design note §1.4 item 6; project choice): the distance of L to the
 * nearest level at which the state changes — the lower bounding peak above, and for a
 * horseshoe or compound orbit the highest maximum inside the arc below — over the well depth
 * (lower bounding peak − lowest enclosed minimum; L − that minimum when the bound is the planet
 * itself, V = ∞). 1 at the centre of a single well, 0 on a separatrix.
 */
export function separatrixMargin(values: Float64Array, n: number, level: number, arc: [number, number], wells: Wells): number {
  const peak = Math.min(boundingPeak(values, n, arc[1], 1), boundingPeak(values, n, arc[0], -1));
  const depth = (peak < Infinity ? peak : level) - wells.lowestValue; // the planet itself (V = ∞) bounds: scale by L
  const gap = Math.min(peak - level, level - wells.highestInnerMax);
  if (!(depth > 0)) return 0;
  return Math.min(1, Math.max(0, gap / depth));
}

/**
 * Least body–planet distance along the level curve (units of a_P): the least over the arc of
 * minDistance(φ), the least distance over the planet's longitude at fixed φ, computed with the
 * body at a = a_P (averagedDisturbing.ts), linearly interpolated at the turning points.
 * Approximation (project choice, design note §1.4 "close approaches"): the offset x along the
 * curve is neglected; it is exact at the turning points (x = 0 there, where tadpoles and
 * horseshoes of small e and i come closest) and elsewhere changes the distance by up to ~|x| a_P.
 * Sampling overestimates the least distance by at most half a sample step of the relative
 * motion: ~(e + sin i) · 0.013 a_P for 240 planet longitudes, ~0.004 a_P for the 0.5° φ step
 * (Earth's 3 Hill radii are 0.030 a_P).
 */
export function minDistanceOnArc(minDistance: Float64Array, n: number, loRad: number, hiRad: number): number {
  const h = TWO_PI / n;
  let best = Math.min(linearAt(minDistance, n, loRad), linearAt(minDistance, n, hiRad));
  for (let j = Math.ceil(loRad / h); j * h <= hiRad; j++) best = Math.min(best, atIndex(minDistance, n, j));
  return best;
}

function linearAt(values: Float64Array, n: number, phiRad: number): number {
  const t = phiRad / (TWO_PI / n);
  const j = Math.floor(t);
  const a = atIndex(values, n, j), b = atIndex(values, n, j + 1);
  return a + (t - j) * (b - a);
}

/** The level curve through (x0, φ0) and what it encloses (recipe in the header). */
export function readPhasePortrait(values: Float64Array, minDistance: Float64Array, n: number, x0: number, phi0Rad: number, mu: number): PhasePortrait {
  const phi0 = wrapTwoPi(phi0Rad);
  const level = energyLevel(values, n, x0, phi0, mu);
  const arc = findArc(values, n, level, phi0);
  if (arc === null) return passingPortrait(values, minDistance, n, level, mu);
  const wells = enclosedWells(values, n, arc[0], arc[1]);
  const [state, compoundWith] = stateOfWells(wells.kinds);
  const single = state === 'quasi-satellite' || state === 'tadpole-L4' || state === 'tadpole-L5';
  return {
    state, compoundWith, level, loRad: arc[0], hiRad: arc[1],
    centreRad: single ? wells.lowestRad : 0.5 * (arc[0] + arc[1]),
    bottomRad: wells.lowestRad, bottomValue: wells.lowestValue,
    separatrixMargin: separatrixMargin(values, n, level, arc, wells),
    maxOffsetRel: Math.sqrt((8 / 3) * mu * Math.max(0, level - wells.lowestValue)),
    minDistance: minDistanceOnArc(minDistance, n, arc[0], arc[1]),
  };
}

/**
 * Circulation: no turning point. Its margin is the height of L above the highest V, over L − the
 * lowest V (project choice): 0 on the separatrix, towards 1 far from the planet.
 */
function passingPortrait(values: Float64Array, minDistance: Float64Array, n: number, level: number, mu: number): PhasePortrait {
  let vMin = Infinity, vMax = -Infinity, dMin = Infinity;
  for (let j = 0; j < n; j++) {
    vMin = Math.min(vMin, values[j]);
    vMax = Math.max(vMax, values[j]);
    dMin = Math.min(dMin, minDistance[j]);
  }
  return {
    state: 'passing', compoundWith: 'none', level, loRad: NaN, hiRad: NaN, centreRad: NaN, bottomRad: NaN, bottomValue: NaN,
    separatrixMargin: (level - vMax) / (level - vMin),
    maxOffsetRel: Math.sqrt((8 / 3) * mu * Math.max(0, level - vMin)), minDistance: dMin,
  };
}
