/**
 * Completing a row's element set: a from q or q from a, and mean anomaly from perihelion
 * time or the reverse, for rows that passed validation. Conic relations: q = a(1 − e);
 * mean motion n = k·|a|^(−3/2) rad/day (Gaussian constant; Danby 1992, Fundamentals of
 * Celestial Mechanics, §6.3), M = n·(t − tp).
 */
import { GAUSS_K, RAD_PER_DEG } from '../core/constants.js';
import { wrapTwoPi } from '../core/math.js';
import type { OrbitRow } from '../io/types.js';

/** Elements a catalogue row needs, derived from whichever set the input gave. */
export interface CompleteElements {
  aAu: number; // negative for hyperbolic, Infinity for parabolic
  qAu: number;
  meanAnomalyRad: number; // NaN for e ≥ 1
  tpJdTT: number; // NaN only when it cannot be derived
}

/** Derive the complete element set into `out`. Assumes invalidReason(row) === null. */
export function completeElements(row: OrbitRow, out: CompleteElements): void {
  const e = row.e;
  let a = row.aAu;
  let q = row.qAu;
  if (Number.isNaN(q)) q = a * (1 - e);
  if (Number.isNaN(a)) a = e === 1 ? Infinity : q / (1 - e);
  out.aAu = a;
  out.qAu = q;
  const nRadPerDay = e < 1 ? GAUSS_K / Math.pow(a, 1.5) : NaN;
  if (!Number.isNaN(row.meanAnomalyDeg) && e < 1) {
    const m = row.meanAnomalyDeg * RAD_PER_DEG;
    out.meanAnomalyRad = m;
    // Perihelion time nearest the epoch: M in (−π, π] before subtraction.
    const mCentred = m > Math.PI ? m - 2 * Math.PI : m;
    out.tpJdTT = Number.isFinite(row.tpJdTT) ? row.tpJdTT : row.epochJdTT - mCentred / nRadPerDay;
  } else {
    out.tpJdTT = row.tpJdTT;
    out.meanAnomalyRad = e < 1 ? wrapTwoPi(nRadPerDay * (row.epochJdTT - row.tpJdTT)) : NaN;
  }
}
