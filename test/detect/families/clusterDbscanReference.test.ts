/**
 * HCM at cutoff v_c with N_min = 2 against a general-purpose reference DBSCAN (scikit-learn,
 * eps = v_c, min_samples = 2; test/fixtures/sklearn/README.md) on 4 000 real proper elements
 * (SDSS MOC 4 with proper elements, test/fixtures/proper-elements-sdss/README.md). The
 * equivalence argued in clusterHcm.ts: the same partition, only the numbering differs.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { clusterHcm } from '../../../src/detect/families/clusterHcm.js';
import { toVelocitySpace } from '../../../src/detect/families/metricVelocity.js';
import { adjustedRandIndex, canonicalLabels } from '../../helpers/partition.js';
import { readProperElements } from '../../helpers/properElements.js';

interface Fixture { rowCount: number; aRefAu: number; labelings: { epsMPerS: number; labels: number[] }[] }
const fixture: Fixture = JSON.parse(readFileSync(new URL('../../fixtures/sklearn/dbscanSdss.json', import.meta.url), 'utf8'));

describe('HCM against scikit-learn DBSCAN (min_samples = 2) on real proper elements', () => {
  const all = readProperElements();
  const n = fixture.rowCount;
  const space = toVelocitySpace(all.aAu.subarray(0, n), all.e.subarray(0, n), all.sinI.subarray(0, n), fixture.aRefAu);
  for (const { epsMPerS, labels } of fixture.labelings) {
    it(`same partition at eps = ${epsMPerS} m/s`, () => {
      const got = clusterHcm(space, epsMPerS, 2);
      expect(labels.length).toBe(n);
      // Adjusted Rand index 1 and identical canonical labels: the same groups and the same noise.
      expect(adjustedRandIndex(got.labels, labels)).toBe(1);
      expect(Array.from(canonicalLabels(got.labels))).toEqual(Array.from(canonicalLabels(labels)));
    });
  }

  it('with N_min = 5: the DBSCAN clusters of at least 5 members, the rest noise', () => {
    const { epsMPerS, labels } = fixture.labelings[1];
    const size = new Map<number, number>();
    for (const l of labels) if (l >= 0) size.set(l, (size.get(l) ?? 0) + 1);
    const trimmed = labels.map((l) => (l >= 0 && size.get(l)! >= 5 ? l : -1));
    const got = clusterHcm(space, epsMPerS, 5);
    expect(got.memberCounts.length).toBe([...size.values()].filter((m) => m >= 5).length);
    expect(Array.from(canonicalLabels(got.labels))).toEqual(Array.from(canonicalLabels(trimmed)));
  });
});
