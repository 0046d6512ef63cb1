/**
 * One body's fitted Chebyshev segments as plain data, so a filled cache can be handed to
 * other threads (postMessage / structuredClone copies it) or filled by several threads, one
 * set of bodies each, and merged: the coefficients are the same numbers whichever thread
 * fitted them, so results do not depend on the number of threads.
 */
import type { EphemerisBody } from '../types.js';

export interface CacheBodyTable {
  readonly body: EphemerisBody;
  /** Everything that decides the coefficients; an import must match it exactly. */
  readonly startJdTDB: number;
  readonly endJdTDB: number;
  readonly segmentDays: number;
  readonly segmentCount: number;
  readonly coefficients: number;
  readonly stride: number;
  readonly velocity: string;
  readonly fillMethod: string;
  readonly fitToleranceAu: number;
  readonly sourceName: string;
  /** Coefficients of segment s at s*stride; built[s] = 1 where segment s is fitted. */
  readonly coeffs: Float64Array;
  readonly built: Uint8Array;
}

const KEYS = [
  'startJdTDB', 'endJdTDB', 'segmentDays', 'segmentCount', 'coefficients', 'stride', 'velocity',
  'fillMethod', 'fitToleranceAu', 'sourceName',
] as const;

/** RangeError naming the first field where `table` does not describe the same segments as `own`. */
export function assertSameTable(own: Omit<CacheBodyTable, 'coeffs' | 'built'>, table: CacheBodyTable): void {
  for (const key of KEYS) {
    if (own[key] !== table[key]) {
      throw new RangeError(
        `cache table for '${table.body}' does not match this cache: ${key} ${String(table[key])} ≠ ${String(own[key])}`,
      );
    }
  }
  if (table.coeffs.length !== table.segmentCount * table.stride || table.built.length !== table.segmentCount) {
    throw new RangeError(`cache table for '${table.body}': arrays of ${table.coeffs.length} and ${table.built.length} do not fit ${table.segmentCount} segments`);
  }
}
