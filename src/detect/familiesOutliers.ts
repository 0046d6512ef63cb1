/**
 * The outlier candidates of the families detector: bodies outside every family whose isolation
 * in proper elements (families/outliers.ts) the null model makes rare. falseAlarmProb is the
 * null tail fraction; tailFraction ranks the score among every screened body.
 */
import { qualityNames, type Catalogue } from '../clean/types.js';
import { memberUpperTailFraction } from './empiricalTail.js';
import type { FamilyRow } from './families/familyTable.js';
import { velocityDistanceMPerS } from './families/metricVelocity.js';
import type { ProperOutliers } from './families/outliers.js';
import type { FamilyName } from './familiesNaming.js';
import type { Candidate } from './types.js';

/** The family nearest to screened body j and its distance in m/s: through its k nearest bodies, else the closest family centre. */
export function nearestFamily(
  j: number, o: ProperOutliers, labels: Int32Array, table: readonly FamilyRow[], a: Float64Array, e: Float64Array, sinI: Float64Array,
): { family: number; distanceMPerS: number; via: 'neighbour' | 'centre' | '' } {
  for (let m = 0; m < o.k; m++) {
    const l = labels[o.neighbourIndex[j * o.k + m]];
    if (l >= 0) return { family: l, distanceMPerS: o.neighbourDistanceMps[j * o.k + m], via: 'neighbour' };
  }
  let family = -1, distanceMPerS = NaN;
  for (const f of table) {
    const d = velocityDistanceMPerS(a[j], e[j], sinI[j], f.aAu.median, f.e.median, f.sinI.median, a[j]);
    if (!(d >= distanceMPerS)) { family = f.id; distanceMPerS = d; }
  }
  return { family, distanceMPerS, via: family >= 0 ? 'centre' : '' };
}

const fixed = (x: number, d: number): number => (Number.isFinite(x) ? Number(x.toFixed(d)) : x);

/** Candidates, in screened order, of the bodies outside every family with null tail fraction below `threshold`. */
export function familyOutlierCandidates(
  cat: Catalogue, screened: Int32Array, a: Float64Array, e: Float64Array, sinI: Float64Array,
  labels: Int32Array, table: readonly FamilyRow[], names: readonly FamilyName[], o: ProperOutliers, threshold: number,
): Candidate[] {
  const sorted = Float64Array.from(o.score).sort();
  const out: Candidate[] = [];
  for (let j = 0; j < screened.length; j++) {
    if (labels[j] >= 0 || !(o.nullTailFraction[j] < threshold)) continue;
    const k = screened[j];
    const near = nearestFamily(j, o, labels, table, a, e, sinI);
    const fam = near.family >= 0 ? names[near.family] : undefined;
    const nearText = fam
      ? `nearest family ${fam.name === fam.id ? fam.id : `${fam.name} (${fam.id})`} ${near.distanceMPerS.toFixed(0)} m/s away (${near.via === 'neighbour' ? `one of its ${o.k} nearest bodies` : 'its median centre'})`
      : 'no family found in this catalogue';
    out.push({
      designation: cat.designation[k], index: k, detector: 'families', class: 'family-outlier', boundary: false,
      score: fixed(o.score[j], 4),
      tailFraction: memberUpperTailFraction(sorted, o.score[j]), tailPopulation: screened.length,
      falseAlarmProb: o.nullTailFraction[j],
      flags: qualityNames(cat.quality[k]),
      why: `Outside every family and isolated in proper elements (a ${a[j].toFixed(4)} au, e ${e[j].toFixed(4)}, sin i ${sinI[j].toFixed(4)}): ` +
        `isolation score ${o.score[j].toFixed(2)} (ln of background over ${o.k}-nearest density), nearest body ${o.nearestDistanceMps[j].toFixed(0)} m/s away; ` +
        `a fraction ${o.nullTailFraction[j].toPrecision(2)} of the null model's bodies score as high; ${nearText}.`,
      details: {
        proper_a_au: fixed(a[j], 6), proper_e: fixed(e[j], 6), proper_sin_i: fixed(sinI[j], 6),
        nearest_family: fam ? fam.name : '', nearest_family_id: fam ? fam.id : '',
        nearest_family_mps: fixed(near.distanceMPerS, 1), nearest_family_via: near.via,
        nearest_body_mps: fixed(o.nearestDistanceMps[j], 1), kth_body_mps: fixed(o.kthDistanceMps[j], 1),
        null_tail_fraction: o.nullTailFraction[j],
      },
    });
  }
  return out;
}
