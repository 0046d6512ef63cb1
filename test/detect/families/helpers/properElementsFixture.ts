/**
 * Real proper elements for the outlier tests (test/fixtures/proper-elements-sdss/, provenance
 * in its README): read once, hash-checked, and reduced to distinct bodies. The file lists
 * detections of a moving-object survey joined with proper elements, so an asteroid seen on
 * several nights appears on several rows with the same (a, e, sin i) (186 922 rows, 89 622
 * distinct triples); a density statistic wants each asteroid once, so the first row of each
 * triple is kept.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { distinctBodies, PROPER_ELEMENTS_SDSS_PATH, readProperElements } from '../../../helpers/properElements.js';

const DIR = new URL('../../../fixtures/proper-elements-sdss/', import.meta.url);
const PROPER_SHA256 = 'd6616ab43527595502b17ebccff222aa77dfac9f0715e98d08ebb298a0173695';
const FAMILIES_SHA256 = 'b28f868ff0968ac83627902a7078a3fdbd2aad450b9e6d3ec8512d9307ca20e9';

export interface ProperElements { aAu: Float64Array; e: Float64Array; sinI: Float64Array; rows: number }

function checkedText(name: string, sha256: string): string {
  const bytes = readFileSync(new URL(name, DIR));
  const got = createHash('sha256').update(bytes).digest('hex');
  if (got !== sha256) throw new Error(`${name}: SHA-256 ${got}, expected ${sha256} (see its README)`);
  return bytes.toString('utf8');
}

let cached: ProperElements | undefined;

/** Distinct bodies of the real proper-element file (first row of each (a, e, sin i)), hash-checked. */
export function distinctProperElements(): ProperElements {
  if (cached) return cached;
  checkedText('proper-elements-sdss.csv', PROPER_SHA256);
  const all = readProperElements(PROPER_ELEMENTS_SDSS_PATH);
  if (all.badLines.length > 0) throw new Error(`proper-elements-sdss.csv: rows that are not numbers: ${all.badLines[0]}`);
  const d = distinctBodies(all);
  cached = { aAu: d.aAu, e: d.e, sinI: d.sinI, rows: all.aAu.length };
  return cached;
}

/** Families with median proper a, e, sin i (Parker et al. 2008, Table 2), largest first. */
export function sdssFamilies(): { name: string; members: number; aAu: number; e: number; sinI: number }[] {
  const lines = checkedText('families-sdss-2008.csv', FAMILIES_SHA256).trim().split('\n').slice(1);
  return lines.map((l) => {
    const f = l.split(',');
    return { name: f[0], members: Number(f[1]), aAu: Number(f[2]), sinI: Number(f[3]), e: Number(f[4]) };
  }).sort((x, y) => y.members - x.members);
}
