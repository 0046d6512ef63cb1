/**
 * Which candidate nights are observed, and when: the candidate nights (./candidateNights.ts)
 * fall into apparitions (a gap longer than `apparitionGapDays` starts a new one); tracklets
 * are handed to the apparitions in turn, each to a night drawn at random among that
 * apparition's unused candidate nights (so the nights spread over the weeks the body is in
 * reach). A tracklet is perNightMin–perNightMax observations (uniform), consecutive ones
 * spacingMin–spacingMax minutes apart (uniform), started at a uniform instant of the night's
 * window that leaves room for all of them; the last tracklet takes what is left of the count
 * (never fewer than perNightMin unless the count itself is smaller). Each instant is put on the
 * written time grid (1e-5 or 1e-6 day) and checked against the rules exactly; a tracklet with
 * an instant that fails is dropped and the night not used again.
 */
import type { Random } from '../../core/random.js';
import type { CandidateNight } from './candidateNights.js';
import type { CadenceRules } from './types.js';

export interface PlannedTracklet {
  night: CandidateNight;
  apparition: number;
  timesJdUtc: number[]; // on the time grid, ascending
}

/** Apparition index of each candidate (candidates sorted by window start). */
export function apparitionsOf(sorted: readonly CandidateNight[], gapDays: number): number[] {
  const out: number[] = [];
  let a = 0;
  for (let k = 0; k < sorted.length; k++) {
    if (k > 0 && sorted[k].windowStartJdUtc - sorted[k - 1].windowStartJdUtc > gapDays) a++;
    out.push(a);
  }
  return out;
}

/** An instant put on the grid of 10^-decimals of the UTC day. */
export function onTimeGrid(jdUtc: number, decimals: number): number {
  const midnight = Math.floor(jdUtc - 0.5) + 0.5;
  const scale = 10 ** decimals;
  return midnight + Math.round((jdUtc - midnight) * scale) / scale;
}

function uniformIn(random: Random, lo: number, hi: number): number {
  return lo + (hi - lo) * random();
}

/** Observations of the next tracklet when `remaining` are still to be placed. */
function trackletSize(random: Random, remaining: number, c: CadenceRules): number {
  let k = Math.min(remaining, c.perNightMin + Math.floor((c.perNightMax - c.perNightMin + 1) * random()));
  const left = remaining - k;
  if (left > 0 && left < c.perNightMin) k = remaining <= c.perNightMax ? remaining : remaining - c.perNightMin;
  return k;
}

/**
 * Tracklets for `count` observations; `accept(times, night)` checks the gridded instants.
 * Draws from `random` in a fixed order, so the same inputs give the same plan.
 */
export function planTracklets(candidates: readonly CandidateNight[], count: number, cadence: CadenceRules, dateDecimals: number,
  random: Random, accept: (timesJdUtc: readonly number[], night: CandidateNight) => boolean): { tracklets: PlannedTracklet[]; apparitions: number } {
  const sorted = [...candidates].sort((a, b) => a.windowStartJdUtc - b.windowStartJdUtc || a.station - b.station);
  const app = apparitionsOf(sorted, cadence.apparitionGapDays);
  const nApp = sorted.length === 0 ? 0 : app[app.length - 1] + 1;
  const pools: number[][] = Array.from({ length: nApp }, () => []);
  sorted.forEach((_, k) => pools[app[k]].push(k));
  const tracklets: PlannedTracklet[] = [];
  let remaining = count;
  let turn = 0;
  let open = pools.filter((p) => p.length > 0).length;
  while (remaining > 0 && open > 0) {
    const a = turn++ % nApp;
    const pool = pools[a];
    if (pool.length === 0) continue;
    const j = Math.floor(random() * pool.length);
    const night = sorted[pool[j]];
    pool[j] = pool[pool.length - 1];
    pool.pop();
    if (pool.length === 0) open--;
    let k = trackletSize(random, remaining, cadence);
    const gaps: number[] = [];
    for (let g = 1; g < k; g++) gaps.push(uniformIn(random, cadence.spacingMinMinutes, cadence.spacingMaxMinutes) / 1440);
    const windowDays = night.windowEndJdUtc - night.windowStartJdUtc;
    let span = gaps.reduce((s, g) => s + g, 0);
    while (k > Math.min(cadence.perNightMin, remaining) && span > windowDays) {
      k--;
      span -= gaps.pop()!;
    }
    const u = random();
    const left = remaining - k;
    if (span > windowDays || (left > 0 && left < cadence.perNightMin)) continue; // no room, or a lone observation would be left
    const start = night.windowStartJdUtc + u * (windowDays - span);
    const times = [start];
    for (const g of gaps) times.push(times[times.length - 1] + g);
    const gridded = times.map((t) => onTimeGrid(t, dateDecimals));
    if (!accept(gridded, night)) continue;
    tracklets.push({ night, apparition: a, timesJdUtc: gridded });
    remaining -= k;
  }
  return { tracklets, apparitions: nApp };
}
