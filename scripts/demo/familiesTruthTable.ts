/**
 * families-truth.csv: every body the demo planted in proper elements — the main-belt
 * background, the family members and the isolated bodies — with its line in orbits.txt,
 * role, planted family, the proper a, e, sin i as planted (before the short-period scatter of
 * properToOsculating.ts), and what a tester needs besides: H, and for members the diameter,
 * ejection speed and Yarkovsky drift they were given; for isolated bodies the distances to
 * the nearest and 8th-nearest drawn body, and their empty pocket's radius, the count of
 * background bodies the smooth law would put in it and the count carved from it. Streamed: one line per body as it is written.
 */
import { DEMO_FAMILIES } from './families.js';
import { LineWriter } from './lineWriter.js';
import type { OutlierPlant } from './plantedOutliers.js';
import type { NaturalPlant } from './population.js';

export const FAMILIES_TRUTH_COLUMNS = [
  'designation', 'line', 'role', 'family', 'a_proper_au', 'e_proper', 'sin_i_proper', 'H',
  'diameter_km', 'ejection_mps', 'yarkovsky_da_au', 'nearest_mps', 'eighth_nearest_mps',
  'pocket_radius_mps', 'pocket_expected', 'pocket_carved',
] as const;

function num(x: number, decimals: number): string {
  return Number.isFinite(x) ? x.toFixed(decimals) : '';
}

export class FamiliesTruthWriter {
  private readonly w: LineWriter;
  rows = 0;
  /** Rows per role, and per planted family as 'family member <id>'. */
  readonly counts: Record<string, number> = {};

  constructor(path: string) {
    this.w = new LineWriter(path);
    this.w.write(FAMILIES_TRUTH_COLUMNS.join(','));
  }

  natural(designation: string, line: number, H: number, p: NaturalPlant): void {
    if (p.role === '') return;
    const fam = p.family >= 0 ? DEMO_FAMILIES[p.family].id : '';
    this.row(designation, line, p.role, fam, p.proper.aAu, p.proper.e, p.proper.sinI, H,
      p.member.diameterKm, p.member.ejectionMPerS, p.member.yarkovskyAu, NaN, NaN, NaN, NaN, NaN);
  }

  outlier(designation: string, line: number, H: number, o: OutlierPlant): void {
    this.row(designation, line, 'outlier', '', o.proper.aAu, o.proper.e, o.proper.sinI, H, NaN, NaN, NaN, o.nearestMPerS, o.eighthMPerS,
      o.pocket.radiusMPerS, o.expectedInPocket, o.carvedFromPocket);
  }

  private row(
    designation: string, line: number, role: string, family: string, a: number, e: number, sinI: number, H: number,
    dKm: number, ejection: number, yark: number, nearest: number, eighth: number,
    pocketRadius: number, expected: number, carved: number,
  ): void {
    this.w.write([
      designation, String(line), role, family, num(a, 7), num(e, 7), num(sinI, 7), num(H, 2),
      num(dKm, 3), num(ejection, 1), num(yark, 6), num(nearest, 0), num(eighth, 0),
      num(pocketRadius, 0), num(expected, 1), num(carved, 0),
    ].join(','));
    this.rows++;
    const key = family === '' ? role : `${role} ${family}`;
    this.counts[key] = (this.counts[key] ?? 0) + 1;
  }

  close(): void {
    this.w.close();
  }
}
