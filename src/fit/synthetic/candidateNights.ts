/**
 * The station-nights on which a body can be observed: for each station and each night of the
 * span, the body is checked at a fixed step through the hours around local midnight, and the
 * longest run of steps at which every visibility rule holds (./visibility.ts) is that night's
 * window. A night is a candidate when its window is at least one tracklet spacing long.
 * Local midnight is taken as 0h UTC − east longitude / 15° per hour (mean solar time, common
 * practice); ±0.4 day about it is scanned. A night whose elongation at local midnight is
 * more than 10° below the limit is skipped without a scan (elongation changes by about 1° a
 * day, a few degrees at the closest approaches of near-Earth bodies).
 */
import { Instant } from '../../core/time/time.js';
import type { Ephemeris } from '../../core/types.js';
import { isObservable, observingGeometry } from './visibility.js';
import type { CadenceRules, SyntheticStation, VisibilityRules } from './types.js';

/** Heliocentric ecliptic position of the body at a TDB instant into out[0..2]. */
export type BodyPositionFn = (jdTDB: number, out: Float64Array) => void;

export interface CandidateNight {
  station: number; // index into the stations
  midnightJdUtc: number; // local midnight
  windowStartJdUtc: number; // first and last scan instants of the visible run
  windowEndJdUtc: number;
}

const HALF_NIGHT_DAYS = 0.4;
const PREFILTER_MARGIN_DEG = 10;

/** TT − UTC (days) at a UTC instant, through the leap-second table. */
export function ttMinusUtcDays(jdUtc: number): number {
  return Instant.fromJd(jdUtc, 'UTC').to('TT').jd - jdUtc;
}

/** Candidate nights of every station over [startJdUtc, endJdUtc), in (night, station) order. */
export function findCandidateNights(stations: readonly SyntheticStation[], startJdUtc: number, endJdUtc: number,
  eph: Ephemeris, bodyAt: BodyPositionFn, visibility: VisibilityRules, cadence: CadenceRules): CandidateNight[] {
  const out: CandidateNight[] = [];
  const pos = new Float64Array(3);
  const step = cadence.scanStepMinutes / 1440;
  const samples = Math.floor((2 * HALF_NIGHT_DAYS) / step) + 1;
  const firstDay = Math.floor(startJdUtc - 0.5) + 0.5; // 0h UTC
  for (let day = firstDay; day < endJdUtc; day += 1) {
    const dTT = ttMinusUtcDays(day);
    for (let s = 0; s < stations.length; s++) {
      const st = stations[s];
      const lonFrac = (((-st.site.longitudeDegE / 360) % 1) + 1) % 1;
      const midnight = day + lonFrac;
      if (midnight < startJdUtc || midnight >= endJdUtc || midnight < st.fromJdUtc || midnight > st.toJdUtc) continue;
      bodyAt(midnight + dTT, pos);
      const g0 = observingGeometry(st.site, midnight, midnight + dTT, midnight + dTT, eph, pos);
      if (g0.solarElongationDeg < visibility.minSolarElongationDeg - PREFILTER_MARGIN_DEG) continue;
      let best = 0, bestStart = -1, run = 0;
      for (let k = 0; k < samples; k++) {
        const t = midnight - HALF_NIGHT_DAYS + k * step;
        bodyAt(t + dTT, pos); // TDB − TT (≤ 1.7 ms) left out: nothing here moves in it
        const ok = isObservable(observingGeometry(st.site, t, t + dTT, t + dTT, eph, pos), visibility);
        run = ok ? run + 1 : 0;
        if (run > best) {
          best = run;
          bestStart = k - run + 1;
        }
      }
      if (best < 2 || (best - 1) * cadence.scanStepMinutes < cadence.spacingMinMinutes) continue;
      const t0 = midnight - HALF_NIGHT_DAYS + bestStart * step;
      out.push({ station: s, midnightJdUtc: midnight, windowStartJdUtc: t0, windowEndJdUtc: t0 + (best - 1) * step });
    }
  }
  return out;
}
