/**
 * The `nongrav` detector: each catalogue body with astrometry is checked as `wayward check`
 * checks one (src/fit/check/runCheck.ts: gravity only and the thermal, comet and srp models
 * fitted and compared on one set of observations, the preferred model guarded), starting from
 * the catalogue's own elements. A body whose preferred model is not gravity only is a
 * candidate (nongravCandidate.ts).
 *
 * Leave-one-station-out refits run only for a body whose preferred model is not gravity only
 * (runCheck's rule): each refit costs a whole fit, a gravity-only body has no signal for them
 * to test, and in a scan most bodies are gravity-only, so this keeps a scan to one set of
 * model fits a body plus a few refits a candidate.
 *
 * Not screened: every body when no astrometry is given; a body without astrometry; a body
 * with fewer usable observations than `minObservations`; a body whose elements give no start
 * (neither a and M nor q and the perihelion time); a body whose gravity-only fit fails (its
 * message in the result's warnings).
 *
 * A deliberate departure from the layer map: this detector calls src/fit (the check), a layer
 * beside it, not below it.
 */
import type { Catalogue } from '../clean/types.js';
import type { OrbitElements } from '../core/propagate/propagateOrbit.js';
import { mapInWorkers } from '../core/workerPool.js';
import { COMPARISON_NULL_HYPOTHESIS } from '../fit/models/index.js';
import { jdTTToTDB } from '../fit/observerPosition.js';
import { checkNongravBody, type NongravChecked, type NongravOutcome, type NongravTask } from './nongravCheck.js';
import { nongravCandidate } from './nongravCandidate.js';
import type { Candidate, Detector, DetectorResult } from './types.js';

export const NONGRAV_NOT_SCREENED = {
  'no-astrometry-given': 'no astrometry was given (scan --obs DIR)',
  'no-astrometry': 'no observations of the body in the astrometry given',
  'too-few-observations': 'fewer usable observations than the least the check takes',
  'no-usable-elements': 'the catalogue row gives neither a and M nor q and the perihelion time to start the fit from',
  'fit-failed': 'the gravity-only orbit fit to the astrometry failed',
} as const;
export type NongravNotScreened = keyof typeof NONGRAV_NOT_SCREENED;

/** The catalogue row's elements as the fit's start (as check's --elements reads a row), or null. */
export function catalogueElements(cat: Catalogue, k: number): OrbitElements | null {
  const angles = { iRad: cat.i[k], nodeRad: cat.node[k], periRad: cat.peri[k] };
  const epochJdTDB = jdTTToTDB(cat.epochJdTT[k]);
  if (cat.e[k] < 1 && cat.a[k] > 0 && Number.isFinite(cat.meanAnomaly[k]) && Number.isFinite(epochJdTDB)) {
    return { form: 'semimajor', aAu: cat.a[k], e: cat.e[k], ...angles, meanAnomalyRad: cat.meanAnomaly[k], epochJdTDB };
  }
  if (Number.isFinite(cat.q[k]) && Number.isFinite(cat.tpJdTT[k]) && Number.isFinite(cat.e[k])) {
    const tpJdTDB = jdTTToTDB(cat.tpJdTT[k]);
    return { form: 'perihelion', qAu: cat.q[k], e: cat.e[k], ...angles, tpJdTDB, epochJdTDB: Number.isFinite(epochJdTDB) ? epochJdTDB : tpJdTDB };
  }
  return null;
}

/** Fraction of `values` at least `x` (x itself among them). */
function tailAtLeast(sortedAscending: Float64Array, x: number): number {
  let lo = 0, hi = sortedAscending.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sortedAscending[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return (sortedAscending.length - lo) / sortedAscending.length;
}

async function checkAll(tasks: readonly NongravTask[], threads: number): Promise<NongravOutcome[]> {
  if (threads <= 1 || tasks.length <= 1) {
    const out: NongravOutcome[] = [];
    for (const t of tasks) out.push(await checkNongravBody(t));
    return out;
  }
  return mapInWorkers<NongravTask, NongravOutcome>(import.meta.url, 'nongravWorker', tasks, { threads: Math.min(threads, tasks.length) });
}

export const nongravDetector: Detector = {
  id: 'nongrav',
  description: "bodies whose astrometry (scan --obs DIR) needs a non-gravitational force: each body's orbit fitted as `check` fits it, from the catalogue's elements",
  scoreMeaning: 'Δχ² of the preferred model against gravity only over the same observations (dimensionless, χ² units); 0 for a probable data artefact (reported apart)',
  tailMeaning: 'bodies checked whose Δχ² against gravity only (of the preferred model; of the best alternative when gravity is preferred) is at least as large, the body itself included',
  falseAlarmModel: `${COMPARISON_NULL_HYPOTHESIS} (the likelihood-ratio test of the preferred model: Δχ² against a χ² law with the added parameters as degrees of freedom; too small when the astrometry has systematic errors)`,
  notScreenedReasons: NONGRAV_NOT_SCREENED,
  async run(cat, opts, ctx): Promise<DetectorResult> {
    const o = opts.nongrav;
    const notScreened: Record<NongravNotScreened, number> = {
      'no-astrometry-given': 0, 'no-astrometry': 0, 'too-few-observations': 0, 'no-usable-elements': 0, 'fit-failed': 0,
    };
    if (o.bodies === null) {
      notScreened['no-astrometry-given'] = cat.size;
      return { candidates: [], screened: 0, notScreened };
    }
    const tasks: NongravTask[] = [];
    const rows: number[] = [];
    const warnings: string[] = [];
    const seen = new Set<number>();
    for (const b of o.bodies) {
      if (!(b.index >= 0 && b.index < cat.size) || seen.has(b.index)) throw new RangeError(`nongrav: catalogue row ${b.index} given twice or out of range`);
      seen.add(b.index);
      if (b.observations.length < o.minObservations) {
        notScreened['too-few-observations']++;
        warnings.push(`${cat.designation[b.index]}: not checked: ${b.observations.length} usable observation${b.observations.length === 1 ? '' : 's'}, fewer than ${o.minObservations}`);
        continue;
      }
      const elements = catalogueElements(cat, b.index);
      if (elements === null) {
        notScreened['no-usable-elements']++;
        warnings.push(`${cat.designation[b.index]}: not checked: ${NONGRAV_NOT_SCREENED['no-usable-elements']}`);
        continue;
      }
      rows.push(b.index);
      tasks.push({
        designation: cat.designation[b.index], observations: b.observations, sites: o.sites, elements, absMagH: cat.H[b.index],
        models: o.models, stationMinShare: o.stationMinShare,
      });
    }
    notScreened['no-astrometry'] = cat.size - seen.size;
    ctx?.progress?.start(`nongrav: checking ${tasks.length} bodies`);
    const outcomes = await checkAll(tasks, ctx?.threads ?? 1);
    ctx?.progress?.end();
    const checked: { k: number; c: NongravChecked }[] = [];
    outcomes.forEach((r, j) => {
      if (r.ok) checked.push({ k: rows[j], c: r });
      else {
        notScreened['fit-failed']++;
        warnings.push(`${cat.designation[rows[j]]}: not checked: ${r.message}`);
      }
    });
    const sorted = Float64Array.from(checked, ({ c }) => c.tailDeltaChi2).sort();
    const candidates: Candidate[] = [];
    for (const { k, c } of checked) {
      if (c.preferred === 'gravity') continue;
      candidates.push(nongravCandidate(cat, k, c, tailAtLeast(sorted, c.tailDeltaChi2), checked.length));
    }
    return { candidates, screened: checked.length, notScreened, warnings };
  },
};
