/**
 * Residual means per observing station: a station whose residuals sit off zero in α cos δ or δ
 * (a catalogue or timing bias of that station) can imitate a non-gravitational signal.
 *
 * Per station and coordinate: the weighted mean m = Σ w r / Σ w (w = 1/σ², σ the assumed
 * error), its standard error, and z = m / SE. The standard error is the larger of the one the
 * weights imply, 1/√Σw, and the one the scatter implies, √(Σ w (r − m)² / ((n − 1) Σ w))
 * (n ≥ 2), so a station whose errors are understated is not flagged on that account alone
 * (common practice). The two coordinates together: χ² = z_α² + z_δ² with 2 degrees of freedom
 * (independent coordinates assumed), its p-value, and that p-value times the number of stations
 * (the Bonferroni bound for having looked at every station; common practice).
 * The p-values are tail areas under the null hypothesis "this station's residuals have mean 0".
 */
import { chiSquareSf } from './tailFunctions.js';

export interface StationResiduals {
  /** Station code per observation. */
  station: readonly string[];
  /** Residual in α cos δ per observation, arcsec (observed − computed). */
  raCosDecArcsec: ArrayLike<number>;
  /** Residual in δ per observation, arcsec. */
  decArcsec: ArrayLike<number>;
  /** Assumed 1σ error in α cos δ and in δ per observation, arcsec. */
  sigmaRaArcsec: ArrayLike<number>;
  sigmaDecArcsec: ArrayLike<number>;
}

export interface CoordinateMean {
  meanArcsec: number;
  standardErrorArcsec: number;
  /** mean / standard error. */
  z: number;
}

export interface StationMean {
  station: string;
  /** Observations of this station with finite residuals and positive errors. */
  n: number;
  ra: CoordinateMean;
  dec: CoordinateMean;
  /** z_α² + z_δ². */
  chiSquare: number;
  /** Pr(χ²₂ ≥ chiSquare) under "mean 0". */
  pValue: number;
  /** min(1, pValue × number of stations). */
  pValueAllStations: number;
  /** pValueAllStations below the threshold given. */
  biased: boolean;
}

export interface StationMeansResult {
  stations: StationMean[];
  /** Observations left out: a non-finite residual or a non-positive error. */
  skipped: number;
  /** The threshold `biased` used. */
  pValueThreshold: number;
}

/** Default: 0.0027, the two-sided Gaussian 3σ level. */
export const DEFAULT_STATION_P_THRESHOLD = 0.0027;

function coordinateMean(r: readonly number[], s: readonly number[]): CoordinateMean {
  let sw = 0, swr = 0;
  for (let i = 0; i < r.length; i++) {
    const w = 1 / (s[i] * s[i]);
    sw += w; swr += w * r[i];
  }
  const mean = swr / sw;
  let se = 1 / Math.sqrt(sw);
  if (r.length >= 2) {
    let ss = 0;
    for (let i = 0; i < r.length; i++) ss += (r[i] - mean) ** 2 / (s[i] * s[i]);
    se = Math.max(se, Math.sqrt(ss / ((r.length - 1) * sw)));
  }
  return { meanArcsec: mean, standardErrorArcsec: se, z: mean / se };
}

/** Residual means per station, stations in code order. */
export function stationMeans(res: StationResiduals, pValueThreshold = DEFAULT_STATION_P_THRESHOLD): StationMeansResult {
  const n = res.station.length;
  for (const col of [res.raCosDecArcsec, res.decArcsec, res.sigmaRaArcsec, res.sigmaDecArcsec]) {
    if (col.length !== n) throw new RangeError(`stationMeans: columns of ${col.length} and ${n} observations`);
  }
  if (!(pValueThreshold > 0 && pValueThreshold <= 1)) throw new RangeError(`stationMeans: bad threshold ${pValueThreshold}`);
  const groups = new Map<string, { ra: number[]; sra: number[]; dec: number[]; sdec: number[] }>();
  let skipped = 0;
  for (let i = 0; i < n; i++) {
    const ra = res.raCosDecArcsec[i], dec = res.decArcsec[i], sra = res.sigmaRaArcsec[i], sdec = res.sigmaDecArcsec[i];
    if (!Number.isFinite(ra) || !Number.isFinite(dec) || !(sra > 0) || !(sdec > 0) || !Number.isFinite(sra) || !Number.isFinite(sdec)) {
      skipped++;
      continue;
    }
    let g = groups.get(res.station[i]);
    if (g === undefined) groups.set(res.station[i], (g = { ra: [], sra: [], dec: [], sdec: [] }));
    g.ra.push(ra); g.sra.push(sra); g.dec.push(dec); g.sdec.push(sdec);
  }
  const codes = [...groups.keys()].sort();
  const stations = codes.map((code): StationMean => {
    const g = groups.get(code)!;
    const ra = coordinateMean(g.ra, g.sra);
    const dec = coordinateMean(g.dec, g.sdec);
    const chiSquare = ra.z * ra.z + dec.z * dec.z;
    const pValue = chiSquareSf(chiSquare, 2);
    const pValueAllStations = Math.min(1, pValue * codes.length);
    return { station: code, n: g.ra.length, ra, dec, chiSquare, pValue, pValueAllStations, biased: pValueAllStations < pValueThreshold };
  });
  return { stations, skipped, pValueThreshold };
}
