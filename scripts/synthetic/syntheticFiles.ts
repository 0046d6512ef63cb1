/**
 * Files of one synthetic body: its astrometry (80-column records and/or ADES PSV, through the
 * project's writers), its elements row (one-line orbit export format) and a CSV of each
 * observation's truth (true place, noise added, outlier or not, geometry). Each file is written
 * to a temporary sibling and renamed into place (atomic); the same result gives the same bytes.
 */
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DEG_PER_RAD } from '../../src/core/constants.js';
import { formatAdesPsv, formatObs80Record } from '../../src/io/astrometry/index.js';
import type { SyntheticObservation } from '../../src/fit/synthetic/types.js';

export type SyntheticFormat = 'obs80' | 'ades' | 'both';

export interface SyntheticFileSet {
  dir: string;
  name: string; // file stem
  format: SyntheticFormat;
  elementsLine: string;
  observations: readonly SyntheticObservation[];
  adesHeader?: { keyword: string; entries: [string, string][] }[];
}

/** Writes `text` to `path` through a temporary sibling and a rename. */
export function writeFileAtomic(path: string, text: string): void {
  const tmp = `${path}.tmp-${process.pid}`;
  writeFileSync(tmp, text);
  renameSync(tmp, path);
}

const TRUTH_HEADER = 'line,time_jd_utc,station,tracklet,apparition,true_ra_deg,true_dec_deg,noise_ra_cos_dec_arcsec,noise_dec_arcsec,sigma_arcsec,outlier,sun_altitude_deg,body_altitude_deg,solar_elongation_deg,distance_au';

function truthCsv(obs: readonly SyntheticObservation[]): string {
  const rows = obs.map((s, k) => [
    k + 1, s.observation.timeJdUtc.toFixed(6), s.observation.station, s.tracklet, s.apparition,
    (s.trueRaRad * DEG_PER_RAD).toFixed(9), (s.trueDecRad * DEG_PER_RAD).toFixed(9),
    s.noiseRaCosDecArcsec.toFixed(4), s.noiseDecArcsec.toFixed(4), s.observation.sigmaDecArcsec.toFixed(3), s.outlier ? 1 : 0,
    s.sunAltitudeDeg.toFixed(2), s.bodyAltitudeDeg.toFixed(2), s.solarElongationDeg.toFixed(2), s.distanceAu.toFixed(6),
  ].join(','));
  return [TRUTH_HEADER, ...rows].join('\n') + '\n';
}

/** Writes the set; returns the paths written, in order. */
export function writeSyntheticFiles(set: SyntheticFileSet): string[] {
  mkdirSync(set.dir, { recursive: true });
  const paths: string[] = [];
  const put = (file: string, text: string): void => {
    const p = join(set.dir, file);
    writeFileAtomic(p, text);
    paths.push(p);
  };
  const obs = set.observations.map((s) => s.observation);
  if (set.format !== 'ades') put(`${set.name}.obs80.txt`, obs.flatMap((o) => formatObs80Record(o, { dateDecimals: 6 })).join('\n') + '\n');
  if (set.format !== 'obs80') put(`${set.name}.psv`, formatAdesPsv(obs, { header: set.adesHeader, timeDecimals: 3, angleDecimals: 7 }));
  put(`${set.name}-elements.txt`, set.elementsLine + '\n');
  put(`${set.name}-observations.csv`, truthCsv(set.observations));
  return paths;
}
