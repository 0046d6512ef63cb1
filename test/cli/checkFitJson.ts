/** What the `check` tests read of fit.json, and where their inputs are (paths from the repository root). */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

export const DEMO = 'data/demo/check';
export const FIX = 'test/fixtures/astrometry';
export const CODES = `${FIX}/observatory-codes.txt`;
export const SAMPLE = `${FIX}/astrometry-80col-sample.txt`;

interface Param { value: number; sigma: number }
export interface FitJson {
  verdict: string; preferred: string; pValueNullHypothesis: string; gravityRestart: { from: string; firstFailure: string } | null;
  models: Record<string, { params: Record<string, Param & { assumedCR?: number }>; chi2: number; weightedRmsArcsec: number; kept: number; rejected: number; deltaChi2: number; pValue: number | null; deltaBic: number }>;
  guards: { leaveOneStationOut: { drops: { station: string; verdict: string }[] } | null; runsTest: unknown; stationMeans: unknown };
  plausibility: { srp: { judgement: { verdict: string } } | null };
  input: { observationsFitted: number; otherDesignations: { designation: string; observations: number }[]; setAside: { line: number; reason: string }[] };
}

export function fitJson(dir: string): FitJson {
  return JSON.parse(readFileSync(join(dir, 'fit.json'), 'utf8')) as FitJson;
}
