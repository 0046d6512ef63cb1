/**
 * Synthetic astrometry of one body, made with the project's own dynamics and observation model:
 *
 * 1. The truth orbit is integrated once over the span at 0h TDB of every day (./truthTrajectory.ts:
 *    Sun, eight planets, optional 1PN, A1/A2/A3, radiation pressure); between those days the
 *    body is carried by two-body motion from the nearest day (≤ 0.5 d: enough to decide
 *    visibility and to estimate the light time, never used for a place).
 * 2. Candidate station-nights (./candidateNights.ts) and the tracklets placed on them
 *    (./tracklets.ts), every instant on the written UTC time grid and checked exactly.
 * 3. The place of each observation: the light time estimated from the daily states, the body
 *    integrated again to exactly that emission instant, and the astrometric place computed by
 *    the fit's model (../astrometricPlace.ts, ../observerPosition.ts: light-time iteration from
 *    that state by two-body motion over the microseconds it moves, observer from the site,
 *    ICRF, frame bias), so a fit with the same dynamics sees the truth up to the noise.
 * 4. Noise: each of Δ(α cos δ) and Δδ normal with the station's σ; an observation is an outlier
 *    with probability `outlierRate` and is then displaced instead by a uniform
 *    [outlierArcsec] amount in a uniform direction.
 *
 * Times: drawn in UTC; TT through the leap-second table (so from 1972 on), TDB through the
 * core. All randomness from one seeded stream in a fixed order (cadence, then noise in time
 * order): the same request gives the same numbers bit for bit.
 */
import { GM_SUN_AU3_PER_DAY2, MJD_OFFSET, RAD_PER_ARCSEC } from '../../core/constants.js';
import { wrapTwoPi } from '../../core/math.js';
import { propagateTwoBody } from '../../core/orbit/universal.js';
import { planetaryEphemerisOver } from '../../core/propagate/propagateOrbit.js';
import { normalDeviate, seededRandom, type Random } from '../../core/random.js';
import { FIRST_LEAP_MJD_UTC } from '../../core/time/leapSeconds.js';
import type { Ephemeris } from '../../core/types.js';
import type { AstrometryObservation } from '../../io/astrometry/types.js';
import { computeAstrometricPlace } from '../astrometricPlace.js';
import { jdTTToTDB, observerHeliocentricState } from '../observerPosition.js';
import { findCandidateNights, ttMinusUtcDays, type BodyPositionFn, type CandidateNight } from './candidateNights.js';
import { planTracklets, type PlannedTracklet } from './tracklets.js';
import { truthStates } from './truthTrajectory.js';
import type { CadenceRules, SyntheticObservation, SyntheticRequest, SyntheticResult, SyntheticStation } from './types.js';
import { DEFAULT_VISIBILITY, isObservable, observingGeometry } from './visibility.js';

/** Defaults: 2–5 observations a night 20–30 min apart (common practice of surveys); 15-min scan; 60-day apparition gap. */
export const DEFAULT_CADENCE: CadenceRules = Object.freeze({
  perNightMin: 2, perNightMax: 5, spacingMinMinutes: 20, spacingMaxMinutes: 30, scanStepMinutes: 15, apparitionGapDays: 60,
});

/** RA resolution written (0.001 s of time) and Dec (0.01″): the finest the 80-column record holds. */
export const SYNTHETIC_RA_RESOLUTION_ARCSEC = 0.015;
export const SYNTHETIC_DEC_RESOLUTION_ARCSEC = 0.01;

function checkRequest(r: SyntheticRequest, cadence: CadenceRules): void {
  if (!(Number.isFinite(r.startJdUtc) && Number.isFinite(r.endJdUtc) && r.endJdUtc > r.startJdUtc)) {
    throw new RangeError(`synthetic astrometry: span ${r.startJdUtc}–${r.endJdUtc} is not a finite, non-empty span`);
  }
  if (r.startJdUtc - MJD_OFFSET < FIRST_LEAP_MJD_UTC) throw new RangeError('synthetic astrometry: the span must start in 1972 or later (TT from the leap-second table)');
  if (!Number.isInteger(r.count) || r.count < 1) throw new RangeError(`synthetic astrometry: count ${r.count} is not a positive integer`);
  if (!Number.isInteger(r.seed)) throw new RangeError(`synthetic astrometry: seed ${r.seed} is not an integer`);
  if (!(r.outlierRate >= 0 && r.outlierRate <= 1)) throw new RangeError(`synthetic astrometry: outlier rate ${r.outlierRate} not in [0, 1]`);
  if (!(r.outlierArcsec[0] >= 0 && r.outlierArcsec[1] >= r.outlierArcsec[0])) throw new RangeError(`synthetic astrometry: outlier displacement [${r.outlierArcsec.join(', ')}]″ is not a range`);
  if (r.stations.length === 0) throw new RangeError('synthetic astrometry: no stations');
  for (const s of r.stations) {
    if (!(s.sigmaArcsec > 0)) throw new RangeError(`synthetic astrometry: station ${s.site.code} σ ${s.sigmaArcsec}″ is not positive`);
  }
  if (!(cadence.perNightMin >= 1 && cadence.perNightMax >= cadence.perNightMin && cadence.spacingMinMinutes > 0
    && cadence.spacingMaxMinutes >= cadence.spacingMinMinutes && cadence.scanStepMinutes > 0)) {
    throw new RangeError(`synthetic astrometry: cadence rules are not consistent: ${JSON.stringify(cadence)}`);
  }
}

/** Daily truth states over the span and the two-body carry between them. */
function dailyTruth(r: SyntheticRequest, eph: Ephemeris): BodyPositionFn {
  const first = Math.floor(r.startJdUtc) - 1;
  const days = Math.ceil(r.endJdUtc) + 2 - first;
  const times = Float64Array.from({ length: days }, (_, k) => first + k);
  const states = truthStates(r.truth, eph, times);
  const tmp = new Float64Array(6);
  return (jdTDB, out) => {
    const k = Math.min(days - 1, Math.max(0, Math.round(jdTDB - first)));
    propagateTwoBody(states.subarray(6 * k, 6 * k + 6), jdTDB - times[k], GM_SUN_AU3_PER_DAY2, tmp);
    out[0] = tmp[0];
    out[1] = tmp[1];
    out[2] = tmp[2];
  };
}

function readableIds(designation: string): Pick<AstrometryObservation, 'designation' | 'packed' | 'number' | 'provisional' | 'temporary'> {
  const m = /^\((\d+)\)$/.exec(designation);
  if (m) return { designation, packed: '', number: Number(m[1]), provisional: '', temporary: false };
  return { designation, packed: '', number: NaN, provisional: designation, temporary: false };
}

interface Placed {
  jdUtc: number;
  jdTT: number;
  jdTDB: number;
  station: SyntheticStation;
  tracklet: number;
  apparition: number;
}

function placeInstants(tracklets: readonly PlannedTracklet[], stations: readonly SyntheticStation[]): Placed[] {
  const out: Placed[] = [];
  tracklets.forEach((t, k) => {
    for (const jdUtc of t.timesJdUtc) {
      const jdTT = jdUtc + ttMinusUtcDays(jdUtc);
      out.push({ jdUtc, jdTT, jdTDB: jdTTToTDB(jdTT), station: stations[t.night.station], tracklet: k, apparition: t.apparition });
    }
  });
  return out.sort((a, b) => a.jdUtc - b.jdUtc || a.station.site.code.localeCompare(b.station.site.code));
}

/** Generates the observations of `request` for the body `designation` (readable form). */
export function generateSyntheticAstrometry(designation: string, request: SyntheticRequest): SyntheticResult {
  const visibility = { ...DEFAULT_VISIBILITY, ...request.visibility };
  const cadence = { ...DEFAULT_CADENCE, ...request.cadence };
  checkRequest(request, cadence);
  const dateDecimals = request.dateDecimals ?? 6;
  const epoch = request.truth.elements.epochJdTDB;
  const eph = planetaryEphemerisOver(Math.min(epoch, request.startJdUtc - 2), Math.max(epoch, request.endJdUtc + 3));
  const bodyAt = dailyTruth(request, eph);
  const candidates = findCandidateNights(request.stations, request.startJdUtc, request.endJdUtc, eph, bodyAt, visibility, cadence);
  const random = seededRandom(request.seed);
  const pos = new Float64Array(3);
  const accept = (times: readonly number[], night: CandidateNight): boolean => times.every((t) => {
    const tt = t + ttMinusUtcDays(t);
    bodyAt(jdTTToTDB(tt), pos);
    return isObservable(observingGeometry(request.stations[night.station].site, t, tt, jdTTToTDB(tt), eph, pos), visibility);
  });
  const plan = planTracklets(candidates, request.count, cadence, dateDecimals, random, accept);
  const placed = placeInstants(plan.tracklets, request.stations);
  const observations = observe(designation, placed, request, eph, bodyAt, random);
  return {
    observations, candidateNights: candidates.length, apparitions: plan.apparitions, tracklets: plan.tracklets.length,
    requested: request.count, shortBy: request.count - observations.length,
  };
}

/** Places, geometry and noise of the placed instants (in time order). */
function observe(designation: string, placed: readonly Placed[], r: SyntheticRequest, eph: Ephemeris, bodyAt: BodyPositionFn, random: Random): SyntheticObservation[] {
  const ids = readableIds(designation);
  // the light time from the daily states, then the exact state at each estimated emission instant
  const emit = new Float64Array(placed.length);
  const pos = new Float64Array(3);
  const observers = placed.map((p) => {
    const s = p.station.site;
    return observerHeliocentricState({ kind: 'site', longitudeDegE: s.longitudeDegE, rhoCosPhiPrime: s.rhoCosPhiPrime, rhoSinPhiPrime: s.rhoSinPhiPrime }, p.jdUtc, p.jdTT, eph);
  });
  placed.forEach((p, k) => {
    const rough = computeAstrometricPlace((t, out) => {
      bodyAt(t, out); // position only: the light time is all that is taken from this pass
      out[3] = out[4] = out[5] = 0;
    }, observers[k].positionIcrfAu, p.jdTDB);
    emit[k] = p.jdTDB - rough.lightTimeDays;
  });
  const exact = truthStates(r.truth, eph, emit);
  const out: SyntheticObservation[] = [];
  const tmp = new Float64Array(6);
  placed.forEach((p, k) => {
    const s0 = exact.subarray(6 * k, 6 * k + 6);
    const te = emit[k];
    const place = computeAstrometricPlace((t, o) => {
      propagateTwoBody(s0, t - te, GM_SUN_AU3_PER_DAY2, tmp);
      o.set(tmp);
    }, observers[k].positionIcrfAu, p.jdTDB);
    bodyAt(p.jdTDB, pos);
    const g = observingGeometry(p.station.site, p.jdUtc, p.jdTT, p.jdTDB, eph, pos);
    const sigma = p.station.sigmaArcsec;
    let nx = sigma * normalDeviate(random);
    let ny = sigma * normalDeviate(random);
    const outlier = random() < r.outlierRate;
    if (outlier) {
      const size = r.outlierArcsec[0] + (r.outlierArcsec[1] - r.outlierArcsec[0]) * random();
      const angle = 2 * Math.PI * random();
      nx = size * Math.cos(angle);
      ny = size * Math.sin(angle);
    }
    const decRad = Math.max(-Math.PI / 2, Math.min(Math.PI / 2, place.decRad + ny * RAD_PER_ARCSEC));
    const raRad = wrapTwoPi(place.raRad + (nx * RAD_PER_ARCSEC) / Math.cos(place.decRad));
    out.push({
      observation: {
        ...ids, timeJdUtc: p.jdUtc, timeJdTT: p.jdTT, raRad, decRad, raDecimals: 3, decDecimals: 2,
        raResolutionArcsec: SYNTHETIC_RA_RESOLUTION_ARCSEC, decResolutionArcsec: SYNTHETIC_DEC_RESOLUTION_ARCSEC,
        sigmaRaCosDecArcsec: sigma, sigmaDecArcsec: sigma, correlationRaDec: NaN, station: p.station.site.code, kind: 'optical',
        observerGeocentricKm: null, rovingSite: null, mag: NaN, band: '', note1: '', note2: p.station.note2,
        mode: p.station.note2 === 'P' || p.station.note2 === '' ? 'PHO' : 'CCD', catalogue: '', discovery: false, file: '', line: 0, lines: 1,
      },
      trueRaRad: place.raRad, trueDecRad: place.decRad, noiseRaCosDecArcsec: nx, noiseDecArcsec: ny, outlier,
      apparition: p.apparition, tracklet: p.tracklet,
      sunAltitudeDeg: g.sunAltitudeDeg, bodyAltitudeDeg: g.bodyAltitudeDeg, solarElongationDeg: g.solarElongationDeg, distanceAu: place.distanceAu,
    });
  });
  return out;
}
