/**
 * The outlier candidates of the families detector: bodies outside every family whose isolation
 * in proper elements (families/outliers.ts) the null model makes rare. falseAlarmProb is the
 * null tail fraction, or beyond the null sample's resolution the tail fit's extrapolation
 * (flag `fap-extrapolated`, details.false_alarm_from); q_value the Benjamini–Hochberg adjusted
 * level over every body tested (outside every family); tailFraction ranks the score among every
 * screened body.
 */
import { qualityNames, type Catalogue } from '../clean/types.js';
import type { FamilyRow } from './families/familyTable.js';
import { orbitalSpeedMPerS } from './families/metricVelocity.js';
import { FamilyMemberSearch } from './families/nearestMember.js';
import type { ProperOutliers } from './families/outliers.js';
import type { FamilyName } from './familiesNaming.js';
import { countsAtLeastUnsorted } from './tailCountsAtLeast.js';
import { TAIL_FROM_FIT, TAIL_FROM_FRACTION_BEYOND_FIT } from './tailExtrapolation.js';
import type { Candidate } from './types.js';

/** Flag of a candidate whose false-alarm probability is the tail fit's extrapolation. */
export const FAP_EXTRAPOLATED_FLAG = 'fap-extrapolated';

const fromText = (from: number): string => (from === TAIL_FROM_FIT ? 'tail fit' : from === TAIL_FROM_FRACTION_BEYOND_FIT ? 'null fraction (tail fit underflows)' : 'null fraction');

/**
 * The family nearest to screened body j: the family of its nearest family member in the velocity
 * metric, and that member's distance in m/s (scaled distance times the body's own n·a, as for
 * its k nearest bodies: families/outlierMetric.ts). The first member among its k nearest bodies
 * is that member (`via` 'neighbour'); when none of them is a member, the members alone are
 * searched (`via` 'members', families/nearestMember.ts). No family at all: −1, NaN, ''.
 */
export function nearestFamily(
  j: number, o: ProperOutliers, labels: Int32Array, members: FamilyMemberSearch, a: Float64Array,
): { family: number; member: number; distanceMPerS: number; via: 'neighbour' | 'members' | '' } {
  for (let m = 0; m < o.k; m++) {
    const b = o.neighbourIndex[j * o.k + m];
    if (labels[b] >= 0) return { family: labels[b], member: b, distanceMPerS: o.neighbourDistanceMps[j * o.k + m], via: 'neighbour' };
  }
  const near = members.nearest(o.scaledXyz[3 * j], o.scaledXyz[3 * j + 1], o.scaledXyz[3 * j + 2]);
  if (near.body < 0) return { family: -1, member: -1, distanceMPerS: NaN, via: '' };
  return { family: near.family, member: near.body, distanceMPerS: orbitalSpeedMPerS(a[j]) * near.scaledDistance, via: 'members' };
}

const fixed = (x: number, d: number): number => (Number.isFinite(x) ? Number(x.toFixed(d)) : x);

/**
 * Candidates, in screened order, of the bodies outside every family with false-alarm probability
 * below `threshold`, each with its q-value and whether it is below the false-discovery level.
 * `labels` may run past the screened bodies (the bodies set apart that occupy space: −1).
 */
export function familyOutlierCandidates(
  cat: Catalogue, screened: Int32Array, a: Float64Array, e: Float64Array, sinI: Float64Array,
  labels: Int32Array, table: readonly FamilyRow[], names: readonly FamilyName[], o: ProperOutliers, threshold: number,
  fdr: { qValue: Float64Array; level: number },
): Candidate[] {
  const listed: number[] = [];
  for (let j = 0; j < screened.length; j++) if (labels[j] < 0 && o.falseAlarmProb[j] < threshold) listed.push(j);
  // the screened bodies at least as isolated as each listed one (memberUpperTailFraction's count, without sorting every score)
  const atLeast = countsAtLeastUnsorted(o.score.subarray(0, screened.length), listed.map((j) => o.score[j]));
  const out: Candidate[] = [];
  const members = new FamilyMemberSearch(o.scaledXyz, labels);
  for (let t = 0; t < listed.length; t++) {
    const j = listed[t];
    const k = screened[j];
    const near = nearestFamily(j, o, labels, members, a);
    const fam = near.family >= 0 ? names[near.family] : undefined;
    const nearText = fam
      ? `nearest family ${fam.name === fam.id ? fam.id : `${fam.name} (${fam.id})`} ${near.distanceMPerS.toFixed(0)} m/s away (its nearest member ${cat.designation[screened[near.member]]}${near.via === 'neighbour' ? `, one of its ${o.k} nearest bodies` : ''})`
      : 'no family found in this catalogue';
    const extrapolated = o.falseAlarmFrom[j] === TAIL_FROM_FIT;
    const q = fdr.qValue[j];
    const fapText = extrapolated
      ? `false-alarm probability ${o.falseAlarmProb[j].toPrecision(2)}, extrapolated by the null sample's tail fit (fewer than 10 of its ${o.nullScores} bodies score as high: below its resolution this is a model estimate)`
      : `a fraction ${o.falseAlarmProb[j].toPrecision(2)} of the null model's bodies score as high`;
    out.push({
      designation: cat.designation[k], index: k, detector: 'families', class: 'family-outlier', boundary: false,
      score: fixed(o.score[j], 4),
      tailFraction: atLeast[t] / screened.length, tailPopulation: screened.length,
      falseAlarmProb: o.falseAlarmProb[j],
      flags: extrapolated ? [...qualityNames(cat.quality[k]), FAP_EXTRAPOLATED_FLAG] : qualityNames(cat.quality[k]),
      why: `Outside every family and isolated in proper elements (a ${a[j].toFixed(4)} au, e ${e[j].toFixed(4)}, sin i ${sinI[j].toFixed(4)}): ` +
        `isolation score ${o.score[j].toFixed(2)} (ln of background over ${o.k}-nearest density), nearest body ${o.nearestDistanceMps[j].toFixed(0)} m/s away; ` +
        `${fapText}; false-discovery-adjusted q ${q.toPrecision(2)} over every body tested (${q < fdr.level ? 'below' : 'not below'} ${fdr.level}); ${nearText}.`,
      details: {
        proper_a_au: fixed(a[j], 6), proper_e: fixed(e[j], 6), proper_sin_i: fixed(sinI[j], 6),
        nearest_family: fam ? fam.name : '', nearest_family_id: fam ? fam.id : '',
        nearest_family_mps: fixed(near.distanceMPerS, 1), nearest_family_via: near.via,
        nearest_body_mps: fixed(o.nearestDistanceMps[j], 1), kth_body_mps: fixed(o.kthDistanceMps[j], 1),
        null_tail_fraction: o.nullTailFraction[j],
        false_alarm_from: fromText(o.falseAlarmFrom[j]),
        q_value: q,
        fdr_pass: q < fdr.level ? 'yes' : 'no',
      },
    });
  }
  return out;
}
