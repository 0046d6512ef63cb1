/**
 * Segmentation of a sampled resonant angle φ(t) = λ − λ_P into stretches of one co-orbital
 * state (design note on the co-orbital detector, §6 [design]; the states and their sign
 * convention are in types.ts):
 *  1. φ̄ = running mean of the unwrapped φ over one planet period (runningMean.ts);
 *  2. the turning points of φ̄, with hysteresis (turningPoints.ts), cut it into pieces: the
 *     libration half-cycles, plus a partial piece at each end;
 *  3. each piece is classified by the range of φ̄ it covers (classifyRange below);
 *  4. consecutive pieces in the same state merge into one segment, with its centre (circular
 *     mean of φ̄), amplitude (half the range of φ̄) and mean period.
 * The classification by covered range is the note's table in §6 [design]; it is kinematic
 * (which of 0°, ±60°, 180° the cycle passes over), not the dynamical one of the averaged
 * problem. Limits [design]: at high eccentricity the libration centres move away from ±60°
 * (Leleu et al. 2017, abstract [seen in the note]), and a quasi-satellite wider than 60° is
 * called compound here.
 */
import { DEG_PER_RAD, DAYS_PER_JULIAN_YEAR, RAD_PER_DEG } from '../constants.js';
import { TWO_PI, wrapPi } from '../math.js';
import type { CoorbitalSegment, CoorbitalState } from './types.js';
import { runningMeanInto } from './runningMean.js';
import { turningPointsInto } from './turningPoints.js';

export interface SegmentationOptions {
  /** Running-mean window, normally one orbital period of the planet (days). */
  smoothingDays: number;
  /** Reversal of φ̄ needed to make a turning point (deg); default 3 [design: "a few degrees", note §6]. */
  hysteresisDeg?: number;
}

export const DEFAULT_HYSTERESIS_DEG = 3;

/** Whether the unwrapped interval [lo, hi] (rad) passes over the direction c (mod 2π). */
function covers(loRad: number, hiRad: number, cRad: number): boolean {
  return cRad + TWO_PI * Math.floor((hiRad - cRad) / TWO_PI) >= loRad;
}

/**
 * The state of a piece of φ̄ covering [lo, hi] (unwrapped rad), design note §6 [design]:
 * ≥ one full turn: passing; over 0 and 180°, or 0 and a ±60° centre: compound; over 0 only:
 * quasi-satellite; over 180° without 0: horseshoe; otherwise the side of the planet it
 * stays on: tadpole-L4 (0°, 180°) or tadpole-L5 (−180°, 0°).
 */
export function classifyRange(loRad: number, hiRad: number): CoorbitalState {
  if (hiRad - loRad >= TWO_PI) return 'passing';
  const zero = covers(loRad, hiRad, 0);
  const half = covers(loRad, hiRad, Math.PI);
  const centres = covers(loRad, hiRad, Math.PI / 3) || covers(loRad, hiRad, -Math.PI / 3);
  if (zero) return half || centres ? 'compound' : 'quasi-satellite';
  if (half) return 'horseshoe';
  return wrapPi(0.5 * (loRad + hiRad)) > 0 ? 'tadpole-L4' : 'tadpole-L5';
}

/** Minimum and maximum of values[a..b] (inclusive) into mm[0], mm[1]. */
function rangeInto(values: Float64Array, a: number, b: number, mm: Float64Array): void {
  let lo = Infinity, hi = -Infinity;
  for (let k = a; k <= b; k++) {
    const v = values[k];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  mm[0] = lo;
  mm[1] = hi;
}

/** φ in degrees wrapped to (−180°, 180°]. */
function wrapDeg180(rad: number): number {
  return -wrapPi(-rad) * DEG_PER_RAD;
}

/**
 * One segment over samples [a, b] made of `pieces` pieces, `complete` of them bounded by
 * turning points on both sides, those spanning [tpFirst, tpLast] (sample indices).
 */
function makeSegment(
  state: CoorbitalState, times: Float64Array, phiBar: Float64Array, a: number, b: number,
  complete: number, tpFirst: number, tpLast: number, endJd: number, mm: Float64Array,
): CoorbitalSegment {
  rangeInto(phiBar, a, b, mm);
  let periodYears = NaN;
  let centreDeg = NaN, amplitudeDeg = NaN;
  if (state === 'passing') {
    // Circulation: the time per turn of φ̄ (the synodic period) [design].
    const turns = Math.abs(phiBar[b] - phiBar[a]) / TWO_PI;
    if (turns >= 1) periodYears = (times[b] - times[a]) / turns / DAYS_PER_JULIAN_YEAR;
  } else {
    if (state === 'horseshoe' || state === 'compound') {
      // The middle of the range: a horseshoe lingers near its turning points beside the
      // planet, so its time-weighted mean points at the planet (0°) instead of at L3 (180°).
      centreDeg = wrapDeg180(0.5 * (mm[0] + mm[1]));
    } else {
      let s = 0, c = 0;
      for (let k = a; k <= b; k++) { s += Math.sin(phiBar[k]); c += Math.cos(phiBar[k]); }
      centreDeg = wrapDeg180(Math.atan2(s, c)); // circular mean (common practice)
    }
    amplitudeDeg = 0.5 * (mm[1] - mm[0]) * DEG_PER_RAD;
    // A libration cycle is two half-cycles.
    if (complete >= 2) periodYears = (2 * (times[tpLast] - times[tpFirst])) / complete / DAYS_PER_JULIAN_YEAR;
  }
  return { state, startJdTDB: times[a], endJdTDB: endJd, centreDeg, amplitudeDeg, periodYears };
}

/**
 * Segments of a sampled φ(t): `timesJd` ascending (JD TDB), `phiUnwrappedRad` unwrapped
 * (resonantAngle.ts), both finite. In time order, covering [t_0, t_last]; each segment's end is
 * the next one's start, the last ends at the last sample.
 */
export function segmentResonantAngle(
  timesJd: Float64Array, phiUnwrappedRad: Float64Array, opts: SegmentationOptions,
): CoorbitalSegment[] {
  const n = timesJd.length;
  if (phiUnwrappedRad.length !== n) throw new RangeError(`segments: ${n} times but ${phiUnwrappedRad.length} angles`);
  if (n < 2) throw new RangeError(`segments: need at least 2 samples, got ${n}`);
  for (let k = 0; k < n; k++) {
    if (!Number.isFinite(phiUnwrappedRad[k]) || !Number.isFinite(timesJd[k])) {
      throw new RangeError(`segments: non-finite sample ${k}: t=${timesJd[k]}, φ=${phiUnwrappedRad[k]}`);
    }
  }
  const phiBar = new Float64Array(n);
  runningMeanInto(timesJd, phiUnwrappedRad, opts.smoothingDays, phiBar);
  const tp = new Int32Array(n);
  const nTp = turningPointsInto(phiBar, (opts.hysteresisDeg ?? DEFAULT_HYSTERESIS_DEG) * RAD_PER_DEG, tp);
  return mergePieces(timesJd, phiBar, tp, nTp);
}

/** A stretch of φ̄ between turning points (or a series end): samples [a, b]. */
interface Piece {
  a: number;
  b: number;
  state: CoorbitalState;
  complete: boolean; // bounded by turning points on both sides: a libration half-cycle
}

/** The pieces cut by the turning points, classified (one object per half-cycle). */
function classifiedPieces(phiBar: Float64Array, tp: Int32Array, nTp: number, mm: Float64Array): Piece[] {
  const pieces: Piece[] = [];
  for (let p = 0; p <= nTp; p++) {
    const a = p === 0 ? 0 : tp[p - 1];
    const b = p === nTp ? phiBar.length - 1 : tp[p];
    rangeInto(phiBar, a, b, mm);
    pieces.push({ a, b, state: classifyRange(mm[0], mm[1]), complete: p > 0 && p < nTp });
  }
  if (nTp >= 2) {
    adoptIfInside(phiBar, pieces[0], pieces[1], mm);
    adoptIfInside(phiBar, pieces[nTp], pieces[nTp - 1], mm);
  }
  return pieces;
}

/**
 * An end piece cut by the window takes the state of its neighbouring half-cycle when its
 * range of φ̄ lies inside the neighbour's: it is part of the same libration [design].
 */
function adoptIfInside(phiBar: Float64Array, end: Piece, neighbour: Piece, mm: Float64Array): void {
  rangeInto(phiBar, end.a, end.b, mm);
  const lo = mm[0], hi = mm[1];
  rangeInto(phiBar, neighbour.a, neighbour.b, mm);
  if (neighbour.complete && lo >= mm[0] && hi <= mm[1]) end.state = neighbour.state;
}

/**
 * A lone half-cycle that passes over both 0 and 180° (compound, or a full turn: passing)
 * between two different libration states is the switch from one to the other [design]: a
 * quasi-satellite ↔ horseshoe switch passes over both within one half-cycle, since the two
 * kinds turn on opposite sides of the planet, and covers about a full turn doing so.
 */
function isSwitch(pieces: readonly Piece[], p: number): boolean {
  if (p < 1 || p + 1 >= pieces.length || !pieces[p].complete) return false;
  const s = pieces[p].state, before = pieces[p - 1].state, after = pieces[p + 1].state;
  const libration = (x: CoorbitalState): boolean => x !== 'compound' && x !== 'passing';
  return (s === 'compound' || s === 'passing') && before !== after && libration(before) && libration(after);
}

/** Where a switch piece leaves the range of φ̄ of the half-cycle before it: the boundary [design]. */
function switchSample(phiBar: Float64Array, before: Piece, sw: Piece, mm: Float64Array): number {
  rangeInto(phiBar, before.a, before.b, mm);
  for (let k = sw.a + 1; k <= sw.b; k++) if (phiBar[k] > mm[1] || phiBar[k] < mm[0]) return k;
  return sw.a;
}

/** Merge runs of pieces of one state into segments; a switch piece is split between its neighbours. */
function mergePieces(times: Float64Array, phiBar: Float64Array, tp: Int32Array, nTp: number): CoorbitalSegment[] {
  const n = times.length;
  const mm = new Float64Array(2);
  const pieces = classifiedPieces(phiBar, tp, nTp, mm);
  const segments: CoorbitalSegment[] = [];
  let i = 0, start = 0;
  while (i < pieces.length) {
    let j = i;
    while (j + 1 < pieces.length && pieces[j + 1].state === pieces[i].state) j++;
    let complete = 0, tpFirst = -1, tpLast = -1;
    for (let p = i; p <= j; p++) {
      if (!pieces[p].complete) continue;
      if (complete++ === 0) tpFirst = pieces[p].a;
      tpLast = pieces[p].b;
    }
    const sw = isSwitch(pieces, j + 1);
    const end = j + 1 >= pieces.length ? n - 1 : sw ? switchSample(phiBar, pieces[j], pieces[j + 1], mm) : pieces[j + 1].a;
    segments.push(makeSegment(pieces[i].state, times, phiBar, start, end, complete, tpFirst, tpLast, times[end], mm));
    start = end;
    i = sw ? j + 2 : j + 1;
  }
  return segments;
}
