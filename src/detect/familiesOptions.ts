/**
 * Options of the families detector and its defaults. The published family list and a user's
 * membership list are read by the command line (src/cli/) and handed in as data: the detector
 * reads no file.
 */
import type { PublishedFamily } from '../io/publishedFamilies.js';
import type { FamilyMember } from '../io/familyMembership.js';

export interface FamiliesOptions {
  cutoffMPerS: number | null; // one HCM cutoff for every belt region; null: each region's quasi-random level
  minMembers: number; // N_min: fewest members a family may have
  fapThreshold: number; // a body outside every family is listed (wayward families' outliers.csv) when falseAlarmProb < this
  fdrLevel: number; // Q: of those, the ones with Benjamini–Hochberg q < Q survive the false-discovery control (scan lists these)
  seed: number; // seeds the QRL backgrounds and the outliers' null catalogues
  published: readonly PublishedFamily[]; // names for clusters whose centre lies in a family's ranges
  membership: readonly FamilyMember[] | null; // a user's labels: clusters named by majority of matched members
}

/**
 * Defaults. N_min 20 and the QRL settings are those the clustering's recovery test uses on
 * 90 000 real proper elements (test/detect/families/familyRecovery.test.ts; our choice);
 * α = 0.01 the false-alarm level the outliers' calibration was measured at; Q = 0.05 the
 * false-discovery level Benjamini & Hochberg 1995 illustrate with (common practice); the seed is arbitrary.
 */
export const FAMILIES_DEFAULTS: Readonly<FamiliesOptions> = {
  cutoffMPerS: null,
  minMembers: 20,
  fapThreshold: 0.01,
  fdrLevel: 0.05,
  seed: 2026,
  published: [],
  membership: null,
};

/** QRL settings (qrlCutoff.ts): 3 backgrounds uniform in 0.02 boxes of a, e, sin i, bisected to 0.5 m/s (as the recovery test). */
export const FAMILIES_QRL = { backgrounds: 3, background: { cell: { aAu: 0.02, e: 0.02, sinI: 0.02 } }, resolutionMPerS: 0.5 } as const;
