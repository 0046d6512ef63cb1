/** Synthetic test rows (invented bodies) with every field a valid asteroid row needs. */
import { emptyOrbitRow, type OrbitRow } from '../../src/io/types.js';

export function asteroidRow(overrides: Partial<OrbitRow> = {}): OrbitRow {
  return {
    ...emptyOrbitRow(),
    designation: '2031 AB7', kind: 'asteroid', epochJdTT: 2_463_000.5,
    aAu: 2.6, e: 0.12, iDeg: 8.5, nodeDeg: 120, periDeg: 45, meanAnomalyDeg: 200,
    H: 15.2, G: 0.15, uncertainty: 1, nObs: 340, nOpp: 9, arcDays: 6000,
    firstObsYear: 2014, lastObsYear: 2030, lastObsJdTT: 2_462_800.5, rmsArcsec: 0.5,
    ...overrides,
  };
}

export function cometRow(overrides: Partial<OrbitRow> = {}): OrbitRow {
  return {
    ...emptyOrbitRow(),
    designation: 'P/2031 C4', kind: 'comet', epochJdTT: 2_463_000.5,
    qAu: 1.4, e: 0.55, iDeg: 11, nodeDeg: 80, periDeg: 170, tpJdTT: 2_462_950.25, H: 13, G: 4,
    ...overrides,
  };
}
