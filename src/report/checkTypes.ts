/**
 * What `check`'s writers need beside the fit (src/fit/check/): the account of the input — the
 * astrometry file, the observations of other designations set aside, the records of the
 * designation a fit could not use (unknown station, date, duplicate) and the lines the readers
 * could not read — and where the fit started.
 */
import type { CheckResult } from '../fit/check/index.js';
import type { AstrometryObservation } from '../io/astrometry/types.js';
import type { InputError } from '../io/types.js';

export interface CheckSetAsideRecord {
  observation: AstrometryObservation;
  reason: string;
}

export interface CheckInputAccount {
  file: string;
  format: string;
  /** Data lines read = lines in observations + lines rejected by the reader. */
  linesRead: number;
  /** Observations the reader gave (every designation). */
  observationsRead: number;
  /** Lines the reader could not read, with file:line and reason. */
  unreadable: InputError[];
  /** Observations of other designations, not fitted. */
  others: { designation: string; observations: number }[];
  /** The designation's records set aside before the fit, in input order. */
  setAside: CheckSetAsideRecord[];
  /** The observatory-code table: its file, or '' for the built-in one. */
  obscodes: string;
  /** 'elements row FILE:LINE' or 'Gauss's method'. */
  start: string;
  /** From the elements row; NaN when unknown. */
  absMagH: number;
}

export interface CheckRun {
  account: CheckInputAccount;
  result: CheckResult;
  /** The models asked for, in order (gravity always first). */
  models: readonly string[];
}
