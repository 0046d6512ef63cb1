/**
 * Writers against readers, property-based (fast-check, invented rows): a row written by
 * formatOrbitExportLine / formatCometExportLine and read back gives the same values to the
 * resolution of each column of the published layouts (angles 1e-5° in the orbit format and
 * 1e-4° in the comet format, e 1e-7 / 1e-6, perihelion day 1e-4). Worst errors printed in
 * arcsec, au and seconds.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  emptyOrbitRow, formatCometExportLine, formatOrbitExportLine, parseCometExportLine,
  parseOrbitExportLine, unpackDesignation, type OrbitRow,
} from '../../src/io/index.js';
import { isoToJd } from './fixtureCases.js';

const EPOCH = isoToJd('2031-03-15'); // invented common epoch, 0h TT
const angle = fc.double({ min: 0, max: 359.99999, noNaN: true });

describe('orbit export writer ↔ reader (property)', () => {
  it('round-trips invented rows to the column resolution', () => {
    const worst = { angleArcsec: 0, aAu: 0 };
    fc.assert(fc.property(
      fc.integer({ min: 1, max: 15_396_335 }), angle, angle, angle, fc.double({ min: 0, max: 179.99999, noNaN: true }),
      fc.double({ min: 0, max: 0.99, noNaN: true }), fc.double({ min: 0.5, max: 99, noNaN: true }),
      (number, M, peri, node, inc, e, a) => {
        const row: OrbitRow = {
          ...emptyOrbitRow(), number, name: number % 3 === 0 ? 'Invented' : '', H: 15.25, G: 0.15,
          epochJdTT: EPOCH, meanAnomalyDeg: M, periDeg: peri, nodeDeg: node, iDeg: inc, e, aAu: a,
          meanMotionDegPerDay: 0.9856076686 / a ** 1.5, uncertainty: number % 10, reference: 'invented',
          nObs: 42, nOpp: 3, firstObsYear: 2020, lastObsYear: 2031, rmsArcsec: 0.5,
        };
        const line = formatOrbitExportLine(row);
        const back = emptyOrbitRow();
        expect(parseOrbitExportLine(line, back, 'w', 1)).toBe('row');
        expect(back.number).toBe(number);
        expect(back.name).toBe(row.name);
        expect(back.epochJdTT).toBe(EPOCH);
        for (const f of ['meanAnomalyDeg', 'periDeg', 'nodeDeg', 'iDeg'] as const) {
          const d = Math.abs(back[f] - row[f]);
          worst.angleArcsec = Math.max(worst.angleArcsec, d * 3600);
          expect(d).toBeLessThanOrEqual(0.5e-5 + 1e-12);
        }
        expect(Math.abs(back.e - e)).toBeLessThanOrEqual(0.5e-7 + 1e-15);
        worst.aAu = Math.max(worst.aAu, Math.abs(back.aAu - a));
        expect(Math.abs(back.aAu - a)).toBeLessThanOrEqual(0.5e-7 + 1e-12);
        expect(back.uncertainty).toBe(number % 10);
      }), { numRuns: 2000 });
    console.log(`orbit export round trip: worst angle ${worst.angleArcsec.toFixed(4)}″, worst a ${worst.aAu.toExponential(2)} au`);
  });
});

describe('comet export writer ↔ reader (property)', () => {
  const designations = fc.constantFrom('1P', '2P', '12P', '1I', '73P-B', '73P-AA', 'C/1995 O1', 'P/2004 V5-A', 'C/2031 A12', 'P/2030 FY140', 'C/1942 EA');
  it('round-trips invented rows to the column resolution', () => {
    const worst = { angleArcsec: 0, tpSeconds: 0 };
    fc.assert(fc.property(
      designations, fc.double({ min: 0, max: 20000, noNaN: true }), angle, angle, fc.double({ min: 0, max: 179.9999, noNaN: true }),
      fc.double({ min: 0.01, max: 99, noNaN: true }), fc.double({ min: 0, max: 1.5, noNaN: true }),
      (designation, tpOffset, peri, node, inc, q, e) => {
        const row: OrbitRow = {
          ...emptyOrbitRow(), kind: 'comet', designation, name: designation.startsWith('C/1942') ? '' : 'Invented',
          tpJdTT: EPOCH + tpOffset, qAu: q, e, periDeg: peri, nodeDeg: node, iDeg: inc, epochJdTT: EPOCH, H: 9.5, G: 4,
          reference: 'invented',
        };
        const line = formatCometExportLine(row);
        const back = emptyOrbitRow();
        expect(parseCometExportLine(line, back, 'w', 1)).toBe('row');
        expect(back.designation).toBe(designation);
        expect(back.name).toBe(row.name);
        expect(unpackDesignation(back.packedDesignation)).toBe(designation);
        const dt = Math.abs(back.tpJdTT - row.tpJdTT);
        worst.tpSeconds = Math.max(worst.tpSeconds, dt * 86400);
        // perihelion day to 1e-4 day; JD arithmetic near 2.46e6 adds ~1e-9 day
        expect(dt).toBeLessThanOrEqual(0.5e-4 + 1e-8);
        for (const f of ['periDeg', 'nodeDeg', 'iDeg'] as const) {
          const d = Math.abs(back[f] - row[f]);
          worst.angleArcsec = Math.max(worst.angleArcsec, d * 3600);
          expect(d).toBeLessThanOrEqual(0.5e-4 + 1e-12);
        }
        expect(Math.abs(back.qAu - q)).toBeLessThanOrEqual(0.5e-6 + 1e-12);
        expect(Math.abs(back.e - e)).toBeLessThanOrEqual(0.5e-6 + 1e-15);
      }), { numRuns: 2000 });
    console.log(`comet export round trip: worst angle ${worst.angleArcsec.toFixed(3)}″, worst perihelion time ${worst.tpSeconds.toFixed(2)} s`);
  });
});
