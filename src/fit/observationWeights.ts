/**
 * The uncertainty an orbit fit gives each observation (σ of α cos δ and of δ, arcsec, and
 * their correlation), and so its weight 1/σ².
 *
 * 1. The record's own: ADES rmsRA (of α cos δ), rmsDec and rmsCorr when given.
 * 2. Else a default by technique, era and station, `defaultSigmaArcsec`:
 *    - CCD (80-column note 2 C or c, ADES mode CCD or CMOS) and space-based positions: the
 *      survey's σ from the table below when the station has one, else 1.0″. The table and the
 *      1.0″ default are the weighting scheme of Vereš et al. 2017 (Icarus 296, 139, "Statistical
 *      analysis of astrometric errors for the most productive asteroid surveys", Table of
 *      per-station σ); the values are from memory of that table, rounded as remembered.
 *    - Photographic and every other technique: 1.5″ from 1950, 3.0″ before (from memory; the
 *      order of the RMS Carpino, Milani & Chesley 2003, Icarus 166, 248, found for
 *      photographic observatories of those eras).
 *    - Never below what the record's written precision allows: one unit of the last written
 *      decimal over √12 (a uniform rounding error; common practice).
 * 3. Per night: N observations of one station in one night are not N independent ones (the
 *    same reference stars, the same timing), so each one's σ is multiplied by √(N/4) when
 *    N > 4 (Vereš et al. 2017, from memory: four observations a night count in full); the
 *    night is the observer's local night, floor(JD_UTC + λ/360°) for east longitude λ
 *    (common practice; space-based and roving records count by UTC day).
 */
import type { AstrometryObservation, ObservatorySite } from '../io/astrometry/types.js';

/** Per-station σ of CCD astrometry, arcsec, with the first year it applies (Vereš et al. 2017, from memory). */
const STATION_SIGMA_ARCSEC: Readonly<Record<string, readonly { fromYear: number; sigma: number }[]>> = Object.freeze({
  F51: [{ fromYear: 0, sigma: 0.2 }], // Pan-STARRS 1
  G96: [{ fromYear: 0, sigma: 0.5 }], // Mt. Lemmon Survey
  '703': [{ fromYear: 0, sigma: 1.0 }, { fromYear: 2014, sigma: 0.8 }], // Catalina Sky Survey (camera change in 2014)
  E12: [{ fromYear: 0, sigma: 0.75 }], // Siding Spring Survey
  '691': [{ fromYear: 0, sigma: 0.6 }], // Spacewatch
  '644': [{ fromYear: 0, sigma: 0.6 }], // NEAT, Palomar
  '699': [{ fromYear: 0, sigma: 0.8 }], // LONEOS
  '704': [{ fromYear: 0, sigma: 1.0 }], // LINEAR
  '568': [{ fromYear: 0, sigma: 0.25 }], // Mauna Kea
  C51: [{ fromYear: 0, sigma: 1.0 }], // WISE / NEOWISE
});

/** σ of CCD astrometry from a station the table does not list, arcsec (Vereš et al. 2017, from memory). */
export const DEFAULT_CCD_SIGMA_ARCSEC = 1.0;
/** σ of photographic and other non-CCD astrometry from 1950 and before it, arcsec (from memory, see the file comment). */
export const PHOTOGRAPHIC_SIGMA_ARCSEC = 1.5;
export const EARLY_PHOTOGRAPHIC_SIGMA_ARCSEC = 3.0;
/** Observations of one station in one night that count in full (Vereš et al. 2017, from memory). */
export const FULL_WEIGHT_PER_NIGHT = 4;

/** JD (UTC) of 1950 January 1.0. */
const JD_1950 = 2433282.5;

/** One observation's uncertainty as the fit uses it. */
export interface ObservationSigma {
  sigmaRaCosDecArcsec: number;
  sigmaDecArcsec: number;
  correlation: number; // of the α cos δ and δ errors, 0 when not given
  source: 'record' | 'default';
  nightCount: number; // observations of the same station that night
  nightFactor: number; // √(N/4) when N > 4, else 1; already applied to the σ above
}

/** Calendar year of a JD (UTC), good to a day (enough for the table's years). */
function yearOf(jd: number): number {
  return 2000 + (jd - 2451544.5) / 365.25;
}

/** Whether the record is CCD-like (or space-based) astrometry. */
function isCcd(o: AstrometryObservation): boolean {
  if (o.kind === 'space') return true;
  if (o.note2 === 'C' || o.note2 === 'c') return true;
  const mode = o.mode.toUpperCase();
  return mode === 'CCD' || mode === 'CMO';
}

/** The default σ (arcsec) of an observation by technique, era and station, before the per-night factor. */
export function defaultSigmaArcsec(o: AstrometryObservation): number {
  let sigma: number;
  if (isCcd(o)) {
    sigma = DEFAULT_CCD_SIGMA_ARCSEC;
    const rows = Object.hasOwn(STATION_SIGMA_ARCSEC, o.station) ? STATION_SIGMA_ARCSEC[o.station] : undefined;
    if (rows) {
      const y = yearOf(o.timeJdUtc);
      for (const r of rows) if (y >= r.fromYear) sigma = r.sigma;
    }
  } else {
    sigma = o.timeJdUtc < JD_1950 ? EARLY_PHOTOGRAPHIC_SIGMA_ARCSEC : PHOTOGRAPHIC_SIGMA_ARCSEC;
  }
  return sigma;
}

/** The local-night key of an observation (see the file comment). */
function nightKey(o: AstrometryObservation, sites: ReadonlyMap<string, ObservatorySite>): string {
  const site = sites.get(o.station);
  const lon = o.kind === 'optical' && site !== undefined && site.fixedSite ? site.longitudeDegE : 0;
  return `${o.station}|${Math.floor(o.timeJdUtc + lon / 360)}`;
}

/**
 * The σ of every observation (see the file comment). `sites` gives the stations' longitudes
 * for the local night. The record's rmsRA/rmsDec are used when both are finite and positive.
 */
export function observationSigmas(obs: readonly AstrometryObservation[], sites: ReadonlyMap<string, ObservatorySite>): ObservationSigma[] {
  const counts = new Map<string, number>();
  const keys = obs.map((o) => nightKey(o, sites));
  for (const k of keys) counts.set(k, (counts.get(k) ?? 0) + 1);
  return obs.map((o, i) => {
    const n = counts.get(keys[i])!;
    const factor = n > FULL_WEIGHT_PER_NIGHT ? Math.sqrt(n / FULL_WEIGHT_PER_NIGHT) : 1;
    const own = o.sigmaRaCosDecArcsec > 0 && o.sigmaDecArcsec > 0 && Number.isFinite(o.sigmaRaCosDecArcsec + o.sigmaDecArcsec);
    let sRa: number, sDec: number;
    if (own) {
      sRa = o.sigmaRaCosDecArcsec; sDec = o.sigmaDecArcsec;
    } else {
      const s = defaultSigmaArcsec(o);
      // Rounding floor: the written RA unit is of α, not α cos δ.
      const raFloor = (Number.isFinite(o.raResolutionArcsec) ? o.raResolutionArcsec : 0) * Math.cos(o.decRad) / Math.sqrt(12);
      const decFloor = (Number.isFinite(o.decResolutionArcsec) ? o.decResolutionArcsec : 0) / Math.sqrt(12);
      sRa = Math.max(s, raFloor); sDec = Math.max(s, decFloor);
    }
    const rho = own && Number.isFinite(o.correlationRaDec) && Math.abs(o.correlationRaDec) < 1 ? o.correlationRaDec : 0;
    return {
      sigmaRaCosDecArcsec: sRa * factor, sigmaDecArcsec: sDec * factor, correlation: rho,
      source: own ? 'record' : 'default', nightCount: n, nightFactor: factor,
    };
  });
}
