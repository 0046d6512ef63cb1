/**
 * The families detector: asteroid families in proper elements and the bodies isolated from
 * them. Stages:
 *   1. screen and proper elements (familiesScreen.ts: linear secular theory, core/secular);
 *      bodies whose proper elements the theory does not trust are set apart with the reasons;
 *   2. families: HCM region by region at the quasi-random level or a given cutoff
 *      (familiesCluster.ts), named from the published list or a user's labels (familiesNaming.ts);
 *   3. outliers: isolation scores with a calibrated null model (families/outliers.ts);
 *      candidates are the bodies outside every family with falseAlarmProb below the threshold
 *      (familiesOutliers.ts). Deterministic for the seed.
 * The QRL levels (stage 2) and the k-nearest searches (stage 3) run on the scan's threads
 * (DetectorContext.threads; families/familiesThreads.ts), with the same numbers on any count.
 */
import { seededRandom } from '../core/random.js';
import type { Catalogue } from '../clean/types.js';
import { DEFAULT_PROPER_OUTLIER_OPTIONS, properOutliers, type ProperOutliers } from './families/outliers.js';
import { clusterFamilies, type FamiliesClustering } from './familiesCluster.js';
import { pick } from './families/qrlRegion.js';
import { membershipLabels, nameFamilies, type FamilyName } from './familiesNaming.js';
import type { FamilyMember } from '../io/familyMembership.js';
import type { FamiliesOptions } from './familiesOptions.js';
import { familyOutlierCandidates } from './familiesOutliers.js';
import { SERIAL_FAMILIES_WORK, startFamiliesThreads, type FamiliesWork } from './families/familiesThreads.js';
import { FAMILIES_NOT_SCREENED, screenFamilies, type FamiliesScreen } from './familiesScreen.js';
import type { Candidate, Detector, DetectorResult } from './types.js';

export interface FamiliesAnalysis {
  screen: FamiliesScreen;
  a: Float64Array; e: Float64Array; sinI: Float64Array; // proper elements of the screened bodies, in screened order
  clustering: FamiliesClustering;
  names: FamilyName[];
  outliers: ProperOutliers | null; // null when too few bodies were screened (no more than k)
  candidates: Candidate[];
  unmatched: FamilyMember[]; // membership lines no catalogue body matched
}

/**
 * Everything the detector finds; `wayward families` writes it all. `work`: the threads the QRL
 * levels and the outliers' k-nearest searches run on (startFamiliesThreads); the same numbers
 * on any.
 */
export function analyseFamilies(cat: Catalogue, opts: FamiliesOptions, work: FamiliesWork = SERIAL_FAMILIES_WORK): FamiliesAnalysis {
  if (!(opts.fapThreshold > 0 && opts.fapThreshold <= 1)) throw new RangeError(`analyseFamilies: fapThreshold must be in (0, 1], got ${opts.fapThreshold}`);
  if (!Number.isInteger(opts.minMembers) || opts.minMembers < 2) throw new RangeError(`analyseFamilies: minMembers must be an integer ≥ 2, got ${opts.minMembers}`);
  if (opts.cutoffMPerS !== null && !(opts.cutoffMPerS > 0)) throw new RangeError(`analyseFamilies: cutoff must be positive m/s, got ${opts.cutoffMPerS}`);
  const screen = screenFamilies(cat);
  const pickCol = (col: Float64Array) => pick(col, screen.screened);
  const a = pickCol(screen.proper.aAu), e = pickCol(screen.proper.e), sinI = pickCol(screen.proper.sinI);
  const clustering = clusterFamilies(a, e, sinI, opts, work.levels);
  const user = opts.membership ? membershipLabels(cat, opts.membership) : null;
  const names = nameFamilies(clustering.table, clustering.familyRegion, screen.screened, opts.published, user ? user.label : null);
  const k = DEFAULT_PROPER_OUTLIER_OPTIONS.k;
  const outliers = a.length > k ? properOutliers(a, e, sinI, seededRandom(opts.seed), DEFAULT_PROPER_OUTLIER_OPTIONS, work.search) : null;
  const candidates = outliers
    ? familyOutlierCandidates(cat, screen.screened, a, e, sinI, clustering.labels, clustering.table, names, outliers, opts.fapThreshold)
    : [];
  return { screen, a, e, sinI, clustering, names, outliers, candidates, unmatched: user ? user.unmatched : [] };
}

const K = DEFAULT_PROPER_OUTLIER_OPTIONS.k;

export const familiesDetector: Detector = {
  id: 'families',
  description: 'asteroid families in proper elements (linear secular theory, HCM at the quasi-random level) and the bodies isolated from every family',
  scoreMeaning: `isolation in proper elements: ln(background density / density within the ${K}th-nearest body), scaled coordinates (√(5/4)·ln a, √2·e, √2·sin i)`,
  tailMeaning: 'bodies screened (trusted proper elements) with an isolation score at least as high, the body itself included',
  falseAlarmModel: 'as many bodies as were screened, drawn independently from a smooth background in scaled proper-element space ' +
    `(each a point uniform in the ball around an observed body as wide as its ${K}th-neighbour distance, that body picked with weight ` +
    `min(1, ${DEFAULT_PROPER_OUTLIER_OPTIONS.weightCap}·background/${K}-nearest density) so that families do not shape it, e and sin i reflected at 0); ` +
    `${DEFAULT_PROPER_OUTLIER_OPTIONS.replicates} such catalogues, seeded, scored as the observed one`,
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
    return { candidates: r.candidates, screened: r.screen.screened.length, notScreened: { ...r.screen.notScreened } };
  },
};
