/**
 * The candidate row of one co-orbital body: the class is its state now (from the N-body
 * history when it was confirmed, else the averaged problem's prediction), the score the
 * firmness and duration of that state, the sentence what a person needs to judge it.
 *
 * Score (libration cycles): for a confirmed body, the number of libration periods it stays
 * in its present resonant state within the integrated window, minus one — so a state held
 * for less than one full cycle scores ≤ 0 and is a boundary case: a transient, or a state
 * the window is too short to establish (held over the whole window but shorter than one
 * period, as for Neptune's Trojans over ±500 years: flag 'window-shorter-than-period'). A body not
 * confirmed (time budget, an orbit too poor to integrate, the window outside the ephemeris)
 * scores 0 and is a boundary case flagged 'coorbital-unconfirmed': a prediction alone.
 */
import { DAYS_PER_JULIAN_YEAR, DEG_PER_RAD, KM_PER_AU } from '../core/constants.js';
import type { CoorbitalHistory, CoorbitalPrediction, CoorbitalSegment, CoorbitalState } from '../core/coorbital/types.js';
import { qualityNames, type Catalogue } from '../clean/types.js';
import type { ZoneEntry } from './coorbitalZone.js';
import type { Candidate } from './types.js';

/** Everything the detector learnt about one screened body. */
export interface CoorbitalBodyResult {
  entry: ZoneEntry;
  prediction: CoorbitalPrediction;
  history: CoorbitalHistory | null; // null when not confirmed
  unconfirmedReason: string; // why history is null; '' when confirmed
}

/** The segment of the history that holds the epoch. */
export function segmentAtEpoch(h: CoorbitalHistory): CoorbitalSegment | undefined {
  return h.segments.find((s) => s.startJdTDB <= h.epochJdTDB && h.epochJdTDB < s.endJdTDB) ?? h.segments[h.segments.length - 1];
}

/** The state now: confirmed if there is a history, else predicted. */
export function stateNow(r: CoorbitalBodyResult): CoorbitalState {
  return r.history ? r.history.stateAtEpoch : r.prediction.state;
}

function round(x: number, digits: number): number {
  return Number.isFinite(x) ? Number(x.toFixed(digits)) : x;
}

const yearsOf = (days: number) => days / DAYS_PER_JULIAN_YEAR;

/** Whether the state now is the only one over the whole integrated window. */
function heldWholeWindow(h: CoorbitalHistory): boolean {
  return h.segments.length === 1;
}

/** Score and the duration it rests on (see the file comment). */
function firmness(r: CoorbitalBodyResult): { score: number; years: number; periodYears: number } {
  if (!r.history) return { score: 0, years: NaN, periodYears: r.prediction.periodYears };
  const seg = segmentAtEpoch(r.history);
  if (!seg) return { score: 0, years: 0, periodYears: NaN };
  const years = yearsOf(seg.endJdTDB - seg.startJdTDB);
  const periodYears = Number.isFinite(seg.periodYears) ? seg.periodYears : r.prediction.periodYears;
  const cycles = Number.isFinite(periodYears) && periodYears > 0 ? years / periodYears : 0;
  return { score: round(cycles - 1, 4), years, periodYears };
}

function whyFor(r: CoorbitalBodyResult, state: CoorbitalState, f: ReturnType<typeof firmness>): string {
  const p = r.entry.planet[0].toUpperCase() + r.entry.planet.slice(1);
  const pred = r.prediction;
  if (!r.history) {
    return `Predicted ${state} of ${p} by the averaged problem (φ ${(r.entry.phiRad * DEG_PER_RAD).toFixed(1)}° now, ` +
      `libration about ${pred.centreDeg.toFixed(0)}° between ${pred.phiMinDeg.toFixed(0)}° and ${pred.phiMaxDeg.toFixed(0)}°, ` +
      `period ≈ ${pred.periodYears.toFixed(0)} yr); not confirmed by N-body: ${r.unconfirmedReason}.`;
  }
  const seg = segmentAtEpoch(r.history)!;
  const agree = pred.state === state ? 'as predicted' : `predicted ${pred.state}`;
  const close = r.history.minDistanceAu;
  return `${state} of ${p} now (${agree}): φ librates about ${seg.centreDeg.toFixed(0)}° with amplitude ${seg.amplitudeDeg.toFixed(0)}°, ` +
    `period ${f.periodYears.toFixed(0)} yr, held ${f.years.toFixed(0)} yr of the integrated window (score ${f.score.toFixed(2)} cycles beyond the first); ` +
    `closest approach ${close.toFixed(4)} au (${Math.round(close * KM_PER_AU).toLocaleString('en-US')} km)` +
    (f.score < 0 && heldWholeWindow(r.history) ? '; the window is shorter than one libration period, so the state is not established: integrate longer.' : '.');
}

/** The candidate of a body whose state now is resonant, or null for a passing body. */
export function coorbitalCandidate(cat: Catalogue, r: CoorbitalBodyResult, tailFraction: number, tailPopulation: number): Candidate | null {
  const state = stateNow(r);
  if (state === 'passing') return null;
  const f = firmness(r);
  const flags: string[] = qualityNames(cat.quality[r.entry.index]);
  if (!r.history) flags.push('coorbital-unconfirmed');
  if (r.history && r.history.captures.length > 0) flags.push('temporary-capture');
  if (r.prediction.closeApproach) flags.push('close-approach-averaging-unreliable');
  if (r.history && f.score < 0 && heldWholeWindow(r.history)) flags.push('window-shorter-than-period');
  const k = r.entry.index;
  return {
    designation: cat.designation[k], index: k, detector: 'coorbital', class: state,
    boundary: f.score <= 0, score: f.score, tailFraction, tailPopulation, falseAlarmProb: NaN,
    flags, why: whyFor(r, state, f), details: coorbitalDetails(r, f),
  };
}

function coorbitalDetails(r: CoorbitalBodyResult, f: ReturnType<typeof firmness>): Record<string, number | string> {
  const h = r.history;
  const seg = h ? segmentAtEpoch(h) : undefined;
  return {
    planet: r.entry.planet,
    delta_a_over_a: round(r.entry.x, 7),
    phi_deg: round(r.entry.phiRad * DEG_PER_RAD, 3),
    predicted: r.prediction.state,
    predicted_period_yr: round(r.prediction.periodYears, 1),
    separatrix_margin: round(r.prediction.separatrixMargin, 3),
    confirmed: h ? h.stateAtEpoch : 'not confirmed',
    agree: h ? String(h.stateAtEpoch === r.prediction.state) : '',
    centre_deg: seg ? round(seg.centreDeg, 1) : '',
    amplitude_deg: seg ? round(seg.amplitudeDeg, 1) : '',
    period_yr: round(f.periodYears, 1),
    held_yr: Number.isFinite(f.years) ? round(f.years, 1) : '',
    min_distance_au: h ? round(h.minDistanceAu, 6) : '',
    min_distance_jd_tdb: h ? round(h.minDistanceJdTDB, 3) : '',
    captures: h ? h.captures.length : '',
    unconfirmed_reason: r.unconfirmedReason,
  };
}
