/**
 * The families detector: asteroid families in proper elements and the bodies isolated from
 * them. Stages:
 *   1. screen and proper elements (familiesScreen.ts: linear secular theory, core/secular);
 *      bodies whose proper elements the theory does not trust are set apart with the reasons;
 *   2. families: HCM region by region at the quasi-random level or a given cutoff
 *      (familiesCluster.ts), named from the published list or a user's labels (familiesNaming.ts);
 *   3. outliers: isolation scores with a calibrated null model (families/outliers.ts). The
 *      bodies whose proper elements are not trusted (but could be computed) occupy space there
 *      and are not scored, as they are not clustered; the null catalogues see the same
 *      selection. Every body outside the families is tested at once: Benjamini–Hochberg
 *      q-values over them (tailQValues.ts) from the false-alarm probabilities, which beyond the
 *      null sample's resolution come from its tail fit (tailExtrapolation.ts). The analysis
 *      lists the bodies with falseAlarmProb below the threshold, each with its q-value
 *      (familiesOutliers.ts); the detector's candidates in `scan` are those of them with
 *      q below the false-discovery level. Deterministic for the seed.
 * The proper elements (stage 1), the QRL levels (stage 2) and the k-nearest searches and null
 * catalogues (stage 3) run on the scan's threads (DetectorContext.threads;
 * families/familiesThreads.ts), with the same numbers on any count; with more than one, stage 2
 * runs on a worker while this thread scores the outliers (they meet at the candidates).
 */
import { seededRandom } from '../core/random.js';
import type { Catalogue } from '../clean/types.js';
import { DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers, type ProperOutliers } from './families/outliers.js';
import { nullPickClause } from './families/outlierCalibration.js';
import type { FamiliesClustering } from './familiesCluster.js';
import { pick } from './families/qrlRegion.js';
import { membershipLabels, nameFamilies, type FamilyName } from './familiesNaming.js';
import type { FamilyMember } from '../io/familyMembership.js';
import type { FamiliesOptions } from './familiesOptions.js';
import { familyOutlierCandidates } from './familiesOutliers.js';
import { SERIAL_FAMILIES_WORK, startFamiliesThreads, type FamiliesWork } from './families/familiesThreads.js';
import { FAMILIES_NOT_SCREENED, screenFamilies, type FamiliesScreen } from './familiesScreen.js';
import { benjaminiHochbergQValues } from './tailQValues.js';
import type { Candidate, Detector, DetectorResult } from './types.js';

export interface FamiliesAnalysis {
  screen: FamiliesScreen;
  a: Float64Array; e: Float64Array; sinI: Float64Array; // proper elements of the screened bodies, in screened order
  clustering: FamiliesClustering;
  names: FamilyName[];
  outliers: ProperOutliers | null; // null when too few bodies were screened (no more than k); its first screened.length bodies are the screened ones, in order, then the bodies set apart that occupy space
  occupying: Int32Array; // catalogue rows of the bodies with untrusted proper elements that occupy space in the outliers' stage (after the screened ones)
  tested: number; // bodies tested at once: screened, outside every family
  qValue: Float64Array | null; // Benjamini–Hochberg q per outliers' body over the tested ones; NaN for the others
  candidates: Candidate[]; // tested bodies with falseAlarmProb < fapThreshold, each with its q-value
  fdrCandidates: Candidate[]; // those of them with q < fdrLevel (the detector's candidates in scan)
  unmatched: FamilyMember[]; // membership lines no catalogue body matched
}

/**
 * Everything the detector finds; `wayward families` writes it all. `work`: the threads the proper
 * elements, the clustering and the outliers' searches run on (startFamiliesThreads); the same
 * numbers on any.
 */
export function analyseFamilies(cat: Catalogue, opts: FamiliesOptions, work: FamiliesWork = SERIAL_FAMILIES_WORK): FamiliesAnalysis {
  if (!(opts.fapThreshold > 0 && opts.fapThreshold <= 1)) throw new RangeError(`analyseFamilies: fapThreshold must be in (0, 1], got ${opts.fapThreshold}`);
  if (!(opts.fdrLevel > 0 && opts.fdrLevel <= 1)) throw new RangeError(`analyseFamilies: fdrLevel must be in (0, 1], got ${opts.fdrLevel}`);
  if (!Number.isInteger(opts.minMembers) || opts.minMembers < 2) throw new RangeError(`analyseFamilies: minMembers must be an integer ≥ 2, got ${opts.minMembers}`);
  if (opts.cutoffMPerS !== null && !(opts.cutoffMPerS > 0)) throw new RangeError(`analyseFamilies: cutoff must be positive m/s, got ${opts.cutoffMPerS}`);
  const screen = screenFamilies(cat, work.proper);
  const pickCol = (col: Float64Array) => pick(col, screen.screened);
  const a = pickCol(screen.proper.aAu), e = pickCol(screen.proper.e), sinI = pickCol(screen.proper.sinI);
  // The clustering and the outliers' scores are independent until the candidates: with threads,
  // one clusters while the others score (familiesThreads.ts), the same numbers either way.
  const clustered = work.clusterAside(a, e, sinI, opts);
  const k = DEFAULT_PROPER_OUTLIER_OPTIONS.k;
  const occupying = occupyingUnreliable(screen, a, e, sinI);
  const space = withOccupying(screen, a, e, sinI, occupying);
  const outliers = a.length > k ? properOutliers(space.a, space.e, space.sinI, seededRandom(opts.seed), DEFAULT_PROPER_OUTLIER_OPTIONS, space.scored, work.search, work.nullReplicates) : null;
  const clustering = clustered();
  const user = opts.membership ? membershipLabels(cat, opts.membership) : null;
  const names = nameFamilies(clustering.table, clustering.familyRegion, screen.screened, opts.published, user ? user.label : null);
  const labels = new Int32Array(space.a.length).fill(-1); // the bodies set apart that occupy space: no family
  labels.set(clustering.labels);
  const tested = new Uint8Array(labels.length); // a plain loop: Uint8Array.from with a map function took a second on a million rows
  let testedCount = 0;
  for (let j = 0; j < a.length; j++) if (labels[j] < 0) { tested[j] = 1; testedCount++; }
  const qValue = outliers ? benjaminiHochbergQValues(outliers.falseAlarmProb, tested) : null;
  const candidates = outliers && qValue
    ? familyOutlierCandidates(cat, screen.screened, a, e, sinI, labels, clustering.table, names, outliers, opts.fapThreshold, { qValue, level: opts.fdrLevel })
    : [];
  const fdrCandidates = candidates.filter((c) => (c.details.q_value as number) < opts.fdrLevel);
  return {
    screen, a, e, sinI, clustering, names, outliers, occupying, tested: testedCount, qValue,
    candidates, fdrCandidates, unmatched: user ? user.unmatched : [],
  };
}

/**
 * Rows set apart for untrusted proper elements that occupy space in the outliers' stage: those
 * whose proper elements could still be computed and lie in the box the screened bodies span (in
 * a, e, sin i). Beyond it they are not placed: the untrusted values there reach e and sin i of
 * 20 and more near the secular resonances (measured on the demo catalogue), which are no place
 * in the belt. Limit: the box's own faces (the cuts at e and sin i of 0.3) stay hard in the
 * observed catalogue and soft in the null one, whose draws are not clipped to the box (clipping
 * them also cut the null's most isolated bodies at a smooth cloud's natural edges and raised
 * 1.6% at α = 0.01 on the synthetic test of outlierSelection.test.ts).
 */
function occupyingUnreliable(screen: FamiliesScreen, a: Float64Array, e: Float64Array, sinI: Float64Array): Int32Array {
  const [aLo, aHi] = rangeOf(a), [eLo, eHi] = rangeOf(e), [sLo, sHi] = rangeOf(sinI);
  const rows: number[] = [];
  const p = screen.proper;
  for (let k = 0; k < screen.reason.length; k++) {
    if (screen.reason[k] !== 'proper-unreliable') continue;
    if (p.aAu[k] >= aLo && p.aAu[k] <= aHi && p.e[k] >= eLo && p.e[k] <= eHi && p.sinI[k] >= sLo && p.sinI[k] <= sHi) rows.push(k);
  }
  return Int32Array.from(rows);
}

function rangeOf(c: Float64Array): [number, number] {
  let lo = Infinity, hi = -Infinity;
  for (let j = 0; j < c.length; j++) {
    if (c[j] < lo) lo = c[j];
    if (c[j] > hi) hi = c[j];
  }
  return [lo, hi];
}

/** Proper elements of the screened bodies then the occupying ones, which are marked not scored. */
function withOccupying(screen: FamiliesScreen, a: Float64Array, e: Float64Array, sinI: Float64Array, occupying: Int32Array) {
  const s = a.length, n = s + occupying.length;
  const join = (screened: Float64Array, col: Float64Array) => {
    const out = new Float64Array(n);
    out.set(screened);
    for (let m = 0; m < occupying.length; m++) out[s + m] = col[occupying[m]];
    return out;
  };
  const scored = occupying.length > 0 ? new Uint8Array(n).fill(1, 0, s) : null; // null: no selection to see
  return { a: join(a, screen.proper.aAu), e: join(e, screen.proper.e), sinI: join(sinI, screen.proper.sinI), scored };
}

const K = DEFAULT_PROPER_OUTLIER_OPTIONS.k;

export const familiesDetector: Detector = {
  id: 'families',
  description: 'asteroid families in proper elements (linear secular theory, HCM at the quasi-random level) and the bodies isolated from every family',
  scoreMeaning: `isolation in proper elements: ln(background density / density within the ${K}th-nearest body), scaled coordinates (√(5/4)·ln a, √2·e, √2·sin i)`,
  tailMeaning: 'bodies screened (trusted proper elements) with an isolation score at least as high, the body itself included',
  falseAlarmModel: 'as many bodies as occupy proper-element space (screened, and set apart with untrusted proper elements within the screened ones\' ranges), drawn independently from a smooth background in scaled proper-element space ' +
    `(each a point uniform in the ball around an observed body as wide as its ${K}th-neighbour distance, ${nullPickClause(DEFAULT_PROPER_OUTLIER_OPTIONS.weightCap)}, e and sin i reflected at 0); ` +
    `up to ${DEFAULT_PROPER_OUTLIER_OPTIONS.replicates} such catalogues, seeded, the bodies drawn from a screened body scored as the observed ones; ` +
    'beyond the null sample\'s resolution, a generalized Pareto fit to its upper tail (an extrapolation, flagged fap-extrapolated); ' +
    'candidates are the bodies outside every family with Benjamini–Hochberg q below the false-discovery level over all of them',
  notScreenedReasons: FAMILIES_NOT_SCREENED,
  async run(cat, all, ctx): Promise<DetectorResult> {
    ctx?.progress?.start('families');
    const threads = await startFamiliesThreads(ctx?.threads ?? 1);
    let r: FamiliesAnalysis;
    try {
      r = analyseFamilies(cat, all.families, threads);
    } finally {
      await threads.close();
    }
    ctx?.progress?.end();
    return { candidates: r.fdrCandidates, screened: r.screen.screened.length, notScreened: { ...r.screen.notScreened } };
  },
};
